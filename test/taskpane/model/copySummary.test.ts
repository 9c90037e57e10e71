/**
 * The summary to copy. Data: x = 1…5, y = 2, 4, 5, 4, 5, fitted by hand (common practice (no
 * source)): Sxx = 10, Sxy = 6, slope 0.6, intercept 2.2; residuals −0.8, 0.6, 1.0, −0.6, −0.2, so
 * RSS = 2.4, σ̂² = 0.8, σ̂ = 0.894; SE(slope) = √(0.8/10) = 0.2828, SE(intercept) =
 * √(0.8·(1/5 + 9/10)) = 0.9381; SST = 6, R² = 0.6. Each number is shown to about three significant
 * digits of its standard error (2 − ⌊log₁₀ SE⌋ decimals: 3 for both here).
 */
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../../src/engine';
import { copySummary } from '../../../src/taskpane/model/copySummary';

const data = { y: [2, 4, 5, 4, 5], x: [[1], [2], [3], [4], [5]], names: ['Dose (mg)'] };

describe('copySummary', () => {
  it('gives the fitted equation, each estimate ± its standard error, and the fit’s size and spread', () => {
    const lines = copySummary('Response', fitModel(data)).split('\n');
    expect(lines).toEqual([
      'Fitted [Response] = 2.200 + 0.600·[Dose (mg)]',
      '',
      'Term       Estimate ± standard error',
      'Intercept  2.200 ± 0.938',
      'Dose (mg)  0.600 ± 0.283',
      '',
      '5 rows; R² = 0.600; σ̂ = 0.894; standard errors classical.',
    ]);
  });

  it('writes a negative estimate with a minus sign and names robust standard errors', () => {
    const falling = { ...data, y: data.y.map((v) => -v) };
    const text = copySummary('Response', fitModel(falling, { covariance: 'HC3' }));
    expect(text).toContain('Dose (mg)  −0.600 ± ');
    expect(text).toContain('standard errors robust (HC3).');
  });

  it('labels R² without an intercept as uncentered and never rounds it to a bare 1', () => {
    // y ≈ 2x through the origin, by hand: Σxy = 109.97, Σx² = 55, Σy² = 219.881, RSS = Σy² − (Σxy)²/Σx²
    // = 0.000984, uncentered R² = 1 − RSS/Σy² = 0.99999553; rounded to three digits it would read 1.00.
    const nearlyProportional = { y: [2.01, 3.99, 6.02, 7.98, 10], x: [[1], [2], [3], [4], [5]] };
    const text = copySummary('Response', fitModel(nearlyProportional, { intercept: false }));
    expect(text).toContain('uncentered R² (no intercept) = 0.99999553;');
  });

  it('says which term is aliased rather than give it a number', () => {
    const doubled = { y: data.y, x: data.x.map(([v]) => [v, 2 * v]), names: ['Dose (mg)', 'Twice the dose'] };
    const text = copySummary('Response', fitModel(doubled));
    expect(text).toMatch(/Twice the dose +aliased, not estimated/);
  });
});
