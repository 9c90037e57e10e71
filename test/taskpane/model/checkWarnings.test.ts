/**
 * Which failed checks the pane puts into words, on data built to fail one check each: a spread
 * that grows with x (Breusch–Pagan), and a trend left in row order (Durbin–Watson). Thresholds are
 * the usual ones: p below 1 − level (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { assumptionChecks } from '../../../src/engine';
import { checkWarnings } from '../../../src/taskpane/model/checkWarnings';
import { gaussian, mulberry32 } from '../../support/random';

describe('checkWarnings', () => {
  const normal = gaussian(mulberry32(17));
  const x = Array.from({ length: 200 }, (_, i) => [1 + (i % 50) / 5]);
  const rows = x.map((_, i) => i + 2);

  it('offers robust standard errors when the spread grows with the predictor', () => {
    const y = x.map(([v]) => 2 + 3 * v + v * v * normal());
    const warnings = checkWarnings(assumptionChecks({ y, x }), rows);
    const spread = warnings.find((w) => w.suggestsRobust);
    expect(spread?.text).toMatch(/^Residual spread changes with the predictors \(Breusch–Pagan p/);
  });

  it('says nothing about spread when the noise is even', () => {
    const y = x.map(([v]) => 2 + 3 * v + normal());
    expect(checkWarnings(assumptionChecks({ y, x }), rows).some((w) => w.suggestsRobust)).toBe(false);
  });

  it('names related neighbouring residuals when a slow wave is left in row order', () => {
    const y = x.map(([v], i) => 2 + 3 * v + 3 * Math.sin(i / 10) + 0.2 * normal());
    expect(checkWarnings(assumptionChecks({ y, x }), rows).map((w) => w.text).join(' ')).toContain('Durbin–Watson');
  });
});
