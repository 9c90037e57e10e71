/**
 * New rows to predict, read by one rule for the cell functions (PLUMB.PREDICT) and the pane: laid
 * out like the predictors, categorical columns as level text; a first row that repeats the
 * predictors' headers is a header and skipped; a row with a blank is kept, unpredicted, so the
 * rows stay in step with the sheet; any other cell that does not fit its column is an error.
 */
import { EngineError } from '../errors';
import { type CellGrid, classifyCell, describeCell } from './cells';

/** A predictor column as new values must fit it: numeric, or categorical with its levels. */
export interface NewRowColumn {
  name: string;
  /** The levels of a categorical column; undefined for a numeric one. */
  levels: readonly string[] | undefined;
}

/** How messages name a new row and one of its cells, as the caller's user finds them. */
export interface NewRowNaming {
  /** E.g. "new_rows row 12" or "New row 12"; `position` counts from the first row of the grid. */
  row(position: number): string;
  /** E.g. "new_rows cell Plan!C12". */
  cell(position: number, column: number): string;
}

/** One new row: its position in the grid and its values, or the column whose blank leaves it out. */
export type NewRowValues = { position: number; values: (number | string)[]; blankIn: undefined } | { position: number; values: undefined; blankIn: string };

export function readNewRowValues(grid: CellGrid, columns: readonly NewRowColumn[], hasHeader: boolean, naming: NewRowNaming): NewRowValues[] {
  if (grid.length === 0) throw new EngineError('shape', 'The new rows are empty: select the rows to predict.');
  grid.forEach((row, i) => {
    if (row.length !== columns.length) {
      throw new EngineError('shape', `${naming.row(i)} has ${row.length} columns; predictors has ${columns.length}. Lay new rows out like predictors.`);
    }
  });
  const repeatsHeader =
    hasHeader &&
    columns.every((c, j) => {
      const cell = classifyCell(grid[0][j]);
      return cell.kind === 'text' && cell.text.toLowerCase() === c.name.toLowerCase();
    });
  const start = repeatsHeader ? 1 : 0;
  return grid.slice(start).map((row, k): NewRowValues => {
    const position = k + start;
    const cells = row.map(classifyCell);
    const blankAt = cells.findIndex((c) => c.kind === 'missing');
    if (blankAt >= 0) return { position, values: undefined, blankIn: columns[blankAt].name };
    const values = cells.map((cell, j) => {
      const column = columns[j];
      if (cell.kind === 'number' && column.levels === undefined) return cell.value;
      if (cell.kind === 'text' && column.levels !== undefined) return cell.text;
      throw new EngineError(
        'bad-value',
        `${naming.cell(position, j)} ("${column.name}") holds ${describeCell(cell)}; ` +
          (column.levels === undefined ? 'it needs a number.' : `it needs one of the levels ${column.levels.join(', ')}.`),
      );
    });
    return { position, values, blankIn: undefined };
  });
}
