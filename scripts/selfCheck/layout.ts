/**
 * Where things sit in the self-check workbook, shared by the generator and its test. Every data
 * sheet has the same shape: a title and its sources on top, the data from column A under a
 * header row, the check table in columns I to M beside it, and the raw PLUMB results from
 * column O, one block under another so a result that gains a column never runs into the next.
 */
import { cellAddress, columnLetters } from '../../src/addressing/a1';

/**
 * A check passes when the log relative error is at least 10: about ten significant digits agree.
 * The engine reaches 13 or more on every value here (test/engine/fitModel.strd.test.ts and this
 * workbook's own test), so 10 leaves three digits for another JavaScript engine's elementary
 * functions and for Excel's own arithmetic in the LRE formula, while a wrong row, a wrong model
 * or a result that lost precision falls far below it.
 */
export const PASS_LRE = 10;

/** LRE is capped at 15: doubles hold about 15–17 significant digits and the values print 15. */
export const LRE_CAP = 15;

export const SUMMARY_SHEET = 'Summary';

/** 0-based worksheet rows and columns. */
export const DATA_HEADER_ROW = 4;
export const CHECK_COLUMNS = { label: 8, expected: 9, plumbline: 10, lre: 11, result: 12 } as const;
export const OUTPUT_COLUMN = 14;

/** The Summary sheet's cells. */
export const SUMMARY = {
  overall: { row: 3, column: 1 },
  passed: { row: 4, column: 1 },
  total: { row: 5, column: 1 },
  threshold: { row: 6, column: 1 },
  /** The first row of the per-sheet table; its header sits one row above. */
  firstSection: 9,
} as const;

export function absolute(row: number, column: number): string {
  return `$${columnLetters(column)}$${row + 1}`;
}

export function relative(row: number, column: number): string {
  return cellAddress(row, column);
}
