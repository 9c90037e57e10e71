import { formatRange, type RangeRef } from '../../addressing/a1';
import { LIVE_NOTE, LIVE_QQ_LABEL, LIVE_SETTINGS_HEADING, REFRESH_NOTE, REPORT_TITLE_PREFIX, VALUES_SETTINGS_HEADING } from '../model/reportSections';
import { AXES_FIXED_NOTE } from '../model/reportCharts';
import { inPieces } from './inPieces';
import { longRun } from './longRun';
import { jsonBytes } from './payload';
import { readRowBlocks } from './readRowBlocks';
import { uniqueSheetName } from './uniqueSheetName';

/** The copy's title, in A1 as the report's: what the copy is, of which report, as of when. */
export function frozenTitle(title: string, reportName: string, asOf: string): string {
  return `${title}: frozen copy of "${reportName}", values as of ${asOf} UTC`;
}

/**
 * What the copy says where a report speaks of itself: no line promises formulas or cells that
 * recalculate, nor a Refresh that a copy never gets; it says the values are as of the copy.
 */
export function frozenText(text: string, asOf: string): string {
  if (text === LIVE_SETTINGS_HEADING || text === VALUES_SETTINGS_HEADING) return `Settings used (as of ${asOf} UTC; editing them here changes nothing)`;
  if (text.endsWith(REFRESH_NOTE)) return `${text.slice(0, -REFRESH_NOTE.length)}This copy keeps the values as of ${asOf} UTC: Refresh does not reach it.`;
  if (text === LIVE_QQ_LABEL) return 'Normal Q–Q points';
  if (text.startsWith(AXES_FIXED_NOTE)) return 'The charts stay on the live report; this copy holds the values they were drawn from.';
  if (text.endsWith(LIVE_NOTE))
    return `${text.slice(0, -LIVE_NOTE.length)}Every number below is a value as of ${asOf} UTC, not a formula: nothing here recalculates.`;
  return text;
}

/** Bold read and written in pieces of this many cells: each cell's answer is a few bytes. */
const BOLD_CELL_BYTES = 200;

/**
 * Writes a values-only copy of the active report sheet for colleagues without the add-in (in
 * whose Excel the PLUMB formulas would show #NAME?), cell for cell at the report's own places,
 * with its number formats and its bold headings. Every string is written under the text format,
 * so nothing copied can turn into a formula, and the report's statements about itself are
 * rewritten for a copy (frozenText). A values report with its residual table can fill a million
 * rows, so the report is read and the copy written block by block, each request sized by payload;
 * if any step fails the copy is removed.
 */
export async function freezeActiveReport(now: Date): Promise<string> {
  const { reportName, used, name } = await longRun(async (context) => {
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
    const copyName = uniqueSheetName(
      `${report.name} values`.slice(0, 31),
      sheets.items.map((s) => s.name),
    );
    sheets.add(copyName);
    await context.sync();
    const extent: RangeRef = {
      sheet: report.name,
      top: usedRange.rowIndex,
      left: usedRange.columnIndex,
      bottom: usedRange.rowIndex + usedRange.rowCount - 1,
      right: usedRange.columnIndex + usedRange.columnCount - 1,
    };
    return { reportName: report.name, used: extent, name: copyName };
  });
  const asOf = now.toISOString().slice(0, 16).replace('T', ' ');
  const textCells: { row: number; column: number }[] = [];
  try {
    await readRowBlocks(
      [used],
      ({ values, numberFormats, offset }) => {
        const top = used.top + offset;
        // Headings are text (in the first column, and beside the charts); only text cells are asked for bold.
        values[0].forEach((row, i) =>
          row.forEach((v, j) => {
            if (typeof v === 'string' && v !== '') textCells.push({ row: top + i, column: used.left + j });
          }),
        );
        const isTitle = (i: number, j: number) => top + i === 0 && used.left + j === 0;
        const text = values[0].map((row, i) =>
          row.map((v, j) => (typeof v !== 'string' ? v : isTitle(i, j) ? frozenTitle(v, reportName, asOf) : frozenText(v, asOf))),
        );
        return copyBlock(name, top, used.left, text, (numberFormats ?? [])[0] ?? []);
      },
      { numberFormats: true },
    );
    await copyBold(reportName, name, textCells);
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
 * Bold, cell by cell, from the report's text cells to the same cells of the copy: a range's
 * font.bold reads null over cells that differ, so each text cell is asked on its own.
 */
async function copyBold(reportName: string, copyName: string, cells: readonly { row: number; column: number }[]): Promise<void> {
  await inPieces(
    cells.length,
    () => BOLD_CELL_BYTES,
    (start, count) =>
      longRun(async (context) => {
        const report = context.workbook.worksheets.getItem(reportName);
        const fonts = cells.slice(start, start + count).map(({ row, column }) => {
          const font = report.getRange(formatRange({ sheet: reportName, top: row, left: column, bottom: row, right: column }, false)).format.font;
          font.load('bold');
          return { row, column, font };
        });
        await context.sync();
        const copy = context.workbook.worksheets.getItem(copyName);
        for (const { row, column, font } of fonts) {
          if (font.bold) copy.getRange(formatRange({ sheet: copyName, top: row, left: column, bottom: row, right: column }, false)).format.font.bold = true;
        }
        await context.sync();
      }),
  );
}

/**
 * One block of the report onto the copy at sheet row `top`, its first column at `firstColumn`,
 * strings under the text format. Only the columns holding something in this block are written:
 * the copy is a new sheet, already blank, and a values report's residual table runs a million
 * rows below a report ten columns wide.
 */
async function copyBlock(sheetName: string, top: number, firstColumn: number, values: unknown[][], numberFormats: unknown[][]): Promise<void> {
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
  const formats = cells.map((row, i) => row.map((v, j) => (typeof v === 'string' ? '@' : (numberFormats[i]?.[left + j] ?? 'General'))));
  await inPieces(
    cells.length,
    (i) => jsonBytes(cells[i]) + jsonBytes(formats[i]),
    (start, count) =>
      longRun(async (context) => {
        const target = context.workbook.worksheets
          .getItem(sheetName)
          .getRange(
            formatRange({ sheet: sheetName, top: top + start, left: firstColumn + left, bottom: top + start + count - 1, right: firstColumn + right }, false),
          );
        target.numberFormat = formats.slice(start, start + count);
        target.values = cells.slice(start, start + count);
        await context.sync();
      }),
  );
}
