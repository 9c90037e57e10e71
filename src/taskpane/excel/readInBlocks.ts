import type { RangeRef } from '../../addressing/a1';
import type { BlockValues } from '../model/blockRows';
import { readRowBlocks } from './readRowBlocks';

export interface BlockSink {
  /** Called with each block in order, and awaited; `offset` is its first row within the chosen ranges. */
  block(values: BlockValues, offset: number): void | Promise<void>;
  progress(rowsRead: number, totalRows: number): void;
}

/**
 * Reads the chosen columns (response, predictors, weights) in row blocks sized by payload,
 * handing each block on before the next is asked for (readRowBlocks).
 */
export async function readInBlocks(
  columns: { response: RangeRef; predictors: readonly RangeRef[]; weights: RangeRef | undefined },
  sink: BlockSink,
  signal: AbortSignal,
): Promise<void> {
  const ranges = [columns.response, ...columns.predictors, ...(columns.weights === undefined ? [] : [columns.weights])];
  const p = columns.predictors.length;
  await readRowBlocks(
    ranges,
    ({ values, offset }) =>
      sink.block({ response: values[0], predictors: values.slice(1, 1 + p), weights: columns.weights === undefined ? undefined : values[1 + p] }, offset),
    { signal, progress: sink.progress },
  );
}
