/**
 * The exact Durbin–Watson test. Sources (values in fixtures/checks.json, written by
 * scripts/reference/checks.R with R 4.2.2 and lmtest 0.9.40; the data are R's datasets):
 * - lmtest::dwtest(exact = TRUE), one-sided ("greater") and two-sided, on lm(dist ~ speed, cars),
 *   lm(mpg ~ wt + hp, mtcars), lm(mpg ~ wt + hp + disp + drat + qsec, mtcars[1:12, ]) (6 residual df),
 *   lm(dist ~ speed - 1, cars) (no intercept) and lm(LakeHuron ~ time(LakeHuron)) (p ≈ 1e-22);
 * - P(D ≤ x) and P(D ≥ x) over a grid of x for the same designs, from lmtest's Fortran pan
 *   (Farebrother 1980, AS 153) with 400 terms in the tails, and from Imhof's (1961) integral by R's
 *   integrate() where the probability is at least 1e-4 (pan loses digits near the median of the
 *   98-row design; Imhof has only absolute accuracy in the far tails);
 * - the eigenvalues of MA on the residual space, as dwtest computes them with eigen();
 * - the exact null moments of durbinWatson.ts, which the beta fallback matches;
 * - the 5 % bounds dL and dU of Durbin & Watson (Biometrika 38, 1951) as extended by Savin & White
 *   (Econometrica 45, 1977), to three decimals, from memory: they are the 5 % points of d with the
 *   n − k smallest, and the n − k largest but k', nonzero eigenvalues 2 − 2cos(πj/n) of A (k' slopes);
 * - a seeded simulation of the test's size (mulberry32, test/support/random.ts).
 */
import { describe, expect, it } from 'vitest';
import { checksFixture, relativeError, type DurbinWatsonCase } from '../../support/checksFixture';
import { solveModel } from '../../../src/engine/fitModel';
import { durbinWatsonMoments } from '../../../src/engine/infer/durbinWatson';
import {
  durbinWatsonBetaTails,
  durbinWatsonExact,
  durbinWatsonTails,
  EXACT_MAX_ROWS,
  residualSpaceEigenvalues,
} from '../../../src/engine/infer/durbinWatsonExact';
import { gaussian, mulberry32, randomProblem } from '../../support/random';

const fixture = checksFixture;

/** A fixture design with an intercept carries it as its first column; the engine adds its own. */
function solve(c: DurbinWatsonCase) {
  const x = c.intercept ? c.design.map((row) => row.slice(1)) : c.design;
  return solveModel({ y: c.y, x }, { intercept: c.intercept }).solution;
}

/** Imhof where its absolute accuracy is ample, pan in the tails. */
function reference(imhof: number, pan: number): number {
  return imhof >= 1e-4 ? imhof : pan;
}

describe('durbinWatsonExact against lmtest', () => {
  it.each(fixture.durbinWatson.map((c) => [c.name, c] as const))('%s: d, one- and two-sided p as dwtest', (_, c) => {
    const result = durbinWatsonExact(solve(c));
    expect(result.method).toBe('exact');
    expect(result.undefinedBecause).toBeUndefined();
    expect(relativeError(result.statistic, c.statistic)).toBeLessThan(1e-12);
    // dwtest's default of 15 terms is good to about 1e-9 here; pan with 400 terms is the sharper reference.
    expect(relativeError(result.pPositive, c.dwtestGreater)).toBeLessThan(1e-6);
    expect(relativeError(result.pTwoSided, c.dwtestTwoSided)).toBeLessThan(1e-6);
    expect(relativeError(result.pPositive, c.panBelowStatistic)).toBeLessThan(1e-8);
    expect(result.pTwoSided).toBe(Math.min(1, 2 * Math.min(result.pPositive, result.pNegative)));
  });

  it.each(fixture.durbinWatson.map((c) => [c.name, c] as const))('%s: eigenvalues of the residual space as eigen() in R', (_, c) => {
    const values = residualSpaceEigenvalues(solve(c).qr);
    expect(values.length).toBe(c.eigenvalues.length);
    values.forEach((v, i) => expect(Math.abs(v - c.eigenvalues[i])).toBeLessThan(1e-12));
  });

  it.each(fixture.durbinWatson.map((c) => [c.name, c] as const))('%s: both tails over a grid to 1e-8 relative', (_, c) => {
    const values = residualSpaceEigenvalues(solve(c).qr);
    c.grid.forEach((x, k) => {
      const { below, above } = durbinWatsonTails(values, x);
      expect(relativeError(below, reference(c.imhofBelow[k], c.panBelow[k]))).toBeLessThan(1e-8);
      expect(relativeError(above, reference(c.imhofAbove[k], c.panAbove[k]))).toBeLessThan(1e-8);
    });
  });
});

describe('durbinWatsonTails against the published bounds (from memory)', () => {
  /** x with P(D ≤ x) = 0.05, by bisection on the exact lower tail. */
  function fivePercentPoint(eigenvalues: number[]): number {
    let low = 0;
    let high = 4;
    for (let i = 0; i < 50; i++) {
      const middle = (low + high) / 2;
      if (durbinWatsonTails(eigenvalues, middle).below < 0.05) low = middle;
      else high = middle;
    }
    return (low + high) / 2;
  }

  it.each([
    [15, 1, 1.077, 1.361],
    [20, 1, 1.201, 1.411],
    [20, 2, 1.1, 1.537],
    [30, 1, 1.352, 1.489],
    [40, 3, 1.338, 1.659],
    [50, 1, 1.503, 1.585],
    [100, 1, 1.654, 1.694],
    [15, 5, 0.562, 2.22],
  ])("n = %i, k' = %i: dL = %d, dU = %d", (n, slopes, lowerBound, upperBound) => {
    const nonzero = Array.from({ length: n - 1 }, (_, j) => 2 - 2 * Math.cos((Math.PI * (j + 1)) / n));
    const m = n - slopes - 1;
    expect(Math.abs(fivePercentPoint(nonzero.slice(0, m)) - lowerBound)).toBeLessThan(0.0006);
    expect(Math.abs(fivePercentPoint(nonzero.slice(slopes, slopes + m)) - upperBound)).toBeLessThan(0.0006);
  });
});

describe('durbinWatsonExact with weights and aliased columns (common practice, no source)', () => {
  it('a weighted fit gives what the unweighted fit of √w·y on √w·[1, X] gives', () => {
    const { y, x } = randomProblem(51, 30, 2);
    const weights = y.map((_, i) => 0.5 + (i % 3));
    const weighted = durbinWatsonExact(solveModel({ y, x, weights }).solution);
    const root = weights.map(Math.sqrt);
    const scaled = durbinWatsonExact(
      solveModel({ y: y.map((v, i) => root[i] * v), x: x.map((row, i) => [root[i], ...row.map((v) => root[i] * v)]) }, { intercept: false }).solution,
    );
    expect(relativeError(weighted.statistic, scaled.statistic)).toBeLessThan(1e-12);
    expect(relativeError(weighted.pPositive, scaled.pPositive)).toBeLessThan(1e-9);
    expect(relativeError(weighted.pNegative, scaled.pNegative)).toBeLessThan(1e-9);
  });

  it('an aliased column changes nothing: the residual space has n − rank dimensions', () => {
    const { y, x } = randomProblem(52, 25, 2);
    const plain = solveModel({ y, x }).solution;
    const aliased = solveModel({ y, x: x.map((row) => [row[0], 2 * row[0], row[1]]) }).solution;
    expect(residualSpaceEigenvalues(aliased.qr).length).toBe(25 - 3);
    const a = durbinWatsonExact(plain);
    const b = durbinWatsonExact(aliased);
    expect(relativeError(b.pPositive, a.pPositive)).toBeLessThan(1e-9);
  });
});

describe('durbinWatsonExact edge cases', () => {
  it('reports an exact fit and a residual space of one dimension', () => {
    const x = [[1], [2], [3], [4]];
    const exact = durbinWatsonExact(solveModel({ y: [3, 5, 7, 9], x }).solution);
    expect(exact.undefinedBecause).toBe('exact-fit');
    const oneDf = durbinWatsonExact(solveModel({ y: [1, 3, 2], x: [[1], [2], [3]] }).solution);
    expect(oneDf.undefinedBecause).toBe('fixed-by-design');
    expect(Number.isFinite(oneDf.statistic)).toBe(true);
    expect(Number.isNaN(oneDf.pPositive)).toBe(true);
  });

  it('uses the beta approximation beyond EXACT_MAX_ROWS, close to the exact value and to its own formula', () => {
    const n = EXACT_MAX_ROWS + 1;
    const { y, x } = randomProblem(41, n, 3);
    const solution = solveModel({ y, x }).solution;
    const approximate = durbinWatsonExact(solution);
    expect(approximate.method).toBe('beta-approximation');
    const exact = durbinWatsonTails(residualSpaceEigenvalues(solution.qr), approximate.statistic);
    // Measured at 300 rows: the beta form is within 1.4e-5 of the exact probability (module comment).
    expect(Math.abs(approximate.pPositive - exact.below)).toBeLessThan(2e-5);
    const { mean, variance } = durbinWatsonMoments(solution);
    expect(approximate.pPositive).toBe(durbinWatsonBetaTails(approximate.statistic, mean, variance).below);
  });
});

describe('durbinWatsonExact under the null (seeded simulation)', () => {
  // Independent normal errors: the one-sided test at 5 % rejects with probability 0.05 exactly, so
  // the rate over R replications lies within 4 standard errors √(0.05·0.95/R) of it.
  it.each([10, 20, 50])('rejects at the nominal 5 percent within Monte Carlo error at n = %i', (n) => {
    const replications = 2000;
    const normal = gaussian(mulberry32(900 + n));
    const x = Array.from({ length: n }, (_, i) => [i / n, Math.cos(i)]);
    let rejected = 0;
    for (let r = 0; r < replications; r++) {
      const y = x.map(() => normal());
      if (durbinWatsonExact(solveModel({ y, x }).solution).pPositive < 0.05) rejected++;
    }
    const rate = rejected / replications;
    expect(Math.abs(rate - 0.05)).toBeLessThan(4 * Math.sqrt((0.05 * 0.95) / replications));
  });
});
