import { cellAddress } from '../../addressing/a1';

/**
 * Where a values report keeps its residual table: from column K, header in row 5, one row per
 * used data row. A sheet has 1,048,576 rows, fewer than a full sheet's data plus the header, so
 * the table continues in panels of a million rows side by side (K:M, then O:Q, …), each with its
 * own header.
 */
export const RESIDUAL_TABLE_TOP = 4;
export const RESIDUAL_TABLE_LEFT = 10;
export const RESIDUAL_TABLE_COLUMNS = 3;
export const ROWS_PER_PANEL = 1_000_000;
/** Three columns and an empty one between panels. */
const PANEL_STRIDE = RESIDUAL_TABLE_COLUMNS + 1;

/** A rectangle of table rows within one panel: entries [start, start + rows) of the table. */
export interface TablePiece {
  top: number;
  left: number;
  start: number;
  rows: number;
}

export function panelsFor(rows: number): number {
  return Math.max(1, Math.ceil(rows / ROWS_PER_PANEL));
}

export function panelLeft(panel: number): number {
  return RESIDUAL_TABLE_LEFT + panel * PANEL_STRIDE;
}

/** The rectangles that entries [first, first + count) occupy, split at panel ends and every `maxRows`. */
export function tablePieces(first: number, count: number, maxRows = ROWS_PER_PANEL): TablePiece[] {
  const pieces: TablePiece[] = [];
  for (let start = first; start < first + count;) {
    const panel = Math.floor(start / ROWS_PER_PANEL);
    const within = start - panel * ROWS_PER_PANEL;
    const rows = Math.min(first + count - start, ROWS_PER_PANEL - within, maxRows);
    pieces.push({ top: RESIDUAL_TABLE_TOP + 1 + within, left: panelLeft(panel), start, rows });
    start += rows;
  }
  return pieces;
}

export function pieceAddress(piece: TablePiece): string {
  return `${cellAddress(piece.top, piece.left)}:${cellAddress(piece.top + piece.rows - 1, piece.left + RESIDUAL_TABLE_COLUMNS - 1)}`;
}

/** Each panel's header row, for a table of `rows` entries. */
export function headerAddresses(rows: number): string[] {
  return Array.from({ length: panelsFor(rows) }, (_, panel) => {
    const left = panelLeft(panel);
    return `${cellAddress(RESIDUAL_TABLE_TOP, left)}:${cellAddress(RESIDUAL_TABLE_TOP, left + RESIDUAL_TABLE_COLUMNS - 1)}`;
  });
}
