/**
 * One fit, many cells: the engine's content-addressed cache. Fit counts come from the cache's
 * own counter, so each assertion fails if a formula refits.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { modelCache } from '../../src/engine';
import { LruCache } from '../../src/engine/cache/lruCache';
import { covariance, estimates, fitStats, intervals, predict, stdErrors, terms } from '../../src/functions/functions';
import { randomProblem } from '../support/random';

const { y, x } = randomProblem(81, 50, 4);
const yCells = [['Yield'], ...y.map((v) => [v])];
const xCells = [['a', 'b', 'c', 'd'], ...x];

beforeEach(() => modelCache.reset());

describe('fit cache', () => {
  it('ten formulas on the same ranges and settings cause one fit', () => {
    terms(yCells, xCells);
    estimates(yCells, xCells);
    stdErrors(yCells, xCells);
    intervals(yCells, xCells);
    covariance(yCells, xCells);
    fitStats(yCells, xCells);
    predict(yCells, xCells, [[0, 0, 0, 0]]);
    terms(yCells, xCells, null, true);
    estimates(yCells, xCells, 0.95);
    stdErrors(yCells, xCells, '', '', '');
    expect(modelCache.stats().fits).toBe(1);
    expect(modelCache.stats().hits).toBe(9);
  });

  it('a recalculation that changes nothing refits nothing; a changed cell or setting refits once', () => {
    terms(yCells, xCells);
    terms(
      yCells.map((r) => [...r]),
      xCells.map((r) => [...r]),
    );
    expect(modelCache.stats().fits).toBe(1);
    const edited = yCells.map((r, i) => (i === 5 ? [(r[0] as number) + 1] : r));
    terms(edited, xCells);
    estimates(edited, xCells);
    expect(modelCache.stats().fits).toBe(2);
    terms(yCells, xCells, 0.9);
    expect(modelCache.stats().fits).toBe(3);
  });

  it('returns the same numbers from the cache as from a fresh fit', () => {
    const first = terms(yCells, xCells);
    modelCache.reset();
    expect(terms(yCells, xCells)).toEqual(first);
  });

  it('stays within its entry bound', () => {
    for (let k = 0; k < 80; k++)
      terms(
        yCells.map((r, i) => (i === 1 ? [k] : r)),
        xCells,
      );
    expect(modelCache.stats().fits).toBe(80);
    expect(modelCache.stats().entries).toBeLessThanOrEqual(64);
  });
});

describe('LruCache bounds', () => {
  it('evicts the least recently used entry past its byte budget', () => {
    const cache = new LruCache<string, number>(10, 100);
    cache.set('a', 1, 40);
    cache.set('b', 2, 40);
    cache.get('a');
    cache.set('c', 3, 40);
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBe(1);
    expect(cache.bytes).toBeLessThanOrEqual(100);
  });

  it('never stores an entry larger than the whole budget', () => {
    const cache = new LruCache<string, number>(10, 100);
    cache.set('huge', 1, 101);
    expect(cache.size).toBe(0);
  });
});
