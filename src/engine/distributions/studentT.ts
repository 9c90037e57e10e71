import tQuantileLibrary from '@stdlib/stats-base-dists-t-quantile';
import { betaTailParts, type BetaTailParts } from './betaTail';
import { normalQuantile, normalTwoSidedP, normalUpperTail } from './normal';
import { solveUpperTail } from './solve';

/**
 * P(|T| > t) = P(F(1, ν) > t²) for t ≥ 0, via the shared incomplete-beta tail. Past t ≈ 1e154 the
 * square overflows, so log t² is passed alongside (heavy tails such as ν = 1 still give p ≈ 1e-300
 * at t ≈ 1e300).
 */
function twoSidedParts(tAbs: number, df: number): BetaTailParts {
  const t2 = tAbs * tAbs;
  if (t2 < Number.POSITIVE_INFINITY) return betaTailParts(t2, 1, df);
  return betaTailParts(Number.POSITIVE_INFINITY, 1, df, 2 * Math.log(tAbs));
}

function validDf(df: number): boolean {
  return df > 0 && !Number.isNaN(df);
}

/**
 * P(T > t) with ν = df degrees of freedom (ν > 0, not necessarily an integer; ν = Infinity is the
 * normal). The small side is computed directly, never as 1 − cdf.
 */
export function studentTUpperTail(t: number, df: number): number {
  if (Number.isNaN(t) || !validDf(df)) return Number.NaN;
  if (df === Number.POSITIVE_INFINITY) return normalUpperTail(t);
  if (t === Number.POSITIVE_INFINITY) return 0;
  if (t === Number.NEGATIVE_INFINITY) return 1;
  if (t === 0) return 0.5;
  const half = twoSidedParts(Math.abs(t), df).upper / 2;
  return t > 0 ? half : 1 - half;
}

/** P(|T| > |t|). */
export function studentTTwoSidedP(t: number, df: number): number {
  if (Number.isNaN(t) || !validDf(df)) return Number.NaN;
  if (df === Number.POSITIVE_INFINITY) return normalTwoSidedP(t);
  const tAbs = Math.abs(t);
  if (tAbs === Number.POSITIVE_INFINITY) return 0;
  if (tAbs === 0) return 1;
  return twoSidedParts(tAbs, df).upper;
}

/**
 * t > 0 with P(T > t) = alpha, 0 < alpha < ½. ν = 1 (Cauchy) and ν = 2 have closed forms; the
 * library quantile returns Infinity for ν = 1 below alpha ≈ 1e-200, so it is only used as a seed
 * for Newton's method on our own tail for other ν.
 */
function upperQuantile(alpha: number, df: number): number {
  if (df === 1) {
    // tan(π(½ − α)) = 1/tan(πα); each form is used where its argument is exact or well scaled.
    return alpha <= 0.25 ? 1 / Math.tan(Math.PI * alpha) : Math.tan(Math.PI * (0.5 - alpha));
  }
  if (df === 2) {
    // (1 − 2α)/√(2α(1 − α)): no cancellation for α ≤ ½.
    return (1 - 2 * alpha) / Math.sqrt(2 * alpha * (1 - alpha));
  }
  const seed = -tQuantileLibrary(alpha, df);
  return solveUpperTail(alpha, seed, (t) => {
    if (t === Number.POSITIVE_INFINITY) return { upper: 0, slope: 0 };
    const parts = twoSidedParts(t, df);
    // P(T > t) = ½·P(F(1,ν) > t²) and −dP/d(log t) = x^a·y^b/B(a,b) (the factor 2 from t² cancels the ½).
    return { upper: parts.upper / 2, slope: Math.exp(parts.logKernel) };
  });
}

/** Lower-tail quantile: x with P(T ≤ x) = p. */
export function studentTQuantile(p: number, df: number): number {
  if (Number.isNaN(p) || !validDf(df) || p < 0 || p > 1) return Number.NaN;
  if (df === Number.POSITIVE_INFINITY) return normalQuantile(p);
  if (p === 0) return Number.NEGATIVE_INFINITY;
  if (p === 1) return Number.POSITIVE_INFINITY;
  if (p === 0.5) return 0;
  return p < 0.5 ? -upperQuantile(p, df) : upperQuantile(1 - p, df);
}
