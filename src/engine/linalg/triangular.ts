/** Solves R x = b for upper-triangular R (row-major, size × size); b is overwritten by x. */
export function solveUpper(r: Float64Array, size: number, b: Float64Array): void {
  for (let i = size - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < size; j++) s -= r[i * size + j] * b[j];
    b[i] = s / r[i * size + i];
  }
}

/** Solves Rᵀ x = b for upper-triangular R; b is overwritten by x. */
export function solveUpperTransposed(r: Float64Array, size: number, b: Float64Array): void {
  for (let i = 0; i < size; i++) {
    let s = b[i];
    for (let j = 0; j < i; j++) s -= r[j * size + i] * b[j];
    b[i] = s / r[i * size + i];
  }
}

/** R⁻¹ (upper triangular, row-major), column by column by back-substitution. */
export function invertUpper(r: Float64Array, size: number): Float64Array {
  const inverse = new Float64Array(size * size);
  const e = new Float64Array(size);
  for (let c = 0; c < size; c++) {
    e.fill(0);
    e[c] = 1;
    solveUpper(r, size, e);
    for (let i = 0; i <= c; i++) inverse[i * size + c] = e[i];
  }
  return inverse;
}
