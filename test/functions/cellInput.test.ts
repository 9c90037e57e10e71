/**
 * rangeRows checks a range as toCellGrid does, without reading its cells. Common practice (no
 * source): a cheaper check must refuse exactly what the full one refuses.
 */
import { describe, expect, it } from 'vitest';
import { rangeRows, toCellGrid } from '../../src/functions/cellInput';

describe('rangeRows', () => {
  it('gives the rows with their cells as passed, an omitted range as none', () => {
    const error = { code: '#N/A' };
    const range = [['a'], [error]];
    const rows = rangeRows(range, 'predictors');
    expect(rows).toBe(range);
    expect(rows[1][0]).toBe(error);
    expect(rangeRows(null, 'weights')).toEqual([]);
  });

  it('refuses what toCellGrid refuses, in its words', () => {
    for (const bad of [5, [[1], 2], ['ab']] as unknown as unknown[][][]) {
      expect(() => rangeRows(bad, 'weights')).toThrow('weights must be a range of cells.');
      expect(() => toCellGrid(bad, 'weights')).toThrow('weights must be a range of cells.');
    }
  });
});
