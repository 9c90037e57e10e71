import { type ColumnMajorMatrix, columnView, stableNorm } from '../linalg/columnMajor';
import { applyQ, applyQTranspose, householderQr, type QrFactorization } from '../linalg/householderQr';
import { invertUpper, solveUpper } from '../linalg/triangular';
import { type ExtendedColumn, recognisePowers } from '../precise/exactPowers';
import { preciseLeastSquares } from '../precise/preciseQr';
import type { WeightedDesign } from './design';

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
 * double-double (see precise/preciseQr.ts).
 */
export const PRECISE_CONDITION_THRESHOLD = 1e3;

/**
 * The relative error allowed in σ̂ before the double-double path takes over: RSS comes from
 * Qᵀy, whose entries carry absolute errors near κ·u·‖y‖, so ‖r‖ is good to about κ·u·‖y‖/‖r‖.
 * That is large when the residuals are tiny beside y (a large level with little noise, NIST's
 * Norris and Pontius), and the coefficients that carry such a level lose as many digits.
 */
export const RESIDUAL_ACCURACY_TARGET = 1e-13;

const UNIT_ROUNDOFF = 2 ** -53;

/** Whether double precision may fall short of 13 digits in the coefficients or σ̂. */
export function needsExtendedPrecision(condition: number, scaledResidualNorm: number): boolean {
  if (condition > PRECISE_CONDITION_THRESHOLD) return true;
  // An exact fit reports σ̂ = 0: there is no relative accuracy of σ̂ to protect.
  if (scaledResidualNorm <= PERFECT_FIT_TOLERANCE) return false;
  return UNIT_ROUNDOFF * condition > RESIDUAL_ACCURACY_TARGET * scaledResidualNorm;
}

/** 'double' skips the check and the extended-precision path, for measuring what they cost. */
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
  const scaled: ColumnMajorMatrix = { rows: n, cols: matrix.cols, data: new Float64Array(matrix.data.length) };
  for (let j = 0; j < matrix.cols; j++) {
    const col = columnView(matrix, j);
    const s = stableNorm(col);
    columnScales[j] = s > 0 ? s : 1;
    const target = columnView(scaled, j);
    for (let i = 0; i < n; i++) target[i] = col[i] / columnScales[j];
  }
  const yNorm = stableNorm(y);
  const yScale = yNorm > 0 ? yNorm : 1;

  const qr = householderQr(scaled, aliasTolerance(n));
  const rank = qr.accepted.length;
  const qty = Float64Array.from(y, (v) => v / yScale);
  applyQTranspose(qr, qty);

  const solution = qty.slice(0, rank);
  solveUpper(qr.r, rank, solution);
  const coefficients = new Float64Array(matrix.cols).fill(Number.NaN);
  qr.accepted.forEach((col, a) => {
    coefficients[col] = (solution[a] * yScale) / columnScales[col];
  });

  let scaledRss = 0;
  for (let i = rank; i < n; i++) scaledRss += qty[i] * qty[i];
  let r = qr.r;
  let rInverse = invertUpper(qr.r, rank);
  if (precision === 'auto' && needsExtendedPrecision(frobeniusCondition(qr.r, rInverse, rank), Math.sqrt(scaledRss))) {
    // The double QR's reflectors stay in use for residuals and diagnostics: they are accurate
    // to double precision in what they produce (Qᵀ applied to vectors), unlike the solve.
    const precise = preciseLeastSquares(
      extendedColumns(design, qr.accepted),
      qr.accepted.map((col) => columnScales[col]),
      y,
      yScale,
    );
    qr.accepted.forEach((col, a) => {
      coefficients[col] = precise.coefficients[a];
    });
    r = precise.r;
    rInverse = precise.rInverse;
    scaledRss = precise.scaledRss;
  }
  const perfectFit = Math.sqrt(scaledRss) <= PERFECT_FIT_TOLERANCE;
  if (perfectFit) scaledRss = 0;

  const residualPart = new Float64Array(n);
  if (!perfectFit) for (let i = rank; i < n; i++) residualPart[i] = qty[i];
  applyQ(qr, residualPart);
  const residuals = new Float64Array(n);
  const fitted = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const w = design.rootWeights === undefined ? 1 : design.rootWeights[i];
    residuals[i] = (residualPart[i] * yScale) / w;
    fitted[i] = design.response[i] - residuals[i];
  }
  if (!perfectFit) recomputeLeadingResiduals(design, qr.accepted, coefficients, residuals, fitted);

  return {
    design,
    qr: r === qr.r ? qr : { ...qr, r },
    columnScales,
    yScale,
    coefficients,
    rInverse,
    scaledRss,
    perfectFit,
    residuals,
    fitted,
  };
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
 * Q·(0, Qᵀy tail) gives residuals accurate to about u·‖y‖ absolute in every row but the first
 * `rank`, where each reflector's leading entry meets the column's whole norm: on a million rows
 * those residuals were off by 5e-10 against 6e-13 elsewhere. They are formed directly instead,
 * y − x·b, whose error does not grow with the number of rows.
 */
function recomputeLeadingResiduals(
  design: WeightedDesign,
  accepted: readonly number[],
  coefficients: Float64Array,
  residuals: Float64Array,
  fitted: Float64Array,
): void {
  const { matrix, y } = design;
  const n = matrix.rows;
  for (let i = 0; i < Math.min(accepted.length, n); i++) {
    let prediction = 0;
    for (const col of accepted) prediction += matrix.data[col * n + i] * coefficients[col];
    const w = design.rootWeights === undefined ? 1 : design.rootWeights[i];
    residuals[i] = (y[i] - prediction) / w;
    fitted[i] = design.response[i] - residuals[i];
  }
}
