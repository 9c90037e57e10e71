import { cellAddress, formatRange } from '../../addressing/a1';
import type { AxisBounds, ReportChartPlan } from '../model/reportCharts';
import type { ReportCell, ReportPlan } from '../model/reportPlan';
import { longRun } from './longRun';
import { uniqueSheetName } from './uniqueSheetName';

export const REPORT_SHEET_BASE = 'Plumbline report';

/**
 * Writes a planned report onto a NEW sheet with a name no sheet has, so nothing of the user's is
 * ever overwritten. If anything fails, the new sheet is removed again: no half-written report.
 * Labels get the text number format before their value, so a header such as "=x" stays text.
 */
export async function writeReport(plan: (sheetName: string) => ReportPlan): Promise<string> {
  return longRun(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    const name = uniqueSheetName(
      REPORT_SHEET_BASE,
      sheets.items.map((s) => s.name),
    );
    const sheet = sheets.add(name);
    await context.sync();
    try {
      const { charts, ...rest } = plan(name);
      writePlanCells(sheet, rest);
      await addCharts(sheet, charts, context);
      sheet.getRange('A1').format.columnWidth = 170;
      sheet.activate();
      await context.sync();
      return name;
    } catch (error) {
      sheet.delete();
      await context.sync();
      throw error;
    }
  });
}

/**
 * Each chart gets exactly the series its plan names: the points, then any guide lines. `charts.add`
 * needs a source range and lays out series from it by its own rules, on cells whose formulas may
 * still be calculating, so whatever series it made are deleted and the planned ones are added and
 * pointed at their cells (ChartSeriesCollection.add, ChartSeries.setXAxisValues and setValues:
 * ExcelApi 1.7). A guide line is a series of its own chart type, XYScatterLinesNoMarkers
 * (ChartSeries.chartType, ExcelApi 1.7): straight lines through its points, no markers. Fixed axis
 * bounds go to ChartAxis.minimum and maximum (ExcelApi 1.1); the category axis is a scatter
 * chart's X axis. An axis planned 'auto' is left as Excel made it.
 */
async function addCharts(sheet: Excel.Worksheet, planned: readonly ReportChartPlan[], context: Excel.RequestContext): Promise<void> {
  const added = planned.map((c) => {
    const chart = sheet.charts.add(Excel.ChartType.xyscatter, sheet.getRange(formatRange(c.series[0].y, false)), Excel.ChartSeriesBy.columns);
    chart.name = c.name;
    chart.title.text = c.title;
    chart.axes.categoryAxis.title.text = c.xAxis.title;
    chart.axes.valueAxis.title.text = c.yAxis.title;
    setBounds(chart.axes.categoryAxis, c.xAxis.bounds);
    setBounds(chart.axes.valueAxis, c.yAxis.bounds);
    chart.setPosition(c.topLeft, c.bottomRight);
    chart.series.load('items');
    return { chart, c };
  });
  await context.sync();
  for (const { chart, c } of added) {
    // From the last, so each deletion leaves the positions of those still to go unchanged.
    for (const made of [...chart.series.items].reverse()) made.delete();
    for (const s of c.series) {
      const series = chart.series.add(s.name);
      series.setXAxisValues(sheet.getRange(formatRange(s.x, false)));
      series.setValues(sheet.getRange(formatRange(s.y, false)));
      if (s.drawn === 'line') series.chartType = Excel.ChartType.xyscatterLinesNoMarkers;
    }
  }
}

function setBounds(axis: Excel.ChartAxis, bounds: AxisBounds): void {
  if (bounds === 'auto') return;
  axis.minimum = bounds.minimum;
  axis.maximum = bounds.maximum;
}

/** Number formats, then cells; a label gets the text format before its value so it stays text. */
export function writePlanCells(sheet: Excel.Worksheet, { cells, formats }: Pick<ReportPlan, 'cells' | 'formats'>): void {
  for (const f of formats) {
    const rows = f.range.bottom - f.range.top + 1;
    const columns = f.range.right - f.range.left + 1;
    sheet.getRange(formatRange(f.range, false)).numberFormat = Array.from({ length: rows }, () => Array.from({ length: columns }, () => f.numberFormat));
  }
  for (const cell of cells) writeCell(sheet, cell);
}

function writeCell(sheet: Excel.Worksheet, cell: ReportCell): void {
  const range = sheet.getRange(cellAddress(cell.row, cell.column));
  if (cell.kind === 'label') {
    range.numberFormat = [['@']];
    range.values = [[cell.text]];
    if (cell.bold) range.format.font.bold = true;
  } else if (cell.kind === 'formula') {
    range.formulas = [[cell.formula]];
  } else {
    range.values = [[cell.value]];
  }
}
