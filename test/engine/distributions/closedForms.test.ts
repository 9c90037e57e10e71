import { afterAll, describe, expect, it } from 'vitest';
import {
  fisherFUpperTail,
  studentTTwoSidedP,
  studentTUpperTail,
} from '../../../src/engine/distributions';
import { WorstErrors } from './errorTable';

// Exact identities evaluated in a cancellation-free way in double precision. They are independent
// of the implementation (no incomplete beta, no shared helpers) and hold to ~1e-14 in floating
// point, so the spec's 1e-12 relative tolerance (1e-10 for F with a df above 1e5) is a real test.

const worst = new WorstErrors();
afterAll(() => worst.print('closed forms: worst relative error per family'));

const TOL = 1e-12;
const TOL_LARGE_DF = 1e-10; // spec: F tails with a df above 1e5

function logSumExp(logs: number[]): number {
  const m = Math.max(...logs);
  let s = 0;
  for (const l of logs) s += Math.exp(l - m);
  return m + Math.log(s);
}

/** Statistics giving upper tails spread from ~0.5 down past 1e-300, with a few near the centre. */
const T_GRID = [1e-8, 0.01, 0.3, 1, 2, 3, 5, 10, 37, 100, 1e3, 1e5, 1e10, 1e30, 1e75, 1e100, 1e150, 1e200, 1e300];

describe('t with 1 df (Cauchy): P(T > t) = atan(1/t)/π for t > 0', () => {
  it('matches down to 1e-300', () => {
    for (const t of T_GRID) {
      const expected = Math.atan(1 / t) / Math.PI; // Cauchy distribution function, exact
      const e = worst.record('t, ν = 1 (Cauchy)', studentTUpperTail(t, 1), expected, `t=${t}`);
      expect(e, `t=${t}`).toBeLessThan(TOL);
      // Symmetry: P(T > −t) = 1 − P(T > t); the result is ≥ ½ so relative error stays small.
      expect(Math.abs(studentTUpperTail(-t, 1) - (1 - expected)) / (1 - expected)).toBeLessThan(1e-14);
    }
  });
});

describe('t with 2 df: P(T > t) = 1/(√(2+t²)·(√(2+t²)+t))', () => {
  it('matches down to 1e-300', () => {
    for (const t of T_GRID.filter((v) => v <= 1e150)) {
      const r = Math.sqrt(2 + t * t);
      const expected = 1 / (r * (r + t)); // (1 − t/√(2+t²))/2 rationalised, exact identity
      const e = worst.record('t, ν = 2', studentTUpperTail(t, 2), expected, `t=${t}`);
      expect(e, `t=${t}`).toBeLessThan(TOL);
    }
  });
});

/**
 * Tail-sum form of Abramowitz & Stegun 26.7.3/26.7.4 (recalled from memory), with θ = atan(t/√ν),
 * z = cos²θ = ν/(ν+t²):
 *   ν even: A(t|ν) = sinθ·Σ_{k<ν/2} c_k z^k, c_k = (2k−1)!!/(2k)!!
 *   ν odd:  A(t|ν) = (2/π)[θ + sinθ cosθ·Σ_{k<(ν−1)/2} d_k z^k], d_k = (2k)!!/(2k+1)!!
 * Since Σ_{k≥0} c_k z^k = (1−z)^(−½) = 1/sinθ and sinθ cosθ·Σ_{k≥0} d_k z^k = arcsin(cosθ) = π/2 − θ,
 * the two-sided tail 1 − A is the remaining tail of a positive series, which has no cancellation:
 *   ν even: P(|T|>t) = sinθ·Σ_{k≥ν/2} c_k z^k;  ν odd: P(|T|>t) = (2/π) sinθ cosθ·Σ_{k≥(ν−1)/2} d_k z^k.
 */
function tTwoSidedSeries(t: number, nu: number): number {
  const logZ = -Math.log1p((t * t) / nu);
  const z = Math.exp(logZ);
  const even = nu % 2 === 0;
  const start = even ? nu / 2 : (nu - 1) / 2;
  // Leading coefficient by the exact ratio recurrence (few hundred steps at most here).
  let c = 1; // c_k or d_k
  for (let k = 0; k < start; k++) c *= even ? (2 * k + 1) / (2 * k + 2) : (2 * k + 2) / (2 * k + 3);
  let term = 1;
  let sum = 0;
  for (let k = start; k < start + 5_000_000; k++) {
    sum += term;
    if (term < 1e-18 * sum) break;
    term *= (even ? (2 * k + 1) / (2 * k + 2) : (2 * k + 2) / (2 * k + 3)) * z;
  }
  const sinTheta = t / Math.sqrt(nu + t * t);
  const logLead = Math.log(c) + start * logZ + Math.log(sum);
  if (even) return sinTheta * Math.exp(logLead);
  const cosTheta = Math.sqrt(nu) / Math.sqrt(nu + t * t);
  return (2 / Math.PI) * sinTheta * cosTheta * Math.exp(logLead);
}

describe('t with integer df: A&S 26.7.3/26.7.4 tail series (from memory)', () => {
  it('the tail-sum rewrite agrees with the finite A&S sums where 1 − A has no cancellation', () => {
    // Guards the rewrite itself: finite sums as printed in A&S, at t where A is far from 1.
    for (const nu of [3, 4, 7, 10]) {
      const t = 0.7;
      const theta = Math.atan(t / Math.sqrt(nu));
      const cz = Math.cos(theta) ** 2;
      let a: number;
      if (nu % 2 === 0) {
        let coef = 1;
        let s = 0;
        for (let k = 0; k < nu / 2; k++) {
          s += coef * cz ** k;
          coef *= (2 * k + 1) / (2 * k + 2);
        }
        a = Math.sin(theta) * s;
      } else {
        let coef = 1;
        let s = 0;
        for (let k = 0; k < (nu - 1) / 2; k++) {
          s += coef * cz ** k;
          coef *= (2 * k + 2) / (2 * k + 3);
        }
        a = (2 / Math.PI) * (theta + Math.sin(theta) * Math.cos(theta) * s);
      }
      expect(Math.abs(1 - a - tTwoSidedSeries(t, nu)) / (1 - a)).toBeLessThan(1e-13);
    }
  });

  for (const nu of [3, 4, 5, 6, 9, 10, 29, 30, 99, 100, 1000]) {
    it(`ν = ${nu}`, () => {
      for (const t of [0.5, 1, 2, 3, 5, 8, 13, 21, 37, 60, 100, 1e3, 1e5, 1e10, 1e30, 1e70]) {
        const expected = tTwoSidedSeries(t, nu);
        if (!(expected > 1e-300)) continue;
        const e = worst.record('t, integer ν ≤ 1000 (A&S series)', studentTTwoSidedP(t, nu), expected, `ν=${nu} t=${t}`);
        expect(e, `ν=${nu} t=${t}`).toBeLessThan(TOL);
        expect(studentTUpperTail(t, nu) / (expected / 2)).toBeCloseTo(1, 12);
      }
    });
  }
});

describe('F(2, ν): P(F > f) = (1 + 2f/ν)^(−ν/2)', () => {
  it('matches for ν from 0.5 to 1e7, p down to 1e-300', () => {
    for (const nu of [0.5, 1, 2, 3, 7.5, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7]) {
      for (let k = 0; k <= 300; k += 15) {
        // f chosen so that the exact tail is about 10^−k (and a few near the centre).
        const logP = -k * Math.LN10 - 0.1;
        const f = (nu / 2) * Math.expm1((-2 * logP) / nu);
        if (!Number.isFinite(f)) continue;
        const expected = Math.exp((-nu / 2) * Math.log1p((2 * f) / nu)); // exact closed form
        const got = fisherFUpperTail(f, 2, nu);
        const e = worst.record(nu > 1e5 ? 'F(2, ν), ν > 1e5' : 'F(2, ν), ν ≤ 1e5', got, expected, `ν=${nu} f=${f}`);
        expect(e, `ν=${nu} f=${f}`).toBeLessThan(nu > 1e5 ? TOL_LARGE_DF : TOL);
      }
    }
  });
});

describe('F(1, ν) is the square of t with ν df', () => {
  // P(F(1,ν) > t²) = P(|T| > t). Both sides share the engine's incomplete beta, so this is a
  // consistency check of the two entry points; the t values themselves are checked above.
  it('agrees to 1e-13', () => {
    for (const nu of [1, 2.5, 10, 1e3, 1e7]) {
      for (const t of [0.1, 1, 2.5, 6, 30]) {
        const e = worst.record('F(1, ν) vs t²', fisherFUpperTail(t * t, 1, nu), studentTTwoSidedP(t, nu), `ν=${nu} t=${t}`);
        expect(e).toBeLessThan(1e-13);
      }
    }
  });
});

/**
 * Abramowitz & Stegun 26.6.4 (from memory), even df1 = 2m:
 *   P(F > f) = x^{ν2/2} · Σ_{k=0}^{m−1} C(ν2/2 + k − 1, k)(1 − x)^k,  x = ν2/(ν2 + ν1 f).
 * Terms are positive; their logs follow the exact ratio (ν2/2 + k)/(k+1)·(1 − x) and are summed
 * in log space so neither x^{ν2/2} nor the sum can under- or overflow on the way.
 */
function fEvenDf1Series(f: number, df1: number, df2: number): number {
  const w = (df1 * f) / df2;
  const logX = -Math.log1p(w);
  const log1mX = Math.log(w) - Math.log1p(w);
  const a = df2 / 2;
  const logs: number[] = [];
  let lt = 0;
  for (let k = 0; k < df1 / 2; k++) {
    logs.push(lt);
    lt += Math.log((a + k) / (k + 1)) + log1mX;
  }
  return Math.exp(a * logX + logSumExp(logs));
}

describe('F with even df1: A&S 26.6.4 finite series (from memory)', () => {
  const df1s = [4, 6, 8, 10, 20, 40, 78];
  const df2s = [1, 2, 2.5, 3, 5, 10, 30, 100, 1e3, 1e4, 1e5, 1e6, 1e7];
  for (const df1 of df1s) {
    it(`df1 = ${df1}`, () => {
      for (const df2 of df2s) {
        const spread = Math.sqrt(2 / df1 + 2 / df2);
        const fs = [0.01, 0.1, 0.5, 0.9, 1, 1.1, 1.5, 2, 3, 5, 10, 30, 100, 1e3, 1e5, 1e10, 1e50, 1e100, 1e200];
        for (const k of [1, 3, 10, 20, 40, 80]) fs.push(1 + k * spread);
        for (const f of fs) {
          const expected = fEvenDf1Series(f, df1, df2);
          if (!(expected > 1e-300)) continue;
          const large = df2 > 1e5;
          const e = worst.record(
            large ? 'F(2m, ν2), ν2 > 1e5 (A&S 26.6.4)' : 'F(2m, ν2), ν2 ≤ 1e5 (A&S 26.6.4)',
            fisherFUpperTail(f, df1, df2),
            expected,
            `df=(${df1},${df2}) f=${f}`,
          );
          expect(e, `df=(${df1},${df2}) f=${f}`).toBeLessThan(large ? TOL_LARGE_DF : TOL);
        }
      }
    });
  }

  it('mirror: the same series bounds the swapped distribution through P(F(ν2,ν1) < 1/f)', () => {
    // P(F(ν2, 2m) > 1/f) = 1 − P(F(2m, ν2) > f); checked only where that difference is benign.
    for (const df2 of [3, 30, 1e3, 1e6]) {
      for (const f of [0.5, 1, 2]) {
        const direct = fEvenDf1Series(f, 6, df2);
        expect(fisherFUpperTail(1 / f, df2, 6)).toBeCloseTo(1 - direct, 12);
      }
    }
  });
});
