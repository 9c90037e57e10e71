/**
 * Durbin–Watson, Breusch–Pagan (Koenker's form) and Jarque–Bera. Sources:
 * - an independent oracle built with ml-matrix (npm, general-purpose linear algebra): residuals
 *   from its QR solve, each statistic from its defining formula; the exact null moments of d
 *   from M = I − X(XᵀX)⁻¹Xᵀ and the first-difference matrix A formed explicitly as n×n matrices
 *   (Durbin & Watson 1950: E[d] = tr(MA)/(n−p), Var[d] = 2[tr((MA)²) − tr(MA)E[d]]/((n−p)(n−p+2)));
 * - closed forms: for the intercept-only model MA = A, so E[d] = 2 and Var[d] = 4(n−2)/(n²−1);
 *   χ² upper tails exp(−x/2) for 2 df and exp(−x/2)(1 + x/2) for 4 df;
 * - a seeded Monte-Carlo estimate of P(D ≤ d) under the null, as a loose check of the normal
 *   approximation only (tolerance 0.03: Monte-Carlo SE ≈ 0.004 plus the approximation's own error).
 * No published worked example is used: none whose digits I am certain of.
 */
import { Matrix, QrDecomposition, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { assumptionChecks, collinearity, highLeverageCount, residualDiagnostics } from '../../../src/engine';
import { chiSquareUpperTail } from '../../../src/engine/distributions/chiSquare';
import { gaussian, mulberry32, randomProblem } from '../../support/random';

/** √w-scaled residuals of weighted least squares, by ml-matrix. */
function scaledResiduals(x: number[][], y: number[], w = y.map(() => 1)): number[] {
  const design = new Matrix(x.map((row, i) => [1, ...row].map((v) => v * Math.sqrt(w[i]))));
  const yw = y.map((v, i) => v * Math.sqrt(w[i]));
  const beta = new QrDecomposition(design).solve(Matrix.columnVector(yw));
  const fitted = design.mmul(beta).getColumn(0);
  return yw.map((v, i) => v - fitted[i]);
}

function durbinWatsonOf(e: number[]): number {
  let num = 0;
  for (let i = 1; i < e.length; i++) num += (e[i] - e[i - 1]) ** 2;
  return num / e.reduce((s, v) => s + v * v, 0);
}

function differenceMatrix(n: number): Matrix {
  const a = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    a.set(i, i, i === 0 || i === n - 1 ? 1 : 2);
    if (i > 0) a.set(i, i - 1, -1);
    if (i < n - 1) a.set(i, i + 1, -1);
  }
  return a;
}

function residualMaker(x: number[][], w: number[]): Matrix {
  const design = new Matrix(x.map((row, i) => [1, ...row].map((v) => v * Math.sqrt(w[i]))));
  const hat = design.mmul(inverse(design.transpose().mmul(design))).mmul(design.transpose());
  return Matrix.eye(x.length).sub(hat);
}

function bruteForceMoments(x: number[][], w: number[]): { mean: number; variance: number } {
  const n = x.length;
  const p = x[0].length + 1;
  const ma = residualMaker(x, w).mmul(differenceMatrix(n));
  const t1 = ma.trace();
  const t2 = ma.mmul(ma).trace();
  const mean = t1 / (n - p);
  return { mean, variance: (2 * (t2 - t1 * mean)) / ((n - p) * (n - p + 2)) };
}

/** Koenker's LM = n·R² of e² on [1, X], by ml-matrix. */
function koenkerOf(x: number[][], e: number[]): number {
  const u = e.map((v) => v * v);
  const design = new Matrix(x.map((row) => [1, ...row]));
  const fitted = design.mmul(new QrDecomposition(design).solve(Matrix.columnVector(u))).getColumn(0);
  const mean = u.reduce((s, v) => s + v, 0) / u.length;
  const rss = u.reduce((s, v, i) => s + (v - fitted[i]) ** 2, 0);
  const tss = u.reduce((s, v) => s + (v - mean) ** 2, 0);
  return u.length * (1 - rss / tss);
}

function jarqueBeraOf(e: number[]): { jb: number; skewness: number; kurtosis: number } {
  const n = e.length;
  const mean = e.reduce((s, v) => s + v, 0) / n;
  const moment = (k: number) => e.reduce((s, v) => s + (v - mean) ** k, 0) / n;
  const skewness = moment(3) / moment(2) ** 1.5;
  const kurtosis = moment(4) / moment(2) ** 2;
  return { jb: (n / 6) * (skewness ** 2 + (kurtosis - 3) ** 2 / 4), skewness, kurtosis };
}

function expectRelative(actual: number, expected: number, tol = 1e-9): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol * Math.abs(expected));
}

/** AR(1) noise e_t = ρe_{t−1} + z_t, so that the test has something to find. */
function ar1Problem(seed: number, n: number, p: number, rho: number): { y: number[]; x: number[][] } {
  const { x } = randomProblem(seed, n, p);
  const normal = gaussian(mulberry32(seed + 1000));
  let e = 0;
  const y = x.map((row) => {
    e = rho * e + normal();
    return 1 + row.reduce((s, v) => s + v, 0) + e;
  });
  return { y, x };
}

describe('Durbin–Watson', () => {
  it('d agrees with the definition on residuals computed by ml-matrix, weighted and not', () => {
    const { y, x } = randomProblem(31, 25, 3);
    expectRelative(assumptionChecks({ y, x }).durbinWatson.statistic, durbinWatsonOf(scaledResiduals(x, y)));
    const w = y.map((_, i) => 0.5 + (i % 4));
    expectRelative(assumptionChecks({ y, x, weights: w }).durbinWatson.statistic, durbinWatsonOf(scaledResiduals(x, y, w)));
  });

  it('exact mean and variance agree with M and A formed explicitly, weighted and not', () => {
    const { y, x } = randomProblem(32, 14, 3);
    const plain = assumptionChecks({ y, x }).durbinWatson;
    const reference = bruteForceMoments(
      x,
      y.map(() => 1),
    );
    expectRelative(plain.mean, reference.mean);
    expectRelative(plain.variance, reference.variance);
    const w = y.map((_, i) => 1 + 0.3 * i);
    const weighted = assumptionChecks({ y, x, weights: w }).durbinWatson;
    const weightedReference = bruteForceMoments(x, w);
    expectRelative(weighted.mean, weightedReference.mean);
    expectRelative(weighted.variance, weightedReference.variance);
    expect(Math.abs(weighted.mean - plain.mean)).toBeGreaterThan(1e-4);
  });

  it('intercept only: E[d] = 2 and Var[d] = 4(n−2)/(n²−1)', () => {
    const { y } = randomProblem(33, 20, 0);
    const dw = assumptionChecks({ y, x: y.map(() => []) }).durbinWatson;
    expectRelative(dw.mean, 2, 1e-12);
    expectRelative(dw.variance, (4 * 18) / (400 - 1), 1e-12);
  });

  it('p-values: the normal approximation is near a Monte-Carlo estimate of P(D ≤ d) (loose check)', () => {
    const { y, x } = ar1Problem(34, 30, 2, 0.25);
    const dw = assumptionChecks({ y, x }).durbinWatson;
    const m = residualMaker(
      x,
      y.map(() => 1),
    );
    const normal = gaussian(mulberry32(35));
    const draws = 20000;
    let below = 0;
    for (let k = 0; k < draws; k++) {
      const e = m.mmul(Matrix.columnVector(y.map(() => normal()))).getColumn(0);
      if (durbinWatsonOf(e) <= dw.statistic) below++;
    }
    expect(Math.abs(dw.pPositive - below / draws)).toBeLessThan(0.03);
    expect(dw.pPositive + dw.pNegative).toBeCloseTo(1, 12);
    expect(dw.pTwoSided).toBeCloseTo(2 * Math.min(dw.pPositive, dw.pNegative), 12);
  });

  // One response typed far off: its studentized residual is far past 3 (the RESIDUALS flag) and it
  // alone makes the residuals look non-normal; the overall reading names it before any other signal
  // (Cook & Weisberg 1982 on single-row influence; common practice, no source).
  it('names an outlying row first, by the row number given, with the note that it can cause the other signals', () => {
    const normal = gaussian(mulberry32(44));
    const x = Array.from({ length: 60 }, (_, i) => [1 + (i % 12) / 2]);
    const y = x.map(([v]) => 3 + 2 * v + 0.3 * normal());
    y[23] += 25;
    const rowNumbers = x.map((_, i) => i + 5);
    const checks = assumptionChecks({ y, x }, undefined, rowNumbers);
    expect(checks.jarqueBera.pValue).toBeLessThan(0.05);
    expect(checks.unusualRows[0]).toMatchObject({ index: 23, row: 28, outlier: true });
    expect(checks.unusualRows[0].studentized).toBeGreaterThan(10);
    expect(checks.overall).toMatch(
      /^worth a look first: row 28 \(studentized residual \d+\.\d, Cook's distance \d\.\d\d\) stands out: check its data first, since such a row can cause the other signals; then .*non-normal residuals/,
    );
    expect(assumptionChecks({ y, x }).unusualRows[0].row).toBe(24);
  });

  it('finds strong positive autocorrelation and reads it; independent noise reads as none', () => {
    const correlated = assumptionChecks(ar1Problem(36, 60, 2, 0.8));
    expect(correlated.durbinWatson.pPositive).toBeLessThan(0.001);
    expect(correlated.durbinWatson.reading).toMatch(/^neighbouring residuals move together: positive autocorrelation \(read on the two-sided p < 0\.001\)/);
    expect(correlated.overall).toContain('positive autocorrelation');
    const independent = assumptionChecks(ar1Problem(37, 60, 2, 0));
    expect(independent.durbinWatson.pTwoSided).toBeGreaterThan(0.05);
    expect(independent.durbinWatson.reading).toMatch(/^no sign of autocorrelation in row order \(read on the two-sided p = 0\.\d\d\)$/);
  });

  it('alternating residuals read as negative autocorrelation', () => {
    const dw = assumptionChecks(ar1Problem(38, 60, 1, -0.8)).durbinWatson;
    expect(dw.pNegative).toBeLessThan(0.001);
    expect(dw.reading).toMatch(/^neighbouring residuals alternate in sign: negative autocorrelation/);
  });
});

describe('Breusch–Pagan (Koenker)', () => {
  it('LM agrees with n·R² of the auxiliary regression by ml-matrix; p with the χ² closed forms', () => {
    const two = randomProblem(41, 40, 2);
    const bp2 = assumptionChecks(two).breuschPagan;
    expectRelative(bp2.statistic, koenkerOf(two.x, scaledResiduals(two.x, two.y)));
    expect(bp2.df).toBe(2);
    expectRelative(bp2.pValue, Math.exp(-bp2.statistic / 2));
    const four = randomProblem(42, 50, 4);
    const bp4 = assumptionChecks(four).breuschPagan;
    expectRelative(bp4.statistic, koenkerOf(four.x, scaledResiduals(four.x, four.y)));
    expect(bp4.df).toBe(4);
    expectRelative(bp4.pValue, Math.exp(-bp4.statistic / 2) * (1 + bp4.statistic / 2));
  });

  it('weighted: on √w-scaled residuals, regressed on the predictors as given', () => {
    const { y, x } = randomProblem(43, 30, 2);
    const w = y.map((_, i) => 0.5 + ((i * 7) % 5));
    expectRelative(assumptionChecks({ y, x, weights: w }).breuschPagan.statistic, koenkerOf(x, scaledResiduals(x, y, w)));
  });

  it('spread growing with x is found and read; constant variance is not flagged', () => {
    const normal = gaussian(mulberry32(44));
    const x = Array.from({ length: 200 }, (_, i) => [1 + i / 20]);
    const uneven = assumptionChecks({ y: x.map(([v]) => 2 + v + v * normal()), x }).breuschPagan;
    expect(uneven.pValue).toBeLessThan(0.01);
    expect(uneven.reading).toMatch(/^residual spread changes with the predictors \(p (<|=) 0\.0\d*\): consider robust standard errors$/);
    const even = assumptionChecks({ y: x.map(([v]) => 2 + v + normal()), x }).breuschPagan;
    expect(even.pValue).toBeGreaterThan(0.05);
    expect(even.reading).toMatch(/^no sign that the residual spread changes with the predictors/);
  });

  it('residuals all of one size: the squares have no spread, so LM is NaN with the reason', () => {
    // y ⟂ x and mean 0: the fit is 0 and the residuals are ±1.
    const bp = assumptionChecks({ y: [1, -1, -1, 1, 1, -1, -1, 1], x: [[1], [1], [-1], [-1], [2], [2], [-2], [-2]] }).breuschPagan;
    expect(bp.statistic).toBeNaN();
    expect(bp.undefinedBecause).toBe('equal-squares');
    expect(bp.reading).toContain('every residual has the same size');
  });

  it('intercept-only model: no predictors to test against', () => {
    const { y } = randomProblem(45, 10, 0);
    const bp = assumptionChecks({ y, x: y.map(() => []) }).breuschPagan;
    expect([bp.statistic, bp.df, bp.undefinedBecause]).toEqual([NaN, 0, 'no-predictors']);
  });
});

describe('Jarque–Bera', () => {
  it('agrees with the definition on ml-matrix residuals; p = exp(−JB/2) is the χ²(2) tail', () => {
    const { y, x } = randomProblem(51, 60, 3);
    const jb = assumptionChecks({ y, x }).jarqueBera;
    const reference = jarqueBeraOf(scaledResiduals(x, y));
    expectRelative(jb.statistic, reference.jb);
    expectRelative(jb.skewness, reference.skewness);
    expectRelative(jb.kurtosis, reference.kurtosis);
    expectRelative(jb.pValue, chiSquareUpperTail(jb.statistic, 2), 1e-12);
  });

  it('weighted: moments of the √w-scaled residuals', () => {
    const { y, x } = randomProblem(52, 40, 2);
    const w = y.map((_, i) => 1 + (i % 3));
    expectRelative(assumptionChecks({ y, x, weights: w }).jarqueBera.statistic, jarqueBeraOf(scaledResiduals(x, y, w)).jb);
  });

  it('skewed (exponential) noise is found and described; normal noise looks roughly normal', () => {
    const uniform = mulberry32(53);
    const { x } = randomProblem(54, 300, 1);
    const skewed = assumptionChecks({ y: x.map(([v]) => 1 + v - Math.log(uniform())), x }).jarqueBera;
    expect(skewed.pValue).toBeLessThan(0.001);
    expect(skewed.skewness).toBeGreaterThan(1);
    expect(skewed.reading).toMatch(/^residuals depart from a normal shape \(p < 0\.001\): a long right tail/);
    const normal = assumptionChecks(randomProblem(55, 300, 1)).jarqueBera;
    expect(normal.pValue).toBeGreaterThan(0.05);
    expect(normal.reading).toMatch(/^residuals look roughly normal \(p = 0\.\d\d\)$/);
  });
});

describe('assumptionChecks: together', () => {
  it("passes on residualDiagnostics' Cook's distance, its row and the high-leverage count, and the largest VIF", () => {
    const { y, x } = randomProblem(61, 30, 3);
    const checks = assumptionChecks({ y, x });
    const diagnostics = residualDiagnostics({ y, x });
    const cooks = diagnostics.rows.map((r) => r.cooksDistance);
    expect(checks.largestCooksDistance).toBe(Math.max(...cooks));
    expect(checks.largestCooksRow).toBe(cooks.indexOf(Math.max(...cooks)));
    expect(checks.highLeverageRows).toBe(highLeverageCount(diagnostics));
    const vifs = collinearity(x).terms.map((t) => t.vif);
    expect(checks.largestVif).toBe(Math.max(...vifs));
    expect(checks.largestVifTerm).toBe(`x${vifs.indexOf(Math.max(...vifs)) + 1}`);
  });

  it('reads each test at α = 1 − level: a p between 0.01 and 0.05 is flagged at 0.95 and not at 0.99', () => {
    // Seed chosen (by search over a few seeds) so that Koenker's p lands between 0.01 and 0.05.
    const normal = gaussian(mulberry32(70));
    const x = Array.from({ length: 80 }, (_, i) => [i / 10]);
    const y = x.map(([v]) => v + (1 + 0.12 * v) * normal());
    const at95 = assumptionChecks({ y, x }, { level: 0.95 });
    expect(at95.breuschPagan.pValue).toBeGreaterThan(0.01);
    expect(at95.breuschPagan.pValue).toBeLessThan(0.05);
    expect(at95.breuschPagan.reading).toMatch(/^residual spread changes/);
    expect(at95.overall).toBe('worth a look: uneven residual spread');
    const at99 = assumptionChecks({ y, x }, { level: 0.99 });
    expect(at99.breuschPagan.reading).toMatch(/^no sign that the residual spread/);
    expect(at99.overall).toBe('nothing stands out at the 99% level');
  });

  it('the three tests ignore a known σ and do not change when y is multiplied by 1e200', () => {
    const { y, x } = randomProblem(63, 25, 2);
    const base = assumptionChecks({ y, x });
    const known = assumptionChecks({ y, x }, { knownSigma: 3 });
    const huge = assumptionChecks({ y: y.map((v) => v * 1e200), x });
    for (const other of [known, huge]) {
      expectRelative(other.durbinWatson.statistic, base.durbinWatson.statistic, 1e-12);
      expectRelative(other.breuschPagan.statistic, base.breuschPagan.statistic, 1e-10);
      expectRelative(other.jarqueBera.statistic, base.jarqueBera.statistic, 1e-10);
    }
    expect(known.largestCooksDistance).not.toBeCloseTo(base.largestCooksDistance, 6);
  });

  it('an exact fit: every statistic NaN with the reason, and the overall reading says why', () => {
    const x = [[1], [2], [3], [4], [6], [7]];
    const checks = assumptionChecks({ y: x.map(([v]) => 2 + 0.5 * v), x });
    expect([checks.durbinWatson.statistic, checks.breuschPagan.statistic, checks.jarqueBera.statistic]).toEqual([NaN, NaN, NaN]);
    expect([checks.durbinWatson.undefinedBecause, checks.breuschPagan.undefinedBecause, checks.jarqueBera.undefinedBecause]).toEqual([
      'exact-fit',
      'exact-fit',
      'exact-fit',
    ]);
    expect(checks.durbinWatson.reading).toMatch(/^exact fit/);
    expect(checks.largestCooksDistance).toBeNaN();
    expect(checks.largestCooksRow).toBe(-1);
    expect(checks.overall).toMatch(/^exact fit: every residual is 0/);
  });

  it('n = p + 1: d is fixed by the design (Var[d] = 0), so it has no p-value', () => {
    const { y, x } = randomProblem(64, 4, 2);
    const dw = assumptionChecks({ y, x }).durbinWatson;
    expect(Math.abs(dw.variance)).toBeLessThan(1e-12);
    expectRelative(dw.statistic, dw.mean, 1e-9);
    expect(dw.pPositive).toBeNaN();
    expect(dw.undefinedBecause).toBe('fixed-by-design');
    expect(dw.reading).toContain('fixed by the design');
  });

  it('perfectly collinear predictors: largest VIF ∞ with its term and reason, named in the overall reading', () => {
    const { y, x } = randomProblem(65, 20, 2);
    const checks = assumptionChecks({ y, x: x.map((r) => [...r, r[0] + r[1]]) });
    expect(checks.largestVif).toBe(Infinity);
    expect(checks.largestVifTerm).toBe('x1');
    expect(checks.largestVifReason).toContain('perfectly collinear');
    expect(checks.overall).toContain('terms that are exact combinations of others');
  });
});
