/**
 * How a chart's source range becomes scatter series, only as far as the docs say: X values in
 * the first column and Y values in the adjacent ones (Microsoft Support, "Present your
 * data in a scatter chart or a line chart"). Header rows as names are Excel's own rule, which the
 * preview deliberately does not follow, so code that needs named series must add them itself.
 */
import { describe, expect, it } from 'vitest';
import { seriesFromColumns } from '../../../src/preview/shim/chartSource';
import type { RangeRef } from '../../../src/preview/workbook/types';

const ref = (top: number, left: number, bottom: number, right: number): RangeRef => ({ sheet: 'S', top, left, bottom, right });

describe('seriesFromColumns', () => {
  it('reads series down columns: the first column is X, each further column one series of Y', () => {
    expect(seriesFromColumns(ref(0, 0, 2, 2))).toEqual([
      { name: 'Series1', x: ref(0, 0, 2, 0), y: ref(0, 1, 2, 1), chartType: 'XYScatter' },
      { name: 'Series2', x: ref(0, 0, 2, 0), y: ref(0, 2, 2, 2), chartType: 'XYScatter' },
    ]);
  });

  it('plots a lone column as Y values with no X', () => {
    expect(seriesFromColumns(ref(0, 0, 2, 0))).toEqual([{ name: 'Series1', x: null, y: ref(0, 0, 2, 0), chartType: 'XYScatter' }]);
  });
});
