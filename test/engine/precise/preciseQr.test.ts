import { describe, expect, it } from 'vitest';
import { fitModel } from '../../../src/engine';
import { preciseLeastSquares } from '../../../src/engine/precise/preciseQr';
import { abs, add, exactOf, type Fraction, lessOrEqual, mul, seeded, solveExact, sub } from './exact';

const random = seeded(1996);
const ZERO: Fraction = { num: 0n, den: 1n };

/** The exact least-squares solution of the doubles as given, from the normal equations in rationals. */
function exactLeastSquares(columns: Float64Array[], y: Float64Array): Fraction[] {
  const cols = columns.map((c) => Array.from(c, exactOf));
  const ys = Array.from(y, exactOf);
  const dot = (a: Fraction[], b: Fraction[]) => a.reduce((s, v, i) => add(s, mul(v, b[i])), ZERO);
  return solveExact(cols.map((a) => cols.map((b) => dot(a, b))), cols.map((a) => dot(a, ys)));
}

/** 13 correct significant digits: |est − exact| ≤ 1e-13·|exact|, in rationals. */
const digits13 = (estimate: number, exact: Fraction) =>
  lessOrEqual(mul(abs(sub(exactOf(estimate), exact)), { num: 10n ** 13n, den: 1n }), abs(exact));

/** Ill-conditioned polynomial problems: x on a short interval away from 0, degree 6–9, n ≤ 30. */
function problem(degree: number): { x: number[][]; columns: Float64Array[]; y: Float64Array } {
  const n = 20 + Math.floor(random() * 11);
  const t = Array.from({ length: n }, () => 1 + 2 * random());
  const x = t.map((v) => Array.from({ length: degree }, (_, k) => v ** (k + 1)));
  const columns = [Float64Array.from(t, () => 1), ...Array.from({ length: degree }, (_, k) => Float64Array.from(x, (row) => row[k]))];
  const y = Float64Array.from(t, (v) => Math.sin(3 * v) + 0.01 * (random() - 0.5));
  return { x, columns, y };
}

const norm = (v: Float64Array) => Math.sqrt(v.reduce((s, a) => s + a * a, 0));

describe('double-double least squares against exact rational solutions', () => {
  for (const degree of [6, 7, 8, 9]) {
    it(`degree ${degree}: 13 correct digits on every coefficient, directly and through fitModel`, () => {
      for (let trial = 0; trial < 2; trial++) {
        const { x, columns, y } = problem(degree);
        const exact = exactLeastSquares(columns, y);
        const precise = preciseLeastSquares(columns, columns.map(norm), y, norm(y));
        expect(Array.from(precise.coefficients).every((b, i) => digits13(b, exact[i]))).toBe(true);
        // The hook must route such designs to the precise path: plain double QR loses these digits.
        const fit = fitModel({ y: Array.from(y), x });
        expect(fit.terms.every((term, i) => digits13(term.estimate, exact[i]))).toBe(true);
      }
    });
  }
});
