/**
 * Householder QR with alias detection, tested directly. Sources: the factorization and its
 * properties (Q orthogonal, R upper triangular, QR = A, LAPACK's reflector H = I − τvvᵀ with
 * v₁ = 1 and β = −sign(α)‖x‖) follow Golub & Van Loan, Matrix Computations, §5.1–5.2 (Householder
 * QR); the 3×2 example is worked by hand below; the alias rule (a column is dropped when the part
 * orthogonal to the columns before it is at most the tolerance of its unit norm) is this engine's
 * own, stated in householderQr.ts, and its scale-invariance is common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/engine/fit/design';
import { aliasTolerance, solveLeastSquares } from '../../../src/engine/fit/leastSquares';
import { type ColumnMajorMatrix, columnView, stableNorm } from '../../../src/engine/linalg/columnMajor';
import { applyQ, applyQTranspose, householderQr } from '../../../src/engine/linalg/householderQr';
import { gaussian, mulberry32 } from '../../support/random';

const EPSILON = 2 ** -52;
/** Golub & Van Loan §5.2.2: Householder QR is backward stable, errors a modest multiple of n·ε. */
const roundingBound = (n: number) => n * EPSILON;

function fromColumns(columns: readonly (readonly number[])[]): ColumnMajorMatrix {
  const rows = columns[0].length;
  const data = new Float64Array(rows * columns.length);
  columns.forEach((column, j) => data.set(column, j * rows));
  return { rows, cols: columns.length, data };
}

/** Each column divided by its norm, as fit/leastSquares.ts hands the design to the factorization. */
function unitScaled(columns: readonly (readonly number[])[]): ColumnMajorMatrix {
  return fromColumns(
    columns.map((column) => {
      const norm = stableNorm(Float64Array.from(column));
      return column.map((v) => v / norm);
    }),
  );
}

function randomColumns(seed: number, rows: number, cols: number): number[][] {
  const normal = gaussian(mulberry32(seed));
  return Array.from({ length: cols }, () => Array.from({ length: rows }, () => normal()));
}

describe('householderQr on a 3×2 example worked by hand', () => {
  /*
   * A = [3 1; 4 2; 0 5], columns a₁ = (3, 4, 0), a₂ = (1, 2, 5).
   * Step 1: ‖a₁‖ = 5, α = 3 ≥ 0 so β = −5. v = (a₁ − βe₁) / (α − β) = (8, 4, 0)/8 = (1, 0.5, 0),
   *   τ = (β − α)/β = (−8)/(−5) = 1.6 (check: 2/vᵀv = 2/1.25 = 1.6). So R₁₁ = −5.
   *   H₁a₂ = a₂ − τ(vᵀa₂)v = (1, 2, 5) − 1.6·2·(1, 0.5, 0) = (−2.2, 0.4, 5). So R₁₂ = −2.2
   *   (check: q₁ = −a₁/5, q₁ᵀa₂ = −(3 + 8)/5 = −2.2).
   * Step 2: x = (0.4, 5), ‖x‖ = √25.16, α = 0.4 ≥ 0 so β = −√25.16 = R₂₂
   *   (check: ‖a₂‖² = 30 = R₁₂² + R₂₂² = 4.84 + 25.16).
   */
  const a = fromColumns([
    [3, 4, 0],
    [1, 2, 5],
  ]);
  const qr = householderQr(a, 1e-13);

  it('gives R = [−5 −2.2; 0 −√25.16] and the first reflector (1, 0.5, 0) with τ = 1.6', () => {
    expect(qr.accepted).toEqual([0, 1]);
    expect(qr.aliased).toEqual([false, false]);
    expect(qr.r[0]).toBeCloseTo(-5, 15);
    expect(qr.r[1]).toBeCloseTo(-2.2, 14);
    expect(qr.r[2]).toBe(0);
    expect(qr.r[3]).toBeCloseTo(-Math.sqrt(25.16), 14);
    expect(Array.from(qr.reflectors[0])).toEqual([1, 0.5, 0]);
    expect(qr.taus[0]).toBeCloseTo(1.6, 15);
  });

  it('Qᵀa₂ is (R₁₂, R₂₂, 0)', () => {
    const b = Float64Array.from([1, 2, 5]);
    applyQTranspose(qr, b);
    expect(b[0]).toBeCloseTo(-2.2, 14);
    expect(b[1]).toBeCloseTo(-Math.sqrt(25.16), 14);
    expect(Math.abs(b[2])).toBeLessThan(1e-14);
  });
});

describe('householderQr on a random 12×5 design', () => {
  const n = 12;
  const q = 5;
  const columns = randomColumns(91, n, q);
  const a = unitScaled(columns);
  const qr = householderQr(a, aliasTolerance(n));

  it('reproduces A: Q·[R; 0] equals A to a few ε', () => {
    expect(qr.accepted).toEqual([0, 1, 2, 3, 4]);
    for (let j = 0; j < q; j++) {
      const column = new Float64Array(n);
      for (let i = 0; i <= j; i++) column[i] = qr.r[i * q + j];
      applyQ(qr, column);
      const original = columnView(a, j);
      // Unit columns, so the absolute error is also the relative one.
      for (let i = 0; i < n; i++) expect(Math.abs(column[i] - original[i])).toBeLessThan(roundingBound(n));
    }
  });

  it('Qᵀ is orthogonal: Qᵀ applied to the identity gives orthonormal columns', () => {
    const qtColumns = Array.from({ length: n }, (_, i) => {
      const e = new Float64Array(n);
      e[i] = 1;
      applyQTranspose(qr, e);
      return e;
    });
    for (let i = 0; i < n; i++) {
      for (let k = 0; k < n; k++) {
        let dot = 0;
        for (let m = 0; m < n; m++) dot += qtColumns[i][m] * qtColumns[k][m];
        expect(Math.abs(dot - (i === k ? 1 : 0))).toBeLessThan(roundingBound(n));
      }
    }
  });

  it('R is upper triangular: Qᵀ·A is zero below the diagonal, and R is stored so', () => {
    for (let j = 0; j < q; j++) {
      const column = Float64Array.from(columnView(a, j));
      applyQTranspose(qr, column);
      for (let i = j + 1; i < n; i++) expect(Math.abs(column[i])).toBeLessThan(roundingBound(n));
      for (let i = 0; i <= j; i++) expect(Math.abs(column[i] - qr.r[i * q + j])).toBeLessThan(roundingBound(n));
      for (let i = j + 1; i < q; i++) expect(qr.r[i * q + j]).toBe(0);
    }
  });
});

describe('alias detection', () => {
  const n = 20;
  const [u, v, w] = randomColumns(92, n, 3);
  const combination = u.map((x, i) => x + 2 * v[i]);

  it('drops an exact combination of earlier columns and keeps the columns after it in place', () => {
    const qr = householderQr(unitScaled([u, v, combination, w]), aliasTolerance(n));
    expect(qr.aliased).toEqual([false, false, true, false]);
    expect(qr.accepted).toEqual([0, 1, 3]);
    expect(qr.r).toHaveLength(9);
  });

  it('keeps the earlier of two identical columns', () => {
    const qr = householderQr(unitScaled([u, v, u]), aliasTolerance(n));
    expect(qr.accepted).toEqual([0, 1]);
    expect(qr.aliased[2]).toBe(true);
  });

  it('keeps a nearly dependent column whose own part is well above the tolerance, drops one below it', () => {
    // combination + δ·w: after unit scaling, its part orthogonal to u and v is about δ‖w⊥‖/‖combination‖.
    const own = (delta: number) => {
      const column = combination.map((x, i) => x + delta * w[i]);
      const qr = householderQr(unitScaled([u, v, column]), aliasTolerance(n));
      return qr.aliased[2];
    };
    expect(own(1e-9)).toBe(false);
    expect(own(1e-16)).toBe(true);
  });

  it('is scale-invariant: a column multiplied by 1e8 (or 1e-8) leaves the accepted columns unchanged', () => {
    const [t] = randomColumns(93, n, 1);
    const y = u.map((x, i) => x - v[i] + 0.1 * t[i]);
    const near = combination.map((x, i) => x + 1e-9 * w[i]);
    const accepted = (scale: number, column: number) => {
      const cols = [u, v, combination, near, t].map((c, j) => (j === column ? c.map((x) => x * scale) : c));
      const rows = y.map((_, i) => cols.map((c) => c[i]));
      return solveLeastSquares(buildDesign(y, rows, true, undefined, undefined)).qr.accepted;
    };
    const plain = accepted(1, 0);
    // Intercept first, then u, v; the exact combination (3) dropped; the near one (own part ≈ 4e-10) and t kept.
    expect(plain).toEqual([0, 1, 2, 4, 5]);
    for (const column of [0, 2, 3, 4]) {
      expect(accepted(1e8, column)).toEqual(plain);
      expect(accepted(1e-8, column)).toEqual(plain);
    }
  });
});
