import type { UnusualRow } from './assumptionChecks';
import type { BreuschPagan } from './breuschPagan';
import type { CollinearityReason } from './collinearity';
import type { DurbinWatson } from './durbinWatson';
import type { JarqueBera } from './jarqueBera';

/**
 * Plain-language readings of the assumption checks. Each test is read at α = 1 − level; a blank
 * statistic always comes with the reason it is blank.
 */

/** Two decimals, three below 0.01, and "< 0.001" below that: enough to read, never false precision. */
export function formatP(p: number): string {
  if (p < 0.001) return 'p < 0.001';
  return `p = ${p < 0.01 ? p.toFixed(3) : p.toFixed(2)}`;
}

const EXACT_FIT = 'exact fit: every residual is 0, so there is nothing to test';

/**
 * Read on the two-sided p (autocorrelation of either sign is a concern) and says so; CHECKS shows
 * the one-sided p for ρ > 0 beside it, labelled as such.
 */
export function durbinWatsonReading(dw: DurbinWatson, alpha: number): string {
  if (dw.undefinedBecause === 'exact-fit') return EXACT_FIT;
  if (dw.undefinedBecause === 'fixed-by-design') return 'rows = parameters + 1: d is fixed by the design and cannot be tested';
  const p = `read on the two-sided ${formatP(dw.pTwoSided)}`;
  if (dw.pTwoSided >= alpha) return `no sign of autocorrelation in row order (${p})`;
  return dw.statistic < dw.mean
    ? `neighbouring residuals move together: positive autocorrelation (${p}); standard errors are likely too small`
    : `neighbouring residuals alternate in sign: negative autocorrelation (${p})`;
}

export function breuschPaganReading(bp: BreuschPagan, alpha: number): string {
  switch (bp.undefinedBecause) {
    case 'exact-fit':
      return EXACT_FIT;
    case 'no-predictors':
      return 'no predictors besides the intercept: nothing for the spread to change with';
    case 'equal-squares':
      return 'every residual has the same size: no spread to relate to the predictors';
    case 'too-few-rows':
      return 'too few rows: the squared residuals are fitted exactly';
    case undefined:
      return bp.pValue < alpha
        ? `residual spread changes with the predictors (${formatP(bp.pValue)}): consider robust standard errors`
        : `no sign that the residual spread changes with the predictors (${formatP(bp.pValue)})`;
  }
}

export function jarqueBeraReading(jb: JarqueBera, alpha: number): string {
  if (jb.undefinedBecause === 'exact-fit') return EXACT_FIT;
  if (jb.pValue >= alpha) return `residuals look roughly normal (${formatP(jb.pValue)})`;
  // Which way the shape departs, named only past round cut-offs of our own (no source): |S| ≥ 0.5, K outside 2.5–3.5.
  const shape = [
    Math.abs(jb.skewness) >= 0.5 ? (jb.skewness > 0 ? 'a long right tail' : 'a long left tail') : undefined,
    jb.kurtosis > 3.5 ? 'more extreme residuals than a normal shape' : jb.kurtosis < 2.5 ? 'fewer extreme residuals than a normal shape' : undefined,
  ].filter((s): s is string => s !== undefined);
  const described = shape.length > 0 ? `: ${shape.join(' and ')}` : '';
  return `residuals depart from a normal shape (${formatP(jb.pValue)})${described}; intervals rely on normality most when rows are few`;
}

/** Rows shown by number in a reading; the rest are counted. */
const NAMED_ROWS = 5;

/** "row 12 (studentized residual 21.5, Cook's distance 3.2) stands out…", with the caution that such rows can cause the other signals. */
export function unusualRowsReading(rows: readonly UnusualRow[]): string {
  const named = rows.slice(0, NAMED_ROWS).map((u) => {
    const parts = [
      Number.isFinite(u.studentized) ? `studentized residual ${u.studentized.toFixed(1)}` : u.outlier ? 'the other rows fit it exactly' : undefined,
      u.influential ? `Cook's distance ${u.cooksDistance.toFixed(2)}` : undefined,
    ].filter((t): t is string => t !== undefined);
    return `row ${u.row} (${parts.join(', ')})`;
  });
  const more = rows.length > NAMED_ROWS ? ` and ${rows.length - NAMED_ROWS} more` : '';
  const one = rows.length === 1;
  return `${named.join(', ')}${more} ${one ? 'stands' : 'stand'} out: check ${one ? 'its' : 'their'} data first, since ${one ? 'such a row' : 'such rows'} can cause the other signals`;
}

export const COLLINEARITY_REASON_TEXT: Record<CollinearityReason, string> = {
  constant: 'constant: the column does not vary',
  collinear: 'perfectly collinear: an exact combination of the other terms',
  'spans-intercept': 'with other terms it sums to a constant, standing in for the intercept: no centered VIF',
};

/**
 * Condition-number bands after Belsley, Kuh & Welsch (Regression Diagnostics, 1980), who read
 * indexes of the unit-scaled design from about 30 up as moderate to strong dependencies and from
 * about 100 as serious ones (from memory).
 */
export function conditionReading(conditionNumber: number): string {
  if (conditionNumber === Number.POSITIVE_INFINITY) return 'infinite: some terms are exact combinations of others';
  if (!Number.isFinite(conditionNumber)) return 'not defined';
  if (conditionNumber < 10) return 'no sign of harmful collinearity';
  if (conditionNumber < 30) return 'mild dependence among the columns';
  if (conditionNumber < 100) return 'moderate to strong collinearity: see which terms have large VIFs';
  return 'serious collinearity: individual estimates are unreliable';
}

/** A VIF above 10 is the usual rule of thumb for a term whose estimate collinearity degrades. */
export const LARGE_VIF = 10;

/** Cook & Weisberg (Residuals and Influence in Regression, 1982): a Cook's distance above 1 marks a row that moves the fit. */
export const LARGE_COOKS_DISTANCE = 1;
