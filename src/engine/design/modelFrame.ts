import { EngineError } from '../errors';
import { INTERCEPT_NAME } from '../fit/design';
import type { ModelData } from '../types';
import { type Cell, type CellGrid, cellErrorCode, classifyCell } from './cells';
import { codeCategorical, type SourceColumn } from './categorical';
import { badCellMessage, badWeightMessage, isCategoricalColumn } from './cellRules';
import { frameNames } from './frameNames';
import { hostNumericFrame, type HostFrameInput } from './hostFrame';
import { numericFrame } from './numericFrame';
import { readNumericCells } from './numericCells';
import { cellPlace, columnLetters, type RangeOrigin, rowNumber } from './origin';

export type { HostFrameInput } from './hostFrame';

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
  /**
   * For each x block, the 0-based worksheet column its first column is named by when it has no
   * header, where that is not its origin's: the pane names the predictors a live report gathers
   * onto its own sheet by the columns there, the only ones the report's cell functions see.
   */
  xNamedAt?: readonly (number | undefined)[];
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

/**
 * Cells as CellValues, or a host's ranges as it hands them over (HostFrameInput: read in one pass
 * when all-numeric, else as the CellValues it makes on request).
 */
export function buildModelFrame(input: FrameInput | HostFrameInput): ModelFrame {
  if ('asCells' in input) return hostNumericFrame(input) ?? cellsFrame(input.asCells());
  return cellsFrame(input);
}

function cellsFrame(input: FrameInput): ModelFrame {
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
  const naming = frameNames(
    {
      rowCount,
      responseFirst: classifyCell(input.y[0][0]),
      widths: input.x.map((block) => block[0]?.length ?? 0),
      headerCell: (b, j) => classifyCell(input.x[b][0][j]),
      xArguments: input.xArguments,
      origins,
    },
    true,
  );
  const { hasHeader, firstData, responseName, names, columnBlocks, columnWithinBlock } = naming;
  const located = (j: number, name: string, categorical: boolean): Located => ({
    argument: blockArgument(columnBlocks[j]),
    origin: origins.x?.[columnBlocks[j]],
    column: columnWithinBlock[j],
    singleColumn: false,
    name,
    categorical,
  });

  // The common case, every cell a number, a blank or #N/A, in one pass; otherwise the general path.
  const numeric = readNumericCells(input.y, input.x, input.weights, firstData, [responseName, ...names, 'weight'], rowNumber(origins.y, 0), cellErrorCode);
  if (numeric !== undefined) return numericFrame(numeric, { hasHeader, responseName, names, columnBlocks, intercept: input.intercept });

  const classified = xColumns.map((cellAt) => Array.from({ length: rowCount - firstData }, (_, k) => classifyCell(cellAt(k + firstData))));
  const categorical = classified.map(isCategoricalColumn);

  const usedRows: number[] = [];
  const skipped: SkippedRow[] = [];
  const y: number[] = [];
  const numericX: (number | string)[][] = [];
  const weights: number[] = [];
  const xPlaces = xColumns.map((_, j) => located(j, names[j], categorical[j]));
  const yPlace: Located = { argument: 'response', origin: origins.y, column: 0, singleColumn: true, name: responseName, categorical: false };
  const wPlace: Located = { argument: 'weights', origin: origins.weights, column: 0, singleColumn: true, name: 'weight', categorical: false };
  // Per column (response, predictors, weights), the rows with a blank or #N/A, to name them if no row is complete.
  const columnNames = [yPlace, ...xPlaces, ...(input.weights === undefined ? [] : [wPlace])].map((where) => columnLabel(where, hasHeader));
  const missingCounts = columnNames.map(() => 0);
  for (let k = 0; k < rowCount - firstData; k++) {
    const position = k + firstData;
    const row = rowNumber(origins.y, position);
    const yCell = classifyCell(input.y[position][0]);
    const wCell = input.weights === undefined ? undefined : classifyCell(input.weights[position][0]);
    const cells: [Cell, Located][] = [[yCell, yPlace], ...classified.map((column, j): [Cell, Located] => [column[k], xPlaces[j]])];
    if (wCell !== undefined) cells.push([wCell, wPlace]);
    cells.forEach(([cell, where]) => rejectBadCell(cell, where, position));
    cells.forEach(([cell], c) => {
      if (cell.kind === 'missing') missingCounts[c] += 1;
    });
    const missing = cells.find(([cell]) => cell.kind === 'missing');
    if (missing !== undefined) {
      const [cell, where] = missing;
      skipped.push({ row, reason: `${cell.kind === 'missing' && cell.why === '#N/A' ? '#N/A' : 'blank'} in ${where.name}` });
      continue;
    }
    if (wCell !== undefined && wCell.kind === 'number' && !(wCell.value > 0)) {
      throw new EngineError('bad-weight', badWeightMessage(wCell.value, placeOf(wPlace, position)));
    }
    usedRows.push(row);
    y.push((yCell as { value: number }).value);
    numericX.push(classified.map((cells) => valueOf(cells[k])));
    if (wCell !== undefined) weights.push((wCell as { value: number }).value);
  }
  if (usedRows.length === 0) throw new EngineError('no-rows', noCompleteRows(columnNames, missingCounts, rowCount - firstData));

  const coded = codeCategorical(numericX, names, categorical, input.intercept);
  rejectIdentifierColumns(coded.columns, usedRows.length, skipped.length > 0);
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

/** Names the columns that left no row complete: those blank in every row, else each one with blanks. */
function noCompleteRows(columnNames: readonly string[], missingCounts: readonly number[], dataRows: number): string {
  const everywhere = columnNames.filter((_, c) => missingCounts[c] === dataRows);
  if (everywhere.length > 0) {
    const verb = everywhere.length === 1 ? 'is' : 'are';
    return `No complete rows: ${listOf(everywhere)} ${verb} blank or #N/A in every row. Select the column that holds the values.`;
  }
  const partly = columnNames.flatMap((name, c) => (missingCounts[c] > 0 ? [`${name} (${rowsText(missingCounts[c])})`] : []));
  return `No complete rows: every row has a blank or #N/A in ${listOf(partly, 'or')}.`;
}

/**
 * From this many rows on, a text column with a different level in every row is taken for an
 * identifier. Below it such a column is as likely a coincidence of few rows, and the fit's own
 * message (rows against parameters) says what is wrong.
 */
const IDENTIFIER_MIN_ROWS = 10;

/**
 * A text column with a level per row gives every row a term of its own: no model that includes it
 * has rows left to measure the noise (with or without the intercept), so it is named here, where
 * the cause is known, instead of as a count of parameters.
 */
function rejectIdentifierColumns(columns: readonly SourceColumn[], rowsUsed: number, someSkipped: boolean): void {
  if (rowsUsed < IDENTIFIER_MIN_ROWS) return;
  for (const column of columns) {
    if (column.kind === 'categorical' && column.levels.length === rowsUsed) {
      throw new EngineError(
        'no-residual-df',
        `${column.name} looks like an identifier: ${column.levels.length} levels for ${rowsUsed} rows${someSkipped ? ' used' : ''}, ` +
          `so every row would have a term of its own and none would be left to measure the noise. ` +
          `Leave ${column.name} out of the predictors, or enter its values as numbers if it measures an amount.`,
      );
    }
  }
}

/** A column as a message names it: by its header, else by its argument and place. */
function columnLabel(where: Located, hasHeader: boolean): string {
  if (where.argument === 'weights') return 'weights';
  if (hasHeader) return where.name;
  if (where.singleColumn) return where.argument;
  const column = where.origin === undefined ? String(where.column + 1) : columnLetters(where.origin.column + where.column);
  return `${where.argument} column ${column}`;
}

function rowsText(count: number): string {
  return count === 1 ? '1 row' : `${count} rows`;
}

/** "a", "a and b", "a, b and c". */
function listOf(items: readonly string[], conjunction = 'and'): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} ${conjunction} ${items[items.length - 1]}`;
}

function valueOf(cell: Cell): number | string {
  if (cell.kind === 'number') return cell.value;
  if (cell.kind === 'text') return cell.text;
  throw new Error(`unreachable: ${cell.kind} survived validation`);
}

function placeOf(where: Located, position: number): string {
  return cellPlace(where.argument, where.origin, position, where.column, where.singleColumn);
}

/** position: the cell's 0-based row within its range. */
function rejectBadCell(cell: Cell, where: Located, position: number): void {
  const ok = cell.kind === 'number' || cell.kind === 'missing' || (cell.kind === 'text' && where.categorical);
  if (ok) return;
  throw new EngineError('bad-value', badCellMessage(cell, `${placeOf(where, position)} ("${where.name}")`));
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
