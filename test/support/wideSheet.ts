/**
 * Data above the live size for the browser long-task tests: the bench's generated numbers
 * (scripts/benchData.ts) at 50,000 rows × 20 predictors, 1,050,000 numbers, four times the live
 * size, written into a preview sheet block by block as an add-in writing this much would, and
 * read back through the Excel API as the add-in reads a cell.
 */
import type { Page } from 'playwright-core';
import { type BrowserSession, openPage } from './browser';
import { cellAddress, columnLetters } from '../../src/addressing/a1';
import { generateColumns } from '../../scripts/benchData';

export const WIDE_ROWS = 50_000;
export const WIDE_PREDICTORS = 20;
export const WIDE_SHEET = 'Wide';
/** Rows per write, each its own sync. */
const ROWS_PER_WRITE = 2_500;

/** The generated numbers: x column-major (column j at j·WIDE_ROWS), y. */
export function wideData(): { x: Float64Array; y: Float64Array } {
  return generateColumns(WIDE_ROWS, WIDE_PREDICTORS);
}

/** A fresh preview page, its demo loaded, with the data written on WIDE_SHEET. */
export async function openWideSheet(origin: string): Promise<BrowserSession> {
  const session = await openPage(`${origin}/preview.html`);
  await session.page.waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
  await writeWideSheet(session.page);
  return session;
}

/** Header row then data rows on WIDE_SHEET: y in column A, x1…x20 from column B. */
export async function writeWideSheet(page: Page): Promise<void> {
  const { x, y } = wideData();
  const header = ['y', ...Array.from({ length: WIDE_PREDICTORS }, (_, j) => `x${j + 1}`)];
  await writeRows(page, `A1:${columnLetters(WIDE_PREDICTORS)}1`, [header], true);
  for (let top = 0; top < WIDE_ROWS; top += ROWS_PER_WRITE) {
    const count = Math.min(ROWS_PER_WRITE, WIDE_ROWS - top);
    const rows = Array.from({ length: count }, (_, k) => [y[top + k], ...Array.from({ length: WIDE_PREDICTORS }, (_, j) => x[j * WIDE_ROWS + top + k])]);
    await writeRows(page, `${cellAddress(top + 1, 0)}:${cellAddress(top + count, WIDE_PREDICTORS)}`, rows, false);
  }
}

function writeRows(page: Page, address: string, rows: (string | number)[][], addSheet: boolean): Promise<void> {
  return page.evaluate(
    ({ sheet, address, rows, addSheet }) =>
      Excel.run(async (context) => {
        const sheets = context.workbook.worksheets;
        (addSheet ? sheets.add(sheet) : sheets.getItem(sheet)).getRange(address).values = rows;
        await context.sync();
      }),
    { sheet: WIDE_SHEET, address, rows, addSheet },
  );
}

/** One cell's value, read through the Excel API. */
export function cellValue(page: Page, sheet: string, row: number, column: number): Promise<unknown> {
  return page.evaluate(
    ({ sheet, address }) =>
      Excel.run(async (context) => {
        const range = context.workbook.worksheets.getItem(sheet).getRange(address).load('values');
        await context.sync();
        return range.values[0][0] as unknown;
      }),
    { sheet, address: cellAddress(row, column) },
  );
}
