import { type AssumptionChecks, EXACT_MAX_ROWS } from '../engine';
import { COLLINEARITY_REASON_TEXT } from './collinearityReadings';
import { formatFixed, formatLevel } from './numbers';
import { formatP } from './pValues';
import { LARGE_VIF, type UnusualRow, unusualRows } from './thresholds';

/**
 * Plain-language readings of the engine's assumption checks, from its verdict codes (each test
 * decided at α = 1 − level). A blank statistic always comes with the reason it is blank.
 */

const EXACT_FIT = 'exact fit: every residual is 0, so there is nothing to test';

/** Which computation gave d's p-values: CHECKS' "DW method" row. */
export function durbinWatsonMethodText(dw: AssumptionChecks['durbinWatson']): string {
  return dw.method === 'exact' ? 'exact' : `beta approximation (n > ${EXACT_MAX_ROWS})`;
}

/** The p Durbin–Watson is decided on, with how it was computed: "exact two-sided p = 0.0123" or "two-sided p = 0.0123 by the beta approximation". */
export function durbinWatsonPText(dw: AssumptionChecks['durbinWatson']): string {
  return dw.method === 'exact' ? `exact two-sided ${formatP(dw.pTwoSided)}` : `two-sided ${formatP(dw.pTwoSided)} by the beta approximation`;
}

/**
 * Read on the two-sided p (autocorrelation of either sign is a concern) and says so; CHECKS shows
 * the one-sided p for ρ > 0 beside it, labelled as such.
 */
export function durbinWatsonReading(dw: AssumptionChecks['durbinWatson']): string {
  const p = `read on the ${durbinWatsonPText(dw)}`;
  switch (dw.verdict) {
    case 'exact-fit':
      return EXACT_FIT;
    case 'fixed-by-design':
      return 'd takes the same value whatever the data (as when rows = parameters + 1), so it cannot be tested';
    case 'none':
      return `no sign of autocorrelation in row order (${p})`;
    case 'positive-autocorrelation':
      return `neighbouring residuals move together: positive autocorrelation (${p}); standard errors are likely too small`;
    case 'negative-autocorrelation':
      return `neighbouring residuals alternate in sign: negative autocorrelation (${p})`;
  }
}

export function breuschPaganReading(bp: AssumptionChecks['breuschPagan']): string {
  switch (bp.verdict) {
    case 'exact-fit':
      return EXACT_FIT;
    case 'no-predictors':
      return 'no predictors besides the intercept: nothing for the spread to change with';
    case 'equal-squares':
      return 'every residual has the same size: no spread to relate to the predictors';
    case 'too-few-rows':
      return 'too few rows: the squared residuals are fitted exactly';
    case 'uneven-spread':
      return `residual spread changes with the predictors (${formatP(bp.pValue)}): consider robust standard errors`;
    case 'none':
      return `no sign that the residual spread changes with the predictors (${formatP(bp.pValue)})`;
  }
}

/** Rows shown by number in a reading; the rest are counted. */
const NAMED_ROWS = 5;

/** "row 12 (studentized residual 21.5, Bonferroni p < 0.0001, Cook's distance 3.20) stands out…", with the caution that such rows can cause the other signals. */
export function unusualRowsReading(rows: readonly UnusualRow[]): string {
  const named = rows.slice(0, NAMED_ROWS).map((u) => {
    const parts = [
      Number.isFinite(u.studentized) ? `studentized residual ${formatFixed(u.studentized, 1)}` : u.outlier ? 'the other rows fit it exactly' : undefined,
      u.outlier ? `Bonferroni ${formatP(u.bonferroniP)}` : undefined,
      u.influential ? `Cook's distance ${formatFixed(u.cooksDistance, 2)}` : undefined,
    ].filter((t): t is string => t !== undefined);
    return `row ${u.row} (${parts.join(', ')})`;
  });
  const more = rows.length > NAMED_ROWS ? ` and ${rows.length - NAMED_ROWS} more` : '';
  const one = rows.length === 1;
  return `${named.join(', ')}${more} ${one ? 'stands' : 'stand'} out: check ${one ? 'its' : 'their'} data first, since ${one ? 'such a row' : 'such rows'} can cause the other signals`;
}

/** The term with the largest VIF, and why that VIF is infinite when it is. */
export function largestVifTermReading(checks: AssumptionChecks): string {
  if (checks.largestVifTerm === undefined) return 'none: the model has no predictors';
  return checks.largestVifReason === undefined ? checks.largestVifTerm : `${checks.largestVifTerm} (${COLLINEARITY_REASON_TEXT[checks.largestVifReason]})`;
}

/**
 * Every concern in one line, in the order issue #16 gives: unusual rows first (outliers by the
 * Bonferroni test, and influential rows), since one such row can cause the other signals; then
 * autocorrelation, uneven spread, a non-normal shape, lack of fit, and collinearity last. Each
 * test is named with the p it was decided on.
 */
export function overallReading(checks: AssumptionChecks): string {
  const { durbinWatson: dw, breuschPagan: bp, shapiroWilk: sw, jarqueBera: jb, lackOfFit: lof } = checks;
  const concerns: string[] = [];
  const dwP =
    dw.method === 'exact' ? `Durbin–Watson exact two-sided ${formatP(dw.pTwoSided)}` : `Durbin–Watson two-sided ${formatP(dw.pTwoSided)}, beta approximation`;
  if (dw.verdict === 'positive-autocorrelation') concerns.push(`positive autocorrelation (${dwP})`);
  if (dw.verdict === 'negative-autocorrelation') concerns.push(`negative autocorrelation (${dwP})`);
  if (bp.verdict === 'uneven-spread') concerns.push(`uneven residual spread (Breusch–Pagan ${formatP(bp.pValue)})`);
  if (sw.verdict === 'non-normal') concerns.push(`non-normal residuals (Shapiro–Wilk ${formatP(sw.pValue)})`);
  if (jb.verdict === 'non-normal') concerns.push(`non-normal residuals (Jarque–Bera ${formatP(jb.pValue)})`);
  if (lof.verdict === 'lack-of-fit') concerns.push(`lack of fit (against pure error, ${formatP(lof.pValue)})`);
  if (checks.largestVif === Number.POSITIVE_INFINITY) concerns.push('terms that are exact combinations of others');
  else if (checks.largestVif > LARGE_VIF) concerns.push(`strong collinearity (a VIF above ${LARGE_VIF})`);
  if (checks.exactFit) return ['exact fit: every residual is 0, so the residual checks do not apply', ...concerns].join('; ');
  const unusual = unusualRows(checks);
  if (unusual.length > 0) {
    const then = concerns.length > 0 ? `; then ${concerns.join(', ')}` : '';
    return `worth a look first: ${unusualRowsReading(unusual)}${then}`;
  }
  if (concerns.length === 0) return `nothing stands out at the ${formatLevel(1 - checks.alpha)} level`;
  return `worth a look: ${concerns.join(', ')}`;
}
