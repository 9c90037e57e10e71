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

/** Side-by-side concatenation of single-column grids into one grid. */
export function joinColumns(columns: readonly CellGrid[]): CellGrid {
  const rows = columns[0]?.length ?? 0;
  return Array.from({ length: rows }, (_, i) => columns.flatMap((c) => c[i] as CellValue[]));
}
