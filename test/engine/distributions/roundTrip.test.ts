import { afterAll, describe, expect, it } from 'vitest';
import { fisherFQuantile, fisherFUpperTail, normalQuantile, normalUpperTail, studentTQuantile, studentTUpperTail } from '../../../src/engine/distributions';
import { decades, WorstErrors } from './errorTable';

// Round trips upperTail(quantile(p)) ≈ p are a consistency check between our own functions, not an
// external reference: they catch a quantile that misses its target, while the tails themselves
// are pinned by the closed forms. A quantile can at best be correctly rounded, and that half-ulp
// moves the tail by κ·ε/2 relative, κ = |d log P / d log x|; κ reaches ~1e3 at p = 1e-300 for
// light tails, so the tolerance is max(1e-12, 8·κ·ε) and κ is reported with the worst case.

const EPS = 2.220446049250313e-16;
const worst = new WorstErrors();
afterAll(() => worst.print('quantile round trips: worst relative error per family'));

function kappa(tail: (x: number) => number, x: number): number {
  const h = 1e-7;
  return Math.abs(Math.log(tail(x * (1 + h)) / tail(x * (1 - h)))) / (2 * h);
}

const SMALL_P = [0.5, 0.4, 0.25, 0.1, 0.05, 0.025, 0.01, ...decades(3, 300, 9), 1e-300];
// Upper-tail levels expressible as 1 − p with p a double; alpha is then recovered exactly as 1 − p.
const UPPER_ALPHA = [0.4, 0.1, 0.05, 0.01, 1e-3, 1e-5, 1e-8, 1e-12, 1e-15];

function check(family: string, got: number, target: number, k: number, at: string): void {
  const tol = Math.max(1e-12, 8 * k * EPS);
  const e = worst.record(family, got, target, `${at} κ=${k.toPrecision(3)}`);
  expect(e, `${family} ${at}`).toBeLessThan(tol);
}

describe('normal quantile round trip', () => {
  it('lower tail p from 0.5 to 1e-300', () => {
    for (const p of SMALL_P) {
      const z = normalQuantile(p);
      if (p === 0.5) {
        expect(z).toBe(0);
        continue;
      }
      // By symmetry P(Z ≤ z) = P(Z > −z), which the upper tail evaluates without 1 − (…).
      const tail = (x: number) => normalUpperTail(x);
      check('normal', tail(-z), p, kappa(tail, -z), `p=${p}`);
    }
  });
  it('upper tail through p = 1 − alpha', () => {
    for (const a of UPPER_ALPHA) {
      const p = 1 - a;
      const alpha = 1 - p; // exact (Sterbenz)
      const z = normalQuantile(p);
      check('normal', normalUpperTail(z), alpha, kappa(normalUpperTail, z), `1-p=${alpha}`);
    }
  });
});

describe('Student t quantile round trip', () => {
  const dfs = [1, 1.5, 2, 2.5, 3, 5, 10, 30, 100, 1e3, 1e4, 1e5, 1e6, 1e7];
  for (const df of dfs) {
    it(`ν = ${df}`, () => {
      const tail = (x: number) => studentTUpperTail(x, df);
      for (const p of SMALL_P) {
        const q = studentTQuantile(p, df);
        if (p === 0.5) {
          expect(q).toBe(0);
          continue;
        }
        check('t', tail(-q), p, kappa(tail, -q), `ν=${df} p=${p}`);
      }
      for (const a of UPPER_ALPHA) {
        const p = 1 - a;
        const q = studentTQuantile(p, df);
        check('t', tail(q), 1 - p, kappa(tail, q), `ν=${df} 1-p=${1 - p}`);
      }
    });
  }
});

describe('F quantile round trip', () => {
  const dfs = [1, 2, 3, 4.5, 10, 30, 78, 1e3, 1e5, 1e7];
  for (const df1 of dfs) {
    it(`df1 = ${df1}`, () => {
      for (const df2 of dfs) {
        const upper = (x: number) => fisherFUpperTail(x, df1, df2);
        for (const a of UPPER_ALPHA) {
          const p = 1 - a;
          const q = fisherFQuantile(p, df1, df2);
          check('F (critical values)', upper(q), 1 - p, kappa(upper, q), `(${df1},${df2}) 1-p=${1 - p}`);
        }
        // Lower tail: P(F(df1,df2) ≤ q) = P(F(df2,df1) ≥ 1/q), an upper tail again.
        const swapped = (x: number) => fisherFUpperTail(x, df2, df1);
        for (const p of SMALL_P) {
          const q = fisherFQuantile(p, df1, df2);
          if (q === 0) {
            // Only acceptable when the true quantile is below the smallest double: then even the
            // largest finite 1/q leaves more than p in the swapped upper tail.
            expect(swapped(Number.MAX_VALUE), `(${df1},${df2}) p=${p}`).toBeGreaterThan(p);
            continue;
          }
          check('F (lower tail)', swapped(1 / q), p, kappa(swapped, 1 / q), `(${df1},${df2}) p=${p}`);
        }
      }
    });
  }
});
