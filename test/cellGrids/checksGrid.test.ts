/**
 * CHECKS' grid: one fixed list of rows whatever the data (a live spill must keep its size), no NaN
 * or ±∞ in any cell, and every blank value beside a reading that says why. The numbers themselves
 * are checked against R in test/functions/checksReference.test.ts; the layout is our own (common
 * practice, no source, for grouping each test's statistic, p-value and reading together).
 */
import { describe, expect, it } from 'vitest';
import { CHECKS_LABELS, checksGrid } from '../../src/cellGrids/checksGrid';
import { assumptionChecks, buildModelFrame } from '../../src/engine';
import { gaussian, mulberry32, randomProblem } from '../support/random';

function gridOf(y: number[], x: number[][]) {
  const frame = buildModelFrame({ y: y.map((v) => [v]), x: [x], intercept: true });
  return checksGrid(assumptionChecks(frame.data, undefined, frame.usedRows), frame);
}

/** What explains a blank value: the next text below it in its block (its reading, or the "at row" beside Cook's distance). */
function readingFor(grid: ReturnType<typeof gridOf>, i: number): string {
  for (let j = i + 1; j < grid.length; j++) if (typeof grid[j][1] === 'string' && grid[j][1] !== '') return String(grid[j][1]);
  return '';
}

const cases: [string, () => ReturnType<typeof gridOf>][] = [
  ['ordinary data', () => gridOf(randomProblem(101, 30, 2).y, randomProblem(101, 30, 2).x)],
  [
    'replicated settings',
    () => {
      const normal = gaussian(mulberry32(102));
      const x = Array.from({ length: 24 }, (_, i) => [i % 6]);
      return gridOf(
        x.map(([v]) => 1 + v + normal()),
        x,
      );
    },
  ],
  [
    'an exact fit',
    () => {
      const x = [[1], [2], [3], [4], [6]];
      return gridOf(
        x.map(([v]) => 2 + 0.5 * v),
        x,
      );
    },
  ],
  ['rows = parameters + 1', () => gridOf(randomProblem(103, 4, 2).y, randomProblem(103, 4, 2).x)],
];

describe('CHECKS grid', () => {
  it.each(cases)('%s: the same labels in the same order, finite numbers or text only', (_, make) => {
    const grid = make();
    expect(grid.map((r) => r[0])).toEqual([...CHECKS_LABELS]);
    for (const [, value] of grid) expect(typeof value === 'string' || (typeof value === 'number' && Number.isFinite(value))).toBe(true);
  });

  it.each(cases)('%s: every blank value has a non-empty reading after it', (_, make) => {
    const grid = make();
    grid.forEach(([, value], i) => {
      if (value === '') expect(readingFor(grid, i)).not.toBe('');
    });
  });

  it('the lack-of-fit degrees of freedom show only with replicated settings', () => {
    const replicated = cases[1][1]();
    const valueOf = (grid: ReturnType<typeof gridOf>, label: string) => grid.find((r) => r[0] === label)?.[1];
    // 6 settings, 2 parameters, 24 rows: 4 and 18 (NIST/SEMATECH e-Handbook §4.4.4: df_lack = c − p, df_pure = n − c).
    expect([valueOf(replicated, 'LOF df'), valueOf(replicated, 'Pure-error df')]).toEqual([4, 18]);
    const plain = cases[0][1]();
    expect([valueOf(plain, 'LOF df'), valueOf(plain, 'Pure-error df')]).toEqual(['', '']);
    expect(valueOf(cases[3][1](), 'DW method')).toBe('');
  });
});
