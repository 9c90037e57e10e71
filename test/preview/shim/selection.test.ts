/**
 * Selections with several areas and whole columns. getSelectedRange throws InvalidSelection when
 * several ranges are selected ("Manage Excel workbooks with the Excel JavaScript API");
 * getSelectedRanges returns a RangeAreas whose address joins each area's sheet-qualified address,
 * with whole columns written "Sheet1!H:H" ("Work with multiple ranges simultaneously in Excel
 * add-ins", example "Sheet1!F3:F5, Sheet1!H:H").
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { MAX_ROWS } from '../../../src/addressing/a1';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, officeError, thrownOfficeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
});

const area = (top: number, left: number, bottom: number, right: number) => ({ sheet: 'Sheet1', top, left, bottom, right });
const wholeColumn = (column: number) => area(0, column, MAX_ROWS - 1, column);

describe('several selected areas', () => {
  beforeEach(() => {
    model.selectAreas([area(1, 1, 8, 1), area(1, 3, 8, 3)]);
  });

  it('make getSelectedRange reject with InvalidSelection', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.getSelectedRange().load('address');
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidSelection');
  });

  it('come back from getSelectedRanges as one RangeAreas with every area in its address', async () => {
    const address = await Excel.run(async (context) => {
      const selected = context.workbook.getSelectedRanges();
      selected.load('address');
      await context.sync();
      return selected.address;
    });
    expect(address).toBe('Sheet1!B2:B9, Sheet1!D2:D9');
  });

  it('follow the load rules: the address is not readable before load and sync', async () => {
    await Excel.run(async (context) => {
      const selected = context.workbook.getSelectedRanges();
      expect(thrownOfficeError(() => selected.address).code).toBe('PropertyNotLoaded');
      selected.load('address');
      await context.sync();
      expect(selected.address).toBe('Sheet1!B2:B9, Sheet1!D2:D9');
    });
  });
});

describe('whole columns', () => {
  it('read back as "Sheet1!B:B" when a column header is selected', async () => {
    model.select(wholeColumn(1));
    const [single, areas] = await Excel.run(async (context) => {
      const range = context.workbook.getSelectedRange().load('address');
      const selected = context.workbook.getSelectedRanges().load('address');
      await context.sync();
      return [range.address, selected.address];
    });
    expect(single).toBe('Sheet1!B:B');
    expect(areas).toBe('Sheet1!B:B');
  });

  it('mix with ordinary areas in one RangeAreas', async () => {
    model.selectAreas([area(2, 5, 4, 5), wholeColumn(7)]);
    const address = await Excel.run(async (context) => {
      const selected = context.workbook.getSelectedRanges().load('address');
      await context.sync();
      return selected.address;
    });
    expect(address).toBe('Sheet1!F3:F5, Sheet1!H:H');
  });

  it('can be asked for by address ("B:B", "$B:$D")', async () => {
    const addresses = await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Sheet1');
      const ranges = [sheet.getRange('B:B').load('address, rowCount'), sheet.getRange('$B:$D').load('address, columnCount')];
      await context.sync();
      return [ranges[0].address, ranges[0].rowCount, ranges[1].address, ranges[1].columnCount];
    });
    expect(addresses).toEqual(['Sheet1!B:B', MAX_ROWS, 'Sheet1!B:D', 3]);
  });
});
