/**
 * Cell grids as they cross to and from the formula worker (offThread.ts) by postMessage. The
 * structured clone keeps numbers, text, booleans and null as they are but not the error objects of
 * a grid (a CustomFunctions.Error is an Error subclass, cloned without its code), so errors travel
 * as plain { code, message } records and are made into the host's error values on arrival. The
 * numbers travel as transferred Float64Arrays (a range's row-major, a result's by column), so a
 * range or table of a million cells costs the page one pass over them, not a structured clone.
 */
import { errorCodeOf } from '../cellInput';

/** An error value on its way: the code and the message, all a cell error carries. */
export interface ErrorInTransit {
  errorInTransit: string;
  message?: string;
}

function isErrorInTransit(value: unknown): value is ErrorInTransit {
  return typeof value === 'object' && value !== null && typeof (value as ErrorInTransit).errorInTransit === 'string';
}

function errorOut(value: object): ErrorInTransit | object {
  const code = errorCodeOf(value);
  if (code === undefined) return value;
  const message = 'message' in value && typeof value.message === 'string' && value.message !== '' ? value.message : undefined;
  return message === undefined ? { errorInTransit: code } : { errorInTransit: code, message };
}

/** A cell as it is posted: an error value as its record, anything else as it is. */
function errorRecord(value: unknown): unknown {
  return typeof value === 'object' && value !== null ? errorOut(value) : value;
}

/**
 * A rectangular range on its way: its numbers in one transferred Float64Array, row-major, and
 * every other cell (text, booleans, blanks, errors as records) listed with its index. Packing is
 * one pass with a type test per cell, where the structured clone of the rows would walk a
 * million arrays on the page's thread (about 100 ms per million cells here).
 */
export interface RangeInTransit {
  rangeInTransit: { rows: number; columns: number };
  numbers: Float64Array;
  otherAt: Int32Array;
  others: unknown[];
}

function isRangeInTransit(value: unknown): value is RangeInTransit {
  return typeof value === 'object' && value !== null && 'rangeInTransit' in value;
}

function rectangularRows(argument: readonly unknown[]): number | undefined {
  const first: unknown = argument[0];
  if (!Array.isArray(first)) return undefined;
  const columns = first.length;
  for (const row of argument) if (!Array.isArray(row) || row.length !== columns) return undefined;
  return columns;
}

/**
 * An argument ready to post, and the buffers to transfer with it: a rectangular range packed
 * (RangeInTransit), any other array row by row with its error values as records, a scalar as itself.
 */
export function argumentOut(argument: unknown): { value: unknown; transfer: ArrayBuffer[] } {
  if (!Array.isArray(argument)) return { value: errorRecord(argument), transfer: [] };
  const columns = argument.length === 0 ? undefined : rectangularRows(argument);
  if (columns === undefined) {
    const rows = argument.map((row: unknown) => (Array.isArray(row) ? row.map(errorRecord) : errorRecord(row)));
    return { value: rows, transfer: [] };
  }
  const rows = argument.length;
  const numbers = new Float64Array(rows * columns);
  const otherAt: number[] = [];
  const others: unknown[] = [];
  for (let i = 0, at = 0; i < rows; i++) {
    const row = argument[i] as unknown[];
    for (let j = 0; j < columns; j++, at++) {
      const cell = row[j];
      if (typeof cell === 'number') numbers[at] = cell;
      else {
        otherAt.push(at);
        others.push(errorRecord(cell));
      }
    }
  }
  const indexes = Int32Array.from(otherAt);
  const packed: RangeInTransit = { rangeInTransit: { rows, columns }, numbers, otherAt: indexes, others };
  return { value: packed, transfer: [numbers.buffer, indexes.buffer] };
}

/** An argument as it arrives in the worker: rows again, its records back as the { code, message } errors cellInput reads. */
export function argumentIn(argument: unknown): unknown {
  const cell = (value: unknown) => (isErrorInTransit(value) ? { code: value.errorInTransit, message: value.message } : value);
  if (isRangeInTransit(argument)) {
    const { rows, columns } = argument.rangeInTransit;
    const cells: unknown[] = Array.from(argument.numbers);
    argument.otherAt.forEach((at, k) => {
      cells[at] = cell(argument.others[k]);
    });
    return Array.from({ length: rows }, (_, i) => cells.slice(i * columns, (i + 1) * columns));
  }
  if (!Array.isArray(argument)) return cell(argument);
  return argument.map((row: unknown) => (Array.isArray(row) ? row.map(cell) : cell(row)));
}

/** A result grid by columns: a column of numbers only as a Float64Array, any other column as its values. */
export interface GridInTransit {
  /** Each row's length: grids are rectangular as Excel spills them, but nothing here relies on it. */
  widths: Int32Array;
  columns: (Float64Array | unknown[])[];
}

/** The grid by columns, and the buffers to transfer with it. */
export function gridOut(grid: readonly (readonly unknown[])[]): { grid: GridInTransit; transfer: ArrayBuffer[] } {
  const rows = grid.length;
  const widths = Int32Array.from(grid, (row) => row.length);
  const width = widths.reduce((w, length) => Math.max(w, length), 0);
  const columns: (Float64Array | unknown[])[] = [];
  const transfer: ArrayBuffer[] = [widths.buffer];
  for (let j = 0; j < width; j++) {
    let numeric = true;
    for (let i = 0; i < rows && numeric; i++) numeric = j < grid[i].length && typeof grid[i][j] === 'number';
    if (numeric) {
      const column = new Float64Array(rows);
      for (let i = 0; i < rows; i++) column[i] = grid[i][j] as number;
      columns.push(column);
      transfer.push(column.buffer);
    } else {
      columns.push(grid.map((row) => (j < row.length ? errorRecord(row[j]) : undefined)));
    }
  }
  return { grid: { widths, columns }, transfer };
}

/** The grid by rows again, each error record made into the host's error value by `errorValue`. */
export function gridIn(grid: GridInTransit, errorValue: (code: string, message?: string) => unknown): unknown[][] {
  const { widths, columns } = grid;
  const out = new Array<unknown[]>(widths.length);
  for (let i = 0; i < widths.length; i++) {
    const width = widths[i];
    const row = new Array<unknown>(width);
    for (let j = 0; j < width; j++) {
      const value = columns[j][i];
      row[j] = isErrorInTransit(value) ? errorValue(value.errorInTransit, value.message) : value;
    }
    out[i] = row;
  }
  return out;
}
