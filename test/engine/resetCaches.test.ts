/** One call clears every cache the engine keeps across calls. */
import { describe, expect, it } from 'vitest';
import { fitModel, modelCache, type ModelData, resetCaches } from '../../src/engine';
import { solveModel } from '../../src/engine/fitModel';
import { designBasis } from '../../src/engine/infer/designBasis';
import { equalVarianceResiduals } from '../../src/engine/infer/equalVarianceResiduals';
import { sharedCollinearity } from '../../src/engine/infer/sharedCollinearity';
import type { Collinearity } from '../../src/engine/infer/collinearity';

const x = [
  [1, 4],
  [2, 3],
  [3, 5],
  [4, 1],
  [5, 2],
  [6, 7],
];
const data: ModelData = { y: [2.2, 3.1, 5.8, 4.4, 6.9, 9.7], x };

/** A collinearity result that counts how often it was computed. */
function counted(counter: { calls: number }): () => Collinearity {
  return () => {
    counter.calls++;
    return { terms: [], conditionNumber: 1, singularValues: [], hasIntercept: true };
  };
}

describe('resetCaches', () => {
  it('forgets the fits', () => {
    fitModel(data);
    expect(modelCache.stats().entries).toBeGreaterThan(0);
    resetCaches();
    expect(modelCache.stats()).toMatchObject({ entries: 0, fits: 0, hits: 0 });
  });

  it('forgets the collinearity memo, which clearing the fits alone keeps', () => {
    const counter = { calls: 0 };
    sharedCollinearity(data, true, [], counted(counter));
    modelCache.reset();
    sharedCollinearity(data, true, [], counted(counter));
    expect(counter.calls).toBe(1);
    resetCaches();
    sharedCollinearity(data, true, [], counted(counter));
    expect(counter.calls).toBe(2);
  });

  it('lets go of the kept design basis and residuals', () => {
    const { solution } = solveModel(data);
    const basis = designBasis(solution);
    const residuals = equalVarianceResiduals(solution);
    expect(designBasis(solution)).toBe(basis);
    expect(equalVarianceResiduals(solution)).toBe(residuals);
    resetCaches();
    const again = designBasis(solution);
    expect(again).not.toBe(basis);
    expect(again).toEqual(basis);
    expect(equalVarianceResiduals(solution)).not.toBe(residuals);
    expect(equalVarianceResiduals(solution)).toEqual(residuals);
  });
});
