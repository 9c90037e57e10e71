import { cellAddress, quoteSheetName, type RangeRef } from '../../addressing/a1';
import {
  badCellMessage,
  badWeightMessage,
  buildModelFrame,
  type Cell,
  classifyCell,
  EngineError,
  isCategoricalColumn,
  type RangeOrigin,
  type RowBlock,
  type SkippedRow,
} from '../../engine';
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
 * The header as the engine decides it for the cell functions and the in-memory pane (its model
 * frame, not a copy of its rule): the frame of the first row and, when the ranges have more rows,
 * a stand-in data row of zeros, which can neither fail nor change what the first row says. The
 * predictors go in `order` (sheet order unless given), as the fit reads them; a column without a
 * header is named by its worksheet column. Names come back in sheet order. Streamed data get a
 * values-only report, which gathers nothing, so no column is named by a report sheet's. A numeric
 * predictor header under a text response header is the engine's error, naming the cell.
 */
export function detectHeader(first: BlockValues, sources: BlockSources, totalRows: number, order?: readonly number[]): BlockHeader {
  const fitOrder = order ?? first.predictors.map((_, j) => j);
  const rows = (column: readonly (readonly unknown[])[]) => (totalRows > 1 ? [[asCellValue(column[0]?.[0])], [0]] : [[asCellValue(column[0]?.[0])]]);
  const frame = buildModelFrame({
    y: rows(first.response),
    x: fitOrder.map((j) => rows(first.predictors[j])),
    intercept: false,
    origins: { y: originOf(sources.response), x: fitOrder.map((j) => originOf(sources.predictors[j])) },
  });
  const predictorNames: string[] = [];
  fitOrder.forEach((j, position) => {
    predictorNames[j] = frame.columns[position].name;
  });
  return { hasHeader: frame.hasHeader, responseName: frame.responseName, predictorNames };
}

/** Where a chosen range sits on its sheet, for the engine's messages and row numbers. */
export function originOf(range: RangeRef): RangeOrigin {
  return { sheet: range.sheet, row: range.top, column: range.left };
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
  const index = first.predictors.findIndex((column) => isCategoricalColumn(column.slice(start).map((row) => classifyCell(asCellValue(row[0])))));
  if (index < 0) return undefined;
  return (
    `${header.predictorNames[index]} holds text, so it would be a categorical predictor: categorical columns need the data to fit in a live report. ` +
    'Select fewer rows, or code the column as numbers.'
  );
}

interface Located {
  cell: Cell;
  /** The argument the engine's messages name it by: response, predictors or weights. */
  argument: string;
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
    const located: Located[] = [
      { cell: classifyCell(asCellValue(values.response[i][0])), argument: 'response', what: header.responseName, source: sources.response },
    ];
    for (let j = 0; j < p; j++) {
      const cell = classifyCell(asCellValue(values.predictors[j][i][0]));
      located.push({ cell, argument: 'predictors', what: header.predictorNames[j], source: sources.predictors[j] });
    }
    if (values.weights !== undefined && sources.weights !== undefined) {
      located.push({ cell: classifyCell(asCellValue(values.weights[i][0])), argument: 'weights', what: 'weight', source: sources.weights });
    }
    for (const l of located) rejectBadCell(l, offset + i);
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
      throw new EngineError('bad-value', badWeightMessage(weight.value, `weights cell ${place(sources.weights as RangeRef, offset + i)}`));
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

/** `offset`: the cell's row within the chosen ranges. Worded by the engine's rule, as the model frame words it. */
function rejectBadCell({ cell, argument, what, source }: Located, offset: number): void {
  if (cell.kind === 'number' || cell.kind === 'missing') return;
  throw new EngineError('bad-value', badCellMessage(cell, `${argument} cell ${place(source, offset)} ("${what}")`));
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
