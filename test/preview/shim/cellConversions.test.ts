/**
 * The pure conversions behind Range.values, Range.formulas and load(): how Excel reads a written
 * string as a typed entry, and what a cell reads as.
 */
import { describe, expect, it } from 'vitest';
import { apiFormula, apiValue, inputFromWrite, KEEP } from '../../../src/preview/shim/cellValues';
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
