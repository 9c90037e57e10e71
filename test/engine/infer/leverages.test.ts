/**
 * The hat diagonal and the design basis behind it. Sources: the closed form of a straight-line fit's
 * leverage, hᵢ = 1/n + (xᵢ − x̄)²/Sxx, and its weighted form hᵢ = wᵢ·(1/W + (xᵢ − x̄_w)²/S_w), and the
 * identity Σhᵢ = rank (trace of a projection): common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/engine/fit/design';
import { solveLeastSquares } from '../../../src/engine/fit/leastSquares';
import { basisByTriangle, designBasis, formBasis } from '../../../src/engine/infer/designBasis';
import { leverages } from '../../../src/engine/infer/leverages';

function solve(y: number[], x: number[][], weights?: number[]) {
  return solveLeastSquares(buildDesign(y, x, true, undefined, weights));
}

const xs = [1, 2, 4, 7, 8, 12, 13, 20];
const ys = [2.1, 3.9, 8.2, 13.8, 16.1, 24.3, 25.7, 41.0];

describe('leverages', () => {
  it("is a straight line's 1/n + (xᵢ − x̄)²/Sxx", () => {
    const n = xs.length;
    const mean = xs.reduce((s, v) => s + v, 0) / n;
    const sxx = xs.reduce((s, v) => s + (v - mean) ** 2, 0);
    const h = leverages(
      solve(
        ys,
        xs.map((v) => [v]),
      ),
    );
    xs.forEach((v, i) => expect(h[i]).toBeCloseTo(1 / n + (v - mean) ** 2 / sxx, 14));
  });

  it("is a weighted straight line's wᵢ·(1/W + (xᵢ − x̄_w)²/S_w)", () => {
    const w = [1, 2, 0.5, 3, 1, 4, 0.25, 2];
    const total = w.reduce((s, v) => s + v, 0);
    const mean = xs.reduce((s, v, i) => s + w[i] * v, 0) / total;
    const sxx = xs.reduce((s, v, i) => s + w[i] * (v - mean) ** 2, 0);
    const h = leverages(
      solve(
        ys,
        xs.map((v) => [v]),
        w,
      ),
    );
    xs.forEach((v, i) => expect(h[i]).toBeCloseTo(w[i] * (1 / total + (v - mean) ** 2 / sxx), 14));
  });

  it('sums to the rank, an aliased column not counted', () => {
    const x = xs.map((v, i) => [v, (i * 7) % 5, v - 2 * ((i * 7) % 5)]);
    const h = leverages(solve(ys, x));
    expect(h.reduce((s, v) => s + v, 0)).toBeCloseTo(3, 13);
  });

  it('is computed once per solution', () => {
    const solution = solve(
      ys,
      xs.map((v) => [v]),
    );
    expect(leverages(solution)).toBe(leverages(solution));
  });
});

describe('designBasis', () => {
  it('is orthonormal to rounding for an ill-conditioned polynomial design, and spans it', () => {
    const t = Array.from({ length: 40 }, (_, i) => 1 + i / 4);
    const x = t.map((v) => [v, v ** 2, v ** 3, v ** 4, v ** 5, v ** 6]);
    const solution = solve(
      t.map((v) => Math.sin(v)),
      x,
    );
    const n = t.length;
    const p = solution.qr.accepted.length;
    expect(p).toBe(7);
    const q = designBasis(solution);
    for (let a = 0; a < p; a++) {
      for (let b = 0; b < p; b++) {
        let dot = 0;
        for (let i = 0; i < n; i++) dot += q[a * n + i] * q[b * n + i];
        expect(Math.abs(dot - (a === b ? 1 : 0))).toBeLessThan(1e-14);
      }
    }
    // The intercept column, 1/√n-normalised, lies in the span: its projection keeps its norm.
    let projected = 0;
    for (let a = 0; a < p; a++) {
      let dot = 0;
      for (let i = 0; i < n; i++) dot += q[a * n + i] / Math.sqrt(n);
      projected += dot * dot;
    }
    expect(projected).toBeCloseTo(1, 13);
  });

  /** max |QᵀQ − I| over the n × p column-major q. */
  function orthonormalityError(q: Float64Array, n: number, p: number): number {
    let worst = 0;
    for (let a = 0; a < p; a++) {
      for (let b = 0; b < p; b++) {
        let dot = 0;
        for (let i = 0; i < n; i++) dot += q[a * n + i] * q[b * n + i];
        worst = Math.max(worst, Math.abs(dot - (a === b ? 1 : 0)));
      }
    }
    return worst;
  }

  // A well-conditioned weighted design with an aliased column (x3 = x1 − 2·x2), so the accepted
  // columns are a subset and the rows are √w-scaled.
  const n = 60;
  const wide = Array.from({ length: n }, (_, i) => {
    const a = Math.sin(i * 1.7) * 3 + 10;
    const b = Math.cos(i * 0.9);
    return [a, b, a - 2 * b, ((i * 37) % 11) / 11];
  });
  const wideY = wide.map((r, i) => r[0] - 2 * r[3] + Math.sin(i * 5.3));
  const wideWeights = Array.from({ length: n }, (_, i) => 0.5 + ((i * 13) % 7) / 3);

  it.each([
    ['four accepted columns', 4, 4],
    ['three accepted columns (an odd count)', 3, 3],
  ])('is X·R⁻¹ for a well-conditioned design, the same basis the reflectors give: %s', (_, columns, rank) => {
    const solution = solve(
      wideY,
      wide.map((r) => r.slice(0, columns)),
      wideWeights,
    );
    const p = solution.qr.accepted.length;
    expect(p).toBe(rank);
    expect(basisByTriangle(solution)).toBe(true);
    const byTriangle = formBasis(solution, true);
    const byReflectors = formBasis(solution, false);
    // The same Q₁ (R fixes each column's sign), not just the same span.
    byTriangle.forEach((v, i) => expect(Math.abs(v - byReflectors[i])).toBeLessThan(1e-13));
    expect(orthonormalityError(byTriangle, n, p)).toBeLessThan(1e-13);
    expect(designBasis(solution)).toEqual(byTriangle);
  });

  it('takes the reflectors for an ill-conditioned design, where X·R⁻¹ would lose orthonormality', () => {
    // Two columns 1e-7 apart: κ near 3e7, so X·R⁻¹ is orthonormal only to about κ·u.
    const rows = 40;
    const x = Array.from({ length: rows }, (_, i) => {
      const a = Math.sin(i * 1.3);
      return [a, a + 1e-7 * Math.cos(i * 2.1), Math.cos(i * 0.7)];
    });
    const solution = solve(
      x.map((r, i) => r[0] + r[2] + Math.sin(i * 4.1)),
      x,
    );
    const p = solution.qr.accepted.length;
    expect(p).toBe(4);
    expect(basisByTriangle(solution)).toBe(false);
    expect(designBasis(solution)).toEqual(formBasis(solution, false));
    expect(orthonormalityError(formBasis(solution, false), rows, p)).toBeLessThan(1e-14);
    expect(orthonormalityError(formBasis(solution, true), rows, p)).toBeGreaterThan(1e-10);
  });
});
