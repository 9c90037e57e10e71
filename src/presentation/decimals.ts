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
