/**
 * Source: F. J. Anscombe, "Graphs in Statistical Analysis", The American Statistician 27(1),
 * 17–21 (1973), Table 1 (the four data sets, from memory) and the summary printed with it: every
 * set gives ŷ = 3 + 0.5x, regression SS 27.50, residual SS 13.75 on 9 df, SE of the slope 0.118
 * and multiple R² 0.667 (from memory).
 */
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../src/engine';

const x123 = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const quartet = [
  { x: x123, y: [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68] },
  { x: x123, y: [9.14, 8.14, 8.74, 8.77, 9.26, 8.1, 6.13, 3.1, 9.13, 7.26, 4.74] },
  { x: x123, y: [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73] },
  { x: [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8], y: [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.5, 5.56, 7.91, 6.89] },
];

describe("Anscombe's quartet (Anscombe 1973)", () => {
  it.each([0, 1, 2, 3])('set %i gives intercept 3.00, slope 0.500, R² 0.67 and the printed sums of squares', (k) => {
    const { x, y } = quartet[k];
    const fit = fitModel({ y, x: x.map((v) => [v]) });
    const [intercept, slope] = fit.terms;
    expect(intercept.estimate).toBeCloseTo(3.0, 2);
    expect(slope.estimate).toBeCloseTo(0.5, 3);
    expect(fit.rSquared).toBeCloseTo(0.67, 2);
    expect(slope.standardError).toBeCloseTo(0.118, 3);
    expect(fit.residualDf).toBe(9);
    expect(fit.rss).toBeCloseTo(13.75, 1);
  });
});
