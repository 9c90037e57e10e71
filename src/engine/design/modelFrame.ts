import { EngineError } from '../errors';
import { INTERCEPT_NAME } from '../fit/design';
import type { ModelData } from '../types';
import { type Cell, type CellGrid, classifyCell, describeCell, shortName } from './cells';
import { codeCategorical, type SourceColumn } from './categorical';

export interface FrameInput {
  y: CellGrid;
  /** One or more blocks of predictor columns, side by side, each with the rows of y. */
  x: readonly CellGrid[];
  /** How each block is named in messages (default known_x). */
  xArguments?: readonly string[];
  weights?: CellGrid;
  intercept: boolean;
}

export interface SkippedRow {
  /** 1-based position in the input range (a header row counts as row 1). */
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
  /** Zero-based position within that argument's range. */
  column: number;
  name: string;
  categorical: boolean;
}

export function buildModelFrame(input: FrameInput): ModelFrame {
  const rowCount = input.y.length;
  if (rowCount === 0) throw new EngineError('no-rows', 'known_y is empty: select the column of responses.');
  requireRectangular(input.y, 'known_y');
  if (input.y[0].length !== 1) {
    throw new EngineError('shape', `known_y has ${input.y[0].length} columns; select a single column of responses.`);
  }
  const blockArgument = (b: number): string => input.xArguments?.[b] ?? 'known_x';
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
  const names = xColumns.map((cellAt, j) =>
    headerName(hasHeader ? classifyCell(cellAt(0)) : undefined, j, blockArgument(columnBlocks[j]), columnWithinBlock[j]),
  );

  const classified = xColumns.map((cellAt) => Array.from({ length: rowCount - firstData }, (_, k) => classifyCell(cellAt(k + firstData))));
  const categorical = classified.map((cells) => cells.some((c) => c.kind === 'text') && !cells.some((c) => c.kind === 'number'));

  const usedRows: number[] = [];
  const skipped: SkippedRow[] = [];
  const y: number[] = [];
  const numericX: (number | string)[][] = [];
  const weights: number[] = [];
  for (let k = 0; k < rowCount - firstData; k++) {
    const row = k + firstData + 1;
    const yCell = classifyCell(input.y[k + firstData][0]);
    const wCell = input.weights === undefined ? undefined : classifyCell(input.weights[k + firstData][0]);
    const located: [Cell, Located][] = [
      [yCell, { argument: 'known_y', column: 0, name: responseName, categorical: false }],
      ...classified.map((cells, j): [Cell, Located] => [
        cells[k],
        { argument: blockArgument(columnBlocks[j]), column: columnWithinBlock[j], name: names[j], categorical: categorical[j] },
      ]),
    ];
    if (wCell !== undefined) located.push([wCell, { argument: 'weights', column: 0, name: 'weight', categorical: false }]);
    located.forEach(([cell, where]) => rejectBadCell(cell, where, row));
    const missing = located.find(([cell]) => cell.kind === 'missing');
    if (missing !== undefined) {
      const [cell, where] = missing;
      skipped.push({ row, reason: `${cell.kind === 'missing' && cell.why === '#N/A' ? '#N/A' : 'blank'} in ${where.name}` });
      continue;
    }
    if (wCell !== undefined && wCell.kind === 'number' && !(wCell.value > 0)) {
      throw new EngineError('bad-weight', `weights row ${row} is ${wCell.value}; every weight must be a positive number.`);
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

function headerName(cell: Cell | undefined, j: number, argument: string, column: number): string {
  if (cell === undefined || cell.kind === 'missing') return `x${j + 1}`;
  if (cell.kind === 'text') return shortName(cell.text);
  throw new EngineError(
    'bad-value',
    `known_y starts with a header but ${argument} row 1, column ${column + 1} holds ${describeCell(cell)}: ` +
      'give every predictor column a text header, or select the ranges without headers.',
  );
}

function rejectBadCell(cell: Cell, where: Located, row: number): void {
  const ok = cell.kind === 'number' || cell.kind === 'missing' || (cell.kind === 'text' && where.categorical);
  if (ok) return;
  const column = where.argument === 'known_y' || where.argument === 'weights' ? '' : `, column ${where.column + 1}`;
  const place = `${where.argument} row ${row}${column} ("${where.name}")`;
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
    throw new EngineError('shape', `known_y has ${rowCount} rows but ${argument} has ${grid.length}; select the same rows for both.`);
  }
  requireRectangular(grid, argument);
}
