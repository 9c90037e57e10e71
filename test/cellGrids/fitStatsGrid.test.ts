/**
 * FITSTATS rows: grouped by the question each answers (data used, noise, how much is explained,
 * the overall F test with both degrees of freedom, information criteria), with the R² rows marked
 * uncentered without an intercept. Values against NIST StRD Longley and NoInt1 (certified values,
 * read in place from ../shared/reference/strd).
 */
import { describe, expect, it } from 'vitest';
import { FIT_STATS_LABELS, fitStatsLabels, fitStatsRows } from '../../src/cellGrids/fitStatsGrid';
import { fitModel } from '../../src/engine';
import { lre, readStrd, strdAvailable } from '../support/strd';

describe('FITSTATS layout', () => {
  // Our own grouping (issue #14); the grouping is a design decision, so: common practice (no source)
  // for what belongs together.
  it('groups the rows by question: data, noise, explained, overall test, information criteria', () => {
    expect(FIT_STATS_LABELS).toEqual([
      'Rows used',
      'Rows skipped',
      'Parameters',
      'Sigma-hat',
      'Residual df',
      'RSS',
      'R²',
      'Adjusted R²',
      'F (all slopes zero)',
      'F numerator df',
      'F denominator df',
      'p-value of F',
      'Log-likelihood',
      'AIC',
      'BIC',
    ]);
  });

  // Without an intercept R² is 1 − RSS/Σy², measured from 0 (NIST StRD, NoInt1 and NoInt2 certify
  // it in this form), and F tests every coefficient, not just the slopes.
  it('labels R² and F as uncentered only when the intercept is off', () => {
    expect(fitStatsLabels(true)).toEqual([...FIT_STATS_LABELS]);
    const without = fitStatsLabels(false);
    expect(without[FIT_STATS_LABELS.indexOf('R²')]).toBe('R² (uncentered)');
    expect(without[FIT_STATS_LABELS.indexOf('Adjusted R²')]).toBe('Adjusted R² (uncentered)');
    expect(without[FIT_STATS_LABELS.indexOf('F (all slopes zero)')]).toBe('F (all coefficients zero)');
    expect(without.filter((label, i) => label !== FIT_STATS_LABELS[i])).toHaveLength(3);
  });

  it('reports the rows skipped as given and leaves the denominator df blank when σ is known', () => {
    // Invented numbers, only to exercise the layout; the values are checked against NIST below.
    const fit = fitModel({ y: [1, 3, 2, 5, 4, 6], x: [[1], [2], [3], [4], [5], [6]] }, { knownSigma: 0.5 });
    const stats = new Map(fitStatsRows(fit, 4).map(([label, value]) => [label, value]));
    expect(stats.get('Rows skipped')).toBe(4);
    expect(stats.get('F numerator df')).toBe(1);
    // With σ known the overall test is χ²/df: there is no residual df in its denominator.
    expect(stats.get('F denominator df')).toBe('');
    expect(stats.get('Residual df')).toBe(4);
  });
});

describe.skipIf(!strdAvailable())('FITSTATS values (source: NIST StRD)', () => {
  it('Longley: the certified R², F and both degrees of freedom of the ANOVA table', () => {
    const p = readStrd('Longley');
    const stats = new Map(fitStatsRows(fitModel({ y: p.y, x: p.x }), 0).map(([label, value]) => [label, value]));
    expect(stats.get('Rows used')).toBe(16);
    expect(stats.get('Parameters')).toBe(7);
    expect(stats.get('F numerator df')).toBe(p.certified.regression.df);
    expect(stats.get('F denominator df')).toBe(p.certified.residual.df);
    expect(stats.get('Residual df')).toBe(p.certified.residual.df);
    expect(lre(stats.get('Sigma-hat') as number, p.certified.residualSd)).toBeGreaterThanOrEqual(13);
    expect(lre(stats.get('R²') as number, p.certified.rSquared)).toBeGreaterThanOrEqual(13);
    expect(lre(stats.get('F (all slopes zero)') as number, p.certified.regression.f)).toBeGreaterThanOrEqual(10);
  });

  it('NoInt1 without an intercept: the certified uncentered R², under its own label', () => {
    const p = readStrd('NoInt1');
    const stats = new Map(fitStatsRows(fitModel({ y: p.y, x: p.x }, { intercept: false }), 0).map(([label, value]) => [label, value]));
    expect(stats.has('R²')).toBe(false);
    expect(lre(stats.get('R² (uncentered)') as number, p.certified.rSquared)).toBeGreaterThanOrEqual(11);
    expect(stats.get('F numerator df')).toBe(p.certified.regression.df);
    expect(stats.get('F denominator df')).toBe(p.certified.residual.df);
    expect(lre(stats.get('F (all coefficients zero)') as number, p.certified.regression.f)).toBeGreaterThanOrEqual(10);
  });
});
