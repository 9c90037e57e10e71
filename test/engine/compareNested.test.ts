/**
 * The extra-sum-of-squares F test. Checks: against sums of squares computed independently with
 * ml-matrix (npm) least squares, the F = t² identity (common practice, no source), and the
 * NIST/SEMATECH e-Handbook table value F₀.₉₅(2, 20) = 3.493 (section 1.3.6.7.3, from memory).
 */
import { Matrix, QrDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { compareNested, fitModel } from '../../src/engine';
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
