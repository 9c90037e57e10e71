import { continuedFraction } from './continuedFraction';
import { largeAExpansion } from './largeA';
import { asymptoticExpansion } from './largeAB';
import { type BetaPoint, swapCoordinates } from './point';
import { powerSeries } from './powerSeries';
import { upwardRecurrenceSum } from './recurrenceSum';
import { type BetaPlan, EPS, planIncompleteBeta } from './regions';
import { smallASeries, smallBSeries } from './smallParameterSeries';

export interface BetaTails {
  /** I_x(a, b) = P(X ≤ x) for X ~ Beta(a, b). */
  lower: number;
  /** 1 − I_x(a, b) = P(X > x). */
  upper: number;
}

const fromLower = (lower: number): BetaTails => ({ lower, upper: 1 - lower });
const fromUpper = (upper: number): BetaTails => ({ lower: 1 - upper, upper });

/**
 * Parameter b of the oriented problem reduced into (0, 1] by an integer n ≥ 1 (b > 1 here), so
 * that the upward recurrence can bridge from b − n to b.
 */
function reduceB(b: number): { n: number; reduced: number } {
  const n = Math.floor(b);
  return b === n ? { n: n - 1, reduced: 1 } : { n, reduced: b - n };
}

function evaluate(plan: BetaPlan): BetaTails {
  const { a, b, point: p, lambda, shift } = plan;
  switch (plan.method) {
    case 'tinyParameters':
      return { lower: b / (a + b), upper: a / (a + b) };
    case 'smallBSeries':
      return fromLower(smallBSeries(a, b, p, EPS));
    case 'smallASeries':
      return fromUpper(smallASeries(a, b, p, EPS));
    case 'powerSeries':
      return fromLower(powerSeries(a, b, p, EPS));
    case 'complementPowerSeries':
      return fromUpper(powerSeries(b, a, swapCoordinates(p), EPS));
    case 'continuedFraction':
      // The paper stops at 15·EPS; at EPS the truncation error drops from 4e-15 to 4e-16 for a
      // few more steps.
      return fromLower(continuedFraction(a, b, p, lambda, EPS));
    case 'asymptoticExpansion':
      return fromLower(asymptoticExpansion(a, b, lambda, 100 * EPS));
    case 'complementLargeA': {
      // 1 − I_x(a, b) = I_y(b, a) = [I_y(b, a) − I_y(b + n, a)] + I_y(b + n, a).
      const q = swapCoordinates(p);
      const head = shift > 0 ? upwardRecurrenceSum(b, a, q, shift, EPS) : 0;
      return fromUpper(largeAExpansion(b + shift, a, q, head, 15 * EPS));
    }
    case 'reducedBPowerSeries':
    case 'reducedBLargeA': {
      // I_x(a, b) = [I_x(a, b) − I_x(a, b')] + I_x(a, b'), b' = b − n, where the bracket is
      // I_y(b', a) − I_y(b' + n, a), an upward recurrence in y.
      const { n, reduced } = reduceB(b);
      let sum = upwardRecurrenceSum(reduced, a, swapCoordinates(p), n, EPS);
      if (plan.method === 'reducedBPowerSeries') return fromLower(sum + powerSeries(a, reduced, p, EPS));
      if (a > 15) return fromLower(largeAExpansion(a, reduced, p, sum, 15 * EPS));
      // The large-a expansion needs a ≥ 15: bridge from a to a + 20 first.
      sum += upwardRecurrenceSum(a, reduced, p, 20, EPS);
      return fromLower(largeAExpansion(a + 20, reduced, p, sum, 15 * EPS));
    }
  }
}

/**
 * Both tails of the beta distribution, I_x(a, b) and 1 − I_x(a, b), after Didonato & Morris 1992
 * (ACM TOMS 708, BRATIO), for a, b > 0 at a point given by both coordinates and their logs (see
 * BetaPoint). `lambda` = a − (a+b)·x may be supplied when the caller can form it more accurately
 * than from x and y; it decides the orientation when a, b > 1 and enters the methods for two large
 * parameters (the log-form kernel, the continued fraction and the large-a-and-b expansion).
 */
export function incompleteBeta(a: number, b: number, point: BetaPoint, lambda?: number): BetaTails {
  // NaN anywhere would keep the series below from ever meeting their stopping tests.
  const valid = a > 0 && b > 0 && a < Number.POSITIVE_INFINITY && b < Number.POSITIVE_INFINITY && point.x >= 0 && point.y >= 0;
  if (!valid) return { lower: Number.NaN, upper: Number.NaN };
  if (point.logX === Number.NEGATIVE_INFINITY) return { lower: 0, upper: 1 };
  if (point.logY === Number.NEGATIVE_INFINITY) return { lower: 1, upper: 0 };
  const plan = planIncompleteBeta(a, b, point, lambda);
  const tails = evaluate(plan);
  return plan.swapped ? { lower: tails.upper, upper: tails.lower } : tails;
}
