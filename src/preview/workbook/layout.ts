/**
 * Sheet geometry in points, the unit of Excel's API for column widths and chart positions. The
 * grid draws it at 96 dpi. Rows all share one height here; columns can each have their own width.
 */
import { MAX_COLUMNS } from '../../addressing/a1';

/** The preview's own standard width (104 px), wider than Excel's so demo labels fit. */
export const STANDARD_COLUMN_WIDTH = 78;
export const ROW_HEIGHT = 18;
export const PIXELS_PER_POINT = 4 / 3;

/** A point on the sheet as a cell plus an offset into it, so it moves when widths change. */
export interface CellAnchor {
  row: number;
  column: number;
  dx: number;
  dy: number;
}

export type WidthOf = (column: number) => number;

export function columnLeft(widthOf: WidthOf, column: number): number {
  let left = 0;
  for (let c = 0; c < column; c++) left += widthOf(c);
  return left;
}

export function anchorAt(widthOf: WidthOf, x: number, y: number): CellAnchor {
  const row = Math.floor(y / ROW_HEIGHT);
  let left = 0;
  let column = 0;
  // Hidden (zero-width) columns cannot hold a point, so the loop passes over them.
  while (column < MAX_COLUMNS - 1 && left + widthOf(column) <= x) {
    left += widthOf(column);
    column++;
  }
  return { row, column, dx: x - left, dy: y - row * ROW_HEIGHT };
}

export function pointOf(widthOf: WidthOf, anchor: CellAnchor): { x: number; y: number } {
  // An offset wider than a column that has since narrowed stops at the column's edge, as in Excel.
  const dx = Math.min(anchor.dx, widthOf(anchor.column));
  return { x: columnLeft(widthOf, anchor.column) + dx, y: anchor.row * ROW_HEIGHT + Math.min(anchor.dy, ROW_HEIGHT) };
}
