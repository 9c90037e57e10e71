import { EngineError, RegressionAccumulator, type SkippedRow } from '../engine';
import type { ResolvedRanges } from './model/choices';
import type { ReadData } from './model/analysis';
import { type BlockHeader, type BlockSources, categoricalInFirstBlock, convertBlock, detectHeader } from './model/blockRows';
import { asCellGrid } from './model/readValues';
import type { StreamedData } from './model/streamedAnalysis';
import { readInBlocks } from './excel/readInBlocks';
import type { CellGrid } from '../engine';

/**
 * Numbers in the model's data past which the pane streams: 250,000 numbers is about what fits in
 * the ~5 MB a cell function can receive in one call, so beyond it a live report could not work
 * and the pane must not hold the data twice either.
 */
export const STREAM_THRESHOLD = 250_000;

export type PaneData = { kind: 'cells'; data: ReadData } | { kind: 'streamed'; data: StreamedData; dataRows: number };

export function numbersInModel(ranges: ResolvedRanges): number {
  const rows = ranges.response.bottom - ranges.response.top + 1;
  return rows * (1 + ranges.predictorColumns.length + (ranges.weights === undefined ? 0 : 1));
}

export function isLarge(ranges: ResolvedRanges): boolean {
  return numbersInModel(ranges) > STREAM_THRESHOLD;
}

/**
 * Reads the chosen columns block by block. Small data are gathered into the grids the in-memory
 * analysis has always used; large data go block by block into the accumulator and are dropped.
 */
export async function readData(
  ranges: ResolvedRanges,
  progress: (read: number, total: number) => void,
  signal: AbortSignal,
  stream = isLarge(ranges),
): Promise<PaneData> {
  const sources: BlockSources = { response: ranges.response, predictors: ranges.predictorColumns, weights: ranges.weights };
  return stream ? readStreamed(sources, progress, signal) : readCells(sources, progress, signal);
}

async function readCells(sources: BlockSources, progress: (read: number, total: number) => void, signal: AbortSignal): Promise<PaneData> {
  const response: CellGrid[number][] = [];
  const predictors: CellGrid[number][][] = sources.predictors.map(() => []);
  const weights: CellGrid[number][] = [];
  await readInBlocks(
    sources,
    {
      block: (values) => {
        response.push(...asCellGrid(values.response));
        values.predictors.forEach((column, j) => predictors[j].push(...asCellGrid(column)));
        if (values.weights !== undefined) weights.push(...asCellGrid(values.weights));
      },
      progress,
    },
    signal,
  );
  return { kind: 'cells', data: { response, predictorColumns: predictors, weights: sources.weights === undefined ? undefined : weights, sources } };
}

async function readStreamed(sources: BlockSources, progress: (read: number, total: number) => void, signal: AbortSignal): Promise<PaneData> {
  const total = sources.response.bottom - sources.response.top + 1;
  // Always with the intercept column: models without it, or in another order, are derived from R.
  const accumulator = new RegressionAccumulator(sources.predictors.length, true, sources.weights !== undefined);
  let header: BlockHeader | undefined;
  let skipped = 0;
  const skippedExamples: SkippedRow[] = [];
  await readInBlocks(
    sources,
    {
      block: (values, offset) => {
        if (header === undefined) {
          header = detectHeader(values, sources, total);
          const categorical = categoricalInFirstBlock(values, header);
          if (categorical !== undefined) throw new EngineError('bad-value', categorical);
        }
        const converted = convertBlock(values, sources, header, offset);
        accumulator.addBlock(converted.block);
        skipped += converted.skipped;
        skippedExamples.push(...converted.skippedExamples.slice(0, 5 - skippedExamples.length));
      },
      progress,
    },
    signal,
  );
  const accumulated = accumulator.result();
  if (header === undefined || accumulated.n === 0) {
    throw new EngineError('no-rows', 'No complete rows: every row has a blank or #N/A in the response, a predictor or a weight.');
  }
  return { kind: 'streamed', data: { header, accumulated, skipped, skippedExamples }, dataRows: total - (header.hasHeader ? 1 : 0) };
}
