import { type ColumnMajorMatrix, columnView, stableNorm } from './columnMajor';
import { BLOCK_SIZE, ReflectorBlock } from './reflectorBlock';

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

/** The one reflector block every factorization uses in turn (see ReflectorBlock on why one). */
const SHARED_BLOCK = new ReflectorBlock();

export function householderQr(scaled: ColumnMajorMatrix, aliasTolerance: number): QrFactorization {
  return factorInPlace({ rows: scaled.rows, cols: scaled.cols, data: new Float64Array(scaled.data) }, aliasTolerance);
}

/**
 * householderQr on `m` itself, whose storage becomes the reflectors': column j of an accepted
 * column holds its reflector (zeros above row k, 1 at row k), and the QR keeps views of those
 * columns rather than copies. R's entries are taken out as each column is finished. Aliased
 * columns are left holding partial work and are not part of the result.
 *
 * The last `carried` columns are not factored but have every reflector applied as it is made:
 * a response carried along this way comes out as Qᵀy at no extra pass over the reflectors.
 */
export function factorInPlace(m: ColumnMajorMatrix, aliasTolerance: number, carried = 0): QrFactorization {
  const n = m.rows;
  const factored = m.cols - carried;
  const work = m.data;
  const accepted: number[] = [];
  const aliased: boolean[] = new Array<boolean>(factored).fill(false);
  const reflectors: Float64Array[] = [];
  const tauList: number[] = [];
  const rColumns: Float64Array[] = [];

  // Left-looking within a block, right-looking across blocks: each column first receives the
  // reflectors still pending, and a full block is then applied to every later column at once.
  const block = SHARED_BLOCK.attach(work, n);
  try {
    for (let j = 0; j < factored; j++) {
      const k = accepted.length;
      const col = columnView(m, j);
      const remaining = k < n ? normOf(block.prepareColumn(j, k), col, k) : 0;
      if (!(remaining > aliasTolerance)) {
        aliased[j] = true;
        continue;
      }
      const rColumn = col.slice(0, k + 1);
      const alpha = col[k];
      const tau = reflectInPlace(col, k, remaining);
      rColumn[k] = col[k];
      // The same 1/(α − β) that reflectInPlace scaled by.
      const inverse = 1 / (alpha - col[k]);
      col[k] = 1;
      block.add(j * n, k, tau, inverse);
      if (block.size === BLOCK_SIZE) {
        block.applyTo(j + 1, m.cols - j - 1);
        block.clear();
      }
      accepted.push(j);
      reflectors.push(col);
      tauList.push(tau);
      rColumns.push(rColumn);
    }
    // What is still pending reaches the carried columns; the factored ones have had it already.
    block.applyTo(factored, carried);
  } finally {
    block.detach();
  }

  const rank = accepted.length;
  const r = new Float64Array(rank * rank);
  for (let a = 0; a < rank; a++) {
    for (let i = 0; i <= a; i++) r[i * rank + a] = rColumns[a][i];
  }
  return { rows: n, accepted, aliased, r, reflectors, taus: Float64Array.from(tauList) };
}

/**
 * ‖x[k..]‖ from its sum of squares, for a column of the unit-norm-scaled working matrix: its
 * entries are at most 1, so the sum cannot overflow, and it can only underflow for a remainder far
 * below any alias tolerance; stableNorm takes over in that case.
 */
function normOf(squares: number, x: Float64Array, k: number): number {
  const norm = Math.sqrt(squares);
  return norm > 1e-140 && norm < 1e140 ? norm : stableNorm(x, k);
}

/**
 * Overwrites x with the LAPACK-style reflector H = I − τ v vᵀ (v_k = 1, zeros above k) that maps
 * x[k..] to (β, 0, …, 0); β is left in x[k] and τ returned.
 */
function reflectInPlace(x: Float64Array, k: number, norm: number): number {
  const alpha = x[k];
  const beta = alpha >= 0 ? -norm : norm;
  const inv = 1 / (alpha - beta);
  for (let i = 0; i < k; i++) x[i] = 0;
  for (let i = k + 1; i < x.length; i++) x[i] *= inv;
  x[k] = beta;
  return (beta - alpha) / beta;
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
