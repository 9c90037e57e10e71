import { cellAddress } from '../../addressing/a1';
import type { ReportCell } from './reportPlan';
import { headerAddresses, pieceAddress, tablePieces } from './residualTableLayout';

/** The table's growth is read back in blocks, as the data are, to keep each sync small. */
const CHECK_BLOCK_ROWS = 20_000;

/**
 * Addresses a refresh would newly write: report cells the previous report left empty, and the
 * residual table's entries (and panel headers) beyond its previous length. These may hold what
 * the user typed since, so a refresh checks them before it writes anything (no data lost).
 */
export function newlyWrittenAddresses(
  previous: readonly ReportCell[],
  next: readonly ReportCell[],
  previousTableRows: number,
  nextTableRows: number,
): string[] {
  const written = new Set(previous.map((c) => `${c.row},${c.column}`));
  const cells = next.filter((c) => !written.has(`${c.row},${c.column}`)).map((c) => cellAddress(c.row, c.column));
  const newHeaders = headerAddresses(nextTableRows).slice(headerAddresses(previousTableRows).length);
  const growth = nextTableRows > previousTableRows ? tablePieces(previousTableRows, nextTableRows - previousTableRows, CHECK_BLOCK_ROWS) : [];
  return [...cells, ...newHeaders, ...growth.map(pieceAddress)];
}
