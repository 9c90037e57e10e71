/**
 * Folds a block of rows into an upper-triangular factor: the R of QR([R; B]), computed in place
 * with Householder reflections that touch only R's diagonal row and the block (TSQR, one block
 * at a time). R is row-major size × size; the block is column-major rows × size.
 */
export function foldBlock(r: Float64Array, size: number, block: Float64Array, rows: number): void {
  for (let j = 0; j < size; j++) {
    const col = j * rows;
    let scale = Math.abs(r[j * size + j]);
    for (let i = 0; i < rows; i++) scale = Math.max(scale, Math.abs(block[col + i]));
    if (scale === 0) continue;
    let sum = (r[j * size + j] / scale) ** 2;
    for (let i = 0; i < rows; i++) sum += (block[col + i] / scale) ** 2;
    const norm = scale * Math.sqrt(sum);
    if (norm === Math.abs(r[j * size + j]) && blockColumnIsZero(block, col, rows)) continue;
    const alpha = r[j * size + j];
    const beta = alpha >= 0 ? -norm : norm;
    // v = (1 at R's row j; block[:, j] / (alpha − beta)), τ = (beta − alpha)/beta.
    const inv = 1 / (alpha - beta);
    const tau = (beta - alpha) / beta;
    for (let i = 0; i < rows; i++) block[col + i] *= inv;
    r[j * size + j] = beta;
    for (let k = j + 1; k < size; k++) {
      const target = k * rows;
      let s = r[j * size + k];
      for (let i = 0; i < rows; i++) s += block[col + i] * block[target + i];
      s *= tau;
      r[j * size + k] -= s;
      for (let i = 0; i < rows; i++) block[target + i] -= s * block[col + i];
    }
    for (let i = 0; i < rows; i++) block[col + i] = 0;
  }
}

function blockColumnIsZero(block: Float64Array, col: number, rows: number): boolean {
  for (let i = 0; i < rows; i++) if (block[col + i] !== 0) return false;
  return true;
}
