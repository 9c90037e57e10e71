/**
 * Excel.Range as the Excel JavaScript API reference describes it (Microsoft Learn,
 * Excel.Range): addresses, values and formulas, shapes of writes, derived ranges, selection.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, officeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
  model.addSheet('Data');
});

async function load<K extends keyof Excel.Range>(address: string, property: K, sheet = 'Data'): Promise<Excel.Range[K]> {
  return Excel.run(async (context) => {
    const range = context.workbook.worksheets.getItem(sheet).getRange(address);
    range.load(property);
    await context.sync();
    return range[property];
  });
}

describe('address', () => {
  it('names the sheet and normalises absolute and reversed corners', async () => {
    expect(await load('$C$5:B2', 'address')).toBe('Data!B2:C5');
    expect(await load('b2', 'address')).toBe('Data!B2');
  });

  it('quotes sheet names with spaces or punctuation, doubling inner quotes', async () => {
    model.addSheet('Planned batches');
    model.addSheet("Ann's data");
    expect(await load('B2:E6', 'address', 'Planned batches')).toBe("'Planned batches'!B2:E6");
    expect(await load('A1', 'address', "Ann's data")).toBe("'Ann''s data'!A1");
  });

  it('accepts a sheet-qualified address, quoted or not', async () => {
    model.addSheet('Planned batches');
    expect(await load("'Planned batches'!A1:B2", 'address')).toBe("'Planned batches'!A1:B2");
    expect(await load('Sheet1!C3', 'address')).toBe('Sheet1!C3');
  });

  it.each(['ZZZZ1', 'A0', '1A', 'A1:B2:C3', '', 'XFE1', 'A1048577'])('rejects %j with InvalidArgument at sync', async (address) => {
    const error = await officeError(load(address, 'address'));
    expect(error.code).toBe('InvalidArgument');
    expect(error.message).toBe('The argument is invalid or missing or has an incorrect format.');
    expect(error.debugInfo.errorLocation).toBe('Worksheet.getRange');
  });

  it('rejects an unknown sheet inside the address with InvalidArgument', async () => {
    expect((await officeError(load('Nope!A1', 'address'))).code).toBe('InvalidArgument');
  });

  it('rejects getRange() without an address', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Data').getRange().load('address');
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
  });

  it('reports the size and position, 0-based', async () => {
    const shape = await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('C2:E6');
      range.load('rowCount, columnCount, rowIndex, columnIndex');
      await context.sync();
      return [range.rowCount, range.columnCount, range.rowIndex, range.columnIndex];
    });
    expect(shape).toEqual([5, 3, 1, 2]);
  });
});

describe('values, formulas, numberFormat', () => {
  beforeEach(() => {
    model.setInputs('Data', 0, 0, [
      [1.5, 'text', true],
      [null, '=A1', '=NOSUCH(1)'],
    ]);
  });

  it('reads blanks as "", errors as their text, numbers and booleans as such', async () => {
    const values = await load('A1:C2', 'values');
    expect(values[0]).toEqual([1.5, 'text', true]);
    expect(values[1][0]).toBe('');
    expect(values[1][1]).toBe(1.5);
    expect(values[1][2]).toMatch(/^#[A-Z/0!?]+/);
  });

  it('reads formula text for formula cells and constants otherwise', async () => {
    expect(await load('A1:C2', 'formulas')).toEqual([
      [1.5, 'text', true],
      ['', '=A1', '=NOSUCH(1)'],
    ]);
  });

  it('stores a string starting with "=" as a formula, through values as through formulas', async () => {
    await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Data');
      sheet.getRange('D1').values = [['=A1']];
      sheet.getRange('D2').formulas = [['=C1']];
    });
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 3 })).toBe('=A1');
    expect(model.valueAt({ sheet: 'Data', row: 0, column: 3 })).toBe(1.5);
    expect(model.valueAt({ sheet: 'Data', row: 1, column: 3 })).toBe(true);
  });

  it('reads written strings as typed entries, except in cells formatted as text', async () => {
    model.setNumberFormats('Data', 3, 1, [['@']]);
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('A4:D4').values = [['0042', '12.5%', 'FALSE', 'kept']];
      context.workbook.worksheets.getItem('Data').getRange('B4').values = [['0042']];
    });
    expect([0, 1, 2, 3].map((column) => model.inputAt({ sheet: 'Data', row: 3, column }))).toEqual([42, '0042', false, 'kept']);
  });

  it('leaves a cell alone where the written value is null, and clears it for ""', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('A1:B1').values = [[null, '']];
    });
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 0 })).toBe(1.5);
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 1 })).toBeNull();
  });

  it('rejects values whose dimensions differ from the range with InvalidArgument', async () => {
    for (const values of [[[1, 2]], [[1], [2], [3]], [[1], [2, 3]]]) {
      const error = await officeError(
        Excel.run(async (context) => {
          context.workbook.worksheets.getItem('Data').getRange('E1:E2').values = values;
          await context.sync();
        }),
      );
      expect(error.code).toBe('InvalidArgument');
      expect(error.debugInfo.errorLocation).toBe('Range.values');
    }
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 4 })).toBeNull();
  });

  it('writes and reads number formats', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:A2');
      range.values = [[0.125], [1234.5]];
      range.numberFormat = [['0.0%'], ['#,##0.00']];
    });
    expect(await load('A1:A2', 'numberFormat')).toEqual([['0.0%'], ['#,##0.00']]);
  });
});

describe('derived ranges', () => {
  async function addressOf(derive: (range: Excel.Range) => Excel.Range): Promise<string> {
    return Excel.run(async (context) => {
      const derived = derive(context.workbook.worksheets.getItem('Data').getRange('B2:D5')).load('address');
      await context.sync();
      return derived.address;
    });
  }

  it.each<[string, (range: Excel.Range) => Excel.Range, string]>([
    ['getCell', (r) => r.getCell(1, 2), 'Data!D3'],
    ['getCell outside the range', (r) => r.getCell(5, 0), 'Data!B7'],
    ['getResizedRange', (r) => r.getResizedRange(1, -1), 'Data!B2:C6'],
    ['getOffsetRange', (r) => r.getOffsetRange(-1, 2), 'Data!D1:F4'],
    ['getRow', (r) => r.getRow(3), 'Data!B5:D5'],
    ['chained', (r) => r.getRow(3).getCell(0, 1), 'Data!C5'],
  ])('%s', async (_label, derive, expected) => {
    expect(await addressOf(derive)).toBe(expected);
  });

  it.each<[string, (range: Excel.Range) => Excel.Range]>([
    ['an offset above row 1', (r) => r.getOffsetRange(-2, 0)],
    ['a resize to no rows', (r) => r.getResizedRange(-4, 0)],
  ])('rejects %s with InvalidArgument', async (_label, derive) => {
    expect((await officeError(addressOf(derive))).code).toBe('InvalidArgument');
  });
});

describe('selection', () => {
  it('round-trips through getSelectedRange after select()', async () => {
    const address = await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('B3:C4').select();
      await context.sync();
      const selected = context.workbook.getSelectedRange().load('address');
      await context.sync();
      return selected.address;
    });
    expect(address).toBe('Data!B3:C4');
    expect(model.activeSheet()).toBe('Data');
  });

  it('reads the selection at its place in the batch', async () => {
    await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Data');
      sheet.getRange('A1').select();
      const first = context.workbook.getSelectedRange().load('address');
      sheet.getRange('E5:F6').select();
      const second = context.workbook.getSelectedRange().load('address');
      await context.sync();
      expect([first.address, second.address]).toEqual(['Data!A1', 'Data!E5:F6']);
    });
  });
});

describe('clear', () => {
  beforeEach(() => {
    model.setInputs('Data', 0, 0, [[1, 2]]);
    model.setNumberFormats('Data', 0, 0, [['0.00', '0.00']]);
  });

  it('clears contents and number formats by default', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('A1').clear();
    });
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 0 })).toBeNull();
    expect(model.numberFormatAt({ sheet: 'Data', row: 0, column: 0 })).toBe('General');
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 1 })).toBe(2);
  });

  it('clears only contents when asked', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('A1').clear('Contents');
    });
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 0 })).toBeNull();
    expect(model.numberFormatAt({ sheet: 'Data', row: 0, column: 0 })).toBe('0.00');
  });
});
