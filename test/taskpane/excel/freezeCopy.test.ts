/**
 * Freeze a copy against the strict preview host: a report bigger than one 5 MB response
 * ("Resource limits and performance optimization for Office Add-ins") is copied block by block,
 * the copy waits for a cell edit to end rather than failing ("Excel.RunOptions",
 * delayForCellEdit), and a failed step leaves no copy behind.
 */
import { describe, expect, it } from 'vitest';
import { writeLiveReportFor } from '../../support/liveReport';
import { PAYLOAD_LIMIT_BYTES } from '../../../src/preview/shim/hostSettings';
import { freezeActiveReport, frozenText } from '../../../src/taskpane/excel/freezeCopy';
import { AXES_FIXED_NOTE } from '../../../src/taskpane/model/reportCharts';
import { REFRESH_NOTE, VALUES_SETTINGS_HEADING } from '../../../src/taskpane/model/reportSections';
import { valuesNote } from '../../../src/taskpane/model/valuesReportPlan';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import { LIVE_NOTE, LIVE_QQ_LABEL, LIVE_SETTINGS_HEADING, REPORT_TITLE_PREFIX } from '../../../src/taskpane/model/reportPlan';
import { plumbPreview } from '../../support/plumbPreview';
import { randomProblem } from '../../support/random';
import { afterPendingWork, freshHost } from '../../preview/shim/harness';

const NOW = new Date('2026-01-02T03:04:00Z');

/** A report-like sheet: its title in A1, a text label per row and eleven long numbers. */
function bigReport(model: PreviewWorkbook, rows: number): (i: number, j: number) => number {
  const value = (i: number, j: number) => (i * 11 + j + 1) / 7 + 1e-3;
  model.addSheet('Plumbline report');
  model.setInputs('Plumbline report', 0, 0, [
    ['Plumbline report: invented'],
    ...Array.from({ length: rows }, (_, i) => [`label ${i}`, ...Array.from({ length: 11 }, (_, j) => value(i, j))]),
  ]);
  model.setNumberFormats(
    'Plumbline report',
    1,
    0,
    Array.from({ length: rows }, () => ['@', ...Array.from({ length: 11 }, () => '0.000')]),
  );
  model.activateSheet('Plumbline report');
  return value;
}

describe('freezeActiveReport against the strict host', () => {
  it('copies a report of more than 5 MB of values and formats whole, strings under the text format', async () => {
    const { model } = freshHost();
    const rows = 20_000;
    const value = bigReport(model, rows);
    // What one read of the whole report returns: its values and its number formats.
    const values = Array.from({ length: rows }, (_, i) => [`label ${i}`, ...Array.from({ length: 11 }, (_, j) => value(i, j))]);
    const formats = Array.from({ length: rows }, () => ['@', ...Array.from({ length: 11 }, () => '0.000')]);
    expect(JSON.stringify(values).length + JSON.stringify(formats).length).toBeGreaterThan(PAYLOAD_LIMIT_BYTES);
    const name = await freezeActiveReport(NOW);
    expect(name).toBe('Plumbline report values');
    // Every cell at its place in the report, the title once.
    for (const i of [0, 7_000, rows - 1]) {
      expect(model.valueAt({ sheet: name, row: 1 + i, column: 0 })).toBe(`label ${i}`);
      expect(model.numberFormatAt({ sheet: name, row: 1 + i, column: 0 })).toBe('@');
      expect(model.valueAt({ sheet: name, row: 1 + i, column: 11 })).toBe(value(i, 10));
      expect(model.numberFormatAt({ sheet: name, row: 1 + i, column: 11 })).toBe('0.000');
    }
    expect(model.valueAt({ sheet: name, row: 0, column: 0 })).toBe(
      'Plumbline report: invented: frozen copy of "Plumbline report", values as of 2026-01-02 03:04 UTC',
    );
    expect(model.usedExtent(name)).toEqual({ rows: rows + 1, columns: 12 });
  });

  it('keeps every cell in its column when whole blocks of columns are blank, as beside a residual table', async () => {
    const { model } = freshHost();
    model.addSheet('Plumbline report');
    model.setInputs('Plumbline report', 0, 0, [['Plumbline report: invented']]);
    model.setInputs('Plumbline report', 9, 10, [
      [11, 1.5, -0.25],
      [12, 2.5, 0.75],
    ]);
    model.activateSheet('Plumbline report');
    const name = await freezeActiveReport(NOW);
    expect(String(model.valueAt({ sheet: name, row: 0, column: 0 }))).toMatch(/^Plumbline report: invented: frozen copy/);
    expect([10, 11, 12].map((column) => model.valueAt({ sheet: name, row: 9, column }))).toEqual([11, 1.5, -0.25]);
    expect([10, 11, 12].map((column) => model.valueAt({ sheet: name, row: 10, column }))).toEqual([12, 2.5, 0.75]);
    expect(model.usedExtent(name)).toEqual({ rows: 11, columns: 13 });
  });

  it('waits while the user edits a cell, adding no sheet, and copies once the edit ends', async () => {
    const { model } = freshHost();
    bigReport(model, 10);
    const before = model.sheetNames();
    model.setCellEditMode(true);
    const freezing = freezeActiveReport(NOW);
    await afterPendingWork();
    expect(model.sheetNames()).toEqual(before);
    model.setCellEditMode(false);
    expect(await freezing).toBe('Plumbline report values');
  });

  it('removes its copy when a step after the first block fails', async () => {
    const { model } = freshHost();
    bigReport(model, 10);
    const before = model.sheetNames();
    const proto = Excel.Worksheet.prototype;
    const activate = proto.activate;
    proto.activate = () => {
      throw new Error('simulated failure while freezing');
    };
    try {
      await expect(freezeActiveReport(NOW)).rejects.toThrow('simulated failure while freezing');
    } finally {
      proto.activate = activate;
    }
    expect(model.sheetNames()).toEqual(before);
  });
});

describe('freezeActiveReport of a live report', () => {
  // The report written by the pane over invented seeded data, with the real PLUMB functions
  // registered in the preview host (test/support/plumbPreview.ts). Issue #14: the copy must say
  // what it is, show its title once and keep the report's bold headings and number formats.
  it('says it holds values as of its time, shows the title once and keeps bold headings and number formats', async () => {
    const model = await plumbPreview('Data');
    const { y, x } = randomProblem(23, 15, 2);
    model.setInputs('Data', 0, 0, [['Yield', 'Temp', 'Time'], ...y.map((v, i) => [v, ...x[i]])]);
    const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A16', predictors: 'Data!B1:C16' };
    const { sheet: report, plan } = await writeLiveReportFor(choices, NOW);
    model.activateSheet(report);
    const name = await freezeActiveReport(NOW);

    const extent = model.usedExtent(name);
    const texts: string[] = [];
    for (let row = 0; row < extent.rows; row++) {
      for (let column = 0; column < extent.columns; column++) {
        const value = model.valueAt({ sheet: name, row, column });
        if (typeof value === 'string') texts.push(value);
      }
    }
    expect(texts.filter((t) => t.startsWith(REPORT_TITLE_PREFIX))).toEqual([
      'Plumbline report: Yield: frozen copy of "Plumbline report", values as of 2026-01-02 03:04 UTC',
    ]);
    for (const live of [LIVE_NOTE, LIVE_SETTINGS_HEADING, LIVE_QQ_LABEL, 'live formula', 'recalculates']) {
      expect(texts.filter((t) => t.includes(live) && !t.includes('nothing here recalculates'))).toEqual([]);
    }
    expect(model.valueAt({ sheet: name, row: 1, column: 0 })).toContain('Every number below is a value as of 2026-01-02 03:04 UTC, not a formula');

    // Every bold heading, down column A and beside the charts (freezeCopy copies bold from every text cell).
    const bold = plan?.cells.filter((c) => c.kind === 'label' && c.bold === true) ?? [];
    expect(bold.length).toBeGreaterThan(5);
    expect(bold.some((c) => c.column > 0)).toBe(true);
    for (const c of bold) {
      expect({ row: c.row, column: c.column, bold: model.styleAt({ sheet: name, row: c.row, column: c.column }).bold }).toEqual({
        row: c.row,
        column: c.column,
        bold: true,
      });
    }
    const plainLabel = plan?.cells.find((c) => c.kind === 'label' && c.column === 0 && c.bold === false && c.row > 2);
    expect(model.styleAt({ sheet: name, row: plainLabel?.row ?? -1, column: 0 }).bold).toBe(false);
    for (const f of plan?.formats ?? []) {
      const at = { row: f.range.top, column: f.range.left };
      if (typeof model.valueAt({ sheet: report, ...at }) !== 'number') continue;
      expect(model.numberFormatAt({ sheet: name, ...at })).toBe(f.numberFormat);
    }
  }, 60_000);
});

describe('frozenText of a values report', () => {
  // A frozen copy is never refreshed: its text must not promise Refresh, and must say it holds values as of its time.
  it('rewrites the values report’s Refresh wording to say what the copy is', () => {
    const note = frozenText(valuesNote(300_000), '2026-01-02 03:04');
    expect(note).not.toContain(REFRESH_NOTE);
    expect(note).toContain('values as of 2026-01-02 03:04 UTC');
    expect(frozenText(VALUES_SETTINGS_HEADING, '2026-01-02 03:04')).toBe('Settings used (as of 2026-01-02 03:04 UTC; editing them here changes nothing)');
  });

  // The copy has no charts, so the note on the charts' fixed axes (and writing the report again) has no place in it.
  it('replaces the note on the charts’ fixed axes, since the copy has no charts', () => {
    const note = frozenText(
      `${AXES_FIXED_NOTE} X of ObservedVsFitted 14 to 24. Points that move outside them later are not shown; write the report again.`,
      'x',
    );
    expect(note).not.toContain('write the report again');
    expect(note).toContain('The charts stay on the live report');
  });
});
