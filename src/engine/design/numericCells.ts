/**
 * The common case of cells to design in one pass: every cell a finite number, a blank or #N/A.
 * Each cell is judged by inline typeof checks (no Cell object per cell) and its number written
 * straight into typed arrays. Anything else (text, an error, TRUE, a weight that is not positive,
 * no complete row) returns undefined, and the model frame's general path then reads the same
 * cells and words the message: the two paths never disagree because this one never words anything
 * but the skipped rows' reasons, in the general path's own words.
 */
import type { CellGrid, CellValue } from './cells';

/** The used rows' values: response, predictors (p per row, row-major), weights. */
export interface NumericCells {
  /** The rows used, numbered as the frame numbers them. */
  usedRows: number[];
  /** The rows left out, with the reason as the general path words it. */
  skipped: { row: number; reason: string }[];
  y: number[];
  /** usedPositions.length × p numbers, row-major. */
  x: Float64Array;
  weights: number[] | undefined;
}

const NUMBER = 0;
const BLANK = 1;
const NOT_AVAILABLE = 2;
/** Any cell the general path must judge (and maybe word). */
const OTHER = 3;

/** classifyCell's verdict for the kinds this path takes, without building the Cell. */
function kindOf(value: CellValue): number {
  if (typeof value === 'number') return value - value === 0 ? NUMBER : OTHER;
  if (value === null || value === undefined) return BLANK;
  if (typeof value === 'string') {
    const trimmed = value.trim();
    if (trimmed === '') return BLANK;
    return trimmed.toUpperCase() === '#N/A' ? NOT_AVAILABLE : OTHER;
  }
  if (typeof value === 'object') return value.errorCode.toUpperCase() === '#N/A' ? NOT_AVAILABLE : OTHER;
  return OTHER;
}

/**
 * columnNames: how a skipped row's reason names each column, in the general path's order
 * (response, every predictor column across blocks, weight). firstRow: the number of the ranges'
 * first row (position 0). Grids are already checked to have the same rows, and every block its
 * own constant width.
 */
export function readNumericCells(
  yGrid: CellGrid,
  xBlocks: readonly CellGrid[],
  weightGrid: CellGrid | undefined,
  firstData: number,
  columnNames: readonly string[],
  firstRow: number,
): NumericCells | undefined {
  const rows = yGrid.length;
  const widths = xBlocks.map((block) => block[0]?.length ?? 0);
  const p = widths.reduce((sum, w) => sum + w, 0);
  // Filled by index and cut to length at the end: a push per row costs twice as much.
  const y = new Array<number>(rows);
  const usedRows = new Array<number>(rows);
  const x = new Float64Array(rows * p);
  const weights = weightGrid === undefined ? undefined : new Array<number>(rows);
  const skipped: { row: number; reason: string }[] = [];
  let used = 0;
  for (let position = firstData; position < rows; position++) {
    // The first blank or #N/A in column order names the reason, as in the general path.
    let missingColumn = -1;
    let missingKind = NUMBER;
    const yValue = yGrid[position][0];
    if (typeof yValue === 'number' && yValue - yValue === 0) y[used] = yValue;
    else {
      const yKind = kindOf(yValue);
      if (yKind === OTHER) return undefined;
      missingColumn = 0;
      missingKind = yKind;
    }
    let at = used * p;
    let column = 1;
    for (let b = 0; b < xBlocks.length; b++) {
      const row = xBlocks[b][position];
      const width = widths[b];
      for (let j = 0; j < width; j++, column++, at++) {
        const value = row[j];
        // Numbers, by far the most common cells, are taken before any other check.
        if (typeof value === 'number' && value - value === 0) {
          x[at] = value;
          continue;
        }
        const kind = kindOf(value);
        if (kind === OTHER) return undefined;
        if (missingColumn < 0) {
          missingColumn = column;
          missingKind = kind;
        }
      }
    }
    if (weightGrid !== undefined && weights !== undefined) {
      const wValue = weightGrid[position][0];
      const wKind = kindOf(wValue);
      if (wKind === OTHER) return undefined;
      if (wKind === NUMBER) {
        // A weight that is not positive is an error the general path words.
        if (missingColumn < 0 && !((wValue as number) > 0)) return undefined;
        weights[used] = wValue as number;
      } else if (missingColumn < 0) {
        missingColumn = column;
        missingKind = wKind;
      }
    }
    if (missingColumn >= 0) {
      skipped.push({ row: firstRow + position, reason: `${missingKind === NOT_AVAILABLE ? '#N/A' : 'blank'} in ${columnNames[missingColumn]}` });
      continue;
    }
    usedRows[used] = firstRow + position;
    used++;
  }
  // No complete row: the general path counts each column's blanks and names them.
  if (used === 0) return undefined;
  y.length = used;
  usedRows.length = used;
  if (weights !== undefined) weights.length = used;
  return { usedRows, skipped, y, x: x.subarray(0, used * p), weights };
}
