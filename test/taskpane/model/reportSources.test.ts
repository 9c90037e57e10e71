/**
 * Where the live report's formulas read their data. Predictors that are not one block are brought
 * together by PLUMB.GATHER at the data's own rows, never by plain references: in Excel a formula
 * that refers to an empty cell yields 0 (the preview host models it; test/preview/shim), so a
 * gathered `=Data!B4:B18` would fit every blank as 0.
 *
 * The check that matters is end to end in the preview host in Node, with the real PLUMB functions
 * registered from the generated functions.json: the report over predictors in separate areas, with
 * blank and #N/A cells, shows exactly the numbers of the report over the same cells in one block.
 * The data are seeded random numbers; the statistics are checked against outside sources in
 * test/engine.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { writeLiveReportFor } from '../../support/liveReport';
import type { RangeRef } from '../../../src/addressing/a1';
import { FIT_STATS_LABELS } from '../../../src/cellGrids/fitStatsGrid';
import { fitModel } from '../../../src/engine';
import type { CellInput } from '../../../src/preview/workbook/types';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import type { CellsAnalysis as PaneAnalysis } from '../../../src/taskpane/model/paneAnalysis';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { gatheredColumns, joinRuns, reportSources } from '../../../src/taskpane/model/reportSources';
import { NOT_AVAILABLE_CELL, plumbPreview } from '../../support/plumbPreview';
import { randomProblem } from '../../support/random';

const col = (left: number, right = left): RangeRef => ({ sheet: 'Data', top: 3, bottom: 17, left, right });

describe('joinRuns', () => {
  it('joins neighbouring columns in order and keeps separate ones apart', () => {
    expect(joinRuns([col(1), col(2), col(4), col(3)])).toEqual([col(1, 2), col(4), col(3)]);
    expect(joinRuns([col(1), { ...col(2), top: 4 }])).toHaveLength(2);
  });
});

describe('reportSources', () => {
  const ranges = (predictors: RangeRef[]) => ({ response: col(0), predictorColumns: predictors, weights: undefined, newRows: undefined });

  it('reads one block of predictors where it is, with the added set split off its right end', () => {
    const sources = reportSources('R', ranges([col(1), col(2), col(3)]), [2]);
    expect(sources).toEqual({ y: 'Data!$A$4:$A$18', x: 'Data!$B$4:$D$18', base: 'Data!$B$4:$C$18', added: 'Data!$D$4:$D$18', newRows: undefined, gathers: [] });
  });

  it('gathers separate areas onto the report sheet at the rows they come from', () => {
    const sources = reportSources('R', ranges([col(1), col(3)]), []);
    expect(sources.gathers).toEqual([{ areas: [col(1), col(3)], block: { sheet: 'R', top: 3, bottom: 17, left: 24, right: 25 } }]);
    expect(sources.x).toBe('$Y$4:$Z$18');
  });

  it('says which report-sheet column each gathered predictor lands in, and none for one block read in place', () => {
    expect(gatheredColumns([col(1), col(2)])).toEqual([undefined, undefined]);
    expect(gatheredColumns([col(1), col(3)])).toEqual([24, 25]);
    expect(gatheredColumns([col(3), col(1), col(2)])).toEqual([24, 25, 26]);
  });
});

/** Sheet rows 4–18 hold the header and 14 data rows; three rows are incomplete. */
const { y, x } = randomProblem(47, 14, 2);
const BLANK_Y = 1; // sheet row 6
const BLANK_A = 5; // sheet row 10
const MISSING_B = 9; // sheet row 14, #N/A
const cell = (i: number, j: number): CellInput => {
  if (j === 0) return i === BLANK_Y ? null : y[i];
  if (j === 1) return i === BLANK_A ? null : x[i][0];
  return i === MISSING_B ? NOT_AVAILABLE_CELL : x[i][1];
};

describe('the live report in the preview host', () => {
  let model: PreviewWorkbook;
  const reports: Record<string, { sheet: string; plan: ReportPlan; analysis: PaneAnalysis }> = {};

  async function report(name: string, choices: PaneChoices): Promise<void> {
    const { sheet, plan, analysis } = await writeLiveReportFor(choices);
    reports[name] = { sheet, plan, analysis };
  }

  /** The grid a PLUMB formula of a report fills, read from its anchor cell. */
  function result(name: string, fn: string, rows: number, columns: number): unknown[][] {
    const { sheet, plan } = reports[name];
    const anchor = plan.cells.find((c) => c.kind === 'formula' && c.formula.startsWith(`=PLUMB.${fn}(`));
    if (anchor === undefined) throw new Error(`${name} has no ${fn}`);
    return Array.from({ length: rows }, (_, i) =>
      Array.from({ length: columns }, (_, j) => model.valueAt({ sheet, row: anchor.row + i, column: anchor.column + j })),
    );
  }

  beforeAll(async () => {
    model = await plumbPreview('Batch log');
    model.addSheet('Block');
    // 'Batch log': y in A, a in B, notes in C, b in D (predictors in two areas). 'Block': the same y, a, b in A:C.
    const header = [['Yield', 'Temp', 'note', 'Time']];
    const rows = y.map((_, i) => [cell(i, 0), cell(i, 1), `batch ${i + 1}`, cell(i, 2)]);
    model.setInputs('Batch log', 3, 0, [...header, ...rows]);
    model.setInputs(
      'Block',
      3,
      0,
      [...header, ...rows].map((r) => [r[0], r[1], r[3]]),
    );
    await report('areas', { ...EMPTY_CHOICES, response: "'Batch log'!A4:A18", predictors: "'Batch log'!B4:B18,'Batch log'!D4:D18" });
    await report('block', { ...EMPTY_CHOICES, response: 'Block!A4:A18', predictors: 'Block!B4:C18' });
  }, 60_000);

  it('has the pane skip and count the blank and #N/A rows as it reads them, by worksheet row', () => {
    expect(reports.areas.analysis.frame.skipped).toEqual([
      { row: 6, reason: 'blank in Yield' },
      { row: 10, reason: 'blank in Temp' },
      { row: 14, reason: '#N/A in Time' },
    ]);
    expect(reports.block.analysis.frame.skipped).toEqual(reports.areas.analysis.frame.skipped);
  });

  it('gathers the two areas with PLUMB.GATHER and no plain reference to the data', () => {
    const formulas = reports.areas.plan.cells.flatMap((c) => (c.kind === 'formula' ? [c.formula] : []));
    expect(formulas).toContain("=PLUMB.GATHER('Batch log'!$B$4:$B$18, 'Batch log'!$D$4:$D$18)");
    // Only PLUMB functions read the data; the charts' guide lines (MIN, MAX, COUNT) read PLUMB results on the report sheet.
    expect(formulas.filter((f) => !f.startsWith('=PLUMB.')).filter((f) => f.includes('Batch log'))).toEqual([]);
  });

  it('gives exactly the term table and fit statistics of the same data in one block', () => {
    const terms = result('areas', 'TERMS', 4, 8);
    expect(terms).toEqual(result('block', 'TERMS', 4, 8));
    expect(result('areas', 'FITSTATS', FIT_STATS_LABELS.length, 2)).toEqual(result('block', 'FITSTATS', FIT_STATS_LABELS.length, 2));
    expect(result('areas', 'CHECKS', 20, 6)).toEqual(result('block', 'CHECKS', 20, 6));
    // And they are the fit of the 11 complete rows, as the engine computes it on those rows alone.
    const complete = y.map((_, i) => i).filter((i) => ![BLANK_Y, BLANK_A, MISSING_B].includes(i));
    const fit = fitModel({ y: complete.map((i) => y[i]), x: complete.map((i) => x[i]) });
    expect(terms.slice(1).map((r) => r[1])).toEqual(fit.terms.map((t) => t.estimate));
    expect(result('areas', 'FITSTATS', 2, 2)).toEqual([
      ['Rows used', 11],
      ['Rows skipped', 3],
    ]);
  });

  it('numbers the residual table by worksheet row and charts observed against fitted from it', () => {
    const table = result('areas', 'RESIDUALS', 12, 3);
    expect(table[0]).toEqual(['Row', 'Observed', 'Fitted']);
    expect(table.slice(1).map((r) => r[0])).toEqual([5, 7, 8, 9, 11, 12, 13, 15, 16, 17, 18]);
    expect(table.slice(1).map((r) => r[1])).toEqual([0, 2, 3, 4, 6, 7, 8, 10, 11, 12, 13].map((i) => y[i]));
    expect(table).toEqual(result('block', 'RESIDUALS', 12, 3));
    const observed = model.charts(reports.areas.sheet).find((c) => c.name === 'ObservedVsFitted');
    const planned = reports.areas.plan.charts.find((c) => c.name === 'ObservedVsFitted');
    expect(observed?.series).toHaveLength(planned?.series.length ?? -1);
    expect(observed?.series[0].y?.sheet).toBe(reports.areas.sheet);
  });
});

/**
 * Issue 14: a column without a header is named by its worksheet column, and the pane's names are
 * the ones the live report's own PLUMB functions print. The report reads one block where it is
 * (names of the data sheet); it gathers separate areas onto its sheet from column Y, where the
 * functions see only that sheet's columns, so the pane names a gathered headerless column by its
 * column there.
 */
describe('column names without headers, pane and live report alike', () => {
  let model: PreviewWorkbook;
  const terms: Record<string, { pane: string[]; report: unknown[] }> = {};

  async function namesOf(name: string, choices: PaneChoices): Promise<void> {
    const { sheet, plan: planned, analysis } = await writeLiveReportFor(choices);
    const anchor = planned.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.TERMS('));
    if (anchor === undefined) throw new Error('no TERMS');
    const count = analysis.frame.termNames.length;
    terms[name] = {
      pane: analysis.frame.termNames,
      report: Array.from({ length: count }, (_, i) => model.valueAt({ sheet, row: anchor.row + 1 + i, column: anchor.column })),
    };
  }

  beforeAll(async () => {
    model = await plumbPreview('Bare');
    // 'Bare': no header row; y in A, a in B, notes in C, b in D, from sheet row 4. 'BareBlock': y, a, b in A:C.
    // 'Titled': as 'Bare' under a header row whose cell over b is blank.
    const rows = y.map((_, i) => [cell(i, 0), cell(i, 1), `batch ${i + 1}`, cell(i, 2)]);
    model.setInputs('Bare', 3, 0, rows);
    model.addSheet('BareBlock');
    model.setInputs(
      'BareBlock',
      3,
      0,
      rows.map((r) => [r[0], r[1], r[3]]),
    );
    model.addSheet('Titled');
    model.setInputs('Titled', 3, 0, [['Yield', 'Temp', 'note', ''], ...rows]);
    await namesOf('block', { ...EMPTY_CHOICES, response: 'BareBlock!A4:A17', predictors: 'BareBlock!B4:C17' });
    await namesOf('areas', { ...EMPTY_CHOICES, response: 'Bare!A4:A17', predictors: 'Bare!B4:B17,Bare!D4:D17' });
    await namesOf('titled areas', { ...EMPTY_CHOICES, response: 'Titled!A4:A18', predictors: 'Titled!B4:B18,Titled!D4:D18' });
    await namesOf('titled block', { ...EMPTY_CHOICES, response: 'Titled!A4:A18', predictors: 'Titled!D4:D18' });
  }, 60_000);

  it('names one block read in place by the data sheet’s columns, in the pane and the report', () => {
    expect(terms.block.pane).toEqual(['Intercept', 'column B', 'column C']);
    expect(terms.block.report).toEqual(terms.block.pane);
    expect(terms['titled block'].pane).toEqual(['Intercept', 'column D']);
    expect(terms['titled block'].report).toEqual(terms['titled block'].pane);
  });

  it('names gathered areas by the report sheet’s columns, in the pane and the report', () => {
    expect(terms.areas.pane).toEqual(['Intercept', 'column Y', 'column Z']);
    expect(terms.areas.report).toEqual(terms.areas.pane);
    expect(terms['titled areas'].pane).toEqual(['Intercept', 'Temp', 'column Z']);
    expect(terms['titled areas'].report).toEqual(terms['titled areas'].pane);
  });
});
