import type { LeastSquaresSolution } from '../fit/leastSquares';
import { solveUpperTransposed } from '../linalg/triangular';

/**
 * Where a prediction stands against the rows the model was fitted to.
 *
 * Leverage scale: everything here is x₀ᵀ(XᵀWX)⁻¹x₀ with x₀ unweighted, which says where a row lies
 * in the predictors' space. A fitting row's hat value is hᵢ = wᵢ·xᵢᵀ(XᵀWX)⁻¹xᵢ; its weight says how
 * noisy its response is, not where it lies, so the fitting rows enter the comparison as hᵢ/wᵢ and a
 * new row's own weight never does. Without weights both are the plain hat values.
 */
export interface FittingSpan {
  /** Each column of ModelData.x: the smallest and the largest value among the fitting rows. */
  low: number[];
  high: number[];
  /** The largest xᵢᵀ(XᵀWX)⁻¹xᵢ among the fitting rows (NaN when there are none). */
  largestLeverage: number;
}

export interface ExtrapolationFlags {
  outsideRange: number[];
  hiddenExtrapolation: boolean;
}

/**
 * A row equal to the fitting row of largest leverage computes the same number by the same steps;
 * this margin only keeps rows that differ from it by rounding from being called extrapolation.
 */
const LEVERAGE_TIE_TOLERANCE = 1e-9;

/**
 * x₀ᵀ(XᵀWX)⁻¹x₀ from the factorization: ‖R⁻ᵀ·x₀‖² over the accepted columns, in the QR's
 * unit-norm scaling. `full` holds the model's columns, the intercept's 1 first when there is one.
 * Aliased columns do not enter (their coefficients are not estimated).
 */
export function leverageAt(full: readonly number[], solution: LeastSquaresSolution): number {
  const rank = solution.qr.accepted.length;
  const u = new Float64Array(rank);
  solution.qr.accepted.forEach((col, a) => {
    u[a] = full[col] / solution.columnScales[col];
  });
  solveUpperTransposed(solution.qr.r, rank, u);
  let sum = 0;
  for (const v of u) sum += v * v;
  return sum;
}

/** Which values lie outside their column's range, and whether an inside row is still far off. */
export function extrapolationFlags(row: readonly number[], leverage: number, span: FittingSpan): ExtrapolationFlags {
  const outsideRange: number[] = [];
  row.forEach((v, j) => {
    if (v < span.low[j] || v > span.high[j]) outsideRange.push(j);
  });
  const hiddenExtrapolation = outsideRange.length === 0 && leverage > span.largestLeverage * (1 + LEVERAGE_TIE_TOLERANCE);
  return { outsideRange, hiddenExtrapolation };
}

/** Kept per factorization: the model cache hands the same solution to every prediction of a model. */
const spans = new WeakMap<LeastSquaresSolution, FittingSpan>();

/** The fitting rows' span; x are their predictor columns as fitted (ModelData.x, no intercept). */
export function fittingSpan(x: readonly (readonly number[])[], solution: LeastSquaresSolution): FittingSpan {
  const known = spans.get(solution);
  if (known !== undefined) return known;
  const p = x.length > 0 ? x[0].length : solution.design.matrix.cols - (solution.design.hasIntercept ? 1 : 0);
  const low = new Array<number>(p).fill(Number.POSITIVE_INFINITY);
  const high = new Array<number>(p).fill(Number.NEGATIVE_INFINITY);
  let largestLeverage = Number.NaN;
  for (const row of x) {
    row.forEach((v, j) => {
      if (v < low[j]) low[j] = v;
      if (v > high[j]) high[j] = v;
    });
    const leverage = leverageAt(solution.design.hasIntercept ? [1, ...row] : row, solution);
    if (Number.isNaN(largestLeverage) || leverage > largestLeverage) largestLeverage = leverage;
  }
  const span = { low, high, largestLeverage };
  spans.set(solution, span);
  return span;
}
