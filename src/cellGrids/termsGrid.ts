import type { ModelFit, TermEstimate } from '../engine';
import { termReading } from '../presentation';
import { finiteOrBlank, type Grid } from './gridCell';

export const TERMS_HEADER = ['Term', 'Estimate', 'Std error', 't', 'p-value', 'CI low', 'CI high', 'CV %', 'Reading'];

/** The header names the robust covariance when one was used, so a table never hides which SEs it shows. */
export function termsGrid(fit: ModelFit): Grid {
  const header = [...TERMS_HEADER];
  if (fit.covarianceKind !== 'classical') header[2] = `Std error (${fit.covarianceKind})`;
  header[3] = fit.statisticKind;
  return [header, ...fit.terms.map((t) => termRow(t, fit.perfectFit))];
}

function termRow(t: TermEstimate, perfectFit: boolean): Grid[number] {
  return [
    t.name,
    finiteOrBlank(t.estimate),
    finiteOrBlank(t.standardError),
    finiteOrBlank(t.statistic),
    finiteOrBlank(t.pValue),
    finiteOrBlank(t.ciLow),
    finiteOrBlank(t.ciHigh),
    finiteOrBlank(t.cvPercent),
    termReading(t, perfectFit),
  ];
}
