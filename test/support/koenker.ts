/** Koenker's LM = n·R² of e² on [1, X], by ml-matrix: the reference the Breusch–Pagan tests check against. */
import { Matrix, QrDecomposition } from 'ml-matrix';

export function koenkerOf(x: number[][], residuals: ArrayLike<number>): number {
  const u = Array.from(residuals, (v) => v * v);
  const design = new Matrix(x.map((row) => [1, ...row]));
  const fitted = design.mmul(new QrDecomposition(design).solve(Matrix.columnVector(u))).getColumn(0);
  const mean = u.reduce((s, v) => s + v, 0) / u.length;
  const rss = u.reduce((s, v, i) => s + (v - fitted[i]) ** 2, 0);
  const tss = u.reduce((s, v) => s + (v - mean) ** 2, 0);
  return u.length * (1 - rss / tss);
}
