import type { ColumnMajorMatrix } from './columnMajor';

/**
 * Rows per tile for sweeps that read every column of a tall matrix: 512 rows of 21 columns are
 * 86 kB, which stay in a core's L2 cache between the passes over one tile.
 */
export const ROW_TILE = 512;

/**
 * r −= X·step over the given columns, then (when `gradient` is given) gradient = Xᵀr, tile by
 * tile so that each tile of X is read from memory once for both. In double precision: the callers
 * use it where r is already small beside y (refinement steps) or where rounding at u·|y| is the
 * accuracy wanted (residuals of a double-precision fit).
 */
export function subtractProduct(
  matrix: ColumnMajorMatrix,
  columns: readonly number[],
  step: ArrayLike<number>,
  residual: Float64Array,
  gradient?: Float64Array,
): void {
  const n = matrix.rows;
  const data = matrix.data;
  const q = columns.length;
  gradient?.fill(0);
  for (let from = 0; from < n; from += ROW_TILE) {
    const to = Math.min(n, from + ROW_TILE);
    let a = 0;
    // Columns in pairs: each residual entry is loaded and stored once per two columns.
    for (; a + 1 < q; a += 2) {
      const d = step[a];
      const e = step[a + 1];
      const offset = columns[a] * n;
      const next = columns[a + 1] * n;
      for (let i = from; i < to; i++) residual[i] -= data[offset + i] * d + data[next + i] * e;
    }
    if (a < q) {
      const d = step[a];
      const offset = columns[a] * n;
      for (let i = from; i < to; i++) residual[i] -= data[offset + i] * d;
    }
    if (gradient !== undefined) {
      let c = 0;
      for (; c + 1 < q; c += 2) {
        const offset = columns[c] * n;
        const next = columns[c + 1] * n;
        let dot = 0;
        let nextDot = 0;
        for (let i = from; i < to; i++) {
          const e = residual[i];
          dot += data[offset + i] * e;
          nextDot += data[next + i] * e;
        }
        gradient[c] += dot;
        gradient[c + 1] += nextDot;
      }
      if (c < q) {
        const offset = columns[c] * n;
        let dot = 0;
        for (let i = from; i < to; i++) dot += data[offset + i] * residual[i];
        gradient[c] += dot;
      }
    }
  }
}
