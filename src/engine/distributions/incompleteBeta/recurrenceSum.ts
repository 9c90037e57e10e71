import { expTimes } from './elementary';
import { logBetaKernel } from './kernel';
import type { BetaPoint } from './point';

/**
 * I_x(a, b) − I_x(a + n, b) for a positive integer n (Didonato & Morris 1992, ACM TOMS 708, BUP),
 * from I_x(a, b) − I_x(a + 1, b) = x^a·y^b/(a·B(a, b)) applied n times:
 *   Σ_{i<n} d_i · x^a·y^b/(a·B(a, b)),  d_0 = 1,  d_i = d_{i−1}·x·(a + b + i − 1)/(a + i).
 * It moves a parameter by an integer so that a method valid only for the shifted one applies.
 */
export function upwardRecurrenceSum(a: number, b: number, p: BetaPoint, n: number, eps: number): number {
  let term = 1;
  let sum = 1;
  for (let i = 1; i < n; i++) {
    const ratio = (p.x * (a + b + i - 1)) / (a + i);
    term *= ratio;
    sum += term;
    // For b > 1 the ratio falls with i; for b ≤ 1 it stays below x. Either way, once it is below 1
    // the remaining terms keep shrinking.
    if (ratio < 1 && term <= eps * sum) break;
  }
  // The leading factor may underflow while the sum is large (terms can grow by e^700 when a + b
  // is large); the paper rescales by e^μ, expTimes moves the sum into the exponent instead.
  return expTimes(logBetaKernel(a, b, p) - Math.log(a), sum);
}
