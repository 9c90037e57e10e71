import type { AssumptionChecks } from '../engine';
import { formatP } from './pValues';
import { NORMAL_KURTOSIS, NOTABLE_SKEWNESS } from './thresholds';

/**
 * Readings of the two normality tests. Shapiro–Wilk decides for 3 to 5000 rows (Royston's range);
 * Jarque–Bera is shown beside it for information and decides only above 5000 rows, where its
 * χ²(2) reference is close to right (issue #16: far too few rejections at 10–50 rows).
 */

const EXACT_FIT = 'exact fit: every residual is 0, so there is nothing to test';
const CAUTION = 'intervals rely on normality most when rows are few';

export function shapiroWilkReading(checks: AssumptionChecks): string {
  const sw = checks.shapiroWilk;
  switch (sw.verdict) {
    case 'exact-fit':
      return EXACT_FIT;
    case 'too-few':
      return 'fewer than 3 rows: too few to test the shape of the residuals';
    case 'too-many':
      return 'more than 5000 rows, beyond the range of Royston’s Shapiro–Wilk: Jarque–Bera tests the shape (below)';
    case 'constant':
      return 'every residual is the same: no shape to test';
    case 'none':
      return `residuals look roughly normal (${formatP(sw.pValue)})`;
    case 'non-normal':
      return `residuals depart from a normal shape (${formatP(sw.pValue)})${shapeOf(checks.jarqueBera)}; ${CAUTION}`;
  }
}

export function jarqueBeraReading(jb: AssumptionChecks['jarqueBera']): string {
  switch (jb.verdict) {
    case 'exact-fit':
      return EXACT_FIT;
    case 'shapiro-wilk-decides':
      return 'for information: up to 5000 rows the shape is tested by Shapiro–Wilk (above)';
    case 'none':
      return `residuals look roughly normal (${formatP(jb.pValue)})`;
    case 'non-normal':
      return `residuals depart from a normal shape (${formatP(jb.pValue)})${shapeOf(jb)}; ${CAUTION}`;
  }
}

/** ": a long right tail and more extreme residuals than a normal shape", past the cut-offs only. */
function shapeOf(jb: AssumptionChecks['jarqueBera']): string {
  const shape = [
    Math.abs(jb.skewness) >= NOTABLE_SKEWNESS ? (jb.skewness > 0 ? 'a long right tail' : 'a long left tail') : undefined,
    jb.kurtosis > NORMAL_KURTOSIS.high
      ? 'more extreme residuals than a normal shape'
      : jb.kurtosis < NORMAL_KURTOSIS.low
        ? 'fewer extreme residuals than a normal shape'
        : undefined,
  ].filter((s): s is string => s !== undefined);
  return shape.length > 0 ? `: ${shape.join(' and ')}` : '';
}
