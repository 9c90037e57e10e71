/**
 * Invariances and identities of least squares that any correct fit satisfies. These are facts of
 * the trade (common practice, no source); the data are seeded random designs.
 */
import { describe, expect, it } from 'vitest';
import { compareNested, fitModel } from '../../src/engine';
import { randomProblem } from '../support/random';

const close = (a: number, b: number, tol: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(tol * Math.max(1, Math.abs(b)));

describe('least-squares invariances', () => {
  const { y, x } = randomProblem(11, 40, 4);
  const base = fitModel({ y, x });

  it('keeps the fitted values when a column is rescaled by 1e6 or 1e-6', () => {
    for (const factor of [1e6, 1e-6]) {
      const scaled = fitModel({ y, x: x.map((r) => r.map((v, j) => (j === 2 ? v * factor : v))) });
      scaled.fitted.forEach((f, i) => close(f, base.fitted[i], 1e-10));
      close(scaled.terms[3].estimate * factor, base.terms[3].estimate, 1e-10);
      close(scaled.terms[3].statistic, base.terms[3].statistic, 1e-9);
    }
  });

  it('keeps the fitted values and each term when the columns are permuted', () => {
    const order = [3, 0, 2, 1];
    const permuted = fitModel({ y, x: x.map((r) => order.map((j) => r[j])), names: order.map((j) => `x${j + 1}`) });
    permuted.fitted.forEach((f, i) => close(f, base.fitted[i], 1e-10));
    order.forEach((j, k) => close(permuted.terms[k + 1].estimate, base.terms[j + 1].estimate, 1e-10));
  });

  it('declares the second of two identical columns aliased, names it, and fits the rest', () => {
    const duplicated = fitModel({ y, x: x.map((r) => [...r, r[1]]), names: ['a', 'b', 'c', 'd', 'b again'] });
    expect(duplicated.terms.map((t) => t.aliased)).toEqual([false, false, false, false, false, true]);
    expect(duplicated.terms[5].name).toBe('b again');
    expect(Number.isNaN(duplicated.terms[5].estimate)).toBe(true);
    expect(duplicated.rank).toBe(5);
    expect(duplicated.parameters).toBe(6);
    duplicated.fitted.forEach((f, i) => close(f, base.fitted[i], 1e-10));
    close(duplicated.sigma, base.sigma, 1e-12);
  });

  it('declares a constant predictor aliased with the intercept, at any scale', () => {
    for (const c of [7, 1e-200, 3e250]) {
      const fit = fitModel({ y, x: x.map((r) => [r[0], c]) });
      expect(fit.terms.map((t) => t.aliased)).toEqual([false, false, true]);
    }
  });

  it('gives F = t² when the nested test adds one term, with the same p-value', () => {
    const nested = compareNested({ y, base: x.map((r) => r.slice(0, 3)), added: x.map((r) => [r[3]]) });
    const t = base.terms[4];
    close(nested.f, t.statistic ** 2, 1e-10);
    close(nested.pValue, t.pValue, 1e-10);
    expect(nested.dfNumerator).toBe(1);
    expect(nested.dfDenominator).toBe(base.residualDf);
  });

  it('with a known σ uses z: intervals are estimate ± 1.959964·SE and SE = σ·√diag((XᵀX)⁻¹)', () => {
    const known = fitModel({ y, x }, { knownSigma: 2 });
    expect(known.statisticKind).toBe('z');
    known.terms.forEach((t, j) => {
      close(t.ciHigh - t.estimate, 1.959964 * t.standardError, 1e-6);
      close(t.standardError, (base.terms[j].standardError * 2) / base.sigma, 1e-12);
    });
  });

  it('follows the rule of thumb: |estimate| > 2·SE exactly when CV% < 50 (common practice, no source)', () => {
    let checked = 0;
    for (let seed = 100; seed < 140; seed++) {
      const problem = randomProblem(seed, 12, 3, 3);
      for (const t of fitModel({ y: problem.y, x: problem.x }).terms) {
        expect(Math.abs(t.estimate) > 2 * t.standardError).toBe(t.cvPercent < 50);
        checked++;
      }
    }
    expect(checked).toBe(160);
  });
});

describe('weights', () => {
  const { y, x } = randomProblem(21, 30, 2);

  it('equal weights change neither the estimates nor their standard errors', () => {
    const plain = fitModel({ y, x });
    const weighted = fitModel({ y, x, weights: y.map(() => 4) });
    weighted.terms.forEach((t, j) => {
      close(t.estimate, plain.terms[j].estimate, 1e-12);
      close(t.standardError, plain.terms[j].standardError, 1e-12);
    });
  });

  it('integer weights give the coefficients and RSS of repeating the rows', () => {
    const weights = y.map((_, i) => 1 + (i % 3));
    const repeatedY: number[] = [];
    const repeatedX: number[][] = [];
    weights.forEach((w, i) => {
      for (let k = 0; k < w; k++) {
        repeatedY.push(y[i]);
        repeatedX.push(x[i]);
      }
    });
    const weighted = fitModel({ y, x, weights });
    const repeated = fitModel({ y: repeatedY, x: repeatedX });
    weighted.terms.forEach((t, j) => close(t.estimate, repeated.terms[j].estimate, 1e-12));
    close(weighted.rss, repeated.rss, 1e-12);
    weighted.residuals.forEach((r, i) => close(r, y[i] - weighted.fitted[i], 1e-12));
  });

  it.each([
    [0, 'row 3'],
    [-1, 'row 3'],
    [Number.NaN, 'row 3'],
  ])('a weight of %s is an error naming the row', (bad, where) => {
    const weights = y.map((_, i) => (i === 2 ? bad : 1));
    expect(() => fitModel({ y, x, weights })).toThrow(where);
  });
});

describe('degenerate input', () => {
  it('n ≤ q: no residual degrees of freedom is a clear error', () => {
    expect(() =>
      fitModel({
        y: [1, 2, 3],
        x: [
          [1, 0],
          [2, 1],
          [3, 5],
        ],
      }),
    ).toThrow(/more rows than parameters/);
  });

  it('a perfect fit has SE 0, infinite t, p 0, and NaN t where the estimate is exactly 0', () => {
    const fit = fitModel({ y: [1, 3, 5, 7], x: [[0], [1], [2], [3]] });
    expect(fit.perfectFit).toBe(true);
    expect(fit.terms.map((t) => t.standardError)).toEqual([0, 0]);
    expect(fit.terms.map((t) => t.statistic)).toEqual([Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY]);
    expect(fit.terms.map((t) => t.pValue)).toEqual([0, 0]);
    const zeroSlope = fitModel({ y: [0, 0, 0, 0], x: [[0], [1], [2], [3]] });
    expect(Number.isNaN(zeroSlope.terms[1].statistic)).toBe(true);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])('non-finite input (%s) is an error, never a NaN result', (bad) => {
    expect(() => fitModel({ y: [1, 2, bad, 4], x: [[1], [2], [3], [5]] })).toThrow(/row 3/);
    expect(() => fitModel({ y: [1, 2, 3, 4], x: [[1], [2], [bad], [5]] })).toThrow(/row 3/);
  });

  it('rows of y and x that differ in number are an error', () => {
    expect(() => fitModel({ y: [1, 2, 3], x: [[1], [2]] })).toThrow(/must match/);
  });

  it('p = 0 fits the intercept alone: the mean, with SE = s/√n', () => {
    const y = [2, 4, 9, 5];
    const fit = fitModel({ y, x: y.map(() => []) });
    close(fit.terms[0].estimate, 5, 1e-14);
    const s = Math.sqrt(((2 - 5) ** 2 + 1 + 16 + 0) / 3);
    close(fit.terms[0].standardError, s / 2, 1e-14);
    expect(Number.isNaN(fit.fStatistic)).toBe(true);
  });

  it('rejects a confidence level outside (0, 1) and a non-positive known σ', () => {
    const data = { y: [1, 2, 4, 3], x: [[1], [2], [3], [4]] };
    expect(() => fitModel(data, { level: 95 })).toThrow(/between 0 and 1/);
    expect(() => fitModel(data, { knownSigma: 0 })).toThrow(/positive/);
  });
});
