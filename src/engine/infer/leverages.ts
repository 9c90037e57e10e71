import type { LeastSquaresSolution } from '../fit/leastSquares';
import { designBasis } from './designBasis';

/**
 * The hat diagonal hᵢ of the (√w-weighted) design, hᵢ = ‖row i of Q₁‖² (Q₁ from designBasis.ts):
 * O(n·p) beyond Q₁, never the n × n hat matrix. Σhᵢ = rank. Kept per solution object, so CHECKS,
 * RESIDUALS, QQPOINTS and PREDICT's extrapolation screen share one computation per fit; callers
 * must not write into the array returned.
 */
const cached = new WeakMap<LeastSquaresSolution, Float64Array>();

export function leverages(solution: LeastSquaresSolution): Float64Array {
  let h = cached.get(solution);
  if (h === undefined) {
    h = hatDiagonal(solution);
    cached.set(solution, h);
  }
  return h;
}

function hatDiagonal(solution: LeastSquaresSolution): Float64Array {
  const n = solution.qr.rows;
  const p = solution.qr.accepted.length;
  const basis = designBasis(solution);
  const h = new Float64Array(n);
  for (let k = 0; k < p; k++) {
    const base = k * n;
    for (let i = 0; i < n; i++) h[i] += basis[base + i] * basis[base + i];
  }
  return h;
}
