/**
 * When the solve switches to double-double, and what the switch buys. Sources: NIST StRD Norris
 * (certified values, read in place from ../shared/reference/strd); the error model is Björck 1996,
 * Numerical Methods for Least Squares Problems, §2.4 (forward error about κ·u).
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/engine/fit/design';
import { needsExtendedPrecision, PRECISE_CONDITION_THRESHOLD, solveLeastSquares } from '../../../src/engine/fit/leastSquares';
import { mulberry32, randomProblem } from '../../support/random';
import { lre, readStrd, strdAvailable } from '../../support/strd';

describe('needsExtendedPrecision', () => {
  it('switches on a large condition number whatever the residual', () => {
    expect(needsExtendedPrecision(PRECISE_CONDITION_THRESHOLD * 1.01, 1)).toBe(true);
    expect(needsExtendedPrecision(PRECISE_CONDITION_THRESHOLD * 0.5, 1)).toBe(false);
  });

  it('switches when residuals are tiny beside y, where σ̂ would lose digits to κ·u·‖y‖/‖r‖', () => {
    // Norris measures κ ≈ 3.2 and ‖r‖/‖y‖ ≈ 1.6e-3; the benchmark's random designs κ ≤ 51 and ‖r‖/‖y‖ ≥ 0.18.
    expect(needsExtendedPrecision(3.2, 1.6e-3)).toBe(true);
    expect(needsExtendedPrecision(51, 0.18)).toBe(false);
    // An exact fit reports standard errors of 0, so its coefficients are read as exact: always refined.
    expect(needsExtendedPrecision(1, 0)).toBe(true);
    expect(needsExtendedPrecision(2e3, 0)).toBe(true);
  });
});

describe.skipIf(!strdAvailable())('solveLeastSquares on NIST Norris (source: NIST StRD)', () => {
  it('reaches 13 digits in the intercept only with the extended path, which the check selects', () => {
    const problem = readStrd('Norris');
    const design = buildDesign(problem.y, problem.x, true, undefined, undefined);
    const certified = problem.certified.parameters[0].estimate;
    expect(lre(solveLeastSquares(design).coefficients[0], certified)).toBeGreaterThanOrEqual(13);
    expect(lre(solveLeastSquares(design, 'double').coefficients[0], certified)).toBeLessThan(13);
  });
});

describe('solveLeastSquares on well-conditioned data', () => {
  it('gives bit-for-bit the double-precision result: the check alone runs', () => {
    const { y, x } = randomProblem(11, 500, 6);
    const design = buildDesign(y, x, true, undefined, undefined);
    const auto = solveLeastSquares(design);
    const plain = solveLeastSquares(design, 'double');
    expect(Array.from(auto.coefficients)).toEqual(Array.from(plain.coefficients));
    expect(auto.scaledRss).toBe(plain.scaledRss);
  });
});

describe('residuals on many rows', () => {
  it('keeps the first rows’ residuals as accurate as the rest (y − x·b to 1e-12 σ), where Q alone lost digits', () => {
    // 200,000 rows with a level of 50: ‖y‖ ≈ 2e4, which Q·(0, Qᵀy tail) carried into the leading rows.
    const random = mulberry32(3);
    const n = 200_000;
    const x = Array.from({ length: n }, () => [10 * random(), 5 * random() - 2, random()]);
    const y = x.map(([a, b, c]) => 50 + 0.8 * a - 1.5 * b + 2 * c + (random() - 0.5));
    const design = buildDesign(y, x, true, undefined, undefined);
    const solution = solveLeastSquares(design);
    const b = Array.from(solution.coefficients);
    const sigma = Math.sqrt((solution.scaledRss * solution.yScale ** 2) / (n - 4));
    for (const i of [0, 1, 2, 3, 4, 1000, n - 1]) {
      const direct = y[i] - (b[0] + b[1] * x[i][0] + b[2] * x[i][1] + b[3] * x[i][2]);
      expect(Math.abs(solution.residuals[i] - direct), `row ${i}`).toBeLessThanOrEqual(1e-12 * sigma);
    }
  });
});

// Common practice (no source): data that a line fits exactly have standard errors of 0, so the
// coefficients are read as exact; a constant response has its level as intercept and slope 0.
describe('solveLeastSquares on exact fits', () => {
  const x = [[1], [2], [3], [4], [5], [6]];
  it('gives a constant response its level and a slope of exactly 0', () => {
    const solution = solveLeastSquares(buildDesign([5, 5, 5, 5, 5, 5], x, true, undefined, undefined));
    expect(Array.from(solution.coefficients)).toEqual([5, 0]);
    expect(solution.perfectFit).toBe(true);
  });
  it('gives an exact line its coefficients exactly', () => {
    const solution = solveLeastSquares(
      buildDesign(
        x.map(([v]) => 2 + 3 * v),
        x,
        true,
        undefined,
        undefined,
      ),
    );
    expect(Array.from(solution.coefficients)).toEqual([2, 3]);
  });
});
