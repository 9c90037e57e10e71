/**
 * The values report of a streamed fit: values and text labels only (no formula could receive
 * the data), the note that says why and how to refresh, the engine's numbers in the tables, the
 * nested test and predictions when chosen, and what was left out said in words.
 */
import { describe, expect, it } from 'vitest';
import { fittedEquation } from '../../../src/cellGrids/equationGrid';
import { EMPTY_CHOICES, type PaneChoices, resolveRanges } from '../../../src/taskpane/model/choices';
import { analyzeStreamed } from '../../../src/taskpane/model/streamedAnalysis';
import { StreamFold } from '../../../src/taskpane/model/streamFold';
import { LEFT_OUT_NOTE, planValuesReport, valuesNote } from '../../../src/taskpane/model/valuesReportPlan';
import { randomProblem } from '../../support/random';

const { y, x } = randomProblem(12, 300, 2);
const sheetColumn = (left: number) => ({ sheet: 'Data', top: 0, bottom: 304, left, right: left });
// 300 complete rows and 4 with a blank response, under a header that looks like a formula.
const fold = new StreamFold({ response: sheetColumn(0), predictors: [sheetColumn(1), sheetColumn(2)], weights: undefined }, 305);
fold.add(
  {
    response: [['=Yield'], ...y.map((v) => [v]), [''], [''], [''], ['']],
    predictors: [0, 1].map((j) => [[['Temp', 'Time'][j]], ...x.map((r) => [r[j]]), [1], [2], [3], [4]]),
    weights: undefined,
  },
  0,
);
const data = fold.result();

function plan(choices: PaneChoices) {
  const { ranges } = resolveRanges(choices);
  if (ranges === undefined) throw new Error('bad test ranges');
  const newRows =
    ranges.newRows === undefined
      ? undefined
      : {
          cells: [
            [20, 3],
            [25, ''],
          ],
          labelCells: ['P-01', 'P-02'],
          sheetRows: [1, 2],
        };
  const analysis = analyzeStreamed({ ...data, newRows }, choices);
  return {
    analysis,
    plan: planValuesReport({ sheetName: 'Plumbline report', ranges, choices, analysis, writtenAt: new Date('2026-12-02T10:00:00Z') }),
  };
}

const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A305', predictors: 'Data!B1:C305' };
const textAt = (cells: ReturnType<typeof plan>['plan']['cells'], row: number, column: number) =>
  cells.find((c) => c.row === row && c.column === column && c.kind === 'label')?.kind === 'label'
    ? (cells.find((c) => c.row === row && c.column === column) as { text: string }).text
    : undefined;

describe('planValuesReport', () => {
  it('writes no formula, and says why the results are values and how to refresh them', () => {
    const { cells } = plan(choices).plan;
    expect(cells.filter((c) => c.kind === 'formula')).toEqual([]);
    expect(textAt(cells, 2, 0)).toBe(
      'These results are values, not live formulas: the data (304 rows) exceed what a cell function can receive in one call (about 5 MB). Use Refresh in the Plumbline pane after the data change.',
    );
    expect(valuesNote(200000)).toContain('(200,000 rows)');
    expect(cells.some((c) => c.kind === 'label' && c.text === LEFT_OUT_NOTE)).toBe(true);
  });

  it('writes the term table and fit statistics of the streamed fit as numbers', () => {
    const { analysis, plan: p } = plan(choices);
    const header = p.cells.find((c) => c.kind === 'label' && c.text === 'Term');
    if (header === undefined || analysis.fit === undefined) throw new Error('no term table');
    analysis.fit.terms.forEach((t, i) => {
      expect(textAt(p.cells, header.row + 1 + i, 0)).toBe(t.name);
      expect(p.cells.find((c) => c.row === header.row + 1 + i && c.column === 1)).toMatchObject({ kind: 'value', value: t.estimate });
    });
    const skipped = p.cells.find((c) => c.kind === 'label' && c.text === 'Rows skipped');
    expect(p.cells.find((c) => c.row === skipped?.row && c.column === 1)).toMatchObject({ kind: 'value', value: 4 });
  });

  // One story: the values report shows the fitted equation PLUMB.EQUATION gives the live report,
  // and says which standard errors each section uses, as the live report does.
  it('writes the fitted equation with its numbers and labels each section with its standard errors', () => {
    const { analysis, plan: p } = plan(choices);
    if (analysis.fit === undefined) throw new Error('no fit');
    const labels = p.cells.flatMap((c) => (c.kind === 'label' ? [c.text] : []));
    expect(labels).toContain(fittedEquation('=Yield', analysis.fit));
    expect(labels.some((t) => t.includes('b0'))).toBe(false);
    expect(labels.some((t) => t.endsWith('Standard errors: classical.'))).toBe(true);
    expect(labels.filter((t) => t.startsWith('Classical standard errors')).length).toBeGreaterThanOrEqual(1);
  });

  it('keeps a response name that looks like a formula as a text label', () => {
    const { cells } = plan(choices).plan;
    expect(textAt(cells, 0, 0)).toBe('Plumbline report: =Yield');
  });

  it('adds the nested test and the predictions when they are chosen, a blank new row left blank', () => {
    const { analysis, plan: p } = plan({ ...choices, added: [1], newRows: 'New!A1:B2' });
    const fRow = p.cells.find((c) => c.kind === 'label' && c.text === 'F')?.row;
    expect(p.cells.find((c) => c.row === fRow && c.column === 1)).toMatchObject({ kind: 'value', value: analysis.nested?.f });
    expect(p.cells.some((c) => c.kind === 'label' && c.text === 'Does Time add anything?')).toBe(true);
    const header = p.cells.find((c) => c.kind === 'label' && c.text === 'Prediction');
    if (header === undefined) throw new Error('no predictions table');
    // Each new row's label in column A, beside its prediction; the row with a blank keeps its label, its numbers blank.
    expect(textAt(p.cells, header.row + 1, header.column - 1)).toBe('P-01');
    expect(p.cells.find((c) => c.row === header.row + 1 && c.column === header.column)?.kind).toBe('value');
    expect(textAt(p.cells, header.row + 2, header.column - 1)).toBe('P-02');
    expect(textAt(p.cells, header.row + 2, header.column)).toBe('');
  });
});
