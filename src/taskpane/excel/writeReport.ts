import { cellAddress, formatRange } from '../../addressing/a1';
import type { ReportCell, ReportPlan } from '../model/reportPlan';
import { uniqueSheetName } from './uniqueSheetName';

export const REPORT_SHEET_BASE = 'Plumbline report';

/**
 * Writes a planned report onto a NEW sheet with a name no sheet has, so nothing of the user's is
 * ever overwritten. If anything fails, the new sheet is removed again: no half-written report.
 * Labels get the text number format before their value, so a header such as "=x" stays text.
 */
export async function writeReport(plan: (sheetName: string) => ReportPlan): Promise<string> {
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    const name = uniqueSheetName(REPORT_SHEET_BASE, sheets.items.map((s) => s.name));
    const sheet = sheets.add(name);
    await context.sync();
    try {
      const { charts, ...rest } = plan(name);
      writePlanCells(sheet, rest);
      for (const c of charts) {
        const chart = sheet.charts.add(Excel.ChartType.xyscatter, sheet.getRange(formatRange(c.y, false)), Excel.ChartSeriesBy.columns);
        chart.name = c.name;
        chart.title.text = c.title;
        const series = chart.series.getItemAt(0);
        series.setXAxisValues(sheet.getRange(formatRange(c.x, false)));
        series.setValues(sheet.getRange(formatRange(c.y, false)));
        series.name = c.yTitle;
        chart.axes.categoryAxis.title.text = c.xTitle;
        chart.axes.valueAxis.title.text = c.yTitle;
        chart.setPosition(c.topLeft, c.bottomRight);
      }
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
