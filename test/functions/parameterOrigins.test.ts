/**
 * Reading invocation.parameterAddresses ("Custom functions parameter options", Detect the address
 * of a parameter): `SheetName!RelativeCellAddress` such as `Costs!D8`; a sheet name with a space
 * or one of the listed characters is quoted, inner quotes doubled (`'Bob''s Region'!F6`). An
 * argument that is no reference has no address. Whole columns (`Data!B:B`, how Excel writes a
 * column selection, contract C10) start at row 1.
 */
import { describe, expect, it } from 'vitest';
import { argumentOrigins, originOf } from '../../src/functions/parameterOrigins';

describe('originOf', () => {
  it.each([
    ['Costs!D8', { sheet: 'Costs', row: 7, column: 3 }],
    ['Data!B1:B61', { sheet: 'Data', row: 0, column: 1 }],
    ['Data!$C$5:$E$9', { sheet: 'Data', row: 4, column: 2 }],
    ["'Latest Prices'!F6", { sheet: 'Latest Prices', row: 5, column: 5 }],
    ["'Bob''s Region'!F6:G9", { sheet: "Bob's Region", row: 5, column: 5 }],
    ['Data!B:B', { sheet: 'Data', row: 0, column: 1 }],
    ['Data!C:E', { sheet: 'Data', row: 0, column: 2 }],
    ['Data!3:5', { sheet: 'Data', row: 2, column: 0 }],
    ['AA10', { row: 9, column: 26 }],
  ])('%s starts at %o', (address, origin) => {
    expect(originOf(address)).toEqual(origin);
  });

  it.each([[''], ['   '], [undefined], [null], [42], ['Data!B1:B5,Data!D1:D5'], ['Temps'], ['Data!A0'], ['Data!XFE1']])('%o has no origin', (address) => {
    expect(originOf(address)).toBeUndefined();
  });
});

describe('argumentOrigins', () => {
  it('reads each argument by its position, and nothing past the addresses given', () => {
    const at = argumentOrigins({ parameterAddresses: ['Data!B2:B9', '', 'Data!D2:E9'] });
    expect(at(0)).toEqual({ sheet: 'Data', row: 1, column: 1 });
    expect(at(1)).toBeUndefined();
    expect(at(2)).toEqual({ sheet: 'Data', row: 1, column: 3 });
    expect(at(5)).toBeUndefined();
  });

  it('without an invocation or its addresses every origin is unknown', () => {
    expect(argumentOrigins(undefined)(0)).toBeUndefined();
    expect(argumentOrigins({})(0)).toBeUndefined();
  });
});
