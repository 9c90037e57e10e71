import type { LeastSquaresSolution } from '../fit/leastSquares';
import { ROW_TILE } from '../linalg/rowTiles';
import { designBasis } from './designBasis';

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
 * design (designBasis.ts, shared with the leverages), P = Q₁Q₁ᵀ and G = DQ₁:
 *   tr(MA)     = tr(A) − tr(Q₁ᵀAQ₁)                    = 2(n−1) − ‖G‖²_F
 *   tr((MA)²)  = tr(A²) − 2·tr(Q₁ᵀA²Q₁) + tr((Q₁ᵀAQ₁)²) = (6n − 8) − 2‖AQ₁‖²_F + ‖GᵀG‖²_F
 * using M² = M, tr(APA) = tr(PA²) and Q₁ᵀAQ₁ = GᵀG. O(n·p²) time; G is formed a tile of rows at a
 * time, so beyond Q₁ the memory is O(p² + p·ROW_TILE). Kept per solution object: the test and
 * CHECKS' expected d read the same moments.
 */
export interface DurbinWatsonMoments {
  mean: number;
  variance: number;
}

const cached = new WeakMap<LeastSquaresSolution, DurbinWatsonMoments>();

export function durbinWatsonMoments(solution: LeastSquaresSolution): DurbinWatsonMoments {
  let moments = cached.get(solution);
  if (moments === undefined) {
    moments = computeMoments(solution);
    cached.set(solution, moments);
  }
  return moments;
}

function computeMoments(solution: LeastSquaresSolution): DurbinWatsonMoments {
  const n = solution.qr.rows;
  const p = solution.qr.accepted.length;
  const q = designBasis(solution);
  // GᵀG, upper triangle row-major; g a tile of G's rows (differences i = from … to − 1), column k at k·ROW_TILE.
  const gram = new Float64Array(p * p);
  const g = new Float64Array(p * ROW_TILE);
  let aqSquares = 0;
  for (let from = 0; from < n - 1; from += ROW_TILE) {
    const to = Math.min(n - 1, from + ROW_TILE);
    const size = to - from;
    for (let k = 0; k < p; k++) {
      const base = k * n;
      const at = k * ROW_TILE;
      for (let i = 0; i < size; i++) g[at + i] = q[base + from + i + 1] - q[base + from + i];
      // (Aq)ᵢ = (Dᵀg)ᵢ = gᵢ₋₁ − gᵢ, with g₋₁ = gₙ₋₁ = 0: rows from … to − 1 here, row n − 1 after the last tile.
      let previous = from > 0 ? q[base + from] - q[base + from - 1] : 0;
      for (let i = 0; i < size; i++) {
        const current = g[at + i];
        aqSquares += (previous - current) ** 2;
        previous = current;
      }
      if (to === n - 1) aqSquares += previous * previous;
    }
    addGram(g, size, p, gram);
  }
  let gSquares = 0;
  let bSquares = 0;
  for (let k = 0; k < p; k++) {
    gSquares += gram[k * p + k];
    for (let l = k; l < p; l++) bSquares += (k === l ? 1 : 2) * gram[k * p + l] ** 2;
  }
  const traceMA = 2 * (n - 1) - gSquares;
  const traceMA2 = 6 * n - 8 - 2 * aqSquares + bSquares;
  const df = n - p;
  const mean = traceMA / df;
  const variance = (2 * (traceMA2 - traceMA * mean)) / (df * (df + 2));
  return { mean, variance };
}

/**
 * gram[k·p + l] += Σᵢ g_k[i]·g_l[i] for l ≥ k (and, in the blocks on the diagonal, one entry below
 * it, which is never read), the columns of g at k·ROW_TILE. Two columns by two per sweep: each
 * entry loaded serves two products.
 */
function addGram(g: Float64Array, size: number, p: number, gram: Float64Array): void {
  for (let k = 0; k < p; k += 2) {
    const k1 = Math.min(k + 1, p - 1);
    const a = k * ROW_TILE;
    const b = k1 * ROW_TILE;
    for (let l = k; l < p; l += 2) {
      const l1 = Math.min(l + 1, p - 1);
      const c = l * ROW_TILE;
      const d = l1 * ROW_TILE;
      let ac = 0;
      let ad = 0;
      let bc = 0;
      let bd = 0;
      for (let i = 0; i < size; i++) {
        const x = g[a + i];
        const y = g[b + i];
        const u = g[c + i];
        const v = g[d + i];
        ac += x * u;
        ad += x * v;
        bc += y * u;
        bd += y * v;
      }
      // At an odd p's last column k1 = k or l1 = l: the duplicate products are not added twice.
      gram[k * p + l] += ac;
      if (l1 > l) gram[k * p + l1] += ad;
      if (k1 > k) {
        gram[k1 * p + l] += bc;
        if (l1 > l) gram[k1 * p + l1] += bd;
      }
    }
  }
}
