import erfc from '@stdlib/math-base-special-erfc';
import erfcinv from '@stdlib/math-base-special-erfcinv';
import { solveUpperTail } from './solve';

/** P(Z > z) = erfc(z/√2)/2: erfc is an upper tail itself, so tiny values keep relative accuracy. */
export function normalUpperTail(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  return 0.5 * erfc(z * Math.SQRT1_2);
}

/** P(|Z| > |z|) = erfc(|z|/√2), at most 1 without clamping. */
export function normalTwoSidedP(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  return erfc(Math.abs(z) * Math.SQRT1_2);
}

const INV_SQRT_2PI = 0.3989422804014327; // 1/√(2π)

/** Newton steps taken inline from erfcinv's seed before the guarded general solver takes over. */
const INLINE_STEPS = 3;

/**
 * z > 0 with P(Z > z) = alpha < ½. erfcinv of the small tail is the seed (the library's normal
 * quantile loses accuracy below p ≈ 1e-5); erfcinv itself drifts to 7e-14 relative near
 * alpha = 1e-300, which the z² ≈ 1400 conditioning turns into 1e-10 in the round trip, so Newton
 * steps on the erfc tail finish the job. They are the general solver's steps (distributions/solve.ts:
 * Newton in log z on log(P/alpha)) taken inline, without its bracket and per-step objects, because
 * from this seed they converge at once: a Q–Q plot asks for one quantile per point, tens of
 * thousands at a time. The general solver is the fallback for a seed that is no number or does not settle.
 */
function upperQuantile(alpha: number): number {
  const seed = Math.SQRT2 * erfcinv(2 * alpha);
  let z = seed;
  for (let step = 0; step < INLINE_STEPS && z > 0 && z < Number.POSITIVE_INFINITY; step++) {
    const upper = normalUpperTail(z);
    const slope = z * INV_SQRT_2PI * Math.exp(-0.5 * z * z);
    if (!(upper > 0 && slope > 0)) break;
    const next = z * Math.exp((Math.log(upper / alpha) * upper) / slope);
    // A step within an ulp or two: quadratic convergence leaves next correct to the tail's own rounding.
    if (Math.abs(next - z) <= 4.5e-16 * z) return next;
    z = next;
  }
  return solveUpperTail(alpha, seed, (x) => ({
    upper: normalUpperTail(x),
    slope: x * INV_SQRT_2PI * Math.exp(-0.5 * x * x),
  }));
}

/**
 * Lower-tail quantile x with P(Z ≤ x) = p. For p > ½ the tail 1 − p is exact (Sterbenz), so the
 * only loss there is the one already present in p.
 */
export function normalQuantile(p: number): number {
  if (Number.isNaN(p) || p < 0 || p > 1) return Number.NaN;
  if (p === 0) return Number.NEGATIVE_INFINITY;
  if (p === 1) return Number.POSITIVE_INFINITY;
  if (p === 0.5) return 0;
  return p < 0.5 ? -upperQuantile(p) : upperQuantile(1 - p);
}
