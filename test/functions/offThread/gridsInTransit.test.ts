/**
 * Grids crossing to and from the formula worker: what arrives is what was sent, cell for cell,
 * with error values kept by code and message. The expectations are the inputs themselves (common
 * practice (no source)); the structured clone is the platform's (HTML Living Standard,
 * "StructuredSerialize"), applied here by Node's own structuredClone.
 */
import { describe, expect, it } from 'vitest';
import { argumentIn, argumentOut, gridIn, gridOut } from '../../../src/functions/offThread/gridsInTransit';

/** What the worker receives: the value through the structured clone, its buffers transferred. */
function posted<T>(value: T, transfer: ArrayBuffer[]): T {
  return structuredClone(value, { transfer });
}

const errorValue = (code: string, message?: string) => ({ rebuilt: code, message });

describe('range arguments on their way to the worker', () => {
  it('arrive as the same rows: numbers, text, booleans, blanks, and errors by code and message', () => {
    const range = [
      ['y', 'x'],
      [1.5, -0],
      [null, ''],
      [true, { code: '#N/A', message: 'no reading' }],
      [{ type: 'Error', basicValue: '#DIV/0!', errorType: 'Div0' }, 2e-300],
    ];
    const { value, transfer } = argumentOut(range);
    expect(transfer.length).toBe(2);
    const rows = argumentIn(posted(value, transfer)) as unknown[][];
    expect(rows).toEqual([
      ['y', 'x'],
      [1.5, -0],
      [null, ''],
      [true, { code: '#N/A', message: 'no reading' }],
      [{ code: '#DIV/0!', message: undefined }, 2e-300],
    ]);
    expect(Object.is(rows[1][1], -0)).toBe(true);
  });

  it('packs a rectangular range of numbers into one transferred array, leaving the caller its rows', () => {
    const range = Array.from({ length: 300 }, (_, i) => [i, i / 7, -i]);
    const { value, transfer } = argumentOut(range);
    expect(transfer[0].byteLength).toBe(300 * 3 * 8);
    expect(argumentIn(posted(value, transfer))).toEqual(range);
    expect(range[299]).toEqual([299, 299 / 7, -299]);
  });

  it('sends ragged rows, scalars and omitted arguments as they are', () => {
    for (const argument of [[[1], [2, 3]], 0.95, 'HC3', null, undefined, true]) {
      const { value, transfer } = argumentOut(argument);
      expect(argumentIn(posted(value, transfer))).toEqual(argument);
    }
    const { value } = argumentOut({ code: '#REF!' });
    expect(argumentIn(posted(value, []))).toEqual({ code: '#REF!', message: undefined });
  });
});

describe('result grids on their way back', () => {
  it('arrive as the same rows, numeric columns transferred, errors made by the host', () => {
    const grid = [
      ['Term', 'Estimate', 'Note'],
      ['Intercept', 1.25, ''],
      ['x1', -0.5, { code: '#NUM!', message: 'too large' }],
    ];
    const { grid: sent, transfer } = gridOut(grid);
    const back = gridIn(posted(sent, transfer), errorValue);
    expect(back).toEqual([
      ['Term', 'Estimate', 'Note'],
      ['Intercept', 1.25, ''],
      ['x1', -0.5, { rebuilt: '#NUM!', message: 'too large' }],
    ]);
  });

  it('sends an all-number column as a Float64Array, and keeps each row its length', () => {
    const grid = [[1, 2], [3, 4], [5]];
    const { grid: sent, transfer } = gridOut(grid);
    expect(sent.columns[0]).toBeInstanceOf(Float64Array);
    expect(sent.columns[1]).not.toBeInstanceOf(Float64Array);
    expect(transfer.length).toBe(2);
    expect(gridIn(posted(sent, transfer), errorValue)).toEqual(grid);
  });
});
