/**
 * The one rule for p-values, in the pane's sentences, the cells' readings and the report's cells:
 * four decimals, trailing zeros kept, and below 0.0001 "< 0.0001" rather than a row of zeros. The
 * report writes p-values as numbers under P_VALUE_FORMAT, which Excel displays by the same rule;
 * test/presentation/pValues.test.ts renders both and compares them.
 */

/** Decimals of a p-value. */
export const P_VALUE_DECIMALS = 4;

/** The smallest p-value shown by its digits: 0.0001. */
const FLOOR = 10 ** -P_VALUE_DECIMALS;
const FLOOR_TEXT = FLOOR.toFixed(P_VALUE_DECIMALS);

/**
 * Excel's number format for a p-value cell: a conditional section for values below the floor
 * (shown as the quoted text "<0.0001"), then four fixed decimals for the rest.
 */
export const P_VALUE_FORMAT = `[<${FLOOR_TEXT}]"<${FLOOR_TEXT}";0.${'0'.repeat(P_VALUE_DECIMALS)}`;

/** A p-value as its cell shows it under P_VALUE_FORMAT: "0.0123", "1.0000" or "<0.0001". */
export function formatPValue(p: number): string {
  return p < FLOOR ? `<${FLOOR_TEXT}` : p.toFixed(P_VALUE_DECIMALS);
}

/** A p-value in a sentence: "p = 0.0123", "p < 0.0001", or "p not defined" when there is none. */
export function formatP(p: number): string {
  if (!Number.isFinite(p)) return 'p not defined';
  return p < FLOOR ? `p < ${FLOOR_TEXT}` : `p = ${p.toFixed(P_VALUE_DECIMALS)}`;
}
