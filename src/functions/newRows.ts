import { type CellGrid, cellPlace, classifyCell, codeRow, describeCell, EngineError, type ModelFrame, type RangeOrigin, rowNumber } from '../engine';

export interface NewRows {
  /** Coded rows in fit column order; undefined where the new row has a blank and is not predicted. */
  rows: (number[] | undefined)[];
}

/**
 * new_rows in the layout of predictors: the same source columns, categorical ones as level text. A
 * first row that repeats predictors' headers is taken as a header and skipped. origin: where new_rows
 * sits on its worksheet, so messages name its cells by address.
 */
export function readNewRows(grid: CellGrid, frame: ModelFrame, origin?: RangeOrigin): NewRows {
  const width = frame.columns.length;
  if (grid.length === 0) throw new EngineError('shape', 'new_rows is empty: select the rows to predict.');
  grid.forEach((row, i) => {
    if (row.length !== width) {
      throw new EngineError(
        'shape',
        `new_rows row ${rowNumber(origin, i)} has ${row.length} columns; predictors has ${width}. Lay new rows out like predictors.`,
      );
    }
  });
  const repeatsHeader = (row: CellGrid[number]): boolean =>
    frame.hasHeader &&
    frame.columns.every((c, j) => {
      const cell = classifyCell(row[j]);
      return cell.kind === 'text' && cell.text.toLowerCase() === c.name.toLowerCase();
    });
  const start = repeatsHeader(grid[0]) ? 1 : 0;

  const rows = grid.slice(start).map((row, k) => {
    const cells = row.map(classifyCell);
    if (cells.some((c) => c.kind === 'missing')) return undefined;
    const values = cells.map((cell, j) => {
      const column = frame.columns[j];
      if (cell.kind === 'number' && column.kind === 'numeric') return cell.value;
      if (cell.kind === 'text' && column.kind === 'categorical') return cell.text;
      throw new EngineError(
        'bad-value',
        `${cellPlace('new_rows', origin, k + start, j, false)} ("${column.name}") holds ${describeCell(cell)}; ` +
          (column.kind === 'numeric' ? 'it needs a number.' : `it needs one of the levels ${column.levels.join(', ')}.`),
      );
    });
    return codeRow(values, frame.columns);
  });
  return { rows };
}
