import type { ModelFit, TermEstimate } from '../engine';
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
    reading(t, perfectFit),
  ];
}

/** The verdict on one term, with the reason whenever a number above it had to be left blank. */
export function reading(t: TermEstimate, perfectFit: boolean): string {
  if (t.aliased) return 'aliased';
  if (t.undefinedBecause === 'leverage-one') return 'no HC3 SE: a row with leverage 1 determines this term';
  const verdict = t.ciLow > 0 || t.ciHigh < 0 ? 'clear of zero' : 'could be zero';
  if (perfectFit) return `${verdict} (exact fit: SE is 0, so t and CV % are undefined)`;
  if (t.estimate === 0) return `${verdict} (estimate is exactly 0, so CV % is undefined)`;
  return verdict;
}
