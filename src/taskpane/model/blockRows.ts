import { cellAddress, quoteSheetName, type RangeRef } from '../../addressing/a1';
import { type Cell, classifyCell, describeCell, EngineError, type RowBlock, type SkippedRow } from '../../engine';
import { asCellValue } from './readValues';

/** One block of Range.values per chosen column (each rows × 1), as the sheet gave them. */
export interface BlockValues {
  response: readonly (readonly unknown[])[];
  predictors: readonly (readonly (readonly unknown[])[])[];
  weights: readonly (readonly unknown[])[] | undefined;
}

/** The columns the blocks come from, so a message can name the sheet cell. */
export interface BlockSources {
  response: RangeRef;
  predictors: readonly RangeRef[];
  weights: RangeRef | undefined;
}

export interface BlockHeader {
  hasHeader: boolean;
  responseName: string;
  predictorNames: string[];
}

export interface ConvertedBlock {
  block: RowBlock;
  /** The worksheet rows (as the sheet numbers them, from the response's rows) of the block's used rows, in order. */
  usedRows: number[];
  /** Rows of this block left out for a blank or #N/A; the first few are kept as examples. */
  skipped: number;
  skippedExamples: SkippedRow[];
}

const EXAMPLES = 5;

/**
 * The header is decided as the cell functions decide it: a text first response cell (with more
 * than one row) makes the first row a header, and every predictor then needs a text or blank header.
 */
export function detectHeader(first: BlockValues, sources: BlockSources, totalRows: number): BlockHeader {
  const responseCell = classifyCell(asCellValue(first.response[0]?.[0]));
  const hasHeader = totalRows > 1 && responseCell.kind === 'text';
  const predictorNames = first.predictors.map((column, j) => {
    if (!hasHeader) return `x${j + 1}`;
    const cell = classifyCell(asCellValue(column[0]?.[0]));
    if (cell.kind === 'missing') return `x${j + 1}`;
    if (cell.kind === 'text') return cell.text;
    throw new EngineError(
      'bad-value',
      `The response starts with a header but predictor ${j + 1}'s first cell (${place(sources.predictors[j], 0)}) holds ${describeCell(cell)}: ` +
        'give every predictor column a text header, or select the ranges without headers.',
    );
  });
  return { hasHeader, responseName: hasHeader && responseCell.kind === 'text' ? responseCell.text : 'y', predictorNames };
}

/** "Data!C5": the cell `offset` rows down a column, as a user finds it on the sheet. */
function place(source: RangeRef, offset: number): string {
  return `${quoteSheetName(source.sheet)}!${cellAddress(source.top + offset, source.left)}`;
}

/**
 * A categorical column is one whose first block holds text and no number, as the cell functions
 * judge a whole column; on the streamed path its levels cannot be known until every row is read.
 */
export function categoricalInFirstBlock(first: BlockValues, header: BlockHeader): string | undefined {
  const start = header.hasHeader ? 1 : 0;
  const index = first.predictors.findIndex((column) => {
    const cells = column.slice(start).map((row) => classifyCell(asCellValue(row[0])));
    return cells.some((c) => c.kind === 'text') && !cells.some((c) => c.kind === 'number');
  });
  if (index < 0) return undefined;
  return (
    `${header.predictorNames[index]} holds text, so it would be a categorical predictor: categorical columns need the data to fit in a live report. ` +
    'Select fewer rows, or code the column as numbers.'
  );
}

interface Located {
  cell: Cell;
  what: string;
  source: RangeRef;
}

/**
 * Excel values of one block → the accumulator's numeric block. `offset` is the block's first row
 * within the chosen ranges (0-based; the header, when there is one, is row 0 and is not data).
 * Blank and #N/A rows are skipped and counted; any other non-number is an error naming its cell.
 * Rows are numbered as the sheet numbers them: the response's worksheet row.
 */
export function convertBlock(values: BlockValues, sources: BlockSources, header: BlockHeader, offset: number): ConvertedBlock {
  const p = values.predictors.length;
  const length = values.response.length;
  const start = offset === 0 && header.hasHeader ? 1 : 0;
  const used = new Uint8Array(length);
  const worksheetRow = (i: number) => sources.response.top + offset + i + 1;
  const skippedExamples: SkippedRow[] = [];
  let skipped = 0;
  let rows = 0;
  for (let i = start; i < length; i++) {
    const located: Located[] = [{ cell: classifyCell(asCellValue(values.response[i][0])), what: header.responseName, source: sources.response }];
    for (let j = 0; j < p; j++)
      located.push({ cell: classifyCell(asCellValue(values.predictors[j][i][0])), what: header.predictorNames[j], source: sources.predictors[j] });
    if (values.weights !== undefined && sources.weights !== undefined) {
      located.push({ cell: classifyCell(asCellValue(values.weights[i][0])), what: 'weight', source: sources.weights });
    }
    for (const l of located) rejectBadCell(l, offset + i, worksheetRow(i));
    const missing = located.find((l) => l.cell.kind === 'missing');
    if (missing !== undefined) {
      skipped++;
      if (skippedExamples.length < EXAMPLES) {
        skippedExamples.push({
          row: worksheetRow(i),
          reason: `${missing.cell.kind === 'missing' && missing.cell.why === '#N/A' ? '#N/A' : 'blank'} in ${missing.what}`,
        });
      }
      continue;
    }
    const weight = located[p + 1]?.cell;
    if (weight !== undefined && weight.kind === 'number' && !(weight.value > 0)) {
      throw new EngineError(
        'bad-value',
        `The weight in ${place(sources.weights as RangeRef, offset + i)} is ${weight.value}; every weight must be a positive number.`,
      );
    }
    used[i] = 1;
    rows++;
  }
  const usedRows: number[] = [];
  used.forEach((flag, i) => {
    if (flag === 1) usedRows.push(worksheetRow(i));
  });
  return { block: fill(values, used, rows, p), usedRows, skipped, skippedExamples };
}

/** `offset`: the cell's row within the chosen ranges; `row`: the worksheet row it is on. */
function rejectBadCell({ cell, what, source }: Located, offset: number, row: number): void {
  if (cell.kind === 'number' || cell.kind === 'missing') return;
  const hint =
    cell.kind === 'text' && /^[-+]?[\d.,\s]+$/.test(cell.text)
      ? ' It looks like a number stored as text: re-enter it as a number without separators.'
      : ' Use a number, or leave the cell blank to skip the row.';
  throw new EngineError('bad-value', `Row ${row}, cell ${place(source, offset)} ("${what}"), holds ${describeCell(cell)}.${hint}`);
}

/** Second pass: the used rows only, x column-major, so no row-major copy is ever built. */
function fill(values: BlockValues, used: Uint8Array, rows: number, p: number): RowBlock {
  const x = new Float64Array(rows * p);
  const y = new Float64Array(rows);
  const weights = values.weights === undefined ? undefined : new Float64Array(rows);
  let k = 0;
  for (let i = 0; i < used.length; i++) {
    if (used[i] === 0) continue;
    y[k] = Number(values.response[i][0]);
    for (let j = 0; j < p; j++) x[j * rows + k] = Number(values.predictors[j][i][0]);
    if (weights !== undefined && values.weights !== undefined) weights[k] = Number(values.weights[i][0]);
    k++;
  }
  return weights === undefined ? { rows, x, y } : { rows, x, y, weights };
}
