import { normalUpperTail } from '../distributions/normal';
import type { LeastSquaresSolution } from '../fit/leastSquares';
import { applyQ } from '../linalg/householderQr';

/**
 * Durbin & Watson, "Testing for serial correlation in least squares regression" I and II
 * (Biometrika 37, 1950; 38, 1951).
 *
 * d = Σ(uᵢ − uᵢ₋₁)²/Σuᵢ² over the rows in the order used (rows skipped for blanks are simply left
 * out), uᵢ = √wᵢ·eᵢ: the residuals of the √w-scaled problem, which are the ones that are
 * independent with equal variance under the model. Under that null d = εᵀMAMε/εᵀMε with
 * M = I − Q₁Q₁ᵀ and A = DᵀD (D the (n−1)×n first-difference matrix), whose exact mean and
 * variance for the design at hand are
 *   E[d] = tr(MA)/(n−p),  Var[d] = 2[tr((MA)²) − tr(MA)·E[d]] / ((n−p)(n−p+2)).
 * The p-values refer (d − E[d])/√Var[d] to the standard normal: an approximation to the exact
 * distribution, but with the design's own moments rather than the bounds of the published tables.
 */
export interface DurbinWatson {
  statistic: number;
  mean: number;
  variance: number;
  /** P(D ≤ d): small when neighbouring residuals move together (H1: ρ > 0). */
  pPositive: number;
  /** P(D ≥ d): small when neighbouring residuals alternate (H1: ρ < 0). */
  pNegative: number;
  /** 2·min of the two, at most 1. */
  pTwoSided: number;
  undefinedBecause: DurbinWatsonReason | undefined;
}

/**
 * - exact-fit: every residual is 0, so d is 0/0.
 * - fixed-by-design: with n = p + 1 the residuals lie on one line, d is the same for every data
 *   set and has no distribution to refer to (Var[d] = 0).
 */
export type DurbinWatsonReason = 'exact-fit' | 'fixed-by-design';

/** Var[d] below this fraction of E[d]² is rounding of an exact 0 (n = p + 1). */
const FIXED_TOLERANCE = 1e-10;

export function durbinWatson(solution: LeastSquaresSolution): DurbinWatson {
  const n = solution.qr.rows;
  const p = solution.qr.accepted.length;
  const { mean, variance } = durbinWatsonMoments(solution);
  const nan = Number.NaN;
  const result: DurbinWatson = { statistic: nan, mean, variance, pPositive: nan, pNegative: nan, pTwoSided: nan, undefinedBecause: undefined };
  if (solution.perfectFit) return { ...result, undefinedBecause: 'exact-fit' };

  // Scaled by yScale so that residuals near 1e±300 neither overflow nor underflow when squared.
  const u = Array.from(solution.residuals, (e, i) => ((solution.design.rootWeights?.[i] ?? 1) * e) / solution.yScale);
  let differences = 0;
  let squares = u[0] * u[0];
  for (let i = 1; i < n; i++) {
    differences += (u[i] - u[i - 1]) ** 2;
    squares += u[i] * u[i];
  }
  result.statistic = differences / squares;
  if (n - p <= 1 || !(variance > FIXED_TOLERANCE * mean * mean)) return { ...result, undefinedBecause: 'fixed-by-design' };

  const z = (result.statistic - mean) / Math.sqrt(variance);
  result.pPositive = normalUpperTail(-z);
  result.pNegative = normalUpperTail(z);
  result.pTwoSided = Math.min(1, 2 * Math.min(result.pPositive, result.pNegative));
  return result;
}

/**
 * The exact null moments without any n×n matrix. With Q₁ the n×p orthonormal basis of the
 * design (from the QR's reflectors), P = Q₁Q₁ᵀ and G = DQ₁:
 *   tr(MA)     = tr(A) − tr(Q₁ᵀAQ₁)                    = 2(n−1) − ‖G‖²_F
 *   tr((MA)²)  = tr(A²) − 2·tr(Q₁ᵀA²Q₁) + tr((Q₁ᵀAQ₁)²) = (6n − 8) − 2‖AQ₁‖²_F + ‖GᵀG‖²_F
 * using M² = M, tr(APA) = tr(PA²) and Q₁ᵀAQ₁ = GᵀG. O(n·p²) time and O(n·p) memory.
 */
export function durbinWatsonMoments(solution: LeastSquaresSolution): { mean: number; variance: number } {
  const { qr } = solution;
  const n = qr.rows;
  const p = qr.accepted.length;
  const differences: Float64Array[] = [];
  let aqSquares = 0;
  let gSquares = 0;
  for (let k = 0; k < p; k++) {
    const q = new Float64Array(n);
    q[k] = 1;
    applyQ(qr, q);
    const g = new Float64Array(n - 1);
    for (let i = 0; i < n - 1; i++) {
      g[i] = q[i + 1] - q[i];
      gSquares += g[i] * g[i];
    }
    // (Aq)ᵢ = (Dᵀg)ᵢ = gᵢ₋₁ − gᵢ, with g₋₁ = gₙ₋₁ = 0.
    for (let i = 0; i < n; i++) aqSquares += ((i > 0 ? g[i - 1] : 0) - (i < n - 1 ? g[i] : 0)) ** 2;
    differences.push(g);
  }
  let bSquares = 0;
  for (let k = 0; k < p; k++) {
    for (let l = k; l < p; l++) {
      let b = 0;
      for (let i = 0; i < n - 1; i++) b += differences[k][i] * differences[l][i];
      bSquares += (k === l ? 1 : 2) * b * b;
    }
  }
  const traceMA = 2 * (n - 1) - gSquares;
  const traceMA2 = 6 * n - 8 - 2 * aqSquares + bSquares;
  const df = n - p;
  const mean = traceMA / df;
  const variance = (2 * (traceMA2 - traceMA * mean)) / (df * (df + 2));
  return { mean, variance };
}
