import { afterAll, describe, expect, it } from 'vitest';
import { fisherFUpperTail, studentTTwoSidedP, studentTUpperTail } from '../../../src/engine/distributions';
import { WorstErrors } from './errorTable';
import { fUpperBySeries, fUpperEvenDf1, fUpperTwoDf1, tTwoSided } from './support/references';

// Exact identities and series, each independent of the implementation (no shared code). Those that
// are accurate to a few ulps in double are evaluated in double; the rest in 320-bit fixed point
// (support/references.ts), so every reference is good to far below the spec's 1e-12 relative
// tolerance, which holds on the full grid, large df included.

const worst = new WorstErrors();
afterAll(() => worst.print('closed forms and exact series: worst relative error per family'));

const TOL = 1e-12;

/** Statistics giving upper tails spread from ~0.5 down past 1e-300, with a few near the centre. */
const T_GRID = [1e-8, 0.01, 0.3, 1, 2, 3, 5, 10, 37, 100, 1e3, 1e5, 1e10, 1e30, 1e75, 1e100, 1e150, 1e200, 1e300];

describe('t with 1 df (Cauchy): P(T > t) = atan(1/t)/π for t > 0 (common practice, no source)', () => {
  it('matches down to 1e-300', () => {
    for (const t of T_GRID) {
      // Four roundings in double (1/t, atan, π, the division): good to about 1e-15.
      const expected = Math.atan(1 / t) / Math.PI;
      const e = worst.record('t, ν = 1 (Cauchy)', studentTUpperTail(t, 1), expected, `t=${t}`);
      expect(e, `t=${t}`).toBeLessThan(TOL);
      // Symmetry: P(T > −t) = 1 − P(T > t); the result is ≥ ½ so relative error stays small.
      expect(Math.abs(studentTUpperTail(-t, 1) - (1 - expected)) / (1 - expected)).toBeLessThan(1e-14);
    }
  });
});

describe('t with 2 df: P(T > t) = 1/(√(2+t²)·(√(2+t²)+t)) (common practice, no source)', () => {
  it('matches down to 1e-300', () => {
    for (const t of T_GRID.filter((v) => v <= 1e150)) {
      const r = Math.sqrt(2 + t * t);
      // (1 − t/√(2+t²))/2 rationalised; a handful of roundings in double, good to about 1e-15.
      const expected = 1 / (r * (r + t));
      const e = worst.record('t, ν = 2', studentTUpperTail(t, 2), expected, `t=${t}`);
      expect(e, `t=${t}`).toBeLessThan(TOL);
    }
  });
});

describe('t with integer df: Abramowitz & Stegun 26.7.3/26.7.4 (from memory), 320-bit', () => {
  for (const nu of [3, 4, 5, 6, 9, 10, 29, 30, 99, 100, 1000]) {
    it(`ν = ${nu}`, () => {
      for (const t of [0.5, 1, 2, 3, 5, 8, 13, 21, 37, 60, 100, 1e3, 1e5, 1e10, 1e30, 1e70]) {
        const expected = tTwoSided(t, nu);
        if (!(expected > 1e-300)) continue;
        const e = worst.record('t, integer ν ≤ 1000 (A&S series)', studentTTwoSidedP(t, nu), expected, `ν=${nu} t=${t}`);
        expect(e, `ν=${nu} t=${t}`).toBeLessThan(TOL);
        expect(worst.record('t, integer ν ≤ 1000 (A&S series)', studentTUpperTail(t, nu), expected / 2, `ν=${nu} t=${t}`)).toBeLessThan(TOL);
      }
    });
  }
});

describe('F(2, ν): P(F > f) = (1 + 2f/ν)^(−ν/2) (common practice, no source), 320-bit', () => {
  it('matches for ν from 0.5 to 1e7, p down to 1e-300', () => {
    for (const nu of [0.5, 1, 2, 3, 7.5, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7]) {
      for (let k = 0; k <= 300; k += 15) {
        // f chosen so that the exact tail is about 10^−k (and a few near the centre).
        const logP = -k * Math.LN10 - 0.1;
        const f = (nu / 2) * Math.expm1((-2 * logP) / nu);
        if (!Number.isFinite(f)) continue;
        const expected = fUpperTwoDf1(f, nu);
        const got = fisherFUpperTail(f, 2, nu);
        const e = worst.record(nu > 1e5 ? 'F(2, ν), ν > 1e5' : 'F(2, ν), ν ≤ 1e5', got, expected, `ν=${nu} f=${f}`);
        expect(e, `ν=${nu} f=${f}`).toBeLessThan(TOL);
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
 * log P(F > f) for even df1 by the same A&S 26.6.4 sum in double, only to place grid points at
 * chosen tail sizes; the checks themselves use the 320-bit evaluation.
 */
function logUpperEvenDf1Approx(f: number, df1: number, df2: number): number {
  const w = (df1 * f) / df2;
  const a = df2 / 2;
  const logY = Math.log(w) - Math.log1p(w);
  const logs: number[] = [];
  let lt = 0;
  for (let k = 0; k < df1 / 2; k++) {
    logs.push(lt);
    lt += Math.log((a + k) / (k + 1)) + logY;
  }
  const m = Math.max(...logs);
  return -a * Math.log1p(w) + m + Math.log(logs.reduce((s, l) => s + Math.exp(l - m), 0));
}

/** f with P(F > f) ≈ 10^−k, by bisection in log f. */
function fAtTail(k: number, df1: number, df2: number): number {
  let lo = Math.log(1e-3);
  let hi = Math.log(1e7);
  for (let i = 0; i < 100; i++) {
    const mid = (lo + hi) / 2;
    if (logUpperEvenDf1Approx(Math.exp(mid), df1, df2) > -k * Math.LN10) lo = mid;
    else hi = mid;
  }
  return Math.exp((lo + hi) / 2);
}

describe('F with even df1: Abramowitz & Stegun 26.6.4 finite series (from memory), 320-bit', () => {
  const df1s = [4, 6, 8, 10, 20, 40, 78];
  const df2s = [1, 2, 2.5, 3, 5, 10, 30, 100, 1e3, 1e4, 1e5, 1e6, 1e7];
  for (const df1 of df1s) {
    it(`df1 = ${df1}`, () => {
      for (const df2 of df2s) {
        const spread = Math.sqrt(2 / df1 + 2 / df2);
        const fs = [0.01, 0.1, 0.5, 0.9, 1, 1.1, 1.5, 2, 3, 5, 10, 30, 100, 1e3, 1e5, 1e10, 1e50, 1e100, 1e200];
        for (const k of [1, 3, 10, 20, 40, 80]) fs.push(1 + k * spread);
        for (const f of fs) {
          const expected = fUpperEvenDf1(f, df1, df2);
          if (!(expected > 1e-300)) continue;
          const family = df2 > 1e5 ? 'F(2m, ν2), ν2 > 1e5 (A&S 26.6.4)' : 'F(2m, ν2), ν2 ≤ 1e5 (A&S 26.6.4)';
          const e = worst.record(family, fisherFUpperTail(f, df1, df2), expected, `df=(${df1},${df2}) f=${f}`);
          expect(e, `df=(${df1},${df2}) f=${f}`).toBeLessThan(TOL);
        }
      }
    });
  }

  // The pairs where a library incomplete beta that forms 1 − x inside erred by 1e-11 to 3e-10.
  for (const df2 of [1e5, 1e6, 1e7]) {
    it(`df2 = ${df2}: tails from 0.5 down to 1e-300`, () => {
      for (const df1 of [4, 6, 10, 20, 40, 78]) {
        for (const k of [0.3, 1, 2, 3, 5, 8, 10, 15, 20, 30, 50, 75, 100, 150, 200, 250, 300]) {
          const f = fAtTail(k, df1, df2);
          const expected = fUpperEvenDf1(f, df1, df2);
          const e = worst.record('F(2m, ν2), ν2 ≥ 1e5, p to 1e-300', fisherFUpperTail(f, df1, df2), expected, `df=(${df1},${df2}) p≈1e-${k}`);
          expect(e, `df=(${df1},${df2}) f=${f}`).toBeLessThan(TOL);
        }
      }
    });
  }

  it('mirror: P(F(ν2, 2m) > 1/f) = 1 − P(F(2m, ν2) > f), where that difference is benign', () => {
    for (const df2 of [3, 30, 1e3, 1e6]) {
      for (const f of [0.5, 1, 2]) {
        const expected = 1 - fUpperEvenDf1(f, 6, df2); // between 0.03 and 0.97 here
        expect(worst.record('F mirror (A&S 26.6.4)', fisherFUpperTail(1 / f, df2, 6), expected, `df2=${df2} f=${f}`)).toBeLessThan(TOL);
      }
    }
  });
});

describe('F with both df large: DLMF 8.17.8 series (from memory), 320-bit', () => {
  // The continued fraction and the large-parameter expansion with df up to 1e7 on both sides, and
  // pairs far apart, where the tail is most sensitive to how λ = a − (a+b)·x is formed.
  const pairs: Array<[number, number]> = [
    [1e5, 1e5],
    [1e6, 1e6],
    [1e7, 1e7],
    [1e6, 1e7],
    [1e7, 1e6],
    [1e5, 1e7],
    [1e7, 1e5],
    [3001, 1e6],
    [3908.5, 914614],
    [4436325, 2895.5],
    [2e6, 1700],
  ];
  for (const [df1, df2] of pairs) {
    it(`df = (${df1}, ${df2})`, () => {
      const spread = Math.sqrt(2 / df1 + 2 / df2); // standard deviation of log F, roughly
      for (const m of [0.1, 0.5, 1, 2, 4, 8, 16, 24, 30, 35]) {
        const f = Math.exp(m * spread);
        const expected = fUpperBySeries(f, df1, df2);
        if (!(expected > 1e-300)) continue;
        const e = worst.record('F, both df large (DLMF 8.17.8)', fisherFUpperTail(f, df1, df2), expected, `df=(${df1},${df2}) f=${f}`);
        expect(e, `df=(${df1},${df2}) f=${f}`).toBeLessThan(TOL);
      }
    });
  }
});
