/**
 * Symmetric eigenvalues. Sources: closed forms (the second-difference matrix DᵀD of the
 * Durbin–Watson statistic has eigenvalues 2 − 2cos(πk/n), k = 0…n−1, Durbin & Watson 1950; the
 * tridiagonal Toeplitz matrix tridiag(1, 2, 1) has 2 + 2cos(πk/(m+1)), k = 1…m: common practice,
 * no source); ml-matrix's EigenvalueDecomposition (npm, general-purpose linear algebra, a port of
 * JAMA) on seeded random matrices; and the invariants trace = Σλ and ‖A‖²_F = Σλ².
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { symmetricEigenvalues, tridiagonalEigenvalues } from '../../../src/engine/linalg/symmetricEigen';
import { gaussian, mulberry32 } from '../../support/random';

function differenceMatrix(n: number): Float64Array {
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    a[i * n + i] = i === 0 || i === n - 1 ? 1 : 2;
    if (i > 0) a[i * n + i - 1] = -1;
    if (i < n - 1) a[i * n + i + 1] = -1;
  }
  return a;
}

function randomSymmetric(seed: number, m: number): Float64Array {
  const normal = gaussian(mulberry32(seed));
  const a = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j <= i; j++) {
      const value = normal();
      a[i * m + j] = value;
      a[j * m + i] = value;
    }
  }
  return a;
}

function maxAbsDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let worst = 0;
  for (let i = 0; i < a.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]));
  return worst;
}

describe('symmetricEigenvalues', () => {
  it.each([2, 3, 10, 57, 200])('gives 2 − 2cos(πk/n) for the difference matrix DᵀD, n = %i', (n) => {
    const expected = Float64Array.from({ length: n }, (_, k) => 2 - 2 * Math.cos((Math.PI * k) / n)).sort();
    expect(maxAbsDifference(symmetricEigenvalues(differenceMatrix(n), n), expected)).toBeLessThan(1e-13);
  });

  it('gives 2 + 2cos(πk/(m+1)) for tridiag(1, 2, 1) straight from its diagonals', () => {
    const m = 40;
    const values = tridiagonalEigenvalues(new Float64Array(m).fill(2), new Float64Array(m - 1).fill(1));
    const expected = Float64Array.from({ length: m }, (_, k) => 2 + 2 * Math.cos((Math.PI * (k + 1)) / (m + 1))).sort();
    expect(maxAbsDifference(values, expected)).toBeLessThan(1e-13);
  });

  it.each([
    [1, 5],
    [2, 16],
    [3, 60],
  ])('agrees with ml-matrix on a seeded random symmetric matrix (seed %i, m = %i)', (seed, m) => {
    const a = randomSymmetric(seed, m);
    const rows = Array.from({ length: m }, (_, i) => Array.from(a.subarray(i * m, (i + 1) * m)));
    const reference = Float64Array.from(new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }).realEigenvalues).sort();
    const values = symmetricEigenvalues(a, m);
    expect(maxAbsDifference(values, reference)).toBeLessThan(1e-12 * m);
    let trace = 0;
    let frobenius = 0;
    for (let i = 0; i < m * m; i++) frobenius += a[i] * a[i];
    for (let i = 0; i < m; i++) trace += a[i * m + i];
    expect(Math.abs(values.reduce((s, v) => s + v, 0) - trace)).toBeLessThan(1e-12 * m);
    expect(Math.abs(values.reduce((s, v) => s + v * v, 0) - frobenius)).toBeLessThan(1e-11 * frobenius);
  });

  it('handles 1×1, a diagonal matrix, repeated eigenvalues and a matrix that is already split', () => {
    expect(Array.from(symmetricEigenvalues(Float64Array.of(-3), 1))).toEqual([-3]);
    expect(Array.from(symmetricEigenvalues(Float64Array.of(3, 0, 0, 0, -1, 0, 0, 0, 2), 3))).toEqual([-1, 2, 3]);
    // 3I + a rank-one 𝟙𝟙ᵀ: eigenvalue 3 three times and 3 + 4 once (common practice, no source).
    const m = 4;
    const a = new Float64Array(m * m).map((_, k) => (k % (m + 1) === 0 ? 4 : 1));
    const values = symmetricEigenvalues(a, m);
    expect(maxAbsDifference(values, [3, 3, 3, 7])).toBeLessThan(1e-14);
  });
});
