/** The preview workbook's cell styles and column widths, which the grid draws and the shim reads. */
import { describe, expect, it, vi } from 'vitest';
import { STANDARD_COLUMN_WIDTH } from '../../../src/preview/workbook/layout';
import { createWorkbook } from '../../../src/preview/workbook/workbook';

const cell = (row: number, column: number) => ({ sheet: 'S', row, column });
const range = (top: number, left: number, bottom: number, right: number) => ({ sheet: 'S', top, left, bottom, right });

describe('cell styles', () => {
  it('are plain until set, and a change keeps the members it does not name', () => {
    const wb = createWorkbook('S');
    expect(wb.styleAt(cell(0, 0))).toEqual({ bold: false, fill: null, wrap: false });
    wb.setStyle(range(0, 0, 1, 1), { bold: true });
    wb.setStyle(range(1, 1, 2, 2), { fill: '#CCFBF1' });
    expect(wb.styleAt(cell(0, 0))).toEqual({ bold: true, fill: null, wrap: false });
    expect(wb.styleAt(cell(1, 1))).toEqual({ bold: true, fill: '#CCFBF1', wrap: false });
    expect(wb.styleAt(cell(2, 2))).toEqual({ bold: false, fill: '#CCFBF1', wrap: false });
    expect(wb.styleAt(cell(3, 3))).toEqual({ bold: false, fill: null, wrap: false });
  });

  it('are cleared by clearStyles without touching values or number formats', () => {
    const wb = createWorkbook('S');
    wb.setInputs('S', 0, 0, [[1.5]]);
    wb.setNumberFormats('S', 0, 0, [['0.00']]);
    wb.setStyle(range(0, 0, 0, 0), { bold: true, wrap: true });
    wb.clearStyles(range(0, 0, 0, 0));
    expect(wb.styleAt(cell(0, 0))).toEqual({ bold: false, fill: null, wrap: false });
    expect(wb.valueAt(cell(0, 0))).toBe(1.5);
    expect(wb.numberFormatAt(cell(0, 0))).toBe('0.00');
  });

  it('hand out copies, so a caller cannot change the model by editing one', () => {
    const wb = createWorkbook('S');
    wb.styleAt(cell(0, 0)).bold = true;
    expect(wb.styleAt(cell(0, 0)).bold).toBe(false);
  });

  it('notify subscribers', () => {
    const wb = createWorkbook('S');
    const listener = vi.fn();
    wb.subscribe(listener);
    wb.setStyle(range(0, 0, 0, 0), { bold: true });
    wb.clearStyles(range(0, 0, 0, 0));
    wb.setColumnWidth('S', 0, 0, 10);
    expect(listener).toHaveBeenCalledTimes(3);
  });
});

describe('column widths', () => {
  it('are the standard width until set, per column', () => {
    const wb = createWorkbook('S');
    expect(wb.columnWidth('S', 4)).toBe(STANDARD_COLUMN_WIDTH);
    wb.setColumnWidth('S', 1, 2, 120.75);
    expect([0, 1, 2, 3].map((c) => wb.columnWidth('S', c))).toEqual([STANDARD_COLUMN_WIDTH, 120.75, 120.75, STANDARD_COLUMN_WIDTH]);
  });

  it('refuse negative and non-finite widths', () => {
    const wb = createWorkbook('S');
    expect(() => wb.setColumnWidth('S', 0, 0, -1)).toThrow();
    expect(() => wb.setColumnWidth('S', 0, 0, Number.NaN)).toThrow();
    expect(wb.columnWidth('S', 0)).toBe(STANDARD_COLUMN_WIDTH);
  });

  it('belong to their sheet', () => {
    const wb = createWorkbook('S');
    wb.addSheet('T');
    wb.setColumnWidth('S', 0, 0, 30);
    expect(wb.columnWidth('T', 0)).toBe(STANDARD_COLUMN_WIDTH);
  });
});
