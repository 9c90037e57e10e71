/** Value of an upper tail at a point together with −dP/d(log x). */
export interface TailWithSlope {
  upper: number;
  /** −dP/d(log x) ≥ 0. */
  slope: number;
}

/**
 * Solves P(X > x) = alpha for x > 0 by Newton's method in log x with log(P/alpha) as the residual;
 * log P is close to linear in log x (heavy tails) or in x (light tails) far out, so from a good
 * start one or two steps suffice. The iterate is kept as x itself and multiplied by exp(step):
 * carrying log x instead would round x to |log x|·ε relative (1e-13 at the 1e-300 end).
 * A bisection bracket (geometric midpoint) guards against a poor start, such as a library quantile
 * that returned 0, Infinity or NaN.
 */
export function solveUpperTail(alpha: number, start: number, tail: (x: number) => TailWithSlope): number {
  let lo = 0; // P(lo) > alpha
  let hi = Number.POSITIVE_INFINITY; // P(hi) < alpha
  let x = start > 0 && start < Number.POSITIVE_INFINITY ? start : 1;
  let best = x;
  let bestErr = Number.POSITIVE_INFINITY;
  for (let iter = 0; iter < 300; iter++) {
    const { upper, slope } = tail(x);
    const residual = upper > 0 ? Math.log(upper / alpha) : Number.NEGATIVE_INFINITY;
    if (Math.abs(residual) < bestErr) {
      bestErr = Math.abs(residual);
      best = x;
    }
    if (residual === 0) return x;
    if (residual > 0) lo = Math.max(lo, x);
    else hi = Math.min(hi, x);
    const step = upper > 0 && slope > 0 ? (residual * upper) / slope : Number.NaN;
    let next = x * Math.exp(step);
    if (!(next > lo && next < hi)) {
      if (lo > 0 && hi < Number.POSITIVE_INFINITY) next = Math.sqrt(lo) * Math.sqrt(hi);
      else if (lo > 0) {
        next = lo * 16;
        if (next === Number.POSITIVE_INFINITY) {
          // The quantile lies beyond the largest double (e.g. F(1, ν) lower tail at 1e-300 needs
          // 1/q ≈ 1e600): overflow is the honest answer.
          if (tail(Number.MAX_VALUE).upper > alpha) return Number.POSITIVE_INFINITY;
          next = Number.MAX_VALUE;
        }
      } else if (hi < Number.POSITIVE_INFINITY) {
        next = hi / 16;
        if (next === 0) {
          if (tail(Number.MIN_VALUE).upper < alpha) return 0;
          next = Number.MIN_VALUE;
        }
      } else next = x;
    }
    if (Math.abs(next - x) <= 1e-16 * x || next === x) {
      // Within an ulp or two: the last two iterates bracket the answer, keep the better.
      if (next !== x) {
        const r2 = tail(next).upper;
        if (Math.abs(Math.log(r2 / alpha)) < bestErr) return next;
      }
      return best;
    }
    x = next;
  }
  return best;
}
