import type { RangeRef } from '../../addressing/a1';
import { readRowBlocks } from './readRowBlocks';

/** Values of several ranges, each read in blocks sized by payload and joined again. */
export async function readRanges(ranges: readonly RangeRef[]): Promise<unknown[][][]> {
  const grids: unknown[][][] = [];
  for (const range of ranges) {
    const rows: unknown[][] = [];
    await readRowBlocks([range], ({ values }) => {
      for (const row of values[0]) rows.push(row);
    });
    grids.push(rows);
  }
  return grids;
}
