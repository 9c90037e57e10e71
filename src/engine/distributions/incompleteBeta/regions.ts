import { meanDeviation } from './kernel';
import { type BetaPoint, swapCoordinates } from './point';

/**
 * Accuracy target of the component methods: Didonato & Morris 1992 (ACM TOMS 708) use
 * max(machine epsilon, 1e-15), which is 1e-15 in double precision.
 */
export const EPS = 1e-15;

/**
 * How I_x(a, b) is evaluated, after Didonato & Morris 1992 (ACM TOMS 708, BRATIO). Each method
 * computes whichever of I and 1 − I it gives directly; the other is 1 minus it, which the region
 * rules keep harmless by having the direct one be the smaller, or at least not near 1.
 */
export type BetaMethod =
  /** Both parameters below 1e-3·EPS: I = b/(a + b). */
  | 'tinyParameters'
  /** FPSER: I directly, for a tiny b. */
  | 'smallBSeries'
  /** APSER: 1 − I directly, for a tiny a. */
  | 'smallASeries'
  /** BPSER in x: I directly. */
  | 'powerSeries'
  /** BPSER in y with the parameters exchanged: 1 − I directly. */
  | 'complementPowerSeries'
  /** BFRAC: I directly, x at or below the mean. */
  | 'continuedFraction'
  /** BASYM: I directly, both parameters above 100 and x close to the mean. */
  | 'asymptoticExpansion'
  /** BUP over `shift` steps then BGRAT, both in y with the parameters exchanged: 1 − I directly. */
  | 'complementLargeA'
  /** b reduced to (0, 1] by BUP (in y), then BPSER in x for the reduced b: I directly. */
  | 'reducedBPowerSeries'
  /** b reduced to (0, 1] by BUP (in y), then (for a ≤ 15, BUP in x over 20 steps and) BGRAT: I directly. */
  | 'reducedBLargeA';

export interface BetaPlan {
  method: BetaMethod;
  /** The problem after orientation: I_x(a, b) = 1 − I_y(b, a) lets every method assume its favourable side. */
  a: number;
  b: number;
  point: BetaPoint;
  /** λ = a − (a+b)·x of the oriented problem; it is ≥ 0 whenever a, b > 1. */
  lambda: number;
  /** True when (a, b, x) became (b, a, y), so the two tails must be exchanged at the end. */
  swapped: boolean;
  /** The number of upward-recurrence steps for 'complementLargeA' (0 or 20). */
  shift: number;
}

/** The region rules of Didonato & Morris 1992 (ACM TOMS 708, BRATIO), for a, b > 0. */
export function planIncompleteBeta(a: number, b: number, point: BetaPoint, lambda?: number): BetaPlan {
  const lambdaGiven = lambda ?? meanDeviation(a, b, point);
  const orient = (swap: boolean, method: BetaMethod, shift = 0): BetaPlan =>
    swap
      ? { method, a: b, b: a, point: swapCoordinates(point), lambda: -lambdaGiven, swapped: true, shift }
      : { method, a, b, point, lambda: lambdaGiven, swapped: false, shift };

  if (Math.max(a, b) < 1e-3 * EPS) return orient(false, 'tinyParameters');

  if (Math.min(a, b) <= 1) {
    // Work with x ≤ ½.
    const swap = point.x > 0.5;
    const a0 = swap ? b : a;
    const b0 = swap ? a : b;
    const x0 = swap ? point.y : point.x;
    const logX0 = swap ? point.logY : point.logX;
    if (b0 < Math.min(EPS, EPS * a0)) return orient(swap, 'smallBSeries');
    if (a0 < Math.min(EPS, EPS * b0) && b0 * x0 <= 1) return orient(swap, 'smallASeries');
    if (Math.max(a0, b0) <= 1) {
      if (a0 >= Math.min(0.2, b0)) return orient(swap, 'powerSeries');
      if (Math.exp(a0 * logX0) <= 0.9) return orient(swap, 'powerSeries');
      if (x0 >= 0.3) return orient(swap, 'complementPowerSeries');
      return orient(swap, 'complementLargeA', 20);
    }
    if (b0 <= 1) return orient(swap, 'powerSeries');
    if (x0 >= 0.3) return orient(swap, 'complementPowerSeries');
    if (x0 < 0.1 && Math.exp(a0 * (logX0 + Math.log(b0))) <= 0.7) return orient(swap, 'powerSeries');
    return orient(swap, 'complementLargeA', b0 > 15 ? 0 : 20);
  }

  // a, b > 1: work with x at or below the mean.
  const swap = lambdaGiven < 0;
  const a0 = swap ? b : a;
  const b0 = swap ? a : b;
  const x0 = swap ? point.y : point.x;
  const lambda0 = Math.abs(lambdaGiven);
  if (b0 < 40) {
    if (b0 * x0 <= 0.7) return orient(swap, 'powerSeries');
    return orient(swap, x0 > 0.7 ? 'reducedBLargeA' : 'reducedBPowerSeries');
  }
  const smaller = Math.min(a0, b0);
  if (smaller <= 100 || lambda0 > 0.03 * smaller) return orient(swap, 'continuedFraction');
  return orient(swap, 'asymptoticExpansion');
}
