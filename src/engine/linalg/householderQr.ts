import { type ColumnMajorMatrix, columnView, stableNorm } from './columnMajor';
import { reflectFourColumns } from './reflectFourColumns';

/**
 * Householder QR of a matrix whose columns have unit norm, taken column by column in input
 * order. A column whose part orthogonal to the columns already accepted is no larger than
 * `aliasTolerance` (relative to its unit norm, hence scale-invariant) is declared aliased and
 * skipped, so the factor is that of the accepted columns alone and later columns stay in their
 * places: the earliest of two identical columns is the one that is kept.
 */
export interface QrFactorization {
  rows: number;
  /** Original indices of the accepted columns, in order; R is rank × rank over these. */
  accepted: number[];
  aliased: boolean[];
  /** Upper-triangular R, row-major rank × rank. */
  r: Float64Array;
  /** Householder vectors, one per accepted column, each stored over rows k..n−1 with v_k = 1. */
  reflectors: Float64Array[];
  taus: Float64Array;
}

export function householderQr(scaled: ColumnMajorMatrix, aliasTolerance: number): QrFactorization {
  const n = scaled.rows;
  const work = new Float64Array(scaled.data);
  const m: ColumnMajorMatrix = { rows: n, cols: scaled.cols, data: work };
  const accepted: number[] = [];
  const aliased: boolean[] = new Array<boolean>(scaled.cols).fill(false);
  const reflectors: Float64Array[] = [];
  const tauList: number[] = [];

  for (let j = 0; j < scaled.cols; j++) {
    const k = accepted.length;
    const col = columnView(m, j);
    const remaining = k < n ? stableNorm(col, k) : 0;
    if (!(remaining > aliasTolerance)) {
      aliased[j] = true;
      continue;
    }
    const { v, tau, beta } = makeReflector(col, k, remaining);
    col[k] = beta;
    for (let i = k + 1; i < n; i++) col[i] = 0;
    let c = j + 1;
    for (; c + 3 < scaled.cols; c += 4) reflectFourColumns(v, k, work, c * n + k, n, n - k, tau);
    for (; c < scaled.cols; c++) applyReflector(v, tau, k, columnView(m, c));
    accepted.push(j);
    reflectors.push(v);
    tauList.push(tau);
  }

  const rank = accepted.length;
  const r = new Float64Array(rank * rank);
  for (let a = 0; a < rank; a++) {
    const col = columnView(m, accepted[a]);
    for (let i = 0; i <= a; i++) r[i * rank + a] = col[i];
  }
  return { rows: n, accepted, aliased, r, reflectors, taus: Float64Array.from(tauList) };
}

/** LAPACK-style reflector H = I − τ v vᵀ with v_k = 1, mapping x[k..] to (β, 0, …, 0). */
function makeReflector(x: Float64Array, k: number, norm: number): { v: Float64Array; tau: number; beta: number } {
  const alpha = x[k];
  const beta = alpha >= 0 ? -norm : norm;
  const v = new Float64Array(x.length);
  const inv = 1 / (alpha - beta);
  v[k] = 1;
  for (let i = k + 1; i < x.length; i++) v[i] = x[i] * inv;
  return { v, tau: (beta - alpha) / beta, beta };
}

function applyReflector(v: Float64Array, tau: number, k: number, target: Float64Array): void {
  let s = 0;
  for (let i = k; i < target.length; i++) s += v[i] * target[i];
  s *= tau;
  if (s === 0) return;
  for (let i = k; i < target.length; i++) target[i] -= s * v[i];
}

/** Overwrites b with Qᵀb. */
export function applyQTranspose(qr: QrFactorization, b: Float64Array): void {
  for (let k = 0; k < qr.reflectors.length; k++) applyReflector(qr.reflectors[k], qr.taus[k], k, b);
}

/** Overwrites b with Qb. */
export function applyQ(qr: QrFactorization, b: Float64Array): void {
  for (let k = qr.reflectors.length - 1; k >= 0; k--) applyReflector(qr.reflectors[k], qr.taus[k], k, b);
}
