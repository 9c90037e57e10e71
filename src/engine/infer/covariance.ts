import type { LeastSquaresSolution } from '../fit/leastSquares';

/**
 * Covariance of the estimates, σ²(XᵀWX)⁻¹, taken from R⁻¹ of the scaled columns:
 * (XᵀWX)⁻¹ = S⁻¹ R⁻¹ R⁻ᵀ S⁻¹ with S the column scales. Never forms or inverts XᵀX.
 * Rows and columns of aliased terms are NaN.
 */
export function covarianceMatrix(solution: LeastSquaresSolution, sigma: number): number[][] {
  const q = solution.coefficients.length;
  const rank = solution.qr.accepted.length;
  const position = acceptedPositions(solution);
  const { rInverse } = solution;
  const cov: number[][] = Array.from({ length: q }, () => new Array<number>(q).fill(Number.NaN));
  for (let a = 0; a < q; a++) {
    const pa = position[a];
    if (pa < 0) continue;
    const fa = sigma / solution.columnScales[a];
    for (let b = 0; b <= a; b++) {
      const pb = position[b];
      if (pb < 0) continue;
      let dot = 0;
      // R⁻¹ is upper triangular: row a is zero left of its diagonal.
      for (let k = Math.max(pa, pb); k < rank; k++) dot += rInverse[pa * rank + k] * rInverse[pb * rank + k];
      const value = fa * (sigma / solution.columnScales[b]) * dot;
      cov[a][b] = value;
      cov[b][a] = value;
    }
  }
  return cov;
}

/** Standard errors, √diag of the covariance, each from one row of R⁻¹. */
export function standardErrors(solution: LeastSquaresSolution, sigma: number): number[] {
  const rank = solution.qr.accepted.length;
  const position = acceptedPositions(solution);
  return Array.from(solution.coefficients, (_, a) => {
    const pa = position[a];
    if (pa < 0) return Number.NaN;
    let sum = 0;
    for (let k = pa; k < rank; k++) sum += solution.rInverse[pa * rank + k] ** 2;
    return (sigma / solution.columnScales[a]) * Math.sqrt(sum);
  });
}

/** For each design column, its row in R (or −1 when aliased). */
export function acceptedPositions(solution: LeastSquaresSolution): Int32Array {
  const position = new Int32Array(solution.coefficients.length).fill(-1);
  solution.qr.accepted.forEach((col, a) => {
    position[col] = a;
  });
  return position;
}
