/**
 * The pure conversions behind Range.values, Range.text and load(): how Excel reads a written
 * string as a typed entry, and how General and simple number formats display a number.
 * Expected texts are Excel's display of these values in a standard-width column, from memory.
 */
import { describe, expect, it } from 'vitest';
import { cellText } from '../../../src/preview/shim/cellText';
import { apiFormula, apiValue, inputFromWrite, KEEP, valueType } from '../../../src/preview/shim/cellValues';
import { parseLoadOption } from '../../../src/preview/shim/loadOptions';

describe('inputFromWrite', () => {
  it.each<[unknown, boolean, unknown]>([
    [null, false, KEEP],
    [undefined, false, KEEP],
    ['', false, null],
    [3, false, 3],
    [false, false, false],
    ['42', false, 42],
    [' -1.5e3 ', false, -1500],
    ['7%', false, 0.07],
    ['true', false, true],
    ['=A1', false, '=A1'],
    ['-A1', false, '=-A1'],
    ['+A1', false, '=+A1'],
    ['-', false, '-'],
    ['1,234', false, '1,234'],
    ['0042', true, '0042'],
    ['=A1', true, '=A1'],
    [Number.NaN, false, undefined],
    [{}, false, undefined],
  ])('%j (text cell: %s) → %j', (written, textCell, expected) => {
    expect(inputFromWrite(written, textCell)).toEqual(expected);
  });
});

describe('reading cells', () => {
  it('maps blanks to "", errors to their text', () => {
    expect([apiValue(null), apiValue({ error: '#N/A' }), apiValue(0), apiValue(false)]).toEqual(['', '#N/A', 0, false]);
    expect([apiFormula(null), apiFormula('=B2'), apiFormula(4)]).toEqual(['', '=B2', 4]);
    expect([valueType(null), valueType(''), valueType(1), valueType('x'), valueType(true), valueType({ error: '#REF!' })]).toEqual([
      'Empty',
      'Empty',
      'Double',
      'String',
      'Boolean',
      'Error',
    ]);
  });
});

describe('Range.text under General', () => {
  it.each<[number, string]>([
    [0, '0'],
    [42, '42'],
    [-3.5, '-3.5'],
    [1 / 3, '0.333333333'],
    [0.1 + 0.2, '0.3'],
    [123456.789123, '123456.7891'],
    [0.0001, '0.0001'],
    [0.00001, '1E-05'],
    [123456789012, '1.23457E+11'],
  ])('%s → %s', (value, expected) => {
    expect(cellText(value, 'General')).toBe(expected);
  });
});

describe('Range.text under a number format', () => {
  it.each<[number, string, string]>([
    [3.14159, '0.00', '3.14'],
    [2.5, '0', '3'],
    // From memory: Excel keeps the sign of a negative value that rounds to zero ("-0.00").
    [-0.001, '0.00', '-0.00'],
    [1234567.891, '#,##0.00', '1,234,567.89'],
    [-1234.5, '#,##0', '-1,235'],
    [0.125, '0.0%', '12.5%'],
    [0.5, '0%', '50%'],
    [12345, '0.00E+00', '1.23E+04'],
    [0.5, 'yyyy-mm-dd', '0.5'],
  ])('%s in %s → %s', (value, format, expected) => {
    expect(cellText(value, format)).toBe(expected);
  });

  it('shows booleans, text and errors as Excel does', () => {
    expect([cellText(true, 'General'), cellText('abc', '0.00'), cellText({ error: '#DIV/0!' }, 'General'), cellText(null, '0')]).toEqual([
      'TRUE',
      'abc',
      '#DIV/0!',
      '',
    ]);
  });
});

describe('parseLoadOption', () => {
  const names = (option: unknown): unknown => {
    const spec = parseLoadOption(option);
    const flatten = (s: typeof spec): unknown => (s.all ? true : Object.fromEntries([...s.members].map(([k, v]) => [k, flatten(v)])));
    return flatten(spec);
  };

  it('reads every form into the same tree', () => {
    const expected = { values: true, worksheet: { name: true } };
    expect(names('values, worksheet/name')).toEqual(expected);
    expect(names(['values', 'worksheet/name'])).toEqual(expected);
    expect(names({ values: true, worksheet: { name: true } })).toEqual(expected);
    expect(names({ select: 'values', expand: 'worksheet/name' })).toEqual(expected);
  });

  it('means everything when called without an argument', () => {
    expect(names(undefined)).toBe(true);
  });

  it('lets a whole member win over one of its parts', () => {
    expect(names('items, items/name')).toEqual({ items: true });
    expect(names({ $top: 5, values: false, address: true })).toEqual({ address: true });
  });
});
