/**
 * Sizing of the pane's requests by payload, not by rows: Excel on the web rejects any request or
 * response over 5 MB (RequestPayloadSizeLimitExceeded, ResponsePayloadSizeLimitExceeded; "Resource
 * limits and performance optimization for Office Add-ins"), and a row of twenty predictors weighs
 * twenty times a row of one.
 */

/** What one request or response aims at: well under 5 MB, leaving room for the envelope around the values. */
export const PAYLOAD_BUDGET_BYTES = 4_000_000;

/**
 * Bytes per cell assumed before any have been measured: the longest text of a double
 * ("-2.2250738585072014e-308", 24 characters) and the brackets and comma around a cell of a
 * one-column block.
 */
export const FIRST_GUESS_CELL_BYTES = 28;

/**
 * An allowance for what a request says about one operation besides its values (object path,
 * address, property): our own generous estimate, not a documented figure.
 */
export const OPERATION_BYTES = 200;

const LIMIT_CODES: ReadonlySet<string> = new Set(['RequestPayloadSizeLimitExceeded', 'ResponsePayloadSizeLimitExceeded']);

/** True for the error Excel rejects an over-large request or response with. */
export function isPayloadLimit(error: unknown): boolean {
  if (typeof error !== 'object' || error === null || !('code' in error)) return false;
  return LIMIT_CODES.has(String(error.code));
}

/**
 * UTF-8 length of the JSON text of `value`: what travels, so text in other scripts counts at its
 * real weight (JSON's own length counts UTF-16 units).
 */
export function jsonBytes(value: unknown): number {
  const text = JSON.stringify(value) ?? '';
  let bytes = text.length;
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    // A surrogate pair is 2 units and 4 bytes; other units past U+007F take 2 or 3 bytes for 1 unit.
    if (unit >= 0x80) bytes += unit < 0x800 || (unit >= 0xd800 && unit <= 0xdfff) ? 1 : 2;
  }
  return bytes;
}

/**
 * Rows per read block, learned as blocks come back: the first from a guess per cell, each next one
 * from the bytes per row just measured (at most doubling, as rows may grow heavier further down),
 * and half the last when Excel refused it as too large. After a refusal the budget drops to the
 * bytes of the first block accepted since, so a host with a lower limit is not asked again and
 * again for more than it takes.
 */
export class BlockSizer {
  private current: number;
  private budget: number;
  private refused = false;

  constructor(cellsPerRow: number, budget = PAYLOAD_BUDGET_BYTES) {
    this.budget = budget;
    this.current = Math.max(1, Math.floor(budget / (Math.max(1, cellsPerRow) * FIRST_GUESS_CELL_BYTES)));
  }

  get rows(): number {
    return this.current;
  }

  /** A block of `rows` rows came back as `bytes` bytes. */
  measured(rows: number, bytes: number): void {
    if (this.refused) {
      this.budget = Math.min(this.budget, bytes);
      this.refused = false;
    }
    const perRow = Math.max(1, bytes / Math.max(1, rows));
    this.current = Math.max(1, Math.min(2 * rows, Math.floor(this.budget / perRow)));
  }

  /** Excel refused a block of `rows` rows as too large; false when a single row already was. */
  rejected(rows: number): boolean {
    if (rows <= 1) return false;
    this.current = Math.ceil(rows / 2);
    this.refused = true;
    return true;
  }
}

/**
 * Consecutive pieces [start, start + count) of `count` units (rows, or queued cell writes) whose
 * estimated bytes stay within the budget; a unit heavier than the budget is a piece of its own.
 */
export function piecesWithin(count: number, bytesOf: (index: number) => number, budget = PAYLOAD_BUDGET_BYTES): { start: number; count: number }[] {
  const pieces: { start: number; count: number }[] = [];
  let start = 0;
  let bytes = 0;
  for (let i = 0; i < count; i++) {
    const unit = bytesOf(i);
    if (i > start && bytes + unit > budget) {
      pieces.push({ start, count: i - start });
      start = i;
      bytes = 0;
    }
    bytes += unit;
  }
  if (count > start) pieces.push({ start, count: count - start });
  return pieces;
}
