import { EngineError } from '../errors';
import type { ColumnMajorMatrix } from '../linalg/columnMajor';

export const INTERCEPT_NAME = 'Intercept';

/**
 * The model's columns as the factorization sees them: the intercept (if any) first, every
 * column and y multiplied by √w so that weighted least squares becomes ordinary least squares.
 */
export interface WeightedDesign {
  names: string[];
  hasIntercept: boolean;
  matrix: ColumnMajorMatrix;
  /** √w·y. */
  y: Float64Array;
  /** y as given. */
  response: Float64Array;
  /** √w per row, or undefined for an unweighted model. */
  rootWeights: Float64Array | undefined;
}

/** Rows copied into the columns per block (see buildDesign). */
const ROW_BLOCK = 256;

export function buildDesign(
  y: readonly number[],
  x: readonly (readonly number[])[],
  intercept: boolean,
  names: readonly string[] | undefined,
  weights: readonly number[] | undefined,
): WeightedDesign {
  const n = y.length;
  if (x.length !== n) {
    throw new EngineError('shape', `y has ${n} rows but x has ${x.length}; they must match.`);
  }
  const p = n > 0 ? x[0].length : (names?.length ?? 0);
  x.forEach((row, i) => {
    if (row.length !== p) throw new EngineError('shape', `Row ${i + 1} of x has ${row.length} values; row 1 has ${p}.`);
  });
  if (names !== undefined && names.length !== p) {
    throw new EngineError('shape', `${names.length} names were given for ${p} predictor columns.`);
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(y[i])) throw new EngineError('non-finite', `y in row ${i + 1} is ${y[i]}; every value must be a finite number.`);
  }
  // Filled straight into the columns, a block of rows at a time: the block's row arrays stay in
  // cache while each column's stretch is written in order.
  const q = p + (intercept ? 1 : 0);
  const data = new Float64Array(n * q);
  const offset = intercept ? n : 0;
  for (let from = 0; from < n; from += ROW_BLOCK) {
    const to = Math.min(n, from + ROW_BLOCK);
    for (let i = from; i < to; i++) {
      const row = x[i];
      for (let j = 0; j < p; j++) {
        if (!Number.isFinite(row[j])) {
          throw new EngineError('non-finite', `x column ${j + 1} in row ${i + 1} is ${row[j]}; every value must be a finite number.`);
        }
      }
    }
    for (let j = 0; j < p; j++) {
      const base = offset + j * n;
      for (let i = from; i < to; i++) data[base + i] = x[i][j];
    }
  }
  if (intercept) data.fill(1, 0, n);
  const rootWeights = weights === undefined ? undefined : rootsOfWeights(weights, n);
  const response = Float64Array.from(y);
  let yw = response;
  if (rootWeights !== undefined) {
    for (let j = 0; j < q; j++) for (let i = 0; i < n; i++) data[j * n + i] *= rootWeights[i];
    yw = Float64Array.from(response, (v, i) => v * rootWeights[i]);
  }
  const predictorNames = names ?? Array.from({ length: p }, (_, j) => `x${j + 1}`);
  return {
    names: intercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames],
    hasIntercept: intercept,
    matrix: { rows: n, cols: q, data },
    y: yw,
    response,
    rootWeights,
  };
}

function rootsOfWeights(weights: readonly number[], n: number): Float64Array {
  if (weights.length !== n) {
    throw new EngineError('shape', `There are ${weights.length} weights for ${n} rows; they must match.`);
  }
  return Float64Array.from(weights, (w, i) => {
    if (!(w > 0 && Number.isFinite(w))) {
      throw new EngineError('bad-weight', `The weight in row ${i + 1} is ${w}; every weight must be a positive number.`);
    }
    return Math.sqrt(w);
  });
}
