/**
 * The same sheet columns read both ways the pane reads them: as cells (grids, analyzeCells) and as
 * a stream of blocks (StreamFold, analyzeStreamed), so a test can ask both paths the same question.
 */
import type { CellValue } from '../../../src/engine';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import type { BlockSources } from '../../../src/taskpane/model/blockRows';
import type { PaneChoices } from '../../../src/taskpane/model/choices';
import type { NewRowsRead } from '../../../src/taskpane/model/newRowPredictions';
import type { PaneAnalysis } from '../../../src/taskpane/model/paneAnalysis';
import { analyzeStreamed } from '../../../src/taskpane/model/streamedAnalysis';
import { StreamFold } from '../../../src/taskpane/model/streamFold';

/** Columns on sheet "Data" from row 1: the response in A, the predictors in B, C, … */
export function sourcesFor(predictors: number, rows: number): BlockSources {
  const at = (left: number) => ({ sheet: 'Data', top: 0, bottom: rows - 1, left, right: left });
  return { response: at(0), predictors: Array.from({ length: predictors }, (_, j) => at(j + 1)), weights: undefined };
}

export function bothSources(
  response: readonly CellValue[],
  predictors: readonly (readonly CellValue[])[],
  choices: PaneChoices,
  newRows?: NewRowsRead,
  blockRows = 7,
): { cells: PaneAnalysis; streamed: PaneAnalysis } {
  const sources = sourcesFor(predictors.length, response.length);
  const column = (values: readonly CellValue[]) => values.map((v) => [v]);
  const cells = analyzeCells({ response: column(response), predictorColumns: predictors.map(column), weights: undefined, sources, newRows }, choices);
  const fold = new StreamFold(sources, response.length);
  for (let offset = 0; offset < response.length; offset += blockRows) {
    const slice = (values: readonly CellValue[]) => column(values.slice(offset, offset + blockRows));
    fold.add({ response: slice(response), predictors: predictors.map(slice), weights: undefined }, offset);
  }
  return { cells, streamed: analyzeStreamed({ ...fold.result(), newRows }, choices) };
}

/** The failure message of a call that must fail. */
export function failureOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
  throw new Error('expected a failure');
}
