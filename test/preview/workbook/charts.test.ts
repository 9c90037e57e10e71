/**
 * Charts in the preview workbook: kept per sheet, anchored to their cells, and drawn from their
 * source cells as those cells are now. Expected positions are worked by hand from the 78-point
 * standard column and 18-point row.
 */
import { describe, expect, it, vi } from 'vitest';
import { plotChart } from '../../../src/preview/workbook/chartData';
import type { ChartSeriesSource, NewChart, RangeRef } from '../../../src/preview/workbook/types';
import { createWorkbook } from '../../../src/preview/workbook/workbook';

const ref = (sheet: string, top: number, left: number, bottom: number, right: number): RangeRef => ({ sheet, top, left, bottom, right });

function scatter(series: ChartSeriesSource[], bounds = { left: 234, top: 18, width: 360, height: 216 }): NewChart {
  const automatic = { minimum: null, maximum: null };
  return { type: 'XYScatter', title: null, series, axisTitles: { category: '', value: '' }, axisScales: { category: automatic, value: automatic }, bounds };
}

function setup() {
  const wb = createWorkbook('Data');
  wb.setInputs('Data', 0, 0, [
    ['Steep', 'Yield'],
    [12, 17.5],
    [18, 19.1],
    [24, 21.4],
  ]);
  const series: ChartSeriesSource = { name: ref('Data', 0, 1, 0, 1), x: ref('Data', 1, 0, 3, 0), y: ref('Data', 1, 1, 3, 1), chartType: 'XYScatter' };
  return { wb, series };
}

describe('chart list', () => {
  it('adds charts named Chart 1, Chart 2… with ids, per sheet', () => {
    const { wb, series } = setup();
    wb.addSheet('Other');
    const first = wb.addChart('Data', scatter([series]));
    const second = wb.addChart('Data', scatter([series]));
    const elsewhere = wb.addChart('Other', scatter([series]));
    expect([first.name, second.name, elsewhere.name]).toEqual(['Chart 1', 'Chart 2', 'Chart 1']);
    expect(new Set([first.id, second.id, elsewhere.id]).size).toBe(3);
    expect(wb.charts('Data').map((c) => c.id)).toEqual([first.id, second.id]);
  });

  it('does not reuse a removed chart’s number, and skips a number taken by a renamed chart', () => {
    const { wb, series } = setup();
    const first = wb.addChart('Data', scatter([series]));
    wb.removeChart('Data', first.id);
    expect(wb.addChart('Data', scatter([series])).name).toBe('Chart 2');
    const renamed = wb.addChart('Data', scatter([series]));
    wb.updateChart('Data', renamed.id, { name: 'Chart 4' });
    expect(wb.addChart('Data', scatter([series])).name).toBe('Chart 5');
  });

  it('updates title, axis titles and series, and refuses an unknown id', () => {
    const { wb, series } = setup();
    const { id } = wb.addChart('Data', scatter([series]));
    wb.updateChart('Data', id, { title: 'Yield by steep', axisTitles: { category: 'Steep (h)', value: 'Yield (%)' } });
    expect(wb.charts('Data')[0]).toMatchObject({ title: 'Yield by steep', axisTitles: { category: 'Steep (h)', value: 'Yield (%)' } });
    expect(() => wb.updateChart('Data', 'nope', { title: 'x' })).toThrow();
    expect(() => wb.removeChart('Data', 'nope')).toThrow();
  });

  it('refuses negative or non-finite positions', () => {
    const { wb, series } = setup();
    expect(() => wb.addChart('Data', scatter([series], { left: -1, top: 0, width: 10, height: 10 }))).toThrow();
    const { id } = wb.addChart('Data', scatter([series]));
    expect(() => wb.updateChart('Data', id, { bounds: { left: 0, top: 0, width: Infinity, height: 1 } })).toThrow();
  });

  it('notifies subscribers on add, update and remove', () => {
    const { wb, series } = setup();
    const listener = vi.fn();
    wb.subscribe(listener);
    const { id } = wb.addChart('Data', scatter([series]));
    wb.updateChart('Data', id, { title: 't' });
    wb.removeChart('Data', id);
    expect(listener).toHaveBeenCalledTimes(3);
  });

  it('hands out copies, so a caller cannot change a chart by editing one', () => {
    const { wb, series } = setup();
    wb.addChart('Data', scatter([series]));
    wb.charts('Data')[0].series[0].x = null;
    expect(wb.charts('Data')[0].series[0].x).toEqual(ref('Data', 1, 0, 3, 0));
  });

  it('follows a renamed sheet in its source ranges', () => {
    const { wb, series } = setup();
    wb.addChart('Data', scatter([series]));
    wb.renameSheet('Data', 'Batches');
    const [chart] = wb.charts('Batches');
    expect(chart.series[0].x?.sheet).toBe('Batches');
    expect(plotChart(wb, chart).series[0].points).toHaveLength(3);
  });
});

describe('position', () => {
  it('moves right when a column to its left widens, and stretches when one beneath it does', () => {
    const { wb, series } = setup();
    // Left 234 = three standard columns: the chart starts at D1 and its right edge falls 48 points into H.
    wb.addChart('Data', scatter([series], { left: 234, top: 18, width: 360, height: 216 }));
    wb.setColumnWidth('Data', 0, 0, 100);
    expect(wb.charts('Data')[0].bounds).toEqual({ left: 256, top: 18, width: 360, height: 216 });
    wb.setColumnWidth('Data', 4, 4, 100);
    expect(wb.charts('Data')[0].bounds).toEqual({ left: 256, top: 18, width: 382, height: 216 });
  });
});

describe('plotChart', () => {
  it('reads points, the header name and the automatic title from the cells as they are now', () => {
    const { wb, series } = setup();
    wb.addChart('Data', scatter([series]));
    const before = plotChart(wb, wb.charts('Data')[0]);
    expect(before.title).toBe('Yield');
    expect(before.series[0]).toEqual({
      name: 'Yield',
      drawn: 'markers',
      runs: [],
      points: [
        { x: 12, y: 17.5 },
        { x: 18, y: 19.1 },
        { x: 24, y: 21.4 },
      ],
    });
    wb.setInputs('Data', 2, 1, [[25]]);
    wb.setInputs('Data', 0, 1, [['Extraction yield']]);
    const after = plotChart(wb, wb.charts('Data')[0]);
    expect(after.series[0].points[1]).toEqual({ x: 18, y: 25 });
    expect(after.title).toBe('Extraction yield');
  });

  // From memory: Excel leaves gaps for blank cells and #N/A in a scatter chart, and plots text
  // (also "" returned by a formula) at zero, which is why charted cells must never hold "".
  it('leaves out points whose Y is blank or an error, and plots text Y at zero', () => {
    const { wb, series } = setup();
    wb.setInputs('Data', 1, 1, [[null]]);
    wb.setInputs('Data', 2, 1, [['n/a']]);
    wb.addChart('Data', scatter([series]));
    expect(plotChart(wb, wb.charts('Data')[0]).series[0].points).toEqual([
      { x: 18, y: 0 },
      { x: 24, y: 21.4 },
    ]);
    wb.setInputs('Data', 2, 1, [['=PLUMB.MISSING()']]);
    expect(plotChart(wb, wb.charts('Data')[0]).series[0].points).toEqual([{ x: 24, y: 21.4 }]);
  });

  it('draws a line series as runs of its points, broken at a blank cell, and keeps a renamed sheet in them', () => {
    const { wb, series } = setup();
    wb.setInputs('Data', 2, 1, [[null]]);
    wb.addChart('Data', scatter([series, { ...series, name: 'Guide', chartType: 'XYScatterLinesNoMarkers' }]));
    wb.renameSheet('Data', 'Batches');
    const [points, line] = plotChart(wb, wb.charts('Batches')[0]).series;
    expect(points.drawn).toBe('markers');
    expect(line.drawn).toBe('lines');
    expect(line.runs).toEqual([[{ x: 12, y: 17.5 }], [{ x: 24, y: 21.4 }]]);
  });

  it('passes fixed axis bounds through, null where automatic', () => {
    const { wb, series } = setup();
    const { id } = wb.addChart('Data', scatter([series]));
    wb.updateChart('Data', id, { axisScales: { category: { minimum: 10, maximum: null }, value: { minimum: null, maximum: null } } });
    const plotted = plotChart(wb, wb.charts('Data')[0]);
    expect(plotted.xScale).toEqual({ minimum: 10, maximum: null });
    expect(plotted.yScale).toEqual({ minimum: null, maximum: null });
  });

  it('numbers the points 1, 2, 3… when an X value is text or there are no X values', () => {
    const { wb, series } = setup();
    wb.setInputs('Data', 1, 0, [['early']]);
    wb.addChart('Data', scatter([series, { ...series, name: 'Plain', x: null }]));
    const plotted = plotChart(wb, wb.charts('Data')[0]);
    expect(plotted.series.map((s) => s.points.map((p) => p.x))).toEqual([
      [1, 2, 3],
      [1, 2, 3],
    ]);
    expect(plotted.title).toBe('Chart Title');
    expect(plotted.series[1].name).toBe('Plain');
  });

  it('shows no points once the source sheet is gone', () => {
    const { wb, series } = setup();
    wb.addSheet('Report');
    wb.addChart('Report', scatter([series]));
    wb.deleteSheet('Data');
    expect(plotChart(wb, wb.charts('Report')[0]).series[0].points).toEqual([]);
  });
});
