import { describe, expect, it } from 'vitest';
import { fitModel } from '../../../src/engine';
import { preciseLeastSquares } from '../../../src/engine/precise/preciseQr';
import { abs, add, exactOf, type Fraction, lessOrEqual, mul, solveExact, sub } from './exact';
import { mulberry32 } from '../../support/random';

const random = mulberry32(1996);
const ZERO: Fraction = { num: 0n, den: 1n };

/** The exact least-squares solution, from the normal equations in rationals. */
function exactLeastSquares(cols: Fraction[][], y: Float64Array): Fraction[] {
  const ys = Array.from(y, exactOf);
  const dot = (a: Fraction[], b: Fraction[]) => a.reduce((s, v, i) => add(s, mul(v, b[i])), ZERO);
  return solveExact(
    cols.map((a) => cols.map((b) => dot(a, b))),
    cols.map((a) => dot(a, ys)),
  );
}

/** 13 correct significant digits: |est − exact| ≤ 1e-13·|exact|, in rationals. */
const digits13 = (estimate: number, exact: Fraction) => lessOrEqual(mul(abs(sub(exactOf(estimate), exact)), { num: 10n ** 13n, den: 1n }), abs(exact));

/** Ill-conditioned polynomial problems: x on a short interval away from 0, degree 6–9, n ≤ 30. */
function problem(degree: number): { t: number[]; x: number[][]; columns: Float64Array[]; y: Float64Array } {
  const n = 20 + Math.floor(random() * 11);
  const t = Array.from({ length: n }, () => 1 + 2 * random());
  const x = t.map((v) => Array.from({ length: degree }, (_, k) => v ** (k + 1)));
  const columns = [Float64Array.from(t, () => 1), ...Array.from({ length: degree }, (_, k) => Float64Array.from(x, (row) => row[k]))];
  const y = Float64Array.from(t, (v) => Math.sin(3 * v) + 0.01 * (random() - 0.5));
  return { t, x, columns, y };
}

const norm = (v: Float64Array) => Math.sqrt(v.reduce((s, a) => s + a * a, 0));

/** Columns 1, t, t², … with the powers exact in rationals, as the model means them. */
function exactPowerColumns(t: number[], degree: number): Fraction[][] {
  const base = t.map(exactOf);
  const columns: Fraction[][] = [base.map(() => ({ num: 1n, den: 1n }))];
  for (let k = 0; k < degree; k++) columns.push(columns[k].map((v, i) => mul(v, base[i])));
  return columns;
}

describe('double-double least squares against exact rational solutions', () => {
  for (const degree of [6, 7, 8, 9]) {
    it(`degree ${degree}: 13 correct digits on every coefficient, for the doubles as given and for exact powers through fitModel`, () => {
      for (let trial = 0; trial < 2; trial++) {
        const { t, x, columns, y } = problem(degree);
        const exactOfDoubles = exactLeastSquares(
          columns.map((c) => Array.from(c, exactOf)),
          y,
        );
        const precise = preciseLeastSquares(columns, columns.map(norm), y, norm(y));
        expect(Array.from(precise.coefficients).every((b, i) => digits13(b, exactOfDoubles[i]))).toBe(true);
        // Through fitModel the hook routes the design to the precise path (plain double QR loses
        // these digits) and takes the rounded powers as the exact powers of t they stand for.
        const exactOfPowers = exactLeastSquares(exactPowerColumns(t, degree), y);
        const fit = fitModel({ y: Array.from(y), x });
        expect(fit.terms.every((term, i) => digits13(term.estimate, exactOfPowers[i]))).toBe(true);
      }
    });
  }
});
