import { columnCount, formatRange, parseRange } from '../../addressing/a1';
import { inPieces } from './inPieces';
import { longRun } from './longRun';
import { FIRST_GUESS_CELL_BYTES } from './payload';
import { readRowBlocks } from './readRowBlocks';

const holdsAnything = (values: unknown[][]) => values.some((row) => row.some((v) => v !== '' && v !== null));

/**
 * The addresses on `sheetName` among `addresses` (cells or ranges) that hold anything at all,
 * read in requests sized by payload: single rows (report cells, panel headers) many to a
 * request, taller ranges (a growing residual table can span a million rows) in row blocks.
 */
export async function occupiedAddresses(sheetName: string, addresses: readonly string[]): Promise<string[]> {
  const ranges = addresses.map((address) => {
    const range = parseRange(address, sheetName);
    if (range === undefined) throw new Error(`unreachable: "${address}" is an address the report planned`);
    return range;
  });
  const occupied = new Set<number>();
  const singleRows = ranges.flatMap((range, index) => (range.top === range.bottom ? [{ range, index }] : []));
  await inPieces(
    singleRows.length,
    (i) => columnCount(singleRows[i].range) * FIRST_GUESS_CELL_BYTES,
    (start, count) =>
      longRun(async (context) => {
        const sheet = context.workbook.worksheets.getItem(sheetName);
        const piece = singleRows.slice(start, start + count);
        const proxies = piece.map(({ range }) => sheet.getRange(formatRange(range, false)).load('values'));
        await context.sync();
        piece.forEach(({ index }, k) => {
          if (holdsAnything(proxies[k].values)) occupied.add(index);
        });
      }),
  );
  for (const [index, range] of ranges.entries()) {
    if (range.top === range.bottom) continue;
    await readRowBlocks([range], ({ values }) => {
      if (holdsAnything(values[0])) occupied.add(index);
    });
  }
  return addresses.filter((_, i) => occupied.has(i));
}
