/**
 * How cell contents cross the API boundary: what `values` and `formulas` read,
 * and how a written value becomes a model input, following Excel's treatment of written strings.
 */
import type { CellInput, CellValue } from '../workbook/types';

export type ApiCellValue = number | string | boolean;

export function isCellError(value: CellValue): value is { error: string; message?: string } {
  return typeof value === 'object' && value !== null;
}

/** Excel reads blanks as "" and errors as their text ("#VALUE!"). */
export function apiValue(value: CellValue): ApiCellValue {
  if (value === null) return '';
  if (isCellError(value)) return value.error;
  return value;
}

/** Formula text for formula cells, the constant otherwise, "" for a blank. */
export function apiFormula(input: CellInput): ApiCellValue {
  return input === null ? '' : input;
}

/** A written null leaves the cell as it is, as in Office.js. */
export const KEEP = Symbol('keep existing input');

const NUMBER = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
const PERCENT = /^\s*([+-]?(?:\d+\.?\d*|\.\d+))\s*%\s*$/;

/**
 * A written value as Excel stores it: strings are read like typed entries (numbers, percents,
 * TRUE/FALSE; "=", "+" and "-" start a formula) unless the cell is formatted as text ("@").
 * Undefined means the value cannot be written at all.
 */
export function inputFromWrite(value: unknown, cellIsText: boolean): CellInput | typeof KEEP | undefined {
  if (value === null || value === undefined) return KEEP;
  if (typeof value === 'number') return Number.isFinite(value) ? value : undefined;
  if (typeof value === 'boolean') return value;
  if (typeof value !== 'string') return undefined;
  if (value === '') return null;
  if (cellIsText) return value;
  if (NUMBER.test(value)) return Number(value);
  const percent = PERCENT.exec(value);
  if (percent) return Number(percent[1]) / 100;
  const upper = value.trim().toUpperCase();
  if (upper === 'TRUE' || upper === 'FALSE') return upper === 'TRUE';
  if (value.startsWith('=')) return value;
  if (value.length > 1 && (value.startsWith('+') || value.startsWith('-'))) return `=${value}`;
  return value;
}
