/**
 * PLUMB.CHECKS' rows for issue #16 against R, through the any[][] interface Excel uses. Values in
 * test/engine/infer/fixtures/checks.json, written by scripts/reference/checks.R (R 4.2.2, lmtest
 * 0.9.40, car 3.1.1) on datasets of R's datasets package and carData:
 * - DW p-values: lmtest::dwtest(exact = TRUE), alternative "greater" and "two.sided" (Farebrother's
 *   pan, AS 153);
 * - Shapiro–Wilk W and p: stats::shapiro.test of the fit's residuals (Royston 1995, AS R94);
 * - largest |studentized residual|, its row and the Bonferroni p: car::outlierTest (Cook & Weisberg 1982);
 * - lack of fit: anova(lm(y ~ X), lm(y ~ factor(setting))) (NIST/SEMATECH e-Handbook §4.4.4).
 * The modules themselves are tested against the same fixtures in test/engine/infer/; here the
 * concern is that CHECKS shows those numbers in the right rows, names rows as the input range does
 * (the header is row 1) and reads each verdict in words.
 */
import { describe, expect, it } from 'vitest';
import { checks } from '../../src/functions/functions';
import { column, columns } from '../support/cells';
import { checksFixture, fixtureCase } from '../support/checksFixture';
import { randomProblem } from '../support/random';

const fixture = checksFixture;

function valueOf(grid: unknown[][], label: string, occurrence = 0): unknown {
  const row = grid.filter((r) => r[0] === label)[occurrence];
  if (row === undefined) throw new Error(`no row labelled ${label}`);
  return row[1];
}

function expectRelative(actual: unknown, expected: number, tolerance = 1e-9): void {
  expect(typeof actual).toBe('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(tolerance * Math.abs(expected));
}

/** CHECKS over a fixture design (its intercept column dropped: CHECKS adds its own), headed y, x1, x2, … */
function checksOf(c: { y: number[]; design: number[][] }, level: number | null = null): unknown[][] {
  const x = c.design.map((row) => row.slice(1));
  return checks(
    column('y', c.y),
    columns(
      x[0].map((_, j) => `x${j + 1}`),
      x,
    ),
    level,
  );
}

describe('PLUMB.CHECKS against R on lm(mpg ~ wt + hp, mtcars)', () => {
  const grid = checksOf(fixtureCase(fixture.durbinWatson, 'lm(mpg ~ wt + hp, mtcars)'));

  it("DW p-values are dwtest's exact ones, and the method row says so", () => {
    const dw = fixtureCase(fixture.durbinWatson, 'lm(mpg ~ wt + hp, mtcars)');
    expectRelative(valueOf(grid, 'DW p-value (ρ > 0)'), dw.dwtestGreater);
    expectRelative(valueOf(grid, 'DW p-value (two-sided)'), dw.dwtestTwoSided);
    expect(valueOf(grid, 'DW method')).toBe('exact');
    // Two-sided p = 0.0412 < 0.05 with d below its mean: positive autocorrelation.
    expect(valueOf(grid, 'DW reading')).toBe(
      'neighbouring residuals move together: positive autocorrelation (read on the exact two-sided p = 0.0412); standard errors are likely too small',
    );
  });

  it("Shapiro–Wilk W and p are shapiro.test's of the residuals, and decide normality", () => {
    const sw = fixtureCase(fixture.shapiroWilk, 'residuals of lm(mpg ~ wt + hp, mtcars)');
    expectRelative(valueOf(grid, 'Shapiro–Wilk W'), sw.w, 1e-12);
    expectRelative(valueOf(grid, 'SW p-value'), sw.p);
    expect(valueOf(grid, 'SW reading')).toMatch(/^residuals depart from a normal shape \(p = 0\.0343\)/);
  });

  it("the outlier rows are car::outlierTest's: |t|, the row (header = range row 1) and the Bonferroni p", () => {
    const outlier = fixtureCase(fixture.outlierTest, 'lm(mpg ~ wt + hp, mtcars)');
    expectRelative(valueOf(grid, 'Largest |studentized residual|'), Math.abs(outlier.largest));
    expect(valueOf(grid, 'at row', 0)).toBe(outlier.row + 1);
    expectRelative(valueOf(grid, 'Outlier p-value (Bonferroni)'), outlier.bonferroni);
    expect(valueOf(grid, 'Outlier reading')).toBe(`no row is an outlier: the most extreme, row ${outlier.row + 1}, has Bonferroni p = 0.4653`);
  });

  it('every concern in the overall reading names its test and p: autocorrelation, then the normal shape', () => {
    expect(valueOf(grid, 'Overall reading')).toBe(
      'worth a look: positive autocorrelation (Durbin–Watson exact two-sided p = 0.0412), non-normal residuals (Shapiro–Wilk p = 0.0343)',
    );
  });
});

describe('PLUMB.CHECKS against R: outliers and lack of fit', () => {
  it("lm(dist ~ speed, cars): car::outlierTest's row 49, and lack of fit from anova() against one mean per speed", () => {
    const outlier = fixtureCase(fixture.outlierTest, 'lm(dist ~ speed, cars)');
    const lof = fixtureCase(fixture.lackOfFit, 'lm(dist ~ speed, cars)');
    const grid = checksOf(lof);
    expect(valueOf(grid, 'at row', 0)).toBe(outlier.row + 1);
    expectRelative(valueOf(grid, 'Outlier p-value (Bonferroni)'), outlier.bonferroni);
    expectRelative(valueOf(grid, 'Lack-of-fit F'), lof.f);
    expect(valueOf(grid, 'LOF df')).toBe(lof.lackDf);
    expect(valueOf(grid, 'Pure-error df')).toBe(lof.pureDf);
    expectRelative(valueOf(grid, 'LOF p-value'), lof.p);
    expect(valueOf(grid, 'LOF reading')).toBe('no sign of lack of fit: the model follows the means of repeated settings within their spread (p = 0.2948)');
  });

  it("lm(breaks ~ wool + tension, warpbreaks): anova()'s lack of fit at p = 0.021 is a concern at 95% and not at 99%", () => {
    const lof = fixtureCase(fixture.lackOfFit, 'lm(breaks ~ wool + tension, warpbreaks)');
    const grid = checksOf(lof);
    expectRelative(valueOf(grid, 'Lack-of-fit F'), lof.f);
    expect([valueOf(grid, 'LOF df'), valueOf(grid, 'Pure-error df')]).toEqual([lof.lackDf, lof.pureDf]);
    expectRelative(valueOf(grid, 'LOF p-value'), lof.p);
    expect(valueOf(grid, 'LOF reading')).toMatch(/^the model misses the means of repeated settings by more than their own spread explains \(p = 0\.0210\)/);
    expect(valueOf(grid, 'Overall reading')).toContain('lack of fit (against pure error, p = 0.0210)');
    expect(valueOf(checksOf(lof, 0.99), 'Overall reading')).not.toContain('lack of fit');
  });

  it("lm(stack.loss ~ ., stackloss): car's Bonferroni p of row 21 (0.089) names it first at 90% and not at 95%", () => {
    const outlier = fixtureCase(fixture.outlierTest, 'lm(stack.loss ~ ., stackloss)');
    const at90 = checksOf(outlier, 0.9);
    expectRelative(valueOf(at90, 'Outlier p-value (Bonferroni)'), outlier.bonferroni);
    const row = outlier.row + 1;
    expect(valueOf(at90, 'Outlier reading')).toMatch(new RegExp(`^row ${row} is an outlier \\(studentized residual -3\\.3, Bonferroni p = 0\\.0890\\)`));
    expect(valueOf(at90, 'Overall reading')).toMatch(
      new RegExp(
        `^worth a look first: row ${row} \\(studentized residual -3\\.3, Bonferroni p = 0\\.0890\\) stands out: check its data first, since such a row can cause the other signals`,
      ),
    );
    const at95 = checksOf(outlier, 0.95);
    expect(valueOf(at95, 'Outlier reading')).toMatch(/^no row is an outlier/);
    expect(valueOf(at95, 'Overall reading')).not.toMatch(/^worth a look first/);
  });

  it('lm(LakeHuron ~ time): a two-sided p of 2e-22, exact to 1e-6 relative (dwtest)', () => {
    const dw = fixtureCase(fixture.durbinWatson, 'lm(LakeHuron ~ time(LakeHuron))');
    const grid = checksOf(dw);
    expectRelative(valueOf(grid, 'DW p-value (ρ > 0)'), dw.dwtestGreater, 1e-6);
    expectRelative(valueOf(grid, 'DW p-value (two-sided)'), dw.dwtestTwoSided, 1e-6);
    expect(valueOf(grid, 'DW reading')).toMatch(/positive autocorrelation \(read on the exact two-sided p < 0\.0001\)/);
  });
});

describe('PLUMB.CHECKS keeps its shape whatever the data', () => {
  const labels = (grid: unknown[][]) => grid.map((r) => r[0]);
  const small = checksOf(fixtureCase(fixture.lackOfFit, 'lm(dist ~ speed, cars)'));

  it('no repeated settings: the four lack-of-fit values blank, and the reading says why', () => {
    const { y, x } = randomProblem(91, 25, 2);
    const grid = checks(column(undefined, y), x);
    expect(labels(grid)).toEqual(labels(small));
    for (const label of ['Lack-of-fit F', 'LOF df', 'Pure-error df', 'LOF p-value']) expect(valueOf(grid, label)).toBe('');
    expect(valueOf(grid, 'LOF reading')).toBe('no two rows share the same predictor values: without repeats there is no pure error to test the fit against');
  });

  // Past EXACT_MAX_ROWS (300) d is referred to the beta approximation; its error there is measured
  // in src/engine/infer/durbinWatsonExact.ts and checked in test/engine/infer/durbinWatsonExact.test.ts.
  it('more than 300 rows: the method row and the reading name the beta approximation', () => {
    const { y, x } = randomProblem(92, 301, 1);
    const grid = checks(column(undefined, y), x);
    expect(labels(grid)).toEqual(labels(small));
    expect(valueOf(grid, 'DW method')).toBe('beta approximation (n > 300)');
    expect(valueOf(grid, 'DW reading')).toMatch(/read on the two-sided p [=<] 0\.\d{4} by the beta approximation\)$/);
  });

  // Royston's approximations cover 3 ≤ n ≤ 5000 (Royston 1995); above, Jarque–Bera decides.
  it('more than 5000 rows: Shapiro–Wilk blank with the reason, Jarque–Bera decides', () => {
    const { y, x } = randomProblem(93, 5001, 1);
    const grid = checks(column(undefined, y), x);
    expect(labels(grid)).toEqual(labels(small));
    expect([valueOf(grid, 'Shapiro–Wilk W'), valueOf(grid, 'SW p-value')]).toEqual(['', '']);
    expect(valueOf(grid, 'SW reading')).toMatch(/^more than 5000 rows/);
    expect(typeof valueOf(grid, 'JB p-value')).toBe('number');
    expect(valueOf(grid, 'JB reading')).toMatch(/^residuals (look roughly normal|depart from a normal shape) \(p [=<] /);
  });
});
