/** What a PLUMB function may put in a cell: a finite number or text, never NaN, ∞ or null. */
export type GridCell = number | string;
export type Grid = GridCell[][];

/** NaN and ±∞ become "" (a null would show as 0, and a non-finite number is never a result). */
export function finiteOrBlank(value: number): GridCell {
  return Number.isFinite(value) ? value : '';
}
