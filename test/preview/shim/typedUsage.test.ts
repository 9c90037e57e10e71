/**
 * Code written the way a task pane is written against @types/office-js, unchanged: it type-checks
 * against the real declarations (npm test runs tsc over this file) and runs on the shim.
 */
import { beforeEach, expect, it } from 'vitest';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook } from './harness';

/** Writes a small table below a title on a sheet, creating the sheet if needed; returns its address. */
async function writeTable(sheetName: string, header: string[], rows: (string | number)[][]): Promise<string> {
  return Excel.run(async (context: Excel.RequestContext) => {
    let sheet: Excel.Worksheet = context.workbook.worksheets.getItemOrNullObject(sheetName);
    await context.sync();
    if (sheet.isNullObject) sheet = context.workbook.worksheets.add(sheetName);
    const title = sheet.getRange('A1');
    title.values = [[`${sheetName} (${rows.length} rows)`]];
    const table = title.getOffsetRange(2, 0).getResizedRange(rows.length, header.length - 1);
    table.values = [header, ...rows];
    table.getRow(0).select();
    table.load(['address', 'rowCount']);
    await context.sync();
    return `${table.address} (${table.rowCount})`;
  });
}

async function readSelection(): Promise<{ address: string; values: unknown[][] }> {
  return Excel.run(async (context) => {
    const range = context.workbook.getSelectedRange();
    range.load({ address: true, values: true });
    await context.sync();
    return { address: range.address, values: range.values };
  });
}

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
});

it('runs typed task-pane code end to end', async () => {
  await Office.onReady();
  expect(
    await writeTable(
      'Terms table',
      ['Term', 'Estimate'],
      [
        ['Intercept', 1.25],
        ['Steep', 0.42],
      ],
    ),
  ).toBe("'Terms table'!A3:B5 (3)");
  expect(await readSelection()).toEqual({ address: "'Terms table'!A3:B3", values: [['Term', 'Estimate']] });
  expect(await writeTable('Terms table', ['Term'], [['x']])).toBe("'Terms table'!A3:A4 (2)");
  expect(model.sheetNames()).toEqual(['Sheet1', 'Terms table']);
  expect(model.valueAt({ sheet: 'Terms table', row: 0, column: 0 })).toBe('Terms table (1 rows)');
});
