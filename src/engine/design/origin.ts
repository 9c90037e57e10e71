/**
 * Where a range sits on its worksheet, so that messages name rows and cells as the user reads
 * them ("row 10", "Data!C5") instead of by their position inside the selected range. The engine
 * stays free of any host: the adapters work the origin out (the cell functions from Excel's
 * parameter addresses, the pane from its own addresses) and pass it in.
 */
export interface RangeOrigin {
  /** The worksheet's name; without it a cell is named by its address alone ("C5"). */
  sheet?: string;
  /** 0-based worksheet row of the range's top-left cell. */
  row: number;
  /** 0-based worksheet column of the range's top-left cell. */
  column: number;
}

/** The row number a user reads: the worksheet row with an origin, else the 1-based position in the range. */
export function rowNumber(origin: RangeOrigin | undefined, position: number): number {
  return origin === undefined ? position + 1 : origin.row + position + 1;
}

/** "A", …, "Z", "AA", …: a 0-based worksheet column as the sheet labels it. */
export function columnLetters(column: number): string {
  let letters = '';
  for (let n = column + 1; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}

/**
 * Sheet names that are not plain words are quoted with inner quotes doubled, the form Excel
 * itself writes ("Options for Excel custom functions": 'Latest Prices'!F6, 'Bob''s Region'!F6).
 */
function sheetPrefix(sheet: string | undefined): string {
  if (sheet === undefined || sheet === '') return '';
  const plain = /^[A-Za-z_][A-Za-z0-9_.]*$/.test(sheet) && !/^[A-Za-z]{1,3}\d+$/.test(sheet);
  return plain ? `${sheet}!` : `'${sheet.replace(/'/g, "''")}'!`;
}

/** The worksheet address ("Data!C5") of the cell at a 0-based position inside a range. */
export function worksheetAddress(origin: RangeOrigin, row: number, column: number): string {
  return `${sheetPrefix(origin.sheet)}${columnLetters(origin.column + column)}${origin.row + row + 1}`;
}

/**
 * How a message names one cell of an argument: "predictors cell Data!C5" when the range's origin
 * is known, else "predictors row 4, column 1" by position (the column left out for single-column
 * arguments such as response and weights).
 */
export function cellPlace(argument: string, origin: RangeOrigin | undefined, row: number, column: number, singleColumn: boolean): string {
  if (origin !== undefined) return `${argument} cell ${worksheetAddress(origin, row, column)}`;
  return singleColumn ? `${argument} row ${row + 1}` : `${argument} row ${row + 1}, column ${column + 1}`;
}
