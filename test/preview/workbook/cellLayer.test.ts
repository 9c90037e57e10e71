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
});
