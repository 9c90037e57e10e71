import { predictorValues } from '../cache/packedPredictors';
import { frobeniusCondition, type LeastSquaresSolution } from '../fit/leastSquares';
import { solveUpperTransposed } from '../linalg/triangular';
import type { ModelData } from '../types';
import { leverages } from './leverages';

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
  return leverageOfRow((col) => full[col], solution, new Float64Array(solution.qr.accepted.length));
}

/** leverageAt with the model's column `col` read through `valueAt`, into the caller's work array of length rank. */
function leverageOfRow(valueAt: (col: number) => number, solution: LeastSquaresSolution, u: Float64Array): number {
  const { accepted, r } = solution.qr;
  const rank = accepted.length;
  for (let a = 0; a < rank; a++) u[a] = valueAt(accepted[a]) / solution.columnScales[accepted[a]];
  solveUpperTransposed(r, rank, u);
  let sum = 0;
  for (let a = 0; a < rank; a++) sum += u[a] * u[a];
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

/** The fitting rows' span: `data` is what `solution` was fitted to (its predictors as given, no intercept). */
export function fittingSpan(data: ModelData, solution: LeastSquaresSolution): FittingSpan {
  const known = spans.get(solution);
  if (known !== undefined) return known;
  const packed = predictorValues(data);
  const p = packed.rows > 0 ? packed.p : solution.design.matrix.cols - (solution.design.hasIntercept ? 1 : 0);
  const low = new Array<number>(p);
  const high = new Array<number>(p);
  const { values } = packed;
  const end = packed.rows * p;
  for (let j = 0; j < p; j++) {
    let smallest = Number.POSITIVE_INFINITY;
    let largest = Number.NEGATIVE_INFINITY;
    for (let at = j; at < end; at += p) {
      const v = values[at];
      if (v < smallest) smallest = v;
      if (v > largest) largest = v;
    }
    low[j] = smallest;
    high[j] = largest;
  }
  const span = { low, high, largestLeverage: largestFittingLeverage(values, p, solution) };
  spans.set(solution, span);
  return span;
}

/**
 * The largest leverageAt over the fitting rows, found from the hat diagonal the residual diagnostics
 * share (hᵢ/wᵢ is xᵢᵀ(XᵀWX)⁻¹xᵢ) instead of a triangular solve per row. The two routes differ by
 * rounding, so the rows within `tieWindow` of the largest hᵢ/wᵢ are solved by leverageAt itself
 * and the largest of those is taken: the same number the solve over every row gives, so a new row
 * equal to a fitting row computes exactly the leverage that row contributed, and never exceeds it.
 */
function largestFittingLeverage(values: Float64Array, p: number, solution: LeastSquaresSolution): number {
  const h = leverages(solution);
  const roots = solution.design.rootWeights;
  const n = h.length;
  const onPredictorScale = roots === undefined ? h : Float64Array.from(h, (v, i) => v / (roots[i] * roots[i]));
  let largestHat = Number.NaN;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(largestHat) || onPredictorScale[i] > largestHat) largestHat = onPredictorScale[i];
  }
  const threshold = largestHat * (1 - tieWindow(solution));
  const offset = solution.design.hasIntercept ? 1 : 0;
  const u = new Float64Array(solution.qr.accepted.length);
  let largest = Number.NaN;
  for (let i = 0; i < n; i++) {
    if (!(onPredictorScale[i] >= threshold)) continue;
    const at = i * p - offset;
    const leverage = leverageOfRow((col) => (col < offset ? 1 : values[at + col]), solution, u);
    if (Number.isNaN(largest) || leverage > largest) largest = leverage;
  }
  return largest;
}

/** Far above what rounding parts the two routes by on a well-conditioned design (about 1e-13), so every near-tie is re-solved. */
const TIE_WINDOW_FLOOR = 1e-6;
const UNIT_ROUNDOFF = 2 ** -53;

/**
 * How far hᵢ/wᵢ and leverageAt may differ for one row, relative: both are exact for a design within
 * rounding of X, so each moves by about κ·u times a modest factor of the size (Higham, Accuracy and
 * Stability of Numerical Algorithms, ch. 8 and 19: triangular solves and Householder QR), bounded
 * here generously by n·rank·κ·u. On an ill-conditioned design the window grows until every row is re-solved.
 */
function tieWindow(solution: LeastSquaresSolution): number {
  const rank = solution.qr.accepted.length;
  const condition = frobeniusCondition(solution.qr.r, solution.rInverse, rank);
  return Math.max(TIE_WINDOW_FLOOR, 2 * solution.qr.rows * rank * condition * UNIT_ROUNDOFF);
}
