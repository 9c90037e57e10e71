/**
 * The report's charts as data: each chart's point series and guide lines, the guide cells'
 * formulas (evaluated here in the preview workbook, whose MIN, MAX, COUNT and `/` follow
 * Microsoft Support's function pages: test/preview/workbook/builtins.test.ts), and the axis
 * bounds. Expected bounds are worked by hand from the rule reportCharts.ts states (Excel's
 * automatic minimum is 0 for positive values unless the lowest is at least 5/6 of the highest:
 * Microsoft's knowledge-base article "How Chart Axis Limits Are Determined", as restated by
 * Peltier, "How Excel Calculates Automatic Chart Axis Limits", 2012).
 */
import { describe, expect, it } from 'vitest';
import type { RangeRef } from '../../../src/addressing/a1';
import { residualDiagnostics } from '../../../src/engine';
import { screenCutoffs } from '../../../src/presentation';
import { createWorkbook } from '../../../src/preview/workbook/workbook';
import { axisBoundsFor, planReportCharts, type ReportChartSources } from '../../../src/taskpane/model/reportCharts';
import { randomProblem } from '../../support/random';

const SHEET = 'Plumbline report';
/** A residual-table column (data rows 41 to 60 of the sheet, zero-based 40…59) and Q–Q columns. */
const column = (left: number, top = 40, rows = 20): RangeRef => ({ sheet: SHEET, top, bottom: top + rows - 1, left, right: left });
const RESIDUALS = { row: column(0), observed: column(1), fitted: column(2), residual: column(3), cooksDistance: column(7) };
const QQ = { normalQuantile: column(19, 3), studentized: column(20, 3) };

function sources(now: ReportChartSources['now'] = { observed: [41, 57.5], fitted: [43, 55] }): ReportChartSources {
  return { responseName: 'Yield', residuals: RESIDUALS, qq: QQ, dataRows: { first: 2, last: 21 }, now };
}

const placement = {
  guides: { sheet: SHEET, row: 30, column: 23 },
  corners: (index: number) => ({ topLeft: `K${4 + 18 * index}`, bottomRight: `R${21 + 18 * index}` }),
};

const formulaAt = (cells: ReturnType<typeof planReportCharts>['cells'], row: number, column: number) =>
  cells.find((c) => c.row === row && c.column === column && c.kind === 'formula');

describe('planReportCharts', () => {
  it('plans four charts over the PLUMB result columns, each with its points first', () => {
    const { charts } = planReportCharts(sources(), placement);
    expect(charts.map((c) => c.name)).toEqual(['ObservedVsFitted', 'ResidualsVsFitted', 'NormalQQ', 'CooksDistance']);
    expect(charts.map((c) => [c.series[0].x, c.series[0].y, c.series[0].drawn])).toEqual([
      [RESIDUALS.fitted, RESIDUALS.observed, 'points'],
      [RESIDUALS.fitted, RESIDUALS.residual, 'points'],
      [QQ.normalQuantile, QQ.studentized, 'points'],
      [RESIDUALS.row, RESIDUALS.cooksDistance, 'points'],
    ]);
    expect(charts.map((c) => c.series.slice(1).map((s) => [s.name, s.drawn]))).toEqual([[['y = x', 'line']], [], [['y = x', 'line']], [['4/n', 'line']]]);
    expect(charts[3]).toMatchObject({ topLeft: 'K58', bottomRight: 'R75' });
    expect(charts[0].title).toContain('yield');
  });

  it('points each guide line at two rows of guide cells, X beside Y', () => {
    const { charts } = planReportCharts(sources(), placement);
    const pair = (top: number, left: number): RangeRef => ({ sheet: SHEET, top, bottom: top + 1, left, right: left });
    expect(charts[0].series[1]).toMatchObject({ x: pair(32, 24), y: pair(32, 25) });
    expect(charts[2].series[1]).toMatchObject({ x: pair(34, 24), y: pair(34, 25) });
    expect(charts[3].series[1]).toMatchObject({ x: pair(36, 24), y: pair(36, 25) });
  });

  it('writes the guide cells as live formulas over the plotted ranges', () => {
    const { cells } = planReportCharts(sources(), placement);
    expect(formulaAt(cells, 32, 24)).toMatchObject({ formula: "=MIN('Plumbline report'!$C$41:$C$60)" });
    expect(formulaAt(cells, 33, 24)).toMatchObject({ formula: "=MAX('Plumbline report'!$C$41:$C$60)" });
    expect(formulaAt(cells, 32, 25)).toMatchObject({ formula: "='Plumbline report'!$Y$33" });
    expect(formulaAt(cells, 34, 24)).toMatchObject({ formula: "=MIN('Plumbline report'!$T$4:$T$23)" });
    expect(formulaAt(cells, 35, 24)).toMatchObject({ formula: "=MAX('Plumbline report'!$T$4:$T$23)" });
    expect(formulaAt(cells, 36, 25)).toMatchObject({ formula: "=4/COUNT('Plumbline report'!$A$41:$A$60)" });
    expect(formulaAt(cells, 37, 25)).toMatchObject({ formula: "=4/COUNT('Plumbline report'!$A$41:$A$60)" });
    // Every cell stays inside the block the plan promises: 3 columns, 10 rows.
    expect(cells.every((c) => c.row >= 30 && c.row < 40 && c.column >= 23 && c.column < 26)).toBe(true);
  });

  it("draws the Cook's line where the residual table flags influential rows, live as rows come and go", () => {
    // The flag rule (presentation/thresholds.ts) for a random fit of 20 rows.
    const { y, x } = randomProblem(17, 20, 2);
    const diagnostics = residualDiagnostics({ y, x });
    const { n } = diagnostics;
    const { cells } = planReportCharts(sources(), placement);
    const wb = createWorkbook(SHEET);
    for (const cell of cells) wb.setInputs(SHEET, cell.row, cell.column, [[cell.kind === 'label' ? cell.text : cell.formula]]);
    // The Row column as PLUMB.RESIDUALS fills it: one worksheet row per row used, blank below.
    wb.setInputs(
      SHEET,
      40,
      0,
      Array.from({ length: n }, (_, i) => [i + 2]),
    );
    expect(wb.valueAt({ sheet: SHEET, row: 36, column: 25 })).toBeCloseTo(screenCutoffs(diagnostics).cooksDistance, 15);
    expect([wb.valueAt({ sheet: SHEET, row: 36, column: 24 }), wb.valueAt({ sheet: SHEET, row: 37, column: 24 })]).toEqual([2, n + 1]);
    // A row left out: one fewer used, the line moves up to 4/(n − 1).
    wb.setInputs(SHEET, 45, 0, [[null]]);
    expect(wb.valueAt({ sheet: SHEET, row: 37, column: 25 })).toBeCloseTo(4 / (n - 1), 15);
  });

  it('spans y = x over the points’ horizontal range, ignoring blank and text cells', () => {
    const { cells } = planReportCharts(sources(), placement);
    const wb = createWorkbook(SHEET);
    for (const cell of cells) wb.setInputs(SHEET, cell.row, cell.column, [[cell.kind === 'label' ? cell.text : cell.formula]]);
    wb.setInputs(SHEET, 40, 1, [
      [44, 45],
      [52.5, 50],
      [null, ''],
      [61, 58],
    ]);
    const read = (row: number, column: number) => wb.valueAt({ sheet: SHEET, row, column });
    // Fitted (column C) runs 45 to 58; the observed 44 and 61 lie above and below the line's ends.
    expect([read(32, 24), read(33, 24), read(32, 25), read(33, 25)]).toEqual([45, 58, 45, 58]);
  });

  it('fixes the axes Excel would stretch to zero, says so beside the guides, and leaves the others automatic', () => {
    const { charts, cells } = planReportCharts(sources(), placement);
    // 41 to 57.5 on both axes of observed vs fitted: below 5/6 of the highest, so Excel would start at 0.
    expect(charts[0].xAxis.bounds).toEqual({ minimum: 40, maximum: 60 });
    expect(charts[0].yAxis.bounds).toEqual({ minimum: 40, maximum: 60 });
    // Fitted alone, 43 to 55: span 12, step 5 (about five ticks), padded by 12/20.
    expect(charts[1].xAxis.bounds).toEqual({ minimum: 40, maximum: 60 });
    expect(charts[1].yAxis.bounds).toBe('auto');
    expect([charts[2].xAxis.bounds, charts[2].yAxis.bounds]).toEqual(['auto', 'auto']);
    // Rows 2 to 21 reach down to zero once padded: Excel's own axis is the same.
    expect([charts[3].xAxis.bounds, charts[3].yAxis.bounds]).toEqual(['auto', 'auto']);
    const note = cells.find((c) => c.row === 39 && c.kind === 'label');
    expect(note?.kind === 'label' && note.text).toContain('Observed vs fitted yield: Fitted 40 to 60');
  });

  it('writes no note when every axis is automatic', () => {
    const { cells } = planReportCharts(sources({ observed: [-3, 5], fitted: [-2, 4] }), placement);
    expect(cells.some((c) => c.row === 39)).toBe(false);
  });
});

describe('axisBoundsFor', () => {
  it.each([
    // Positive, lowest below 5/6 of the highest: span 20, step 5, padding 1.
    [[40, 60], { minimum: 35, maximum: 65 }],
    [[12.3, 30.9], { minimum: 10, maximum: 35 }],
    // Mirrored below zero.
    [[-60, -40], { minimum: -65, maximum: -35 }],
    // At least 5/6 of the highest: Excel's automatic axis already fits.
    [[50, 60], 'auto'],
    [[1000, 1060], 'auto'],
    // Spanning zero, padded down to zero, or no numbers at all: automatic.
    [[-3, 4], 'auto'],
    [[2, 61], 'auto'],
    [[Number.NaN, 5, 20], 'auto'],
    [[], 'auto'],
  ])('fits %j with %j', (values, expected) => {
    expect(axisBoundsFor(values)).toEqual(expected);
  });

  it('takes a long column without overflowing the stack', () => {
    const values = Array.from({ length: 300_000 }, (_, i) => 100 + (i % 50));
    // 100 to 149: span 49, step 10, padding 2.45.
    expect(axisBoundsFor(values)).toEqual({ minimum: 90, maximum: 160 });
  });
});
