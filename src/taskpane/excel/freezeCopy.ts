import { formatRange, type RangeRef } from '../../addressing/a1';
import { REPORT_TITLE_PREFIX } from '../model/reportPlan';
import { inPieces } from './inPieces';
import { longRun } from './longRun';
import { jsonBytes } from './payload';
import { readRowBlocks } from './readRowBlocks';
import { uniqueSheetName } from './uniqueSheetName';

/** The copy starts below its two-line stamp and an empty row. */
const COPY_TOP = 3;

/**
 * Writes a values-only copy of the active report sheet for colleagues without the add-in (in
 * whose Excel the PLUMB formulas would show #NAME?). Every string is written under the text
 * format, so nothing copied can turn into a formula; the stamp says what it is and when. A values
 * report with its residual table can fill a million rows, so the report is read and the copy
 * written block by block, each request sized by payload; if any step fails the copy is removed.
 */
export async function freezeActiveReport(now: Date): Promise<string> {
  const { reportName, heading, used, name } = await longRun(async (context) => {
    const report = context.workbook.worksheets.getActiveWorksheet();
    const title = report.getRange('A1');
    const usedRange = report.getUsedRange(true);
    const sheets = context.workbook.worksheets;
    report.load('name');
    title.load('values');
    usedRange.load('rowIndex, columnIndex, rowCount, columnCount');
    sheets.load('items/name');
    await context.sync();
    const text = String(title.values[0][0]);
    if (!text.startsWith(REPORT_TITLE_PREFIX)) {
      throw new Error('Open a Plumbline report sheet first: the copy is made of the active report.');
    }
    const copyName = uniqueSheetName(`${report.name} values`.slice(0, 31), sheets.items.map((s) => s.name));
    sheets.add(copyName);
    await context.sync();
    const extent: RangeRef = {
      sheet: report.name,
      top: usedRange.rowIndex,
      left: usedRange.columnIndex,
      bottom: usedRange.rowIndex + usedRange.rowCount - 1,
      right: usedRange.columnIndex + usedRange.columnCount - 1,
    };
    return { reportName: report.name, heading: text, used: extent, name: copyName };
  });
  try {
    await longRun(async (context) => {
      const copy = context.workbook.worksheets.getItem(name);
      const stamp = copy.getRange('A1:A2');
      stamp.numberFormat = [['@'], ['@']];
      stamp.values = [[`Frozen copy of "${reportName}" made ${now.toISOString().slice(0, 16).replace('T', ' ')} UTC: values only, no live formulas.`], [heading]];
      copy.getRange('A1').format.font.bold = true;
      await context.sync();
    });
    await readRowBlocks([used], ({ values, numberFormats, offset }) => copyBlock(name, COPY_TOP + offset, values[0], (numberFormats ?? [])[0] ?? []), { numberFormats: true });
    await longRun(async (context) => {
      const copy = context.workbook.worksheets.getItem(name);
      copy.getRange('A1').format.columnWidth = 170;
      copy.activate();
      await context.sync();
    });
    return name;
  } catch (error) {
    await longRun(async (context) => {
      context.workbook.worksheets.getItem(name).delete();
      await context.sync();
    });
    throw error;
  }
}

const isBlank = (value: unknown) => value === '' || value === null;

/**
 * One block of the report onto the copy at sheet row `top`, strings under the text format. Only
 * the columns holding something in this block are written: the copy is a new sheet, already
 * blank, and a values report's residual table runs a million rows below a report ten columns wide.
 */
async function copyBlock(sheetName: string, top: number, values: unknown[][], numberFormats: unknown[][]): Promise<void> {
  let left = Number.POSITIVE_INFINITY;
  let right = -1;
  for (const row of values) {
    row.forEach((v, j) => {
      if (isBlank(v)) return;
      left = Math.min(left, j);
      right = Math.max(right, j);
    });
  }
  if (right < 0) return;
  const cells = values.map((row) => row.slice(left, right + 1));
  const formats = cells.map((row, i) => row.map((v, j) => (typeof v === 'string' ? '@' : numberFormats[i]?.[left + j] ?? 'General')));
  await inPieces(
    cells.length,
    (i) => jsonBytes(cells[i]) + jsonBytes(formats[i]),
    (start, count) =>
      longRun(async (context) => {
        const target = context.workbook.worksheets
          .getItem(sheetName)
          .getRange(formatRange({ sheet: sheetName, top: top + start, left, bottom: top + start + count - 1, right }, false));
        target.numberFormat = formats.slice(start, start + count);
        target.values = cells.slice(start, start + count);
        await context.sync();
      }),
  );
}
