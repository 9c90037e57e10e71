/**
 * Where each argument's range sits on its worksheet, from the invocation Excel passes a function
 * tagged @requiresParameterAddresses ("Custom functions parameter options", Detect the address of
 * a parameter): one address per argument, `SheetName!RelativeCellAddress` such as `Costs!D8` or
 * `Data!B1:B61`, the sheet quoted when its name needs it (`'Bob''s Region'!F6`). An argument that
 * is no reference (an array constant, a number, an omitted argument) has no address: "" or
 * nothing at its index. Whole columns (`Data!B:B`) start at row 1.
 */
import type { RangeOrigin } from '../engine';
import { columnIndex, MAX_COLUMNS, MAX_ROWS, splitAreas, splitSheet } from '../addressing/a1';

/** The part of CustomFunctions.Invocation read here; everything else Excel passes is ignored. */
export interface InvocationArgument {
  parameterAddresses?: readonly unknown[];
}

/** The top-left cell of the first (or only) cell, range, whole column or whole row in an address. */
const TOP_LEFT = /^\$?([A-Za-z]{1,3})?\$?(\d{1,7})?$/;

export function originOf(address: unknown): RangeOrigin | undefined {
  if (typeof address !== 'string') return undefined;
  const areas = splitAreas(address);
  // No reference, or a multi-area one such as (B1:B9,D1:D9), which has no single origin.
  if (areas.length !== 1) return undefined;
  const { sheet, address: cells } = splitSheet(areas[0]);
  const parts = cells.split(':');
  const match = TOP_LEFT.exec(parts[0]);
  if (match === null || (match[1] === undefined && match[2] === undefined)) return undefined;
  // A lone "B" or "12" is no cell; only B:B or 12:12 name whole columns or rows.
  if (parts.length === 1 && (match[1] === undefined || match[2] === undefined)) return undefined;
  const column = match[1] === undefined ? 0 : columnIndex(match[1]);
  const row = match[2] === undefined ? 0 : Number(match[2]) - 1;
  if (row < 0 || row >= MAX_ROWS || column >= MAX_COLUMNS) return undefined;
  return sheet === undefined ? { row, column } : { sheet, row, column };
}

/**
 * The origin of each argument by its position in the function's parameter list; undefined where
 * Excel gave no address (no invocation, as when tests call a function directly, or no reference).
 */
export function argumentOrigins(invocation: InvocationArgument | null | undefined): (index: number) => RangeOrigin | undefined {
  const addresses = invocation?.parameterAddresses;
  return (index) => originOf(addresses?.[index]);
}
