/**
 * The model frame of an all-numeric read (numericCells.ts): no coding to do, every column a term
 * of its own, and predictors kept packed so that the cache keys them without rows (the rows are
 * built on first use, for the operations that read them).
 */
import { registerPackedPredictors } from '../cache/packedPredictors';
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

function packedData(cells: NumericCells, names: string[]): ModelData {
  const n = cells.y.length;
  const p = names.length;
  const values = cells.x;
  let rows: number[][] | undefined;
  const data: ModelData = {
    y: cells.y,
    // Read-only, so the packed numbers registered below stay the rows' own.
    get x(): number[][] {
      rows ??= Array.from({ length: n }, (_, i) => Array.from(values.subarray(i * p, (i + 1) * p)));
      return rows;
    },
    names,
    weights: cells.weights,
  };
  registerPackedPredictors(data, { values, rows: n, p });
  return data;
}
