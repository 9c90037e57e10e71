import { cellAddress } from '../../addressing/a1';
import type { ResolvedRanges } from '../model/choices';
import { convertBlock } from '../model/blockRows';
import type { StreamedAnalysis } from '../model/streamedAnalysis';
import { headerAddresses, pieceAddress, RESIDUAL_TABLE_LEFT, RESIDUAL_TABLE_TOP, tablePieces } from '../model/residualTableLayout';
import { RESIDUAL_TABLE_HEADER, residualRows } from '../model/streamedResiduals';
import { readInBlocks } from './readInBlocks';

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
  const write = (first: number, rows: number[][]) =>
    Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem(sheetName);
      for (const piece of tablePieces(first, rows.length)) sheet.getRange(pieceAddress(piece)).values = rows.slice(piece.start - first, piece.start - first + piece.rows);
      await context.sync();
    });
  await Excel.run(async (context) => {
    const title = context.workbook.worksheets.getItem(sheetName).getRange(cellAddress(RESIDUAL_TABLE_TOP - 1, RESIDUAL_TABLE_LEFT));
    title.numberFormat = [['@']];
    title.values = [['Fitted value and residual of every row used (values, computed block by block)']];
    title.format.font.bold = true;
    await context.sync();
  });
  let written = 0;
  const pending: Promise<void>[] = [];
  await readInBlocks(
    sources,
    {
      block: (values, offset) => {
        const rows = residualRows(convertBlock(values, sources, analysis.header, offset), analysis);
        if (rows.length === 0) return;
        pending.push(write(written, rows));
        written += rows.length;
      },
      progress,
    },
    signal,
  );
  await Promise.all(pending);
  await Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    for (const address of headerAddresses(written)) sheet.getRange(address).values = [RESIDUAL_TABLE_HEADER];
    await context.sync();
  });
  return written;
}

/** Empties a previous residual table (headers included) before a refresh writes the new one. */
export async function clearResidualTable(sheetName: string, rows: number): Promise<void> {
  await Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    for (const address of [...headerAddresses(rows), ...tablePieces(0, rows).map(pieceAddress)]) sheet.getRange(address).clear('Contents');
    await context.sync();
  });
}

export async function deleteSheet(sheetName: string): Promise<void> {
  await Excel.run(async (context) => {
    context.workbook.worksheets.getItem(sheetName).delete();
    await context.sync();
  });
}
