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
  y.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new EngineError('non-finite', `y in row ${i + 1} is ${v}; every value must be a finite number.`);
  });
  x.forEach((row, i) =>
    row.forEach((v, j) => {
      if (!Number.isFinite(v)) {
        throw new EngineError('non-finite', `x column ${j + 1} in row ${i + 1} is ${v}; every value must be a finite number.`);
      }
    }),
  );
  const rootWeights = weights === undefined ? undefined : rootsOfWeights(weights, n);

  const q = p + (intercept ? 1 : 0);
  const data = new Float64Array(n * q);
  const offset = intercept ? 1 : 0;
  for (let i = 0; i < n; i++) {
    const w = rootWeights === undefined ? 1 : rootWeights[i];
    if (intercept) data[i] = w;
    for (let j = 0; j < p; j++) data[(j + offset) * n + i] = x[i][j] * w;
  }
  const yw = Float64Array.from(y, (v, i) => (rootWeights === undefined ? v : v * rootWeights[i]));
  const predictorNames = names ?? Array.from({ length: p }, (_, j) => `x${j + 1}`);
  return {
    names: intercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames],
    hasIntercept: intercept,
    matrix: { rows: n, cols: q, data },
    y: yw,
    response: Float64Array.from(y),
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
