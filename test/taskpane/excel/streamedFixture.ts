/**
 * A streamed analysis of invented rows on sheet "Data" (header in row 1), as the pane would have
 * it after "Read data and fit" on large data, for the tests of what is written afterwards.
 */
import { resolveRanges, EMPTY_CHOICES, type PaneChoices, type ResolvedRanges } from '../../../src/taskpane/model/choices';
import type { StreamedAnalysis } from '../../../src/taskpane/model/paneAnalysis';
import { analyzeStreamed } from '../../../src/taskpane/model/streamedAnalysis';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { readData } from '../../../src/taskpane/readData';
import { columnLetters } from '../../../src/addressing/a1';

/** Row i's predictors and response: a fixed linear rule plus a deterministic wobble, invented. */
export function inventedRow(i: number, predictors: number): number[] {
  const x = Array.from({ length: predictors }, (_, j) => ((i * (j + 3)) % 101) / 10 + j);
  const wobble = ((i * 7919) % 13) / 13 - 0.5;
  return [x.reduce((sum, v, j) => sum + (j + 1) * v, 2) + wobble, ...x];
}

export interface StreamedFixture {
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: StreamedAnalysis;
}

export interface FixtureShape {
  rows: number;
  predictors: number;
  /** The sheet row of the header (1 unless given); the data rows follow it. */
  headerRow?: number;
  /** Data rows (0-based, below the header) whose response cell is left blank. */
  blankResponses?: readonly number[];
}

export async function streamedFixture(
  model: PreviewWorkbook,
  { rows, predictors, headerRow = 1, blankResponses = [] }: FixtureShape,
): Promise<StreamedFixture> {
  model.addSheet('Data');
  const header = ['y', ...Array.from({ length: predictors }, (_, j) => `x${j + 1}`)];
  const data = Array.from({ length: rows }, (_, i) => inventedRow(i, predictors)).map((row, i) => (blankResponses.includes(i) ? ['', ...row.slice(1)] : row));
  model.setInputs('Data', headerRow - 1, 0, [header, ...data]);
  const last = headerRow + rows;
  const choices: PaneChoices = {
    ...EMPTY_CHOICES,
    response: `Data!A${headerRow}:A${last}`,
    predictors: `Data!B${headerRow}:${columnLetters(predictors)}${last}`,
  };
  const { ranges } = resolveRanges(choices);
  if (ranges === undefined) throw new Error('fixture ranges do not resolve');
  const read = await readData(ranges, () => undefined, new AbortController().signal, true);
  if (read.kind !== 'streamed') throw new Error('fixture read was not streamed');
  return { ranges, choices, analysis: analyzeStreamed(read.data, choices) };
}
