/**
 * The common case of cells to design in one pass: every cell a finite number, a blank or #N/A.
 * Each cell is judged by inline typeof checks (no Cell object per cell) and its number written
 * straight into typed arrays. Anything else (text, an error, TRUE, a weight that is not positive,
 * no complete row, and for a host's grids a row that is no array or of another width) returns
 * undefined, and the model frame's general path then reads the same cells and words the message:
 * the two paths never disagree because this one never words anything but the skipped rows'
 * reasons, in the general path's own words, and never throws.
 */
import type { HostGrid } from './cells';

/** The used rows' values: response, predictors (p per row, row-major), weights. */
export interface NumericCells {
  /** The rows used, numbered as the frame numbers them. */
  usedRows: number[];
  /** The rows left out, with the reason as the general path words it. */
  skipped: { row: number; reason: string }[];
  y: Float64Array;
  /** usedRows.length × p numbers, row-major. */
  x: Float64Array;
  weights: Float64Array | undefined;
}

/**
 * The error code an object cell stands for, or undefined when it is no error: for CellValues an
 * object is a CellErrorValue; a host's grid says how its own error objects read.
 */
export type ObjectErrorCode = (value: object) => string | undefined;

const NUMBER = 0;
const BLANK = 1;
const NOT_AVAILABLE = 2;
/** Any cell the general path must judge (and maybe word). */
const OTHER = 3;

/** classifyCell's verdict for the kinds this path takes, without building the Cell. */
function kindOf(value: unknown, errorCode: ObjectErrorCode): number {
  if (typeof value === 'number') return value - value === 0 ? NUMBER : OTHER;
  if (value === null || value === undefined) return BLANK;
  if (typeof value === 'string') {
    const trimmed = value.trim();
    if (trimmed === '') return BLANK;
    return trimmed.toUpperCase() === '#N/A' ? NOT_AVAILABLE : OTHER;
  }
  if (typeof value === 'object') return errorCode(value)?.toUpperCase() === '#N/A' ? NOT_AVAILABLE : OTHER;
  return OTHER;
}

/** A row of `width` cells, or undefined when the grid's row there is no array of that width. */
function rowOf(grid: HostGrid, position: number, width: number): readonly unknown[] | undefined {
  const row: unknown = grid[position];
  return Array.isArray(row) && row.length === width ? (row as readonly unknown[]) : undefined;
}

/** The arrays a read writes once it differs from the cells it was told to expect. */
interface Written {
  y: Float64Array;
  x: Float64Array;
  usedRows: number[];
  weights: Float64Array | undefined;
  skipped: { row: number; reason: string }[];
}

/** Arrays for `rows` rows, holding the first `used` rows and `skippedCount` skips of `expected` (empty without it). */
function startWriting(rows: number, p: number, hasWeights: boolean, expected: NumericCells | undefined, used: number, skippedCount: number): Written {
  const written: Written = {
    y: new Float64Array(rows),
    x: new Float64Array(rows * p),
    // Filled by index and cut to length at the end: a push per row costs twice as much.
    usedRows: new Array<number>(rows),
    weights: hasWeights ? new Float64Array(rows) : undefined,
    skipped: expected === undefined ? [] : expected.skipped.slice(0, skippedCount),
  };
  if (expected !== undefined) {
    written.y.set(expected.y.subarray(0, used));
    written.x.set(expected.x.subarray(0, used * p));
    for (let i = 0; i < used; i++) written.usedRows[i] = expected.usedRows[i];
    if (written.weights !== undefined && expected.weights !== undefined) written.weights.set(expected.weights.subarray(0, used));
  }
  return written;
}

/** The same number, bit for bit, for finite numbers: equal, and of one sign when zero. */
function sameFinite(a: number, b: number): boolean {
  return a === b && (a !== 0 || 1 / a === 1 / b);
}

/** Whether a used row (its number, y, the p predictors in `row`, its weight) is row `used` of `expected`. */
function sameUsedRow(expected: NumericCells, used: number, rowNumber: number, y: number, row: Float64Array, p: number, weight: number): boolean {
  if (used >= expected.usedRows.length || expected.usedRows[used] !== rowNumber || !sameFinite(expected.y[used], y)) return false;
  if (expected.weights !== undefined && !sameFinite(expected.weights[used], weight)) return false;
  const x = expected.x;
  for (let j = 0, at = used * p; j < p; j++, at++) if (!sameFinite(x[at], row[j])) return false;
  return true;
}

/**
 * columnNames: how a skipped row's reason names each column, in the general path's order
 * (response, every predictor column across blocks, weight). firstData: the position of the first
 * row of data (after a header). firstRow: the number of the ranges' first row (position 0). Every
 * row, header included, must be an array: y and weights one cell wide, each x block as wide as its
 * first row, all as long as y. expected: cells an earlier read of ranges like these gave; while
 * the cells agree with it nothing is written, and if they agree throughout it is returned itself.
 */
export function readNumericCells(
  yGrid: HostGrid,
  xBlocks: readonly HostGrid[],
  weightGrid: HostGrid | undefined,
  firstData: number,
  columnNames: readonly string[],
  firstRow: number,
  errorCode: ObjectErrorCode,
  expected?: NumericCells,
): NumericCells | undefined {
  const rows = yGrid.length;
  if (xBlocks.some((block) => block.length !== rows) || (weightGrid !== undefined && weightGrid.length !== rows)) return undefined;
  const widths: number[] = [];
  for (const block of xBlocks) {
    const first: unknown = block[0];
    if (!Array.isArray(first)) return undefined;
    widths.push(first.length);
  }
  for (let position = 0; position < firstData; position++) {
    if (rowOf(yGrid, position, 1) === undefined || (weightGrid !== undefined && rowOf(weightGrid, position, 1) === undefined)) return undefined;
    for (let b = 0; b < xBlocks.length; b++) if (rowOf(xBlocks[b], position, widths[b]) === undefined) return undefined;
  }
  const p = widths.reduce((sum, w) => sum + w, 0);
  const hasWeights = weightGrid !== undefined;
  // While comparing with `expected`, a row's predictors go to `scratch`; once writing, straight into the result.
  const scratch = new Float64Array(p);
  let written = expected === undefined ? startWriting(rows, p, hasWeights, undefined, 0, 0) : undefined;
  let used = 0;
  let skippedCount = 0;
  for (let position = firstData; position < rows; position++) {
    // The first blank or #N/A in column order names the reason, as in the general path.
    let missingColumn = -1;
    let missingKind = NUMBER;
    const yRow = rowOf(yGrid, position, 1);
    if (yRow === undefined) return undefined;
    const yValue = yRow[0];
    let yNumber = 0;
    if (typeof yValue === 'number' && yValue - yValue === 0) yNumber = yValue;
    else {
      const yKind = kindOf(yValue, errorCode);
      if (yKind === OTHER) return undefined;
      missingColumn = 0;
      missingKind = yKind;
    }
    const target = written === undefined ? scratch : written.x;
    let at = written === undefined ? 0 : used * p;
    let column = 1;
    for (let b = 0; b < xBlocks.length; b++) {
      const width = widths[b];
      const row = rowOf(xBlocks[b], position, width);
      if (row === undefined) return undefined;
      for (let j = 0; j < width; j++, column++, at++) {
        const value = row[j];
        // Numbers, by far the most common cells, are taken before any other check.
        if (typeof value === 'number' && value - value === 0) {
          target[at] = value;
          continue;
        }
        const kind = kindOf(value, errorCode);
        if (kind === OTHER) return undefined;
        if (missingColumn < 0) {
          missingColumn = column;
          missingKind = kind;
        }
      }
    }
    let weight = 0;
    if (weightGrid !== undefined) {
      const wRow = rowOf(weightGrid, position, 1);
      if (wRow === undefined) return undefined;
      const wValue = wRow[0];
      const wKind = kindOf(wValue, errorCode);
      if (wKind === OTHER) return undefined;
      if (wKind === NUMBER) {
        weight = wValue as number;
        // A weight that is not positive is an error the general path words.
        if (missingColumn < 0 && !(weight > 0)) return undefined;
      } else if (missingColumn < 0) {
        missingColumn = column;
        missingKind = wKind;
      }
    }
    const rowNumber = firstRow + position;
    if (missingColumn >= 0) {
      const reason = `${missingKind === NOT_AVAILABLE ? '#N/A' : 'blank'} in ${columnNames[missingColumn]}`;
      if (written === undefined) {
        const skip = expected?.skipped[skippedCount];
        if (skip === undefined || skip.row !== rowNumber || skip.reason !== reason) written = startWriting(rows, p, hasWeights, expected, used, skippedCount);
      }
      written?.skipped.push({ row: rowNumber, reason });
      skippedCount++;
      continue;
    }
    if (written === undefined) {
      if (expected !== undefined && sameUsedRow(expected, used, rowNumber, yNumber, scratch, p, weight)) {
        used++;
        continue;
      }
      written = startWriting(rows, p, hasWeights, expected, used, skippedCount);
      written.x.set(scratch, used * p);
    }
    written.y[used] = yNumber;
    written.usedRows[used] = rowNumber;
    if (written.weights !== undefined) written.weights[used] = weight;
    used++;
  }
  // No complete row: the general path counts each column's blanks and names them.
  if (used === 0) return undefined;
  if (written === undefined) {
    if (expected !== undefined && used === expected.usedRows.length && skippedCount === expected.skipped.length) return expected;
    written = startWriting(rows, p, hasWeights, expected, used, skippedCount);
  }
  written.usedRows.length = used;
  return {
    usedRows: written.usedRows,
    skipped: written.skipped,
    y: written.y.subarray(0, used),
    x: written.x.subarray(0, used * p),
    weights: written.weights?.subarray(0, used),
  };
}
