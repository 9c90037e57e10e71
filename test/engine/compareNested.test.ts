/**
 * The extra-sum-of-squares F test. Checks: against sums of squares computed independently with
 * ml-matrix (npm) least squares, the F = t² identity (common practice, no source), and the
 * NIST/SEMATECH e-Handbook table value F₀.₉₅(2, 20) = 3.493 (section 1.3.6.7.3, from memory).
 * The base model read off the full model's QR is checked against the base model's own fit and
 * ml-matrix: the QR of leading columns is the leading part of the full QR (common practice, no
 * source; Golub & Van Loan, Matrix Computations, on updating QR, from memory).
 */
import { Matrix, QrDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { compareNested, fitModel, modelCache } from '../../src/engine';
import { registerPackedData } from '../../src/engine/cache/packedPredictors';
import { compareLeadingColumns } from '../../src/engine/compareNested';
import type { ModelData } from '../../src/engine';
import { gaussian, mulberry32, randomProblem } from '../support/random';

function rssByMlMatrix(y: number[], x: number[][]): number {
  const design = new Matrix(x.map((r) => [1, ...r]));
  const beta = new QrDecomposition(design).solve(Matrix.columnVector(y));
  const residual = Matrix.columnVector(y).sub(design.mmul(beta)).to1DArray();
  return residual.reduce((s, r) => s + r * r, 0);
}

describe('compareNested', () => {
  const { y, x } = randomProblem(31, 23, 4);
  const base = x.map((r) => r.slice(0, 2));
  const added = x.map((r) => r.slice(2));

  it('matches F = ((RSS_base − RSS_full)/2)/(RSS_full/18) from an independent least-squares solve', () => {
    const result = compareNested({ y, base, added });
    const rssBase = rssByMlMatrix(y, base);
    const rssFull = rssByMlMatrix(y, x);
    expect(result.rssBase).toBeCloseTo(rssBase, 9);
    expect(result.rssFull).toBeCloseTo(rssFull, 9);
    expect(result.dfNumerator).toBe(2);
    expect(result.dfDenominator).toBe(18);
    const f = (rssBase - rssFull) / 2 / (rssFull / 18);
    expect(Math.abs(result.f - f)).toBeLessThan(1e-9 * f);
  });

  it('uses the table critical value F₀.₉₅(2, 20) = 3.493 and decides by it', () => {
    const problem = randomProblem(5, 25, 4);
    const result = compareNested({
      y: problem.y,
      base: problem.x.map((r) => r.slice(0, 2)),
      added: problem.x.map((r) => r.slice(2)),
    });
    expect(result.dfDenominator).toBe(20);
    expect(result.fCritical).toBeCloseTo(3.493, 3);
    expect(result.addedHelp).toBe(result.f > result.fCritical);
  });

  it('finds strong added terms helpful and pure-noise ones not', () => {
    const normal = gaussian(mulberry32(8));
    const rows = Array.from({ length: 60 }, () => [normal(), normal(), normal()]);
    const strong = rows.map((r) => r[0] + 3 * r[2] + 0.1 * normal());
    const helpful = compareNested({ y: strong, base: rows.map((r) => [r[0]]), added: rows.map((r) => [r[2]]) });
    expect(helpful.addedHelp).toBe(true);
    expect(helpful.pValue).toBeLessThan(1e-20);
    const none = rows.map((r) => r[0] + 0.5 * normal());
    const results = compareNested({ y: none, base: rows.map((r) => [r[0]]), added: rows.map((r) => [r[1]]) });
    expect(results.pValue).toBeGreaterThan(0);
    expect(results.addedHelp).toBe(results.pValue < 0.05);
  });

  it('with a known σ refers F to χ²/df and divides by σ², not by the residual mean square', () => {
    const result = compareNested({ y, base, added }, { knownSigma: 1.5 });
    expect(result.dfDenominator).toBe(Number.POSITIVE_INFINITY);
    const f = (rssByMlMatrix(y, base) - rssByMlMatrix(y, x)) / 2 / 1.5 ** 2;
    expect(Math.abs(result.f - f)).toBeLessThan(1e-9 * f);
    // χ²₂ upper tail is exp(−x/2) exactly (common practice, no source).
    expect(Math.abs(result.pValue - Math.exp(-f))).toBeLessThan(1e-12 * Math.exp(-f));
    // χ²₂ 95% point: −2·ln(0.05) = 5.991, so F crit = 2.996.
    expect(result.fCritical).toBeCloseTo(-Math.log(0.05), 10);
  });

  it('is an error when the added columns repeat base columns', () => {
    expect(() => compareNested({ y, base, added: base.map((r) => [r[0] * 2]) })).toThrow(/nothing to test/);
  });

  it('agrees with the single fits it is built from', () => {
    const full = fitModel({ y, x });
    expect(compareNested({ y, base, added }).rssFull).toBeCloseTo(full.rss, 10);
  });
});

describe("compareNested: the base model from the full model's factorization", () => {
  const { y, x } = randomProblem(41, 40, 5);
  const base = x.map((r) => r.slice(0, 3));
  const added = x.map((r) => r.slice(3));

  function fitsDuring(run: () => void): number {
    modelCache.reset();
    run();
    return modelCache.stats().fits;
  }

  it("gives the base model's own RSS and rank, and fits only the full model", () => {
    let result = compareNested({ y, base, added });
    expect(fitsDuring(() => (result = compareNested({ y, base, added })))).toBe(1);
    const own = fitModel({ y, x: base });
    expect(Math.abs(result.rssBase - own.rss)).toBeLessThan(1e-12 * own.rss);
    expect(Math.abs(result.rssBase - rssByMlMatrix(y, base))).toBeLessThan(1e-9 * own.rss);
    expect(result.dfNumerator).toBe(2);
  });

  it('weighted, without an intercept and with σ known, likewise', () => {
    const weights = y.map((_, i) => 0.5 + (i % 3));
    for (const settings of [{}, { intercept: false }, { knownSigma: 0.8 }]) {
      const result = compareNested({ y, base, added, weights }, settings);
      const own = fitModel({ y, x: base, weights }, settings);
      const full = fitModel({ y, x, weights }, settings);
      expect(Math.abs(result.rssBase - own.rss)).toBeLessThan(1e-12 * own.rss);
      const errorScale = settings.knownSigma === undefined ? full.rss / full.residualDf : settings.knownSigma ** 2;
      const f = (own.rss - full.rss) / (full.rank - own.rank) / errorScale;
      expect(Math.abs(result.f - f)).toBeLessThan(1e-9 * f);
    }
  });

  it('counts only the accepted columns: an aliased base column and an aliased added column', () => {
    const aliasedBase = x.map((r) => [r[0], r[1], r[0] + r[1]]);
    const aliasedAdded = x.map((r) => [r[3], 2 * r[3], r[4]]);
    const result = compareNested({ y, base: aliasedBase, added: aliasedAdded });
    const own = fitModel({ y, x: aliasedBase });
    expect(own.rank).toBe(3);
    expect(result.dfNumerator).toBe(2);
    expect(Math.abs(result.rssBase - own.rss)).toBeLessThan(1e-12 * own.rss);
  });

  it('an intercept-only base: RSS is the total sum of squares about the mean', () => {
    const mean = y.reduce((s, v) => s + v, 0) / y.length;
    const tss = y.reduce((s, v) => s + (v - mean) ** 2, 0);
    const result = compareNested({ y, base: x.map(() => []), added: x });
    expect(Math.abs(result.rssBase - tss)).toBeLessThan(1e-12 * tss);
    expect(result.dfNumerator).toBe(5);
  });

  it('fits the base model itself when the full fit needed more than double precision, and then reports its RSS exactly', () => {
    // Powers of 1..30 up to the fifth: κ far above the double-precision threshold.
    const t = Array.from({ length: 30 }, (_, i) => i + 1);
    const powers = t.map((v) => [v, v ** 2, v ** 3, v ** 4, v ** 5]);
    const noisy = t.map((v, i) => 2 + 0.5 * v - 0.01 * v ** 3 + Math.sin(i));
    let result = compareNested({ y: noisy, base: powers.map((r) => r.slice(0, 2)), added: powers.map((r) => r.slice(2)) });
    expect(fitsDuring(() => (result = compareNested({ y: noisy, base: powers.map((r) => r.slice(0, 2)), added: powers.map((r) => r.slice(2)) })))).toBe(2);
    expect(result.rssBase).toBe(fitModel({ y: noisy, x: powers.map((r) => r.slice(0, 2)) }).rss);
  });

  it("compareLeadingColumns on the full model's data is compareNested of its leading and trailing columns", () => {
    const weights = y.map((_, i) => 1 + (i % 4));
    const viaRows = compareNested({ y, base, added, weights }, { level: 0.9 });
    const viaData = compareLeadingColumns({ y, x, weights }, 3, { level: 0.9 });
    expect(viaData).toEqual(viaRows);
    expect(() => compareLeadingColumns({ y, x }, 6)).toThrow(/first 6 of 5/);
    expect(() => compareLeadingColumns({ y, x }, 5)).toThrow(/nothing to test/);
  });

  it("reads the model frame's packed predictors, never its rows", () => {
    const packedOnly = {
      y,
      get x(): number[][] {
        throw new Error('the rows were built');
      },
    } as ModelData;
    registerPackedData(packedOnly, { y: Float64Array.from(y), predictors: { values: Float64Array.from(x.flat()), rows: x.length, p: 5 }, weights: undefined });
    expect(compareLeadingColumns(packedOnly, 3)).toEqual(compareNested({ y, base, added }));
  });
});
