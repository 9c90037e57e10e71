import { EngineError } from '../errors';
import { fitModel } from '../fitModel';
import { resolveSettings } from '../settings';
import type { FitSettings, ModelData, ModelFit } from '../types';

export interface CandidateResult {
  /** Position of the candidate in the list given (0-based). */
  candidate: number;
  /** Columns of data.x it uses, ascending. */
  columns: number[];
  /** Parameters estimated, intercept included. */
  rank: number;
  residualDf: number;
  sigma: number;
  adjustedRSquared: number;
  logLikelihood: number;
  aic: number;
  bic: number;
  /** BIC minus the smallest BIC among the candidates: 0 for the best. */
  deltaBic: number;
}

/**
 * Fits each candidate (a subset of the columns of `data.x`) on the same rows, weights and settings,
 * and orders them by BIC, smallest first; ties keep the order given. Because every candidate sees
 * the very same y, their likelihoods, and so their AIC and BIC, are comparable; a candidate fitted
 * on its own complete rows would not be. The covariance setting does not change any of these numbers.
 */
export function compareCandidates(data: ModelData, candidates: readonly (readonly number[])[], settings?: FitSettings): CandidateResult[] {
  const resolved = resolveSettings(settings);
  if (candidates.length === 0) throw new EngineError('shape', 'There are no candidate models to compare.');
  const width = data.x[0]?.length ?? data.names?.length ?? 0;
  const results = candidates.map((chosen, k) => {
    const columns = [...new Set(chosen)].sort((a, b) => a - b);
    const outside = columns.find((j) => !(Number.isInteger(j) && j >= 0 && j < width));
    if (outside !== undefined) {
      throw new EngineError('shape', `Candidate ${k + 1} uses column ${outside + 1}, but the data have ${width} columns.`);
    }
    if (columns.length === 0 && !resolved.intercept) {
      throw new EngineError('shape', `Candidate ${k + 1} has no terms: with the intercept off it needs at least one column.`);
    }
    const fit = fitCandidate(data, columns, resolved, k);
    return {
      candidate: k,
      columns,
      rank: fit.rank,
      residualDf: fit.residualDf,
      sigma: fit.sigma,
      adjustedRSquared: fit.adjustedRSquared,
      logLikelihood: fit.logLikelihood,
      aic: fit.aic,
      bic: fit.bic,
      deltaBic: 0,
    };
  });
  const best = Math.min(...results.map((r) => r.bic));
  return results.map((r) => ({ ...r, deltaBic: r.bic - best })).sort((a, b) => a.bic - b.bic || a.candidate - b.candidate);
}

function fitCandidate(data: ModelData, columns: readonly number[], settings: FitSettings, k: number): ModelFit {
  const { names } = data;
  try {
    return fitModel(
      {
        y: data.y,
        x: data.x.map((row) => columns.map((j) => row[j])),
        names: names === undefined ? undefined : columns.map((j) => names[j]),
        weights: data.weights,
      },
      settings,
    );
  } catch (error) {
    if (error instanceof EngineError) throw new EngineError(error.code, `Candidate ${k + 1}: ${error.message}`);
    throw error;
  }
}
