/**
 * The load/sync contract of the Excel JavaScript API (Microsoft's Office Add-ins documentation,
 * "Call load() before reading properties" and "Excel.run"): reads exist only after load and
 * sync, writes are queued in order, a failing operation rejects its sync.
 */
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, NOT_LOADED, officeError, thrownOfficeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
  model.addSheet('Data');
  model.setInputs('Data', 0, 0, [
    [1, 'a'],
    [true, null],
  ]);
});

describe('reading before load and sync', () => {
  it('throws PropertyNotLoaded with the real message when never loaded', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:B2');
      await context.sync();
      const error = thrownOfficeError(() => range.values);
      expect(error.code).toBe('PropertyNotLoaded');
      expect(error.message).toBe(NOT_LOADED('values'));
      expect(error.debugInfo.code).toBe('PropertyNotLoaded');
    });
  });

  it('throws when loaded but not yet synced', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:B2');
      range.load('values');
      expect(thrownOfficeError(() => range.values).code).toBe('PropertyNotLoaded');
      await context.sync();
    });
  });

  it('makes only the loaded properties readable after the sync', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:B2');
      range.load('values');
      await context.sync();
      expect(range.values).toEqual([
        [1, 'a'],
        [true, ''],
      ]);
      expect(thrownOfficeError(() => range.address).message).toBe(NOT_LOADED('address'));
    });
  });

  it('keeps the loaded snapshot until the next load', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1');
      range.load('values');
      await context.sync();
      model.setInputs('Data', 0, 0, [[99]]);
      expect(range.values).toEqual([[1]]);
      range.load('values');
      await context.sync();
      expect(range.values).toEqual([[99]]);
    });
  });
});

describe('load arguments', () => {
  it.each<[string, (range: Excel.Range) => void]>([
    ['a comma-separated string', (r) => r.load('values, address')],
    ['an array of names', (r) => r.load(['values', 'address'])],
    ['an object of flags', (r) => r.load({ values: true, address: true })],
    ['select', (r) => r.load({ select: 'values, address' })],
  ])('accepts %s', async (_label, load) => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:B1');
      load(range);
      await context.sync();
      expect(range.values).toEqual([[1, 'a']]);
      expect(range.address).toBe('Data!A1:B1');
    });
  });

  it('loads every scalar with no argument', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('B2');
      range.load();
      await context.sync();
      expect([range.address, range.rowIndex, range.columnIndex, range.rowCount, range.columnCount]).toEqual(['Data!B2', 1, 1, 1, 1]);
    });
  });

  it('follows a navigation path such as format/columnWidth', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('data').getRange('A1');
      range.load('format/columnWidth');
      await context.sync();
      expect(range.format.columnWidth).toBe(78);
    });
  });

  it('rejects a property the preview lacks with ApiNotFound naming it', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Data').getRange('A1').load('hidden');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ApiNotFound');
    expect(error.message).toContain('Range.hidden');
  });
});

describe('writes', () => {
  it('are not applied before the sync', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('C1').values = [[5]];
      expect(model.valueAt({ sheet: 'Data', row: 0, column: 2 })).toBeNull();
      await context.sync();
      expect(model.valueAt({ sheet: 'Data', row: 0, column: 2 })).toBe(5);
    });
  });

  it('apply in the order they were queued', async () => {
    await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Data');
      sheet.getRange('C1:C2').values = [[1], [2]];
      sheet.getRange('C2').values = [[3]];
      sheet.getRange('C1').formulas = [['=C2']];
      await context.sync();
    });
    expect(model.valueAt({ sheet: 'Data', row: 0, column: 2 })).toBe(3);
    expect(model.inputAt({ sheet: 'Data', row: 0, column: 2 })).toBe('=C2');
  });

  it('interleave with reads at their place in the batch', async () => {
    await Excel.run(async (context) => {
      const cell = context.workbook.worksheets.getItem('Data').getRange('A1');
      const before = cell.getOffsetRange(0, 0).load('values');
      cell.values = [[7]];
      const after = cell.getOffsetRange(0, 0).load('values');
      await context.sync();
      expect(before.values).toEqual([[1]]);
      expect(after.values).toEqual([[7]]);
    });
  });

  it('leave a property the add-in set readable after the sync', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('D1:E1');
      range.values = [[1, 2]];
      await context.sync();
      expect(range.values).toEqual([[1, 2]]);
    });
  });

  it('before a failing operation stay applied and the sync rejects', async () => {
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem('Data');
        sheet.getRange('F1').values = [['kept']];
        sheet.getRange('ZZZZ1').values = [['bad']];
        sheet.getRange('F2').values = [['never']];
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(model.valueAt({ sheet: 'Data', row: 0, column: 5 })).toBe('kept');
    expect(model.valueAt({ sheet: 'Data', row: 1, column: 5 })).toBeNull();
  });
});

describe('failures inside the model', () => {
  it('reject as GeneralException, keeping the cause in debugInfo', async () => {
    vi.spyOn(model, 'setInputs').mockImplementation(() => {
      throw new Error('model refused');
    });
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Data').getRange('A1').values = [[2]];
      }),
    );
    expect(error.code).toBe('GeneralException');
    expect(error.message).toBe('There was an internal error while processing the request.');
    expect(error.debugInfo.message).toContain('model refused');
    expect(error.debugInfo.errorLocation).toBe('Range.values');
  });
});

describe('members the preview lacks', () => {
  it('fail with ApiNotFound naming the member instead of a TypeError', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1');
      const error = thrownOfficeError(() => range.format.borders);
      expect(error.code).toBe('ApiNotFound');
      expect(error.message).toBe('RangeFormat.borders is not available in the preview workbook.');
    });
  });
});

describe('Excel.run', () => {
  it('syncs writes still queued when the batch ends', async () => {
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Data').getRange('G1').values = [['last']];
    });
    expect(model.valueAt({ sheet: 'Data', row: 0, column: 6 })).toBe('last');
  });

  it('resolves with what the batch returns', async () => {
    const address = await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1:A2').load('address');
      await context.sync();
      return range.address;
    });
    expect(address).toBe('Data!A1:A2');
  });

  it("rejects with the batch's own error", async () => {
    const failure = new Error('batch failed');
    await expect(
      Excel.run(async () => {
        throw failure;
      }),
    ).rejects.toBe(failure);
  });

  it('rejects a batch that returns no promise', async () => {
    const error = await officeError(Excel.run((() => undefined) as unknown as (context: Excel.RequestContext) => Promise<void>));
    expect(error.code).toBe('RunMustReturnPromise');
  });

  it('continues in the context of an object passed first', async () => {
    await Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem('Data').getRange('A1');
      await Excel.run(range, async (inner) => {
        expect(inner).toBe(context);
      });
    });
  });
});
