/**
 * The one-pass read of all-numeric ranges must give the frame the general read gives: the same
 * rows, reasons, numbers and names. Each case is worked out by hand in its comments; cases that
 * need a message (text, errors, TRUE, bad weights, no complete row) go through the general path
 * and are checked in modelFrame.test.ts and messages.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type CellGrid, type CellValue } from '../../../src/engine';
import { type NumericCells, readNumericCells } from '../../../src/engine/design/numericCells';

describe('all-numeric ranges', () => {
  it('skip a row at its first blank or #N/A in column order, across blocks and weights', () => {
    // Rows 2–7: row 3 has a blank in b (block 2) and #N/A in y: y comes first. Row 4: "  " in a.
    // Row 5: the text "#n/a" in weight. Row 6: a #N/A error value in b. Rows 2 and 7 are used.
    const frame = buildModelFrame({
      y: [['Out'], [1], [{ errorCode: '#N/A' }], [3], [4], [5], [6]],
      x: [
        [['a'], [10], [20], ['  '], [40], [50], [60]],
        [['b'], [0.5], [null], [1.5], [2], [{ errorCode: '#n/a' }], [3]],
      ],
      xArguments: ['first', 'second'],
      weights: [['w'], [2], [1], [1], ['#n/a'], [1], [4]],
      intercept: false,
      origins: { y: { row: 9, column: 1 } },
    });
    expect(frame.skipped).toEqual([
      { row: 12, reason: '#N/A in Out' },
      { row: 13, reason: 'blank in a' },
      { row: 14, reason: '#N/A in weight' },
      { row: 15, reason: '#N/A in b' },
    ]);
    expect(frame.usedRows).toEqual([11, 16]);
    expect(frame.data.y).toEqual([1, 6]);
    expect(frame.data.x).toEqual([
      [10, 0.5],
      [60, 3],
    ]);
    expect(frame.data.weights).toEqual([2, 4]);
    expect(frame.data.names).toEqual(['a', 'b']);
    expect(frame.termNames).toEqual(['a', 'b']);
    expect(frame.termBlocks).toEqual([0, 1]);
    expect(frame.termColumns).toEqual([0, 1]);
    expect(frame.columns).toEqual([
      { kind: 'numeric', name: 'a' },
      { kind: 'numeric', name: 'b' },
    ]);
  });

  it('give the same frame as the general read once a text column makes the read general', () => {
    // The same numeric columns, once alone and once beside a text column: the shared parts agree.
    const y = [['y'], [1], [2], [null], [4], [5]];
    const a = [['a'], [3], [1], [4], [1], [5]];
    const numeric = buildModelFrame({ y, x: [a], intercept: true });
    const general = buildModelFrame({ y, x: [a, [['g'], ['p'], ['q'], ['p'], ['q'], ['p']]], intercept: true });
    expect(numeric.usedRows).toEqual(general.usedRows);
    expect(numeric.skipped).toEqual(general.skipped);
    expect(numeric.data.y).toEqual(general.data.y);
    expect(numeric.data.x).toEqual(general.data.x.map((row) => row.slice(0, 1)));
  });

  it('leave a range with a non-finite number, TRUE or a bad weight to the general path and its message', () => {
    const y = [['y'], [1], [2], [3]];
    expect(() => buildModelFrame({ y, x: [[['a'], [1], [Number.POSITIVE_INFINITY], [3]]], intercept: true })).toThrow(
      'predictors row 3, column 1 ("a") holds Infinity',
    );
    expect(() => buildModelFrame({ y, x: [[['a'], [1], [true], [3]]], intercept: true })).toThrow('holds TRUE');
    expect(() => buildModelFrame({ y, x: [[['a'], [1], [2], [3]]], weights: [['w'], [1], [0], [1]], intercept: true })).toThrow(
      'weights row 3 is 0; every weight must be a positive number.',
    );
  });
});

describe('a read against the cells an earlier read gave', () => {
  // Rows 2–6 of a header-led range: row 4 blank in a, so rows 2, 3, 5 and 6 are used.
  const y = [['y'], [1], [2], [3], [4], [5]];
  const a = [['a'], [0], [1], [null], [3], [4]];
  const w = [['w'], [1], [1], [2], [2], [3]];
  const names = ['y', 'a', 'weight'];
  const cellErrorCode = (value: object): string | undefined => (value as { errorCode?: string }).errorCode;
  const read = (yGrid: CellGrid, aGrid: CellGrid, expected?: NumericCells, firstRow = 1) =>
    readNumericCells(yGrid, [aGrid], w, 1, names, firstRow, cellErrorCode, expected);
  const expected = read(y, a);
  if (expected === undefined) throw new Error('the all-numeric cells must read');

  it('gives back the expected cells themselves when every cell agrees', () => {
    const copies = [y.map((row) => [...row]), a.map((row) => [...row])];
    expect(read(copies[0], copies[1], expected)).toBe(expected);
  });

  it('reads anew, as without expected cells, at any one difference', () => {
    // A used value changed, 0 written as −0, a blank filled in, a blank that becomes #N/A (another
    // reason), the last row's value changed, and the rows numbered from another first row.
    const edit = (grid: CellGrid, row: number, value: CellValue): CellGrid => grid.map((cells, i) => (i === row ? [value] : cells));
    const variants: [CellGrid, CellGrid, number][] = [
      [edit(y, 2, 2.5), a, 1],
      [y, edit(a, 1, -0), 1],
      [y, edit(a, 3, 2), 1],
      [y, edit(a, 3, '#N/A'), 1],
      [edit(y, 5, 6), a, 1],
      [y, a, 11],
    ];
    for (const [yGrid, aGrid, firstRow] of variants) {
      const again = read(yGrid, aGrid, expected, firstRow);
      expect(again).not.toBe(expected);
      expect(again).toEqual(read(yGrid, aGrid, undefined, firstRow));
      expect(again).not.toEqual(expected);
    }
  });
});
