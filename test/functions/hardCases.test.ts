/**
 * Named hard cases at the edge of what a worksheet can hand the cell functions: degenerate
 * responses, too few rows, aliased columns, magnitudes whose squares overflow, date serials and
 * the widest range Excel allows. Each has the result or the exact message a user sees.
 */
import { describe, expect, it } from 'vitest';
import { estimates, fitStats, terms, collinearity } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';

const column = (values: readonly number[]): number[][] => values.map((v) => [v]);
const numbersOf = (grid: unknown[][]): number[] => grid.map((row) => row[0] as number);
const valueOf = (grid: unknown[][], label: string): unknown => grid.find((row) => row[0] === label)?.[1];

/** Relative agreement, for coefficients whose size spans hundreds of orders of magnitude. */
function expectClose(actual: number, expected: number, relative = 1e-10): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}

const xs = [1, 2, 3, 4, 5, 6, 7, 8];
const ys = [2.1, 3.9, 6.2, 7.8, 10.1, 12.2, 13.8, 16.1];

describe('hard cases', () => {
  it('all-blank y: no complete rows', () => {
    const error = thrownBy(() => terms([[''], [null], [''], [null]], column([1, 2, 3, 4])));
    expect(error).toEqual({ code: '#VALUE!', message: 'No complete rows: response is blank or #N/A in every row. Select the column that holds the values.' });
  });

  // Decision: a constant response is a valid, exact fit (intercept = the constant, slopes 0), not
  // an error. R² (0/0) is left blank; TERMS states the reason in its Reading column.
  it('y of one constant value: fits exactly, R² blank, reason in the reading', () => {
    const y = column([5, 5, 5, 5, 5, 5]);
    const x = column([1, 2, 3, 4, 5, 6]);
    expect(numbersOf(estimates(y, x))).toEqual([5, 0]);
    const stats = fitStats(y, x);
    expect(valueOf(stats, 'RSS')).toBe(0);
    expect(valueOf(stats, 'Sigma-hat')).toBe(0);
    expect(valueOf(stats, 'R²')).toBe('');
    expect(valueOf(stats, 'Adjusted R²')).toBe('');
    const table = terms(y, x);
    expect(table[1][8]).toBe('clear of zero (exact fit: SE is 0, so t and CV % are undefined)');
    expect(table[2][8]).toBe('could be zero (exact fit: SE is 0, so t and CV % are undefined)');
  });

  it('one row: too few rows for the parameters', () => {
    expect(thrownBy(() => estimates([[1]], [[2]])).message).toBe(
      "1 row cannot fit the model's 2 parameters (Intercept, x1) with any left over to measure the noise: the model needs more rows than parameters. Give at least 3 rows, or fewer predictors.",
    );
  });

  it('as many rows as parameters: no residual degrees of freedom', () => {
    expect(
      thrownBy(() =>
        terms(column([1, 3, 2]), [
          [1, 4],
          [2, 1],
          [3, 7],
        ]),
      ).message,
    ).toBe(
      "3 rows cannot fit the model's 3 parameters (Intercept, x1, x2) with any left over to measure the noise: the model needs more rows than parameters. Give at least 4 rows, or fewer predictors.",
    );
  });

  it('two identical predictors: the second is aliased, the first keeps the one-predictor fit', () => {
    const table = terms(
      column(ys),
      xs.map((v) => [v, v]),
    );
    const single = numbersOf(estimates(column(ys), column(xs)));
    expect(table[2][1]).toBeCloseTo(single[1], 12);
    expect(table[3]).toEqual(['x2', '', '', '', '', '', '', '', 'aliased']);
  });

  it('a predictor of all zeros: aliased, the others unaffected', () => {
    const table = terms(
      column(ys),
      xs.map((v) => [v, 0]),
    );
    const single = numbersOf(estimates(column(ys), column(xs)));
    expect(table[2][1]).toBeCloseTo(single[1], 12);
    expect(table[3]).toEqual(['x2', '', '', '', '', '', '', '', 'aliased']);
  });

  // Squares of 1e300 overflow to ∞: only the column scaling lets this fit at all.
  it('values near 1e300: finite estimates equal to the rescaled problem scaled back', () => {
    const big = estimates(column(ys.map((v) => v * 1e300)), column(xs.map((v) => v * 1e300)));
    const unit = numbersOf(estimates(column(ys), column(xs)));
    const [intercept, slope] = numbersOf(big);
    expectClose(intercept, unit[0] * 1e300);
    expectClose(slope, unit[1]);
  });

  it('a 1e-300 column beside a 1e300 column: fits, and matches the rescaled problem', () => {
    const second = [3, 1, 4, 1, 5, 9, 2, 6];
    const mixed = numbersOf(
      estimates(
        column(ys),
        xs.map((v, i) => [v * 1e-300, second[i] * 1e300]),
      ),
    );
    const unit = numbersOf(
      estimates(
        column(ys),
        xs.map((v, i) => [v, second[i]]),
      ),
    );
    expectClose(mixed[0], unit[0]);
    expectClose(mixed[1], unit[1] * 1e300);
    expectClose(mixed[2], unit[2] * 1e-300);
  });

  it('dates as serial numbers (45000–45060): same slope as the shifted problem, intercept moved back', () => {
    const days = Array.from({ length: 13 }, (_, i) => 45000 + 5 * i);
    const sales = days.map((d, i) => 20 + 0.75 * (d - 45000) + [0.3, -0.2, 0.1, -0.4, 0.2, 0, 0.5, -0.1, -0.3, 0.2, 0.1, -0.2, 0.4][i]);
    const [datedIntercept, datedSlope] = numbersOf(estimates(column(sales), column(days)));
    const [shiftedIntercept, shiftedSlope] = numbersOf(estimates(column(sales), column(days.map((d) => d - 45000))));
    expectClose(datedSlope, shiftedSlope, 1e-9);
    expect(datedSlope).toBeGreaterThan(0.7);
    expect(datedSlope).toBeLessThan(0.8);
    expectClose(datedIntercept, shiftedIntercept - shiftedSlope * 45000, 1e-9);
  });

  // Excel's widest range: the answer names rows against parameters. The count is of the model's
  // parameters, aliased ones included: what the user would have to cut. No timing is asserted
  // (speed is the bench's job); the old per-column refactorization would exceed the test timeout.
  it('a 16,384-column x over 3 rows: a clear rows-versus-parameters error', () => {
    const wide = [0, 1, 2].map((i) => Array.from({ length: 16_384 }, (_, j) => (i * 7 + j * 13) % 17));
    const error = thrownBy(() => terms(column([1, 2, 3]), wide));
    expect(error.message).toBe(
      "3 rows cannot fit the model's 16385 parameters with any left over to measure the noise: the model needs more rows than parameters. Give at least 16386 rows, or fewer predictors.",
    );
  });

  // Before the fix each aliased column got its own refactorization: about five minutes, far past
  // the test timeout.
  it('a 16,384-column x over 3 rows in COLLINEARITY: every term marked', () => {
    const wide = [0, 1, 2].map((i) => Array.from({ length: 16_384 }, (_, j) => (i * 7 + j * 13) % 17));
    const grid = collinearity(wide);
    expect(grid).toHaveLength(16_384 + 2);
    expect(grid[16_384][2]).toBe('perfectly collinear: an exact combination of the other terms');
  });

  it('"1,234" typed as text in a numeric cell: the number-stored-as-text message', () => {
    const x = [[12], [14], ['1,234'], [18], [20]];
    expect(thrownBy(() => terms(column([1, 2, 3, 4, 5]), x)).message).toBe(
      'predictors row 3, column 1 ("x1") holds the text "1,234". It looks like a number stored as text: re-enter it as a number without separators.',
    );
  });
});
