import { log1pmx } from './elementary';
import { HALF_LOG_2PI, STIRLING_MIN } from './gammaFunctions';
import { betaStirlingCorrection, logMinTimesBeta } from './logBeta';
import type { BetaPoint } from './point';

/**
 * λ = a − (a + b)·x, how far x lies below the mean a/(a + b), scaled by a + b. Following Didonato &
 * Morris 1992 (ACM TOMS 708) it is formed from y when a > b, where (a + b)·y − b cancels less.
 * Callers that know the point more exactly than x and y (the F statistic, near f = 1 with both df
 * large) pass their own λ instead.
 */
export function meanDeviation(a: number, b: number, p: BetaPoint): number {
  return a > b ? (a + b) * p.y - b : a - (a + b) * p.x;
}

/** The smallest normal double: below it a coordinate has lost relative precision. */
const MIN_NORMAL = 2.2250738585072014e-308;

/**
 * ρ(e) = e − log(1 + e) for one coordinate t (x or y), where 1 + e = t/t₀ and 1/t₀ = 1 + odds
 * (odds = b/a for x, a/b for y). From e = ∓λ/(its parameter) wherever 1 + e does not cancel; the
 * paper switches to e − log(t/t₀) at |e| > 0.6, but for e > 0.6 that cost 4e-13 relative at
 * df = (3001, 1e6) against 6e-14 from e. Far below the centre (e < −0.6) the quotient t/t₀ is
 * formed from t itself, as in the paper, or from log t where t is subnormal.
 */
function rho(e: number, t: number, logT: number, odds: number): number {
  if (e >= -0.6) return -log1pmx(e);
  const ratio = t * (1 + odds);
  return e - (t >= MIN_NORMAL ? Math.log(ratio) : logT + Math.log1p(odds));
}

/**
 * log of x^a·y^b/B(a, b), the factor in front of every expansion of I_x(a, b), in log form
 * (Didonato & Morris 1992, ACM TOMS 708, BRCOMP). When both parameters are large, x^a·y^b and
 * B(a, b) are each astronomically small while their ratio is not, so they are not formed apart:
 * with x₀ = a/(a+b), y₀ = b/(a+b),
 *   x^a·y^b/B(a,b) = √(b·x₀/2π) · exp(−[a·ρ(−λ/a) + b·ρ(λ/b)] − BCORR(a, b)),  ρ(e) = e − log(1 + e),
 * because x/x₀ = 1 − λ/a and y/y₀ = 1 + λ/b.
 */
export function logBetaKernel(a: number, b: number, p: BetaPoint, lambda: number = meanDeviation(a, b, p)): number {
  if (p.logX === Number.NEGATIVE_INFINITY || p.logY === Number.NEGATIVE_INFINITY) return Number.NEGATIVE_INFINITY;
  if (Math.min(a, b) < STIRLING_MIN) {
    return a * p.logX + b * p.logY - logMinTimesBeta(a, b) + Math.log(Math.min(a, b));
  }
  const u = rho(-lambda / a, p.x, p.logX, b / a);
  const v = rho(lambda / b, p.y, p.logY, a / b);
  const logX0 = -Math.log1p(b / a);
  return -(a * u + b * v) + 0.5 * (Math.log(b) + logX0) - HALF_LOG_2PI - betaStirlingCorrection(a, b);
}
