/**
 * Excel.RangeFormat, RangeFont and RangeFill as the Excel JavaScript API reference describes them
 * (Microsoft Learn): columnWidth in points and null when the columns differ, font.bold null when
 * mixed, fill.color as an HTML colour code.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { normalizeColor } from '../../../src/preview/shim/colors';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, NOT_LOADED, officeError, thrownOfficeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
  model.addSheet('Report');
});

const at = (row: number, column: number) => ({ sheet: 'Report', row, column });

async function onRange<T>(address: string, batch: (range: Excel.Range, context: Excel.RequestContext) => Promise<T>): Promise<T> {
  return Excel.run(async (context) => batch(context.workbook.worksheets.getItem('Report').getRange(address), context));
}

describe('font.bold', () => {
  it('sets bold on every cell and reads it back after load and sync', async () => {
    await onRange('A1:B1', async (range, context) => {
      range.format.font.bold = true;
      await context.sync();
    });
    expect(model.styleAt(at(0, 0)).bold).toBe(true);
    expect(model.styleAt(at(0, 1)).bold).toBe(true);
    expect(model.styleAt(at(1, 0)).bold).toBe(false);
    const bold = await onRange('A1:B1', async (range, context) => {
      range.format.font.load('bold');
      await context.sync();
      return range.format.font.bold;
    });
    expect(bold).toBe(true);
  });

  it('reads null over cells that differ, and false where never set', async () => {
    model.setStyle({ sheet: 'Report', top: 0, left: 0, bottom: 0, right: 0 }, { bold: true });
    const read = (address: string) =>
      onRange(address, async (range, context) => {
        range.load('format/font/bold');
        await context.sync();
        return range.format.font.bold;
      });
    expect(await read('A1:A2')).toBeNull();
    expect(await read('C3')).toBe(false);
  });

  it('throws PropertyNotLoaded when read before load and sync', async () => {
    await onRange('A1', async (range, context) => {
      await context.sync();
      const error = thrownOfficeError(() => range.format.font.bold);
      expect(error.code).toBe('PropertyNotLoaded');
      expect(error.message).toBe(NOT_LOADED('bold'));
    });
  });

  it('rejects a value that is not a boolean', async () => {
    const error = await officeError(
      onRange('A1', async (range, context) => {
        range.format.font.bold = 'yes' as unknown as boolean;
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(error.debugInfo.errorLocation).toBe('RangeFont.bold');
  });
});

describe('fill', () => {
  it('stores the colour as #RRGGBB and reads white where there is no fill', async () => {
    await onRange('B2', async (range, context) => {
      range.format.fill.color = '#0f766e';
      await context.sync();
    });
    expect(model.styleAt(at(1, 1)).fill).toBe('#0F766E');
    const colours = await onRange('B2', async (range, context) => {
      const blank = range.getOffsetRange(1, 0).format.fill.load('color');
      range.format.fill.load('color');
      await context.sync();
      return [range.format.fill.color, blank.color];
    });
    expect(colours).toEqual(['#0F766E', '#FFFFFF']);
  });

  it('reads null over cells with different fills', async () => {
    model.setStyle({ sheet: 'Report', top: 0, left: 0, bottom: 0, right: 0 }, { fill: '#FFA500' });
    const mixed = await onRange('A1:A2', async (range, context) => {
      const fill = range.format.fill.load('color');
      await context.sync();
      return fill.color;
    });
    expect(mixed).toBeNull();
  });

  it('rejects a colour it cannot read', async () => {
    const error = await officeError(
      onRange('A1', async (range, context) => {
        range.format.fill.color = 'teal-ish';
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(model.styleAt(at(0, 0)).fill).toBeNull();
  });

  it.each([
    ['#0f766e', '#0F766E'],
    ['FFA500', '#FFA500'],
    ['orange', '#FFA500'],
    [' White ', '#FFFFFF'],
    ['#fff', undefined],
    ['', undefined],
    [12, undefined],
  ])('reads %j as %j', (input, expected) => {
    expect(normalizeColor(input)).toBe(expected);
  });
});

describe('column widths', () => {
  it('sets every column of the range in points and reads a common width back', async () => {
    const width = await onRange('B1:C5', async (range, context) => {
      range.format.columnWidth = 120;
      range.format.load('columnWidth');
      await context.sync();
      return range.format.columnWidth;
    });
    expect(width).toBe(120);
    expect([model.columnWidth('Report', 0), model.columnWidth('Report', 1), model.columnWidth('Report', 2)]).toEqual([78, 120, 120]);
  });

  it('reads null when the columns differ', async () => {
    model.setColumnWidth('Report', 0, 0, 40);
    const width = await onRange('A1:B1', async (range, context) => {
      range.format.load('columnWidth');
      await context.sync();
      return range.format.columnWidth;
    });
    expect(width).toBeNull();
  });

  it('rejects a negative width', async () => {
    const error = await officeError(
      onRange('A1', async (range, context) => {
        range.format.columnWidth = -5;
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
  });
});

describe('clear', () => {
  it("'Formats' resets bold, fill and wrapping but keeps values and column widths", async () => {
    model.setInputs('Report', 0, 0, [['Term']]);
    model.setStyle({ sheet: 'Report', top: 0, left: 0, bottom: 0, right: 0 }, { bold: true, fill: '#FFA500', wrap: true });
    model.setColumnWidth('Report', 0, 0, 150);
    await onRange('A1', async (range, context) => {
      range.clear('Formats');
      await context.sync();
    });
    expect(model.styleAt(at(0, 0))).toEqual({ bold: false, fill: null, wrap: false });
    expect(model.valueAt(at(0, 0))).toBe('Term');
    expect(model.columnWidth('Report', 0)).toBe(150);
  });

  it("'Contents' keeps the style", async () => {
    model.setStyle({ sheet: 'Report', top: 0, left: 0, bottom: 0, right: 0 }, { bold: true });
    await onRange('A1', async (range, context) => {
      range.clear('Contents');
      await context.sync();
    });
    expect(model.styleAt(at(0, 0)).bold).toBe(true);
  });
});

describe('formatting the preview lacks', () => {
  it('fails loudly instead of being silently ignored', async () => {
    await onRange('A1', async (range) => {
      const error = thrownOfficeError(() => {
        range.format.horizontalAlignment = 'Right';
      });
      expect(error.code).toBe('ApiNotFound');
      expect(error.message).toBe('RangeFormat.horizontalAlignment is not available in the preview workbook.');
      expect(thrownOfficeError(() => range.format.font.italic).code).toBe('ApiNotFound');
      expect(thrownOfficeError(() => range.format.wrapText).code).toBe('ApiNotFound');
    });
  });
});
