import erfc from '@stdlib/math-base-special-erfc';
import { describe, expect, it } from 'vitest';
import { erfcScaled, expTimes, log1pmx } from '../../../src/engine/distributions/incompleteBeta/elementary';
import {
  digamma,
  EULER_GAMMA,
  logGamma,
  logGammaOnePlus,
  reciprocalGammaOnePlusMinusOne,
} from '../../../src/engine/distributions/incompleteBeta/gammaFunctions';
import { upperIncompleteGamma } from '../../../src/engine/distributions/incompleteBeta/incompleteGamma';
import { logBetaKernel } from '../../../src/engine/distributions/incompleteBeta/kernel';
import { logBeta, logGammaRatio } from '../../../src/engine/distributions/incompleteBeta/logBeta';
import { pointFromOdds } from '../../../src/engine/distributions/incompleteBeta/point';
import { relativeError } from './errorTable';
import { exp, type Fixed, fromDouble, ln, ONE, toDouble } from './support/fixedPoint';
import { lnGamma } from './support/references';

// The building blocks of the incomplete beta, against 320-bit references (support/) or identities.

const lnGammaRef = (z: number): number => toDouble(lnGamma(fromDouble(z)));
const absoluteOrRelative = (got: number, expected: number): number => Math.abs(got - expected) / Math.max(1, Math.abs(expected));

describe('log Γ family', () => {
  it('log Γ(1 + a) keeps full relative accuracy near its zeros a = 0 and a = 1', () => {
    for (const a of [1e-50, 1e-20, -1e-12, 1e-8, 1e-3, 0.1, 0.5, -0.3, -0.49, -0.9, 0.999999, 1.0000001, 1.5, 2.5, 6.9, 7, 30]) {
      const expected = toDouble(lnGamma(fromDouble(1) + fromDouble(a)));
      expect(relativeError(logGammaOnePlus(a), expected), `a=${a}`).toBeLessThan(1e-14);
    }
  });

  it('1/Γ(1 + a) − 1 keeps full relative accuracy for tiny a', () => {
    for (const a of [1e-50, 1e-20, -1e-10, 1e-5, 0.2, -0.4, 1.2]) {
      const lg: Fixed = lnGamma(ONE + fromDouble(a));
      const expected = toDouble(exp(-lg) - ONE);
      expect(relativeError(reciprocalGammaOnePlusMinusOne(a), expected), `a=${a}`).toBeLessThan(1e-14);
    }
  });

  it('log Γ(z) to 1e-15 absolute (or relative beyond 1)', () => {
    for (const z of [1e-10, 0.3, 1, 1.5, 2, 2.5, 7.9, 8, 100, 1e7]) {
      expect(absoluteOrRelative(logGamma(z), lnGammaRef(z)), `z=${z}`).toBeLessThan(1e-15);
    }
  });

  it('log B(a, b) and log(Γ(b)/Γ(a + b)) in every branch', () => {
    for (const [a, b] of [
      [1e-20, 0.5],
      [0.3, 0.7],
      [0.5, 20],
      [3, 7],
      [3, 5e6],
      [10, 10],
      [1e7, 1e7],
      [39, 5e6],
    ] as const) {
      const fa = fromDouble(a);
      const fb = fromDouble(b);
      const expected = toDouble(lnGamma(fa) + lnGamma(fb) - lnGamma(fa + fb));
      expect(absoluteOrRelative(logBeta(a, b), expected), `(${a},${b})`).toBeLessThan(1e-14);
    }
    for (const [a, b] of [
      [0.5, 8],
      [2, 5e6],
      [1e3, 50],
    ] as const) {
      const ratio = toDouble(lnGamma(fromDouble(b)) - lnGamma(fromDouble(a) + fromDouble(b)));
      expect(absoluteOrRelative(logGammaRatio(a, b), ratio), `(${a},${b})`).toBeLessThan(1e-15);
    }
  });

  it('ψ(1) = −γ, ψ(½) = −γ − 2·log 2, ψ(n + 1) = −γ + H_n (A&S 6.3.2, 6.3.3, from memory)', () => {
    expect(Math.abs(digamma(1) + EULER_GAMMA)).toBeLessThan(1e-15);
    expect(Math.abs(digamma(0.5) + EULER_GAMMA + 2 * Math.LN2)).toBeLessThan(1e-15);
    let harmonic = 0;
    for (let n = 1; n <= 40; n++) harmonic += 1 / n;
    expect(relativeError(digamma(41), harmonic - EULER_GAMMA)).toBeLessThan(1e-15);
    expect(relativeError(digamma(1e-10), -1e10 - EULER_GAMMA)).toBeLessThan(1e-15);
  });
});

describe('elementary helpers', () => {
  it('log(1 + u) − u to a few ulps for u from −0.9 to 50', () => {
    for (const u of [-0.9, -0.6, -0.5, -0.1, -1e-8, 1e-12, 1e-3, 0.3, 0.5, 0.51, 0.9, 2, 50]) {
      const fu = fromDouble(u);
      const expected = toDouble(ln(ONE + fu) - fu);
      expect(relativeError(log1pmx(u), expected), `u=${u}`).toBeLessThan(1e-15);
    }
  });

  it('e^(z²)·erfc(z): both branches agree at z = 2 and the asymptotic series holds far out (A&S 7.1.23, from memory)', () => {
    expect(relativeError(erfcScaled(2), Math.exp(4) * erfc(2))).toBeLessThan(1e-15);
    expect(relativeError(erfcScaled(1.9999999999999998), erfcScaled(2))).toBeLessThan(1e-15);
    expect(erfcScaled(0)).toBe(1);
    for (const z of [30, 1e3, 1e6]) {
      // 1/(z√π)·Σ (−1)^n (2n−1)!!/(2z²)^n; twenty terms leave less than 1e-40 for z ≥ 30.
      let term = 1;
      let sum = 0;
      for (let n = 0; n < 20; n++) {
        sum += term;
        term *= -(2 * n + 1) / (2 * z * z);
      }
      expect(relativeError(erfcScaled(z), sum / (z * Math.sqrt(Math.PI))), `z=${z}`).toBeLessThan(1e-15);
    }
  });

  it('e^L·f keeps the exponent exact, and survives where e^L alone would be subnormal', () => {
    expect(expTimes(-3, 7)).toBe(Math.exp(-3) * 7);
    expect(relativeError(expTimes(-750, 1e20), Math.exp(-750 + 20 * Math.LN10))).toBeLessThan(1e-13);
  });
});

describe('incomplete gamma for small shapes', () => {
  it('Q(1, x) = e^(−x) and Q(½, x) = erfc(√x) on both sides of the x = 1.1 switch (common practice, no source)', () => {
    for (const x of [1e-6, 0.1, 0.24, 0.26, 1, 1.09, 1.11, 3, 30, 600]) {
      // log r as passed in is rounded at its own magnitude, which alone moves Q by about |log r|·ε.
      const logR1 = Math.log(x) - x; // r = x·e^(−x)/Γ(1)
      const q1 = upperIncompleteGamma(1, x, logR1, 1e-15);
      expect(relativeError(q1, Math.exp(-x)), `a=1 x=${x}`).toBeLessThan(1e-14 + 2.3e-16 * Math.abs(logR1));
      const logR = 0.5 * Math.log(x) - x - 0.5 * Math.log(Math.PI); // x^½·e^(−x)/Γ(½)
      const half = upperIncompleteGamma(0.5, x, logR, 1e-15);
      expect(relativeError(half, erfc(Math.sqrt(x))), `a=½ x=${x}`).toBeLessThan(1e-14 + 2.3e-16 * Math.abs(logR));
    }
  });

  it('Q(a, x) for tiny a is a·E₁(x) to first order, not 1 − P (E₁(1) = 0.21938393439552, from memory)', () => {
    const a = 1e-10;
    const logR = -1 - logGamma(a); // log(1^a·e^(−1)/Γ(a))
    const q = upperIncompleteGamma(a, 1, logR, 1e-15);
    expect(relativeError(q, a * 0.21938393439552)).toBeLessThan(1e-9); // O(a) second-order term
  });
});

describe('kernel x^a·y^b/B(a, b)', () => {
  it('matches a 320-bit evaluation in the large-parameter branch, on both sides of its switches', () => {
    for (const [a, b, w] of [
      [1e6, 1e6, 1.001],
      [1e6, 1e6, 0.2],
      [5e4, 5e6, 200],
      [50, 20, 0.01],
      [2000, 1e7, 6000],
      [3, 5e6, 2e-6],
    ] as const) {
      const p = pointFromOdds(w);
      // log x^a y^b / B at the exact point x = 1/(1+w):
      const fw = fromDouble(w);
      const lnOnePlusW = ln(ONE + fw);
      const fa = fromDouble(a);
      const fb = fromDouble(b);
      const lnB = lnGamma(fa) + lnGamma(fb) - lnGamma(fa + fb);
      const exact = toDouble(-(fa * lnOnePlusW) / ONE + (fb * (ln(fw) - lnOnePlusW)) / ONE - lnB);
      // λ = a − (a+b)·x = (a·w − b)/(1 + w), exact up to its final rounding here.
      const lambda = toDouble((((fa * fw) / ONE - fb) * ONE) / (ONE + fw));
      const got = logBetaKernel(a, b, p, lambda);
      expect(Math.abs(got - exact) / Math.max(1, Math.abs(exact)), `(${a},${b}) w=${w}`).toBeLessThan(1e-15);
    }
  });
});
