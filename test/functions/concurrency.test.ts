/**
 * Excel may recalculate hundreds of PLUMB formulas in one go, over several data sets that share
 * one fit cache. Interleaving them must not let one formula see another's fit, and the cache must
 * keep to its bounds while it evicts.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { modelCache } from '../../src/engine';
import { fitStats, nestedF, predict, residuals, terms } from '../../src/functions/functions';
import { randomProblem } from '../support/random';

// The bounds modelCache is constructed with in src/engine/fitModel.ts.
const MAX_ENTRIES = 64;
const MAX_BYTES = 256 * 1024 * 1024;

interface DataSet {
  y: (string | number)[][];
  x: (string | number)[][];
  base: (string | number)[][];
  added: (string | number)[][];
  newX: number[][];
}

// Different sizes and widths, so a result taken from the wrong data set has the wrong shape or numbers.
const DATA_SETS: DataSet[] = [
  { seed: 11, n: 30, p: 2 },
  { seed: 12, n: 45, p: 3 },
  { seed: 13, n: 60, p: 4 },
  { seed: 14, n: 25, p: 3 },
  { seed: 15, n: 80, p: 5 },
].map(({ seed, n, p }) => {
  const { y, x } = randomProblem(seed, n, p);
  const names = Array.from({ length: p }, (_, j) => `x${j + 1}`);
  return {
    y: [['y'], ...y.map((v) => [v])],
    x: [names, ...x],
    base: [names.slice(0, p - 1), ...x.map((r) => r.slice(0, p - 1))],
    added: [names.slice(p - 1), ...x.map((r) => r.slice(p - 1))],
    newX: [x[0].map((v) => v + 0.5), x[1].map((v) => v - 0.25)],
  };
});

type Call = () => unknown[][];

// Twenty confidence levels over five data sets make about a hundred distinct fits: more than the
// cache holds, so the run also exercises eviction while calls interleave.
function makeCalls(): Call[] {
  const calls: Call[] = [];
  for (let i = 0; i < 200; i++) {
    const d = DATA_SETS[i % DATA_SETS.length];
    const level = 0.8 + (Math.floor(i / DATA_SETS.length) % 20) * 0.01;
    const robust = i % 7 === 0 ? 'HC3' : false;
    switch (i % 5 === 0 ? (i / 5) % 5 : i % 5) {
      case 0:
        calls.push(() => terms(d.y, d.x, level, true, undefined, undefined, robust));
        break;
      case 1:
        calls.push(() => fitStats(d.y, d.x, level, true, undefined, undefined, robust));
        break;
      case 2:
        calls.push(() => predict(d.y, d.x, d.newX, level));
        break;
      case 3:
        calls.push(() => nestedF(d.y, d.base, d.added, level));
        break;
      default:
        calls.push(() => residuals(d.y, d.x, level));
    }
  }
  return calls;
}

beforeEach(() => modelCache.reset());

describe('many formulas at once', () => {
  it('200 calls in one tick over five data sets give the results of the same calls made one by one', async () => {
    const calls = makeCalls();
    const oneByOne: unknown[][][] = [];
    for (const call of calls) oneByOne.push(call());
    const sequentialFits = modelCache.stats().fits;

    modelCache.reset();
    const together = await Promise.all(calls.map((c) => Promise.resolve().then(c)));

    expect(together).toHaveLength(200);
    expect(together).toEqual(oneByOne);
    // Every call produced a table, not an error cell, so the comparison above compares real numbers.
    for (const grid of together) expect(typeof grid[0][0] === 'string' && grid[0][0].startsWith('#')).toBe(false);
    expect(modelCache.stats().fits).toBe(sequentialFits);
  });

  it('keeps the cache within its entry and byte bounds, and consistent, after the burst', async () => {
    const calls = makeCalls();
    await Promise.all(calls.map((c) => Promise.resolve().then(c)));
    const stats = modelCache.stats();
    expect(stats.fits).toBeGreaterThan(MAX_ENTRIES);
    expect(stats.entries).toBeGreaterThan(0);
    expect(stats.entries).toBeLessThanOrEqual(MAX_ENTRIES);
    expect(stats.bytes).toBeGreaterThan(0);
    expect(stats.bytes).toBeLessThanOrEqual(MAX_BYTES);
    // A second burst over what is still cached must be served from it, and agree with fresh fits.
    const lastCalls = calls.slice(-20);
    const cached = await Promise.all(lastCalls.map((c) => Promise.resolve().then(c)));
    expect(modelCache.stats().hits).toBeGreaterThan(stats.hits);
    modelCache.reset();
    expect(lastCalls.map((c) => c())).toEqual(cached);
  });
});
