import { afterAll, describe, expect, it } from 'vitest';
import erfc from '@stdlib/math-base-special-erfc';
import { normalQuantile, normalTwoSidedP, normalUpperTail } from '../../../src/engine/distributions';
import { WorstErrors } from './errorTable';

const worst = new WorstErrors();
afterAll(() => worst.print('normal: worst relative error per check'));

describe('normal upper tail', () => {
  it('equals erfc(z/√2)/2 (definition of erfc)', () => {
    for (const z of [-5, -1, 0, 0.3, 1, 2.5, 5, 10, 20, 30, 37]) {
      const e = worst.record('P(Z>z) vs erfc', normalUpperTail(z), 0.5 * erfc(z / Math.SQRT2), `z=${z}`);
      // z/√2 and z·(1/√2) may round differently; that half-ulp moves erfc by about z²·ε relative.
      expect(e).toBeLessThan(1e-15 + 2 * z * z * 2.220446049250313e-16);
    }
  });

  it('known values (from memory)', () => {
    // 0.0249978951482204: P(Z > 1.96), common 15-digit value, from memory.
    expect(worst.record('known values', normalUpperTail(1.96), 0.0249978951482204, 'z=1.96')).toBeLessThan(1e-14);
    // 0.158655253931457: P(Z > 1) = Φ(−1), from memory.
    expect(worst.record('known values', normalUpperTail(1), 0.158655253931457, 'z=1')).toBeLessThan(1e-14);
    // 0.0227501319481792: P(Z > 2), from memory.
    expect(worst.record('known values', normalUpperTail(2), 0.0227501319481792, 'z=2')).toBeLessThan(1e-14);
    // P(Z > 8.2) ≈ 1.2e-16 (two digits, from memory); 1 − Φ would give 0 or 1.1e-16 here.
    expect(normalUpperTail(8.2) / 1.2e-16).toBeCloseTo(1, 1);
  });

  it('matches the asymptotic (Mills ratio) series far out, A&S 26.2.12 (from memory)', () => {
    // P(Z > z) = φ(z)/z · Σ (−1)^k (2k−1)!!/z^{2k}; at z ≥ 30 twelve terms leave < 1e-17 relative.
    // z is an integer so z²/2 is exact and exp(−z²/2) carries only its own rounding.
    for (const z of [30, 32, 35, 37]) {
      let term = 1;
      let sum = 0;
      for (let k = 0; k < 12; k++) {
        sum += term;
        term *= -(2 * k + 1) / (z * z);
      }
      const expected = (Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI) / z) * sum;
      const e = worst.record('asymptotic series z ≥ 30', normalUpperTail(z), expected, `z=${z}`);
      expect(e).toBeLessThan(1e-12);
    }
  });

  it('two-sided p is twice the tail of |z| and never exceeds 1', () => {
    for (const z of [0, 0.5, -0.5, 3, -3, 30, -30]) {
      expect(normalTwoSidedP(z)).toBeCloseTo(2 * normalUpperTail(Math.abs(z)), 15);
      expect(normalTwoSidedP(z)).toBeLessThanOrEqual(1);
    }
    expect(normalTwoSidedP(-38) / (2 * normalUpperTail(38))).toBeCloseTo(1, 12);
  });
});

describe('normal quantile', () => {
  it('is finite and consistent at p = 1e-300', () => {
    const z = normalQuantile(1e-300);
    expect(Number.isFinite(z)).toBe(true);
    expect(z).toBeLessThan(-37);
    expect(z).toBeGreaterThan(-37.1);
    // κ = z² ≈ 1372 here, so a correctly rounded z reproduces p to about 1e-13.
    expect(worst.record('quantile at 1e-300', normalUpperTail(-z), 1e-300, 'p=1e-300')).toBeLessThan(1e-12);
  });

  it('is antisymmetric about ½', () => {
    for (const p of [0.3, 0.1, 0.025, 1e-5]) expect(normalQuantile(1 - p)).toBeCloseTo(-normalQuantile(p), 10);
  });
});
