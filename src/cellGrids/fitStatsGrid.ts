import type { ModelFit, ModelFrame } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

/**
 * FITSTATS rows, grouped by the question each answers: which data the fit used; how large the
 * noise is; how much of the response the model explains; whether the terms help at all (the
 * overall F test with both of its degrees of freedom); and the information criteria used to
 * compare models. These are the labels of a model with an intercept (see fitStatsLabels).
 */
export const FIT_STATS_LABELS = [
  'Rows used',
  'Rows skipped',
  'Parameters',
  'Sigma-hat',
  'Residual df',
  'RSS',
  'R²',
  'Adjusted R²',
  'F (all slopes zero)',
  'F numerator df',
  'F denominator df',
  'p-value of F',
  'Log-likelihood',
  'AIC',
  'BIC',
] as const;

export type FitStatsLabel = (typeof FIT_STATS_LABELS)[number];

/**
 * Without an intercept R² and F are uncentered (they measure y against zero, not against its
 * mean), so the labels say so: the numbers are not comparable with those of a centered fit.
 */
const WITHOUT_INTERCEPT: Partial<Record<FitStatsLabel, string>> = {
  'R²': 'R² (uncentered)',
  'Adjusted R²': 'Adjusted R² (uncentered)',
  'F (all slopes zero)': 'F (all coefficients zero)',
};

/** The labels FITSTATS shows, in FIT_STATS_LABELS order. */
export function fitStatsLabels(intercept: boolean): string[] {
  return FIT_STATS_LABELS.map((label) => (intercept ? label : (WITHOUT_INTERCEPT[label] ?? label)));
}

/**
 * The FITSTATS grid of a fit that left out `skipped` rows. The F test's denominator df is blank
 * when σ is known (the test is then χ²/df, with no residual df).
 */
export function fitStatsRows(fit: ModelFit, skipped: number): Grid {
  const values: Record<FitStatsLabel, number> = {
    'Rows used': fit.n,
    'Rows skipped': skipped,
    Parameters: fit.parameters,
    'Sigma-hat': fit.sigma,
    'Residual df': fit.residualDf,
    RSS: fit.rss,
    'R²': fit.rSquared,
    'Adjusted R²': fit.adjustedRSquared,
    'F (all slopes zero)': fit.fStatistic,
    'F numerator df': fit.fDf[0],
    'F denominator df': fit.fDf[1],
    'p-value of F': fit.fPValue,
    'Log-likelihood': fit.logLikelihood,
    AIC: fit.aic,
    BIC: fit.bic,
  };
  const labels = fitStatsLabels(fit.settings.intercept);
  return FIT_STATS_LABELS.map((label, i) => [labels[i], finiteOrBlank(values[label])]);
}

export function fitStatsGrid(fit: ModelFit, frame: ModelFrame): Grid {
  return fitStatsRows(fit, frame.skipped.length);
}
