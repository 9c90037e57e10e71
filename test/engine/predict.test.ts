/**
 * Prediction intervals. Checks: the textbook closed forms for the intercept-only model (mean
 * interval ȳ ± t·s/√n, new-observation interval ȳ ± t·s·√(1 + 1/n); common practice, no source),
 * x₀ᵀ(XᵀX)⁻¹x₀ from ml-matrix (npm) as an independent oracle, and the NIST/SEMATECH e-Handbook
 * table value t₀.₉₇₅(9) = 2.262 (section 1.3.6.7.2, from memory).
 */
import { Matrix, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { fitModel, predict } from '../../src/engine';
import { randomProblem } from '../support/random';

describe('predict', () => {
  it('intercept only: ȳ ± t₀.₉₇₅(9)·s/√10 for the mean and ȳ ± t·s·√(1.1) for a new value', () => {
    const y = [4.1, 5.3, 6.2, 5.9, 4.8, 5.1, 6.6, 5.5, 4.9, 5.6];
    const mean = y.reduce((a, b) => a + b) / 10;
    const s = Math.sqrt(y.reduce((a, v) => a + (v - mean) ** 2, 0) / 9);
    const [p] = predict({ y, x: y.map(() => []) }, [[]]);
    expect(p.estimate).toBeCloseTo(mean, 12);
    expect((p.meanHigh - p.estimate) / (s / Math.sqrt(10))).toBeCloseTo(2.262, 3);
    expect((p.newHigh - p.estimate) / (s * Math.sqrt(1.1))).toBeCloseTo(2.262, 3);
    expect(p.estimate - p.meanLow).toBeCloseTo(p.meanHigh - p.estimate, 12);
  });

  it('agrees with x₀ᵀ(XᵀX)⁻¹x₀ computed by ml-matrix, and reproduces the fitted value at a data row', () => {
    const { y, x } = randomProblem(41, 35, 3);
    const fit = fitModel({ y, x });
    const design = new Matrix(x.map((r) => [1, ...r]));
    const xtxInverse = inverse(design.transpose().mmul(design));
    const newRows = [x[4], [0.5, -1, 2], [10, 10, -10]];
    const predictions = predict({ y, x }, newRows);
    const t = (fit.terms[1].ciHigh - fit.terms[1].estimate) / fit.terms[1].standardError;
    predictions.forEach((p, i) => {
      const x0 = Matrix.rowVector([1, ...newRows[i]]);
      const h = x0.mmul(xtxInverse).mmul(x0.transpose()).get(0, 0);
      expect(Math.abs(p.meanHigh - p.estimate - t * fit.sigma * Math.sqrt(h))).toBeLessThan(1e-9 * fit.sigma);
      expect(Math.abs(p.newHigh - p.estimate - t * fit.sigma * Math.sqrt(1 + h))).toBeLessThan(1e-9 * fit.sigma);
    });
    expect(predictions[0].estimate).toBeCloseTo(fit.fitted[4], 10);
  });

  it('gives a new observation of weight w₀ the variance σ²/w₀', () => {
    const { y, x } = randomProblem(42, 25, 2);
    const [light] = predict({ y, x }, [[0, 0]], undefined, [4]);
    const [plain] = predict({ y, x }, [[0, 0]]);
    const meanHalf = plain.meanHigh - plain.estimate;
    const newHalfPlain = plain.newHigh - plain.estimate;
    const t2s2 = newHalfPlain ** 2 - meanHalf ** 2;
    expect((light.newHigh - light.estimate) ** 2).toBeCloseTo(meanHalf ** 2 + t2s2 / 4, 10);
  });

  it('with aliased terms predicts only where the answer does not depend on the aliasing', () => {
    const { y, x } = randomProblem(43, 20, 2);
    const withCopy = x.map((r) => [r[0], r[1], 2 * r[0]]);
    const [consistent, inconsistent] = predict({ y, x: withCopy }, [
      [1, 2, 2],
      [1, 2, 5],
    ]);
    const [reference] = predict({ y, x }, [[1, 2]]);
    expect(consistent.estimate).toBeCloseTo(reference.estimate, 10);
    expect(consistent.newHigh).toBeCloseTo(reference.newHigh, 10);
    expect(Number.isNaN(inconsistent.estimate)).toBe(true);
  });

  it('rejects new rows of the wrong width or with non-finite values', () => {
    const { y, x } = randomProblem(44, 10, 2);
    expect(() => predict({ y, x }, [[1]])).toThrow(/2 predictors/);
    expect(() => predict({ y, x }, [[1, Number.NaN]])).toThrow(/finite/);
  });
});
