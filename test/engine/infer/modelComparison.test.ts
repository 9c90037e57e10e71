/**
 * Comparing candidate subsets. Source: the engine's own single-model fit (checked against NIST and
 * ml-matrix elsewhere): every candidate's AIC and BIC must be exactly those of fitting that subset
 * alone on the same rows. Ordering by BIC and ΔBIC = BIC − min BIC are the definitions asked for.
 */
import { describe, expect, it } from 'vitest';
import { compareCandidates, fitModel, type ModelData } from '../../../src/engine';
import { gaussian, mulberry32, randomProblem } from '../../support/random';

/** y depends on x1 and x2 only, so the subsets holding both should rank first. */
function problem(seed: number, n: number): ModelData {
  const { x } = randomProblem(seed, n, 4);
  const normal = gaussian(mulberry32(seed + 1));
  return { y: x.map((r) => 2 + 1.5 * r[0] - r[1] + 0.5 * normal()), x, names: ['a', 'b', 'c', 'd'] };
}

function subset(data: ModelData, columns: number[]): ModelData {
  return {
    y: data.y,
    x: data.x.map((r) => columns.map((j) => r[j])),
    names: columns.map((j) => data.names![j]),
    weights: data.weights,
  };
}

const CANDIDATES = [[0], [0, 1], [], [0, 1, 2, 3], [2, 3], [1, 0, 2]];

describe('compareCandidates', () => {
  it('gives each candidate the AIC, BIC, σ̂ and df of fitting it alone on the same rows', () => {
    const data = problem(3, 60);
    const results = compareCandidates(data, CANDIDATES);
    expect(results).toHaveLength(CANDIDATES.length);
    for (const r of results) {
      const alone = fitModel(
        subset(
          data,
          [...CANDIDATES[r.candidate]].sort((a, b) => a - b),
        ),
      );
      expect([r.aic, r.bic, r.sigma, r.residualDf, r.adjustedRSquared, r.logLikelihood]).toEqual([
        alone.aic,
        alone.bic,
        alone.sigma,
        alone.residualDf,
        alone.adjustedRSquared,
        alone.logLikelihood,
      ]);
    }
  });

  it('sorts by BIC ascending, with ΔBIC 0 for the best and BIC − best for the rest', () => {
    const results = compareCandidates(problem(4, 80), CANDIDATES);
    const bics = results.map((r) => r.bic);
    expect(bics).toEqual([...bics].sort((a, b) => a - b));
    expect(results[0].deltaBic).toBe(0);
    results.forEach((r) => expect(r.deltaBic).toBe(r.bic - results[0].bic));
    // The true model (a and b) beats leaving b out and beats the two unrelated columns.
    expect(results[0].columns).toEqual([0, 1]);
    expect(results.at(-1)!.columns).toEqual([2, 3]);
  });

  it('keeps the given order among equal BICs and treats an empty candidate as intercept only', () => {
    const data = problem(5, 40);
    const results = compareCandidates(data, [[1], [], [1]]);
    const same = results.filter((r) => r.columns.length === 1);
    expect(same.map((r) => r.candidate)).toEqual([0, 2]);
    const empty = results.find((r) => r.candidate === 1)!;
    expect(empty.rank).toBe(1);
    expect(empty.bic).toBe(fitModel({ y: data.y, x: data.y.map(() => []) }).bic);
  });

  it('passes weights and known σ to every candidate', () => {
    const data = { ...problem(6, 50), weights: Array.from({ length: 50 }, (_, i) => 1 + (i % 3)) };
    const [best] = compareCandidates(data, [[0, 1], [0]], { knownSigma: 0.5 });
    expect(best.bic).toBe(fitModel(subset(data, [0, 1]), { knownSigma: 0.5 }).bic);
  });

  it('names the candidate behind a failure', () => {
    const data = problem(7, 4);
    expect(() => compareCandidates(data, [[0], [0, 1, 2, 3]])).toThrow(/^Candidate 2: .*more rows than parameters/);
    expect(() => compareCandidates(data, [[0], []], { intercept: false })).toThrow(/Candidate 2 has no terms/);
    expect(() => compareCandidates(data, [[4]])).toThrow(/Candidate 1 uses column 5, but the data have 4 columns/);
    expect(() => compareCandidates(data, [])).toThrow(/no candidate models/);
  });
});
