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
 * square to Infinity or 0 before the root could bring them back.
 */
export function stableNorm(v: Float64Array, from = 0): number {
  let scale = 0;
  for (let i = from; i < v.length; i++) scale = Math.max(scale, Math.abs(v[i]));
  if (scale === 0 || !Number.isFinite(scale)) return scale;
  let sum = 0;
  for (let i = from; i < v.length; i++) {
    const t = v[i] / scale;
    sum += t * t;
  }
  return scale * Math.sqrt(sum);
}
