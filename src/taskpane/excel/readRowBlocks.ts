import { formatRange, rowCount, type RangeRef } from '../../addressing/a1';
import { longRun } from './longRun';
import { BlockSizer, isPayloadLimit, jsonBytes } from './payload';

export class ReadCancelled extends Error {
  constructor() {
    super('Reading cancelled');
    this.name = 'ReadCancelled';
  }
}

/** The same rows of several ranges, as read in one round trip. */
export interface RowBlock {
  /** One grid per range, in the order asked for. */
  values: unknown[][][];
  /** One grid per range when number formats were asked for. */
  numberFormats: unknown[][][] | undefined;
  /** The block's first row within the ranges (0-based). */
  offset: number;
  rows: number;
}

export interface RowBlockOptions {
  signal?: AbortSignal;
  progress?: (rowsRead: number, totalRows: number) => void;
  numberFormats?: boolean;
}

/** The same rows of one range, as an address the API accepts. */
function slice(range: RangeRef, offset: number, rows: number): string {
  return formatRange({ ...range, top: range.top + offset, bottom: range.top + offset + rows - 1 }, false);
}

/**
 * Reads ranges that share their rows (columns of one table) in row blocks sized by payload, one
 * round trip per block, handing each block on (and awaiting it) before the next is asked for, so
 * only one block is ever held and whatever the handler writes is done before more is read. A
 * block Excel rejects as too large is asked for again at half the rows. The signal is checked
 * between blocks; a cancelled read throws ReadCancelled and hands on nothing more.
 */
export async function readRowBlocks(
  ranges: readonly RangeRef[],
  onBlock: (block: RowBlock) => void | Promise<void>,
  options: RowBlockOptions = {},
): Promise<void> {
  if (ranges.length === 0) return;
  const { signal, progress } = options;
  const total = rowCount(ranges[0]);
  const columns = ranges.reduce((n, r) => n + r.right - r.left + 1, 0);
  const sizer = new BlockSizer(columns * (options.numberFormats === true ? 2 : 1));
  const properties = options.numberFormats === true ? 'values, numberFormat' : 'values';
  progress?.(0, total);
  for (let offset = 0; offset < total;) {
    if (signal?.aborted) throw new ReadCancelled();
    const rows = Math.min(sizer.rows, total - offset);
    let read: Pick<RowBlock, 'values' | 'numberFormats'>;
    try {
      read = await longRun(async (context) => {
        const proxies = ranges.map((r) =>
          context.workbook.worksheets
            .getItem(r.sheet)
            .getRange(slice(r, offset, rows))
            .load(properties),
        );
        await context.sync();
        return {
          values: proxies.map((p) => p.values),
          numberFormats: options.numberFormats === true ? proxies.map((p) => p.numberFormat) : undefined,
        };
      });
    } catch (error) {
      if (isPayloadLimit(error) && sizer.rejected(rows)) continue;
      throw error;
    }
    if (signal?.aborted) throw new ReadCancelled();
    sizer.measured(rows, jsonBytes(read.values) + (read.numberFormats === undefined ? 0 : jsonBytes(read.numberFormats)));
    await onBlock({ ...read, offset, rows });
    offset += rows;
    progress?.(offset, total);
    // A host that answers sync() at once would otherwise never let the pane repaint or see a Cancel click.
    await new Promise((resolve) => setTimeout(resolve, 0));
  }
}
