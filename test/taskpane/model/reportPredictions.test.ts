/**
 * Predictions in both reports, labelled as the user labels the new rows (the text just left of
 * them, else the worksheet row), with the extrapolation flag: a value outside the range of the
 * rows used is extrapolation (common practice, no source). The live report is written and
 * recalculated in the preview host in Node with the real PLUMB functions
 * (test/support/plumbPreview.ts). Invented data (no source); the intervals themselves are checked
 * in test/engine and test/functions.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { writeLiveReportFor } from '../../support/liveReport';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { EMPTY_CHOICES, type PaneChoices, resolveRanges } from '../../../src/taskpane/model/choices';
import type { CellsAnalysis } from '../../../src/taskpane/model/paneAnalysis';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { NEW_ROW_LABEL_HEADER } from '../../../src/taskpane/model/reportSections';
import { planValuesReport } from '../../../src/taskpane/model/valuesReportPlan';
import { plumbPreview } from '../../support/plumbPreview';

// Twelve rows of an invented response against two predictors, then three new rows in B16:C18
// under their header in row 15, labelled in column A: one inside the data, one beyond the
// largest temperature, and one left unlabelled.
const rows = [
  [3.1, 1, 2],
  [4.2, 2, 1],
  [5.0, 3, 4],
  [6.3, 4, 3],
  [6.9, 5, 6],
  [8.1, 6, 5],
  [9.2, 7, 8],
  [9.8, 8, 7],
  [11.1, 9, 10],
  [12.0, 10, 9],
  [13.2, 11, 12],
  [13.8, 12, 11],
];
const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A13', predictors: 'Data!B1:C13', newRows: 'Data!B15:C18' };

describe('labelled predictions', () => {
  let model: PreviewWorkbook;
  let sheet: string;
  let plan: ReportPlan | undefined;
  let analysis: CellsAnalysis;

  beforeAll(async () => {
    model = await plumbPreview('Data');
    model.setInputs('Data', 0, 0, [['Yield', 'Temp', 'Time'], ...rows]);
    model.setInputs('Data', 14, 0, [
      ['Batch', 'Temp', 'Time'],
      ['P-01', 6.5, 6],
      ['P-02', 20, 6],
      [null, 3, 3],
    ]);
    ({ analysis, sheet, plan } = await writeLiveReportFor(choices));
  }, 60_000);

  it('labels each new row by the text left of it, else by its worksheet row, and flags the value outside the data', () => {
    expect(analysis.predictions.map((p) => [p.label, p.sheetRow, p.outsideRange, p.hiddenExtrapolation])).toEqual([
      ['P-01', 16, [], false],
      ['P-02', 17, ['Temp'], false],
      ['Row 18', 18, [], false],
    ]);
    expect(analysis.predictions[0].inputs).toEqual([
      { name: 'Temp', value: 6.5 },
      { name: 'Time', value: 6 },
    ]);
  });

  it('puts the labels beside PLUMB.PREDICT in the live report, as references that follow the label cells', () => {
    const header = plan?.cells.find((c) => c.kind === 'label' && c.text === NEW_ROW_LABEL_HEADER);
    if (header === undefined) throw new Error('no label column');
    const labelAt = (i: number) => model.valueAt({ sheet, row: header.row + 1 + i, column: header.column });
    const predictionAt = (i: number) => model.valueAt({ sheet, row: header.row + 1 + i, column: header.column + 1 });
    expect(model.valueAt({ sheet, row: header.row, column: header.column + 1 })).toBe('Prediction');
    expect([0, 1, 2].map(labelAt)).toEqual(['P-01', 'P-02', 'Row 18']);
    expect(predictionAt(0)).toBeCloseTo(analysis.predictions[0].estimate, 10);
    const flags = [0, 1, 2].map((i) => model.valueAt({ sheet, row: header.row + 1 + i, column: header.column + 6 }));
    expect(flags[0]).toBe('');
    expect(String(flags[1])).toContain('Temp');
    model.setInputs('Data', 15, 0, [['P-01 renamed']]);
    expect(labelAt(0)).toBe('P-01 renamed');
  });

  it('writes the same labels, numbers and flags in the values report', () => {
    const { ranges } = resolveRanges(choices);
    if (ranges === undefined) throw new Error('bad test ranges');
    const values = planValuesReport({ sheetName: 'V', ranges, choices, analysis, writtenAt: new Date('2026-12-03T10:00:00Z') });
    const header = values.cells.find((c) => c.kind === 'label' && c.text === NEW_ROW_LABEL_HEADER);
    if (header === undefined) throw new Error('no label column');
    const at = (row: number, column: number) => {
      const cell = values.cells.find((c) => c.row === row && c.column === column);
      return cell === undefined ? undefined : cell.kind === 'label' ? cell.text : cell.kind === 'value' ? cell.value : cell.formula;
    };
    expect([1, 2, 3].map((i) => at(header.row + i, 0))).toEqual(['P-01', 'P-02', 'Row 18']);
    expect(at(header.row + 1, 1)).toBe(analysis.predictions[0].estimate);
    expect(String(at(header.row + 2, 6))).toContain('Temp');
    const live = plan?.cells.find((c) => c.kind === 'label' && c.text === NEW_ROW_LABEL_HEADER);
    expect(String(at(header.row + 2, 6))).toBe(model.valueAt({ sheet, row: (live?.row ?? 0) + 2, column: 6 }));
  });
});
