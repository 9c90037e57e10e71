import type { CellGrid, CellValue } from '../../engine';

/**
 * Range.values gives numbers, strings (blanks as "", errors as their text such as "#N/A") and
 * booleans; anything else is treated as blank.
 */
export function asCellGrid(values: readonly (readonly unknown[])[]): CellGrid {
  return values.map((row) => row.map(asCellValue));
}

export function asCellValue(v: unknown): CellValue {
  return typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean' ? v : null;
}
