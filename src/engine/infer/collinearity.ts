import { EngineError } from '../errors';
import { buildDesign } from '../fit/design';
import { aliasTolerance } from '../fit/leastSquares';
import { type ColumnMajorMatrix, columnView, stableNorm } from '../linalg/columnMajor';
import { householderQr } from '../linalg/householderQr';
import { singularValues } from '../linalg/jacobiSvd';
import { invertUpper } from '../linalg/triangular';
import { resolveSettings } from '../settings';
import type { FitSettings } from '../types';

/**
 * How far each predictor term is explained by the others, and how close the design is to singular.
 *
 * VIF_j = 1/(1 − R²_j), R²_j from regressing term j on the other terms and a constant: R²_j is
 * centered, the usual definition, and VIF_j is the factor by which collinearity inflates var(β̂_j)
 * over that of a term uncorrelated with the others. Every reading and warning uses this one.
 * Without an intercept the model's own auxiliary regressions have none and give the uncentered
 * VIF, also returned (uncenteredVif): it compares var(β̂_j) with that of a column orthogonal to the
 * rest, mean included, so a predictor far from 0 shows a large uncentered VIF even when its
 * standard error is that of the model with an intercept. A term that, with the others, spans the
 * constant (a full set of category indicators, or a constant column) has no centered VIF: the
 * model is then the model with an intercept, written differently (reason 'spans-intercept').
 * Each VIF is computed as TSS_j / RSS_j, which avoids forming 1 − R²_j by subtraction, from the engine's QR:
 * RSS_j = 1/((XᵀX)⁻¹)_jj = 1/‖row j of R⁻¹‖², or, when the design is rank deficient, the squared
 * last diagonal of R for the columns reordered with j last. XᵀX is never formed.
 *
 * Weights: everything is on the √w-scaled design, as in the fit, so the auxiliary regressions are
 * weighted and TSS_j is centered on the weighted mean.
 *
 * Condition number: σ_max/σ_min of the weighted design with every column, the intercept's
 * included, scaled to unit Euclidean norm and not centered, the scaling Belsley, Kuh & Welsch
 * (Regression Diagnostics, 1980) recommend so that the number measures the conditioning of the
 * model actually fitted, the intercept's near-dependencies included. The singular values are
 * those of the q×q R factor (one-sided Jacobi), equal to the design's. A rank-deficient design has
 * condition number ∞.
 */
export interface TermCollinearity {
  name: string;
  /** ≥ 1; Infinity when the term has no part the others do not explain (see undefinedBecause). */
  vif: number;
  /** 1/VIF: the share of the term's variation the other terms leave unexplained; 0 when VIF is ∞. */
  tolerance: number;
  undefinedBecause: CollinearityReason | undefined;
  /** Without an intercept only: the VIF of the model's own auxiliary regressions, R²_j uncentered. */
  uncenteredVif?: number;
}

/**
 * - constant: the column does not vary (with an intercept), or is all zero (without one).
 * - collinear: the column is an exact linear combination of the other terms (and the intercept).
 * - spans-intercept: without an intercept, the column and other terms sum to a constant, so no
 *   centered VIF exists (vif and tolerance NaN); the model is the one with an intercept.
 */
export type CollinearityReason = 'constant' | 'collinear' | 'spans-intercept';

export interface Collinearity {
  terms: TermCollinearity[];
  /** Infinity when some column is an exact combination of the others. */
  conditionNumber: number;
  /** Singular values of the unit-norm-scaled design's non-aliased columns, largest first. */
  singularValues: number[];
  hasIntercept: boolean;
}

export function collinearity(x: number[][], names?: string[], weights?: number[], settings?: FitSettings): Collinearity {
  const { intercept } = resolveSettings(settings);
  if (x.length === 0) throw new EngineError('no-rows', 'There are no rows of predictors to examine.');
  const own = termVifs(x, names, weights, intercept);
  if (intercept) return { ...own, hasIntercept: true };
  const centered = termVifs(x, names, weights, true).terms;
  const terms = own.terms.map((u, j): TermCollinearity => {
    const c = centered[j];
    if (u.undefinedBecause !== undefined) return { ...u, uncenteredVif: u.vif };
    // Defined without the constant, undefined with it: the constant is what it spans.
    if (c.undefinedBecause !== undefined) {
      return { name: u.name, vif: Number.NaN, tolerance: Number.NaN, undefinedBecause: 'spans-intercept', uncenteredVif: u.vif };
    }
    return { ...c, uncenteredVif: u.vif };
  });
  return { terms, conditionNumber: own.conditionNumber, singularValues: own.singularValues, hasIntercept: false };
}

/** The VIFs of the auxiliary regressions of the design with or without the intercept, and that design's conditioning. */
function termVifs(x: number[][], names: string[] | undefined, weights: number[] | undefined, intercept: boolean): Omit<Collinearity, 'hasIntercept'> {
  const design = buildDesign(new Array<number>(x.length).fill(0), x, intercept, names, weights);
  const n = design.matrix.rows;
  const q = design.matrix.cols;
  if (q === 0) throw new EngineError('shape', 'The model has no terms: give at least one predictor or keep the intercept.');
  const scaled = unitScaled(design.matrix);
  const qr = householderQr(scaled, aliasTolerance(n));
  const rank = qr.accepted.length;
  const values = singularValues(qr.r, rank, rank);
  const conditionNumber = rank < q ? Number.POSITIVE_INFINITY : values[0] / values[rank - 1];

  const offset = intercept ? 1 : 0;
  const rInverse = rank === q ? invertUpper(qr.r, q) : undefined;
  const terms = design.names.slice(offset).map((name, j): TermCollinearity => {
    const c = j + offset;
    const column = x.map((row) => row[j]);
    if (column.every((v) => v === column[0]) && (intercept || column[0] === 0)) return undefinedTerm(name, 'constant');
    if (q - offset === 1) return { name, vif: 1, tolerance: 1, undefinedBecause: undefined };
    const total = intercept ? centeredSquares(columnView(scaled, c), design.rootWeights) : 1;
    let rss: number;
    if (rInverse !== undefined) {
      let norm2 = 0;
      for (let k = c; k < q; k++) norm2 += rInverse[c * q + k] ** 2;
      rss = 1 / norm2;
    } else {
      // Aliased on earlier columns is collinear with the rest; skipping the refactorization keeps
      // a very wide design (16,384 columns over a few rows) from taking minutes.
      if (qr.aliased[c]) return undefinedTerm(name, 'collinear');
      const last = householderQr(withColumnLast(scaled, c), aliasTolerance(n));
      if (last.aliased[q - 1]) return undefinedTerm(name, 'collinear');
      const size = last.accepted.length;
      rss = last.r[size * size - 1] ** 2;
    }
    const vif = Math.max(1, total / rss);
    return { name, vif, tolerance: 1 / vif, undefinedBecause: undefined };
  });
  return { terms, conditionNumber, singularValues: values };
}

function undefinedTerm(name: string, reason: CollinearityReason): TermCollinearity {
  return { name, vif: Number.POSITIVE_INFINITY, tolerance: 0, undefinedBecause: reason };
}

/** Columns divided by their norms (a zero column stays zero), as the least-squares fit scales them. */
function unitScaled(matrix: ColumnMajorMatrix): ColumnMajorMatrix {
  const scaled: ColumnMajorMatrix = { rows: matrix.rows, cols: matrix.cols, data: new Float64Array(matrix.data.length) };
  for (let j = 0; j < matrix.cols; j++) {
    const col = columnView(matrix, j);
    const norm = stableNorm(col);
    const target = columnView(scaled, j);
    for (let i = 0; i < matrix.rows; i++) target[i] = norm > 0 ? col[i] / norm : 0;
  }
  return scaled;
}

function withColumnLast(matrix: ColumnMajorMatrix, c: number): ColumnMajorMatrix {
  const order = [...Array.from({ length: matrix.cols }, (_, j) => j).filter((j) => j !== c), c];
  const data = new Float64Array(matrix.data.length);
  order.forEach((from, to) => data.set(columnView(matrix, from), to * matrix.rows));
  return { rows: matrix.rows, cols: matrix.cols, data };
}

/**
 * Σwᵢ(xᵢ − x̄_w)² for a column already multiplied by √w (entries √wᵢxᵢ), by the corrected two-pass
 * algorithm (Chan, Golub & LeVeque 1983) so that a large mean does not swamp a small spread.
 */
function centeredSquares(column: Float64Array, rootWeights: Float64Array | undefined): number {
  const n = column.length;
  const root = (i: number): number => (rootWeights === undefined ? 1 : rootWeights[i]);
  let weightSum = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    weightSum += root(i) ** 2;
    mean += root(i) * column[i];
  }
  mean /= weightSum;
  let sum = 0;
  let correction = 0;
  for (let i = 0; i < n; i++) {
    const d = column[i] / root(i) - mean;
    sum += root(i) ** 2 * d * d;
    correction += root(i) ** 2 * d;
  }
  return sum - (correction * correction) / weightSum;
}
