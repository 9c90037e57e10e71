import { frobeniusCondition, type LeastSquaresSolution, PRECISE_CONDITION_THRESHOLD } from '../fit/leastSquares';
import { ROW_TILE } from '../linalg/rowTiles';

/**
 * Q₁, the first `rank` columns of the QR's Q: an n × rank orthonormal basis of the (√w-weighted)
 * design's column space, column-major (entry (i, k) at k·n + i), orthonormal to rounding.
 *
 * A well-conditioned fit (κ(R) estimate ≤ PRECISE_CONDITION_THRESHOLD, the bound below which the
 * fit itself trusts double precision) takes Q₁ = X_s·R⁻¹, X_s the accepted scaled columns. Its
 * loss of orthonormality, ‖Q₁ᵀQ₁ − I‖, grows like κ·u (common practice (no source); the tests
 * measure it on both sides of the bound), so about 1e3·u at most here, and the triangular multiply
 * is half the flops of accumulating the reflectors and streams the design's rows. Above the bound
 * Q₁ is formed from the reflectors, orthonormal however ill-conditioned the design.
 *
 * From the reflectors Q₁ is formed by backward accumulation, as LAPACK's dorgqr does: Q₁ = H₁⋯H_p·[I; 0],
 * the last reflectors applied first. Reflectors below k are zero above row k, so a block of them
 * starting at k leaves the columns before k (still unit vectors) alone and touches rows k … n − 1
 * only: about n·p² multiply-adds in all. The reflectors are applied BLOCK at a time in compact WY
 * form, H_k⋯H_{k+s−1} = I − V·T·Vᵀ (Schreiber & Van Loan 1989; LAPACK's dlarft, forward), so each
 * column is swept twice per block rather than twice per reflector.
 *
 * The last solution's basis is kept, so the leverages, the Durbin–Watson moments (each kept per
 * solution by its own module) and the Breusch–Pagan projection of one fit form it once between
 * them; only one is kept, as it is as large as the design, and it holds that one solution until the
 * next basis is formed. Callers must not write into the array returned.
 */
let last: { solution: LeastSquaresSolution; basis: Float64Array } | undefined;

export function designBasis(solution: LeastSquaresSolution): Float64Array {
  if (last?.solution !== solution) last = { solution, basis: formBasis(solution) };
  return last.basis;
}

/** Lets go of the kept basis (see resetCaches.ts). */
export function resetDesignBasis(): void {
  last = undefined;
}

/** Which way designBasis forms Q₁ for this solution (see designBasis); exported for its tests. */
export function basisByTriangle(solution: LeastSquaresSolution): boolean {
  const rank = solution.qr.accepted.length;
  return rank > 0 && frobeniusCondition(solution.qr.r, solution.rInverse, rank) <= PRECISE_CONDITION_THRESHOLD;
}

/** Q₁ formed one way or the other as `byTriangle` says; exported so that tests compare the two. */
export function formBasis(solution: LeastSquaresSolution, byTriangle = basisByTriangle(solution)): Float64Array {
  return byTriangle ? triangleBasis(solution) : accumulateBasis(solution);
}

/**
 * Q₁ = X_s·R⁻¹ with X_s's column a = design column accepted[a] / its scale: column k of Q₁ is
 * Σ_{j ≤ k} x_j·c_jk, c_jk = (R⁻¹)_jk / scale_j. A tile of rows at a time, so that the tile of the
 * design stays in cache across the output columns; two output columns per sweep share each load,
 * and four design columns go into each sweep.
 */
function triangleBasis(solution: LeastSquaresSolution): Float64Array {
  const { accepted, rows: n } = solution.qr;
  const p = accepted.length;
  const data = solution.design.matrix.data;
  const { rInverse, columnScales } = solution;
  // c (row-major p × p) is 0 below its diagonal, so sums may run past j = k where that saves a sweep.
  const c = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    const scale = columnScales[accepted[j]];
    for (let k = j; k < p; k++) c[j * p + k] = rInverse[j * p + k] / scale;
  }
  const offsets = Int32Array.from(accepted, (col) => col * n);
  const q = new Float64Array(n * p);
  for (let from = 0; from < n; from += ROW_TILE) {
    const to = Math.min(n, from + ROW_TILE);
    for (let k = 0; k < p; k += 2) {
      // Output columns k and k + 1 (k alone at an odd p's end, its partner's coefficients then 0).
      const second = Math.min(k + 1, p - 1);
      const partner = second > k ? 1 : 0;
      const out = k * n;
      const next = second * n;
      const end = k + 1 + partner;
      let j = 0;
      for (; j + 4 <= end; j += 4) addFour(data, offsets, c, p, j, k, partner, q, out, next, from, to);
      if (j < end) addRest(data, offsets, c, p, j, end, k, partner, q, out, next, from, to);
    }
  }
  return q;
}

/** Rows from … to − 1 of the output columns at out and next += x_j…x_j+3 times their coefficients in columns k and k + partner. */
function addFour(
  data: Float64Array,
  offsets: Int32Array,
  c: Float64Array,
  p: number,
  j: number,
  k: number,
  partner: number,
  q: Float64Array,
  out: number,
  next: number,
  from: number,
  to: number,
): void {
  const x0 = offsets[j];
  const x1 = offsets[j + 1];
  const x2 = offsets[j + 2];
  const x3 = offsets[j + 3];
  const a0 = c[j * p + k];
  const a1 = c[(j + 1) * p + k];
  const a2 = c[(j + 2) * p + k];
  const a3 = c[(j + 3) * p + k];
  const b0 = partner * c[j * p + k + partner];
  const b1 = partner * c[(j + 1) * p + k + partner];
  const b2 = partner * c[(j + 2) * p + k + partner];
  const b3 = partner * c[(j + 3) * p + k + partner];
  for (let i = from; i < to; i++) {
    const v0 = data[x0 + i];
    const v1 = data[x1 + i];
    const v2 = data[x2 + i];
    const v3 = data[x3 + i];
    q[out + i] += v0 * a0 + v1 * a1 + v2 * a2 + v3 * a3;
    q[next + i] += v0 * b0 + v1 * b1 + v2 * b2 + v3 * b3;
  }
}

/** addFour for the last one to three design columns j … end − 1, on one sweep (a missing column's coefficients 0). */
function addRest(
  data: Float64Array,
  offsets: Int32Array,
  c: Float64Array,
  p: number,
  j: number,
  end: number,
  k: number,
  partner: number,
  q: Float64Array,
  out: number,
  next: number,
  from: number,
  to: number,
): void {
  const has1 = j + 1 < end ? 1 : 0;
  const has2 = j + 2 < end ? 1 : 0;
  const x0 = offsets[j];
  const x1 = offsets[j + has1];
  const x2 = offsets[j + 2 * has2];
  const a0 = c[j * p + k];
  const a1 = has1 * c[(j + has1) * p + k];
  const a2 = has2 * c[(j + 2 * has2) * p + k];
  const b0 = partner * c[j * p + k + partner];
  const b1 = partner * has1 * c[(j + has1) * p + k + partner];
  const b2 = partner * has2 * c[(j + 2 * has2) * p + k + partner];
  for (let i = from; i < to; i++) {
    const v0 = data[x0 + i];
    const v1 = data[x1 + i];
    const v2 = data[x2 + i];
    q[out + i] += v0 * a0 + v1 * a1 + v2 * a2;
    q[next + i] += v0 * b0 + v1 * b1 + v2 * b2;
  }
}

/** Reflectors per block: four keep V's entries for one row in registers. */
const BLOCK = 4;

function accumulateBasis(solution: LeastSquaresSolution): Float64Array {
  const { reflectors, taus, rows: n } = solution.qr;
  const p = reflectors.length;
  const q = new Float64Array(n * p);
  for (let j = 0; j < p; j++) q[j * n + j] = 1;
  for (let end = p; end > 0; end -= BLOCK) {
    const start = Math.max(0, end - BLOCK);
    applyBlock(reflectors.slice(start, end), taus.subarray(start, end), start, q, n, p);
  }
  return q;
}

/**
 * Columns start … p − 1 of q ← (I − V·T·Vᵀ)·q over rows start … n − 1, V the block's reflectors
 * (v_a zero above row start + a, 1 there) and T upper triangular with H_start⋯H_end−1 = I − V·T·Vᵀ.
 * W = Vᵀ·C, then Y = T·W, then C −= V·Y, each sweep a tile of rows at a time so that the tile of V
 * stays in cache across the columns.
 */
function applyBlock(v: Float64Array[], tau: Float64Array, start: number, q: Float64Array, n: number, p: number): void {
  const s = v.length;
  const t = upperT(v, tau, start, n);
  const count = p - start;
  // Row a of W (and of Y) at a·count.
  const w = new Float64Array(s * count);
  const full = s === BLOCK;
  for (let from = start; from < n; from += ROW_TILE) {
    const to = Math.min(n, from + ROW_TILE);
    let c = 0;
    if (full) for (; c + 1 < count; c += 2) dotsOfFourTwice(v, q, (start + c) * n, n, from, to, w, c, count);
    for (; c < count; c++) {
      if (full) dotsOfFour(v, q, (start + c) * n, from, to, w, c, count);
      else for (let a = 0; a < s; a++) w[a * count + c] += dot(v[a], q, (start + c) * n, from, to);
    }
  }
  // Row a of Y needs rows ≥ a of W: top row first.
  for (let a = 0; a < s; a++) {
    for (let c = 0; c < count; c++) {
      let sum = 0;
      for (let b = a; b < s; b++) sum += t[a * s + b] * w[b * count + c];
      w[a * count + c] = sum;
    }
  }
  for (let from = start; from < n; from += ROW_TILE) {
    const to = Math.min(n, from + ROW_TILE);
    let c = 0;
    if (full) for (; c + 1 < count; c += 2) subtractFourTwice(v, q, (start + c) * n, n, from, to, w, c, count);
    for (; c < count; c++) {
      const base = (start + c) * n;
      if (full) subtractFour(v, q, base, from, to, w, c, count);
      else for (let a = 0; a < s; a++) subtractOne(v[a], q, base, from, to, w[a * count + c]);
    }
  }
}

function dot(va: Float64Array, q: Float64Array, base: number, from: number, to: number): number {
  let sum = 0;
  for (let i = from; i < to; i++) sum += va[i] * q[base + i];
  return sum;
}

/** W[·, c] += Vᵀ·(rows from … to − 1 of the column at base), four reflectors on one sweep. */
function dotsOfFour(v: Float64Array[], q: Float64Array, base: number, from: number, to: number, w: Float64Array, c: number, count: number): void {
  const [v0, v1, v2, v3] = v;
  let d0 = 0;
  let d1 = 0;
  let d2 = 0;
  let d3 = 0;
  for (let i = from; i < to; i++) {
    const x = q[base + i];
    d0 += v0[i] * x;
    d1 += v1[i] * x;
    d2 += v2[i] * x;
    d3 += v3[i] * x;
  }
  w[c] += d0;
  w[count + c] += d1;
  w[2 * count + c] += d2;
  w[3 * count + c] += d3;
}

/** dotsOfFour for columns c and c + 1 (the second at base + n) on one sweep: each v entry loaded serves both. */
function dotsOfFourTwice(
  v: Float64Array[],
  q: Float64Array,
  base: number,
  n: number,
  from: number,
  to: number,
  w: Float64Array,
  c: number,
  count: number,
): void {
  const [v0, v1, v2, v3] = v;
  const next = base + n;
  let d0 = 0;
  let d1 = 0;
  let d2 = 0;
  let d3 = 0;
  let e0 = 0;
  let e1 = 0;
  let e2 = 0;
  let e3 = 0;
  for (let i = from; i < to; i++) {
    const x = q[base + i];
    const z = q[next + i];
    const a0 = v0[i];
    const a1 = v1[i];
    const a2 = v2[i];
    const a3 = v3[i];
    d0 += a0 * x;
    d1 += a1 * x;
    d2 += a2 * x;
    d3 += a3 * x;
    e0 += a0 * z;
    e1 += a1 * z;
    e2 += a2 * z;
    e3 += a3 * z;
  }
  w[c] += d0;
  w[count + c] += d1;
  w[2 * count + c] += d2;
  w[3 * count + c] += d3;
  w[c + 1] += e0;
  w[count + c + 1] += e1;
  w[2 * count + c + 1] += e2;
  w[3 * count + c + 1] += e3;
}

/** subtractFour for columns c and c + 1 (the second at base + n) on one sweep. */
function subtractFourTwice(
  v: Float64Array[],
  q: Float64Array,
  base: number,
  n: number,
  from: number,
  to: number,
  w: Float64Array,
  c: number,
  count: number,
): void {
  const [v0, v1, v2, v3] = v;
  const next = base + n;
  const y0 = w[c];
  const y1 = w[count + c];
  const y2 = w[2 * count + c];
  const y3 = w[3 * count + c];
  const z0 = w[c + 1];
  const z1 = w[count + c + 1];
  const z2 = w[2 * count + c + 1];
  const z3 = w[3 * count + c + 1];
  for (let i = from; i < to; i++) {
    const a0 = v0[i];
    const a1 = v1[i];
    const a2 = v2[i];
    const a3 = v3[i];
    q[base + i] -= a0 * y0 + a1 * y1 + a2 * y2 + a3 * y3;
    q[next + i] -= a0 * z0 + a1 * z1 + a2 * z2 + a3 * z3;
  }
}

function subtractOne(va: Float64Array, q: Float64Array, base: number, from: number, to: number, y: number): void {
  for (let i = from; i < to; i++) q[base + i] -= va[i] * y;
}

/** Rows from … to − 1 of the column at base −= V·Y[·, c], four reflectors on one sweep. */
function subtractFour(v: Float64Array[], q: Float64Array, base: number, from: number, to: number, w: Float64Array, c: number, count: number): void {
  const [v0, v1, v2, v3] = v;
  const y0 = w[c];
  const y1 = w[count + c];
  const y2 = w[2 * count + c];
  const y3 = w[3 * count + c];
  for (let i = from; i < to; i++) q[base + i] -= v0[i] * y0 + v1[i] * y1 + v2[i] * y2 + v3[i] * y3;
}

/** T (row-major s × s) of the forward product H₁⋯H_s = I − V·T·Vᵀ: T_aa = τ_a, T[0:a, a] = −τ_a·T[0:a, 0:a]·Vᵀv_a. */
function upperT(v: Float64Array[], tau: Float64Array, start: number, n: number): Float64Array {
  const s = v.length;
  const t = new Float64Array(s * s);
  const dots = new Float64Array(s);
  for (let a = 0; a < s; a++) {
    const va = v[a];
    for (let b = 0; b < a; b++) {
      const vb = v[b];
      let dot = 0;
      for (let i = start + a; i < n; i++) dot += vb[i] * va[i];
      dots[b] = dot;
    }
    for (let b = 0; b < a; b++) {
      let sum = 0;
      for (let c = b; c < a; c++) sum += t[b * s + c] * dots[c];
      t[b * s + a] = -tau[a] * sum;
    }
    t[a * s + a] = tau[a];
  }
  return t;
}
