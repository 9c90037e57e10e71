import type { LeastSquaresSolution } from '../fit/leastSquares';
import { applyQ } from '../linalg/householderQr';

/**
 * The exact null mean and variance of the Durbin–Watson d (Durbin & Watson, "Testing for serial
 * correlation in least squares regression" I and II, Biometrika 37, 1950; 38, 1951) for the design
 * at hand: CHECKS' expected d, and the two moments the beta approximation of durbinWatsonExact.ts
 * matches beyond its exact range.
 *
 * Under the null d = εᵀMAMε/εᵀMε with M = I − Q₁Q₁ᵀ and A = DᵀD (D the (n−1)×n first-difference
 * matrix), on the √w-scaled problem, and
 *   E[d] = tr(MA)/(n−p),  Var[d] = 2[tr((MA)²) − tr(MA)·E[d]] / ((n−p)(n−p+2)).
 *
 * Both without any n×n matrix. With Q₁ the n×p orthonormal basis of the
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
