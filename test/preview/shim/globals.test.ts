/**
 * The Office and CustomFunctions globals as @types/office-js and @types/custom-functions-runtime
 * declare them, and Office.onReady as Microsoft's "Initialize your Office Add-in" describes it.
 */
import { describe, expect, it, vi } from 'vitest';
import { toCellError } from '../../../src/functions/cellError';
import { freshWorkbook } from './harness';

describe('Office', () => {
  it('onReady resolves with Excel on the web and calls the callback with the same', async () => {
    freshWorkbook();
    const callback = vi.fn();
    const info = await Office.onReady(callback);
    expect(info).toEqual({ host: 'Excel', platform: 'OfficeOnline' });
    expect(callback).toHaveBeenCalledWith(info);
  });
});

describe('CustomFunctions', () => {
  it('associate(id, fn) registers the upper-cased id in the model and tells the host', () => {
    const registered: string[] = [];
    const model = freshWorkbook((id) => registered.push(id));
    // Excel calls an associated id under the add-in's namespace, here PLUMB.
    CustomFunctions.associate('twice', (x: number) => 2 * x);
    model.setInputs('Sheet1', 0, 0, [[21, '=PLUMB.TWICE(A1)']]);
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 1 })).toBe(42);
    expect(registered).toEqual(['TWICE']);
  });

  // "Handle and return errors from your custom function": custom messages show only with #VALUE! and #N/A.
  it('Error carries its code and message, and a thrown one shows in the cell (its message only for #VALUE! and #N/A)', () => {
    const model = freshWorkbook();
    const error = new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable, 'No rows.');
    expect([error.code, error.message]).toEqual(['#N/A', 'No rows.']);
    CustomFunctions.associate('FAILS', () => {
      throw new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber, 'Too few rows.');
    });
    CustomFunctions.associate('MISSING', () => {
      throw new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable, 'No rows.');
    });
    model.setInputs('Sheet1', 0, 0, [['=PLUMB.FAILS()'], ['=PLUMB.MISSING()']]);
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toEqual({ error: '#NUM!' });
    expect(model.valueAt({ sheet: 'Sheet1', row: 1, column: 0 })).toEqual({ error: '#N/A', message: 'No rows.' });
  });

  it('ErrorCode has the codes Excel shows', () => {
    freshWorkbook();
    expect({ ...CustomFunctions.ErrorCode }).toEqual({
      invalidValue: '#VALUE!',
      notAvailable: '#N/A',
      divisionByZero: '#DIV/0!',
      invalidNumber: '#NUM!',
      nullReference: '#NULL!',
      invalidName: '#NAME?',
      invalidReference: '#REF!',
    });
  });

  it("is what the add-in's error adapter builds once installed", () => {
    freshWorkbook();
    const cellError = toCellError(new Error('boom'));
    expect(cellError).toBeInstanceOf(CustomFunctions.Error);
    expect(cellError.code).toBe('#VALUE!');
  });
});

describe('OfficeExtension', () => {
  it('exposes the Error class that a failed sync rejects with', async () => {
    freshWorkbook();
    const failed = Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Missing');
      await context.sync();
    });
    await expect(failed).rejects.toBeInstanceOf(OfficeExtension.Error);
  });
});
