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
    expect(info).toEqual({ host: Office.HostType.Excel, platform: Office.PlatformType.OfficeOnline });
    expect(info.host).toBe('Excel');
    expect(info.platform).toBe('OfficeOnline');
    expect(callback).toHaveBeenCalledWith(info);
  });

  it.each<[string, string | undefined, boolean]>([
    ['ExcelApi', '1.12', true],
    ['ExcelApi', '1.1', true],
    ['ExcelApi', undefined, true],
    ['ExcelApi', '1.13', false],
    ['CustomFunctionsRuntime', '1.3', true],
    ['CustomFunctionsRuntime', '1.4', false],
    ['SharedRuntime', '1.1', true],
    ['SharedRuntime', '1.2', false],
    ['WordApi', '1.1', false],
    ['ExcelApi', 'latest', false],
  ])('isSetSupported(%s, %s) is %s', (name, version, expected) => {
    freshWorkbook();
    expect(Office.context.requirements.isSetSupported(name, version)).toBe(expected);
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

  it('associate(mappings) registers each entry', () => {
    const registered: string[] = [];
    freshWorkbook((id) => registered.push(id));
    CustomFunctions.associate({ One: () => 1, two: () => 2 });
    expect(registered).toEqual(['ONE', 'TWO']);
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
  it('exposes the Error class and codes that add-in code compares against', () => {
    freshWorkbook();
    expect(OfficeExtension.ErrorCodes.propertyNotLoaded).toBe('PropertyNotLoaded');
    expect(Excel.ErrorCodes.itemNotFound).toBe('ItemNotFound');
    expect(typeof OfficeExtension.Error).toBe('function');
  });
});
