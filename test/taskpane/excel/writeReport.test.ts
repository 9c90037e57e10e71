/**
 * The report writer against the preview host's Excel API shim in Node: a new sheet only, labels
 * that stay text whatever they start with, no half-written sheet when a step fails, and charts
 * whose one series each is added and bound explicitly (Microsoft Learn, "Excel.ChartSeriesCollection
 * class": add(name, index), "The new added series is not visible until values, x-axis values, or
 * bubble sizes for it are set"; "Excel.ChartSeries class": setXAxisValues, setValues, delete).
 */
import { describe, expect, it } from 'vitest';
import { writeReport } from '../../../src/taskpane/excel/writeReport';
import type { ReportChartPlan } from '../../../src/taskpane/model/reportCharts';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { afterPendingWork, freshHost, freshWorkbook } from '../../preview/shim/harness';

const plan = (labels: string[]): ReportPlan => ({
  cells: labels.map((text, row) => ({ row, column: 0, kind: 'label', text })),
  formats: [],
  charts: [],
  specification: 'test',
});

describe('writeReport', () => {
  it('writes onto a new uniquely named sheet and keeps =, +, -, @ and tab labels as text', async () => {
    const model = freshWorkbook();
    model.addSheet('Plumbline report');
    const hostile = ['=SUM(1,2)', '+1', '-2', '@x', '\t=tab'];
    const name = await writeReport(() => plan(hostile));
    expect(name).toBe('Plumbline report 2');
    hostile.forEach((text, row) => {
      expect(model.inputAt({ sheet: name, row, column: 0 })).toBe(text);
      expect(model.valueAt({ sheet: name, row, column: 0 })).toBe(text);
    });
    expect(model.inputAt({ sheet: 'Plumbline report', row: 0, column: 0 })).toBeNull();
  });

  it('gives each chart exactly the series its plan names, bound to the planned cells', async () => {
    // Syncs that take time, as a real host's do, so every step must await the one before.
    const { model } = freshHost({ syncDelayMs: 1 });
    const column = (sheet: string, left: number) => ({ sheet, top: 3, bottom: 6, left, right: left });
    const chart = (name: string, x: number, y: number, sheet: string): ReportChartPlan => ({
      name,
      title: `${name} title`,
      series: [{ name: `${name} values`, x: column(sheet, x), y: column(sheet, y), drawn: 'points' }],
      xAxis: { title: 'Fitted', bounds: 'auto' },
      yAxis: { title: `${name} values`, bounds: 'auto' },
      topLeft: 'K4',
      bottomRight: 'R21',
    });
    // The cells under the charts are still empty when the charts are made, as formulas that have
    // not calculated yet leave them.
    const name = await writeReport((sheet) => ({
      ...plan(['title']),
      charts: [chart('ObservedVsFitted', 2, 1, sheet), chart('CooksDistance', 0, 7, sheet)],
    }));
    const charts = model.charts(name);
    expect(charts.map((c) => c.name)).toEqual(['ObservedVsFitted', 'CooksDistance']);
    expect(charts[0].series).toHaveLength(1);
    expect(charts[0].series[0]).toMatchObject({ name: 'ObservedVsFitted values', x: column(name, 2), y: column(name, 1) });
    expect(charts[1].series).toHaveLength(1);
    expect(charts[1].series[0]).toMatchObject({ name: 'CooksDistance values', x: column(name, 0), y: column(name, 7) });
    expect(charts[0].title).toBe('ObservedVsFitted title');
    expect(charts[0].axisTitles).toEqual({ category: 'Fitted', value: 'ObservedVsFitted values' });
  });

  it('waits while the user edits a cell, then writes the whole report', async () => {
    // Excel.RunOptions, delayForCellEdit: without it a batch that reaches Excel during cell edit fails.
    const { model } = freshHost({ syncDelayMs: 1 });
    model.setCellEditMode(true);
    let written: string | undefined;
    const writing = writeReport(() => plan(['title', 'body'])).then((name) => {
      written = name;
    });
    await afterPendingWork(10);
    expect(written).toBeUndefined();
    expect(model.sheetNames()).toEqual(['Sheet1']);
    model.setCellEditMode(false);
    await writing;
    expect(written).toBe('Plumbline report');
    expect(model.valueAt({ sheet: 'Plumbline report', row: 1, column: 0 })).toBe('body');
  });

  it('removes its new sheet when a step fails, leaving the workbook as it was', async () => {
    const model = freshWorkbook();
    const before = model.sheetNames();
    const bad: ReportPlan = {
      ...plan(['ok']),
      cells: [
        { row: 0, column: 0, kind: 'formula', formula: '=1' },
        { row: -5, column: 0, kind: 'value', value: 1 },
      ],
    };
    await expect(writeReport(() => bad)).rejects.toBeDefined();
    expect(model.sheetNames()).toEqual(before);
  });
});
