import { expTimes } from './elementary';
import { logBetaKernel } from './kernel';
import type { BetaPoint } from './point';

/**
 * I_x(a, b) for a, b > 1 with x at or below the mean (λ = a − (a+b)·x ≥ 0), by the continued
 * fraction of Didonato & Morris 1992 (ACM TOMS 708, BFRAC):
 *   I_x(a, b) = x^a·y^b/B(a, b) · 1/(β₀ + α₁/(β₁ + α₂/(β₂ + …))),
 *   β₀ = a(1 + λ)/(a + 1),
 *   αₙ = (a+n−1)(a+b+n−1)·n(b−n)·x² / (a+2n−1)²,
 *   βₙ = n + n(b−n)·x/(a+2n−1) + (a+n)/(a+2n+1) · (1 + λ + n(1 + y)).
 * Every place where 1 − x would appear uses y or λ, so no digits are lost when x is near 1.
 */
export function continuedFraction(a: number, b: number, p: BetaPoint, lambda: number, eps: number): number {
  const logKernel = logBetaKernel(a, b, p, lambda);
  if (logKernel === Number.NEGATIVE_INFINITY) return 0;
  const { x, y } = p;
  // Convergents A/B by the three-term recurrence, rescaled each step so that they stay near 1.
  let aPrev = 0;
  let bPrev = 1;
  let aCur = 1;
  let bCur = (a * (1 + lambda)) / (a + 1);
  let value = aCur / bCur;
  for (let n = 1; ; n++) {
    const s = a + 2 * n - 1;
    const w = n * (b - n) * x;
    const alpha = ((a + n - 1) * (a + b + n - 1) * w * x) / (s * s);
    const beta = n + w / s + ((a + n) / (s + 2)) * (1 + lambda + n * (1 + y));
    const aNext = alpha * aPrev + beta * aCur;
    const bNext = alpha * bPrev + beta * bCur;
    const previous = value;
    value = aNext / bNext;
    if (Math.abs(value - previous) <= eps * value) break;
    aPrev = aCur / bNext;
    bPrev = bCur / bNext;
    aCur = value;
    bCur = 1;
  }
  return expTimes(logKernel, value);
}
