/**
 * The report writer's charts against the preview host's Excel API shim in Node: each chart gets
 * the series its plan names, points first, guide lines as series of their own chart type, and the
 * planned axis bounds. Microsoft Learn: "Excel.ChartSeriesCollection class" (add), "Excel.ChartSeries
 * class" (setXAxisValues, setValues, chartType: "the chart type of a series", ExcelApi 1.7) and
 * "Excel.ChartAxis class" (minimum, maximum: "a numeric value or an empty string (for automatic
 * axis values)", ExcelApi 1.1).
 */
import { describe, expect, it } from 'vitest';
import type { RangeRef } from '../../../src/addressing/a1';
import { plotChart } from '../../../src/preview/workbook/chartData';
import { writeReport } from '../../../src/taskpane/excel/writeReport';
import { planReportCharts } from '../../../src/taskpane/model/reportCharts';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { freshHost } from '../../preview/shim/harness';

function chartsPlan(sheet: string): ReportPlan {
  const column = (left: number, top = 40): RangeRef => ({ sheet, top, bottom: top + 3, left, right: left });
  const { charts, cells } = planReportCharts(
    {
      responseName: 'Yield',
      residuals: { row: column(0), observed: column(1), fitted: column(2), residual: column(3), cooksDistance: column(7) },
      qq: { normalQuantile: column(19, 3), studentized: column(20, 3) },
      dataRows: { first: 2, last: 5 },
      now: { observed: [41, 57.5], fitted: [43, 55] },
    },
    { guides: { sheet, row: 30, column: 23 }, corners: (i) => ({ topLeft: `K${4 + 18 * i}`, bottomRight: `R${21 + 18 * i}` }) },
  );
  // The residual table's Row, Observed and Fitted values, as PLUMB.RESIDUALS would spill them.
  const table = [
    [2, 44, 45],
    [3, 52.5, 50],
    [4, 61, 58],
    [5, 47, 48],
  ].flatMap((values, i) => values.map((value, c) => ({ row: 40 + i, column: c, kind: 'value' as const, value })));
  return { cells: [...cells, ...table], formats: [], charts, specification: 'test' };
}

describe('writeReport charts', () => {
  it('adds the points, then each guide line as a line without markers over its guide cells', async () => {
    // Syncs that take time, as a real host's do, so every step must await the one before.
    const { model } = freshHost({ syncDelayMs: 1 });
    const name = await writeReport(chartsPlan);
    const charts = model.charts(name);
    const planned = chartsPlan(name).charts;
    expect(charts.map((c) => c.name)).toEqual(planned.map((c) => c.name));
    charts.forEach((chart, i) => {
      expect(chart.series).toEqual(
        planned[i].series.map((s) => ({ name: s.name, x: s.x, y: s.y, chartType: s.drawn === 'line' ? 'XYScatterLinesNoMarkers' : 'XYScatter' })),
      );
      expect(chart.axisTitles).toEqual({ category: planned[i].xAxis.title, value: planned[i].yAxis.title });
    });
    // The observed-vs-fitted guide runs over the fitted values' range, live from the cells.
    const line = plotChart(model, charts[0]).series[1];
    expect(line.drawn).toBe('lines');
    expect(line.runs).toEqual([
      [
        { x: 45, y: 45 },
        { x: 58, y: 58 },
      ],
    ]);
    expect(plotChart(model, charts[3]).series[1].runs).toEqual([
      [
        { x: 2, y: 1 },
        { x: 5, y: 1 },
      ],
    ]);
  });

  it('fixes the planned axis bounds and leaves automatic axes alone', async () => {
    const { model } = freshHost();
    const name = await writeReport(chartsPlan);
    const [observed, residuals, qq] = model.charts(name);
    expect(observed.axisScales).toEqual({ category: { minimum: 40, maximum: 60 }, value: { minimum: 40, maximum: 60 } });
    expect(residuals.axisScales).toEqual({ category: { minimum: 40, maximum: 60 }, value: { minimum: null, maximum: null } });
    expect(qq.axisScales).toEqual({ category: { minimum: null, maximum: null }, value: { minimum: null, maximum: null } });
  });
});
