/**
 * The rules every path from cells to a design shares (the model frame of the cell functions and
 * the in-memory pane, and the pane's streamed blocks), so that a column is judged and a bad cell
 * is worded the same way wherever the data arrive.
 */
import { type Cell, describeCell } from './cells';

/** A column is categorical when it holds text and no number (blanks and #N/A aside). */
export function isCategoricalColumn(cells: readonly Cell[]): boolean {
  return cells.some((c) => c.kind === 'text') && !cells.some((c) => c.kind === 'number');
}

/**
 * The message for a cell a numeric column cannot take; `place` names it as the user finds it,
 * e.g. `predictors cell Data!C5 ("Temp")`.
 */
export function badCellMessage(cell: Cell, place: string): string {
  const hint =
    cell.kind === 'text' && /^[-+]?[\d.,\s]+$/.test(cell.text)
      ? ' It looks like a number stored as text: re-enter it as a number without separators.'
      : ' Use a number, or leave the cell blank to skip the row.';
  return `${place} holds ${describeCell(cell)}.${hint}`;
}

/** The message for a weight that is not positive; `place` names its cell, e.g. `weights cell Data!D5`. */
export function badWeightMessage(value: number, place: string): string {
  return `${place} is ${value}; every weight must be a positive number.`;
}
