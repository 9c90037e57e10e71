/**
 * Lack of fit against pure error. Sources (values in fixtures/checks.json, written by
 * scripts/reference/checks.R with R 4.2.2): anova(lm(y ~ X), lm(y ~ cell)) with one cell per
 * distinct row of the model matrix (NIST/SEMATECH e-Handbook §4.4.4.3; Draper & Smith 1998 §2.1) on
 * lm(dist ~ speed, cars), lm(weight ~ Time, ChickWeight), lm(breaks ~ wool + tension, warpbreaks)
 * (two factors, six settings) and lm(mpg ~ cyl, mtcars); identities that are common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { checksFixture, relativeError } from '../../support/checksFixture';
import { fitModel } from '../../../src/engine';
import { lackOfFit } from '../../../src/engine/infer/lackOfFit';
import { gaussian, mulberry32 } from '../../support/random';

const fixture = checksFixture;

describe('lackOfFit against anova() in R', () => {
  it.each(fixture.lackOfFit.map((c) => [c.name, c] as const))('%s: sums of squares, df, F and p', (_, c) => {
    const data = { y: c.y, x: c.design.map((row) => row.slice(1)) };
    const fit = fitModel(data);
    const result = lackOfFit(data, fit.rss, fit.rank);
    expect(result.undefinedBecause).toBeUndefined();
    expect(result.settings).toBe(c.settings);
    expect(result.lackDf).toBe(c.lackDf);
    expect(result.pureDf).toBe(c.pureDf);
    expect(relativeError(result.pureSs, c.pureSs)).toBeLessThan(1e-12);
    expect(relativeError(result.lackSs, c.lackSs)).toBeLessThan(1e-10);
    expect(relativeError(result.f, c.f)).toBeLessThan(1e-10);
    expect(relativeError(result.pValue, c.p)).toBeLessThan(1e-9);
  });
});

describe('lackOfFit reason codes and weights (common practice, no source)', () => {
  it('needs repeated settings, more settings than parameters and some spread within them', () => {
    const distinct = { y: [1, 2, 4, 3], x: [[1], [2], [3], [4]] };
    expect(lackOfFit(distinct, 1, 2).undefinedBecause).toBe('no-replicates');
    const twoSettings = { y: [1, 2, 4, 3], x: [[1], [1], [2], [2]] };
    expect(lackOfFit(twoSettings, 1, 2)).toMatchObject({ undefinedBecause: 'no-lack-df', settings: 2, lackDf: 0, pureDf: 2 });
    const agreeing = { y: [1, 1, 5, 5, 2], x: [[1], [1], [2], [2], [3]] };
    expect(lackOfFit(agreeing, 4, 2).undefinedBecause).toBe('replicates-agree');
  });

  it('with weights w takes pure error about weighted means, equal to repeating rows w times', () => {
    const x = [[0], [0], [1], [2], [2], [3]];
    const y = [1.0, 1.6, 2.1, 3.9, 3.0, 4.2];
    const weights = [2, 1, 1, 3, 1, 1];
    const weighted = { y, x, weights };
    const repeated = { y: y.flatMap((v, i) => Array<number>(weights[i]).fill(v)), x: x.flatMap((row, i) => Array<number[]>(weights[i]).fill(row)) };
    const a = lackOfFit(weighted, fitModel(weighted).rss, 2);
    const b = lackOfFit(repeated, fitModel(repeated).rss, 2);
    expect(relativeError(a.pureSs, b.pureSs)).toBeLessThan(1e-12);
    expect(relativeError(a.lackSs, b.lackSs)).toBeLessThan(1e-10);
    expect(a.settings).toBe(b.settings);
  });
});

describe('lackOfFit under the null (seeded simulation)', () => {
  // A straight line through replicated settings with independent normal errors: F is exactly
  // F(df_lack, df_pure) (Draper & Smith 1998 §2.1), so the rate of p < 0.05 over R replications lies
  // within 4 standard errors √(0.05·0.95/R) of 0.05.
  it.each([10, 20, 50])('rejects at the nominal 5 percent within Monte Carlo error at n = %i', (n) => {
    const replications = 2000;
    const normal = gaussian(mulberry32(700 + n));
    const x = Array.from({ length: n }, (_, i) => [i % Math.floor(n / 2)]);
    let rejected = 0;
    for (let r = 0; r < replications; r++) {
      const data = { y: x.map(([v]) => 1 + 0.5 * v + normal()), x };
      if (lackOfFit(data, fitModel(data).rss, 2).pValue < 0.05) rejected++;
    }
    expect(Math.abs(rejected / replications - 0.05)).toBeLessThan(4 * Math.sqrt((0.05 * 0.95) / replications));
  });
});
