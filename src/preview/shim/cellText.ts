/**
 * `Range.text`: a cell's value as displayed under its number format, by the same rules the
 * preview's grid shows it with (workbook/numberFormat.ts), so what the add-in reads back is what
 * the user sees. Column width is ignored (Excel would show "####").
 */
import { formatNumber, formatValue } from '../workbook/numberFormat';
import type { CellValue } from '../workbook/types';

export function cellText(value: CellValue, format: string): string {
  // "@" (text) shows a number as General.
  if (typeof value === 'number' && format.trim() === '@') return formatNumber(value, 'General');
  return formatValue(value, format);
}
