/**
 * The stable sort order. Expected orders are worked by hand, and compared with the built-in stable
 * Array.prototype.sort (ECMAScript 2019 requires it stable) on seeded random data: common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { ascendingOrder, ascendingOrderFrom } from '../../../src/engine/infer/ascendingOrder';
import { gaussian, mulberry32 } from '../../support/random';

function byBuiltIn(values: readonly number[]): number[] {
  return values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
}

describe('ascendingOrder', () => {
  it('orders negatives, zeros of both signs, positives and infinities, ties by index', () => {
    const values = [3, -1, 0, -0, -1, Number.POSITIVE_INFINITY, -2.5, 1e-300, -1e-300, Number.NEGATIVE_INFINITY, 3];
    expect(Array.from(ascendingOrder(Float64Array.from(values)))).toEqual([9, 6, 1, 4, 8, 2, 3, 7, 0, 10, 5]);
  });

  it('agrees with the built-in stable sort on random numbers with many repeats', () => {
    const normal = gaussian(mulberry32(31));
    const values = Array.from({ length: 20000 }, (_, i) => (i % 3 === 0 ? Math.round(normal() * 4) / 4 : normal() * 10 ** Math.round(normal() * 3)));
    expect(Array.from(ascendingOrder(Float64Array.from(values)))).toEqual(byBuiltIn(values));
  });

  it('handles no values and one', () => {
    expect(ascendingOrder(new Float64Array(0))).toHaveLength(0);
    expect(Array.from(ascendingOrder(Float64Array.of(-4)))).toEqual([0]);
  });

  it('orders values whose high 32 bits tie, in short runs and in long ones', () => {
    const random = mulberry32(7);
    // 1 + k·2⁻⁴⁰ share their high half for k < 2²⁰: three runs of 3, 40 and 200 values, shuffled, with repeats.
    const values = [
      ...Array.from({ length: 3 }, () => 2 + Math.floor(random() * 3) * 2 ** -40),
      ...Array.from({ length: 40 }, () => -1 - Math.floor(random() * 30) * 2 ** -40),
      ...Array.from({ length: 200 }, () => 1 + Math.floor(random() * 150) * 2 ** -40),
    ];
    for (let i = values.length - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      [values[i], values[j]] = [values[j], values[i]];
    }
    expect(Array.from(ascendingOrder(Float64Array.from(values)))).toEqual(byBuiltIn(values));
  });
});

describe('ascendingOrderFrom', () => {
  const normal = gaussian(mulberry32(5));
  const values = Array.from({ length: 3000 }, (_, i) => (i % 4 === 0 ? Math.round(normal() * 2) / 2 : normal()));
  values[10] = -0;
  values[11] = 0;
  const expected = byBuiltIn(values);
  const sorted = Int32Array.from(expected);

  it('gives the sorted order from a guess that is nearly right', () => {
    const guess = sorted.slice();
    for (const [a, b] of [
      [0, 2999],
      [5, 6],
      [100, 1700],
      [2000, 2001],
    ])
      [guess[a], guess[b]] = [guess[b], guess[a]];
    expect(Array.from(ascendingOrderFrom(Float64Array.from(values), guess))).toEqual(expected);
  });

  it('gives the same order from any guess: shuffled, reversed, or sorted for other values', () => {
    const random = mulberry32(9);
    const shuffled = Int32Array.from(expected);
    for (let i = shuffled.length - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      [shuffled[i], shuffled[j]] = [shuffled[j], shuffled[i]];
    }
    const typed = Float64Array.from(values);
    expect(Array.from(ascendingOrderFrom(typed, shuffled))).toEqual(expected);
    expect(Array.from(ascendingOrderFrom(typed, sorted.slice().reverse()))).toEqual(expected);
    expect(
      Array.from(
        ascendingOrderFrom(
          typed,
          Int32Array.from(values, (_, i) => i),
        ),
      ),
    ).toEqual(expected);
  });

  it('leaves the guess as it was and ignores a guess of another length', () => {
    const guess = sorted.slice().reverse();
    ascendingOrderFrom(Float64Array.from(values), guess);
    expect(Array.from(guess)).toEqual(expected.slice().reverse());
    expect(Array.from(ascendingOrderFrom(Float64Array.of(2, -1, 2), Int32Array.of(0)))).toEqual([1, 0, 2]);
  });
});
