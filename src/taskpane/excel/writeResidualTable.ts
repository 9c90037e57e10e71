import { cellAddress } from '../../addressing/a1';
import type { ResolvedRanges } from '../model/choices';
import { convertBlock } from '../model/blockRows';
import type { StreamedAnalysis } from '../model/paneAnalysis';
import { headerAddresses, pieceAddress, RESIDUAL_TABLE_LEFT, RESIDUAL_TABLE_TOP, tablePieces } from '../model/residualTableLayout';
import { RESIDUAL_TABLE_HEADER, residualRows } from '../model/streamedResiduals';
import { inPieces } from './inPieces';
import { longRun } from './longRun';
import { jsonBytes } from './payload';
import { readInBlocks } from './readInBlocks';

/** Entries [first, first + rows.length) of the table, panel by panel, in requests sized by payload. */
async function writeEntries(sheetName: string, first: number, rows: number[][]): Promise<void> {
  for (const piece of tablePieces(first, rows.length)) {
    const within = piece.start - first;
    await inPieces(
      piece.rows,
      (i) => jsonBytes(rows[within + i]),
      (start, count) =>
        longRun(async (context) => {
          const address = pieceAddress({ ...piece, top: piece.top + start, start: piece.start + start, rows: count });
          context.workbook.worksheets.getItem(sheetName).getRange(address).values = rows.slice(within + start, within + start + count);
          await context.sync();
        }),
    );
  }
}

/**
 * Writes the fitted value and residual of every used row beside a values report, reading the data
 * again block by block and writing each block, awaited, before the next is read: neither the data
 * nor the table is ever held whole, and the first failure stops every later read and write. The
 * caller removes or clears what a failed call leaves.
 */
export async function writeResidualTable(
  sheetName: string,
  ranges: ResolvedRanges,
  analysis: StreamedAnalysis,
  progress: (read: number, total: number) => void,
  signal: AbortSignal,
): Promise<number> {
  const sources = { response: ranges.response, predictors: ranges.predictorColumns, weights: ranges.weights };
  await longRun(async (context) => {
    const title = context.workbook.worksheets.getItem(sheetName).getRange(cellAddress(RESIDUAL_TABLE_TOP - 1, RESIDUAL_TABLE_LEFT));
    title.numberFormat = [['@']];
    title.values = [['Fitted value and residual of every row used (values, computed block by block)']];
    title.format.font.bold = true;
    await context.sync();
  });
  let written = 0;
  await readInBlocks(
    sources,
    {
      block: async (values, offset) => {
        const rows = residualRows(convertBlock(values, sources, analysis.header, offset), analysis);
        if (rows.length === 0) return;
        await writeEntries(sheetName, written, rows);
        written += rows.length;
      },
      progress,
    },
    signal,
  );
  await longRun(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    for (const address of headerAddresses(written)) sheet.getRange(address).values = [RESIDUAL_TABLE_HEADER];
    await context.sync();
  });
  return written;
}

/** Empties a previous residual table (headers included) before a refresh writes the new one. */
export async function clearResidualTable(sheetName: string, rows: number): Promise<void> {
  await longRun(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    for (const address of [...headerAddresses(rows), ...tablePieces(0, rows).map(pieceAddress)]) sheet.getRange(address).clear('Contents');
    await context.sync();
  });
}

export async function deleteSheet(sheetName: string): Promise<void> {
  await longRun(async (context) => {
    context.workbook.worksheets.getItem(sheetName).delete();
    await context.sync();
  });
}
