/**
 * Source: ml-matrix (npm), a general-purpose linear-algebra library, as an independent oracle:
 * its QR least-squares solve for the coefficients, and its matrix inverse of XᵀX for the
 * covariance on well-conditioned random designs (where forming XᵀX loses nothing that matters
 * at the 1e-9 level asserted).
 */
import { Matrix, QrDecomposition, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../src/engine';
import { randomProblem } from '../support/random';

function withIntercept(x: number[][]): Matrix {
  return new Matrix(x.map((row) => [1, ...row]));
}

function relativeError(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

describe('agreement with ml-matrix on random well-conditioned data', () => {
  it.each([
    [1, 30, 1],
    [2, 50, 3],
    [3, 200, 8],
    [4, 1000, 20],
  ])('seed %i, n = %i, p = %i: coefficients and standard errors agree to 1e-9', (seed, n, p) => {
    const { y, x } = randomProblem(seed, n, p);
    const fit = fitModel({ y, x });

    const design = withIntercept(x);
    const reference = new QrDecomposition(design).solve(Matrix.columnVector(y)).to1DArray();
    fit.terms.forEach((t, j) => expect(relativeError(t.estimate, reference[j])).toBeLessThan(1e-9));

    const residuals = Matrix.columnVector(y)
      .sub(design.mmul(Matrix.columnVector(reference)))
      .to1DArray();
    const rss = residuals.reduce((s, r) => s + r * r, 0);
    const sigma2 = rss / (n - p - 1);
    const xtxInverse = inverse(design.transpose().mmul(design));
    fit.terms.forEach((t, j) => expect(relativeError(t.standardError, Math.sqrt(sigma2 * xtxInverse.get(j, j)))).toBeLessThan(1e-9));
    fit.covariance.forEach((row, a) =>
      row.forEach((v, b) =>
        expect(Math.abs(v - sigma2 * xtxInverse.get(a, b))).toBeLessThan(1e-9 * sigma2 * Math.sqrt(xtxInverse.get(a, a) * xtxInverse.get(b, b))),
      ),
    );
    expect(relativeError(fit.rss, rss)).toBeLessThan(1e-9);
  });
});
