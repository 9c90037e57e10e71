import type { LeastSquaresSolution } from '../fit/leastSquares';
import { applyQ } from '../linalg/householderQr';
import type { CovarianceKind } from '../types';
import { acceptedPositions } from './covariance';

export type RobustKind = Exclude<CovarianceKind, 'classical'>;

export interface RobustCovariance {
  /** q×q, rows in term order; NaN rows and columns for aliased and undefined terms. */
  covariance: number[][];
  standardErrors: number[];
  /** Per term: a row of leverage 1 determines it, so its HC3 variance does not exist. */
  leverageOne: boolean[];
}

/**
 * Heteroscedasticity-consistent ("sandwich") covariance of the estimates:
 *   HC0 = (XᵀX)⁻¹ Xᵀ diag(eᵢ²) X (XᵀX)⁻¹                (White 1980)
 *   HC1 = HC0 · n/(n − p)                                 (p = parameters estimated)
 *   HC3 = (XᵀX)⁻¹ Xᵀ diag(eᵢ²/(1 − hᵢ)²) X (XᵀX)⁻¹       (MacKinnon & White 1985)
 *
 * Computed from the QR of the scaled design, never forming or inverting XᵀX: with X̃ = XS⁻¹ = Q₁R,
 * (XᵀX)⁻¹Xᵀ = S⁻¹R⁻¹Q₁ᵀ, so cov = S⁻¹R⁻¹ (Σᵢ ωᵢ bᵢbᵢᵀ) R⁻ᵀS⁻¹ with bᵢ row i of Q₁, and
 * hᵢ = ‖bᵢ‖² comes out of the same rows.
 *
 * Weights: the formulas apply to the √w-scaled problem (X and eᵢ multiplied by √wᵢ, hᵢ the
 * weighted hat diagonal), the same convention as the residual diagnostics. A known σ plays no part.
 *
 * A row with hᵢ = 1 has eᵢ = 0, so HC3's ωᵢ is 0/0: every term whose estimate depends on that row
 * gets a NaN variance (and is flagged); the other terms do not depend on the row and are exact.
 * HC0 and HC1 give such a row weight 0, as their formulas say.
 */
export function robustCovariance(solution: LeastSquaresSolution, kind: RobustKind): RobustCovariance {
  const { qr, yScale, columnScales, rInverse } = solution;
  const n = qr.rows;
  const rank = qr.accepted.length;
  const q1 = orthonormalColumns(solution);
  const factor = kind === 'HC1' ? n / (n - rank) : 1;

  const meat = new Float64Array(rank * rank);
  const undefinedPositions = new Array<boolean>(rank).fill(false);
  const b = new Float64Array(rank);
  for (let i = 0; i < n; i++) {
    let h = 0;
    for (let k = 0; k < rank; k++) {
      b[k] = q1[k * n + i];
      h += b[k] * b[k];
    }
    const root = solution.design.rootWeights === undefined ? 1 : solution.design.rootWeights[i];
    const u = (root * solution.residuals[i]) / yScale;
    let omega = factor * u * u;
    if (kind === 'HC3') {
      if (1 - h <= LEVERAGE_ONE_TOLERANCE) {
        markDependents(rInverse, rank, b, undefinedPositions);
        continue;
      }
      omega /= (1 - h) ** 2;
    }
    if (omega === 0) continue;
    for (let a = 0; a < rank; a++) {
      const wa = omega * b[a];
      for (let c = 0; c <= a; c++) meat[a * rank + c] += wa * b[c];
    }
  }
  for (let a = 0; a < rank; a++) for (let c = 0; c < a; c++) meat[c * rank + a] = meat[a * rank + c];

  const scaled = sandwich(rInverse, rank, meat);
  const position = acceptedPositions(solution);
  const q = solution.coefficients.length;
  const usable = (j: number): boolean => position[j] >= 0 && !undefinedPositions[position[j]];
  const covariance = Array.from({ length: q }, (_, j) =>
    Array.from({ length: q }, (_, l) =>
      usable(j) && usable(l) ? (yScale / columnScales[j]) * (yScale / columnScales[l]) * scaled[position[j] * rank + position[l]] : Number.NaN,
    ),
  );
  return {
    covariance,
    // The diagonal is a sum of squares, so a negative value can only be rounding of 0.
    standardErrors: covariance.map((row, j) => Math.sqrt(Math.max(0, row[j]))),
    leverageOne: Array.from({ length: q }, (_, j) => position[j] >= 0 && undefinedPositions[position[j]]),
  };
}

/** The same cut-off as the residual diagnostics: below it 1 − hᵢ is rounding of an exact 1. */
const LEVERAGE_ONE_TOLERANCE = 1e-12;

/**
 * Components of R⁻¹bᵢ (the scaled ∂β̂/∂yᵢ) below this fraction of the largest are rounding of an
 * exact zero: a design that isolates a row gives exact zeros for the terms the row does not touch.
 */
const DEPENDENCE_TOLERANCE = 1e-8;

function markDependents(rInverse: Float64Array, rank: number, b: Float64Array, marks: boolean[]): void {
  const d = new Float64Array(rank);
  let largest = 0;
  for (let a = 0; a < rank; a++) {
    for (let k = a; k < rank; k++) d[a] += rInverse[a * rank + k] * b[k];
    largest = Math.max(largest, Math.abs(d[a]));
  }
  for (let a = 0; a < rank; a++) if (Math.abs(d[a]) > DEPENDENCE_TOLERANCE * largest) marks[a] = true;
}

/** R⁻¹ M R⁻ᵀ for upper-triangular R⁻¹ and symmetric M, all row-major rank × rank. */
function sandwich(rInverse: Float64Array, rank: number, meat: Float64Array): Float64Array {
  const left = new Float64Array(rank * rank);
  for (let a = 0; a < rank; a++) {
    for (let c = 0; c < rank; c++) {
      let s = 0;
      for (let k = a; k < rank; k++) s += rInverse[a * rank + k] * meat[k * rank + c];
      left[a * rank + c] = s;
    }
  }
  const result = new Float64Array(rank * rank);
  for (let a = 0; a < rank; a++) {
    for (let c = 0; c <= a; c++) {
      let s = 0;
      for (let k = c; k < rank; k++) s += left[a * rank + k] * rInverse[c * rank + k];
      result[a * rank + c] = s;
      result[c * rank + a] = s;
    }
  }
  return result;
}

/**
 * Q₁ column-major (column k at k·n), each column the stored reflectors applied to a unit vector:
 * orthonormal to rounding however ill-conditioned the design, which X̃R⁻¹ would not be.
 */
function orthonormalColumns(solution: LeastSquaresSolution): Float64Array {
  const { qr } = solution;
  const n = qr.rows;
  const rank = qr.accepted.length;
  const q1 = new Float64Array(n * rank);
  for (let k = 0; k < rank; k++) {
    const column = q1.subarray(k * n, (k + 1) * n);
    column[k] = 1;
    applyQ(qr, column);
  }
  return q1;
}
