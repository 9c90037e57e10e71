/**
 * One p-value rule for the pane, the cells' readings and the report: four decimals with trailing
 * zeros, "< 0.0001" below that (common practice, no source). The report writes p-values as numbers
 * under P_VALUE_FORMAT; here that format is rendered by the preview's model of Excel's number
 * formats (src/preview/ui/formatValue.ts, after Microsoft Support, "Review guidelines for
 * customizing a number format": conditions in square brackets, text in quotes) and must read
 * exactly as the text formatter writes the number.
 */
import { describe, expect, it } from 'vitest';
import { formatP, formatPValue, P_VALUE_FORMAT } from '../../src/presentation';
import { formatNumber as excelDisplay } from '../../src/preview/workbook/numberFormat';

const P_VALUES = [0, 1e-300, 3e-9, 0.00001, 0.0000999, 0.0001, 0.00012, 0.0004999, 0.001, 0.0123, 0.04999, 0.05, 0.3, 0.5, 0.98765, 0.99996, 1];

describe('p-values', () => {
  it('writes the sentence form: "p = 0.0123", "p < 0.0001", trailing zeros kept', () => {
    expect(formatP(0.0123)).toBe('p = 0.0123');
    expect(formatP(0.05)).toBe('p = 0.0500');
    expect(formatP(0.3)).toBe('p = 0.3000');
    expect(formatP(1)).toBe('p = 1.0000');
    expect(formatP(0.0001)).toBe('p = 0.0001');
    expect(formatP(0.0000999)).toBe('p < 0.0001');
    expect(formatP(0)).toBe('p < 0.0001');
    expect(formatP(Number.NaN)).toBe('p not defined');
  });

  it('is the Excel format the report writes', () => {
    expect(P_VALUE_FORMAT).toBe('[<0.0001]"<0.0001";0.0000');
  });

  it.each(P_VALUES)('%s: the cell under P_VALUE_FORMAT reads as the text formatter writes it', (p) => {
    expect(excelDisplay(p, P_VALUE_FORMAT)).toBe(formatPValue(p));
    expect(formatP(p)).toBe(formatPValue(p).startsWith('<') ? `p < ${formatPValue(p).slice(1)}` : `p = ${formatPValue(p)}`);
  });
});
