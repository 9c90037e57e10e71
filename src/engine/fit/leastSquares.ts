import { type ColumnMajorMatrix, columnView, stableNorm } from '../linalg/columnMajor';
import { factorInPlace, type QrFactorization } from '../linalg/householderQr';
import { subtractProduct } from '../linalg/rowTiles';
import { invertUpper, solveUpper } from '../linalg/triangular';
import { type ExtendedColumn, recognisePowers } from '../precise/exactPowers';
import { extendedResidual } from '../precise/extendedResidual';
import { preciseLeastSquares } from '../precise/preciseQr';
import type { WeightedDesign } from './design';
import { refineSolution } from './refinement';

/**
 * A column whose part orthogonal to the earlier columns is below this fraction of its own norm
 * is treated as a combination of them. It sits far below what ill-conditioned but genuine
 * designs reach (NIST Filip's x¹⁰ column keeps 5e-8 of its norm after unit scaling) and above
 * the rounding noise of an exact combination, which grows like √n·ε with the number of rows.
 */
export function aliasTolerance(rows: number): number {
  return 1e-13 * Math.max(1, Math.sqrt(rows / 100));
}

/**
 * Residuals no larger than this fraction of ‖y‖ are indistinguishable from the rounding of the
 * data themselves; the fit is then exact and σ̂ is reported as 0 rather than as noise.
 */
export const PERFECT_FIT_TOLERANCE = 1e-14;

/**
 * Least squares of the weighted design by Householder QR of its unit-norm-scaled columns.
 * Everything is kept in scaled units (columns divided by `columnScales`, y by `yScale`) so that
 * data near 1e±300 neither overflow nor underflow; callers convert back at the last step.
 */
export interface LeastSquaresSolution {
  design: WeightedDesign;
  qr: QrFactorization;
  columnScales: Float64Array;
  yScale: number;
  /** Coefficients in the data's units; NaN for aliased columns. */
  coefficients: Float64Array;
  /** R⁻¹ of the scaled, accepted columns (row-major rank × rank). */
  rInverse: Float64Array;
  /**
   * (Qᵀy)/yScale over the accepted columns, from the double factorization: the base model of a
   * nested test over leading columns reads its extra sum of squares off it (compareNested.ts).
   */
  acceptedQty: Float64Array;
  /** RSS / yScale². */
  scaledRss: number;
  perfectFit: boolean;
  /** Unweighted y − ŷ and ŷ, in the data's units. */
  residuals: Float64Array;
  fitted: Float64Array;
}

/**
 * Above this estimate of κ(R) double precision may lose more than three of its 16 digits in the
 * coefficients (forward error ≈ κ·u, Björck 1996 §2.4), and the estimates are recomputed in
 * double-double (see precise/preciseQr.ts). Below it, iterative refinement (fit/refinement.ts)
 * is tried first where the check fires; it hands over to double-double when it cannot converge.
 */
export const PRECISE_CONDITION_THRESHOLD = 1e3;

/**
 * The relative error allowed in σ̂ before refinement (or, failing it, double-double) takes over: RSS comes from
 * Qᵀy, whose entries carry absolute errors near κ·u·‖y‖, so ‖r‖ is good to about κ·u·‖y‖/‖r‖.
 * That is large when the residuals are tiny beside y (a large level with little noise, NIST's
 * Norris and Pontius), and the coefficients that carry such a level lose as many digits.
 */
export const RESIDUAL_ACCURACY_TARGET = 1e-13;

const UNIT_ROUNDOFF = 2 ** -53;

/** Whether double precision may fall short of 13 digits in the coefficients or σ̂. */
export function needsExtendedPrecision(condition: number, scaledResidualNorm: number): boolean {
  if (condition > PRECISE_CONDITION_THRESHOLD) return true;
  // An exact fit has σ̂ = 0 and standard errors of 0, so its coefficients are read as exact: they
  // are refined to the last digit (a constant y must give its level exactly and a slope of 0).
  if (scaledResidualNorm <= PERFECT_FIT_TOLERANCE) return true;
  return UNIT_ROUNDOFF * condition > RESIDUAL_ACCURACY_TARGET * scaledResidualNorm;
}

/** 'double' skips the check, refinement and the double-double path, for measuring what they cost. */
export type Precision = 'auto' | 'double';

/**
 * ‖R‖_F·‖R⁻¹‖_F, within a factor rank of κ₂. R⁻¹ is needed for the covariance anyway, so the
 * check costs O(rank²) on top of the O(n·rank²) factorization. The diagonal ratio alone is not
 * enough: for Wampler's quintic it is 234 while κ₂ exceeds 1e6.
 */
export function frobeniusCondition(r: Float64Array, rInverse: Float64Array, rank: number): number {
  let a = 0;
  let b = 0;
  for (let i = 0; i < rank * rank; i++) {
    a += r[i] * r[i];
    b += rInverse[i] * rInverse[i];
  }
  return Math.sqrt(a) * Math.sqrt(b);
}

export function solveLeastSquares(design: WeightedDesign, precision: Precision = 'auto'): LeastSquaresSolution {
  const { matrix, y } = design;
  const n = matrix.rows;
  const columnScales = new Float64Array(matrix.cols);
  // The scaled copy, with y/yScale carried as a last column, is the factorization's working
  // storage and then holds its reflectors; the carried column comes out as Qᵀy/yScale.
  const q = matrix.cols;
  const scaled: ColumnMajorMatrix = { rows: n, cols: q + 1, data: new Float64Array(n * (q + 1)) };
  const squares = design.columnSquares;
  for (let j = 0; j < q; j++) {
    const col = columnView(matrix, j);
    const s = squares === undefined ? columnNorm(col) : normFromSquares(squares[j], col);
    columnScales[j] = s > 0 ? s : 1;
    const target = columnView(scaled, j);
    const scale = columnScales[j];
    for (let i = 0; i < n; i++) target[i] = col[i] / scale;
  }
  const yNorm = columnNorm(y);
  const yScale = yNorm > 0 ? yNorm : 1;
  const qty = columnView(scaled, q);
  for (let i = 0; i < n; i++) qty[i] = y[i] / yScale;

  const qr = factorInPlace(scaled, aliasTolerance(n), 1);
  const rank = qr.accepted.length;

  const acceptedQty = qty.slice(0, rank);
  const solution = acceptedQty.slice();
  solveUpper(qr.r, rank, solution);
  let accepted: Float64Array = Float64Array.from(qr.accepted, (col, a) => (solution[a] * yScale) / columnScales[col]);

  let scaledRss = 0;
  for (let i = rank; i < n; i++) scaledRss += qty[i] * qty[i];
  let r = qr.r;
  let rInverse = invertUpper(qr.r, rank);
  // √w(y − Xb)/residualUnit, when the refinement has formed it already (in yScale units).
  let weightedResidual: Float64Array | undefined;
  let residualUnit = 1;
  let extended = false;
  const condition = frobeniusCondition(qr.r, rInverse, rank);
  if (precision === 'auto' && needsExtendedPrecision(condition, Math.sqrt(scaledRss))) {
    const refined = condition <= PRECISE_CONDITION_THRESHOLD ? refineSolution(design, qr.accepted, qr.r, columnScales, yScale, accepted) : undefined;
    if (refined !== undefined) {
      accepted = refined.coefficients;
      scaledRss = refined.scaledRss;
      weightedResidual = refined.scaledResidual;
      residualUnit = yScale;
    } else {
      // The double QR's reflectors stay in use for diagnostics: they are accurate to double
      // precision in what they produce (Qᵀ applied to vectors), unlike the solve.
      const precise = preciseLeastSquares(
        extendedColumns(design, qr.accepted),
        qr.accepted.map((col) => columnScales[col]),
        y,
        yScale,
      );
      accepted = precise.coefficients;
      r = precise.r;
      rInverse = precise.rInverse;
      scaledRss = precise.scaledRss;
      extended = true;
    }
  }
  const perfectFit = Math.sqrt(scaledRss) <= PERFECT_FIT_TOLERANCE;
  const coefficients = new Float64Array(matrix.cols).fill(Number.NaN);
  qr.accepted.forEach((col, a) => {
    // In an exact fit every standard error is 0, so a coefficient that moves the fit by less than
    // the rounding the fit is judged exact by is 0, not a tiny number read as "clear of zero".
    const negligible = perfectFit && Math.abs(accepted[a]) * columnScales[col] <= PERFECT_FIT_TOLERANCE * yScale;
    coefficients[col] = negligible ? 0 : accepted[a];
  });
  if (perfectFit) scaledRss = 0;

  // The weighted residual is this solve's own array, so it becomes the residuals in place.
  const residuals = perfectFit ? new Float64Array(n) : (weightedResidual ?? directResidual(design, qr.accepted, accepted, extended));
  if (!perfectFit) {
    const roots = design.rootWeights;
    if (roots !== undefined) for (let i = 0; i < n; i++) residuals[i] = (residuals[i] * residualUnit) / roots[i];
    else if (residualUnit !== 1) for (let i = 0; i < n; i++) residuals[i] *= residualUnit;
  }
  const fitted = new Float64Array(n);
  for (let i = 0; i < n; i++) fitted[i] = design.response[i] - residuals[i];

  return {
    design,
    qr: r === qr.r ? qr : { ...qr, r },
    columnScales,
    yScale,
    coefficients,
    rInverse,
    acceptedQty,
    scaledRss,
    perfectFit,
    residuals,
    fitted,
  };
}

/**
 * ‖x‖ by the plain sum of squares where that is safe (one pass), by stableNorm where squares
 * could overflow or underflow (data beyond about 1e±140).
 */
function columnNorm(x: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < x.length; i++) sum += x[i] * x[i];
  return normFromSquares(sum, x);
}

/** ‖x‖ from x's sum of squares taken in row order, as columnNorm takes it. */
function normFromSquares(sum: number, x: Float64Array): number {
  return sum > 1e-280 && sum < 1e280 ? Math.sqrt(sum) : stableNorm(x);
}

/**
 * The accepted columns for the double-double solve: those of an unweighted design that are
 * powers of another column are taken as the exact powers (see exactPowers.ts). A weighted
 * design's columns already carry the rounding of √w, so they are used as they stand.
 */
function extendedColumns(design: WeightedDesign, accepted: readonly number[]): (Float64Array | ExtendedColumn)[] {
  const columns = accepted.map((col) => columnView(design.matrix, col));
  if (design.rootWeights !== undefined) return columns;
  const powers = recognisePowers(columns);
  return columns.map((column, a) => powers[a] ?? column);
}

/**
 * √w(y − X·b) formed row by row, in double-double after a double-double solve (so the
 * residuals keep the solve's accuracy) and in double otherwise. Forming it directly keeps every
 * row as accurate as the others: Q·(0, Qᵀy tail) left the first `rank` rows, where each
 * reflector's leading entry meets the column's whole norm, off by 5e-10 against 6e-13 elsewhere
 * on a million rows.
 */
function directResidual(design: WeightedDesign, accepted: readonly number[], coefficients: Float64Array, extended: boolean): Float64Array {
  if (extended) {
    const residual = new Float64Array(design.matrix.rows);
    extendedResidual(design.matrix, accepted, coefficients, design.y, 1, residual);
    return residual;
  }
  const residual = Float64Array.from(design.y);
  subtractProduct(design.matrix, accepted, coefficients, residual);
  return residual;
}
