/**
 * How the engine names worksheet places. The form follows "Custom functions parameter options"
 * (Detect the address of a parameter): `Costs!D8`, and `'Latest Prices'!F6` / `'Bob''s Region'!F6`
 * for names that need quotes. The engine cannot import the shared A1 module, so its column
 * letters and quoting are checked against that module's formatRange here.
 */
import { describe, expect, it } from 'vitest';
import { formatRange } from '../../../src/addressing/a1';
import { cellPlace, rowNumber, worksheetAddress } from '../../../src/engine/design/origin';

describe('worksheetAddress', () => {
  it.each([
    ['Costs', 7, 3, 'Costs!D8'],
    ['Latest Prices', 5, 5, "'Latest Prices'!F6"],
    ["Bob's Region", 5, 5, "'Bob''s Region'!F6"],
    ['Data', 0, 25, 'Data!Z1'],
    ['Data', 1_048_575, 16_383, 'Data!XFD1048576'],
    ['A1', 0, 26, "'A1'!AA1"],
  ])('%s row %i column %i is %s', (sheet, row, column, address) => {
    expect(worksheetAddress({ sheet, row, column }, 0, 0)).toBe(address);
    expect(formatRange({ sheet, top: row, left: column, bottom: row, right: column })).toBe(address);
  });

  it('offsets a position inside the range from its top-left cell; no sheet means the address alone', () => {
    expect(worksheetAddress({ sheet: 'Data', row: 8, column: 2 }, 3, 1)).toBe('Data!D12');
    expect(worksheetAddress({ row: 8, column: 2 }, 0, 0)).toBe('C9');
  });
});

describe('cellPlace and rowNumber', () => {
  it('name by address with an origin, by position without', () => {
    expect(cellPlace('predictors', { sheet: 'Data', row: 0, column: 2 }, 4, 0, false)).toBe('predictors cell Data!C5');
    expect(cellPlace('predictors', undefined, 4, 0, false)).toBe('predictors row 5, column 1');
    expect(cellPlace('weights', undefined, 4, 0, true)).toBe('weights row 5');
    expect(rowNumber({ row: 9, column: 0 }, 0)).toBe(10);
    expect(rowNumber(undefined, 0)).toBe(1);
  });
});
