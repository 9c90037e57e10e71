/**
 * The reports' rounding rule: about three significant digits of the standard error, between 2
 * and 10 decimals (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { decimalsFor, fixedFormat, formatDecimals } from '../../src/presentation';

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

  // Common practice (no source): a value that rounds to zero carries no sign, and text to be read
  // uses the minus sign (U+2212), as the fitted equation and the summary to copy do.
  it('rounds to the decimals, keeps trailing zeros and signs only what is not zero', () => {
    expect(formatDecimals(-0.0043312, 5)).toBe('−0.00433');
    expect(formatDecimals(1.5, 2)).toBe('1.50');
    expect(formatDecimals(-0.001, 2)).toBe('0.00');
  });
});
