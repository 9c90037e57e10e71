/**
 * `Range.text`: a cell's value as displayed under its number format. Covers General and the
 * plain numeric codes a report uses ("0", "0.00", "#,##0.00", "0.0%", "0.00E+00", "@");
 * any other code falls back to General. Column width is ignored (Excel would show "####").
 */
import type { CellValue } from '../workbook/types';
import { isCellError } from './cellValues';

function trimZeros(digits: string): string {
  return digits.includes('.') ? digits.replace(/0+$/, '').replace(/\.$/, '') : digits;
}

function scientific(value: number, decimals: number, trim: boolean): string {
  const [mantissa, exponent] = value.toExponential(decimals).split('e');
  const power = Number(exponent);
  const sign = power < 0 ? '-' : '+';
  return `${trim ? trimZeros(mantissa) : mantissa}E${sign}${String(Math.abs(power)).padStart(2, '0')}`;
}

/**
 * General as in a standard-width cell: up to 11 characters before switching to scientific
 * with six significant digits. An approximation of Excel's rule, not a copy of it.
 */
export function formatGeneral(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e11 || magnitude < 1e-4) return scientific(value, 5, true);
  const integerDigits = Math.max(1, Math.floor(Math.log10(magnitude)) + 1);
  const decimals = Math.max(0, 10 - integerDigits);
  const text = trimZeros(value.toFixed(decimals));
  return text === '-0' ? '0' : text;
}

function withThousands(fixed: string): string {
  const [whole, fraction] = fixed.split('.');
  const negative = whole.startsWith('-');
  const digits = negative ? whole.slice(1) : whole;
  const grouped = digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '-' : ''}${grouped}${fraction === undefined ? '' : `.${fraction}`}`;
}

export function formatNumber(value: number, format: string): string {
  const code = format.split(';')[0].trim();
  const scientificCode = /^0(?:\.(0+))?E\+00$/i.exec(code);
  if (scientificCode) return scientific(value, scientificCode[1]?.length ?? 0, false);
  const fixed = /^(#,##)?0(?:\.(0+))?(%?)$/.exec(code);
  if (!fixed) return formatGeneral(value);
  const decimals = fixed[2]?.length ?? 0;
  const scaled = fixed[3] ? value * 100 : value;
  let text = scaled.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (fixed[1]) text = withThousands(text);
  return `${text}${fixed[3]}`;
}

export function cellText(value: CellValue, format: string): string {
  if (value === null) return '';
  if (isCellError(value)) return value.error;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return value;
  if (format.trim() === '@') return formatGeneral(value);
  return formatNumber(value, format);
}
