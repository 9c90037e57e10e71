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
    for (let k = 0; k < p; k++) aqSquares += differenceTile(q, k * n, from, to, n, g, k * ROW_TILE);
    addGram(g, to - from, p, gram);
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
 * Differences from … to − 1 of the basis column at base into g from `at` (gᵢ = qᵢ₊₁ − qᵢ), and
 * their part of ‖Aq‖²: (Aq)ᵢ = (Dᵀg)ᵢ = gᵢ₋₁ − gᵢ with g₋₁ = gₙ₋₁ = 0, rows from … to − 1 here
 * and row n − 1 with the last tile.
 */
function differenceTile(q: Float64Array, base: number, from: number, to: number, n: number, g: Float64Array, at: number): number {
  let previous = from > 0 ? q[base + from] - q[base + from - 1] : 0;
  let squares = 0;
  for (let i = from; i < to; i++) {
    const current = q[base + i + 1] - q[base + i];
    g[at + i - from] = current;
    const a = previous - current;
    squares += a * a;
    previous = current;
  }
  if (to === n - 1) squares += previous * previous;
  return squares;
}

/**
 * gram[k·p + l] += Σᵢ g_k[i]·g_l[i] for l ≥ k (and, in the blocks on the diagonal, entries below
 * it, which are never read), the columns of g at k·ROW_TILE. Two columns by four per sweep: the
 * six entries loaded serve eight products, and the eight sums stay in registers.
 */
function addGram(g: Float64Array, size: number, p: number, gram: Float64Array): void {
  const last = p - 1;
  for (let k = 0; k < p; k += 2) {
    // Past the last column an index is held at the last one, and its duplicate sums are not added.
    const k1 = Math.min(k + 1, last);
    const a = k * ROW_TILE;
    const b = k1 * ROW_TILE;
    for (let l = k; l < p; l += 4) {
      const l1 = Math.min(l + 1, last);
      const l2 = Math.min(l + 2, last);
      const l3 = Math.min(l + 3, last);
      const c0 = l * ROW_TILE;
      const c1 = l1 * ROW_TILE;
      const c2 = l2 * ROW_TILE;
      const c3 = l3 * ROW_TILE;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      let t0 = 0;
      let t1 = 0;
      let t2 = 0;
      let t3 = 0;
      for (let i = 0; i < size; i++) {
        const x = g[a + i];
        const y = g[b + i];
        const u0 = g[c0 + i];
        const u1 = g[c1 + i];
        const u2 = g[c2 + i];
        const u3 = g[c3 + i];
        s0 += x * u0;
        s1 += x * u1;
        s2 += x * u2;
        s3 += x * u3;
        t0 += y * u0;
        t1 += y * u1;
        t2 += y * u2;
        t3 += y * u3;
      }
      addRow(gram, k * p, l, l1, l2, l3, s0, s1, s2, s3);
      if (k1 > k) addRow(gram, k1 * p, l, l1, l2, l3, t0, t1, t2, t3);
    }
  }
}

/** gram[row + l…l3] += the four sums, each column once (l1 … l3 repeat l's last column past p). */
function addRow(gram: Float64Array, row: number, l: number, l1: number, l2: number, l3: number, s0: number, s1: number, s2: number, s3: number): void {
  gram[row + l] += s0;
  if (l1 > l) gram[row + l1] += s1;
  if (l2 > l1) gram[row + l2] += s2;
  if (l3 > l2) gram[row + l3] += s3;
}
