import type { ModelFit, ModelFrame } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const FIT_STATS_LABELS = [
  'Rows used',
  'Rows skipped',
  'Parameters',
  'Residual df',
  'RSS',
  'Sigma-hat',
  'R²',
  'Adjusted R²',
  'F (all slopes zero)',
  'p-value of F',
  'Log-likelihood',
  'AIC',
  'BIC',
] as const;

export function fitStatsGrid(fit: ModelFit, frame: ModelFrame): Grid {
  const values = [
    fit.n,
    frame.skipped.length,
    fit.parameters,
    fit.residualDf,
    fit.rss,
    fit.sigma,
    fit.rSquared,
    fit.adjustedRSquared,
    fit.fStatistic,
    fit.fPValue,
    fit.logLikelihood,
    fit.aic,
    fit.bic,
  ];
  return FIT_STATS_LABELS.map((label, i) => [label, finiteOrBlank(values[i])]);
}
