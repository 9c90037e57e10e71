/**
 * The report's four charts as data: which PLUMB result cells each series reads, the guide lines
 * drawn over the points, and the axes' bounds. The guide lines are series too, read from a small
 * block of guide cells whose formulas (MIN, MAX, COUNT over the plotted result ranges) keep them
 * in place as the data or the settings change.
 */
import { formatAbsolute, type RangeRef } from '../../addressing/a1';
import { COOKS_NUMERATOR, COOKS_RULE, FLAG_TEXT } from '../../presentation';

/** 'auto': Excel scales the axis itself; otherwise the bounds are fixed when the report is written. */
export type AxisBounds = 'auto' | { minimum: number; maximum: number };

export interface ReportChartAxis {
  title: string;
  bounds: AxisBounds;
}

/** A series of points, or a guide line through its points drawn without markers. */
export interface ReportChartSeries {
  name: string;
  x: RangeRef;
  y: RangeRef;
  drawn: 'points' | 'line';
}

export interface ReportChartPlan {
  name: string;
  title: string;
  /** The points first, then the guide lines over them. */
  series: ReportChartSeries[];
  xAxis: ReportChartAxis;
  yAxis: ReportChartAxis;
  topLeft: string;
  bottomRight: string;
}

/** The cells of the guide block, in the shapes the report's own cells take. */
export type GuideCell =
  { row: number; column: number; kind: 'label'; text: string; bold?: boolean } | { row: number; column: number; kind: 'formula'; formula: string };

/** The plotted PLUMB result columns, data rows only (no header), each one column wide. */
export interface ReportChartSources {
  responseName: string;
  residuals: { row: RangeRef; observed: RangeRef; fitted: RangeRef; residual: RangeRef; cooksDistance: RangeRef };
  qq: { normalQuantile: RangeRef; studentized: RangeRef };
  /** Worksheet row numbers of the first and last data row: every value the Row column can hold. */
  dataRows: { first: number; last: number };
  /** The observed and fitted values as the report is written, for axes Excel would stretch to zero. */
  now: { observed: readonly number[]; fitted: readonly number[] };
}

export interface ReportChartPlacement {
  /** The guide block's top-left cell (zero-based) on the report sheet; it takes 3 columns and 10 rows. */
  guides: { sheet: string; row: number; column: number };
  /** Corners of the chart at `index` (0 observed vs fitted, 1 residuals, 2 Q–Q, 3 Cook's distance). */
  corners: (index: number) => { topLeft: string; bottomRight: string };
}

export interface ReportChartsPlan {
  charts: ReportChartPlan[];
  cells: GuideCell[];
}

/**
 * Excel's automatic scale (Microsoft's knowledge-base article "How Chart Axis Limits Are
 * Determined", as Peltier, "How Excel Calculates Automatic Chart Axis Limits", 2012, restates it):
 * for values all above zero the automatic minimum is 0 unless the lowest is at least 5/6 of the
 * highest (mirrored below zero); the maximum lies one major unit past max + (max − min)/20. An axis
 * that reaches zero or spans it therefore fits its values already, and stays live, so it is left
 * automatic. Otherwise the bounds are fixed here from the values the report is written with: Excel
 * takes an axis's minimum and maximum only as numbers (ChartAxis.minimum/maximum, "" for
 * automatic), never from cells, so they cannot follow later edits; the guide block says so.
 */
const EXCEL_ZERO_RATIO = 5 / 6;
const TICK_TARGET = 5;

/** A step of 1, 2 or 5 times a power of ten giving about `TICK_TARGET` ticks over the span. */
function roundStep(span: number): number {
  const raw = span / TICK_TARGET;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const normalized = raw / magnitude;
  return (normalized <= 1 ? 1 : normalized <= 2 ? 2 : normalized <= 5 ? 5 : 10) * magnitude;
}

/** A multiple of the step, without the binary tail of e.g. 3 × 0.1. */
function onStep(k: number, step: number): number {
  return Number((k * step).toPrecision(12));
}

/** Bounds that fit the values, or 'auto' where Excel's own scale already does. */
export function axisBoundsFor(values: readonly number[]): AxisBounds {
  // A loop, not a spread: a spread over a long column's values would overflow the stack.
  let low = Infinity;
  let high = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    low = Math.min(low, v);
    high = Math.max(high, v);
  }
  if (low > high || (low <= 0 && high >= 0)) return 'auto';
  const fitsAlready = low > 0 ? low >= EXCEL_ZERO_RATIO * high : -high >= EXCEL_ZERO_RATIO * -low;
  if (fitsAlready) return 'auto';
  const span = high - low;
  const pad = span / 20;
  const step = roundStep(span);
  let minimum = onStep(Math.floor((low - pad) / step), step);
  let maximum = onStep(Math.ceil((high + pad) / step), step);
  // Padding never crosses zero: an axis of positive values that reaches 0 is Excel's own choice.
  if (low > 0) minimum = Math.max(0, minimum);
  if (high < 0) maximum = Math.min(0, maximum);
  return minimum === 0 || maximum === 0 ? 'auto' : { minimum, maximum };
}

/** "residuals vs fitted: Fitted 30 to 70", for each axis whose bounds are fixed. */
function fixedAxes(chart: ReportChartPlan): string[] {
  const where = chart.title.split(':')[0];
  return [chart.xAxis, chart.yAxis].flatMap((axis) =>
    axis.bounds === 'auto' ? [] : [`${where}: ${axis.title} ${axis.bounds.minimum} to ${axis.bounds.maximum}`],
  );
}

/** How the note on fixed axes begins, so a frozen copy (which has no charts) can replace it. */
export const AXES_FIXED_NOTE = "Axes fixed when the report was written (Excel's automatic axes would start at 0):";

/**
 * The four charts and their guide cells. Every chart reads PLUMB results only: they skip blank and
 * #N/A rows as the fit does, where a plain reference to the data would chart each blank as 0.
 */
export function planReportCharts(sources: ReportChartSources, placement: ReportChartPlacement): ReportChartsPlan {
  const { residuals, qq } = sources;
  const { sheet, row: top, column: left } = placement.guides;
  const cells: GuideCell[] = [];
  const label = (row: number, column: number, text: string, bold = false) => cells.push({ row, column, kind: 'label', text, bold });
  const formula = (row: number, column: number, text: string) => cells.push({ row, column, kind: 'formula', formula: text });
  const pair = (row: number, column: number): RangeRef => ({ sheet, top: row, bottom: row + 1, left: column, right: column });
  const xColumn = left + 1;
  const yColumn = left + 2;
  const refs = (...ranges: RangeRef[]) => ranges.map(formatAbsolute).join(', ');
  const sameAsX = (row: number) => `=${formatAbsolute({ sheet, top: row, bottom: row, left: xColumn, right: xColumn })}`;

  label(top, left, 'Guide lines on the charts: each runs through its two points', true);
  label(top + 1, left, 'Line');
  label(top + 1, xColumn, 'X');
  label(top + 1, yColumn, 'Y');

  /**
   * A y = x line across the points' horizontal range, so it never stretches the X axis beyond
   * them (one far residual would otherwise squeeze the Q–Q points into a corner).
   */
  const diagonal = (row: number, text: string, horizontal: RangeRef): ReportChartSeries => {
    label(row, left, text);
    formula(row, xColumn, `=MIN(${refs(horizontal)})`);
    formula(row + 1, xColumn, `=MAX(${refs(horizontal)})`);
    formula(row, yColumn, sameAsX(row));
    formula(row + 1, yColumn, sameAsX(row + 1));
    return { name: 'y = x', x: pair(row, xColumn), y: pair(row, yColumn), drawn: 'line' };
  };
  const observedLine = diagonal(top + 2, 'y = x on observed vs fitted', residuals.fitted);
  const qqLine = diagonal(top + 4, 'y = x on the normal Q–Q plot', qq.normalQuantile);

  const cooksRow = top + 6;
  // The Cook's distance screen of src/presentation/thresholds.ts, so the line and the residual table's flags agree.
  const cutoff = `=${COOKS_NUMERATOR}/COUNT(${refs(residuals.row)})`;
  label(cooksRow, left, `${COOKS_RULE} on Cook's distance (n = rows used; the cut-off of the residual table's "${FLAG_TEXT.influential}" flag)`);
  formula(cooksRow, xColumn, `=MIN(${refs(residuals.row)})`);
  formula(cooksRow + 1, xColumn, `=MAX(${refs(residuals.row)})`);
  formula(cooksRow, yColumn, cutoff);
  formula(cooksRow + 1, yColumn, cutoff);
  const cooksLine: ReportChartSeries = { name: COOKS_RULE, x: pair(cooksRow, xColumn), y: pair(cooksRow, yColumn), drawn: 'line' };

  const fittedAndObserved = axisBoundsFor([...sources.now.fitted, ...sources.now.observed]);
  const points = (name: string, x: RangeRef, y: RangeRef): ReportChartSeries => ({ name, x, y, drawn: 'points' });
  const response = sources.responseName.toLowerCase();
  const charts: ReportChartPlan[] = [
    {
      name: 'ObservedVsFitted',
      title: `Observed vs fitted ${response}: points near the line y = x are fitted well`,
      series: [points('Observed', residuals.fitted, residuals.observed), observedLine],
      // One scale on both axes, so y = x runs corner to corner.
      xAxis: { title: 'Fitted', bounds: fittedAndObserved },
      yAxis: { title: 'Observed', bounds: fittedAndObserved },
      ...placement.corners(0),
    },
    {
      name: 'ResidualsVsFitted',
      title: 'Residuals vs fitted: look for curves, funnels and lone points',
      series: [points('Residual', residuals.fitted, residuals.residual)],
      xAxis: { title: 'Fitted', bounds: axisBoundsFor(sources.now.fitted) },
      yAxis: { title: 'Residual', bounds: 'auto' },
      ...placement.corners(1),
    },
    {
      name: 'NormalQQ',
      title: 'Normal Q–Q of studentized residuals: points near the line y = x mean roughly normal',
      series: [points('Studentized residual', qq.normalQuantile, qq.studentized), qqLine],
      xAxis: { title: 'Normal quantile', bounds: 'auto' },
      yAxis: { title: 'Studentized residual', bounds: 'auto' },
      ...placement.corners(2),
    },
    {
      name: 'CooksDistance',
      title: `Cook's distance by row: points above the ${COOKS_RULE} line steer the fit`,
      series: [points("Cook's distance", residuals.row, residuals.cooksDistance), cooksLine],
      // The Row axis is bounded by the data's rows, which do not change with the values.
      xAxis: { title: 'Row', bounds: axisBoundsFor([sources.dataRows.first, sources.dataRows.last]) },
      yAxis: { title: "Cook's distance", bounds: 'auto' },
      ...placement.corners(3),
    },
  ];

  const fixed = charts.flatMap(fixedAxes);
  if (fixed.length > 0) {
    label(top + 9, left, `${AXES_FIXED_NOTE} ${fixed.join('; ')}. Points that move outside them later are not shown; write the report again.`);
  }
  return { charts, cells };
}
