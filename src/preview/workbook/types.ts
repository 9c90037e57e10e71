/**
 * The preview workbook's model, shared by its grid UI and by the Office.js shim. Rows and
 * columns are 0-based here; A1 text appears only at the edges (formulas, addresses).
 */

/** What a cell holds as entered: a constant, or formula text starting with "=". */
export type CellInput = number | string | boolean | null;

/** An error shown in a cell, with the message a user sees when they hover it. */
export interface CellError {
  error: string;
  message?: string;
}

/** What a cell shows: its constant, a formula's result, a value spilled into it, or an error. */
export type CellValue = number | string | boolean | null | CellError;

export interface CellPosition {
  sheet: string;
  row: number;
  column: number;
}

export interface RangeRef {
  sheet: string;
  top: number;
  left: number;
  /** Inclusive. */
  bottom: number;
  right: number;
}

export type CustomFunction = (...args: unknown[]) => unknown;

export interface WorkbookModel {
  sheetNames(): string[];
  hasSheet(name: string): boolean;
  /** Adds an empty sheet at the end; throws when the name is taken or invalid. */
  addSheet(name: string): void;
  /** Renames a sheet; throws when the new name is taken or invalid. */
  renameSheet(from: string, to: string): void;
  /** Removes a sheet; throws when it does not exist or is the last one. */
  deleteSheet(name: string): void;
  activeSheet(): string;
  activateSheet(name: string): void;

  inputAt(position: CellPosition): CellInput;
  valueAt(position: CellPosition): CellValue;
  /** Sets inputs starting at the range's top-left cell and recalculates once afterwards. */
  setInputs(sheet: string, top: number, left: number, inputs: readonly (readonly CellInput[])[]): void;
  /** Number formats are kept per cell; "General" when never set. */
  numberFormatAt(position: CellPosition): string;
  setNumberFormats(sheet: string, top: number, left: number, formats: readonly (readonly string[])[]): void;

  /** Rows and columns from A1 to the last non-empty input or spilled value; {0, 0} when empty. */
  usedExtent(sheet: string): { rows: number; columns: number };

  selection(): RangeRef;
  select(range: RangeRef): void;

  registerFunction(id: string, fn: CustomFunction): void;

  /** Called after every change (edit, recalculation, sheet added/removed, selection). */
  subscribe(listener: () => void): () => void;
}
