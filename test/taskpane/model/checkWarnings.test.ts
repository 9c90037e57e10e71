/**
 * Which failed checks the pane puts into words, on data built to fail one check each: a spread
 * that grows with x (Breusch–Pagan), a trend left in row order (Durbin–Watson), skewed noise
 * (Shapiro–Wilk), a curve fitted by a line through repeated settings (lack of fit) and a response
 * typed far off (the Bonferroni outlier test). The verdicts are CHECKS' own. Thresholds are the
 * usual ones: p below 1 − level (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { assumptionChecks, buildModelFrame } from '../../../src/engine';
import { checkWarnings } from '../../../src/taskpane/model/checkWarnings';
import { gaussian, mulberry32 } from '../../support/random';

describe('checkWarnings', () => {
  const normal = gaussian(mulberry32(17));
  const x = Array.from({ length: 200 }, (_, i) => [1 + (i % 50) / 5]);
  const rows = x.map((_, i) => i + 2);

  it('offers robust standard errors when the spread grows with the predictor', () => {
    const y = x.map(([v]) => 2 + 3 * v + v * v * normal());
    const warnings = checkWarnings(assumptionChecks({ y, x }));
    const spread = warnings.find((w) => w.suggestsRobust);
    expect(spread?.text).toMatch(/^Residual spread changes with the predictors \(Breusch–Pagan p/);
  });

  it('says nothing about spread when the noise is even', () => {
    const y = x.map(([v]) => 2 + 3 * v + normal());
    expect(checkWarnings(assumptionChecks({ y, x })).some((w) => w.suggestsRobust)).toBe(false);
  });

  it('names related neighbouring residuals when a slow wave is left in row order', () => {
    const y = x.map(([v], i) => 2 + 3 * v + 3 * Math.sin(i / 10) + 0.2 * normal());
    const text = checkWarnings(assumptionChecks({ y, x }))
      .map((w) => w.text)
      .join(' ');
    // The exact two-sided p in CHECKS' format, as in its "DW p-value (two-sided)" row and reading.
    expect(text).toMatch(/Durbin–Watson d = \d\.\d\d, exact two-sided p (< 0\.0001|= 0\.\d{4})\)/);
  });

  // A response typed far off (Cook & Weisberg 1982: one row can distort every residual check; common
  // practice, no source): the pane names that worksheet row before any other warning.
  it('names an outlying row first, by worksheet row, with the note that it can cause the other signals', () => {
    const y = x.map(([v]) => 2 + 3 * v + 0.3 * normal());
    y[40] += 30;
    const warnings = checkWarnings(assumptionChecks({ y, x }, undefined, rows));
    expect(warnings[0].text).toMatch(
      /^Row 42 \(studentized residual \d+\.\d, Bonferroni p < 0\.0001.*\) stands out: check its data first, since such a row can cause the other signals\.$/,
    );
    expect(warnings.filter((w) => w.text.includes('Row 42'))).toHaveLength(1);
  });

  // Without an intercept but with every level of a category, the model is the one with an
  // intercept, and a predictor's standard error is unchanged: its centered VIF, not the
  // uncentered one inflated by its distance from 0, says whether it is inflated (Belsley, Kuh &
  // Welsch 1980, from memory).
  it('does not call a standard error inflated on the uncentered VIF of a no-intercept model', () => {
    const grid: (string | number)[][] = [['Yield', 'Grind', 'Origin']];
    for (let i = 0; i < 30; i++) grid.push([20 + 0.02 * (i % 7) + normal(), 400 + 3 * (i % 5) + normal(), ['North', 'South', 'East'][i % 3]]);
    const frame = buildModelFrame({ y: grid.map((r) => [r[0]]), x: [grid.map((r) => r.slice(1))], intercept: false });
    const checks = assumptionChecks(frame.data, { intercept: false }, frame.usedRows);
    expect(checks.largestVif).toBeLessThan(2);
    expect(checkWarnings(checks).some((w) => /VIF/.test(w.text))).toBe(false);
  });

  it('names a non-normal shape on Shapiro–Wilk, as CHECKS decides it up to 5000 rows', () => {
    const uniform = mulberry32(18);
    const y = x.map(([v]) => 2 + 3 * v - Math.log(uniform()));
    const checks = assumptionChecks({ y, x });
    expect(checks.shapiroWilk.verdict).toBe('non-normal');
    expect(checkWarnings(checks).map((w) => w.text)).toContain(
      `Residuals depart from a normal shape (Shapiro–Wilk ${checks.shapiroWilk.pValue < 1e-4 ? 'p < 0.0001' : `p = ${checks.shapiroWilk.pValue.toFixed(4)}`}): read intervals with care, most of all with few rows.`,
    );
  });

  it('names lack of fit when a line misses the means of repeated settings; nothing when it does not', () => {
    // Every setting of x appears four times (i % 50), so pure error exists.
    const curved = checkWarnings(assumptionChecks({ y: x.map(([v]) => 2 + v * v + 0.3 * normal()), x }));
    expect(curved.map((w) => w.text)).toContainEqual(
      expect.stringMatching(/^The model misses the means of rows that repeat the same predictor values .*\(lack of fit p [<=] 0\.\d{4}\)/),
    );
    const straight = checkWarnings(assumptionChecks({ y: x.map(([v]) => 2 + 3 * v + normal()), x }));
    expect(straight.some((w) => /lack of fit/.test(w.text))).toBe(false);
  });
});
