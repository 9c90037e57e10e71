import type { ModelFit } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

/** One column of estimates in term order; aliased terms are "". */
export function estimatesGrid(fit: ModelFit): Grid {
  return fit.terms.map((t) => [finiteOrBlank(t.estimate)]);
}

export function standardErrorsGrid(fit: ModelFit): Grid {
  return fit.terms.map((t) => [finiteOrBlank(t.standardError)]);
}

/** Two columns: the interval's low and high ends at the settings' level. */
export function intervalsGrid(fit: ModelFit): Grid {
  return fit.terms.map((t) => [finiteOrBlank(t.ciLow), finiteOrBlank(t.ciHigh)]);
}

export function covarianceGrid(fit: ModelFit): Grid {
  return fit.covariance.map((row) => row.map(finiteOrBlank));
}
