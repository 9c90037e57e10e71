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

// Contract C6 of issue 13 (common practice (no source) for the diagnostics themselves).
const HEADER = ['Row', 'Observed', 'Fitted', 'Residual', 'Standardized', 'Studentized', 'Leverage', "Cook's distance", 'DFFITS', 'Flag'];
const [ROW, OBSERVED, FITTED, RESIDUAL, STANDARDIZED, STUDENTIZED, LEVERAGE, COOKS, DFFITS, FLAG] = HEADER.map((_, i) => i);

function expectOnlyFiniteNumbersOrText(grid: unknown[][]): void {
  for (const row of grid) {
    expect(row).toHaveLength(HEADER.length);
    for (const cell of row) expect(typeof cell === 'string' || (typeof cell === 'number' && Number.isFinite(cell))).toBe(true);
  }
}

describe('PLUMB.RESIDUALS', () => {
  it('numbers each row by its place in the input range: a header is row 1 and a skipped row leaves a gap', () => {
    const { y, x } = randomProblem(21, 8, 1);
    const yCells = column(
      'Yield',
      y.map((v, i) => (i === 2 ? null : v)),
    );
    const grid = residuals(yCells, columns(['Dose'], x));
    expect(grid[0]).toEqual(HEADER);
    expect(grid.slice(1).map((r) => r[ROW])).toEqual([2, 3, 5, 6, 7, 8, 9]);
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('without a header the first data row is row 1, and residual = y − fitted on every line', () => {
    const { y, x } = randomProblem(22, 10, 2);
    const grid = residuals(column(undefined, y), x);
    expect(grid).toHaveLength(11);
    expect(grid.slice(1).map((r) => r[ROW])).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    grid.slice(1).forEach((r, i) => {
      expect(r[OBSERVED]).toBe(y[i]);
      expect((r[FITTED] as number) + (r[RESIDUAL] as number)).toBeCloseTo(y[i], 12);
    });
    const leverageSum = grid.slice(1).reduce((s, r) => s + (r[LEVERAGE] as number), 0);
    expect(leverageSum).toBeCloseTo(3, 12);
  });

  it('flags a planted outlier as a large residual and a far-out x that follows the trend as high leverage only', () => {
    const { y, x, beta } = randomProblem(23, 30, 1);
    const yPlanted = [...y];
    yPlanted[10] += 10;
    const xPlanted = x.map((r) => [...r]);
    xPlanted[20] = [8];
    // Row 20 keeps its own noise but moves along the true line, so it is far out without being off-trend.
    yPlanted[20] = 1 + 8 * beta[0] + (y[20] - 1 - beta[0] * x[20][0]);
    const grid = residuals(column('y', yPlanted), columns(['x'], xPlanted));
    const flags = grid.slice(1).map((r) => r[FLAG] as string);
    expect(flags[10]).toContain('large residual (|t| over 3)');
    expect(flags[20]).toContain('high leverage');
    expect(flags[20]).not.toContain('large residual');
    flags.forEach((f, i) => {
      if (i !== 10) expect(f).not.toContain('large residual');
      if (i !== 20) expect(f).not.toContain('high leverage');
    });
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('a row alone on a category has leverage 1: its scaled cells are blank and the flag says why', () => {
    const y = [['y'], [3.1], [4.2], [2.9], [5.5], [4.8], [6.1], [3.3], [4.4], [3.9], [5.2], [2.7]];
    const x = [
      ['Dose', 'Batch'],
      [1, 'A'],
      [2, 'B'],
      [1.5, 'A'],
      [3, 'B'],
      [2.5, 'A'],
      [3.5, 'C'],
      [1.2, 'B'],
      [2.2, 'A'],
      [1.8, 'B'],
      [2.9, 'A'],
      [0.8, 'B'],
    ];
    const grid = residuals(y, x);
    const row = grid.find((r) => r[ROW] === 7)!;
    expect(row[LEVERAGE]).toBeCloseTo(1, 12);
    expect([row[STANDARDIZED], row[STUDENTIZED]]).toEqual(['', '']);
    expect([row[COOKS], row[DFFITS]]).toEqual(['', '']);
    expect(row[FLAG]).toBe('high leverage (over 2p/n), leverage 1: fit passes through this row');
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('an exact fit: residuals 0, scaled cells blank, every flag says exact fit', () => {
    const x = [[1], [2], [3], [4], [6]];
    const grid = residuals(
      column(
        undefined,
        x.map(([v]) => 2 + 0.5 * v),
      ),
      x,
    );
    for (const row of grid.slice(1)) {
      expect(row[RESIDUAL]).toBe(0);
      expect([row[STANDARDIZED], row[STUDENTIZED]]).toEqual(['', '']);
      expect(row[FLAG]).toMatch(/^exact fit/);
    }
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('one row more than parameters: studentized and DFFITS blank, the flag says why', () => {
    const grid = residuals([[1], [3], [2]], [[1.5], [2], [4.5]]);
    for (const row of grid.slice(1)) {
      expect(row[STUDENTIZED]).toBe('');
      expect(row[DFFITS]).toBe('');
      expect(typeof row[STANDARDIZED]).toBe('number');
      expect(row[FLAG]).toContain('nothing left to estimate sigma without this row');
    }
    expectOnlyFiniteNumbersOrText(grid);
  });

  it('noise_sd and weights reach the diagnostics: the standardized column scales as √w/σ', () => {
    const { y, x } = randomProblem(24, 12, 1);
    const weights = column(
      undefined,
      y.map((_, i) => (i === 0 ? 4 : 1)),
    );
    const plain = residuals(column(undefined, y), x, null, null, 2);
    const weighted = residuals(column(undefined, y), x, null, null, 2, weights);
    const first = (g: unknown[][]) => g[1] as number[];
    const scaled = (r: number[], sqrtW: number) => (sqrtW * r[RESIDUAL]) / (2 * Math.sqrt(1 - r[LEVERAGE]));
    expect(first(plain)[STANDARDIZED]).toBeCloseTo(scaled(first(plain), 1), 12);
    expect(first(weighted)[STANDARDIZED]).toBeCloseTo(scaled(first(weighted), 2), 12);
  });

  it('numbers rows by worksheet row from the parameter addresses, and Observed is the response of that row', () => {
    // "Custom functions parameter options", Detect the address of a parameter: Data!B10:B17 means
    // the header is on sheet row 10, so the first data row is row 11; row 13 is blank and skipped.
    const y = [['Yield'], [3.1], [4.2], [null], [5.5], [4.8], [6.1], [3.3]];
    const x = [['Dose'], [1], [2], [2.5], [3], [2.5], [3.5], [1.2]];
    const invocation = { parameterAddresses: ['Data!B10:B17', 'Data!D10:D17', '', '', '', '', ''] };
    const grid = residuals(y, x, null, null, null, undefined, null, invocation);
    expect(grid.slice(1).map((r) => r[ROW])).toEqual([11, 12, 14, 15, 16, 17]);
    expect(grid.slice(1).map((r) => r[OBSERVED])).toEqual([3.1, 4.2, 5.5, 4.8, 6.1, 3.3]);
  });

  it('without addresses (an array constant) rows keep their place in response', () => {
    // Same page: an argument that is no reference has no address ("" or nothing).
    const y = [[3.1], [4.2], [2.9], [5.5]];
    const x = [[1], [2], [1.5], [3]];
    expect(
      residuals(y, x, null, null, null, undefined, null, { parameterAddresses: ['', ''] })
        .slice(1)
        .map((r) => r[ROW]),
    ).toEqual([1, 2, 3, 4]);
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
    const studentized = table
      .slice(1)
      .map((r) => r[STUDENTIZED] as number)
      .sort((a, b) => a - b);
    expect(points.slice(1).map((r) => r[1])).toEqual(studentized);
    // Blom position for the middle of 7 points is exactly 1/2, whose normal quantile is 0.
    expect(points[4][0]).toBe(0);
    expect(
      points
        .slice(1)
        .map((r) => r[2])
        .sort(),
    ).toEqual([2, 3, 4, 5, 6, 7, 8]);
  });

  it('traces each point to its worksheet row, as PLUMB.RESIDUALS numbers it', async () => {
    // "Custom functions parameter options", Detect the address of a parameter: 'Batch log'!C5:C12.
    const { qqPoints } = await import('../../src/functions/functions');
    const y = [['y'], [1.2], [2.1], [2.8], [4.4], [4.9], [6.3], [6.8]];
    const x = [['t'], [1], [2], [3], [4], [5], [6], [7]];
    const invocation = { parameterAddresses: ["'Batch log'!C5:C12", "'Batch log'!D5:D12"] };
    expect(
      qqPoints(y, x, null, null, null, undefined, null, invocation)
        .slice(1)
        .map((r) => r[2] as number)
        .sort((a, b) => a - b),
    ).toEqual([6, 7, 8, 9, 10, 11, 12]);
  });
});
