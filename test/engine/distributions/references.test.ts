import { describe, expect, it } from 'vitest';
import { relativeError } from './errorTable';
import { atan, div, exp, expToDouble, type Fixed, fromDouble, fromInteger, ln, LN2, mul, ONE, PI, sqrt, toDouble } from './support/fixedPoint';
import {
  bernoulliForTest,
  betaTailsByBinomial,
  betaTailsBySeries,
  fUpperBySeries,
  fUpperEvenDf1,
  fUpperTwoDf1,
  lnGamma,
  tTwoSided,
} from './support/references';

// The 320-bit references are only as good as their arithmetic; these checks pin it down with
// constants and identities independent of the series the references use.

/** The first `n` decimal digits after the point of a non-negative fixed-point value. */
function decimals(v: bigint, n: number): string {
  return ((v * 10n ** BigInt(n)) >> 320n).toString();
}

/** |a − b| as a double. */
function gap(a: Fixed, b: Fixed): number {
  return Math.abs(toDouble(a - b));
}

describe('fixed-point arithmetic', () => {
  it('reproduces π, ln 2 and e to 60 digits (common values, from memory)', () => {
    expect(decimals(PI, 60)).toBe('3141592653589793238462643383279502884197169399375105820974944');
    expect(decimals(LN2, 60)).toBe('693147180559945309417232121458176568075500134360255254120680');
    expect(decimals(exp(ONE), 60)).toBe('2718281828459045235360287471352662497757247093699959574966967');
  });

  it('exp and ln invert each other; √2² = 2; atan(1) = π/4', () => {
    for (const v of [1e-30, 0.3, 1, 2.5, 1e10, 1e200]) {
      const f = fromDouble(v);
      expect(gap(exp(ln(f)), f) / Math.max(1, v), `v=${v}`).toBeLessThan(1e-90);
    }
    const two = fromInteger(2);
    expect(gap(mul(sqrt(two), sqrt(two)), two)).toBeLessThan(1e-90);
    expect(gap(4n * atan(ONE), PI)).toBeLessThan(1e-90);
    expect(gap(atan(fromInteger(1000)) + atan(div(ONE, fromInteger(1000))), PI / 2n)).toBeLessThan(1e-90);
  });

  it('converts to doubles correctly, including results near 1e-300', () => {
    expect(toDouble(fromDouble(0.1))).toBe(0.1);
    expect(relativeError(expToDouble(fromInteger(-690)), Math.exp(-690))).toBeLessThan(2.3e-16); // within an ulp
    expect(relativeError(expToDouble(-mul(fromInteger(700), LN2)), 2 ** -700)).toBe(0);
    expect(() => fromDouble(1e-300)).toThrow();
  });
});

describe('log Γ by Stirling with exact Bernoulli numbers', () => {
  it('Bernoulli numbers B₂..B₂₀ (A&S table 23.2, from memory)', () => {
    const expected: Array<[bigint, bigint]> = [
      [1n, 6n],
      [-1n, 30n],
      [1n, 42n],
      [-1n, 30n],
      [5n, 66n],
      [-691n, 2730n],
      [7n, 6n],
      [-3617n, 510n],
      [43867n, 798n],
      [-174611n, 330n],
    ];
    expected.forEach((b, k) => expect(bernoulliForTest(2 * k + 2)).toEqual(b));
  });

  it('equals log (n − 1)! exactly computed, and log √π at ½, to 1e-60 (its truncation is 5e-68)', () => {
    let factorial = 1n;
    for (let n = 1; n <= 160; n++) {
      if (n > 1) factorial *= BigInt(n - 1);
      if ([1, 2, 3, 10, 30, 99, 100, 101, 160].includes(n)) {
        expect(gap(lnGamma(fromInteger(n)), ln(fromInteger(factorial))), `n=${n}`).toBeLessThan(1e-60);
      }
    }
    expect(gap(lnGamma(ONE / 2n), ln(PI) / 2n)).toBeLessThan(1e-60);
  });

  it('obeys log Γ(z + 1) − log Γ(z) = log z for tiny, small and huge z', () => {
    for (const z of [1e-20, 0.3, 7.25, 5e6]) {
      const f = fromDouble(z);
      expect(gap(lnGamma(f + ONE) - lnGamma(f), ln(f)), `z=${z}`).toBeLessThan(1e-60);
    }
  });
});

describe('the reference formulas agree with each other where they overlap', () => {
  it('binomial sum and DLMF 8.17.8 series for integer parameters', () => {
    for (const [a, b, x] of [
      [8, 3, 0.5],
      [30, 12, 0.75],
      [3, 200, 0.0078125],
    ] as const) {
      const series = betaTailsBySeries(a, b, x, 1 - x);
      const binomial = betaTailsByBinomial(a, b, x, 1 - x);
      expect(relativeError(series.lower, binomial.lower), `(${a},${b}) lower`).toBeLessThan(2e-16);
      expect(relativeError(series.upper, binomial.upper), `(${a},${b}) upper`).toBeLessThan(2e-16);
    }
    expect(betaTailsByBinomial(8, 3, 0.5, 0.5).lower).toBe(56 / 1024);
  });

  it('A&S 26.6.4, DLMF 8.17.8 and (1 + 2f/ν)^(−ν/2) for F', () => {
    for (const [df1, df2, f] of [
      [2, 7.5, 3],
      [6, 30, 2.5],
      [40, 300, 1.7],
    ] as const) {
      expect(relativeError(fUpperEvenDf1(f, df1, df2), fUpperBySeries(f, df1, df2)), `(${df1},${df2})`).toBeLessThan(2e-16);
    }
    expect(relativeError(fUpperEvenDf1(3, 2, 1e7), fUpperTwoDf1(3, 1e7))).toBeLessThan(2e-16);
  });

  it('A&S 26.7.3/26.7.4 for t: ν = 1 and ν = 2 closed forms, and both of its branches', () => {
    for (const t of [0.3, 1, 7]) {
      expect(relativeError(tTwoSided(t, 1), 1 - (2 / Math.PI) * Math.atan(t)), `t=${t}`).toBeLessThan(1e-15);
      const r = Math.sqrt(2 + t * t);
      expect(relativeError(tTwoSided(t, 2), 2 / (r * (r + t))), `t=${t}`).toBeLessThan(1e-15); // 1 − t/r rationalised
    }
    // 1 − A at t = 3; the tail sum at t = 1e6, where 1 − A is below 2^-100.
    for (const nu of [7, 8]) {
      for (const t of [3, 1e6]) {
        expect(relativeError(tTwoSided(t, nu), fUpperBySeries(t * t, 1, nu)), `ν=${nu} t=${t}`).toBeLessThan(2e-16);
      }
    }
  });
});
