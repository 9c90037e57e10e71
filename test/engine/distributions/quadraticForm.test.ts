/**
 * Tails of Σ wᵢzᵢ². Sources: closed forms for the ratio of independent normal and χ² variables
 * (common practice, no source): with z₁, z₂ standard normal, P(z₁² < c·z₂²) = (2/π)·atan(√c) (the
 * ratio z₁/z₂ is Cauchy); with E₁, E₂ standard exponential (½χ²₂), P(E₁ < cE₂) = c/(1 + c); with
 * G of shape 2 (½χ²₄), P(G < cE) = c²/(1 + c)². The R/lmtest references on Durbin–Watson designs
 * are in test/engine/infer/durbinWatsonExact.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { quadraticFormTails } from '../../../src/engine/distributions/quadraticForm';

function expectRelative(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance * Math.abs(expected));
}

describe('quadraticFormTails', () => {
  it.each([1, 0.3, 1e-4, 1e-10, 1e-20])('P(z₁² − c·z₂² < 0) = (2/π)·atan(√c) for c = %s, in both tails', (c) => {
    const { below, above } = quadraticFormTails([1, -c]);
    expectRelative(below, (2 / Math.PI) * Math.atan(Math.sqrt(c)), 1e-9);
    // P(z₁² − cz₂² > 0) = P(z₂² < z₁²/c) = (2/π)·atan(1/√c), small when c is large… here its complement.
    expectRelative(above, (2 / Math.PI) * Math.atan(1 / Math.sqrt(c)), 1e-9);
  });

  it.each([2, 1, 1e-3, 1e-8, 1e-12])('P(χ²₂ − c·χ²₂ < 0) = c/(1 + c) for c = %s', (c) => {
    const { below, above } = quadraticFormTails([1, 1, -c, -c]);
    expectRelative(below, c / (1 + c), 1e-9);
    expectRelative(above, 1 / (1 + c), 1e-9);
  });

  it.each([0.5, 1e-3, 1e-6])('P(χ²₄ − c·χ²₂ < 0) = c²/(1 + c)² for c = %s (down to 1e-12)', (c) => {
    const { below } = quadraticFormTails([1, 1, 1, 1, -c, -c]);
    expectRelative(below, (c * c) / (1 + c) ** 2, 1e-9);
  });

  it('does not depend on the scale or order of the weights, and the two tails add up to 1', () => {
    const weights = [0.7, -1.3, 2.2, -0.05, 0.4, -0.9, 1.1];
    const base = quadraticFormTails(weights);
    expect(Math.abs(base.below + base.above - 1)).toBeLessThan(1e-13);
    const scaled = quadraticFormTails(weights.map((w) => w * 1e150).reverse());
    expectRelative(scaled.below, base.below, 1e-12);
    expectRelative(scaled.above, base.above, 1e-12);
  });

  it('gives 0 and 1 when every weight has one sign, NaN when all are 0, and ignores zero weights', () => {
    expect(quadraticFormTails([1, 2, 0])).toEqual({ below: 0, above: 1 });
    expect(quadraticFormTails([-1, -2])).toEqual({ below: 1, above: 0 });
    const zeros = quadraticFormTails([0, 0]);
    expect(Number.isNaN(zeros.below) && Number.isNaN(zeros.above)).toBe(true);
    const withZero = quadraticFormTails([1, 0, -0.5]);
    expectRelative(withZero.below, (2 / Math.PI) * Math.atan(Math.sqrt(0.5)), 1e-9);
  });
});
