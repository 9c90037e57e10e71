/**
 * Shapiro–Wilk (Royston 1995, AS R94). Sources (values in fixtures/checks.json, written by
 * scripts/reference/checks.R with R 4.2.2): stats::shapiro.test, whose C routine swilk.c is
 * Royston's AS R94, on the residuals of lm(dist ~ speed, cars), lm(mpg ~ wt + hp, mtcars) and
 * lm(stack.loss ~ ., stackloss), on R's datasets precip, rivers, islands and faithful$eruptions,
 * and on seeded normal and exponential samples (set.seed(20261204), rounded to 6 decimals, stored in
 * the fixture) of n = 3, 4, 5, 11, 12, 20, 50, 500, 5000; the exact n = 3 distribution (Shapiro &
 * Wilk 1965) as a closed form; a seeded simulation of the size (mulberry32, test/support/random.ts).
 */
import { describe, expect, it } from 'vitest';
import { checksFixture, relativeError } from '../../support/checksFixture';
import { shapiroWilk } from '../../../src/engine/infer/shapiroWilk';
import { gaussian, mulberry32 } from '../../support/random';

const fixture = checksFixture;

describe('shapiroWilk against R', () => {
  it.each(fixture.shapiroWilk.map((c) => [c.name, c.x.length, c] as const))('%s (n = %i): W and p as shapiro.test', (_, n, c) => {
    const result = shapiroWilk(c.x);
    expect(result.n).toBe(n);
    expect(result.undefinedBecause).toBeUndefined();
    expect(relativeError(result.statistic, c.w)).toBeLessThan(1e-13);
    expect(relativeError(result.pValue, c.p)).toBeLessThan(1e-10);
  });
});

describe('shapiroWilk properties', () => {
  it('is unchanged by shifting and scaling the data, and by their order', () => {
    const x = fixture.shapiroWilk[0].x;
    const base = shapiroWilk(x);
    const moved = shapiroWilk(x.map((v) => 1e6 + 1e-3 * v).reverse());
    expect(relativeError(moved.statistic, base.statistic)).toBeLessThan(1e-9);
    expect(relativeError(moved.pValue, base.pValue)).toBeLessThan(1e-7);
  });

  it('for n = 3 follows the exact distribution: equal gaps give W = 1 and p = 1, a tie gives W = 3/4 and p = 0', () => {
    // Equally spaced points lie exactly on the n = 3 normal scores: W = 1, p = 1.
    const even = shapiroWilk([1, 2, 3]);
    expect(Math.abs(even.statistic - 1)).toBeLessThan(1e-15);
    expect(Math.abs(even.pValue - 1)).toBeLessThan(1e-7);
    // Two equal values: W = 3/4, the smallest possible, with p = 0.
    const tie = shapiroWilk([0, 0, 1]);
    expect(Math.abs(tie.statistic - 0.75)).toBeLessThan(1e-15);
    expect(tie.pValue).toBeLessThan(1e-7);
  });

  it('returns reason codes outside 3 ≤ n ≤ 5000 and for a constant sample', () => {
    expect(shapiroWilk([1, 2]).undefinedBecause).toBe('too-few');
    expect(shapiroWilk(Array.from({ length: 5001 }, (_, i) => Math.sin(i))).undefinedBecause).toBe('too-many');
    const constant = shapiroWilk([4, 4, 4, 4]);
    expect(constant.undefinedBecause).toBe('constant');
    expect(Number.isNaN(constant.statistic) && Number.isNaN(constant.pValue)).toBe(true);
  });
});

describe('shapiroWilk under the null (seeded simulation)', () => {
  // Normal samples: the rate over R replications should lie within 4 standard errors √(0.05·0.95/R)
  // of 0.05 (Royston's p-values are approximations, but far closer than that; observed 0.048, 0.047, 0.049).
  it.each([10, 20, 50])('rejects at the nominal 5 percent within Monte Carlo error at n = %i', (n) => {
    const replications = 4000;
    const normal = gaussian(mulberry32(700 + n));
    let rejected = 0;
    for (let r = 0; r < replications; r++) {
      const sample = Array.from({ length: n }, () => normal());
      if (shapiroWilk(sample).pValue < 0.05) rejected++;
    }
    const rate = rejected / replications;
    expect(Math.abs(rate - 0.05)).toBeLessThan(4 * Math.sqrt((0.05 * 0.95) / replications));
  });
});
