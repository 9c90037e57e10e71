/**
 * The Bonferroni outlier test. Sources (values in fixtures/checks.json, written by
 * scripts/reference/checks.R with R 4.2.2 and car 3.1.1): car::outlierTest (Cook & Weisberg 1982) on
 * lm(prestige ~ income + education, carData::Duncan), lm(dist ~ speed, cars), lm(mpg ~ wt + hp,
 * mtcars) and lm(stack.loss ~ ., stackloss), both from R's own rstudent() and from the engine's
 * residual diagnostics of the same data. car reports n·p uncapped; ours is capped at 1.
 */
import { describe, expect, it } from 'vitest';
import { checksFixture, relativeError } from '../../support/checksFixture';
import { residualDiagnostics } from '../../../src/engine';
import { outlierTest } from '../../../src/engine/infer/outlierTest';
import { gaussian, mulberry32 } from '../../support/random';

const fixture = checksFixture;

describe('outlierTest against car::outlierTest', () => {
  it.each(fixture.outlierTest.map((c) => [c.name, c] as const))('%s: row, t, p and Bonferroni p', (_, c) => {
    const n = c.y.length;
    const p = c.design[0].length;
    const fromR = outlierTest(c.studentized, n, p);
    const diagnostics = residualDiagnostics({ y: c.y, x: c.design.map((row) => row.slice(1)) });
    const fromEngine = outlierTest(
      diagnostics.rows.map((row) => row.studentized),
      diagnostics.n,
      diagnostics.p,
    );
    for (const result of [fromR, fromEngine]) {
      expect(result.undefinedBecause).toBeUndefined();
      expect(result.index).toBe(c.row - 1);
      expect(result.rowsTested).toBe(n);
      expect(relativeError(result.studentized, c.largest)).toBeLessThan(1e-10);
      expect(relativeError(result.pValue, c.p)).toBeLessThan(1e-9);
      expect(relativeError(result.bonferroniP, Math.min(1, c.bonferroni))).toBeLessThan(1e-9);
    }
  });
});

describe('outlierTest edge cases (common practice, no source)', () => {
  it('caps the Bonferroni p at 1, skips rows without a studentized residual and counts only the rest', () => {
    const result = outlierTest([0.1, Number.NaN, -0.3, 0.2], 10, 2);
    expect(result.index).toBe(2);
    expect(result.rowsTested).toBe(3);
    expect(result.bonferroniP).toBe(1);
    expect(result.pValue).toBeGreaterThan(0.5);
  });

  it('gives p = 0 for a row the others fit exactly, and reason codes without df or residuals', () => {
    expect(outlierTest([1, Number.NEGATIVE_INFINITY, 2], 10, 2)).toMatchObject({ index: 1, pValue: 0, bonferroniP: 0 });
    expect(outlierTest([1, 2, 3], 3, 2).undefinedBecause).toBe('no-deleted-df');
    expect(outlierTest([Number.NaN, Number.NaN], 10, 2).undefinedBecause).toBe('no-studentized');
  });
});

describe('outlierTest under the null (seeded simulation)', () => {
  // Bonferroni's bound makes the test conservative (Cook & Weisberg 1982): with independent normal
  // errors the rate of Bonferroni p < 0.05 is at most 0.05, here within 4 Monte Carlo standard
  // errors √(0.05·0.95/R) above it, and not far below it either (the rows' t are nearly independent).
  it.each([10, 20, 50])('rejects at no more than the nominal 5 percent at n = %i', (n) => {
    const replications = 2000;
    const normal = gaussian(mulberry32(800 + n));
    const x = Array.from({ length: n }, (_, i) => [i / n, Math.cos(i)]);
    let rejected = 0;
    for (let r = 0; r < replications; r++) {
      const data = { y: x.map(() => normal()), x };
      const studentized = residualDiagnostics(data).rows.map((row) => row.studentized);
      if (outlierTest(studentized, n, 3).bonferroniP < 0.05) rejected++;
    }
    const rate = rejected / replications;
    const se = Math.sqrt((0.05 * 0.95) / replications);
    expect(rate).toBeLessThan(0.05 + 4 * se);
    expect(rate).toBeGreaterThan(0.025);
  });
});
