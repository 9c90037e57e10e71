import type { AssumptionChecks } from '../engine';
import { formatFixed } from './numbers';
import { formatP } from './pValues';

/**
 * The Bonferroni outlier test in words (Cook & Weisberg 1982): the most outlying row by its number
 * as the user knows it, and its p adjusted for having picked it from every row.
 */
export function outlierReading(test: AssumptionChecks['outlierTest']): string {
  switch (test.verdict) {
    case 'exact-fit':
      return 'exact fit: every residual is 0, so there is nothing to test';
    case 'no-deleted-df':
      return 'rows = parameters + 1: without a row, nothing is left to estimate the spread, so no studentized residual exists';
    case 'no-studentized':
      return 'no row has a studentized residual: every row has leverage 1';
    case 'outlier': {
      const how = Number.isFinite(test.studentized) ? `studentized residual ${formatFixed(test.studentized, 1)}` : 'the other rows fit it exactly';
      return `row ${test.row} is an outlier (${how}, Bonferroni ${formatP(test.bonferroniP)}): check its data first, since such a row can cause the other signals`;
    }
    case 'none':
      return `no row is an outlier: the most extreme, row ${test.row}, has Bonferroni ${formatP(test.bonferroniP)}`;
  }
}
