/**
 * A ModelData's numbers packed in typed arrays beside (and instead of reading) its rows: the
 * model frame registers them as it builds the data, whose y, x and weights are read-only views
 * built from them on first use, so the cache key reads these arrays whole, a formula whose fit is
 * cached never builds a row, and the numbers cannot change once registered. Keyed weakly on the
 * data object, so a copy or any other ModelData is read from its rows as before.
 */
import type { ModelData } from '../types';

export interface PackedPredictors {
  /** rows × p numbers, row-major, the very numbers of data.x. */
  values: Float64Array;
  /** data.x.length. */
  rows: number;
  /** Columns per row. */
  p: number;
}

/** All of a ModelData's numbers, packed; nothing may write to these arrays once registered. */
export interface PackedData {
  /** The very numbers of data.y. */
  y: Float64Array;
  predictors: PackedPredictors;
  /** The very numbers of data.weights; undefined without weights. */
  weights: Float64Array | undefined;
}

const registered = new WeakMap<ModelData, PackedData>();

/**
 * Only for data whose y, x and weights cannot change after this call (the model frame's are
 * read-only properties built from these arrays), so the registered numbers stay the data's own.
 */
export function registerPackedData(data: ModelData, packed: PackedData): void {
  registered.set(data, packed);
}

export function packedDataOf(data: ModelData): PackedData | undefined {
  return registered.get(data);
}

export function packedPredictorsOf(data: ModelData): PackedPredictors | undefined {
  return registered.get(data)?.predictors;
}

/** Packings of data that registered none, made on first request and dropped with the data. */
const packedOnRequest = new WeakMap<ModelData, { x: readonly (readonly number[])[]; packed: PackedPredictors }>();

/**
 * data's predictors packed row-major, so a stage reads them without building rows: the registered
 * packing when there is one (nothing is copied), else data.x packed once per data object. The
 * packing is remade when data.x is replaced; a row edited in place after the first call is not
 * seen, as no stage edits a ModelData's rows. p is the first row's width; a missing number reads
 * as NaN.
 */
export function predictorValues(data: ModelData): PackedPredictors {
  const packed = registered.get(data)?.predictors;
  if (packed !== undefined) return packed;
  const x = data.x;
  const memo = packedOnRequest.get(data);
  if (memo !== undefined && memo.x === x) return memo.packed;
  const rows = x.length;
  const p = x[0]?.length ?? 0;
  const values = new Float64Array(rows * p);
  let at = 0;
  for (let i = 0; i < rows; i++) {
    const row = x[i];
    for (let j = 0; j < p; j++) values[at++] = row[j] ?? Number.NaN;
  }
  const made = { values, rows, p };
  packedOnRequest.set(data, { x, packed: made });
  return made;
}
