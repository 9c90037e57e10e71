/**
 * χ², the reference of the F tests when σ is known. Checks against closed forms (common practice,
 * no source): with 2 df the upper tail is exp(−x/2); with 1 df it is twice the normal upper tail
 * at √x, i.e. erfc(√(x/2)); and the NIST/SEMATECH e-Handbook table 1.3.6.7.4 (from memory):
 * χ²₀.₉₅(1) = 3.841, χ²₀.₉₅(5) = 11.070, χ²₀.₉₉(10) = 23.209.
 */
import erfc from '@stdlib/math-base-special-erfc';
import { describe, expect, it } from 'vitest';
import { chiSquareUpperQuantile, chiSquareUpperTail } from '../../../src/engine/distributions/chiSquare';

const relativeError = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('chi-square', () => {
  it.each([0.01, 1, 10, 100, 1000, 1300])('2 df: P(χ² > %s) = exp(−x/2) to 1e-12', (x) => {
    expect(relativeError(chiSquareUpperTail(x, 2), Math.exp(-x / 2))).toBeLessThan(1e-12);
  });

  it.each([0.01, 1, 4, 25, 400, 1200])('1 df: P(χ² > %s) = erfc(√(x/2)) to 1e-12', (x) => {
    expect(relativeError(chiSquareUpperTail(x, 1), erfc(Math.sqrt(x / 2)))).toBeLessThan(1e-12);
  });

  it.each([
    [0.05, 1, 3.841],
    [0.05, 5, 11.07],
    [0.01, 10, 23.209],
  ])('table: upper %s point with %s df is %s', (alpha, df, value) => {
    expect(chiSquareUpperQuantile(alpha, df)).toBeCloseTo(value, 3);
  });

  it('quantile and tail invert each other at ordinary levels', () => {
    for (const df of [1, 3, 10, 100]) {
      for (const alpha of [0.5, 0.1, 0.05, 0.01, 0.001]) {
        expect(relativeError(chiSquareUpperTail(chiSquareUpperQuantile(alpha, df), df), alpha)).toBeLessThan(1e-10);
      }
    }
  });

  it('handles the ends of its range', () => {
    expect(chiSquareUpperTail(0, 3)).toBe(1);
    expect(chiSquareUpperTail(Number.POSITIVE_INFINITY, 3)).toBe(0);
    expect(chiSquareUpperQuantile(0, 3)).toBe(Number.POSITIVE_INFINITY);
    expect(chiSquareUpperQuantile(1, 3)).toBe(0);
    expect(Number.isNaN(chiSquareUpperTail(Number.NaN, 3))).toBe(true);
  });
});
