/**
 * Excel.WorksheetCollection and Excel.Worksheet as the Excel JavaScript API reference describes
 * them (Microsoft Learn): look-ups by name, null objects, adding, deleting, used range.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, officeError, thrownOfficeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
});

describe('getItem', () => {
  it('rejects a missing sheet with ItemNotFound at sync, even with nothing loaded', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Missing');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ItemNotFound');
    expect(error.message).toBe("The requested resource doesn't exist.");
    expect(error.debugInfo).toEqual({ code: 'ItemNotFound', message: "The requested resource doesn't exist.", errorLocation: 'WorksheetCollection.getItem' });
  });

  it('finds a sheet whatever the case of the name', async () => {
    const name = await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('SHEET1').load('name');
      await context.sync();
      return sheet.name;
    });
    expect(name).toBe('Sheet1');
  });
});

describe('getItemOrNullObject', () => {
  it('gives a null object for a missing sheet without rejecting', async () => {
    await Excel.run(async (context) => {
      const missing = context.workbook.worksheets.getItemOrNullObject('Missing');
      const present = context.workbook.worksheets.getItemOrNullObject('Sheet1');
      expect(thrownOfficeError(() => missing.isNullObject).code).toBe('PropertyNotLoaded');
      await context.sync();
      expect(missing.isNullObject).toBe(true);
      expect(present.isNullObject).toBe(false);
    });
  });

  it('rejects a write through a null object with ItemNotFound', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItemOrNullObject('Missing').getRange('A1').values = [[1]];
        await context.sync();
      }),
    );
    expect(error.code).toBe('ItemNotFound');
  });
});

describe('add', () => {
  it('adds named sheets and auto-names the rest Sheet2, Sheet3…', async () => {
    await Excel.run(async (context) => {
      const added = context.workbook.worksheets.add();
      context.workbook.worksheets.add('Results');
      const third = context.workbook.worksheets.add();
      added.load('name');
      third.load('name');
      await context.sync();
      expect([added.name, third.name]).toEqual(['Sheet2', 'Sheet4']);
    });
    expect(model.sheetNames()).toEqual(['Sheet1', 'Sheet2', 'Results', 'Sheet4']);
  });

  it('rejects a taken name with ItemAlreadyExists, whatever its case', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.add('sheet1');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ItemAlreadyExists');
    expect(error.message).toBe('The resource already exists.');
    expect(model.sheetNames()).toEqual(['Sheet1']);
  });

  it('rejects a name Excel does not allow with InvalidArgument', async () => {
    expect(
      (
        await officeError(
          Excel.run(async (context) => {
            context.workbook.worksheets.add('a/b');
          }),
        )
      ).code,
    ).toBe('InvalidArgument');
  });

  it('returns a sheet that can be written to in the same batch', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.add('Report').getRange('A1:B1').values = [['Term', 'Estimate']];
    });
    expect(model.valueAt({ sheet: 'Report', row: 0, column: 1 })).toBe('Estimate');
  });
});

describe('items', () => {
  it('lists the sheets after load("items/name")', async () => {
    model.addSheet('Data');
    await Excel.run(async (context) => {
      const sheets = context.workbook.worksheets;
      expect(thrownOfficeError(() => sheets.items).code).toBe('PropertyNotLoaded');
      sheets.load('items/name');
      await context.sync();
      expect(sheets.items.map((sheet) => sheet.name)).toEqual(['Sheet1', 'Data']);
    });
  });

  it('loads every scalar of each sheet with load("items")', async () => {
    model.addSheet('Data');
    await Excel.run(async (context) => {
      const sheets = context.workbook.worksheets.load('items');
      await context.sync();
      expect(sheets.items.map((sheet) => sheet.name)).toEqual(['Sheet1', 'Data']);
    });
  });
});

describe('worksheet', () => {
  it('activates, and getActiveWorksheet reads the active sheet', async () => {
    model.addSheet('Data');
    const name = await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').activate();
      const active = context.workbook.worksheets.getActiveWorksheet().load('name');
      await context.sync();
      return active.name;
    });
    expect(name).toBe('Data');
    expect(model.activeSheet()).toBe('Data');
  });

  it('deletes a sheet; later use of it rejects with ItemNotFound', async () => {
    model.addSheet('Scratch');
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem('Scratch');
        sheet.delete();
        await context.sync();
        expect(model.sheetNames()).toEqual(['Sheet1']);
        sheet.load('name');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ItemNotFound');
  });

  it('refuses to delete the last sheet with InvalidOperation', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Sheet1').delete();
      }),
    );
    expect(error.code).toBe('InvalidOperation');
    expect(model.sheetNames()).toEqual(['Sheet1']);
  });
});

describe('used range', () => {
  // "Excel.Worksheet" getUsedRange: "the smallest range that encompasses any cells that have a
  // value or formatting assigned to them"; with valuesOnly, only cells with values count.
  it('spans the first to the last used cell, counting formatting unless valuesOnly', async () => {
    model.setInputs('Sheet1', 3, 2, [['x']]);
    model.setInputs('Sheet1', 5, 3, [[1]]);
    model.setNumberFormats('Sheet1', 9, 1, [['0.00']]);
    const [all, values] = await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Sheet1');
      const used = [sheet.getUsedRange().load('address'), sheet.getUsedRange(true).load('address')];
      await context.sync();
      return used.map((range) => range.address);
    });
    expect(all).toBe('Sheet1!B4:D10');
    expect(values).toBe('Sheet1!C4:D6');
  });

  it('is A1 on an empty sheet, and a null object through getUsedRangeOrNullObject', async () => {
    await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Sheet1');
      const used = sheet.getUsedRange().load('address');
      const orNull = sheet.getUsedRangeOrNullObject();
      await context.sync();
      expect(used.address).toBe('Sheet1!A1');
      expect(orNull.isNullObject).toBe(true);
    });
  });
});
