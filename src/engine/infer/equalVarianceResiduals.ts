import type { LeastSquaresSolution } from '../fit/leastSquares';

/** The last solution's, so the residual tests and diagnostics of one fit form them once; one is kept. */
let last: { solution: LeastSquaresSolution; u: Float64Array } | undefined;

/**
 * uᵢ = √wᵢ·eᵢ/yScale: the residuals that share one variance under the model, in units that neither
 * over- nor underflow when squared. The residual tests (Durbin–Watson, Breusch–Pagan, Shapiro–Wilk,
 * Jarque–Bera) and the residual diagnostics all read these. Callers must not write into the array returned.
 */
export function equalVarianceResiduals(solution: LeastSquaresSolution): Float64Array {
  if (last?.solution !== solution) {
    const { residuals, yScale } = solution;
    const roots = solution.design.rootWeights;
    const u = new Float64Array(residuals.length);
    for (let i = 0; i < u.length; i++) u[i] = ((roots === undefined ? 1 : roots[i]) * residuals[i]) / yScale;
    last = { solution, u };
  }
  return last.u;
}

/** Lets go of the kept residuals (see resetCaches.ts). */
export function resetEqualVarianceResiduals(): void {
  last = undefined;
}
