/**
 * The reports' rounding rule: about three significant digits of the standard error, between 2
 * and 10 decimals (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { decimalsFor, fixedFormat } from '../../src/presentation';

describe('decimalsFor', () => {
  it.each([
    [0.0123, 4],
    [0.123, 3],
    [1.5, 2],
    [150, 2],
    [1e-12, 10],
    [0, 4],
    [Number.NaN, 4],
  ])('a standard error of %s gets %s decimals', (standardError, decimals) => {
    expect(decimalsFor(standardError)).toBe(decimals);
  });

  it('writes the number format for that many decimals', () => {
    expect(fixedFormat(3)).toBe('0.000');
    expect(fixedFormat(0)).toBe('0');
  });
});
