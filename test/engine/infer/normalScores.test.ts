/**
 * Q–Q plot points. Blom's plotting positions (G. Blom, Statistical Estimates and Transformed
 * Beta-Variables, 1958): for m = 5 they are 0.119, 0.310, 0.5, 0.690, 0.881, whose normal
 * quantiles are ±1.18, ±0.497 and 0 (computed here from the positions with the engine's normal
 * quantile, itself checked against the NIST/SEMATECH normal table in test/engine/distributions).
 * The pairing of points with rows and the order of ties follow the definition: common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { residualDiagnostics } from '../../../src/engine';
import { normalQuantile } from '../../../src/engine/distributions';
import { normalScores, resetNormalScores } from '../../../src/engine/infer/normalScores';
import { randomProblem } from '../../support/random';

describe('normalScores', () => {
  it('pairs the sorted studentized residuals with Blom quantiles, symmetric about 0', () => {
    const { y, x } = randomProblem(5, 5, 0);
    const points = normalScores(residualDiagnostics({ y, x }));
    expect(Array.from(points.normalQuantile, (q) => q.toFixed(3))).toEqual(['-1.180', '-0.497', '0.000', '0.497', '1.180']);
    const values = Array.from(points.studentized);
    expect([...values].sort((a, b) => a - b)).toEqual(values);
  });

  it('skips rows whose studentized residual is undefined', () => {
    // Row 4 alone carries the dummy column: leverage 1, studentized residual undefined.
    const y = [1.1, 2.3, 2.9, 10, 5.2, 5.8];
    const x = [
      [1, 0],
      [2, 0],
      [3, 0],
      [4, 1],
      [5, 0],
      [6, 0],
    ];
    const points = normalScores(residualDiagnostics({ y, x }));
    expect(points.rowIndex).toHaveLength(5);
    expect(Array.from(points.rowIndex)).not.toContain(3);
  });

  it("pairs each point with its own row's residual and Blom's quantile of its rank", () => {
    const { y, x } = randomProblem(8, 30, 2);
    const diagnostics = residualDiagnostics({ y, x });
    const points = normalScores(diagnostics);
    const m = points.rowIndex.length;
    expect(m).toBe(30);
    expect([...points.rowIndex].sort((a, b) => a - b)).toEqual(Array.from({ length: 30 }, (_, i) => i));
    points.rowIndex.forEach((row, k) => {
      expect(points.studentized[k]).toBe(diagnostics.rows[row].studentized);
      expect(points.normalQuantile[k]).toBeCloseTo(normalQuantile((k + 1 - 0.375) / (m + 0.25)), 14);
    });
  });

  it('keeps the rows of equal residuals in row order', () => {
    // Intercept only: equal y give equal studentized residuals.
    const y = [1, 2, 2, 1, 3, 3, 0];
    const points = normalScores(residualDiagnostics({ y, x: y.map(() => []) }));
    expect(Array.from(points.rowIndex)).toEqual([6, 0, 3, 1, 2, 4, 5]);
  });

  it("orders each fit's residuals afresh, whatever the fit before it was", () => {
    // Each call starts from the previous call's order: fits of the same size and of another size in turn.
    const stableOrder = (values: Float64Array) => Array.from(values, (_, i) => i).sort((a, b) => values[a] - values[b]);
    for (const [seed, n] of [
      [3, 60],
      [4, 60],
      [5, 45],
      [6, 60],
    ]) {
      const { y, x } = randomProblem(seed, n, 2);
      const diagnostics = residualDiagnostics({ y, x });
      expect(Array.from(normalScores(diagnostics).rowIndex)).toEqual(stableOrder(diagnostics.studentized));
    }
  });

  it('keeps the quantiles of the last size until reset, and gives the same points after it', () => {
    const { y, x } = randomProblem(7, 25, 1);
    const diagnostics = residualDiagnostics({ y, x });
    const first = normalScores(diagnostics);
    expect(normalScores(diagnostics).normalQuantile).toBe(first.normalQuantile);
    resetNormalScores();
    const afresh = normalScores(diagnostics);
    expect(afresh.normalQuantile).not.toBe(first.normalQuantile);
    expect(afresh).toEqual(first);
  });
});
