/**
 * Heteroscedasticity-consistent covariance. Source: the sandwich formulas themselves, HC0 of
 * White (1980), HC1 = HC0·n/(n − p), HC3 of MacKinnon & White (1985), evaluated directly by an
 * independent oracle built with ml-matrix (npm, general-purpose linear algebra) that forms
 * (XᵀX)⁻¹, the hat diagonal and the meat Xᵀdiag(ω)X explicitly. Forming XᵀX loses nothing at the
 * 1e-9 level on these well-conditioned designs. Other expectations are common practice (no source)
 * and say so. No published example is used: I could not vouch for any published digits.
 */
import { Matrix, inverse } from 'ml-matrix';
import { beforeEach, describe, expect, it } from 'vitest';
import { type CovarianceKind, fitModel, modelCache } from '../../../src/engine';
import { gaussian, mulberry32, randomProblem } from '../../support/random';

type Robust = Exclude<CovarianceKind, 'classical'>;

/** The sandwich on the √w-scaled problem, straight from its definition. */
function sandwich(xData: number[][], y: number[], kind: Robust, w?: number[]): Matrix {
  const root = (i: number) => Math.sqrt(w?.[i] ?? 1);
  const x = new Matrix(xData.map((row, i) => [1, ...row].map((v) => v * root(i))));
  const yw = Matrix.columnVector(y.map((v, i) => v * root(i)));
  const n = x.rows;
  const p = x.columns;
  const bread = inverse(x.transpose().mmul(x));
  const e = yw
    .clone()
    .sub(x.mmul(bread.mmul(x.transpose()).mmul(yw)))
    .to1DArray();
  const meat = Matrix.zeros(p, p);
  for (let i = 0; i < n; i++) {
    const xi = x.getRowVector(i);
    const h = xi.mmul(bread).mmul(xi.transpose()).get(0, 0);
    const omega = kind === 'HC3' ? e[i] ** 2 / (1 - h) ** 2 : kind === 'HC1' ? (e[i] ** 2 * n) / (n - p) : e[i] ** 2;
    meat.add(xi.transpose().mmul(xi).mul(omega));
  }
  return bread.mmul(meat).mmul(bread);
}

/** y whose noise grows with |x1|, so robust and classical SEs really differ. */
function heteroscedastic(seed: number, n: number, p: number): { y: number[]; x: number[][]; w: number[] } {
  const { y, x } = randomProblem(seed, n, p);
  const normal = gaussian(mulberry32(seed + 1000));
  const uniform = mulberry32(seed + 2000);
  return {
    y: y.map((v, i) => v + 3 * Math.abs(x[i][0]) * normal()),
    x,
    w: y.map(() => 0.2 + 3 * uniform()),
  };
}

function expectCovarianceClose(actual: number[][], expected: Matrix): void {
  actual.forEach((row, a) =>
    row.forEach((v, b) => {
      const scale = Math.sqrt(expected.get(a, a) * expected.get(b, b));
      expect(Math.abs(v - expected.get(a, b))).toBeLessThan(1e-9 * scale);
    }),
  );
}

beforeEach(() => modelCache.reset());

describe('robust covariance against the sandwich formula', () => {
  it.each([
    ['HC0', 11, 40, 1],
    ['HC1', 12, 60, 3],
    ['HC3', 13, 200, 6],
    ['HC3', 14, 25, 4],
  ] as const)('%s, seed %i, n = %i, p = %i: unweighted and weighted agree to 1e-9', (kind, seed, n, p) => {
    const { y, x, w } = heteroscedastic(seed, n, p);
    for (const weights of [undefined, w]) {
      const fit = fitModel({ y, x, weights }, { covariance: kind });
      const expected = sandwich(x, y, kind, weights);
      expect(fit.covarianceKind).toBe(kind);
      expectCovarianceClose(fit.covariance, expected);
      fit.terms.forEach((t, j) => {
        expect(Math.abs(t.standardError - Math.sqrt(expected.get(j, j)))).toBeLessThan(1e-9 * Math.sqrt(expected.get(j, j)));
      });
    }
  });

  it('HC1 is HC0 scaled by n/(n − p), and HC3 is at least HC0 on the diagonal (common practice)', () => {
    const { y, x } = heteroscedastic(21, 30, 3);
    const hc0 = fitModel({ y, x }, { covariance: 'HC0' });
    const hc1 = fitModel({ y, x }, { covariance: 'HC1' });
    const hc3 = fitModel({ y, x }, { covariance: 'HC3' });
    hc0.covariance.forEach((row, a) => row.forEach((v, b) => expect(hc1.covariance[a][b]).toBeCloseTo((v * 30) / 26, 12)));
    hc0.terms.forEach((t, j) => expect(hc3.terms[j].standardError).toBeGreaterThanOrEqual(t.standardError));
  });

  it('agrees with the classical SEs on a large homoscedastic sample, within 5 % (common practice)', () => {
    // Both estimate the same variance when the noise is constant; with n = 5000 the ratio's
    // sampling spread is about 2 %, so 5 % fails only if one of them is wrong.
    const { y, x } = randomProblem(31, 5000, 3);
    const classical = fitModel({ y, x });
    const robust = fitModel({ y, x }, { covariance: 'HC3' });
    classical.terms.forEach((t, j) => expect(Math.abs(robust.terms[j].standardError / t.standardError - 1)).toBeLessThan(0.05));
  });

  it('moves only the SEs: estimates, F and the likelihood stay those of the classical fit', () => {
    const { y, x } = heteroscedastic(41, 50, 2);
    const classical = fitModel({ y, x });
    const robust = fitModel({ y, x }, { covariance: 'HC3' });
    expect(robust.terms.map((t) => t.estimate)).toEqual(classical.terms.map((t) => t.estimate));
    expect([robust.fStatistic, robust.aic, robust.sigma]).toEqual([classical.fStatistic, classical.aic, classical.sigma]);
    expect(robust.terms[1].standardError).not.toBeCloseTo(classical.terms[1].standardError, 3);
  });
});

describe('robust covariance: settings and edge cases', () => {
  it('ignores a known σ and refers the statistics to t on the residual df', () => {
    const { y, x } = heteroscedastic(51, 40, 2);
    const known = fitModel({ y, x }, { covariance: 'HC3', knownSigma: 7 });
    const estimated = fitModel({ y, x }, { covariance: 'HC3' });
    expect(known.statisticKind).toBe('t');
    expect(known.terms).toEqual(estimated.terms);
    // F keeps the classical rule: with σ known it is referred to χ².
    expect(known.fDf[1]).toBe(Number.POSITIVE_INFINITY);
  });

  it('is a separate cache entry from the classical fit of the same data', () => {
    const { y, x } = heteroscedastic(61, 30, 2);
    fitModel({ y, x });
    fitModel({ y, x }, { covariance: 'HC3' });
    fitModel({ y, x }, { covariance: 'HC0' });
    fitModel({ y, x }, { covariance: 'HC3' });
    expect(modelCache.stats()).toMatchObject({ fits: 3, hits: 1 });
  });

  it('leaves aliased terms NaN and the others equal to the fit without the aliased column', () => {
    const { y, x } = heteroscedastic(71, 30, 2);
    const withCopy = fitModel({ y, x: x.map((r) => [...r, 2 * r[0]]) }, { covariance: 'HC3' });
    const plain = fitModel({ y, x }, { covariance: 'HC3' });
    expect(withCopy.terms[3].aliased).toBe(true);
    expect(withCopy.covariance[3].every(Number.isNaN)).toBe(true);
    plain.terms.forEach((t, j) => expect(withCopy.terms[j].standardError).toBeCloseTo(t.standardError, 12));
  });

  it('HC3 with a leverage-one row: the terms it determines are NaN with a reason, the rest exact', () => {
    // An indicator of one row gives that row leverage 1; the other terms' HC3 covariance is then
    // that of the data without the row and the indicator, which the oracle computes directly.
    const { y, x } = heteroscedastic(81, 25, 2);
    const withIndicator = x.map((r, i) => [...r, i === 7 ? 1 : 0]);
    const fit = fitModel({ y, x: withIndicator }, { covariance: 'HC3' });
    expect(fit.terms[3].undefinedBecause).toBe('leverage-one');
    expect(Number.isNaN(fit.terms[3].standardError)).toBe(true);
    expect(Number.isNaN(fit.covariance[0][3])).toBe(true);
    const keep = (_: unknown, i: number) => i !== 7;
    const expected = sandwich(x.filter(keep), y.filter(keep), 'HC3');
    expectCovarianceClose(
      fit.covariance.slice(0, 3).map((row) => row.slice(0, 3)),
      expected,
    );
    expect(fit.terms.slice(0, 3).every((t) => t.undefinedBecause === undefined)).toBe(true);
    // HC0 has no 1 − h to divide by: the row simply contributes nothing.
    expect(Number.isFinite(fitModel({ y, x: withIndicator }, { covariance: 'HC0' }).terms[3].standardError)).toBe(true);
  });

  it('rejects an unknown covariance kind', () => {
    const { y, x } = randomProblem(91, 10, 1);
    expect(() => fitModel({ y, x }, { covariance: 'HC2' as CovarianceKind })).toThrow(/covariance must be one of/);
  });
});
