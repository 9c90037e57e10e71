/**
 * How `charts.add` turns a source range into scatter series, only as far as the docs say:
 * "Present your data in a scatter chart or a line chart" (Microsoft Support) puts the X values
 * in the first column and Y values in the adjacent ones, and Excel.ChartSeriesBy says "auto"
 * guesses on desktop and means "columns" on the web. The rest is Excel's own rule and the preview
 * makes it plainly different so code cannot come to rely on it: only series in columns are made
 * (Auto and Rows are refused), a first row of text is never taken as series names (every cell is
 * data), and series are "SeriesN". Code that needs particular series adds them with
 * chart.series.add (ExcelApi 1.7).
 */
import type { ChartSeriesSource, RangeRef } from '../workbook/types';

export function seriesFromColumns(ref: RangeRef): ChartSeriesSource[] {
  const count = ref.right - ref.left + 1;
  const column = (i: number): RangeRef => ({ ...ref, left: ref.left + i, right: ref.left + i });
  const x = count === 1 ? null : column(0);
  const firstY = count === 1 ? 0 : 1;
  return Array.from({ length: count - firstY }, (_, k) => ({ name: `Series${k + 1}`, x, y: column(k + firstY), chartType: 'XYScatter' }));
}
