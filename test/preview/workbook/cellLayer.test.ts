/**
 * The row-wise store of one layer of a sheet's cells: what is set reads back, deleted cells are
 * gone, rows read whole, and the bounds are the smallest rectangle around the cells (common
 * practice (no source): the expectations are worked by hand).
 */
import { describe, expect, it } from 'vitest';
import { CellLayer } from '../../../src/preview/workbook/cellLayer';

describe('cell layer', () => {
  it('reads back what is set, counts cells once, and forgets deleted ones', () => {
    const layer = new CellLayer<number | string>();
    layer.set(4, 2, 'x');
    layer.set(4, 2, 'y');
    layer.set(0, 7, 3);
    expect(layer.get(4, 2)).toBe('y');
    expect(layer.has(0, 7)).toBe(true);
    expect(layer.has(4, 1)).toBe(false);
    expect(layer.size).toBe(2);
    layer.delete(4, 2);
    layer.delete(4, 2);
    expect(layer.get(4, 2)).toBeUndefined();
    expect(layer.row(4)).toBeUndefined();
    expect(layer.size).toBe(1);
    expect([...layer.values()]).toEqual([3]);
  });

  it('gives a row with every column up to its last cell, undefined where empty', () => {
    const layer = new CellLayer<number>();
    layer.set(1, 3, 30);
    layer.set(1, 1, 10);
    expect(layer.row(1)).toEqual([undefined, 10, undefined, 30]);
    layer.delete(1, 3);
    expect(layer.row(1)).toEqual([undefined, 10]);
  });

  it('bounds every cell it holds, and none when empty', () => {
    const layer = new CellLayer<number>();
    expect(layer.bounds()).toBeUndefined();
    layer.set(5, 4, 1);
    layer.set(2, 6, 1);
    layer.set(9, 1, 1);
    expect(layer.bounds()).toEqual({ top: 2, left: 1, bottom: 9, right: 6 });
    layer.delete(9, 1);
    expect(layer.bounds()).toEqual({ top: 2, left: 4, bottom: 5, right: 6 });
  });

  it('empties a block but the cell it keeps, leaving cells beside it, and trims each row once', () => {
    const layer = new CellLayer<number>();
    for (let r = 0; r < 4; r++) for (let c = 0; c < 5; c++) layer.set(r, c, 10 * r + c);
    layer.deleteBlock({ top: 1, left: 1, bottom: 3, right: 4 }, { row: 1, column: 1 });
    expect(layer.size).toBe(5 + 1 + 1 + 1 + 1);
    expect(layer.row(0)).toEqual([0, 1, 2, 3, 4]);
    expect(layer.row(1)).toEqual([10, 11]);
    expect(layer.row(2)).toEqual([20]);
    expect(layer.row(3)).toEqual([30]);
    layer.deleteBlock({ top: 2, left: 0, bottom: 9, right: 9 });
    expect(layer.row(2)).toBeUndefined();
    expect(layer.size).toBe(7);
    expect(layer.bounds()).toEqual({ top: 0, left: 0, bottom: 1, right: 4 });
  });

  it('writes a block row by row but the cell it keeps, and says whether a block holds any cell', () => {
    const layer = new CellLayer<number>();
    layer.set(2, 0, 99);
    layer.setBlock(
      1,
      1,
      [
        [11, 12, 13],
        [21, 22, 23],
      ],
      { row: 1, column: 1 },
    );
    expect(layer.row(1)).toEqual([undefined, undefined, 12, 13]);
    expect(layer.row(2)).toEqual([99, 21, 22, 23]);
    expect(layer.size).toBe(6);
    expect(layer.holdsAny({ top: 0, left: 0, bottom: 1, right: 1 })).toBe(false);
    expect(layer.holdsAny({ top: 2, left: 0, bottom: 2, right: 0 })).toBe(true);
    expect(layer.holdsAny({ top: 2, left: 0, bottom: 2, right: 0 }, { row: 2, column: 0 })).toBe(false);
    expect(layer.holdsAny({ top: 0, left: 3, bottom: 9, right: 9 })).toBe(true);
  });
});
