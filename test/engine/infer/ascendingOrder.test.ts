/**
 * The stable sort order. Expected orders are worked by hand, and compared with the built-in stable
 * Array.prototype.sort (ECMAScript 2019 requires it stable) on seeded random data: common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { ascendingOrder } from '../../../src/engine/infer/ascendingOrder';
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
});
