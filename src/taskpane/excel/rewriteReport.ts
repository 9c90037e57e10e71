import { cellAddress } from '../../addressing/a1';
import type { ReportCell, ReportPlan } from '../model/reportPlan';
import { inPieces } from './inPieces';
import { longRun } from './longRun';
import { jsonBytes, OPERATION_BYTES } from './payload';
import { writePlanCells } from './writeReport';

const placeOf = (c: ReportCell) => `${c.row},${c.column}`;

/** One queued step of the rewrite, with what it adds to a request. */
interface Step {
  bytes: number;
  queue(sheet: Excel.Worksheet): void;
}

/**
 * Refresh of a values report: writes the new plan over the same sheet and empties only those
 * cells the previous plan wrote and the new one does not (say, a term row fewer), so anything the
 * user added elsewhere on the sheet stays. The steps go in requests sized by payload, in order.
 */
export async function rewriteReport(sheetName: string, previous: readonly ReportCell[], plan: ReportPlan): Promise<void> {
  await longRun(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    if (!sheets.items.some((s) => s.name === sheetName)) throw new Error(`The report sheet "${sheetName}" is no longer there: write a new report.`);
  });
  const kept = new Set(plan.cells.map(placeOf));
  const steps: Step[] = [
    // Formats go back to General first: a number written where a label was would otherwise stay text.
    ...previous.map((cell) => ({
      bytes: 3 * OPERATION_BYTES,
      queue: (sheet: Excel.Worksheet) => {
        const range = sheet.getRange(cellAddress(cell.row, cell.column));
        range.numberFormat = [['General']];
        range.format.font.bold = false;
        if (!kept.has(placeOf(cell))) range.values = [['']];
      },
    })),
    ...plan.formats.map((format) => ({
      bytes:
        OPERATION_BYTES + (format.range.bottom - format.range.top + 1) * (format.range.right - format.range.left + 1) * (jsonBytes(format.numberFormat) + 1),
      queue: (sheet: Excel.Worksheet) => writePlanCells(sheet, { cells: [], formats: [format] }),
    })),
    ...plan.cells.map((cell) => ({
      bytes: 3 * OPERATION_BYTES + jsonBytes(cell),
      queue: (sheet: Excel.Worksheet) => writePlanCells(sheet, { cells: [cell], formats: [] }),
    })),
  ];
  await inPieces(
    steps.length,
    (i) => steps[i].bytes,
    (start, count) =>
      longRun(async (context) => {
        const sheet = context.workbook.worksheets.getItem(sheetName);
        for (const step of steps.slice(start, start + count)) step.queue(sheet);
        await context.sync();
      }),
  );
}
