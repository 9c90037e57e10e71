import { cellAddress } from '../../addressing/a1';
import type { ResolvedRanges } from '../model/choices';
import { convertBlock } from '../model/blockRows';
import type { StreamedAnalysis } from '../model/streamedAnalysis';
import { RESIDUAL_TABLE_HEADER, residualRows } from '../model/streamedResiduals';
import { readInBlocks } from './readInBlocks';

/** Where a values report keeps its residual table: column K, under a title in row 4. */
export const RESIDUAL_TABLE_TOP = 4;
export const RESIDUAL_TABLE_LEFT = 10;

/**
 * Writes the fitted value and residual of every used row beside a values report, reading the data
 * again block by block and writing each block as soon as it is computed: neither the data nor the
 * table is ever held whole.
 */
export async function writeResidualTable(
  sheetName: string,
  ranges: ResolvedRanges,
  analysis: StreamedAnalysis,
  progress: (read: number, total: number) => void,
  signal: AbortSignal,
): Promise<number> {
  const sources = { response: ranges.response, predictors: ranges.predictorColumns, weights: ranges.weights };
  const write = (top: number, rows: (string | number)[][]) =>
    Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem(sheetName);
      const range = sheet.getRange(`${cellAddress(top, RESIDUAL_TABLE_LEFT)}:${cellAddress(top + rows.length - 1, RESIDUAL_TABLE_LEFT + 2)}`);
      range.values = rows;
      await context.sync();
    });
  await Excel.run(async (context) => {
    const title = context.workbook.worksheets.getItem(sheetName).getRange(cellAddress(RESIDUAL_TABLE_TOP - 1, RESIDUAL_TABLE_LEFT));
    title.numberFormat = [['@']];
    title.values = [['Fitted value and residual of every row used (values, computed block by block)']];
    title.format.font.bold = true;
    await context.sync();
  });
  await write(RESIDUAL_TABLE_TOP, [RESIDUAL_TABLE_HEADER]);
  let next = RESIDUAL_TABLE_TOP + 1;
  const pending: Promise<void>[] = [];
  await readInBlocks(
    sources,
    {
      block: (values, offset) => {
        const rows = residualRows(convertBlock(values, sources, analysis.header, offset), analysis);
        if (rows.length === 0) return;
        pending.push(write(next, rows));
        next += rows.length;
      },
      progress,
    },
    signal,
  );
  await Promise.all(pending);
  return next - RESIDUAL_TABLE_TOP - 1;
}

/** Empties a previous residual table's rows (header included) before a refresh writes the new one. */
export async function clearResidualTable(sheetName: string, rows: number): Promise<void> {
  await Excel.run(async (context) => {
    const range = context.workbook.worksheets
      .getItem(sheetName)
      .getRange(`${cellAddress(RESIDUAL_TABLE_TOP, RESIDUAL_TABLE_LEFT)}:${cellAddress(RESIDUAL_TABLE_TOP + rows, RESIDUAL_TABLE_LEFT + 2)}`);
    range.clear('Contents');
    await context.sync();
  });
}

export async function deleteSheet(sheetName: string): Promise<void> {
  await Excel.run(async (context) => {
    context.workbook.worksheets.getItem(sheetName).delete();
    await context.sync();
  });
}
