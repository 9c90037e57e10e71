import type { CandidateResult, ModelFrame } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const COMPARE_HEADER = ['Candidate', 'Terms', 'Residual df', 'Sigma-hat', 'Adjusted R²', 'AIC', 'BIC', 'ΔBIC'];

/**
 * One row per candidate, best BIC first. Candidate is the row's number in the candidates grid and
 * Terms names the source columns of predictors it includes, so every line traces back to its choice.
 */
/** Each candidate's source columns of predictors, ascending. */
export function compareGrid(results: readonly CandidateResult[], choices: readonly { sources: number[] }[], frame: ModelFrame): Grid {
  const rows = results.map((r) => [
    r.candidate + 1,
    termsText(choices[r.candidate].sources, frame),
    r.residualDf,
    finiteOrBlank(r.sigma),
    finiteOrBlank(r.adjustedRSquared),
    finiteOrBlank(r.aic),
    finiteOrBlank(r.bic),
    finiteOrBlank(r.deltaBic),
  ]);
  return [[...COMPARE_HEADER], ...rows];
}

function termsText(sources: readonly number[], frame: ModelFrame): string {
  // With the intercept off an empty candidate is refused before it gets here.
  if (sources.length === 0) return 'intercept only';
  return sources.map((j) => frame.columns[j].name).join(', ');
}
