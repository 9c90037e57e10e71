/**
 * Freeze a copy against the strict preview host: a report bigger than one 5 MB response
 * ("Resource limits and performance optimization for Office Add-ins") is copied block by block,
 * the copy waits for a cell edit to end rather than failing ("Excel.RunOptions",
 * delayForCellEdit), and a failed step leaves no copy behind.
 */
import { describe, expect, it } from 'vitest';
import { PAYLOAD_LIMIT_BYTES } from '../../../src/preview/shim/hostSettings';
import { freezeActiveReport } from '../../../src/taskpane/excel/freezeCopy';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { afterPendingWork, freshHost } from '../../preview/shim/harness';

const NOW = new Date('2026-01-02T03:04:00Z');

/** A report-like sheet: its title in A1, a text label per row and eleven long numbers. */
function bigReport(model: PreviewWorkbook, rows: number): (i: number, j: number) => number {
  const value = (i: number, j: number) => (i * 11 + j + 1) / 7 + 1e-3;
  model.addSheet('Plumbline report');
  model.setInputs('Plumbline report', 0, 0, [['Plumbline report: invented'], ...Array.from({ length: rows }, (_, i) => [`label ${i}`, ...Array.from({ length: 11 }, (_, j) => value(i, j))])]);
  model.setNumberFormats('Plumbline report', 1, 0, Array.from({ length: rows }, () => ['@', ...Array.from({ length: 11 }, () => '0.000')]));
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
    // The copy starts in row 4, below the stamp.
    for (const i of [0, 7_000, rows - 1]) {
      expect(model.valueAt({ sheet: name, row: 4 + i, column: 0 })).toBe(`label ${i}`);
      expect(model.numberFormatAt({ sheet: name, row: 4 + i, column: 0 })).toBe('@');
      expect(model.valueAt({ sheet: name, row: 4 + i, column: 11 })).toBe(value(i, 10));
      expect(model.numberFormatAt({ sheet: name, row: 4 + i, column: 11 })).toBe('0.000');
    }
    expect(model.valueAt({ sheet: name, row: 3, column: 0 })).toBe('Plumbline report: invented');
    expect(model.usedExtent(name)).toEqual({ rows: rows + 4, columns: 12 });
  });

  it('keeps every cell in its column when whole blocks of columns are blank, as beside a residual table', async () => {
    const { model } = freshHost();
    model.addSheet('Plumbline report');
    model.setInputs('Plumbline report', 0, 0, [['Plumbline report: invented']]);
    model.setInputs('Plumbline report', 9, 10, [[11, 1.5, -0.25], [12, 2.5, 0.75]]);
    model.activateSheet('Plumbline report');
    const name = await freezeActiveReport(NOW);
    expect(model.valueAt({ sheet: name, row: 3, column: 0 })).toBe('Plumbline report: invented');
    expect([10, 11, 12].map((column) => model.valueAt({ sheet: name, row: 12, column }))).toEqual([11, 1.5, -0.25]);
    expect([10, 11, 12].map((column) => model.valueAt({ sheet: name, row: 13, column }))).toEqual([12, 2.5, 0.75]);
    expect(model.usedExtent(name)).toEqual({ rows: 14, columns: 13 });
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
