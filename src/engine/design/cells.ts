/**
 * What one worksheet cell may hold once it reaches the engine. The host adapters translate their
 * own representations (an Excel error object, a blank that arrives as "" or null) into these.
 */
export type CellValue = number | string | boolean | null | undefined | CellErrorValue;

/** An error value such as #N/A or #DIV/0! in an input cell. */
export interface CellErrorValue {
  errorCode: string;
}

export type Cell =
  | { kind: 'number'; value: number }
  | { kind: 'missing'; why: 'blank' | '#N/A' }
  | { kind: 'text'; text: string }
  | { kind: 'boolean'; value: boolean }
  | { kind: 'error'; code: string }
  | { kind: 'non-finite'; value: number };

/** A grid as it arrives from a range: row-major, possibly ragged when a caller builds it by hand. */
export type CellGrid = readonly (readonly CellValue[])[];

/** A range as a host hands it over: rows (which may turn out not to be arrays) of cells of any kind. */
export type HostGrid = readonly unknown[];

/** The error code of a CellValue that is an object: a CellErrorValue's own. */
export function cellErrorCode(value: object): string | undefined {
  return (value as CellErrorValue).errorCode;
}

const ERROR_LITERALS = new Set(['#N/A', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#NULL!', '#SPILL!', '#CALC!', '#GETTING_DATA', '#BUSY!']);

export function classifyCell(value: CellValue): Cell {
  if (value === null || value === undefined) return { kind: 'missing', why: 'blank' };
  if (typeof value === 'number') return Number.isFinite(value) ? { kind: 'number', value } : { kind: 'non-finite', value };
  if (typeof value === 'boolean') return { kind: 'boolean', value };
  if (typeof value === 'string') {
    const trimmed = value.trim();
    if (trimmed === '') return { kind: 'missing', why: 'blank' };
    // Some hosts hand error values over as their literal text; a typed "#N/A" means the same.
    if (ERROR_LITERALS.has(trimmed.toUpperCase())) return errorCell(trimmed.toUpperCase());
    return { kind: 'text', text: trimmed };
  }
  return errorCell(value.errorCode.toUpperCase());
}

function errorCell(code: string): Cell {
  return code === '#N/A' ? { kind: 'missing', why: '#N/A' } : { kind: 'error', code };
}

/**
 * Headers and levels become term names in result cells, and a cell holds at most 32,767
 * characters; no readable name needs more than this, so longer ones are cut to it.
 */
export const NAME_LIMIT = 1000;

export function shortName(text: string): string {
  return text.length > NAME_LIMIT ? `${text.slice(0, NAME_LIMIT - 1)}…` : text;
}

/** How a cell is quoted in a message. */
export function describeCell(cell: Cell): string {
  switch (cell.kind) {
    case 'number':
      return String(cell.value);
    case 'missing':
      return cell.why === 'blank' ? 'a blank' : '#N/A';
    case 'text':
      return `the text "${cell.text.length > 40 ? `${cell.text.slice(0, 40)}…` : cell.text}"`;
    case 'boolean':
      return cell.value ? 'TRUE' : 'FALSE';
    case 'error':
      return `the error ${cell.code}`;
    case 'non-finite':
      return String(cell.value);
  }
}
