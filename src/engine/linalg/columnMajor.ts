/**
 * A dense matrix stored column by column in one Float64Array: entry (i, j) sits at
 * data[j * rows + i]. Column-major keeps each Householder update a contiguous sweep.
 */
export interface ColumnMajorMatrix {
  rows: number;
  cols: number;
  data: Float64Array;
}

export function columnView(m: ColumnMajorMatrix, j: number): Float64Array {
  return m.data.subarray(j * m.rows, (j + 1) * m.rows);
}

/**
 * Euclidean norm without overflow or underflow: entries near 1e300 or 1e-300 would otherwise
 * square to Infinity or 0 before the root could bring them back. The entries are scaled by a power
 * of two near the largest, which is exact, so the result is the plain formula's wherever that one
 * is finite.
 */
export function stableNorm(v: Float64Array, from = 0): number {
  let largest = 0;
  for (let i = from; i < v.length; i++) largest = Math.max(largest, Math.abs(v[i]));
  if (largest === 0 || !Number.isFinite(largest)) return largest;
  // 2^−e with 2^e ≤ largest, kept within the normal range so that the factor itself is exact.
  const down = 2 ** Math.min(1022, Math.max(-1022, -Math.floor(Math.log2(largest))));
  let sum = 0;
  for (let i = from; i < v.length; i++) {
    const t = v[i] * down;
    sum += t * t;
  }
  return Math.sqrt(sum) / down;
}
