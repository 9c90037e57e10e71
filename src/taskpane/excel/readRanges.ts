import { formatRange, type RangeRef } from '../../addressing/a1';

/** Values of several ranges in one round trip; each range is on its own named sheet. */
export async function readRanges(ranges: readonly RangeRef[]): Promise<unknown[][][]> {
  return Excel.run(async (context) => {
    const proxies = ranges.map((r) => {
      const range = context.workbook.worksheets.getItem(r.sheet).getRange(formatRange(r, false));
      range.load('values');
      return range;
    });
    await context.sync();
    return proxies.map((p) => p.values);
  });
}
