/**
 * Extrapolation flags on predictions. Checks:
 * - simple regression's leverage h₀ = 1/n + (x₀ − x̄)²/Sxx (common practice, no source; e.g.
 *   Montgomery, Peck & Vining, Introduction to Linear Regression Analysis, on the variance of ŷ₀);
 * - the leverage of a new row equal to a fitting row is that row's hat value hᵢ from the engine's
 *   own residual diagnostics (x₀ = xᵢ in x₀ᵀ(XᵀX)⁻¹x₀; common practice, no source), hᵢ/wᵢ with weights;
 * - hidden extrapolation in a design worked by hand (below): two strongly correlated predictors,
 *   where a point inside both ranges lies far off the data's diagonal (common practice, no source);
 * - the fitting rows' largest leverage, read from the shared hat diagonal, is exactly the largest
 *   leverageAt over every fitting row, the definition (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { predict, residualDiagnostics } from '../../../src/engine';
import { solveModel } from '../../../src/engine/fitModel';
import { extrapolationFlags, fittingSpan, leverageAt } from '../../../src/engine/infer/extrapolation';
import type { ModelData } from '../../../src/engine';
import { registerPackedData } from '../../../src/engine/cache/packedPredictors';
import { randomProblem } from '../../support/random';

/**
 * Six rows, both columns of mean 0, so the intercept is orthogonal to them and
 * h(x₀) = 1/6 + x₀ᵀS⁻¹x₀ with S = Σxxᵀ = [[10.5, 9.5], [9.5, 10.5]]:
 *   Σx₁² = Σx₂² = 4 + 4 + 1 + 1 + 0.25 + 0.25 = 10.5, Σx₁x₂ = 4 + 4 + 1 + 1 − 0.25 − 0.25 = 9.5.
 * S has eigenvalue 20 along (1, 1)/√2 and 1 along (1, −1)/√2, so a point a·(1, 1) + b·(1, −1) has
 * x₀ᵀS⁻¹x₀ = 2a²/20 + 2b²/1.
 *   rows (±2, ±2): 1/6 + 8/20 = 0.5667; rows (±1, ±1): 1/6 + 2/20 = 0.2667;
 *   rows ±(0.5, −0.5): 1/6 + 0.5 = 0.6667, the largest hat value.
 *   new (2, −2): inside [−2, 2] in both columns, yet 1/6 + 8 = 8.1667: hidden extrapolation.
 *   new (1, 1): 0.2667, inside and not hidden.  new (3, 3): outside both ranges.
 */
const DIAGONAL_X = [
  [2, 2],
  [-2, -2],
  [1, 1],
  [-1, -1],
  [0.5, -0.5],
  [-0.5, 0.5],
];
const DIAGONAL_Y = [4.1, -3.8, 2.2, -1.9, 0.3, -0.1];

describe('extrapolation flags', () => {
  it('simple regression: leverage is 1/n + (x₀ − x̄)²/Sxx, and a value beyond the data is flagged', () => {
    // x = 1..5: n = 5, x̄ = 3, Sxx = 4 + 1 + 0 + 1 + 4 = 10.
    const x = [[1], [2], [3], [4], [5]];
    const y = [2.1, 3.9, 6.2, 7.8, 10.1];
    const [inside, beyond, below] = predict({ y, x }, [[4.5], [7], [0.5]]);
    expect(inside.leverage).toBeCloseTo(0.2 + 2.25 / 10, 14);
    expect(inside.outsideRange).toEqual([]);
    expect(inside.hiddenExtrapolation).toBe(false);
    expect(beyond.leverage).toBeCloseTo(0.2 + 16 / 10, 14);
    expect(beyond.outsideRange).toEqual([0]);
    // Outside its range is said once, as outsideRange, never also as hidden.
    expect(beyond.hiddenExtrapolation).toBe(false);
    expect(below.outsideRange).toEqual([0]);
  });

  it('a new row equal to a fitting row has that row’s hat value', () => {
    const { y, x } = randomProblem(71, 30, 3);
    const diagnostics = residualDiagnostics({ y, x });
    const rows = [0, 7, 29];
    const predictions = predict(
      { y, x },
      rows.map((i) => x[i]),
    );
    predictions.forEach((p, k) => {
      expect(p.leverage).toBeCloseTo(diagnostics.rows[rows[k]].leverage, 12);
      expect(p.outsideRange).toEqual([]);
      expect(p.hiddenExtrapolation).toBe(false);
    });
  });

  it('the fitting row of largest leverage is not hidden extrapolation, though its leverage ties the largest', () => {
    const { y, x } = randomProblem(72, 25, 2);
    const diagnostics = residualDiagnostics({ y, x });
    const largest = diagnostics.rows.reduce((best, row, i) => (row.leverage > diagnostics.rows[best].leverage ? i : best), 0);
    const [p] = predict({ y, x }, [x[largest]]);
    expect(p.leverage).toBeCloseTo(diagnostics.rows[largest].leverage, 12);
    expect(p.hiddenExtrapolation).toBe(false);
  });

  it('two correlated predictors: (2, −2) is inside each range but far off the diagonal (worked by hand above)', () => {
    const data = { y: DIAGONAL_Y, x: DIAGONAL_X };
    const [offDiagonal, onDiagonal, beyond, dataRow] = predict(data, [
      [2, -2],
      [1, 1],
      [3, 3],
      [0.5, -0.5],
    ]);
    expect(offDiagonal.leverage).toBeCloseTo(1 / 6 + 8, 12);
    expect(offDiagonal.outsideRange).toEqual([]);
    expect(offDiagonal.hiddenExtrapolation).toBe(true);
    expect(onDiagonal.leverage).toBeCloseTo(1 / 6 + 0.1, 12);
    expect(onDiagonal.hiddenExtrapolation).toBe(false);
    expect(beyond.outsideRange).toEqual([0, 1]);
    expect(beyond.hiddenExtrapolation).toBe(false);
    expect(dataRow.leverage).toBeCloseTo(1 / 6 + 0.5, 12);
    expect(dataRow.hiddenExtrapolation).toBe(false);

    const { solution } = solveModel(data);
    const span = fittingSpan(data, solution);
    expect(span.low).toEqual([-2, -2]);
    expect(span.high).toEqual([2, 2]);
    expect(span.largestLeverage).toBeCloseTo(1 / 6 + 0.5, 12);
    const diagnostics = residualDiagnostics(data);
    expect(span.largestLeverage).toBeCloseTo(Math.max(...diagnostics.rows.map((r) => r.leverage)), 12);
  });

  it('weighted fit: leverage is on the predictors’ scale, hᵢ/wᵢ for a fitting row, and ignores the new row’s weight', () => {
    const { y, x } = randomProblem(73, 20, 2);
    const weights = x.map((_, i) => 0.5 + (i % 4));
    const data = { y, x, weights };
    const diagnostics = residualDiagnostics(data);
    const [p] = predict(data, [x[5]]);
    expect(p.leverage).toBeCloseTo(diagnostics.rows[5].leverage / weights[5], 12);
    const [heavy] = predict(data, [x[5]], undefined, [9]);
    expect(heavy.leverage).toBe(p.leverage);

    // The largest hᵢ/wᵢ, not the largest hᵢ, is what the fitting rows span.
    const { solution } = solveModel(data);
    const span = fittingSpan(data, solution);
    const largestOnPredictorScale = Math.max(...diagnostics.rows.map((r, i) => r.leverage / weights[i]));
    expect(span.largestLeverage).toBeCloseTo(largestOnPredictorScale, 12);
    const atLargest = diagnostics.rows.findIndex((r, i) => r.leverage / weights[i] === largestOnPredictorScale);
    expect(predict(data, [x[atLargest]])[0].hiddenExtrapolation).toBe(false);
  });

  it('without an intercept the leverage is x₀ᵀ(XᵀX)⁻¹x₀ = x₀²/Σx² for one predictor', () => {
    // Σx² = 1 + 4 + 9 = 14 (common practice, no source).
    const [p] = predict({ y: [1.1, 1.9, 3.2], x: [[1], [2], [3]] }, [[2.5]], { intercept: false });
    expect(p.leverage).toBeCloseTo(6.25 / 14, 14);
  });

  it('an indicator column that never took a value is outside its range even where no prediction exists', () => {
    // The third column is 0 in every fitting row (a level never seen): it is aliased, and a new row
    // with a 1 there cannot be predicted, but the flag still names the column.
    const { y, x } = randomProblem(74, 12, 2);
    const withUnseen = x.map((r) => [...r, 0]);
    const [p] = predict({ y, x: withUnseen }, [[0, 0, 1]]);
    expect(Number.isNaN(p.estimate)).toBe(true);
    expect(Number.isNaN(p.leverage)).toBe(true);
    expect(p.outsideRange).toEqual([2]);
    expect(p.hiddenExtrapolation).toBe(false);
  });

  it('extrapolationFlags compares with each column’s closed range and the largest leverage', () => {
    const span = { low: [0, 10], high: [1, 20], largestLeverage: 0.5 };
    expect(extrapolationFlags([0, 20], 0.5, span)).toEqual({ outsideRange: [], hiddenExtrapolation: false });
    expect(extrapolationFlags([0.5, 15], 0.6, span)).toEqual({ outsideRange: [], hiddenExtrapolation: true });
    expect(extrapolationFlags([-0.1, 21], 3, span)).toEqual({ outsideRange: [0, 1], hiddenExtrapolation: false });
  });

  describe('the largest fitting leverage', () => {
    function largestByDefinition(data: ModelData): number {
      const { solution } = solveModel(data);
      return Math.max(...data.x.map((row) => leverageAt([1, ...row], solution)));
    }

    it('is the largest leverageAt over every fitting row, to the last bit, with and without weights', () => {
      const { y, x } = randomProblem(75, 200, 6);
      for (const weights of [undefined, x.map((_, i) => 0.25 + (i % 7))]) {
        const data = { y, x, weights };
        expect(fittingSpan(data, solveModel(data).solution).largestLeverage).toBe(largestByDefinition(data));
      }
    });

    const powersOf = (degree: number) => {
      const t = Array.from({ length: 40 }, (_, i) => i + 1);
      return { y: t.map((v) => Math.cos(v)), x: t.map((v) => Array.from({ length: degree }, (_, k) => v ** (k + 1))) };
    };

    it('when two rows nearly tie and the hat diagonal ranks them the other way round from leverageAt', () => {
      // Powers of 1..40 up to the sixth: rows 1 and 40 lead, 1.3e-13 apart, in opposite orders.
      const data = powersOf(6);
      expect(fittingSpan(data, solveModel(data).solution).largestLeverage).toBe(largestByDefinition(data));
    });

    it('on an ill-conditioned design too, where the two routes part by 1e-5 and rank the leading rows differently', () => {
      // Powers up to the sixteenth: κ of the unit-scaled design near 1e12, the routes 1.2e-5 apart.
      const data = powersOf(16);
      expect(fittingSpan(data, solveModel(data).solution).largestLeverage).toBe(largestByDefinition(data));
    });

    it('is read from the packed predictors, never the rows', () => {
      const { y, x } = randomProblem(76, 50, 3);
      const packedOnly = {
        y,
        get x(): number[][] {
          throw new Error('the rows were built');
        },
      } as ModelData;
      registerPackedData(packedOnly, { y: Float64Array.from(y), predictors: { values: Float64Array.from(x.flat()), rows: 50, p: 3 }, weights: undefined });
      const [fromPacked] = predict(packedOnly, [x[4]]);
      expect(fromPacked).toEqual(predict({ y, x }, [x[4]])[0]);
    });

    it('ties: every one of several fitting rows of equal largest leverage is inside the span', () => {
      // x = −3 … 3 with x²: rows −3 and 3 share the largest leverage (a symmetric design).
      const t = [-3, -2, -1, 0, 1, 2, 3];
      const data = { y: [5.1, 2.2, 0.8, 0.1, 1.1, 3.9, 9.2], x: t.map((v) => [v, v * v]) };
      const predictions = predict(data, [
        [-3, 9],
        [3, 9],
      ]);
      expect(predictions[0].leverage).toBeCloseTo(predictions[1].leverage, 14);
      for (const p of predictions) expect(p.hiddenExtrapolation).toBe(false);
    });
  });
});
