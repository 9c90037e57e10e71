/**
 * How `charts.add` turns a source range into scatter series, as Excel does: with series in
 * columns the first column holds X and each further column one series of Y values (rows
 * likewise); a lone column or row is Y alone. A first row (or column) of text names the series.
 */
import { rangeValues, type CellReader } from '../workbook/chartData';
import type { ChartSeriesSource, RangeRef } from '../workbook/types';

export type SeriesBy = 'Auto' | 'Columns' | 'Rows';

export const SERIES_BY: readonly SeriesBy[] = ['Auto', 'Columns', 'Rows'];

/** Excel's automatic choice: series run along the longer side. */
export function seriesInColumns(ref: RangeRef, seriesBy: SeriesBy): boolean {
  if (seriesBy !== 'Auto') return seriesBy === 'Columns';
  return ref.bottom - ref.top >= ref.right - ref.left;
}

export function seriesFromSource(model: CellReader, ref: RangeRef, seriesBy: SeriesBy): ChartSeriesSource[] {
  const byColumns = seriesInColumns(ref, seriesBy);
  const count = byColumns ? ref.right - ref.left + 1 : ref.bottom - ref.top + 1;
  const length = byColumns ? ref.bottom - ref.top + 1 : ref.right - ref.left + 1;
  const line = (i: number, from: number, to: number): RangeRef =>
    byColumns
      ? { sheet: ref.sheet, top: ref.top + from, bottom: ref.top + to, left: ref.left + i, right: ref.left + i }
      : { sheet: ref.sheet, top: ref.top + i, bottom: ref.top + i, left: ref.left + from, right: ref.left + to };
  const firstY = count === 1 ? 0 : 1;
  const isText = (i: number): boolean => {
    const [value] = rangeValues(model, line(i, 0, 0));
    return typeof value === 'string' && value !== '';
  };
  const yLines = Array.from({ length: count - firstY }, (_, k) => k + firstY);
  const header = length > 1 && yLines.every(isText);
  const start = header ? 1 : 0;
  const x = count === 1 ? null : line(0, start, length - 1);
  return yLines.map((i, k) => ({
    name: header ? line(i, 0, 0) : `Series${k + 1}`,
    x,
    y: line(i, start, length - 1),
  }));
}
