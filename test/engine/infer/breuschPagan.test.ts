/**
 * Breusch–Pagan on the paths assumptionChecks.test.ts does not reach: the model's own QR declined
 * (no intercept in the model, or a design too ill-conditioned for double alone), against the same
 * statistic formed with the model's QR where it is reused. Oracle: Koenker's LM = n·R² of u² on
 * [1, X], by ml-matrix's QR (npm, general-purpose linear algebra), from its defining formula.
 */
import { describe, expect, it } from 'vitest';
import { solveModel } from '../../../src/engine/fitModel';
import { breuschPagan } from '../../../src/engine/infer/breuschPagan';
import { gaussian, mulberry32 } from '../../support/random';
import { koenkerOf } from '../../support/koenker';

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

const normal = gaussian(mulberry32(808));

describe('breuschPagan', () => {
  it('a model without an intercept: the auxiliary regression still has one', () => {
    const x = Array.from({ length: 60 }, (_, i) => [1 + i / 10, Math.cos(i)]);
    const data = { y: x.map(([a, b]) => 2 * a - b + a * normal()), x };
    const solution = solveModel(data, { intercept: false }).solution;
    const bp = breuschPagan(solution, data);
    expect(bp.df).toBe(2);
    expect(relative(bp.statistic, koenkerOf(x, solution.residuals))).toBeLessThan(1e-10);
  });

  // κ of the unit-scaled design near 1e4, past the fit's threshold of 1e3, so the auxiliary regression is fitted on its own.
  it('an ill-conditioned polynomial design, with an intercept', () => {
    const x = Array.from({ length: 40 }, (_, i) => {
      const t = 1 + i / 8;
      return [t, t * t, t ** 3, t ** 4, t ** 5];
    });
    const data = { y: x.map(([t]) => Math.log(t) + t * 0.05 * normal()), x };
    const solution = solveModel(data).solution;
    const bp = breuschPagan(solution, data);
    expect(bp.df).toBe(5);
    expect(relative(bp.statistic, koenkerOf(x, solution.residuals))).toBeLessThan(1e-8);
  });

  it('an unweighted model with an intercept, through its own QR', () => {
    const x = Array.from({ length: 80 }, (_, i) => [i / 10, normal()]);
    const data = { y: x.map(([a, b]) => 1 + a + b + (1 + a) * normal()), x };
    const solution = solveModel(data).solution;
    expect(relative(breuschPagan(solution, data).statistic, koenkerOf(x, solution.residuals))).toBeLessThan(1e-10);
  });
});
