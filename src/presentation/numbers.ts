/**
 * How numbers read in sentences: the pane's cards, warnings and the readings in cells. Every
 * number format Plumbline shows in words lives in this module (src/presentation).
 */

/** Significant digits of a number in a sentence: enough to read, never false precision. */
export const SIGNIFICANT_DIGITS = 3;

/**
 * Three significant digits with their trailing zeros kept (1.50, not 1.5: a significant zero is
 * shown), plain for ordinary magnitudes and in exponent form below 1e-4 or from 1e6 up.
 */
export function formatNumber(value: number): string {
  if (Number.isNaN(value)) return 'not defined';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) return value.toExponential(SIGNIFICANT_DIGITS - 1);
  const text = value.toPrecision(SIGNIFICANT_DIGITS);
  // toPrecision writes 1234 as "1.23e+3": a whole number that large is shown rounded, without the exponent.
  return text.includes('e') ? String(Number(text)) : text;
}

/** formatNumber with a plus sign on positive values, so a size reads in the direction of its interval. */
export function formatSigned(value: number): string {
  return value > 0 ? `+${formatNumber(value)}` : formatNumber(value);
}

/** A fixed number of decimals, trailing zeros kept ("3.20"); never "-0.00". */
export function formatFixed(value: number, decimals: number): string {
  if (Number.isNaN(value)) return 'not defined';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** A share near 1 (an uncentered R²) with enough digits that it never shows as a bare 1 unless it is exactly 1. */
export function formatShare(value: number): string {
  if (!Number.isFinite(value) || value === 1 || value < 0.999) return formatNumber(value);
  const digits = Math.min(12, Math.ceil(-Math.log10(1 - value)) + 2);
  return value.toFixed(digits);
}

/** A count of rows, with thousands separators ("12,345"). */
export function formatCount(count: number): string {
  return count.toLocaleString('en-US');
}

/** A confidence level as a percentage, with as many digits as it was given ("95%", "99.9999%"). */
export function formatLevel(level: number): string {
  return `${Number((100 * level).toPrecision(6))}%`;
}
