import fQuantileLibrary from '@stdlib/stats-base-dists-f-quantile';
import { betaTailParts } from './betaTail';
import { solveUpperTail, type TailWithSlope } from './solve';

function validDf(df: number): boolean {
  return df > 0 && df < Number.POSITIVE_INFINITY;
}

/**
 * P(F > f) for Fisher's F with (df1, df2) degrees of freedom, computed as an upper tail directly
 * (never 1 − cdf), so it stays relative-accurate down to the underflow threshold. Infinite df are
 * not accepted: the χ² limit belongs to the caller.
 */
export function fisherFUpperTail(f: number, df1: number, df2: number): number {
  if (Number.isNaN(f) || !validDf(df1) || !validDf(df2)) return Number.NaN;
  if (f <= 0) return 1;
  if (f === Number.POSITIVE_INFINITY) return 0;
  return betaTailParts(f, df1, df2).upper;
}

function tailWithSlope(df1: number, df2: number): (f: number) => TailWithSlope {
  return (f) => {
    if (f === Number.POSITIVE_INFINITY) return { upper: 0, slope: 0 };
    const parts = betaTailParts(f, df1, df2);
    return { upper: parts.upper, slope: Math.exp(parts.logKernel) };
  };
}

/**
 * f with P(F > f) = alpha, for 0 < alpha ≤ ½. The library quantile only seeds Newton's method on
 * our own tail. The seed is the reciprocal of the swapped distribution's lower quantile at alpha,
 * whose input is exact: the direct form at 1 − alpha rounds alpha away below 1e-16 and returned
 * Infinity for F(2, 1) already at alpha = 1e-8; the reciprocal form was within 1.3e-10 of the
 * polished value over our grid, and Newton's method removes the rest.
 */
function upperQuantile(alpha: number, df1: number, df2: number): number {
  const seed = 1 / fQuantileLibrary(alpha, df2, df1);
  return solveUpperTail(alpha, seed, tailWithSlope(df1, df2));
}

/**
 * Lower-tail quantile: q with P(F ≤ q) = p. The critical value at level 0.95 is
 * fisherFQuantile(0.95, df1, df2). For p ≥ ½ the upper tail 1 − p is exact (Sterbenz); for p < ½
 * the identity P(F(df1,df2) ≤ q) = P(F(df2,df1) ≥ 1/q) keeps small p at full relative accuracy.
 */
export function fisherFQuantile(p: number, df1: number, df2: number): number {
  if (Number.isNaN(p) || !validDf(df1) || !validDf(df2) || p < 0 || p > 1) return Number.NaN;
  if (p === 0) return 0;
  if (p === 1) return Number.POSITIVE_INFINITY;
  if (p >= 0.5) return upperQuantile(1 - p, df1, df2);
  return 1 / upperQuantile(p, df2, df1);
}
