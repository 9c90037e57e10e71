/**
 * How a chart's source range becomes scatter series, following Excel's documented layout for
 * XY charts (Microsoft Support, "Present your data in a scatter chart or a line chart"): X values
 * in the first column (or row), Y values in the next. When a first row counts as names is the
 * preview's own rule (every Y column starts with text), not checked against Excel.
 */
import { describe, expect, it } from 'vitest';
import { seriesFromSource, seriesInColumns } from '../../../src/preview/shim/chartSource';
import type { RangeRef } from '../../../src/preview/workbook/types';
import { createWorkbook } from '../../../src/preview/workbook/workbook';

const ref = (top: number, left: number, bottom: number, right: number): RangeRef => ({ sheet: 'S', top, left, bottom, right });

function sheet(cells: (string | number | null)[][]) {
  const wb = createWorkbook('S');
  wb.setInputs('S', 0, 0, cells);
  return wb;
}

describe('seriesFromSource', () => {
  it('reads series down columns with a text header row as names', () => {
    const wb = sheet([
      ['x', 'a', 'b'],
      [1, 2, 3],
      [4, 5, 6],
    ]);
    expect(seriesFromSource(wb, ref(0, 0, 2, 2), 'Columns')).toEqual([
      { name: ref(0, 1, 0, 1), x: ref(1, 0, 2, 0), y: ref(1, 1, 2, 1) },
      { name: ref(0, 2, 0, 2), x: ref(1, 0, 2, 0), y: ref(1, 2, 2, 2) },
    ]);
  });

  it('takes no header when a Y column starts with a number, even if the X column starts with text', () => {
    const wb = sheet([
      ['x', 2],
      [1, 3],
    ]);
    expect(seriesFromSource(wb, ref(0, 0, 1, 1), 'Columns')).toEqual([{ name: 'Series1', x: ref(0, 0, 1, 0), y: ref(0, 1, 1, 1) }]);
  });

  it('reads series along rows, with a text first column as names', () => {
    const wb = sheet([
      ['x', 1, 2, 3],
      ['y', 4, 5, 6],
    ]);
    expect(seriesFromSource(wb, ref(0, 0, 1, 3), 'Rows')).toEqual([{ name: ref(1, 0, 1, 0), x: ref(0, 1, 0, 3), y: ref(1, 1, 1, 3) }]);
  });

  it('plots a lone column as Y values numbered 1, 2, 3…', () => {
    const wb = sheet([['y'], [1], [2]]);
    expect(seriesFromSource(wb, ref(0, 0, 2, 0), 'Auto')).toEqual([{ name: ref(0, 0, 0, 0), x: null, y: ref(1, 0, 2, 0) }]);
  });

  it('chooses columns for a tall range and rows for a wide one when automatic', () => {
    expect(seriesInColumns(ref(0, 0, 60, 1), 'Auto')).toBe(true);
    expect(seriesInColumns(ref(0, 0, 1, 60), 'Auto')).toBe(false);
    expect(seriesInColumns(ref(0, 0, 60, 1), 'Rows')).toBe(false);
  });
});
