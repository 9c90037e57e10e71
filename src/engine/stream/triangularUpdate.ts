import { reflectFourColumns } from '../linalg/reflectFourColumns';

/**
 * Folds a block of rows into an upper-triangular factor: the R of QR([R; B]), computed in place
 * with Householder reflections that touch only R's diagonal row and the block (TSQR, one block
 * at a time). R is row-major size × size; the block is column-major rows × size.
 */
export function foldBlock(r: Float64Array, size: number, block: Float64Array, rows: number): void {
  for (let j = 0; j < size; j++) {
    const col = j * rows;
    const diagonal = j * size + j;
    const norm = columnNorm(r[diagonal], block, col, rows);
    if (norm === 0) continue;
    if (norm === Math.abs(r[diagonal]) && blockColumnIsZero(block, col, rows)) continue;
    const alpha = r[diagonal];
    const beta = alpha >= 0 ? -norm : norm;
    // v = (1 at R's row j; block[:, j] / (alpha − beta)), τ = (beta − alpha)/beta.
    const inv = 1 / (alpha - beta);
    const tau = (beta - alpha) / beta;
    for (let i = 0; i < rows; i++) block[col + i] *= inv;
    r[diagonal] = beta;
    let k = j + 1;
    for (; k + 3 < size; k += 4) reflectFourColumns(block, col, block, k * rows, rows, rows, tau, { r, start: j * size + k });
    for (; k < size; k++) reflectColumn(r, j * size + k, block, col, k * rows, rows, tau);
    for (let i = 0; i < rows; i++) block[col + i] = 0;
  }
}

/** Applies I − τvvᵀ to one column. */
function reflectColumn(r: Float64Array, rIndex: number, block: Float64Array, vStart: number, target: number, rows: number, tau: number): void {
  let s = r[rIndex];
  for (let i = 0; i < rows; i++) s += block[vStart + i] * block[target + i];
  s *= tau;
  r[rIndex] -= s;
  for (let i = 0; i < rows; i++) block[target + i] -= s * block[vStart + i];
}

function blockColumnIsZero(block: Float64Array, col: number, rows: number): boolean {
  for (let i = 0; i < rows; i++) if (block[col + i] !== 0) return false;
  return true;
}

/**
 * ‖(d, block[col..col+rows))‖, in one plain pass when the sum of squares stays within range and
 * with scaling only when it overflows or underflows (data near 1e±154 and beyond).
 */
function columnNorm(d: number, block: Float64Array, col: number, rows: number): number {
  let sum = d * d;
  for (let i = 0; i < rows; i++) sum += block[col + i] * block[col + i];
  if (sum > 1e-290 && sum < 1e290) return Math.sqrt(sum);
  let scale = Math.abs(d);
  for (let i = 0; i < rows; i++) scale = Math.max(scale, Math.abs(block[col + i]));
  if (scale === 0 || !Number.isFinite(scale)) return scale;
  let scaled = (d / scale) ** 2;
  for (let i = 0; i < rows; i++) scaled += (block[col + i] / scale) ** 2;
  return scale * Math.sqrt(scaled);
}
