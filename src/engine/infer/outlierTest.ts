import { studentTTwoSidedP } from '../distributions/studentT';

/**
 * The Bonferroni outlier test (Cook & Weisberg, Residuals and Influence in Regression, 1982, §2.2;
 * car::outlierTest in R): the row with the largest absolute externally studentized residual tᵢ,
 * its two-sided p-value 2·P(T > |tᵢ|) on n − p − 1 degrees of freedom, and that p-value
 * multiplied by the number of rows tested, at most 1, because the row was picked as the most
 * extreme of them.
 *
 * Input: the studentized residuals of residualDiagnostics (NaN where a row has none, such as a
 * leverage-one row; ±Infinity for a row the others fit exactly, whose p-value is then 0), in row
 * order, and the model's n and p. Rows without a studentized residual are not tested and not counted.
 */
export interface OutlierTest {
  /** Index of the most extreme row among the rows given, or −1. */
  index: number;
  studentized: number;
  /** 2·P(T_{n−p−1} > |t|), not adjusted. */
  pValue: number;
  /** min(1, rowsTested · pValue). */
  bonferroniP: number;
  rowsTested: number;
  undefinedBecause: OutlierTestReason | undefined;
}

/**
 * - no-deleted-df: n − p − 1 ≤ 0, so no deleted σ̂ (and no studentized residual) exists.
 * - no-studentized: no row has a studentized residual (every one at leverage 1, or an exact fit).
 */
export type OutlierTestReason = 'no-deleted-df' | 'no-studentized';

export function outlierTest(studentized: ArrayLike<number>, n: number, p: number): OutlierTest {
  const df = n - p - 1;
  const result: OutlierTest = {
    index: -1,
    studentized: Number.NaN,
    pValue: Number.NaN,
    bonferroniP: Number.NaN,
    rowsTested: 0,
    undefinedBecause: undefined,
  };
  if (df <= 0) return { ...result, undefinedBecause: 'no-deleted-df' };
  for (let i = 0; i < studentized.length; i++) {
    const t = studentized[i];
    if (Number.isNaN(t)) continue;
    result.rowsTested++;
    if (result.index < 0 || Math.abs(t) > Math.abs(result.studentized)) {
      result.index = i;
      result.studentized = t;
    }
  }
  if (result.index < 0) return { ...result, undefinedBecause: 'no-studentized' };
  result.pValue = studentTTwoSidedP(result.studentized, df);
  result.bonferroniP = bonferroniP(result.pValue, result.rowsTested);
  return result;
}

/** A two-sided p of one row adjusted for having looked at `rowsTested` rows: min(1, rowsTested·p). */
export function bonferroniP(pValue: number, rowsTested: number): number {
  return Math.min(1, rowsTested * pValue);
}
