/**
 * A1 notation: column letters, cell, range and whole-column addresses with optional sheet names
 * and `$` anchors, and multi-area addresses. Pure functions shared by the task pane and the
 * preview host.
 */
/** A rectangular block of cells on one sheet; rows and columns are 0-based and inclusive. */
export interface RangeRef {
  sheet: string;
  top: number;
  left: number;
  bottom: number;
  right: number;
}

/** Excel's grid limits; addresses beyond them are invalid. */
export const MAX_ROWS = 1_048_576;
export const MAX_COLUMNS = 16_384;

export function columnLetters(column: number): string {
  let n = column + 1;
  let letters = '';
  while (n > 0) {
    const rem = (n - 1) % 26;
    letters = String.fromCharCode(65 + rem) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

export function columnIndex(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

export function cellAddress(row: number, column: number): string {
  return `${columnLetters(column)}${row + 1}`;
}

/** Sheet names that are not plain words are quoted, with inner quotes doubled, as Excel writes them. */
export function quoteSheetName(name: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) && !/^[A-Za-z]{1,3}\d+$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}

/** True when the range spans every row of its columns, as selecting column headers gives. */
export function isWholeColumns(range: RangeRef): boolean {
  return range.top === 0 && range.bottom === MAX_ROWS - 1;
}

/** As Excel writes addresses: "Sheet1!B2:C9", "Sheet1!B2" for one cell, "Sheet1!B:B" for whole columns. */
export function formatRange(range: RangeRef, withSheet = true): string {
  const start = cellAddress(range.top, range.left);
  const end = cellAddress(range.bottom, range.right);
  const body = isWholeColumns(range) ? `${columnLetters(range.left)}:${columnLetters(range.right)}` : start === end ? start : `${start}:${end}`;
  return withSheet ? `${quoteSheetName(range.sheet)}!${body}` : body;
}

const CELL = /^\$?([A-Za-z]{1,3})\$?(\d{1,7})$/;
const COLUMN = /^\$?([A-Za-z]{1,3})$/;

function parseCell(text: string): { row: number; column: number } | undefined {
  const m = CELL.exec(text);
  if (!m) return undefined;
  const column = columnIndex(m[1]);
  const row = Number(m[2]) - 1;
  if (row < 0 || row >= MAX_ROWS || column >= MAX_COLUMNS) return undefined;
  return { row, column };
}

function parseColumn(text: string): number | undefined {
  const m = COLUMN.exec(text);
  if (!m) return undefined;
  const column = columnIndex(m[1]);
  return column < MAX_COLUMNS ? column : undefined;
}

/** Splits "Sheet!A1:B2" or "'Planned batches'!B2" into sheet and address; the sheet may be absent. */
export function splitSheet(text: string): { sheet: string | undefined; address: string } {
  const quoted = /^'((?:[^']|'')+)'!(.*)$/.exec(text);
  if (quoted) return { sheet: quoted[1].replace(/''/g, "'"), address: quoted[2] };
  const bang = text.lastIndexOf('!');
  if (bang < 0) return { sheet: undefined, address: text };
  return { sheet: text.slice(0, bang), address: text.slice(bang + 1) };
}

/**
 * Parses "A1", "$B$2:C5", "B:B", "$B:$D" or "Sheet!A1:B2"; undefined when the text is not a
 * valid address. Whole columns span every row.
 */
export function parseRange(text: string, defaultSheet: string): RangeRef | undefined {
  const { sheet, address } = splitSheet(text.trim());
  const parts = address.split(':');
  if (parts.length > 2) return undefined;
  const bounds = parts.length === 2 ? (columnBounds(parts[0], parts[1]) ?? cellBounds(parts[0], parts[1])) : cellBounds(parts[0], parts[0]);
  return bounds && { sheet: sheet ?? defaultSheet, ...bounds };
}

type Bounds = Omit<RangeRef, 'sheet'>;

function cellBounds(first: string, second: string): Bounds | undefined {
  const a = parseCell(first);
  const b = parseCell(second);
  if (!a || !b) return undefined;
  return { top: Math.min(a.row, b.row), left: Math.min(a.column, b.column), bottom: Math.max(a.row, b.row), right: Math.max(a.column, b.column) };
}

function columnBounds(first: string, second: string): Bounds | undefined {
  const a = parseColumn(first);
  const b = parseColumn(second);
  if (a === undefined || b === undefined) return undefined;
  return { top: 0, left: Math.min(a, b), bottom: MAX_ROWS - 1, right: Math.max(a, b) };
}

/** Parses a multi-area address ("Data!B2:B9, Data!D:D"); undefined when any area is not valid. */
export function parseAreas(text: string, defaultSheet: string): RangeRef[] | undefined {
  const areas = splitAreas(text).map((area) => parseRange(area, defaultSheet));
  if (areas.length === 0 || areas.some((area) => area === undefined)) return undefined;
  return areas as RangeRef[];
}

/**
 * Whether two sheet names name one sheet: Excel compares them regardless of case, so a formula's
 * `data!A1` reads the sheet "Data" (common practice, no source; the preview's getItem does the same).
 */
export function sameSheet(a: string, b: string): boolean {
  return a === b || a.toLowerCase() === b.toLowerCase();
}

export function rangeContains(range: RangeRef, sheet: string, row: number, column: number): boolean {
  return sameSheet(range.sheet, sheet) && row >= range.top && row <= range.bottom && column >= range.left && column <= range.right;
}

export function rangesOverlap(a: RangeRef, b: RangeRef): boolean {
  return sameSheet(a.sheet, b.sheet) && a.top <= b.bottom && b.top <= a.bottom && a.left <= b.right && b.left <= a.right;
}

/** "$B$1:$B$61" style, with the sheet: how report formulas refer to data so they survive copying. */
export function formatAbsolute(range: RangeRef): string {
  const cell = (row: number, column: number) => `$${columnLetters(column)}$${row + 1}`;
  const start = cell(range.top, range.left);
  const end = cell(range.bottom, range.right);
  return `${quoteSheetName(range.sheet)}!${start === end ? start : `${start}:${end}`}`;
}

/** Splits a multi-area address ("Data!C1:E9,Data!G1:G9") at commas outside quoted sheet names. */
export function splitAreas(address: string): string[] {
  const areas: string[] = [];
  let current = '';
  let quoted = false;
  for (const ch of address) {
    if (ch === "'") quoted = !quoted;
    if (ch === ',' && !quoted) {
      areas.push(current.trim());
      current = '';
    } else {
      current += ch;
    }
  }
  if (current.trim() !== '') areas.push(current.trim());
  return areas;
}

export function rowCount(range: RangeRef): number {
  return range.bottom - range.top + 1;
}

export function columnCount(range: RangeRef): number {
  return range.right - range.left + 1;
}

/** One single-column range per column of `range`. */
export function columnsOf(range: RangeRef): RangeRef[] {
  return Array.from({ length: columnCount(range) }, (_, j) => ({ ...range, left: range.left + j, right: range.left + j }));
}
