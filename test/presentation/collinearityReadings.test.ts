/**
 * Condition-number bands after Belsley, Kuh & Welsch (Regression Diagnostics, 1980): from about
 * 30 moderate to strong, from about 100 serious (from memory); below 10 no sign of harm.
 */
import { describe, expect, it } from 'vitest';
import { COLLINEARITY_REASON_TEXT, conditionReading } from '../../src/presentation';

describe('conditionReading', () => {
  it.each([
    [1, 'no sign of harmful collinearity'],
    [9.99, 'no sign of harmful collinearity'],
    [10, 'mild dependence among the columns'],
    [30, 'moderate to strong collinearity: see which terms have large VIFs'],
    [99.9, 'moderate to strong collinearity: see which terms have large VIFs'],
    [100, 'serious collinearity: individual estimates are unreliable'],
    [Number.POSITIVE_INFINITY, 'infinite: some terms are exact combinations of others'],
    [Number.NaN, 'not defined'],
  ])('reads %s as "%s"', (conditionNumber, reading) => {
    expect(conditionReading(conditionNumber)).toBe(reading);
  });

  it('says why a term has no VIF, for every reason the engine gives', () => {
    expect(COLLINEARITY_REASON_TEXT.constant).toBe('constant: the column does not vary');
    expect(COLLINEARITY_REASON_TEXT.collinear).toBe('perfectly collinear: an exact combination of the other terms');
    expect(COLLINEARITY_REASON_TEXT['spans-intercept']).toMatch(/standing in for the intercept: no centered VIF$/);
  });
});
