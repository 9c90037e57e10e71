/**
 * Folds a block of rows into an upper-triangular factor: the R of QR([R; B]), computed in place
 * with Householder reflections that touch only R's diagonal row and the block (TSQR, one block
 * at a time). R is row-major size × size; the block is column-major rows × size.
 */
export function foldBlock(r: Float64Array, size: number, block: Float64Array, rows: number): void {
  for (let j = 0; j < size; j++) {
    const col = j * rows;
    const norm = columnNorm(r[j * size + j], block, col, rows);
    if (norm === 0) continue;
    if (norm === Math.abs(r[j * size + j]) && blockColumnIsZero(block, col, rows)) continue;
    const alpha = r[j * size + j];
    const beta = alpha >= 0 ? -norm : norm;
    // v = (1 at R's row j; block[:, j] / (alpha − beta)), τ = (beta − alpha)/beta.
    const inv = 1 / (alpha - beta);
    const tau = (beta - alpha) / beta;
    for (let i = 0; i < rows; i++) block[col + i] *= inv;
    r[j * size + j] = beta;
    // Columns are updated two at a time, and each sweep over the rows finishes the previous pair
    // while forming the dot products of the next: the block is read about once per pair.
    let pending1 = -1;
    let pending2 = -1;
    let scale1 = 0;
    let scale2 = 0;
    for (let k = j + 1; k < size || pending1 >= 0; k += 2) {
      const k1 = k < size ? k : -1;
      const k2 = k + 1 < size ? k + 1 : -1;
      let dot1 = k1 >= 0 ? r[j * size + k1] : 0;
      let dot2 = k2 >= 0 ? r[j * size + k2] : 0;
      const t1 = k1 * rows;
      const t2 = k2 * rows;
      const p1 = pending1 * rows;
      const p2 = pending2 * rows;
      if (pending1 >= 0 && pending2 >= 0 && k2 >= 0) {
        for (let i = 0; i < rows; i++) {
          const v = block[col + i];
          block[p1 + i] -= scale1 * v;
          block[p2 + i] -= scale2 * v;
          dot1 += v * block[t1 + i];
          dot2 += v * block[t2 + i];
        }
      } else {
        if (pending1 >= 0) for (let i = 0; i < rows; i++) block[p1 + i] -= scale1 * block[col + i];
        if (pending2 >= 0) for (let i = 0; i < rows; i++) block[p2 + i] -= scale2 * block[col + i];
        if (k1 >= 0) for (let i = 0; i < rows; i++) dot1 += block[col + i] * block[t1 + i];
        if (k2 >= 0) for (let i = 0; i < rows; i++) dot2 += block[col + i] * block[t2 + i];
      }
      pending1 = k1;
      pending2 = k2;
      if (k1 >= 0) {
        scale1 = dot1 * tau;
        r[j * size + k1] -= scale1;
      }
      if (k2 >= 0) {
        scale2 = dot2 * tau;
        r[j * size + k2] -= scale2;
      }
    }
    for (let i = 0; i < rows; i++) block[col + i] = 0;
  }
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
