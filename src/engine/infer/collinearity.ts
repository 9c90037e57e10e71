import { predictorValues } from '../cache/packedPredictors';
import { EngineError } from '../errors';
import { buildDesign, type PackedRows } from '../fit/design';
import { aliasTolerance, type LeastSquaresSolution } from '../fit/leastSquares';
import { type ColumnMajorMatrix, columnView, stableNorm } from '../linalg/columnMajor';
import { householderQr, type QrFactorization } from '../linalg/householderQr';
import { singularValues } from '../linalg/jacobiSvd';
import { invertUpper } from '../linalg/triangular';
import type { SolvedModel } from '../fitModel';
import { resolveSettings } from '../settings';
import type { FitSettings, ModelData } from '../types';
import { sharedCollinearity } from './sharedCollinearity';

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

/** Rows of predictors, or the same numbers packed row-major (cache/packedPredictors.ts). */
type Predictors = readonly (readonly number[])[] | PackedRows;

export function collinearity(x: readonly (readonly number[])[], names?: string[], weights?: number[], settings?: FitSettings): Collinearity {
  return collinearityOf(x, names, weights, settings);
}

/**
 * collinearity of a model's predictors (and weights), read from their packed numbers without
 * building rows, and shared with every request over equal numbers (sharedCollinearity.ts).
 */
export function modelCollinearity(data: ModelData, settings?: FitSettings): Collinearity {
  const packed = predictorValues(data);
  const { intercept } = resolveSettings(settings);
  const compute = (): Collinearity => collinearityOf(packed, data.names, data.weights, settings);
  // What the computation refuses (no rows, names not one per column) is never looked up.
  if (packed.rows === 0 || (data.names !== undefined && data.names.length !== packed.p)) return compute();
  const names = data.names ?? Array.from({ length: packed.p }, (_, j) => `x${j + 1}`);
  return sharedCollinearity(data, intercept, names, compute);
}

function collinearityOf(x: Predictors, names: string[] | undefined, weights: number[] | undefined, settings: FitSettings | undefined): Collinearity {
  const { intercept } = resolveSettings(settings);
  const rows = isPacked(x) ? x.rows : x.length;
  if (rows === 0) throw new EngineError('no-rows', 'There are no rows of predictors to examine.');
  // One weighted design with the intercept's column first serves both sets of auxiliary
  // regressions: without an intercept they use the same unit-scaled columns, the first left out.
  const design = buildDesign(new Array<number>(rows).fill(0), x, true, names, weights);
  const scaled = scaleToUnitNorm(design.matrix);
  const predictorNames = design.names.slice(1);
  const constants = constantColumns(x, predictorNames.length);
  const centered = termVifs({ matrix: scaled }, design.rootWeights, predictorNames, constants, true);
  if (intercept) return { ...centered, hasIntercept: true };
  if (predictorNames.length === 0) throw new EngineError('shape', 'The model has no terms: give at least one predictor or keep the intercept.');
  const withoutIntercept: ColumnMajorMatrix = { rows, cols: scaled.cols - 1, data: scaled.data.subarray(rows) };
  const own = termVifs({ matrix: withoutIntercept }, design.rootWeights, predictorNames, constants, false);
  const terms = own.terms.map((u, j): TermCollinearity => {
    const c = centered.terms[j];
    if (u.undefinedBecause !== undefined) return { ...u, uncenteredVif: u.vif };
    // Defined without the constant, undefined with it: the constant is what it spans.
    if (c.undefinedBecause !== undefined) {
      return { name: u.name, vif: Number.NaN, tolerance: Number.NaN, undefinedBecause: 'spans-intercept', uncenteredVif: u.vif };
    }
    return { ...c, uncenteredVif: u.vif };
  });
  return { terms, conditionNumber: own.conditionNumber, singularValues: own.singularValues, hasIntercept: false };
}

/**
 * collinearity of the predictors a model was fitted to, from the fit's own factorization: the fit
 * factors the very design collinearity does (the intercept's column first, every column √w-weighted
 * and scaled to unit norm), so with an intercept only the O(n·p) parts remain to be done here.
 * Without one the centered VIFs need a design the fit does not have, and are computed afresh.
 */
export function collinearityOfFit(data: ModelData, model: SolvedModel): Collinearity {
  if (!model.solution.design.hasIntercept) return modelCollinearity(data, { intercept: false });
  // The cached fit may carry another formula's names; the fit's terms are named for this data.
  const names = model.fit.terms.slice(1).map((t) => t.name);
  return sharedCollinearity(data, true, names, () => fromFitFactor(data, model.solution, names));
}

function fromFitFactor(data: ModelData, solution: LeastSquaresSolution, names: readonly string[]): Collinearity {
  const { design, columnScales } = solution;
  const { cols } = design.matrix;
  const rank = solution.qr.accepted.length;
  const factor = { qr: solution.qr, rInverse: rank === cols ? solution.rInverse : undefined };
  // The fit's own columns and scales: the unit-scaled columns are read through them, not copied.
  const constants = constantColumns(predictorValues(data), cols - 1);
  return { ...termVifs({ matrix: design.matrix, scales: columnScales }, design.rootWeights, names, constants, true, factor), hasIntercept: true };
}

function isPacked(x: Predictors): x is PackedRows {
  return !Array.isArray(x);
}

/** Per predictor column: whether every row holds the same value, and whether that value is 0. */
interface ConstantColumns {
  constant: boolean[];
  zero: boolean[];
}

function constantColumns(x: Predictors, p: number): ConstantColumns {
  const packed = isPacked(x);
  const rows = packed ? x.rows : x.length;
  const valueAt = packed ? (i: number, j: number): number => x.values[i * x.p + j] : (i: number, j: number): number => x[i][j];
  const constant = new Array<boolean>(p).fill(true);
  for (let j = 0; j < p; j++) {
    const first = valueAt(0, j);
    for (let i = 1; i < rows && constant[j]; i++) constant[j] = valueAt(i, j) === first;
  }
  return { constant, zero: constant.map((c, j) => c && valueAt(0, j) === 0) };
}

/** A QR of the unit-scaled columns (aliased ones skipped), with R⁻¹ when no column is aliased. */
interface ScaledFactor {
  qr: Pick<QrFactorization, 'accepted' | 'aliased' | 'r'>;
  rInverse: Float64Array | undefined;
}

function factorOf(scaled: ColumnMajorMatrix): ScaledFactor {
  const qr = householderQr(scaled, aliasTolerance(scaled.rows));
  return { qr, rInverse: qr.accepted.length === scaled.cols ? invertUpper(qr.r, scaled.cols) : undefined };
}

/**
 * Unit-scaled columns as column c of `matrix` divided by `scales[c]` (each entry scaled as it is
 * read, not copied), or `matrix` itself when it is scaled already (no `scales`).
 */
interface ScaledColumns {
  matrix: ColumnMajorMatrix;
  scales?: Float64Array;
}

/**
 * The VIFs of the auxiliary regressions among the unit-scaled columns of `scaled` (the intercept's
 * first when `intercept`), and those columns' conditioning, from `factor` when it is at hand; a
 * caller reading the columns through `scaled.scales` gives their factor.
 */
function termVifs(
  scaled: ScaledColumns,
  rootWeights: Float64Array | undefined,
  names: readonly string[],
  constants: ConstantColumns,
  intercept: boolean,
  factor?: ScaledFactor,
): Omit<Collinearity, 'hasIntercept'> {
  const { matrix, scales } = scaled;
  const n = matrix.rows;
  const q = matrix.cols;
  if (q === 0) throw new EngineError('shape', 'The model has no terms: give at least one predictor or keep the intercept.');
  const { qr, rInverse } = factor ?? factorOf(matrix);
  const rank = qr.accepted.length;
  const values = singularValues(qr.r, rank, rank);
  const conditionNumber = rank < q ? Number.POSITIVE_INFINITY : values[0] / values[rank - 1];

  const offset = intercept ? 1 : 0;
  const terms = names.map((name, j): TermCollinearity => {
    const c = j + offset;
    if (constants.constant[j] && (intercept || constants.zero[j])) return undefinedTerm(name, 'constant');
    if (q - offset === 1) return { name, vif: 1, tolerance: 1, undefinedBecause: undefined };
    const total = intercept ? centeredSquares(columnView(matrix, c), rootWeights, scales?.[c] ?? 1) : 1;
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

/** Columns divided by their norms in place (a zero column stays zero), as the least-squares fit scales them. */
function scaleToUnitNorm(matrix: ColumnMajorMatrix): ColumnMajorMatrix {
  for (let j = 0; j < matrix.cols; j++) {
    const col = columnView(matrix, j);
    const norm = columnNorm(col);
    for (let i = 0; i < matrix.rows; i++) col[i] = norm > 0 ? col[i] / norm : 0;
  }
  return matrix;
}

/**
 * ‖x‖ from the plain sum of squares where no square can overflow or underflow, else stableNorm,
 * whose result is the plain formula's wherever that is finite: one fast pass for ordinary data.
 */
function columnNorm(x: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < x.length; i++) sum += x[i] * x[i];
  return sum > 1e-280 && sum < 1e280 ? Math.sqrt(sum) : stableNorm(x);
}

/** A unit-scaled copy of the columns with column c moved last. */
function withColumnLast({ matrix, scales }: ScaledColumns, c: number): ColumnMajorMatrix {
  const { rows, cols } = matrix;
  const order = [...Array.from({ length: cols }, (_, j) => j).filter((j) => j !== c), c];
  const data = new Float64Array(matrix.data.length);
  order.forEach((from, to) => {
    const column = columnView(matrix, from);
    const scale = scales?.[from] ?? 1;
    for (let i = 0; i < rows; i++) data[to * rows + i] = column[i] / scale;
  });
  return { rows, cols, data };
}

/**
 * Σwᵢ(xᵢ − x̄_w)² for a column already multiplied by √w (entries √wᵢxᵢ), each entry divided by
 * `scale` as it is read, by the corrected two-pass algorithm (Chan, Golub & LeVeque 1983) so that
 * a large mean does not swamp a small spread.
 */
function centeredSquares(column: Float64Array, rootWeights: Float64Array | undefined, scale: number): number {
  if (rootWeights === undefined) return centeredSquaresUnweighted(column, scale);
  const n = column.length;
  let weightSum = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    weightSum += rootWeights[i] ** 2;
    mean += rootWeights[i] * (column[i] / scale);
  }
  mean /= weightSum;
  let sum = 0;
  let correction = 0;
  for (let i = 0; i < n; i++) {
    const d = column[i] / scale / rootWeights[i] - mean;
    sum += rootWeights[i] ** 2 * d * d;
    correction += rootWeights[i] ** 2 * d;
  }
  return sum - (correction * correction) / weightSum;
}

/** centeredSquares with every weight 1: the same sums, without reading weights. */
function centeredSquaresUnweighted(column: Float64Array, scale: number): number {
  const n = column.length;
  // Divided, not multiplied by 1/scale: the same quotients as scaled copies hold, so a fit's VIFs
  // equal those of the predictors examined alone (scaleToUnitNorm) to the last bit.
  let mean = 0;
  for (let i = 0; i < n; i++) mean += column[i] / scale;
  mean /= n;
  let sum = 0;
  let correction = 0;
  for (let i = 0; i < n; i++) {
    const d = column[i] / scale - mean;
    sum += d * d;
    correction += d;
  }
  return sum - (correction * correction) / n;
}
