/**
 * What a chart shows, read live from its cells each time it is asked: the shim answers
 * `title.text` and `series.name` from here and the grid draws from here, so an edit to a source
 * cell reaches the picture without the chart storing any values.
 */
import type { AxisScale, CellValue, ChartSeriesSource, ChartSpec, RangeRef, WorkbookModel } from './types';

export type CellReader = Pick<WorkbookModel, 'valuesIn' | 'hasSheet'>;

export interface PlottedPoint {
  x: number;
  y: number;
}

export interface PlottedSeries {
  name: string;
  /** 'markers' for an XYScatter series, 'lines' for XYScatterLinesNoMarkers. */
  drawn: 'markers' | 'lines';
  points: PlottedPoint[];
  /**
   * For lines, the runs of consecutive points: a blank or error cell breaks the line, as Excel's
   * default for empty cells, "Gaps", does (from memory). Empty for markers.
   */
  runs: PlottedPoint[][];
}

export interface PlottedChart {
  title: string;
  xTitle: string;
  yTitle: string;
  /** Fixed bounds of the horizontal and vertical axes, null where automatic. */
  xScale: AxisScale;
  yScale: AxisScale;
  series: PlottedSeries[];
}

/** Reads across then down, the order Excel takes a one-row or one-column range in. */
export function rangeValues(model: CellReader, ref: RangeRef): CellValue[] {
  if (!model.hasSheet(ref.sheet)) return [];
  return model.valuesIn(ref).flat();
}

function labelOf(value: CellValue): string {
  if (value === null) return '';
  if (typeof value === 'object') return value.error;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  return String(value);
}

export function seriesName(model: CellReader, series: ChartSeriesSource): string {
  if (typeof series.name === 'string') return series.name;
  return rangeValues(model, series.name).map(labelOf).join(' ');
}

/** With one series Excel titles the chart with its name; otherwise with a placeholder. */
export function chartTitle(model: CellReader, chart: ChartSpec): string {
  if (chart.title !== null) return chart.title;
  return chart.series.length === 1 ? seriesName(model, chart.series[0]) : 'Chart Title';
}

export function plotSeries(model: CellReader, series: ChartSeriesSource): PlottedSeries {
  const ys = series.y ? rangeValues(model, series.y) : [];
  const xs = series.x ? rangeValues(model, series.x) : [];
  // Any text among the X values makes Excel number the points 1, 2, 3… instead.
  const numbered = series.x === null || xs.some((x) => x !== null && typeof x !== 'number');
  const points: PlottedPoint[] = [];
  const runs: PlottedPoint[][] = [[]];
  ys.forEach((y, i) => {
    const x = numbered ? i + 1 : xs[i];
    // Blank and error cells leave a gap. Text, "" from a formula included, is plotted at zero
    // (from memory, as Excel does; the reason reports must not chart cells holding "").
    const plotted = typeof y === 'string' ? 0 : y;
    if (typeof plotted === 'number' && typeof x === 'number') {
      points.push({ x, y: plotted });
      runs[runs.length - 1].push({ x, y: plotted });
    } else if (runs[runs.length - 1].length > 0) runs.push([]);
  });
  const drawn = series.chartType === 'XYScatterLinesNoMarkers' ? 'lines' : 'markers';
  return { name: seriesName(model, series), drawn, points, runs: drawn === 'lines' ? runs.filter((r) => r.length > 0) : [] };
}

export function plotChart(model: CellReader, chart: ChartSpec): PlottedChart {
  return {
    title: chartTitle(model, chart),
    xTitle: chart.axisTitles.category,
    yTitle: chart.axisTitles.value,
    xScale: chart.axisScales.category,
    yScale: chart.axisScales.value,
    series: chart.series.map((s) => plotSeries(model, s)),
  };
}
