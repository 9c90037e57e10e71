// The live-size worksheet of issue #15 as Excel hands it to the PLUMB functions: row-major
// unknown[][] grids with a text header row, and the invocation that carries each argument's address.
// Every call gets fresh arrays, as every formula in Excel does, so no cache can key on a grid's identity.
import { generateColumns } from '../benchData';

export interface LiveShape {
  rows: number;
  predictors: number;
}

/** 250,000 numbers each: 12,500 × 20 and 50,000 × 4. */
export const LIVE_SHAPES: readonly LiveShape[] = [
  { rows: 12_500, predictors: 20 },
  { rows: 50_000, predictors: 4 },
];

/** Rows PREDICT is asked about: the first rows of the data, which R's predict gets too. */
export const NEW_ROWS = 10;

const SHEET = 'Data';
const NEW_ROWS_SHEET = 'New';

function columnLetters(index: number): string {
  let letters = '';
  for (let k = index + 1; k > 0; k = Math.floor((k - 1) / 26)) letters = String.fromCharCode(65 + ((k - 1) % 26)) + letters;
  return letters;
}

export class LiveSheet {
  readonly y: Float64Array;
  /** Column-major, as generateColumns makes it and R reads it. */
  readonly x: Float64Array;
  private readonly xRows: number[][];
  private readonly names: string[];
  /** The predictors NESTEDF tests as added: the second half of the columns. */
  readonly baseColumns: number;

  constructor(readonly shape: LiveShape) {
    const { rows, predictors } = shape;
    const { x, y } = generateColumns(rows, predictors);
    this.x = x;
    this.y = y;
    this.xRows = Array.from({ length: rows }, (_, i) => Array.from({ length: predictors }, (_, j) => x[j * rows + i]));
    this.names = Array.from({ length: predictors }, (_, j) => `x${j + 1}`);
    this.baseColumns = Math.floor(predictors / 2);
  }

  /**
   * One data edit: the first predictor of a middle row (past the rows PREDICT asks about), a cell
   * every formula reads, so each of them recalculates and the first to run refits.
   */
  edit(serial: number): void {
    const row = Math.floor(this.shape.rows / 2);
    this.xRows[row][0] = this.x[row] + 1e-3 * (serial + 1);
  }

  response(): unknown[][] {
    return [['y'], ...Array.from(this.y, (v) => [v])];
  }

  predictors(from = 0, to = this.shape.predictors): unknown[][] {
    return [this.names.slice(from, to), ...this.xRows.map((row) => row.slice(from, to))];
  }

  newRows(): unknown[][] {
    return [[...this.names], ...this.xRows.slice(0, NEW_ROWS).map((row) => [...row])];
  }

  /** Addresses on the Data sheet: y in column A, the predictors from column B. */
  responseAddress(): string {
    return `${SHEET}!A1:A${this.shape.rows + 1}`;
  }

  predictorsAddress(from = 0, to = this.shape.predictors): string {
    return `${SHEET}!${columnLetters(1 + from)}1:${columnLetters(to)}${this.shape.rows + 1}`;
  }

  newRowsAddress(): string {
    return `${NEW_ROWS_SHEET}!A1:${columnLetters(this.shape.predictors - 1)}${NEW_ROWS + 1}`;
  }
}

/** The invocation Excel passes a function tagged @requiresParameterAddresses. */
export function invocationOf(addresses: string[]): CustomFunctions.Invocation {
  return { parameterAddresses: addresses } as CustomFunctions.Invocation;
}
