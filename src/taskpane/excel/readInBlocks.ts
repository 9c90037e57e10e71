import { formatRange, type RangeRef } from '../../addressing/a1';
import type { BlockValues } from '../model/blockRows';

/** About 20,000 rows per round trip: a few MB of values, well inside one request's payload. */
export const BLOCK_ROWS = 20_000;

export interface BlockSink {
  /** Called with each block in order; `offset` is its first row within the chosen ranges. */
  block(values: BlockValues, offset: number): void;
  progress(rowsRead: number, totalRows: number): void;
}

export class ReadCancelled extends Error {
  constructor() {
    super('Reading cancelled');
    this.name = 'ReadCancelled';
  }
}

/** The same rows of one column, as an address the API accepts. */
function slice(range: RangeRef, offset: number, rows: number): string {
  return formatRange({ ...range, top: range.top + offset, bottom: range.top + offset + rows - 1 }, false);
}

/**
 * Reads the chosen columns in row blocks, one sync per block, handing each block on before the
 * next is asked for, so only one block of cells is ever held. The signal is checked between
 * blocks; a cancelled read throws ReadCancelled and hands on nothing more.
 */
export async function readInBlocks(
  columns: { response: RangeRef; predictors: readonly RangeRef[]; weights: RangeRef | undefined },
  sink: BlockSink,
  signal: AbortSignal,
  blockRows = BLOCK_ROWS,
): Promise<void> {
  const total = columns.response.bottom - columns.response.top + 1;
  await Excel.run(async (context) => {
    const proxy = (range: RangeRef, offset: number, rows: number) => {
      const r = context.workbook.worksheets.getItem(range.sheet).getRange(slice(range, offset, rows));
      r.load('values');
      return r;
    };
    sink.progress(0, total);
    for (let offset = 0; offset < total; offset += blockRows) {
      if (signal.aborted) throw new ReadCancelled();
      const rows = Math.min(blockRows, total - offset);
      const response = proxy(columns.response, offset, rows);
      const predictors = columns.predictors.map((c) => proxy(c, offset, rows));
      const weights = columns.weights === undefined ? undefined : proxy(columns.weights, offset, rows);
      await context.sync();
      if (signal.aborted) throw new ReadCancelled();
      sink.block({ response: response.values, predictors: predictors.map((p) => p.values), weights: weights?.values }, offset);
      sink.progress(offset + rows, total);
      // A host that answers sync() at once would otherwise never let the pane repaint or see a Cancel click.
      await new Promise((resolve) => setTimeout(resolve, 0));
    }
  });
}
