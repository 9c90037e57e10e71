/**
 * The outlier test's reading (Bonferroni, Cook & Weisberg 1982): the row by the number given, its
 * adjusted p, and the caution that such a row can cause the other signals (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { type AssumptionChecks, assumptionChecks } from '../../src/engine';
import { outlierReading } from '../../src/presentation';
import { gaussian, mulberry32 } from '../support/random';

type OutlierCheck = AssumptionChecks['outlierTest'];

function test(change: Partial<OutlierCheck>): OutlierCheck {
  return { index: 4, row: 6, studentized: 2.1, pValue: 0.04, bonferroniP: 1, rowsTested: 30, undefinedBecause: undefined, verdict: 'none', ...change };
}

describe('outlier reading', () => {
  it('names a response typed far off by the row number given, with its Bonferroni p', () => {
    const normal = gaussian(mulberry32(44));
    const x = Array.from({ length: 60 }, (_, i) => [1 + (i % 12) / 2]);
    const y = x.map(([v]) => 3 + 2 * v + 0.3 * normal());
    y[23] += 25;
    const checks = assumptionChecks(
      { y, x },
      undefined,
      x.map((_, i) => i + 5),
    );
    expect(outlierReading(checks.outlierTest)).toMatch(
      /^row 28 is an outlier \(studentized residual \d+\.\d, Bonferroni p < 0\.0001\): check its data first, since such a row can cause the other signals$/,
    );
  });

  it('reads every verdict', () => {
    expect(outlierReading(test({}))).toBe('no row is an outlier: the most extreme, row 6, has Bonferroni p = 1.0000');
    expect(outlierReading(test({ studentized: Number.POSITIVE_INFINITY, bonferroniP: 0, verdict: 'outlier' }))).toBe(
      'row 6 is an outlier (the other rows fit it exactly, Bonferroni p < 0.0001): check its data first, since such a row can cause the other signals',
    );
    expect(outlierReading(test({ verdict: 'no-deleted-df' }))).toMatch(/^rows = parameters \+ 1: .*no studentized residual exists$/);
    expect(outlierReading(test({ verdict: 'no-studentized' }))).toBe('no row has a studentized residual: every row has leverage 1');
    expect(outlierReading(test({ verdict: 'exact-fit' }))).toMatch(/^exact fit/);
  });
});
