/**
 * When the solve switches to double-double, and what the switch buys. Sources: NIST StRD Norris
 * (certified values, read in place from ../shared/reference/strd); the error model is Björck 1996,
 * Numerical Methods for Least Squares Problems, §2.4 (forward error about κ·u).
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/engine/fit/design';
import { needsExtendedPrecision, PRECISE_CONDITION_THRESHOLD, solveLeastSquares } from '../../../src/engine/fit/leastSquares';
import { randomProblem } from '../../support/random';
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
    // An exact fit has no σ̂ to protect; only its condition number counts.
    expect(needsExtendedPrecision(1, 0)).toBe(false);
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
