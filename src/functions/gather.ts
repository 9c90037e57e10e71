/**
 * PLUMB.GATHER: several areas side by side as one block, cell for cell. A plain reference formula
 * turns a blank into 0 in Excel, which a fit would take as data; GATHER keeps a blank blank ("",
 * since a null in a returned array shows as 0) and an error the same error, so the PLUMB
 * functions that read the block skip and report exactly what they would in the source cells.
 */
import { EngineError } from '../engine';
import { errorValue, type CellError } from './cellError';
import { errorCodeOf } from './cellInput';

export type GatheredCell = number | string | boolean | CellError;

/** A repeating matrix argument passes each area as a 2-D array; a single value is a 1×1 area. */
function asArea(area: unknown, index: number): unknown[][] {
  if (Array.isArray(area) && area.every(Array.isArray)) return area as unknown[][];
  if (area === null || area === undefined || Array.isArray(area)) {
    throw new EngineError('shape', `PLUMB.GATHER: area ${index + 1} is empty; give each area as a range.`);
  }
  return [[area]];
}

function gatheredCell(value: unknown): GatheredCell {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') return value;
  return errorValue(errorCodeOf(value) ?? '#VALUE!', messageOf(value));
}

/** A CustomFunctions.Error's message, passed on with its error; an empty one is no message. */
function messageOf(value: object): string | undefined {
  return 'message' in value && typeof value.message === 'string' && value.message !== '' ? value.message : undefined;
}

/** addresses: each area's address when Excel gave it, to name an area that does not fit. */
export function gatherAreas(areas: unknown, addresses: readonly (string | undefined)[] = []): GatheredCell[][] {
  const list = Array.isArray(areas) ? areas.map(asArea) : [];
  if (list.length === 0) throw new EngineError('shape', 'PLUMB.GATHER needs one or more areas, such as PLUMB.GATHER(B2:B61, D2:E61).');
  const named = (i: number): string => (addresses[i] ? `area ${i + 1} (${addresses[i]})` : `area ${i + 1}`);
  const rows = list[0].length;
  list.forEach((area, i) => {
    if (area.length !== rows) {
      throw new EngineError('shape', `PLUMB.GATHER: ${named(i)} has ${area.length} rows but ${named(0)} has ${rows}; give areas with the same rows.`);
    }
  });
  return Array.from({ length: rows }, (_, r) => list.flatMap((area) => area[r].map(gatheredCell)));
}
