/**
 * The normality readings, from the engine's verdicts: Shapiro–Wilk decides for 3 to 5000 rows
 * (Royston 1995's range), Jarque–Bera above, and is shown for information below. The cut-offs that
 * name a shape (|skewness| from 0.5, kurtosis outside 2.5–3.5) are our own (no source).
 */
import { describe, expect, it } from 'vitest';
import { type AssumptionChecks, assumptionChecks } from '../../src/engine';
import { jarqueBeraReading, shapiroWilkReading } from '../../src/presentation';
import { mulberry32, randomProblem } from '../support/random';

type JarqueBeraCheck = AssumptionChecks['jarqueBera'];
type ShapiroWilkCheck = AssumptionChecks['shapiroWilk'];

function jb(change: Partial<JarqueBeraCheck>): JarqueBeraCheck {
  return { statistic: 20, skewness: 0, kurtosis: 3, pValue: 0.002, undefinedBecause: undefined, verdict: 'non-normal', ...change };
}

/** Only the two fields the normality readings read. */
function withNormality(shapiro: Partial<ShapiroWilkCheck>, jarque: Partial<JarqueBeraCheck> = {}): AssumptionChecks {
  const checks = assumptionChecks(randomProblem(55, 40, 1));
  return {
    ...checks,
    shapiroWilk: { statistic: 0.9, pValue: 0.002, n: 40, undefinedBecause: undefined, verdict: 'non-normal', ...shapiro },
    jarqueBera: jb(jarque),
  };
}

describe('Shapiro–Wilk reading', () => {
  it('describes skewed (exponential) noise; normal noise looks roughly normal', () => {
    const uniform = mulberry32(53);
    const { x } = randomProblem(54, 300, 1);
    expect(shapiroWilkReading(assumptionChecks({ y: x.map(([v]) => 1 + v - Math.log(uniform())), x }))).toMatch(
      /^residuals depart from a normal shape \(p < 0\.0001\): a long right tail/,
    );
    expect(shapiroWilkReading(assumptionChecks(randomProblem(55, 300, 1)))).toMatch(/^residuals look roughly normal \(p = 0\.\d{4}\)$/);
  });

  it('names the way the shape departs only past the cut-offs, from the residuals’ skewness and kurtosis', () => {
    expect(shapiroWilkReading(withNormality({}, { skewness: -0.6 }))).toBe(
      'residuals depart from a normal shape (p = 0.0020): a long left tail; intervals rely on normality most when rows are few',
    );
    expect(shapiroWilkReading(withNormality({}, { skewness: 0.4, kurtosis: 2.4 }))).toMatch(/\(p = 0\.0020\): fewer extreme residuals than a normal shape;/);
    expect(shapiroWilkReading(withNormality({}, { skewness: 0.4, kurtosis: 3.4 }))).toBe(
      'residuals depart from a normal shape (p = 0.0020); intervals rely on normality most when rows are few',
    );
  });

  it('says why it was not computed', () => {
    expect(shapiroWilkReading(withNormality({ verdict: 'too-many' }))).toBe(
      'more than 5000 rows, beyond the range of Royston’s Shapiro–Wilk: Jarque–Bera tests the shape (below)',
    );
    expect(shapiroWilkReading(withNormality({ verdict: 'too-few' }))).toBe('fewer than 3 rows: too few to test the shape of the residuals');
    expect(shapiroWilkReading(withNormality({ verdict: 'constant' }))).toBe('every residual is the same: no shape to test');
    const line = [[1], [2], [3], [4], [6], [7]];
    expect(shapiroWilkReading(assumptionChecks({ y: line.map(([v]) => 2 + 0.5 * v), x: line }))).toMatch(/^exact fit/);
  });
});

describe('Jarque–Bera reading', () => {
  it('up to 5000 rows it is shown for information and says Shapiro–Wilk decides', () => {
    expect(jarqueBeraReading(assumptionChecks(randomProblem(55, 300, 1)).jarqueBera)).toBe(
      'for information: up to 5000 rows the shape is tested by Shapiro–Wilk (above)',
    );
  });

  it('above 5000 rows it decides, and names the shape past the cut-offs', () => {
    expect(jarqueBeraReading(jb({ skewness: 0.8, kurtosis: 4 }))).toBe(
      'residuals depart from a normal shape (p = 0.0020): a long right tail and more extreme residuals than a normal shape; intervals rely on normality most when rows are few',
    );
    expect(jarqueBeraReading(jb({ pValue: 0.4, verdict: 'none' }))).toBe('residuals look roughly normal (p = 0.4000)');
  });
});
