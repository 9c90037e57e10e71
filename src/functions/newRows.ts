import { type CellGrid, cellPlace, codeRow, type ModelFrame, type RangeOrigin, readNewRowValues, rowNumber } from '../engine';

export interface NewRows {
  /** Coded rows in fit column order; undefined where the new row has a blank and is not predicted. */
  rows: (number[] | undefined)[];
}

/**
 * new_rows in the layout of predictors, read by the engine's one rule for new rows (the pane uses
 * it too). origin: where new_rows sits on its worksheet, so messages name its cells by address.
 */
export function readNewRows(grid: CellGrid, frame: ModelFrame, origin?: RangeOrigin): NewRows {
  const columns = frame.columns.map((c) => ({ name: c.name, levels: c.kind === 'categorical' ? c.levels : undefined }));
  const read = readNewRowValues(grid, columns, frame.hasHeader, {
    row: (position) => `new_rows row ${rowNumber(origin, position)}`,
    cell: (position, column) => cellPlace('new_rows', origin, position, column, false),
  });
  return { rows: read.map((row) => (row.values === undefined ? undefined : codeRow(row.values, frame.columns))) };
}
