/**
 * The self-check workbook as data: every cell it holds, before any file format. The generator
 * builds this plan and writes it as xlsx; the test rebuilds it and compares it with the committed
 * file. Rows and columns are 0-based, as in src/addressing.
 */

/** A data cell as the sheet holds it: a number, a text, an empty cell, or the error value #N/A. */
export type DataCell = number | string | null | { error: '#N/A' };

export type CellContent =
  | { value: number | string }
  | { error: '#N/A' }
  /**
   * Formula text as a user types it in Excel, without "=" (`PLUMB.ESTIMATES($A$5:$A$21,…)`).
   * `spill` marks a dynamic-array formula and the block its result fills.
   */
  | { formula: string; spill?: { rows: number; columns: number } };

export interface PlannedCell {
  row: number;
  column: number;
  content: CellContent;
  numberFormat?: string;
  bold?: boolean;
}

export interface PlannedSheet {
  name: string;
  cells: PlannedCell[];
  /** In Excel's character units. */
  columnWidths: { column: number; width: number }[];
  /** The cells that show PASS or FAIL, coloured by the writer. */
  resultCells: { top: number; bottom: number; column: number }[];
}

export interface SelfCheckPlan {
  sheets: PlannedSheet[];
}

/** A cell of the plan holding a value, for the sheet builders. */
export function valueCell(row: number, column: number, value: number | string, style: Omit<PlannedCell, 'row' | 'column' | 'content'> = {}): PlannedCell {
  return { row, column, content: { value }, ...style };
}

export function formulaCell(row: number, column: number, formula: string, style: Omit<PlannedCell, 'row' | 'column' | 'content'> = {}): PlannedCell {
  return { row, column, content: { formula }, ...style };
}
