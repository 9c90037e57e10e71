/**
 * PLUMB.RESIDUALS through the any[][] interface Excel uses. The numbers themselves are checked
 * against an independent oracle in test/engine/infer/influence.test.ts; here the concern is the
 * layout a user reads: the header, the Row numbers that lead back to the data, the flags, and
 * that no cell ever holds NaN or ±∞. Planted points and thresholds are common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { residuals } from '../../src/functions/functions';
import { column, columns, thrownBy } from '../support/cells';
import { randomProblem } from '../support/random';

const HEADER = ['Row', 'Fitted', 'Residual', 'Standardized', 'Studentized', 'Leverage', "Cook's distance", 'DFFITS', 'Flag'];
const FLAG = 8;

function expectOnlyFiniteNumbersOrText(grid: unknown[][]): void {
  for (const row of grid) {
    expect(row).toHaveLength(HEADER.length);
    for (const cell of row) expect(typeof cell === 'string' || (typeof cell === 'number' && Number.isFinite(cell))).toBe(true);
  }
}

describe('PLUMB.RESIDUALS', () => {
  it('numbers each row by its place in the input range: a header is row 1 and a skipped row leaves a gap', () => {
    const { y, x } = randomProblem(21, 8, 1);
    const yCells = column('Yield', y.map((v, i) => (i === 2 ? null : v)));
    const grid = residuals(yCells, columns(['Dose'], x));
    expect(grid[0]).toEqual(HEADER);
    expect(grid.slice(1).map((r) => r[0])).toEqual([2, 3, 5, 6, 7, 8, 9]);
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('without a header the first data row is row 1, and residual = y − fitted on every line', () => {
    const { y, x } = randomProblem(22, 10, 2);
    const grid = residuals(column(undefined, y), x);
    expect(grid).toHaveLength(11);
    expect(grid.slice(1).map((r) => r[0])).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    grid.slice(1).forEach((r, i) => expect((r[1] as number) + (r[2] as number)).toBeCloseTo(y[i], 12));
    const leverageSum = grid.slice(1).reduce((s, r) => s + (r[5] as number), 0);
    expect(leverageSum).toBeCloseTo(3, 12);
  });

  it('flags a planted outlier as an outlier and a far-out x that follows the trend as high leverage only', () => {
    const { y, x, beta } = randomProblem(23, 30, 1);
    const yPlanted = [...y];
    yPlanted[10] += 10;
    const xPlanted = x.map((r) => [...r]);
    xPlanted[20] = [8];
    // Row 20 keeps its own noise but moves along the true line, so it is far out without being off-trend.
    yPlanted[20] = 1 + 8 * beta[0] + (y[20] - 1 - beta[0] * x[20][0]);
    const grid = residuals(column('y', yPlanted), columns(['x'], xPlanted));
    const flags = grid.slice(1).map((r) => r[FLAG] as string);
    expect(flags[10]).toContain('outlier');
    expect(flags[20]).toContain('high leverage');
    expect(flags[20]).not.toContain('outlier');
    flags.forEach((f, i) => {
      if (i !== 10) expect(f).not.toContain('outlier');
      if (i !== 20) expect(f).not.toContain('high leverage');
    });
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('a row alone on a category has leverage 1: its scaled cells are blank and the flag says why', () => {
    const y = [['y'], [3.1], [4.2], [2.9], [5.5], [4.8], [6.1], [3.3], [4.4], [3.9], [5.2], [2.7]];
    const x = [['Dose', 'Batch'], [1, 'A'], [2, 'B'], [1.5, 'A'], [3, 'B'], [2.5, 'A'], [3.5, 'C'], [1.2, 'B'], [2.2, 'A'], [1.8, 'B'], [2.9, 'A'], [0.8, 'B']];
    const grid = residuals(y, x);
    const row = grid.find((r) => r[0] === 7)!;
    expect(row[5]).toBeCloseTo(1, 12);
    expect(row.slice(3, 5)).toEqual(['', '']);
    expect(row.slice(6, 8)).toEqual(['', '']);
    expect(row[FLAG]).toBe('high leverage, leverage 1: fit passes through this row');
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('an exact fit: residuals 0, scaled cells blank, every flag says exact fit', () => {
    const x = [[1], [2], [3], [4], [6]];
    const grid = residuals(column(undefined, x.map(([v]) => 2 + 0.5 * v)), x);
    for (const row of grid.slice(1)) {
      expect(row[2]).toBe(0);
      expect(row.slice(3, 5)).toEqual(['', '']);
      expect(row[FLAG]).toMatch(/^exact fit/);
    }
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('one row more than parameters: studentized and DFFITS blank, the flag says why', () => {
    const grid = residuals([[1], [3], [2]], [[1.5], [2], [4.5]]);
    for (const row of grid.slice(1)) {
      expect(row[4]).toBe('');
      expect(row[7]).toBe('');
      expect(typeof row[3]).toBe('number');
      expect(row[FLAG]).toContain('nothing left to estimate sigma without this row');
    }
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('known_sigma and weights reach the diagnostics: the standardized column scales as √w/σ', () => {
    const { y, x } = randomProblem(24, 12, 1);
    const weights = column(undefined, y.map((_, i) => (i === 0 ? 4 : 1)));
    const plain = residuals(column(undefined, y), x, null, null, 2);
    const weighted = residuals(column(undefined, y), x, null, null, 2, weights);
    const first = (g: unknown[][]) => g[1] as number[];
    expect(first(plain)[3]).toBeCloseTo(first(plain)[2] / (2 * Math.sqrt(1 - first(plain)[5])), 12);
    expect(first(weighted)[3]).toBeCloseTo((2 * first(weighted)[2]) / (2 * Math.sqrt(1 - first(weighted)[5])), 12);
  });

  it('fails like every PLUMB function: #VALUE! with the message', () => {
    const error = thrownBy(() => residuals([[1], [2]], [[1], [2]]));
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toMatch(/more rows than parameters/);
  });
});

describe('PLUMB.QQPOINTS', () => {
  it('lists the finite studentized residuals sorted, with Blom normal quantiles and their rows', async () => {
    const { qqPoints, residuals } = await import('../../src/functions/functions');
    const y = [['y'], [1.2], [2.1], [2.8], [4.4], [4.9], [6.3], [6.8]];
    const x = [['t'], [1], [2], [3], [4], [5], [6], [7]];
    const points = qqPoints(y, x);
    expect(points[0]).toEqual(['Normal quantile', 'Studentized residual', 'Row']);
    const table = residuals(y, x);
    const studentized = table.slice(1).map((r) => r[4] as number).sort((a, b) => a - b);
    expect(points.slice(1).map((r) => r[1])).toEqual(studentized);
    // Blom position for the middle of 7 points is exactly 1/2, whose normal quantile is 0.
    expect(points[4][0]).toBe(0);
    expect(points.slice(1).map((r) => r[2]).sort()).toEqual([2, 3, 4, 5, 6, 7, 8]);
  });
});
