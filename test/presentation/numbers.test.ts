/**
 * Numbers in sentences: three significant digits with significant trailing zeros kept (1.50, not
 * 1.5), counts with thousands separators, levels as percentages (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { formatCount, formatFixed, formatLevel, formatNumber, formatShare, formatSigned } from '../../src/presentation';

describe('formatNumber', () => {
  it.each([
    [1.5, '1.50'],
    [2, '2.00'],
    [0.012, '0.0120'],
    [0.0001, '0.000100'],
    [12.04, '12.0'],
    [-0.25, '-0.250'],
    [9.996, '10.0'],
    [123.4, '123'],
    [12345, '12300'],
    [999.7, '1000'],
    [0, '0'],
    [1e6, '1.00e+6'],
    [-3.2e-7, '-3.20e-7'],
  ])('shows %s as %s', (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });

  it('names what is not a number rather than printing NaN', () => {
    expect(formatNumber(Number.NaN)).toBe('not defined');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('∞');
  });

  it('signs a positive size so that it reads in the direction of its interval', () => {
    expect(formatSigned(1.5)).toBe('+1.50');
    expect(formatSigned(-1.5)).toBe('-1.50');
    expect(formatSigned(0)).toBe('0');
  });
});

describe('the other formats', () => {
  it('fixed decimals keep trailing zeros and never show a negative zero', () => {
    expect(formatFixed(3.2, 2)).toBe('3.20');
    expect(formatFixed(-0.001, 2)).toBe('0.00');
    expect(formatFixed(Number.POSITIVE_INFINITY, 1)).toBe('∞');
  });

  it('a share near 1 keeps the digits that tell it from 1: three significant digits of 1 − share', () => {
    expect(formatShare(0.99995)).toBe('0.9999500');
    expect(formatShare(1)).toBe('1.00');
    expect(formatShare(0.5)).toBe('0.500');
  });

  it('counts and levels', () => {
    expect(formatCount(1048576)).toBe('1,048,576');
    expect(formatLevel(0.95)).toBe('95%');
    expect(formatLevel(0.999999)).toBe('99.9999%');
  });
});
