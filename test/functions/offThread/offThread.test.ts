/**
 * Where a PLUMB call runs: in place at the live size and below, and wherever no Worker exists
 * (Node, these tests); the counting of a call's cells. Apart from formulaWorker.test.ts, whose
 * import marks every call as already off the main thread. Expectations worked by hand (common
 * practice (no source)); the browser side is test/preview/browser/longTasksAboveLiveSize.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { offThreadWhenLarge, OFF_THREAD_CELLS, rangeCells } from '../../../src/functions/offThread/offThread';

const u = undefined;
const response = [['Yield'], ...Array.from({ length: 30 }, (_, i) => [i])];
const predictors = [['Temp', 'Time'], ...Array.from({ length: 30 }, (_, i) => [i, -i])];

describe('where a call runs', () => {
  it('counts the cells of range arguments only', () => {
    expect(rangeCells([response, predictors, 0.95, 'HC3', null])).toBe(31 + 62);
  });

  it('runs in place where there is no Worker (Node), however many cells', () => {
    expect(typeof Worker).toBe('undefined');
    const big = Array.from({ length: OFF_THREAD_CELLS + 1 }, () => [1]);
    let ran = 0;
    const grid = offThreadWhenLarge('terms', [big], u, () => {
      ran++;
      return [['here']];
    });
    expect(grid).toEqual([['here']]);
    expect(ran).toBe(1);
  });
});
