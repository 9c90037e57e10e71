import { describe, expect, it } from 'vitest';
import {
  fisherFQuantile,
  fisherFUpperTail,
  normalQuantile,
  normalTwoSidedP,
  normalUpperTail,
  studentTQuantile,
  studentTTwoSidedP,
  studentTUpperTail,
} from '../../../src/engine/distributions';

const INF = Number.POSITIVE_INFINITY;

describe('edge values', () => {
  it('infinite statistics give tails of exactly 0 or 1', () => {
    expect(normalUpperTail(INF)).toBe(0);
    expect(normalUpperTail(-INF)).toBe(1);
    expect(normalTwoSidedP(-INF)).toBe(0);
    expect(studentTUpperTail(INF, 3)).toBe(0);
    expect(studentTUpperTail(-INF, 3)).toBe(1);
    expect(studentTTwoSidedP(-INF, 3)).toBe(0);
    expect(fisherFUpperTail(INF, 2, 3)).toBe(0);
    expect(fisherFUpperTail(0, 2, 3)).toBe(1);
    expect(fisherFUpperTail(-1, 2, 3)).toBe(1);
  });

  it('a zero statistic sits at the centre', () => {
    expect(studentTUpperTail(0, 7)).toBe(0.5);
    expect(studentTTwoSidedP(0, 7)).toBe(1);
    expect(normalTwoSidedP(0)).toBe(1);
  });

  it('NaN in gives NaN out', () => {
    const N = Number.NaN;
    for (const v of [
      normalUpperTail(N),
      normalTwoSidedP(N),
      normalQuantile(N),
      studentTUpperTail(N, 3),
      studentTUpperTail(1, N),
      studentTTwoSidedP(N, 3),
      studentTQuantile(N, 3),
      studentTQuantile(0.3, N),
      fisherFUpperTail(N, 1, 2),
      fisherFUpperTail(1, N, 2),
      fisherFUpperTail(1, 1, N),
      fisherFQuantile(N, 1, 2),
      fisherFQuantile(0.5, 1, N),
    ]) {
      expect(v).toBeNaN();
    }
  });

  it('invalid df or probability gives NaN', () => {
    expect(studentTUpperTail(1, 0)).toBeNaN();
    expect(studentTUpperTail(1, -2)).toBeNaN();
    expect(fisherFUpperTail(1, 0, 3)).toBeNaN();
    expect(fisherFUpperTail(1, 3, -1)).toBeNaN();
    expect(normalQuantile(1.5)).toBeNaN();
    expect(studentTQuantile(-0.1, 4)).toBeNaN();
    expect(fisherFQuantile(2, 4, 5)).toBeNaN();
  });

  it('p of 0 or 1 gives the support end points', () => {
    expect(normalQuantile(0)).toBe(-INF);
    expect(normalQuantile(1)).toBe(INF);
    expect(studentTQuantile(0, 5)).toBe(-INF);
    expect(studentTQuantile(1, 5)).toBe(INF);
    expect(studentTQuantile(0.5, 5)).toBe(0);
    expect(fisherFQuantile(0, 3, 4)).toBe(0);
    expect(fisherFQuantile(1, 3, 4)).toBe(INF);
  });

  it('non-integer df lie between their integer neighbours', () => {
    // Tails increase with heavier tails (smaller ν) at a fixed t beyond the centre.
    const mid = studentTUpperTail(3, 4.5);
    expect(mid).toBeLessThan(studentTUpperTail(3, 4));
    expect(mid).toBeGreaterThan(studentTUpperTail(3, 5));
    const fMid = fisherFUpperTail(3, 2.5, 7.5);
    expect(fMid).toBeGreaterThan(0);
    expect(fMid).toBeLessThan(1);
    expect(fisherFQuantile(0.95, 2.5, 7.5)).toBeGreaterThan(fisherFQuantile(0.95, 3, 8));
  });

  it('t with 1 df stays finite where a library quantile overflows (α ≤ 1e-200)', () => {
    // Cauchy closed form: the upper quantile at α is 1/tan(πα) ≈ 1/(πα).
    const q = studentTQuantile(1e-250, 1);
    expect(q).toBeLessThan(0);
    expect(Number.isFinite(q)).toBe(true);
    expect(-q * Math.PI * 1e-250).toBeCloseTo(1, 12);
  });

  it('huge statistics whose square overflows still give representable tails', () => {
    // ν = 1: P(T > 1e300) = atan(1e-300)/π = 1e-300/π.
    expect(studentTUpperTail(1e300, 1) / (1e-300 / Math.PI)).toBeCloseTo(1, 12);
    // ν = 1.5: the tail ~ t^-1.5 is still ~1e-300 at t = 1e200, so it must not underflow to 0.
    expect(studentTUpperTail(1e200, 1.5)).toBeGreaterThan(1e-302);
    // F(1, 1): P(F > f) = (2/π)·atan(1/√f); at f = 1e300 that is 2e-150/π.
    expect(fisherFUpperTail(1e300, 1, 1) / (2e-150 / Math.PI)).toBeCloseTo(1, 12);
  });

  it('infinite df for t is the normal limit', () => {
    expect(studentTUpperTail(2, INF)).toBe(normalUpperTail(2));
    expect(studentTTwoSidedP(2, INF)).toBe(normalTwoSidedP(2));
  });

  it('upper tails stay relative-accurate far below 1e-16 (never 1 − cdf)', () => {
    expect(normalUpperTail(10)).toBeGreaterThan(7e-24);
    expect(studentTUpperTail(1e6, 10)).toBeGreaterThan(0);
    expect(fisherFUpperTail(1e6, 5, 5)).toBeGreaterThan(0);
  });
});
