import type { RangeRef } from '../addressing/a1';
import type { CellGrid } from '../engine';
import { readInBlocks } from './excel/readInBlocks';
import { readRanges } from './excel/readRanges';
import type { ReadData } from './model/analysis';
import type { BlockSources } from './model/blockRows';
import type { ResolvedRanges } from './model/choices';
import type { NewRowsRead } from './model/newRowPredictions';
import { asCellGrid } from './model/readValues';
import { StreamFold } from './model/streamFold';
import type { StreamedData } from './model/streamedAnalysis';

/**
 * Numbers in the model's data past which the pane streams: 250,000 numbers is about what fits in
 * the ~5 MB a cell function can receive in one call, so beyond it a live report could not work
 * and the pane must not hold the data twice either.
 */
export const STREAM_THRESHOLD = 250_000;

export type PaneData = { kind: 'cells'; data: ReadData } | { kind: 'streamed'; data: StreamedData };

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
  const read = stream ? await readStreamed(sources, progress, signal) : await readCells(sources, progress, signal);
  if (ranges.newRows === undefined) return read;
  const newRows = await readNewRows(ranges.newRows);
  return read.kind === 'cells' ? { kind: 'cells', data: { ...read.data, newRows } } : { kind: 'streamed', data: { ...read.data, newRows } };
}

/**
 * New rows are few: read at once, their areas joined side by side, with the column just left of
 * the first area, where a user keeps each row's name.
 */
export async function readNewRows(areas: readonly RangeRef[]): Promise<NewRowsRead> {
  const first = areas[0];
  const labelColumn: RangeRef | undefined = first.left > 0 ? { ...first, left: first.left - 1, right: first.left - 1 } : undefined;
  const grids = (await readRanges(labelColumn === undefined ? areas : [...areas, labelColumn])).map(asCellGrid);
  const areaGrids = grids.slice(0, areas.length);
  const cells: CellGrid = areaGrids[0].map((_, i) => areaGrids.flatMap((g) => [...(g[i] ?? [])]));
  return {
    cells,
    labelCells: labelColumn === undefined ? undefined : grids[areas.length].map((row) => row[0]),
    sheetRows: cells.map((_, i) => first.top + i + 1),
  };
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
  const fold = new StreamFold(sources, sources.response.bottom - sources.response.top + 1);
  await readInBlocks(sources, { block: (values, offset) => fold.add(values, offset), progress }, signal);
  return { kind: 'streamed', data: fold.result() };
}
