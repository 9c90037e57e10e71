/**
 * Mixed-precision iterative refinement (fit/refinement.ts). Sources: NIST StRD Norris, Pontius and
 * Filip (certified values, read in place from ../shared/reference/strd); exact rational least
 * squares (test/engine/precise/exact.ts) for a seeded small-residual problem; the double-double
 * residual's hand-worked case below.
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/engine/fit/design';
import { solveLeastSquares } from '../../../src/engine/fit/leastSquares';
import { refineSolution } from '../../../src/engine/fit/refinement';
import { extendedResidual } from '../../../src/engine/precise/extendedResidual';
import { mulberry32 } from '../../support/random';
import { lre, readStrd, strdAvailable } from '../../support/strd';
import { abs, add, exactOf, type Fraction, lessOrEqual, mul, solveExact, sub } from '../precise/exact';

/** The double solution of a design, and its refinement from there. */
function refineFromDouble(y: number[], x: number[][], intercept = true) {
  const design = buildDesign(y, x, intercept, undefined, undefined);
  const plain = solveLeastSquares(design, 'double');
  const start = Float64Array.from(plain.qr.accepted, (col) => plain.coefficients[col]);
  return { design, plain, refined: refineSolution(design, plain.qr.accepted, plain.qr.r, plain.columnScales, plain.yScale, start) };
}

describe('extendedResidual', () => {
  it('keeps the part of y − x·b that double rounding loses (worked by hand)', () => {
    // x = b = 1 + 2⁻³⁰, so x·b = 1 + 2⁻²⁹ + 2⁻⁶⁰; with y = 1 + 2⁻²⁹ the residual is −2⁻⁶⁰ exactly,
    // while in double x·b rounds to 1 + 2⁻²⁹ and the residual comes out as 0.
    const v = 1 + 2 ** -30;
    const residual = new Float64Array(1);
    extendedResidual({ rows: 1, cols: 1, data: Float64Array.of(v) }, [0], Float64Array.of(v), Float64Array.of(1 + 2 ** -29), 1, residual);
    expect(v * v).toBe(1 + 2 ** -29);
    expect(residual[0]).toBe(-(2 ** -60));
  });
});

describe.skipIf(!strdAvailable())('refinement on NIST StRD (source: NIST StRD)', () => {
  it.each(['Norris', 'Pontius'] as const)('%s: from the double solution to 13 digits in every coefficient and σ̂', (name) => {
    const problem = readStrd(name);
    const { plain, refined } = refineFromDouble(problem.y, problem.x);
    const certified = problem.certified;
    expect(refined).toBeDefined();
    if (refined === undefined) return;
    const df = problem.y.length - refined.coefficients.length;
    const sigma = plain.yScale * Math.sqrt(refined.scaledRss / df);
    const plainSigma = plain.yScale * Math.sqrt(plain.scaledRss / df);
    const worst = (values: ArrayLike<number>) => Math.min(...certified.parameters.map((c, i) => lre(values[i], c.estimate)));
    // The double solution alone falls short, so the 13 digits are the refinement's.
    expect(Math.min(worst(plain.coefficients), lre(plainSigma, certified.residualSd))).toBeLessThan(13);
    expect(worst(refined.coefficients)).toBeGreaterThanOrEqual(13);
    expect(lre(sigma, certified.residualSd)).toBeGreaterThanOrEqual(13);
  });

  it('gives up on Filip (κ ≈ 5e9), whose solution it cannot reach, leaving it to the double-double QR', () => {
    const problem = readStrd('Filip');
    expect(refineFromDouble(problem.y, problem.x).refined).toBeUndefined();
  });

  it('is the route solveLeastSquares takes for Norris: the double R factor is kept', () => {
    const problem = readStrd('Norris');
    const design = buildDesign(problem.y, problem.x, true, undefined, undefined);
    const auto = solveLeastSquares(design);
    expect(Array.from(auto.qr.r)).toEqual(Array.from(solveLeastSquares(design, 'double').qr.r));
    expect(lre(auto.coefficients[0], problem.certified.parameters[0].estimate)).toBeGreaterThanOrEqual(13);
  });
});

describe('refinement on a seeded small-residual problem, against exact rational least squares', () => {
  // A level of 10⁴ with noise of 10⁻³ (R² ≈ 1 − 10⁻¹⁴): κ is small, but double precision loses
  // about u·‖y‖/‖r‖ of the coefficients' and σ̂'s digits.
  const random = mulberry32(2024);
  const n = 40;
  const x = Array.from({ length: n }, () => [random() * 10, random() * 5 - 2, random()]);
  const y = x.map(([a, b, c]) => 1e4 + 3 * a - 2 * b + 0.5 * c + 1e-3 * (random() - 0.5));
  const ZERO: Fraction = { num: 0n, den: 1n };
  const columns = [x.map(() => exactOf(1)), ...[0, 1, 2].map((j) => x.map((row) => exactOf(row[j])))];
  const ys = y.map(exactOf);
  const dot = (a: Fraction[], b: Fraction[]) => a.reduce((s, v, i) => add(s, mul(v, b[i])), ZERO);
  const exact = solveExact(
    columns.map((a) => columns.map((b) => dot(a, b))),
    columns.map((a) => dot(a, ys)),
  );

  it('reaches 13 correct digits in every coefficient', () => {
    const { refined } = refineFromDouble(y, x);
    expect(refined).toBeDefined();
    refined?.coefficients.forEach((estimate, j) => {
      const error = abs(sub(exactOf(estimate), exact[j]));
      expect(lessOrEqual(mul(error, { num: 10n ** 13n, den: 1n }), abs(exact[j])), `coefficient ${j}`).toBe(true);
    });
  });

  it('gives residuals that are y − Xb of the refined b to a few ulps of each residual', () => {
    const { design, plain, refined } = refineFromDouble(y, x);
    if (refined === undefined) throw new Error('refinement failed');
    const b = refined.coefficients.map(Number);
    for (const i of [0, 7, n - 1]) {
      const row = [exactOf(1), ...x[i].map(exactOf)];
      const exactResidual = sub(
        ys[i],
        row.reduce((s, v, j) => add(s, mul(v, exactOf(b[j]))), ZERO),
      );
      const got = exactOf(refined.scaledResidual[i] * plain.yScale);
      // 1e-12 relative: a few roundings of the residual itself; the double fit’s residuals are off in the 8th digit.
      expect(lessOrEqual(mul(abs(sub(got, exactResidual)), { num: 10n ** 12n, den: 1n }), abs(exactResidual)), `row ${i}`).toBe(true);
    }
    expect(design.matrix.rows).toBe(n);
  });
});
