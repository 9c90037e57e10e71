/**
 * Predictors a ModelData holds packed row-major in one typed array, beside (and instead of
 * reading) its rows: the model frame registers them as it builds the data, so the cache key is
 * one copy of that array, and a formula whose fit is cached never builds a row. Keyed weakly on the
 * data object, so a copy or any other ModelData is keyed from its rows as before.
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

const registered = new WeakMap<ModelData, PackedPredictors>();

/**
 * Only for data whose x cannot change after this call (the model frame's x is a read-only
 * property built from `values`), so the registered numbers stay the rows' own.
 */
export function registerPackedPredictors(data: ModelData, packed: PackedPredictors): void {
  registered.set(data, packed);
}

export function packedPredictorsOf(data: ModelData): PackedPredictors | undefined {
  return registered.get(data);
}
