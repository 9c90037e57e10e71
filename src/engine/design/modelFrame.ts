import { EngineError } from '../errors';
import { INTERCEPT_NAME } from '../fit/design';
import type { ModelData } from '../types';
import { type Cell, type CellGrid, classifyCell, describeCell, shortName } from './cells';
import { codeCategorical, type SourceColumn } from './categorical';
import { cellPlace, type RangeOrigin, rowNumber } from './origin';

export interface FrameInput {
  y: CellGrid;
  /** One or more blocks of predictor columns, side by side, each with the rows of y. */
  x: readonly CellGrid[];
  /** How each block is named in messages (default predictors). */
  xArguments?: readonly string[];
  weights?: CellGrid;
  intercept: boolean;
  /** Where each range sits on its worksheet; without one, rows and cells are named by position. */
  origins?: FrameOrigins;
}

/**
 * The worksheet origin of each range. y's origin numbers the rows (skipped rows, used rows);
 * every range's own origin names its cells in messages. x has one entry per block of input.x.
 */
export interface FrameOrigins {
  y?: RangeOrigin;
  x?: readonly (RangeOrigin | undefined)[];
  weights?: RangeOrigin;
}

export interface SkippedRow {
  /**
   * The row as the user reads it: its worksheet row when y's origin is known, else its 1-based
   * position in the input range (a header row counts as row 1).
   */
  row: number;
  reason: string;
}

/**
 * Worksheet ranges turned into a numeric model: the header decided, incomplete rows left out,
 * categorical columns coded. Everything downstream works on `data`.
 */
export interface ModelFrame {
  hasHeader: boolean;
  responseName: string;
  columns: SourceColumn[];
  /** Each used row, numbered as SkippedRow.row is. */
  usedRows: number[];
  skipped: SkippedRow[];
  data: ModelData;
  /** Term names in fit order, intercept included. */
  termNames: string[];
  /** For each predictor term (intercept excluded), the index of the x block it came from. */
  termBlocks: number[];
  /** For each predictor term (intercept excluded), the source column (across blocks) it codes. */
  termColumns: number[];
}

interface Located {
  argument: string;
  origin: RangeOrigin | undefined;
  /** Zero-based position within that argument's range. */
  column: number;
  singleColumn: boolean;
  name: string;
  categorical: boolean;
}

export function buildModelFrame(input: FrameInput): ModelFrame {
  const rowCount = input.y.length;
  if (rowCount === 0) throw new EngineError('no-rows', 'response is empty: select the column of responses.');
  requireRectangular(input.y, 'response');
  if (input.y[0].length !== 1) {
    throw new EngineError('shape', `response has ${input.y[0].length} columns; select a single column of responses.`);
  }
  const blockArgument = (b: number): string => input.xArguments?.[b] ?? 'predictors';
  const origins = input.origins ?? {};
  input.x.forEach((block, b) => requireRows(block, rowCount, blockArgument(b)));
  if (input.weights !== undefined) {
    requireRows(input.weights, rowCount, 'weights');
    if (input.weights[0].length !== 1) throw new EngineError('shape', `weights has ${input.weights[0].length} columns; select a single column.`);
  }

  const xColumns = input.x.flatMap((block) => Array.from({ length: block[0]?.length ?? 0 }, (_, j) => (i: number) => block[i][j]));
  const columnBlocks = input.x.flatMap((block, b) => Array.from({ length: block[0]?.length ?? 0 }, () => b));
  const columnWithinBlock = input.x.flatMap((block) => Array.from({ length: block[0]?.length ?? 0 }, (_, j) => j));
  const hasHeader = rowCount > 1 && classifyCell(input.y[0][0]).kind === 'text';
  const firstData = hasHeader ? 1 : 0;
  const responseName = hasHeader ? shortName((classifyCell(input.y[0][0]) as { text: string }).text) : 'y';
  const located = (j: number, name: string, categorical: boolean): Located => ({
    argument: blockArgument(columnBlocks[j]),
    origin: origins.x?.[columnBlocks[j]],
    column: columnWithinBlock[j],
    singleColumn: false,
    name,
    categorical,
  });
  const names = xColumns.map((cellAt, j) => headerName(hasHeader ? classifyCell(cellAt(0)) : undefined, j, located(j, '', false)));

  const classified = xColumns.map((cellAt) => Array.from({ length: rowCount - firstData }, (_, k) => classifyCell(cellAt(k + firstData))));
  const categorical = classified.map((cells) => cells.some((c) => c.kind === 'text') && !cells.some((c) => c.kind === 'number'));

  const usedRows: number[] = [];
  const skipped: SkippedRow[] = [];
  const y: number[] = [];
  const numericX: (number | string)[][] = [];
  const weights: number[] = [];
  const xPlaces = xColumns.map((_, j) => located(j, names[j], categorical[j]));
  const yPlace: Located = { argument: 'response', origin: origins.y, column: 0, singleColumn: true, name: responseName, categorical: false };
  const wPlace: Located = { argument: 'weights', origin: origins.weights, column: 0, singleColumn: true, name: 'weight', categorical: false };
  for (let k = 0; k < rowCount - firstData; k++) {
    const position = k + firstData;
    const row = rowNumber(origins.y, position);
    const yCell = classifyCell(input.y[position][0]);
    const wCell = input.weights === undefined ? undefined : classifyCell(input.weights[position][0]);
    const cells: [Cell, Located][] = [[yCell, yPlace], ...classified.map((column, j): [Cell, Located] => [column[k], xPlaces[j]])];
    if (wCell !== undefined) cells.push([wCell, wPlace]);
    cells.forEach(([cell, where]) => rejectBadCell(cell, where, position));
    const missing = cells.find(([cell]) => cell.kind === 'missing');
    if (missing !== undefined) {
      const [cell, where] = missing;
      skipped.push({ row, reason: `${cell.kind === 'missing' && cell.why === '#N/A' ? '#N/A' : 'blank'} in ${where.name}` });
      continue;
    }
    if (wCell !== undefined && wCell.kind === 'number' && !(wCell.value > 0)) {
      throw new EngineError('bad-weight', `${placeOf(wPlace, position)} is ${wCell.value}; every weight must be a positive number.`);
    }
    usedRows.push(row);
    y.push((yCell as { value: number }).value);
    numericX.push(classified.map((cells) => valueOf(cells[k])));
    if (wCell !== undefined) weights.push((wCell as { value: number }).value);
  }
  if (usedRows.length === 0) {
    throw new EngineError('no-rows', 'No complete rows: every row has a blank or #N/A in the response, a predictor or a weight.');
  }

  const coded = codeCategorical(numericX, names, categorical, input.intercept);
  return {
    hasHeader,
    responseName,
    columns: coded.columns,
    usedRows,
    skipped,
    data: { y, x: coded.x, names: coded.termNames, weights: input.weights === undefined ? undefined : weights },
    termNames: input.intercept ? [INTERCEPT_NAME, ...coded.termNames] : coded.termNames,
    termBlocks: coded.termColumns.map((c) => columnBlocks[c]),
    termColumns: coded.termColumns,
  };
}

function valueOf(cell: Cell): number | string {
  if (cell.kind === 'number') return cell.value;
  if (cell.kind === 'text') return cell.text;
  throw new Error(`unreachable: ${cell.kind} survived validation`);
}

function placeOf(where: Located, position: number): string {
  return cellPlace(where.argument, where.origin, position, where.column, where.singleColumn);
}

function headerName(cell: Cell | undefined, j: number, where: Located): string {
  if (cell === undefined || cell.kind === 'missing') return `x${j + 1}`;
  if (cell.kind === 'text') return shortName(cell.text);
  throw new EngineError(
    'bad-value',
    `response starts with a header but ${placeOf(where, 0)} holds ${describeCell(cell)}: ` +
      'give every predictor column a text header, or select the ranges without headers.',
  );
}

/** position: the cell's 0-based row within its range. */
function rejectBadCell(cell: Cell, where: Located, position: number): void {
  const ok = cell.kind === 'number' || cell.kind === 'missing' || (cell.kind === 'text' && where.categorical);
  if (ok) return;
  const place = `${placeOf(where, position)} ("${where.name}")`;
  const hint =
    cell.kind === 'text' && /^[-+]?[\d.,\s]+$/.test(cell.text)
      ? ' It looks like a number stored as text: re-enter it as a number without separators.'
      : ' Use a number, or leave the cell blank to skip the row.';
  throw new EngineError('bad-value', `${place} holds ${describeCell(cell)}.${hint}`);
}

function requireRectangular(grid: CellGrid, argument: string): void {
  const width = grid[0]?.length ?? 0;
  grid.forEach((row, i) => {
    if (row.length !== width) throw new EngineError('shape', `${argument} row ${i + 1} has ${row.length} cells; row 1 has ${width}.`);
  });
}

function requireRows(grid: CellGrid, rowCount: number, argument: string): void {
  if (grid.length !== rowCount) {
    throw new EngineError('shape', `response has ${rowCount} rows but ${argument} has ${grid.length}; select the same rows for both.`);
  }
  requireRectangular(grid, argument);
}
