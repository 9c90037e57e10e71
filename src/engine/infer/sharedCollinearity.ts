/**
 * Collinearity is a property of the predictors, the weights and the intercept setting, not of y:
 * CHECKS (from its fit) and COLLINEARITY (from the predictor cells alone) over the same columns
 * get one result through this memo. It is content-addressed by the fit cache's own machinery, the
 * key being those numbers under an empty response, so equal numbers find the result whatever
 * objects hold them; names are not part of the key and are applied on the way out.
 */
import { ModelCache } from '../cache/modelCache';
import { packedDataOf, predictorValues, registerPackedData } from '../cache/packedPredictors';
import type { ModelData } from '../types';
import type { Collinearity } from './collinearity';

/** A few reports' distinct predictor sets; each entry keeps a copy of its numbers (as the fit cache does). */
const results = new ModelCache<Collinearity>(8, 64 * 1024 * 1024);
const NO_RESPONSE = new Float64Array(0);

/**
 * The collinearity of `data`'s predictors and weights, computed by `compute` only when no equal
 * numbers were examined before under the same intercept setting. `names` are this caller's term
 * names, one per predictor column. The result is shared: callers must not change it.
 */
export function sharedCollinearity(data: ModelData, intercept: boolean, names: readonly string[], compute: () => Collinearity): Collinearity {
  const weights = packedDataOf(data)?.weights ?? (data.weights === undefined ? undefined : Float64Array.from(data.weights));
  // Only numbers are read from the key: an empty response, and the caller's own packed arrays,
  // which no stage writes to.
  const key: ModelData = { y: [], x: [] };
  registerPackedData(key, { y: NO_RESPONSE, predictors: predictorValues(data), weights });
  const shared = results.getOrCompute(key, { intercept }, compute, approximateBytes);
  if (shared.terms.every((t, j) => t.name === names[j])) return shared;
  return { ...shared, terms: shared.terms.map((t, j) => ({ ...t, name: names[j] })) };
}

function approximateBytes(result: Collinearity): number {
  return 64 * result.terms.length + 8 * result.singularValues.length + 256;
}

/** Forgets every stored result (see resetCaches.ts). */
export function resetSharedCollinearity(): void {
  results.reset();
}
