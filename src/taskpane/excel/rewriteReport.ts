import { cellAddress } from '../../addressing/a1';
import type { ReportCell, ReportPlan } from '../model/reportPlan';
import { writePlanCells } from './writeReport';

const placeOf = (c: ReportCell) => `${c.row},${c.column}`;

/**
 * Refresh of a values report: writes the new plan over the same sheet and empties only those
 * cells the previous plan wrote and the new one does not (say, a term row fewer), so anything the
 * user added elsewhere on the sheet stays.
 */
export async function rewriteReport(sheetName: string, previous: readonly ReportCell[], plan: ReportPlan): Promise<void> {
  await Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    if (!sheets.items.some((s) => s.name === sheetName)) throw new Error(`The report sheet "${sheetName}" is no longer there: write a new report.`);
    const sheet = sheets.getItem(sheetName);
    const kept = new Set(plan.cells.map(placeOf));
    // Formats go back to General first: a number written where a label was would otherwise stay text.
    for (const cell of previous) {
      const range = sheet.getRange(cellAddress(cell.row, cell.column));
      range.numberFormat = [['General']];
      range.format.font.bold = false;
      if (!kept.has(placeOf(cell))) range.values = [['']];
    }
    writePlanCells(sheet, plan);
    await context.sync();
  });
}
