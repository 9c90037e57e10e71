import { afterAll, describe, expect, it } from 'vitest';
import { type BetaPoint, pointFromCoordinates, pointFromOdds, swapCoordinates } from '../../../src/engine/distributions/incompleteBeta/point';
import { incompleteBeta } from '../../../src/engine/distributions/incompleteBeta/ratio';
import { type BetaMethod, planIncompleteBeta } from '../../../src/engine/distributions/incompleteBeta/regions';
import { relativeError, WorstErrors } from './errorTable';
import { expToDouble, fromDouble, ln, mul, ONE } from './support/fixedPoint';
import { betaLowerByBinomial, betaLowerBySeries, betaTailsByBinomial, betaTailsBySeries } from './support/references';

// The incomplete beta after Didonato & Morris 1992 (ACM TOMS 708), checked region by region
// against references evaluated in 320-bit fixed point (support/references.ts). The tolerance is
// ten times tighter than the distributions' 1e-12 so that a loss in one method shows here first,
// except that no result P can beat exp of a rounded log P, whose floor is about |log P|·ε
// (1.5e-13 at 1e-300).

const EPSILON = 2.220446049250313e-16;
const tolerance = (expected: number): number => Math.max(1e-13, 2 * EPSILON * Math.abs(Math.log(expected)));
const worst = new WorstErrors();
afterAll(() => worst.print('incomplete beta: worst relative error per method'));

/**
 * A point with x + y = 1 exactly in doubles: the larger coordinate is rounded once and the smaller
 * is its exact complement (Sterbenz), so the reference sees the same point as the code.
 */
function exactPoint(x: number): BetaPoint {
  if (x >= 0.5) return pointFromCoordinates(x, 1 - x);
  const y = 1 - x;
  return pointFromCoordinates(1 - y, y);
}

describe('exact values', () => {
  it('I_½(a, a) = ½ for every a, by symmetry (common practice, no source)', () => {
    for (const a of [0.3, 1, 2, 7.5, 39.5, 150, 1e4, 1e6]) {
      const { lower, upper } = incompleteBeta(a, a, exactPoint(0.5));
      expect(Math.abs(lower - 0.5), `a=${a}`).toBeLessThan(1e-14);
      expect(Math.abs(upper - 0.5), `a=${a}`).toBeLessThan(1e-14);
    }
  });

  it('I_x(½, ½) = (2/π)·asin(√x): 1/3 at x = ¼ and 2/3 at x = ¾ (arcsine law, common practice, no source)', () => {
    const quarter = incompleteBeta(0.5, 0.5, exactPoint(0.25));
    expect(relativeError(quarter.lower, 1 / 3)).toBeLessThan(1e-15);
    expect(relativeError(quarter.upper, 2 / 3)).toBeLessThan(1e-15);
    const threeQuarters = incompleteBeta(0.5, 0.5, exactPoint(0.75));
    expect(relativeError(threeQuarters.lower, 2 / 3)).toBeLessThan(1e-15);
  });

  it('I_½(8, 3) = P(Binomial(10, ½) ≥ 8) = 56/1024 (common practice, no source)', () => {
    const { lower, upper } = incompleteBeta(8, 3, exactPoint(0.5));
    expect(relativeError(lower, 56 / 1024)).toBeLessThan(1e-15);
    expect(relativeError(upper, 968 / 1024)).toBeLessThan(1e-15);
  });

  it('I_x(a, 1) = x^a and 1 − I_x(1, b) = y^b, down to 1e-300 (common practice, no source)', () => {
    for (const a of [0.5, 3, 40, 1e3, 1e5, 5e6]) {
      for (const x of [0.999999, 0.9999, 0.99, 0.9, 0.5, 0.1, 1e-3]) {
        const logPower = mul(fromDouble(a), ln(fromDouble(x)));
        if (logPower < -690n * ONE) continue;
        const expected = expToDouble(logPower); // x^a in 320-bit
        const p = exactPoint(x);
        const e1 = worst.record('x^a, y^b closed forms', incompleteBeta(a, 1, p).lower, expected, `a=${a} x=${x}`);
        expect(e1, `I_x(${a}, 1), x=${x}`).toBeLessThan(tolerance(expected));
        const e2 = worst.record('x^a, y^b closed forms', incompleteBeta(1, a, swapCoordinates(p)).upper, expected, `b=${a} y=${x}`);
        expect(e2, `1 − I_y(1, ${a}), y=${x}`).toBeLessThan(tolerance(expected));
      }
    }
  });

  it('keeps tails whose coordinate underflows: I_x(½, ½) at odds 1e400 is (2/π)·1e-200', () => {
    // x = 1/(1 + 1e400) is not a double, but log x is; asin(√x) = √x to 1e-400 relative.
    const point = pointFromOdds(Number.POSITIVE_INFINITY, 400 * Math.LN10);
    expect(point.x).toBe(0);
    const { lower } = incompleteBeta(0.5, 0.5, point);
    expect(relativeError(lower, (2 / Math.PI) * 1e-200)).toBeLessThan(1e-13);
  });
});

describe('both tails come back directly', () => {
  it('I_x(a, b) and 1 − I_x(a, b) exchange with (b, a, y), I_x(a, b) + I_y(b, a) = 1', () => {
    for (const [a, b] of [
      [0.3, 0.7],
      [0.05, 5],
      [2.5, 40],
      [30, 2.5],
      [150, 120],
      [5e6, 39],
    ] as const) {
      for (const x of [0.01, 0.2, 0.45, 0.7, 0.97, 0.99999]) {
        const p = exactPoint(x);
        const direct = incompleteBeta(a, b, p);
        const mirrored = incompleteBeta(b, a, swapCoordinates(p));
        expect(relativeError(mirrored.upper, direct.lower), `(${a},${b}) x=${x}`).toBeLessThan(1e-14);
        expect(relativeError(mirrored.lower, direct.upper), `(${a},${b}) x=${x}`).toBeLessThan(1e-14);
      }
    }
  });

  it('the small tail keeps its relative accuracy when the other rounds to 1', () => {
    // x = 0.99 lies far below the mean 0.9997 of Beta(1e4, 3): I is about 1e-40, so 1 − (1 − I)
    // would give 0; the method returns the small tail itself.
    const p = exactPoint(0.99);
    const { lower, upper } = incompleteBeta(1e4, 3, p);
    expect(upper).toBe(1);
    const expected = betaTailsByBinomial(1e4, 3, p.x, p.y).lower; // A&S 26.5.24 (from memory)
    expect(expected).toBeLessThan(1e-30);
    expect(relativeError(lower, expected)).toBeLessThan(tolerance(expected));
  });
});

type Reference = 'series' | 'binomial' | 'lowerSeries' | 'lowerBinomial';

/** Cases the region rules send to each method, with a reference that converges quickly there. */
const REGION_CASES: Array<[BetaMethod, number, number, number, Reference]> = [
  ['tinyParameters', 1e-20, 3e-20, 0.3, 'series'],
  ['smallBSeries', 2, 1e-20, 0.3, 'series'],
  ['smallBSeries', 3, 1e-17, 0.4, 'series'],
  ['smallASeries', 1e-20, 2, 0.3, 'series'],
  ['smallASeries', 1e-18, 0.5, 0.45, 'series'],
  ['powerSeries', 0.5, 0.5, 0.3, 'series'],
  ['powerSeries', 2.5, 0.5, 0.2, 'series'],
  ['powerSeries', 0.3, 5, 0.02, 'series'],
  ['powerSeries', 5, 3, 0.1, 'series'],
  ['powerSeries', 200, 0.5, 0.01, 'series'],
  ['powerSeries', 0.3, 0.7, 0.9, 'series'],
  ['complementPowerSeries', 0.05, 0.5, 0.5, 'series'],
  ['complementPowerSeries', 0.01, 0.5, 0.35, 'series'],
  ['complementPowerSeries', 0.5, 5, 0.4, 'series'],
  ['complementPowerSeries', 3, 1e-17, 0.6, 'series'],
  ['complementLargeA', 0.05, 0.5, 0.2, 'series'],
  ['complementLargeA', 0.01, 0.9, 0.05, 'series'],
  ['complementLargeA', 0.5, 3.5, 0.2, 'series'],
  ['complementLargeA', 0.3, 20, 0.02, 'series'],
  ['complementLargeA', 200, 0.5, 0.99, 'series'],
  ['complementLargeA', 1e4, 0.5, 0.999, 'lowerSeries'],
  ['reducedBPowerSeries', 5, 3, 0.5, 'series'],
  ['reducedBPowerSeries', 30, 2.5, 0.95, 'series'],
  ['reducedBPowerSeries', 10, 2.7, 0.85, 'series'],
  ['reducedBLargeA', 30, 2.5, 0.9, 'series'],
  ['reducedBLargeA', 100, 2.7, 0.95, 'series'],
  ['reducedBLargeA', 10, 2.7, 0.75, 'series'],
  ['reducedBLargeA', 1000, 30.5, 0.97, 'series'],
  ['reducedBLargeA', 1000, 20, 0.97, 'binomial'],
  ['reducedBLargeA', 2000, 1.5, 0.998, 'lowerSeries'],
  ['reducedBLargeA', 5e6, 39, 0.99999, 'lowerBinomial'],
  ['reducedBLargeA', 5e6, 2, 0.9999, 'lowerBinomial'],
  ['continuedFraction', 50, 50, 0.4, 'series'],
  ['continuedFraction', 150, 120, 0.52, 'series'],
  ['continuedFraction', 60, 45, 0.7, 'series'],
  ['continuedFraction', 40, 5e5, 1e-4, 'lowerSeries'],
  ['asymptoticExpansion', 150, 120, 0.55, 'series'],
  ['asymptoticExpansion', 500, 500, 0.49, 'series'],
  ['asymptoticExpansion', 500, 500, 0.51, 'series'],
  ['asymptoticExpansion', 400, 300, 0.58, 'binomial'],
  ['asymptoticExpansion', 1e5, 2e5, 0.333, 'lowerSeries'],
];

describe('every region of Didonato & Morris 1992 against an independent reference', () => {
  for (const [method, a, b, x, reference] of REGION_CASES) {
    it(`${method}: I_x(${a}, ${b}) at x = ${x}`, () => {
      const p = exactPoint(x);
      expect(planIncompleteBeta(a, b, p).method).toBe(method);
      const got = incompleteBeta(a, b, p);
      // DLMF 8.17.8 series (from memory) or the binomial sum, A&S 26.5.24 (from memory).
      if (reference === 'lowerSeries' || reference === 'lowerBinomial') {
        // Only the tail whose sum is short (the other would take millions of terms).
        const lower = (reference === 'lowerSeries' ? betaLowerBySeries : betaLowerByBinomial)(a, b, p.x, p.y);
        expect(worst.record(method, got.lower, lower, `(${a},${b}) x=${x} lower`), 'lower').toBeLessThan(tolerance(lower));
        return;
      }
      const expected = reference === 'series' ? betaTailsBySeries(a, b, p.x, p.y) : betaTailsByBinomial(a, b, p.x, p.y);
      const { lower, upper } = expected;
      expect(worst.record(method, got.lower, lower, `(${a},${b}) x=${x} lower`), 'lower').toBeLessThan(tolerance(lower));
      expect(worst.record(method, got.upper, upper, `(${a},${b}) x=${x} upper`), 'upper').toBeLessThan(tolerance(upper));
    });
  }

  it('orients the problem as the paper does: x ≤ ½ for small parameters, x below the mean otherwise', () => {
    expect(planIncompleteBeta(0.3, 0.7, exactPoint(0.9)).swapped).toBe(true);
    expect(planIncompleteBeta(0.3, 0.7, exactPoint(0.1)).swapped).toBe(false);
    expect(planIncompleteBeta(60, 45, exactPoint(0.7)).swapped).toBe(true); // mean 0.571
    expect(planIncompleteBeta(60, 45, exactPoint(0.5)).swapped).toBe(false);
    // A caller's λ overrides the one formed from x and y.
    expect(planIncompleteBeta(60, 45, exactPoint(0.5), -1).swapped).toBe(true);
  });
});
