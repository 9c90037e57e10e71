/**
 * Number display in the preview grid. The expectations follow the usual spreadsheet conventions
 * for General, fixed, percent and scientific formats (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { formatNumber, formatValue, GENERAL_WIDTH } from '../../../src/preview/ui/formatValue';

describe('formatValue', () => {
  it.each([
    [0, '0'],
    [60, '60'],
    [13.58008274, '13.58008274'],
    [0.4565044412, '0.456504441'],
    [-0.004081612, '-0.00408161'],
    [8.0133e-21, '8.0133E-21'],
    [123456789012, '1.23457E+11'],
  ])('General shows %s as %s', (value, text) => {
    expect(formatNumber(value, 'General')).toBe(text);
    expect(text.length).toBeLessThanOrEqual(GENERAL_WIDTH);
  });

  it('applies fixed, percent and scientific formats', () => {
    expect(formatNumber(15.0812, '0.00')).toBe('15.08');
    expect(formatNumber(0.0423, '0.0%')).toBe('4.2%');
    expect(formatNumber(0.000123, '0.00E+00')).toBe('1.23E-04');
  });

  it('shows errors by code, booleans in capitals and blanks as nothing', () => {
    expect(formatValue({ error: '#VALUE!', message: 'x' }, 'General')).toBe('#VALUE!');
    expect(formatValue(true, 'General')).toBe('TRUE');
    expect(formatValue(null, 'General')).toBe('');
  });
});
