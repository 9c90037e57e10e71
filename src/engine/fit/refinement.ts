import { subtractProduct } from '../linalg/rowTiles';
import { solveUpper, solveUpperTransposed } from '../linalg/triangular';
import { extendedResidual } from '../precise/extendedResidual';
import type { WeightedDesign } from './design';

/**
 * Mixed-precision iterative refinement of a double-precision least-squares solution (Björck 1967,
 * "Iterative refinement of linear least squares solutions I", BIT 7; Higham, Accuracy and
 * Stability of Numerical Algorithms, 2nd ed., ch. 20).
 *
 * Why refining b alone is enough here. Householder QR in double gives the exact solution of a
 * problem perturbed by about u in A and y (Björck 1996, §2.4), so b is off by about
 * u·κ·‖y‖/‖A‖ + u·κ²·‖r‖/‖A‖². When the residuals are tiny beside y (a large level with little
 * noise, R² near 1) the first term dominates: the coefficients carrying the level, and σ̂, which
 * comes from Qᵀy's tail, lose digits though κ is small. Each step here forms r = y − Xb with its
 * cancellation done in double-double (precise/extendedResidual.ts) and solves the correction
 * δ = argmin‖r − Xδ‖ through the R factor already at hand, by the seminormal equations
 * RᵀRδ = Xᵀr (Björck's corrected seminormal equations, "Stability analysis of the method of
 * seminormal equations", Linear Algebra Appl. 88/89, 1987). Because r is accurate, the step
 * removes the u·κ·‖y‖ term: the error contracts by about u·κ² per step, and what remains is the
 * u·κ²·‖r‖ term, small exactly in the small-residual case this is used for. σ̂ then comes from the
 * accurate r itself, whose sum of squares is off only to second order in b's remaining error.
 *
 * After the first step the residual is updated rather than recomputed, r ← r − Xδ in double:
 * δ is already small, so this adds errors of order u·|Xδ|, far below u·|r|. A last update brings
 * r to the coefficients as finally rounded, so that the residuals are those of the reported b.
 *
 * Refinement stops when every step component is below REFINED_TOLERANCE of its coefficient; it
 * gives up (undefined) when a step fails to halve the one before, i.e. it has met its own limiting
 * accuracy above the tolerance (the κ²·‖r‖ term of an ill-conditioned design) or does not
 * converge; the caller then solves in double-double throughout.
 */
export interface RefinedSolution {
  /** Coefficients of the accepted columns, in data units. */
  coefficients: Float64Array;
  /** √w(y − Xb)/yScale for the refined b, each row accurate to a few ulps of itself. */
  scaledResidual: Float64Array;
  scaledRss: number;
}

/** A step this small beside its coefficient leaves 14 or more correct digits. */
export const REFINED_TOLERANCE = 2 ** -47;
const MAX_STEPS = 6;
const UNIT_ROUNDOFF = 2 ** -53;
/** Magnitudes kept far from overflow in Veltkamp's split (2⁹⁹⁶) and from the underflow of error terms. */
const SAFE_MAGNITUDE = 2 ** 400;

export function refineSolution(
  design: WeightedDesign,
  accepted: readonly number[],
  r: Float64Array,
  columnScales: Float64Array,
  yScale: number,
  start: Float64Array,
): RefinedSolution | undefined {
  const rank = accepted.length;
  const scales = Float64Array.from(accepted, (col) => columnScales[col]);
  if (!inSafeRange(yScale)) return undefined;
  for (let a = 0; a < rank; a++) {
    if (!inSafeRange(scales[a]) || !(Math.abs(start[a]) * scales[a] <= SAFE_MAGNITUDE)) return undefined;
  }
  const n = design.matrix.rows;
  const residual = new Float64Array(n);
  const gradient = new Float64Array(rank);
  extendedResidual(design.matrix, accepted, start, design.y, yScale, residual, gradient);

  const coefficients = Float64Array.from(start);
  const corrections = new Float64Array(rank);
  // Σ of the steps the residual reflects, in its units (the columns' over yScale).
  const applied = new Float64Array(rank);
  const step = new Float64Array(rank);
  let previousSize = Number.POSITIVE_INFINITY;
  for (let iteration = 0; iteration < MAX_STEPS; iteration++) {
    // Xᵀr in the scaled columns' units, then δ = R⁻¹R⁻ᵀ(Xᵀr), back to the columns' units (r is in yScale units).
    for (let a = 0; a < rank; a++) step[a] = gradient[a] / scales[a];
    solveUpperTransposed(r, rank, step);
    solveUpper(r, rank, step);
    let size = 0;
    for (let a = 0; a < rank; a++) {
      step[a] /= scales[a];
      const change = Math.abs(step[a] * yScale);
      // A coefficient that is 0 to double-double accuracy (u² of y's scale) needs no more digits.
      const allowed = REFINED_TOLERANCE * Math.abs(start[a] + corrections[a]) + (UNIT_ROUNDOFF * UNIT_ROUNDOFF * yScale) / scales[a];
      size = Math.max(size, change / allowed);
    }
    for (let a = 0; a < rank; a++) corrections[a] += step[a] * yScale;
    if (size <= 1) {
      // The residual is brought to the coefficients as rounded, so that it is exactly theirs:
      // coefficient − start is exact (the two are within a factor of 2), the rest is tiny.
      for (let a = 0; a < rank; a++) {
        coefficients[a] = start[a] + corrections[a];
        step[a] = (coefficients[a] - start[a]) / yScale - applied[a];
      }
      subtractProduct(design.matrix, accepted, step, residual);
      return { coefficients, scaledResidual: residual, scaledRss: sumOfSquares(residual) };
    }
    if (!(size <= 0.5 * previousSize)) return undefined;
    previousSize = size;
    subtractProduct(design.matrix, accepted, step, residual, gradient);
    for (let a = 0; a < rank; a++) applied[a] += step[a];
  }
  return undefined;
}

function inSafeRange(scale: number): boolean {
  return scale >= 1 / SAFE_MAGNITUDE && scale <= SAFE_MAGNITUDE;
}

/** Σr² with Neumaier's compensation, so that a million rows add no more than a rounding or two. */
function sumOfSquares(v: Float64Array): number {
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < v.length; i++) {
    const term = v[i] * v[i];
    const t = sum + term;
    compensation += Math.abs(sum) >= term ? sum - t + term : term - t + sum;
    sum = t;
  }
  return sum + compensation;
}
