/**
 * Number display in the preview grid. The expectations follow the usual spreadsheet conventions
 * for General, fixed, percent and scientific formats (common practice, no source); sections,
 * quoted text and conditions follow Microsoft Support, "Review guidelines for customizing a
 * number format" (up to four sections, positive;negative;zero;text; text in double quotes or after
 * a backslash; a condition, a comparison operator and a value in square brackets, picks the
 * section; [Red]-style colours).
 */
import { describe, expect, it } from 'vitest';
import { formatNumber, formatValue, GENERAL_WIDTH } from '../../../src/preview/workbook/numberFormat';

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

  describe('sections, quoted text and conditions', () => {
    it('shows the p-value format as Excel does: the quoted text below the condition, four decimals above', () => {
      const format = '[<0.0001]"<0.0001";0.0000';
      expect(formatNumber(0.00003, format)).toBe('<0.0001');
      expect(formatNumber(0, format)).toBe('<0.0001');
      expect(formatNumber(0.0001, format)).toBe('0.0001');
      expect(formatNumber(0.0123, format)).toBe('0.0123');
      expect(formatNumber(1, format)).toBe('1.0000');
    });

    it('takes the first section whose condition holds, and the section without one for the rest', () => {
      const format = '[Red][<=100]0;[Blue][>100]0.0';
      expect(formatNumber(100, format)).toBe('100');
      expect(formatNumber(100.25, format)).toBe('100.3');
      expect(formatNumber(0.5, '[<1]"small";0.00')).toBe('small');
      expect(formatNumber(2.5, '[<1]"small";0.00')).toBe('2.50');
      expect(formatNumber(7, '[<=2]"low";[>=4]"high";"mid"')).toBe('high');
      expect(formatNumber(3, '[<=2]"low";[>=4]"high";"mid"')).toBe('mid');
    });

    it('positive;negative;zero sections, the negative one without a sign of its own', () => {
      expect(formatNumber(-2.5, '0.00;(0.00)')).toBe('(2.50)');
      expect(formatNumber(0, '0.00;(0.00);"zero"')).toBe('zero');
      expect(formatNumber(0, '0.00;(0.00)')).toBe('0.00');
      expect(formatNumber(-2.5, '0.00')).toBe('-2.50');
    });

    it('text in quotes or after a backslash, and plain characters, around the number', () => {
      expect(formatNumber(3.25, '0.0" h"')).toBe('3.3 h');
      expect(formatNumber(1234.5, '$#,##0.00')).toBe('$1,234.50');
      expect(formatNumber(12, '0\\x')).toBe('12x');
    });

    it('falls back to General for what it does not interpret, or what the page leaves open', () => {
      expect(formatNumber(0.5, 'mm/dd/yyyy')).toBe('0.5');
      expect(formatNumber(-2, '[>5]0;0.00')).toBe('-2');
      expect(formatNumber(7, '[<1]0.00')).toBe('7');
    });
  });
});
