/**
 * PLUMB.COLLINEARITY and PLUMB.CHECKS through the any[][] interface Excel uses. The numbers are
 * checked against independent oracles in test/engine/infer/collinearity.test.ts and
 * assumptionChecks.test.ts; here the concern is what a user reads: labels, term names, row numbers
 * that lead back to the data, blanks that come with their reason, and no NaN or ±∞ in any cell.
 */
import { describe, expect, it } from 'vitest';
import { assumptionChecks, collinearity as engineCollinearity } from '../../src/engine';
import { checks, collinearity } from '../../src/functions/functions';
import { jarqueBeraReading, overallReading, shapiroWilkReading } from '../../src/presentation';
import { column, columns, thrownBy } from '../support/cells';
import { randomProblem } from '../support/random';

const CHECK_LABELS = [
  'Durbin–Watson',
  'DW expected d',
  'DW p-value (ρ > 0)',
  'DW p-value (two-sided)',
  'DW method',
  'DW reading',
  'Breusch–Pagan LM',
  'BP df',
  'BP p-value',
  'BP reading',
  'Shapiro–Wilk W',
  'SW p-value',
  'SW reading',
  'Jarque–Bera',
  'JB p-value',
  'JB reading',
  'Largest |studentized residual|',
  'at row',
  'Outlier p-value (Bonferroni)',
  'Outlier reading',
  'Lack-of-fit F',
  'LOF df',
  'Pure-error df',
  'LOF p-value',
  'LOF reading',
  "Largest Cook's distance",
  'at row',
  'High-leverage rows',
  'Largest VIF',
  'for term',
  'Overall reading',
];

function expectOnlyFiniteNumbersOrText(grid: unknown[][], width: number): void {
  for (const row of grid) {
    expect(row).toHaveLength(width);
    for (const cell of row) expect(typeof cell === 'string' || (typeof cell === 'number' && Number.isFinite(cell))).toBe(true);
  }
}

/** The value beside a label; `occurrence` picks among rows of the same label ('at row' appears twice). */
function valueOf(grid: unknown[][], label: string, occurrence = 0): unknown {
  const row = grid.filter((r) => r[0] === label)[occurrence];
  if (row === undefined) throw new Error(`no row labelled ${label}`);
  return row[1];
}

describe('PLUMB.COLLINEARITY', () => {
  it('one row per term, categorical indicators included, then the condition number with its reading', () => {
    const x = [
      ['Dose', 'Batch', 'Temp'],
      [1, 'A', 20.1],
      [2, 'B', 22.4],
      [1.5, 'C', 19.8],
      [3, 'A', 25.0],
      [2.5, 'B', 23.1],
      [3.5, 'C', 27.2],
      [1.2, 'A', 18.9],
      [2.2, 'B', 21.7],
    ];
    const grid = collinearity(x);
    expect(grid[0]).toEqual(['Term', 'VIF', 'Tolerance']);
    expect(grid.slice(1, -1).map((r) => r[0])).toEqual(['Dose', 'Batch: B', 'Batch: C', 'Temp']);
    grid.slice(1, -1).forEach((r) => expect((r[1] as number) * (r[2] as number)).toBeCloseTo(1, 12));
    const last = grid[grid.length - 1];
    expect(last[0]).toBe('Condition number');
    expect(last[1]).toBeGreaterThan(1);
    expect(typeof last[2]).toBe('string');
    expectOnlyFiniteNumbersOrText(grid, 3);
  });

  it('matches the engine on the frame’s numbers, header or not, and honours intercept and weights', () => {
    const { x } = randomProblem(71, 15, 3);
    const w = x.map((_, i) => 1 + (i % 3));
    const engine = engineCollinearity(x, undefined, w, { intercept: false });
    const grid = collinearity(x, null, false, null, column(undefined, w));
    // Without an intercept both VIFs, labelled: the centered one (the standard error's inflation) first.
    expect(grid[0]).toEqual(['Term', 'VIF (centered)', 'Tolerance', 'VIF (uncentered)']);
    expect(grid.slice(1, -1).map((r) => r[1])).toEqual(engine.terms.map((t) => t.vif));
    expect(grid.slice(1, -1).map((r) => r[3])).toEqual(engine.terms.map((t) => t.uncenteredVif));
    expect(grid.slice(1, -1).map((r) => r[1])).toEqual(engineCollinearity(x, undefined, w).terms.map((t) => t.vif));
    expect(grid[grid.length - 1][1]).toBe(engine.conditionNumber);
    expectOnlyFiniteNumbersOrText(grid, 4);
    const withHeader = collinearity(columns(['a', 'b', 'c'], x), null, false, null, column('w', w));
    expect(withHeader.slice(1, -1).map((r) => r[0])).toEqual(['a', 'b', 'c']);
    expect(withHeader.slice(1, -1).map((r) => r[1])).toEqual(engine.terms.map((t) => t.vif));
  });

  it('a perfectly collinear set: VIFs blank with the reason, condition number blank with "infinite"', () => {
    const { x } = randomProblem(72, 12, 2);
    const grid = collinearity(
      columns(
        ['a', 'b', 'a+b'],
        x.map((r) => [r[0], r[1], r[0] + r[1]]),
      ),
    );
    for (const row of grid.slice(1, -1)) {
      expect(row[1]).toBe('');
      expect(row[2]).toBe('perfectly collinear: an exact combination of the other terms');
    }
    expect(grid[grid.length - 1]).toEqual(['Condition number', '', 'infinite: some terms are exact combinations of others']);
    expectOnlyFiniteNumbersOrText(grid, 3);
  });

  it('a single predictor has VIF 1; a blank row is skipped as everywhere else', () => {
    const grid = collinearity([['Dose'], [1], [2], [null], [4]]);
    expect(grid[1]).toEqual(['Dose', 1, 1]);
  });

  it('fails like every PLUMB function: #VALUE! with the message', () => {
    const empty = thrownBy(() => collinearity([]));
    expect(empty.code).toBe('#VALUE!');
    expect(empty.message).toMatch(/predictors is empty/);
    const mismatch = thrownBy(() => collinearity([[1], [2], [3]], null, null, null, [[1], [2]]));
    expect(mismatch.message).toBe('predictors has 3 rows but weights has 2; select the same rows for both.');
  });
});

describe('PLUMB.CHECKS', () => {
  it('label and value rows, the numbers those of the engine', () => {
    const { y, x } = randomProblem(81, 30, 2);
    const grid = checks(column(undefined, y), x);
    expect(grid.map((r) => r[0])).toEqual(CHECK_LABELS);
    const engine = assumptionChecks({ y, x });
    expect(valueOf(grid, 'Durbin–Watson')).toBe(engine.durbinWatson.statistic);
    expect(valueOf(grid, 'DW p-value (ρ > 0)')).toBe(engine.durbinWatson.pPositive);
    expect(valueOf(grid, 'DW p-value (two-sided)')).toBe(engine.durbinWatson.pTwoSided);
    expect(valueOf(grid, 'Breusch–Pagan LM')).toBe(engine.breuschPagan.statistic);
    expect(valueOf(grid, 'BP df')).toBe(2);
    expect(valueOf(grid, 'DW method')).toBe('exact');
    expect(valueOf(grid, 'Shapiro–Wilk W')).toBe(engine.shapiroWilk.statistic);
    expect(valueOf(grid, 'SW p-value')).toBe(engine.shapiroWilk.pValue);
    expect(valueOf(grid, 'SW reading')).toBe(shapiroWilkReading(engine));
    expect(valueOf(grid, 'Jarque–Bera')).toBe(engine.jarqueBera.statistic);
    expect(valueOf(grid, 'JB reading')).toBe(jarqueBeraReading(engine.jarqueBera));
    expect(valueOf(grid, 'JB reading')).toMatch(/^for information: up to 5000 rows the shape is tested by Shapiro–Wilk/);
    expect(valueOf(grid, 'Largest |studentized residual|')).toBe(Math.abs(engine.outlierTest.studentized));
    expect(valueOf(grid, 'Outlier p-value (Bonferroni)')).toBe(engine.outlierTest.bonferroniP);
    expect(valueOf(grid, 'Largest VIF')).toBe(engine.largestVif);
    expect(valueOf(grid, 'Overall reading')).toBe(overallReading(engine));
    expectOnlyFiniteNumbersOrText(grid, 2);
  });

  it("'at row' is the row's place in the input range: the header is row 1 and skipped rows count", () => {
    const { y, x } = randomProblem(82, 20, 1);
    const planted = [...y];
    planted[9] += 12;
    const yCells = column(
      'Yield',
      planted.map((v, i) => (i === 2 ? null : v)),
    );
    const grid = checks(yCells, columns(['Dose'], x));
    // Data index 9 is the 9th row used (index 2 is skipped) and sits in range row 11 under the header:
    // both the most outlying row and the row of the largest Cook's distance.
    expect(valueOf(grid, 'at row', 0)).toBe(11);
    expect(valueOf(grid, 'at row', 1)).toBe(11);
    expect(valueOf(grid, 'Outlier reading')).toMatch(/^row 11 is an outlier \(studentized residual \d+\.\d, Bonferroni p/);
    expect(valueOf(grid, 'for term')).toBe('Dose');
  });

  it('an exact fit: statistics blank, and every blank has a reading beside it', () => {
    const x = [[1], [2], [3], [4], [6]];
    const grid = checks(
      column(
        undefined,
        x.map(([v]) => 2 + 0.5 * v),
      ),
      x,
    );
    for (const label of [
      'Durbin–Watson',
      'DW method',
      'Breusch–Pagan LM',
      'Shapiro–Wilk W',
      'SW p-value',
      'Jarque–Bera',
      'JB p-value',
      'Largest |studentized residual|',
      'Outlier p-value (Bonferroni)',
      'Lack-of-fit F',
      'LOF p-value',
      "Largest Cook's distance",
    ]) {
      expect(valueOf(grid, label)).toBe('');
    }
    for (const label of ['DW reading', 'SW reading', 'JB reading', 'Outlier reading']) expect(valueOf(grid, label)).toMatch(/^exact fit/);
    expect(valueOf(grid, 'at row', 0)).toBe('');
    expect(valueOf(grid, 'at row', 1)).toBe('none: exact fit, every residual is 0');
    expect(valueOf(grid, 'Overall reading')).toMatch(/^exact fit/);
    expectOnlyFiniteNumbersOrText(grid, 2);
  });

  it('a collinear term: Largest VIF blank, the term and the reason beside it', () => {
    const { y, x } = randomProblem(83, 15, 2);
    const grid = checks(
      column('y', y),
      columns(
        ['a', 'b', 'c'],
        x.map((r) => [r[0], r[1], 2 * r[0]]),
      ),
    );
    expect(valueOf(grid, 'Largest VIF')).toBe('');
    expect(valueOf(grid, 'for term')).toBe('a (perfectly collinear: an exact combination of the other terms)');
    expectOnlyFiniteNumbersOrText(grid, 2);
  });

  // Both p-values of d, each labelled; the reading says it uses the two-sided one, the p that
  // tests autocorrelation of either sign (Durbin & Watson 1950 tabulate one-sided bounds, so the
  // one-sided p is shown too).
  it('Durbin–Watson: both p-values labelled, and the reading says which it uses', () => {
    const { y, x } = randomProblem(85, 40, 1);
    const grid = checks(column(undefined, y), x);
    const oneSided = valueOf(grid, 'DW p-value (ρ > 0)') as number;
    const twoSided = valueOf(grid, 'DW p-value (two-sided)') as number;
    expect(twoSided).toBeCloseTo(Math.min(1, 2 * Math.min(oneSided, 1 - oneSided)), 12);
    expect(valueOf(grid, 'DW reading')).toMatch(/read on the exact two-sided p [=<] /);
  });

  // One response typed far off (studentized residual far past 3, the flag of RESIDUALS): the
  // overall reading names that row first, by worksheet row, and says it can cause the other
  // signals (Cook & Weisberg 1982: one outlier distorts the residuals every other check reads;
  // common practice, no source).
  it('an obvious outlier is named first in the overall reading, by worksheet row', () => {
    const x = Array.from({ length: 40 }, (_, i) => [1 + (i % 10)]);
    const wobble = [0.3, -0.2, 0.1, -0.4, 0.2, 0.0, -0.1, 0.4, -0.3, 0.1];
    const y = x.map(([v], i) => 5 + 2 * v + wobble[(i * 3) % 10]);
    y[16] += 25;
    // Response from row 3 of its sheet: a header at row 3, data index 16 at worksheet row 20.
    const grid = checks(column('Yield', y), columns(['Dose'], x), null, null, null, undefined, null, {
      parameterAddresses: ['Data!B3:B43', 'Data!C3:C43', '', '', '', '', ''],
    });
    const overall = String(valueOf(grid, 'Overall reading'));
    expect(overall).toMatch(/^worth a look first: row 20 \(studentized residual \d+\.\d, Bonferroni p < 0\.0001/);
    expect(overall).toContain('can cause the other signals');
  });

  it('level moves the line between a concern and none', () => {
    const { y, x } = randomProblem(84, 30, 1);
    const strict = checks(column(undefined, y), x, 0.5);
    const lenient = checks(column(undefined, y), x, 0.999999);
    expect(valueOf(lenient, 'Overall reading')).toBe('nothing stands out at the 99.9999% level');
    // At level 0.5 even rows with a Bonferroni p near 0.3 are outliers, named first.
    expect(valueOf(strict, 'Overall reading')).toMatch(/^worth a look/);
  });

  it('fails like every PLUMB function: #VALUE! with the message', () => {
    const error = thrownBy(() => checks([[1], [2]], [[1], [2]]));
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toMatch(/more rows than parameters/);
  });
});
