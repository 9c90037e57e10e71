/**
 * How many decimals a quantity is shown with, one rule for the report's number formats and the
 * fitted equation of PLUMB.EQUATION: about three significant digits of its standard error.
 */
export function decimalsFor(standardError: number): number {
  if (!(standardError > 0) || !Number.isFinite(standardError)) return 4;
  return Math.min(10, Math.max(2, 2 - Math.floor(Math.log10(standardError))));
}

/** The number format that shows that many decimals ("0.000"). */
export function fixedFormat(decimals: number): string {
  return decimals <= 0 ? '0' : `0.${'0'.repeat(decimals)}`;
}

/** The minus sign of text meant to be read (equations, summaries), not typed back into a cell. */
export const MINUS = '−';

/**
 * A value to that many decimals, split into its sign and digits: a value that rounds to zero has
 * no sign of its own, so the equation never reads "− 0.00".
 */
export function roundedParts(value: number, decimals: number): { negative: boolean; digits: string } {
  const digits = Math.abs(value).toFixed(decimals);
  return { negative: value < 0 && Number(digits) !== 0, digits };
}

/** A value to that many decimals, with the reading minus sign. */
export function formatDecimals(value: number, decimals: number): string {
  const { negative, digits } = roundedParts(value, decimals);
  return negative ? `${MINUS}${digits}` : digits;
}
