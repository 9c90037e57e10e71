/**
 * Addresses as `invocation.parameterAddresses` gives them ("Custom parameter options", Detect the
 * address of a parameter): `SheetName!RelativeCellAddress`, e.g. `Costs!D8` or `Data!B1:B61`, the
 * sheet name quoted when it holds a space or one of the characters the docs list, with inner
 * quotes doubled (`'Bob''s Region'!F6`).
 */
import { formatRange } from '../../addressing/a1';
import type { RangeRef } from './types';

/** The docs' list: a blank space or any of ~ ` ! @ # $ % ^ & ( ) - _ = + { } | ; : , ' < . > */
const NEEDS_QUOTES = /[\s~`!@#$%^&()\-_=+{}|;:,'<.>]/;

export function invocationSheetName(name: string): string {
  return NEEDS_QUOTES.test(name) ? `'${name.replace(/'/g, "''")}'` : name;
}

export function parameterAddress(range: RangeRef): string {
  return `${invocationSheetName(range.sheet)}!${formatRange(range, false)}`;
}
