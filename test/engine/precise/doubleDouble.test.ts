import { describe, expect, it } from 'vitest';
import { ddAdd, ddDiv, ddMul, ddSqrt, pair, quickTwoSum, twoProd, twoSum } from '../../../src/engine/precise/doubleDouble';
import { abs, add, div, equal, exactOf, type Fraction, lessOrEqual, mul, sub } from './exact';
import { mulberry32 } from '../../support/random';

const random = mulberry32(20010501);
/** Doubles spread over many binades and both signs, so cancellation and carries both occur. */
function sample(): number {
  const sign = random() < 0.5 ? -1 : 1;
  return sign * (1 + random()) * 2 ** Math.floor(random() * 120 - 60);
}
const pairValue = (p: Float64Array): Fraction => add(exactOf(p[0]), exactOf(p[1]));
/** |x − exact| ≤ 2^−bits·|exact|, checked in rationals. */
function within(x: Fraction, exact: Fraction, bits: number): boolean {
  return lessOrEqual(mul(abs(sub(x, exact)), { num: 1n << BigInt(bits), den: 1n }), abs(exact));
}

describe('error-free transformations (Knuth TAOCP vol. 2; Dekker 1971)', () => {
  it('TwoSum and FastTwoSum: hi + lo equals the exact sum, hi is the rounded sum', () => {
    const out = pair();
    for (let trial = 0; trial < 2000; trial++) {
      const a = sample();
      const b = trial % 3 === 0 ? -a * (1 + 2 ** -40) : sample();
      twoSum(a, b, out);
      expect(equal(pairValue(out), add(exactOf(a), exactOf(b)))).toBe(true);
      expect(out[0]).toBe(a + b);
      const [big, small] = Math.abs(a) >= Math.abs(b) ? [a, b] : [b, a];
      quickTwoSum(big, small, out);
      expect(equal(pairValue(out), add(exactOf(a), exactOf(b)))).toBe(true);
    }
  });

  it('TwoProd with Veltkamp splitting: hi + lo equals the exact product', () => {
    const out = pair();
    for (let trial = 0; trial < 2000; trial++) {
      const a = sample();
      const b = sample();
      twoProd(a, b, out);
      expect(equal(pairValue(out), mul(exactOf(a), exactOf(b)))).toBe(true);
      expect(out[0]).toBe(a * b);
    }
  });
});

describe('double-double operations (Hida, Li & Bailey 2001): about 104 correct bits', () => {
  function ddSample(): [number, number] {
    const hi = sample();
    return [hi, hi * (random() - 0.5) * 2 ** -53];
  }
  it('add, mul, div and sqrt agree with exact rationals to 2^-100 relative', () => {
    const out = pair();
    for (let trial = 0; trial < 500; trial++) {
      const [ah, al] = ddSample();
      const [bh, bl] = ddSample();
      const a = add(exactOf(ah), exactOf(al));
      const b = add(exactOf(bh), exactOf(bl));
      ddAdd(ah, al, bh, bl, out);
      const sum = add(a, b);
      if (sum.num !== 0n) expect(within(pairValue(out), sum, 100)).toBe(true);
      ddMul(ah, al, bh, bl, out);
      expect(within(pairValue(out), mul(a, b), 100)).toBe(true);
      ddDiv(ah, al, bh, bl, out);
      expect(within(pairValue(out), div(a, b), 100)).toBe(true);
      ddSqrt(Math.abs(ah), Math.sign(ah) * al, out);
      const root = pairValue(out);
      // √ is checked through its square: (1 ± 2⁻¹⁰⁰)² stays within 2⁻⁹⁹ of |a|.
      expect(within(mul(root, root), abs(a), 99)).toBe(true);
    }
  });
});
