/**
 * The exact null moments of the Durbin–Watson d. Source: Durbin & Watson (Biometrika 37, 1950), §3:
 * under the null d is Σλᵢzᵢ²/Σzᵢ² over the m = n − p eigenvalues λ of MA on the residual space, so
 * E[d] = Σλ/m and Var[d] = 2(Σλ² − (Σλ)²/m)/(m(m + 2)) (from memory). The eigenvalues come from
 * residualSpaceEigenvalues, whose values the R fixtures of durbinWatsonExact.test.ts check.
 */
import { describe, expect, it } from 'vitest';
import { solveModel } from '../../../src/engine/fitModel';
import { durbinWatsonMoments } from '../../../src/engine/infer/durbinWatson';
import { residualSpaceEigenvalues } from '../../../src/engine/infer/durbinWatsonExact';
import { randomProblem } from '../../support/random';

function eigenvalueMoments(eigenvalues: Float64Array): { mean: number; variance: number } {
  const m = eigenvalues.length;
  const sum = eigenvalues.reduce((s, v) => s + v, 0);
  const squares = eigenvalues.reduce((s, v) => s + v * v, 0);
  return { mean: sum / m, variance: (2 * (squares - (sum * sum) / m)) / (m * (m + 2)) };
}

describe('durbinWatsonMoments', () => {
  // 600 rows run past one tile of 512 differences, so the tiles' seams are checked too.
  it.each([
    [40, 2],
    [600, 3],
  ])('matches the moments of the eigenvalues of MA at n = %i, %i predictors', (n, p) => {
    const { y, x } = randomProblem(70 + n, n, p);
    const solution = solveModel({ y, x }).solution;
    const expected = eigenvalueMoments(residualSpaceEigenvalues(solution.qr));
    const { mean, variance } = durbinWatsonMoments(solution);
    expect(Math.abs(mean - expected.mean) / expected.mean).toBeLessThan(1e-12);
    expect(Math.abs(variance - expected.variance) / expected.variance).toBeLessThan(1e-9);
  });

  it('weighted, without an intercept: the moments of the √w-scaled design', () => {
    const n = 30;
    const { y, x } = randomProblem(5, n, 2);
    const weights = Array.from({ length: n }, (_, i) => 0.5 + ((i * 7) % 5));
    const solution = solveModel({ y, x, weights }, { intercept: false }).solution;
    const expected = eigenvalueMoments(residualSpaceEigenvalues(solution.qr));
    const { mean, variance } = durbinWatsonMoments(solution);
    expect(Math.abs(mean - expected.mean) / expected.mean).toBeLessThan(1e-12);
    expect(Math.abs(variance - expected.variance) / expected.variance).toBeLessThan(1e-9);
  });
});
