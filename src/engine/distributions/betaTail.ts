import { ddAdd, ddDiv, ddMul, pair, twoProd, twoSum } from '../precise/doubleDouble';
import { logBetaKernel } from './incompleteBeta/kernel';
import { type BetaPoint, pointFromOdds } from './incompleteBeta/point';
import { incompleteBeta } from './incompleteBeta/ratio';

export interface BetaTailParts {
  /** P(F > f) for F with (df1, df2) degrees of freedom. */
  upper: number;
  /**
   * log of x^a·y^b / B(a, b) with a = df2/2, b = df1/2. It equals log(f · density of F at f), i.e.
   * −dP/d(log f), which is what a Newton step on log f needs.
   */
  logKernel: number;
}

/** Beyond this, b·f is too large for the exact-product splitting (and λ ≈ a·y needs no care). */
const LARGEST_EXACT_PRODUCT = 1e290;

/**
 * λ = a − (a+b)·x = a·b·(f − 1)/(a + b·f), the F point's distance from the beta mean that the
 * large-parameter methods need, evaluated in double-double and rounded once. Its condition number
 * in the tail reaches about 2·|log P| (≈ 1400 at P = 1e-300), so the 2–5e-16 left by forming it
 * in plain doubles cost up to 7e-13 relative at df = (3908.5, 914614); rounded once it costs at
 * most 1.5e-13. Where b·f is huge, a·y − b·x has no cancellation and serves directly.
 */
function fMeanDeviation(f: number, a: number, b: number, p: BetaPoint): number {
  if (!(b * f < LARGEST_EXACT_PRODUCT)) return a * p.y - b * p.x;
  const t = pair();
  twoSum(f, -1, t); // f − 1
  const gHi = t[0];
  const gLo = t[1];
  twoProd(a, b, t);
  ddMul(t[0], t[1], gHi, gLo, t); // a·b·(f − 1)
  const nHi = t[0];
  const nLo = t[1];
  twoProd(b, f, t);
  ddAdd(a, 0, t[0], t[1], t); // a + b·f
  ddDiv(nHi, nLo, t[0], t[1], t);
  return t[0];
}

/**
 * P(F > f) = I_x(df2/2, df1/2) with x = df2/(df2 + df1·f); the Student t tails reuse it through
 * P(|T| > t) = P(F(1, ν) > t²).
 *
 * Everything is driven by the odds w = y/x = df1·f/df2, so x = 1/(1+w), y = w/(1+w) and their
 * logarithms are all formed without a subtraction (see BetaPoint), and λ comes from f itself (see
 * fMeanDeviation): near f = 1 with both df large, forming it from a rounded x or y would cost
 * (a+b)·ε absolute. A library incomplete beta takes a single x and forms 1 − x inside, which costs
 * about df·ε relative accuracy when one df is large (measured 3e-10 at df2 = 1e7) and, near
 * underflow, returned 0 or a 1 % error in our measurements.
 *
 * `logF` lets a caller whose f overflows (t beyond 1e154) still supply log f.
 */
export function betaTailParts(f: number, df1: number, df2: number, logF: number = Math.log(f)): BetaTailParts {
  const a = df2 / 2;
  const b = df1 / 2;
  let w = (df1 * f) / df2;
  let logW: number;
  if (w > 0 && w < Number.POSITIVE_INFINITY) {
    logW = Math.log(w);
  } else {
    logW = Math.log(df1) + logF - Math.log(df2);
    w = Math.exp(logW);
  }
  const point = pointFromOdds(w, logW);
  const lambda = fMeanDeviation(f, a, b, point);
  const upper = incompleteBeta(a, b, point, lambda).lower;
  // The complement of a directly computed tail can round a hair outside [0, 1].
  return { upper: Math.min(1, Math.max(0, upper)), logKernel: logBetaKernel(a, b, point, lambda) };
}
