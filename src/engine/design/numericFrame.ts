/**
 * The model frame of an all-numeric read (numericCells.ts): no coding to do, every column a term
 * of its own, and the numbers kept packed so that the cache keys them without rows (the plain
 * arrays are built on first use, for the operations that read them).
 */
import { registerPackedData } from '../cache/packedPredictors';
import { INTERCEPT_NAME } from '../fit/design';
import type { ModelData } from '../types';
import type { ModelFrame } from './modelFrame';
import type { NumericCells } from './numericCells';

export interface NumericFrameParts {
  hasHeader: boolean;
  responseName: string;
  /** Each predictor column's name, across blocks. */
  names: readonly string[];
  /** For each predictor column, the index of its x block. */
  columnBlocks: readonly number[];
  intercept: boolean;
}

export function numericFrame(cells: NumericCells, parts: NumericFrameParts): ModelFrame {
  const termNames = [...parts.names];
  return {
    hasHeader: parts.hasHeader,
    responseName: parts.responseName,
    columns: parts.names.map((name) => ({ kind: 'numeric', name })),
    usedRows: cells.usedRows,
    skipped: cells.skipped,
    data: packedData(cells, termNames),
    termNames: parts.intercept ? [INTERCEPT_NAME, ...termNames] : termNames,
    termBlocks: [...parts.columnBlocks],
    termColumns: parts.names.map((_, j) => j),
  };
}

/** A counted loop into a sized array: about twice Array.from's speed. */
function plainArray(values: Float64Array): number[] {
  const copy = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) copy[i] = values[i];
  return copy;
}

/** n rows of p numbers from row-major `values`, by counted loops (no typed view per row). */
function packedRows(values: Float64Array, n: number, p: number): number[][] {
  const rows = new Array<number[]>(n);
  for (let i = 0, at = 0; i < n; i++) {
    const row = new Array<number>(p);
    for (let j = 0; j < p; j++, at++) row[j] = values[at];
    rows[i] = row;
  }
  return rows;
}

function packedData(cells: NumericCells, names: string[]): ModelData {
  const n = cells.y.length;
  const p = names.length;
  const values = cells.x;
  let y: number[] | undefined;
  let rows: number[][] | undefined;
  let weights: number[] | undefined;
  const data: ModelData = {
    // Read-only, so the packed numbers registered below stay the data's own.
    get y(): number[] {
      y ??= plainArray(cells.y);
      return y;
    },
    get x(): number[][] {
      rows ??= packedRows(values, n, p);
      return rows;
    },
    names,
    get weights(): number[] | undefined {
      if (cells.weights !== undefined) weights ??= plainArray(cells.weights);
      return weights;
    },
  };
  registerPackedData(data, { y: cells.y, predictors: { values, rows: n, p }, weights: cells.weights });
  return data;
}
