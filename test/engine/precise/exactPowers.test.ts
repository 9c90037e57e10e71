/**
 * Recognition of power columns: the double-double values must be the exact powers (checked in
 * BigInt rationals), and nothing but a rounding of x^k may be taken for one.
 */
import { describe, expect, it } from 'vitest';
import { recognisePowers } from '../../../src/engine/precise/exactPowers';
import { abs, add, exactOf, type Fraction, lessOrEqual, mul, sub } from './exact';
import { mulberry32 } from '../../support/random';

const random = mulberry32(708);

function exactPower(x: number, k: number): Fraction {
  let p: Fraction = { num: 1n, den: 1n };
  for (let i = 0; i < k; i++) p = mul(p, exactOf(x));
  return p;
}

/** |a − b| ≤ 2⁻¹⁰⁰·|b| in rationals: double-double agreement. */
const agrees = (a: Fraction, b: Fraction) => lessOrEqual(mul(abs(sub(a, b)), { num: 1n << 100n, den: 1n }), abs(b));

describe('recognisePowers', () => {
  it('takes =x^k columns (rounded in double) as x^k in double-double, for signs, zeros and k up to 12', () => {
    const x = Float64Array.from({ length: 25 }, (_, i) => (i === 3 ? 0 : (random() - 0.4) * 7));
    const columns = [x, ...Array.from({ length: 11 }, (_, k) => Float64Array.from(x, (v) => v ** (k + 2)))];
    const found = recognisePowers(columns);
    expect(found[0]).toBeUndefined();
    found.slice(1).forEach((power, c) => {
      expect(power, `x^${c + 2}`).toBeDefined();
      x.forEach((v, i) => expect(agrees(add(exactOf(power!.hi[i]), exactOf(power!.lo[i])), exactPower(v, c + 2))).toBe(true));
    });
  });

  it('accepts a power off by one unit in the last place (pow need not round correctly) but not by three', () => {
    const x = Float64Array.from({ length: 10 }, (_, i) => 1.5 + i / 7);
    const offByOne = Float64Array.from(x, (v) => v ** 5);
    offByOne[4] += 2 ** -52 * offByOne[4] * 0.99;
    expect(recognisePowers([x, offByOne])[1]).toBeDefined();
    const offByThree = Float64Array.from(x, (v) => v ** 5);
    offByThree[4] *= 1 + 3 * 2 ** -52;
    expect(recognisePowers([x, offByThree])[1]).toBeUndefined();
  });

  it('leaves alone columns that are not powers, and bases of only 0s and ±1s', () => {
    const x = Float64Array.from({ length: 12 }, () => random() * 4);
    const unrelated = Float64Array.from(x, () => random());
    const signs = Float64Array.from({ length: 12 }, (_, i) => (i % 3) - 1);
    const ones = new Float64Array(12).fill(1);
    expect(recognisePowers([x, unrelated, ones, signs])).toEqual([undefined, undefined, undefined, undefined]);
    expect(recognisePowers([signs, Float64Array.from(signs, (v) => v ** 2)])).toEqual([undefined, undefined]);
  });
});
