/**
 * The fitted equation's text, from hand-made term tables: the numbers are invented and the rule
 * (about three significant digits of the standard error; aliased terms have no estimate) is the
 * project's own, common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import type { TermEstimate } from '../../src/engine';
import { equationGrid, fittedEquation } from '../../src/cellGrids/equationGrid';

const term = (name: string, estimate: number, standardError: number, aliased = false): TermEstimate => ({
  name,
  estimate,
  standardError,
  statistic: estimate / standardError,
  pValue: 0.5,
  ciLow: estimate - 2 * standardError,
  ciHigh: estimate + 2 * standardError,
  cvPercent: (100 * standardError) / Math.abs(estimate),
  aliased,
});

describe('fittedEquation', () => {
  it('rounds each coefficient by its own standard error', () => {
    const text = fittedEquation('Yield', { terms: [term('Intercept', 123.456, 14.2), term('Dose', 0.0012345, 0.0000456)] });
    expect(text).toBe('Fitted [Yield] = 123.46 + 0.0012345·[Dose]');
  });

  it('names aliased terms as left out instead of writing a coefficient the fit does not have', () => {
    const text = fittedEquation('Yield', { terms: [term('Intercept', 2, 0.5), term('A', 1.5, 0.1), term('B', Number.NaN, Number.NaN, true)] });
    expect(text).toBe('Fitted [Yield] = 2.000 + 1.500·[A] (aliased, left out: [B])');
  });

  it('writes a coefficient that rounds to zero without a minus sign', () => {
    expect(fittedEquation('y', { terms: [term('Intercept', 5, 0.2), term('x', -0.0004, 0.5)] })).toBe('Fitted [y] = 5.000 + 0.000·[x]');
  });

  it('is one cell for PLUMB.EQUATION', () => {
    expect(equationGrid('y', { terms: [term('x', 2, 0.1)] })).toEqual([['Fitted [y] = 2.000·[x]']]);
  });
});
