/**
 * Ranges read again: equal cells under the same shape, names, first row and intercept give back
 * the very frame of the earlier read, and any difference a frame of its own. Common practice (no
 * source): a memo must return its value for equal inputs only.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type FrameInput } from '../../../src/engine';
import type { HostFrameInput } from '../../../src/engine/design/hostFrame';

const noErrors = (): string | undefined => undefined;
const fresh = (grid: unknown[][]): unknown[][] => grid.map((row) => [...row]);
const y = [['Yield'], [1], [3], [2], [5], [4]];
const x = [
  ['a', 'b'],
  [1, 0.5],
  [2, 0.25],
  [3, 1],
  [4, 0.75],
  [5, 2],
];

function read(yGrid: unknown[][], xGrid: unknown[][], extra: Partial<HostFrameInput> = {}) {
  const asCells = (): FrameInput => {
    throw new Error('all-numeric ranges need no CellValues');
  };
  return buildModelFrame({ y: yGrid, x: [xGrid], intercept: true, errorCodeOf: noErrors, asCells, ...extra });
}

describe('ranges read again', () => {
  it('give the same frame for equal cells in fresh arrays', () => {
    const first = read(fresh(y), fresh(x));
    expect(read(fresh(y), fresh(x))).toBe(first);
  });

  it('give another frame, of the new cells, when any one thing differs', () => {
    const first = read(fresh(y), fresh(x));
    const edited = fresh(x);
    edited[4] = [4, 0.8];
    const afterEdit = read(fresh(y), edited);
    expect(afterEdit).not.toBe(first);
    expect(afterEdit.data.x[3]).toEqual([4, 0.8]);
    // The same cells lower on the sheet number their rows from there.
    const lower = read(fresh(y), fresh(x), { origins: { y: { row: 9, column: 0 } } });
    expect(lower.usedRows).toEqual([11, 12, 13, 14, 15]);
    const noIntercept = read(fresh(y), fresh(x), { intercept: false });
    expect(noIntercept.termNames).toEqual(['a', 'b']);
    const renamed = fresh(x);
    renamed[0] = ['a', 'c'];
    expect(read(fresh(y), renamed).termNames).toEqual(['Intercept', 'a', 'c']);
    // The edited cells, read again, are the latest read of their shape and names.
    const editedAgain = fresh(x);
    editedAgain[4] = [4, 0.8];
    expect(read(fresh(y), editedAgain)).toBe(afterEdit);
  });
});
