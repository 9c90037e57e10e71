/**
 * The live-size report of issue #15 as a preview workbook holds it: the bench's 12,500 × 20 data
 * (scripts/bench/liveSheet.ts, the same generated numbers) on a Data sheet, the rows PREDICT asks
 * about on a New sheet, and the eight PLUMB formulas of a live report on a Report sheet, each
 * anchored in its own band of columns so that no spill blocks another. Sent to the page by the
 * browser long-task test.
 */
import { columnLetters } from '../../src/addressing/a1';
import { generateColumns } from '../../scripts/benchData';
import { LIVE_SHAPES, NEW_ROWS } from '../../scripts/bench/liveSheet';

export const LIVE_SHAPE = LIVE_SHAPES[0];
export const DATA_SHEET = 'Data';
export const NEW_SHEET = 'New';
export const REPORT_SHEET = 'Report';
/** Columns between formula anchors: wider than any PLUMB result. */
const BAND = 16;

export type LiveCell = number | string;

/** Header row then data rows: y in column A, x1…x20 from column B, as the bench lays them out. */
export function liveDataRows(): LiveCell[][] {
  const { rows, predictors } = LIVE_SHAPE;
  const { x, y } = generateColumns(rows, predictors);
  const header = ['y', ...Array.from({ length: predictors }, (_, j) => `x${j + 1}`)];
  const body = Array.from({ length: rows }, (_, i) => [y[i], ...Array.from({ length: predictors }, (_, j) => x[j * rows + i])]);
  return [header, ...body];
}

/** The first data rows' predictors with their header, the rows PREDICT is asked about. */
export function liveNewRows(data: readonly LiveCell[][]): LiveCell[][] {
  return data.slice(0, NEW_ROWS + 1).map((row) => row.slice(1));
}

export interface LiveFormula {
  name: string;
  /** 0-based column of its anchor on the Report sheet, row 0. */
  column: number;
  text: string;
}

/** The eight formulas a live report writes, over the Data and New sheets. */
export function liveFormulas(): LiveFormula[] {
  const { rows, predictors } = LIVE_SHAPE;
  const last = rows + 1;
  const base = Math.floor(predictors / 2);
  const y = `${DATA_SHEET}!$A$1:$A$${last}`;
  const columns = (from: number, to: number) => `${DATA_SHEET}!$${columnLetters(1 + from)}$1:$${columnLetters(to)}$${last}`;
  const x = columns(0, predictors);
  const newRows = `${NEW_SHEET}!$A$1:$${columnLetters(predictors - 1)}$${NEW_ROWS + 1}`;
  const calls: [string, string][] = [
    ['TERMS', `${y},${x}`],
    ['FITSTATS', `${y},${x}`],
    ['NESTEDF', `${y},${columns(0, base)},${columns(base, predictors)}`],
    ['PREDICT', `${y},${x},${newRows}`],
    ['CHECKS', `${y},${x}`],
    ['RESIDUALS', `${y},${x}`],
    ['QQPOINTS', `${y},${x}`],
    ['COLLINEARITY', x],
  ];
  return calls.map(([name, args], k) => ({ name, column: k * BAND, text: `=PLUMB.${name}(${args})` }));
}

/** The data cell a live edit changes: the first predictor of a middle row, past the rows PREDICT reads (as the bench edits). */
export const EDITED_CELL = { row: Math.floor(LIVE_SHAPE.rows / 2) + 1, column: 1 };
