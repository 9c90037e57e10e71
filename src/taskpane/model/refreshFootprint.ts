import { cellAddress } from '../../addressing/a1';
import type { ReportCell } from './reportPlan';

const CHECK_BLOCK_ROWS = 20_000;

/** The residual table's place on a values report: its header row and its left column (0-based). */
export interface ResidualTablePlace {
  top: number;
  left: number;
  columns: number;
}

/**
 * Addresses a refresh would newly write: report cells the previous report left empty, and the
 * residual table's rows beyond its previous length. These may hold what the user typed since,
 * so a refresh checks them before it writes anything (no data lost).
 */
export function newlyWrittenAddresses(
  previous: readonly ReportCell[],
  next: readonly ReportCell[],
  table: ResidualTablePlace,
  previousTableRows: number,
  nextTableRows: number,
): string[] {
  const written = new Set(previous.map((c) => `${c.row},${c.column}`));
  const cells = next.filter((c) => !written.has(`${c.row},${c.column}`)).map((c) => cellAddress(c.row, c.column));
  // The table's growth is read back in blocks, as the data are, to keep each sync small.
  const last = table.top + nextTableRows;
  for (let first = table.top + previousTableRows + 1; first <= last; first += CHECK_BLOCK_ROWS) {
    const end = Math.min(last, first + CHECK_BLOCK_ROWS - 1);
    cells.push(`${cellAddress(first, table.left)}:${cellAddress(end, table.left + table.columns - 1)}`);
  }
  return cells;
}
