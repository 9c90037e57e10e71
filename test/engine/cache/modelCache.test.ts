/**
 * The fit cache finds a model frame's fit by its data object only while it still holds that fit.
 * Common practice (no source): a memo in front of a bounded cache must not outlive the cache's
 * entry, and must key on everything the value depends on.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame } from '../../../src/engine';
import { ModelCache } from '../../../src/engine/cache/modelCache';
import { randomProblem } from '../../support/random';

const frameOf = (seed: number) => {
  const { y, x } = randomProblem(seed, 30, 2);
  return buildModelFrame({ y: y.map((v) => [v]), x: [x], intercept: true }).data;
};
const size = (): number => 1;

describe('ModelCache', () => {
  it('answers the same data object and settings from one fit, other settings from their own', () => {
    const cache = new ModelCache<object>(8, 1 << 20);
    const data = frameOf(1);
    const first = cache.getOrCompute(data, {}, () => ({}), size);
    expect(cache.getOrCompute(data, {}, () => ({}), size)).toBe(first);
    const robust = cache.getOrCompute(data, { covariance: 'HC3' }, () => ({}), size);
    expect(robust).not.toBe(first);
    expect(cache.getOrCompute(data, { covariance: 'HC3' }, () => ({}), size)).toBe(robust);
    expect(cache.stats()).toMatchObject({ fits: 2, hits: 2 });
  });

  it('fits again once the entry is evicted or the cache reset', () => {
    const cache = new ModelCache<object>(1, 1 << 20);
    const [a, b] = [frameOf(2), frameOf(3)];
    const first = cache.getOrCompute(a, {}, () => ({}), size);
    cache.getOrCompute(b, {}, () => ({}), size);
    const again = cache.getOrCompute(a, {}, () => ({}), size);
    expect(again).not.toBe(first);
    cache.reset();
    expect(cache.getOrCompute(a, {}, () => ({}), size)).not.toBe(again);
    expect(cache.stats()).toMatchObject({ fits: 1, hits: 0 });
  });

  it('finds equal numbers in another data object by their content', () => {
    const cache = new ModelCache<object>(8, 1 << 20);
    const data = frameOf(4);
    const first = cache.getOrCompute(data, {}, () => ({}), size);
    const plain = { y: [...data.y], x: data.x.map((row) => [...row]) };
    expect(cache.getOrCompute(plain, {}, () => ({}), size)).toBe(first);
  });
});
