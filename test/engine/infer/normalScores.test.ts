/**
 * Q–Q plot points. Blom's plotting positions (G. Blom, Statistical Estimates and Transformed
 * Beta-Variables, 1958): for m = 5 they are 0.119, 0.310, 0.5, 0.690, 0.881, whose normal
 * quantiles are ±1.18, ±0.497 and 0 (computed here from the positions with the engine's normal
 * quantile, itself checked against the NIST/SEMATECH normal table in test/engine/distributions).
 */
import { describe, expect, it } from 'vitest';
import { residualDiagnostics } from '../../../src/engine';
import { normalScores } from '../../../src/engine/infer/normalScores';
import { randomProblem } from '../../support/random';

describe('normalScores', () => {
  it('pairs the sorted studentized residuals with Blom quantiles, symmetric about 0', () => {
    const { y, x } = randomProblem(5, 5, 0);
    const points = normalScores(residualDiagnostics({ y, x }));
    expect(points.map((p) => p.normalQuantile.toFixed(3))).toEqual(['-1.180', '-0.497', '0.000', '0.497', '1.180']);
    const values = points.map((p) => p.studentized);
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
    expect(points).toHaveLength(5);
    expect(points.map((p) => p.rowIndex)).not.toContain(3);
  });
});
