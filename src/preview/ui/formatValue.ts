import type { CellValue } from '../workbook/types';

/**
 * How a cell's value reads on screen under its number format. Only the formats Plumbline writes
 * are interpreted: General, fixed decimals ("0.000"), percent ("0.0%") and scientific ("0.00E+00").
 */
export function formatValue(value: CellValue, numberFormat: string): string {
  if (value === null) return '';
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return value;
  if (typeof value === 'object') return value.error;
  return formatNumber(value, numberFormat);
}

function decimalsOf(pattern: string): number {
  const dot = pattern.indexOf('.');
  if (dot < 0) return 0;
  let n = 0;
  for (let i = dot + 1; i < pattern.length && (pattern[i] === '0' || pattern[i] === '#'); i++) n++;
  return n;
}

export function formatNumber(value: number, numberFormat: string): string {
  const format = numberFormat.trim();
  if (format === '' || format.toLowerCase() === 'general') return general(value);
  if (/E\+0+$/i.test(format)) return scientific(value, decimalsOf(format));
  if (format.endsWith('%')) return `${(value * 100).toFixed(decimalsOf(format))}%`;
  if (/^[0#,]*(\.[0#]+)?$/.test(format)) return value.toFixed(decimalsOf(format));
  return general(value);
}

function scientific(value: number, decimals: number): string {
  const [mantissa, exponent] = value.toExponential(decimals).split('e');
  const e = Number(exponent);
  return `${mantissa}E${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`;
}

/** Characters a General number may take: what a standard-width column shows. */
export const GENERAL_WIDTH = 11;

/**
 * As many significant digits as fit in a standard column, switching to scientific notation for
 * numbers too large or too small to show that way. The full value stays in the cell.
 */
function general(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude < 1e11 && magnitude >= 1e-4) {
    for (let digits = 10; digits >= 1; digits--) {
      const text = String(Number(value.toPrecision(digits)));
      if (text.length <= GENERAL_WIDTH && !text.includes('e')) return text;
    }
  }
  for (let decimals = 5; decimals >= 0; decimals--) {
    const text = scientific(value, decimals).replace(/\.?0+E/, 'E');
    if (text.length <= GENERAL_WIDTH) return text;
  }
  return scientific(value, 0);
}
