/**
 * VIF, tolerance and the condition number. Sources: an independent oracle built with ml-matrix
 * (npm, general-purpose linear algebra): each VIF from the auxiliary regression actually run with
 * ml-matrix's QR solve, 1/(1 − R²) from its residuals; the condition number from ml-matrix's SVD
 * of the unit-scaled design. Textbook closed forms: with two predictors of correlation r both
 * VIFs are 1/(1 − r²); orthogonal columns of equal norm have every singular value equal; the
 * singular values of a 2×2 matrix have product |det| and squares summing to its Frobenius norm².
 * The entries over a model's data and over its fit are checked against collinearity of the same
 * rows: the fit factors the same unit-scaled weighted design; equal numbers share one result
 * (common practice, no source).
 */
import { Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { collinearity, type ModelData } from '../../../src/engine';
import { registerPackedData } from '../../../src/engine/cache/packedPredictors';
import { solveModel } from '../../../src/engine/fitModel';
import { collinearityOfFit, modelCollinearity } from '../../../src/engine/infer/collinearity';
import { singularValues } from '../../../src/engine/linalg/jacobiSvd';
import { gaussian, mulberry32 } from '../../support/random';

/** Predictors with built-in correlation (x2 leans on x1, x4 on x1 and x3) so that VIFs are well above 1. */
function correlatedPredictors(seed: number, n: number): number[][] {
  const normal = gaussian(mulberry32(seed));
  return Array.from({ length: n }, () => {
    const a = normal();
    const c = normal();
    return [3 + a, 0.8 * a + 0.6 * normal(), c, 0.5 * a - 0.7 * c + 0.4 * normal()];
  });
}

function positiveWeights(seed: number, n: number): number[] {
  const uniform = mulberry32(seed);
  return Array.from({ length: n }, () => 0.2 + 3 * uniform());
}

/** VIF_j by running the auxiliary regression with ml-matrix, as the definition says. */
function referenceVif(x: number[][], j: number, intercept: boolean, w = x.map(() => 1)): number {
  const root = w.map(Math.sqrt);
  const target = x.map((row, i) => row[j] * root[i]);
  const others = x.map((row, i) => [...(intercept ? [1] : []), ...row.filter((_, k) => k !== j)].map((v) => v * root[i]));
  const b = new QrDecomposition(new Matrix(others)).solve(Matrix.columnVector(target));
  const fitted = new Matrix(others).mmul(b).getColumn(0);
  const rss = target.reduce((s, v, i) => s + (v - fitted[i]) ** 2, 0);
  const wsum = w.reduce((s, v) => s + v, 0);
  const mean = x.reduce((s, row, i) => s + w[i] * row[j], 0) / wsum;
  const tss = intercept ? x.reduce((s, row, i) => s + w[i] * (row[j] - mean) ** 2, 0) : target.reduce((s, v) => s + v * v, 0);
  return tss / rss;
}

function referenceCondition(x: number[][], intercept: boolean, w = x.map(() => 1)): { kappa: number; values: number[] } {
  const design = new Matrix(x.map((row, i) => [...(intercept ? [1] : []), ...row].map((v) => v * Math.sqrt(w[i]))));
  for (let j = 0; j < design.columns; j++) {
    const norm = design.getColumnVector(j).norm();
    for (let i = 0; i < design.rows; i++) design.set(i, j, design.get(i, j) / norm);
  }
  const values = [...new SingularValueDecomposition(design, { computeLeftSingularVectors: false, computeRightSingularVectors: false }).diagonal];
  values.sort((a, b) => b - a);
  return { kappa: values[0] / values[values.length - 1], values };
}

function expectRelative(actual: number, expected: number, tol = 1e-9): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol * Math.abs(expected));
}

describe('collinearity: VIF and tolerance', () => {
  it('agrees with the auxiliary regressions run by ml-matrix, with an intercept', () => {
    const x = correlatedPredictors(1, 40);
    const result = collinearity(x, ['a', 'b', 'c', 'd']);
    expect(result.terms.map((t) => t.name)).toEqual(['a', 'b', 'c', 'd']);
    result.terms.forEach((t, j) => {
      expectRelative(t.vif, referenceVif(x, j, true));
      expectRelative(t.tolerance, 1 / referenceVif(x, j, true));
      expect(t.undefinedBecause).toBeUndefined();
    });
    // The built-in correlation must show, or the comparison above would be a weak one.
    expect(Math.max(...result.terms.map((t) => t.vif))).toBeGreaterThan(2);
  });

  it('weighted: the auxiliary regressions are weighted and centered on the weighted mean', () => {
    const x = correlatedPredictors(2, 30);
    const w = positiveWeights(3, 30);
    const result = collinearity(x, undefined, w);
    result.terms.forEach((t, j) => expectRelative(t.vif, referenceVif(x, j, true, w)));
    const unweighted = collinearity(x);
    expect(Math.abs(result.terms[1].vif - unweighted.terms[1].vif)).toBeGreaterThan(1e-3);
  });

  // The centered VIF is the factor by which collinearity inflates var(β̂_j) (Belsley, Kuh & Welsch
  // 1980, from memory); the uncentered one also counts a predictor's distance from 0.
  it('without an intercept the VIF is still the centered one; the uncentered VIF is given beside it', () => {
    const x = correlatedPredictors(4, 25);
    const result = collinearity(x, undefined, undefined, { intercept: false });
    result.terms.forEach((t, j) => {
      expectRelative(t.vif, referenceVif(x, j, true));
      expectRelative(t.uncenteredVif ?? Number.NaN, referenceVif(x, j, false));
    });
    expect(collinearity(x).terms[0].uncenteredVif).toBeUndefined();
  });

  it('two predictors with correlation r: both VIFs are 1/(1 − r²)', () => {
    const x = correlatedPredictors(5, 50).map((row) => [row[0], row[1]]);
    const mean = (j: number) => x.reduce((s, r) => s + r[j], 0) / x.length;
    const [m0, m1] = [mean(0), mean(1)];
    const sxy = x.reduce((s, r) => s + (r[0] - m0) * (r[1] - m1), 0);
    const sxx = x.reduce((s, r) => s + (r[0] - m0) ** 2, 0);
    const syy = x.reduce((s, r) => s + (r[1] - m1) ** 2, 0);
    const r2 = (sxy * sxy) / (sxx * syy);
    for (const t of collinearity(x).terms) expectRelative(t.vif, 1 / (1 - r2));
  });

  it('a single predictor has VIF exactly 1, with or without an intercept', () => {
    const x = correlatedPredictors(6, 10).map((row) => [row[0]]);
    for (const intercept of [true, false]) {
      const [term] = collinearity(x, undefined, undefined, { intercept }).terms;
      expect(term).toMatchObject({ name: 'x1', vif: 1, tolerance: 1, undefinedBecause: undefined });
    }
  });

  it('an exact combination: every column in it has VIF ∞ and tolerance 0, the others are still exact', () => {
    const base = correlatedPredictors(7, 30);
    const x = base.map((r) => [r[0], r[2], r[0] - 2 * r[2], r[3]]);
    const result = collinearity(x);
    expect(result.terms.slice(0, 3).map((t) => [t.vif, t.tolerance, t.undefinedBecause])).toEqual([
      [Infinity, 0, 'collinear'],
      [Infinity, 0, 'collinear'],
      [Infinity, 0, 'collinear'],
    ]);
    // x4 regressed on x1, x2 (x3 adds nothing to their span).
    expectRelative(
      result.terms[3].vif,
      referenceVif(
        base.map((r) => [r[0], r[2], r[3]]),
        2,
        true,
      ),
    );
    expect(result.conditionNumber).toBe(Infinity);
  });

  it('a constant column is collinear with the intercept; without an intercept it stands in for it, and an all-zero column is constant', () => {
    const base = correlatedPredictors(8, 20);
    const x = base.map((r) => [r[0], 5, r[2]]);
    const withIntercept = collinearity(x);
    expect(withIntercept.terms[1]).toMatchObject({ vif: Infinity, tolerance: 0, undefinedBecause: 'constant' });
    // The constant adds nothing beyond the intercept, so x1's VIF is that of x1 on x3 alone.
    expectRelative(
      withIntercept.terms[0].vif,
      referenceVif(
        base.map((r) => [r[0], r[2]]),
        0,
        true,
      ),
    );
    const noIntercept = collinearity(x, undefined, undefined, { intercept: false });
    expect(noIntercept.terms[1]).toMatchObject({ vif: NaN, tolerance: NaN, undefinedBecause: 'spans-intercept' });
    expectRelative(noIntercept.terms[1].uncenteredVif ?? Number.NaN, referenceVif(x, 1, false));
    // With the constant column standing in for the intercept, x1's VIF is that of the model with one.
    expectRelative(noIntercept.terms[0].vif, withIntercept.terms[0].vif);
    const zero = collinearity(
      base.map((r) => [r[0], 0]),
      undefined,
      undefined,
      { intercept: false },
    );
    expect(zero.terms[1]).toMatchObject({ vif: Infinity, undefinedBecause: 'constant' });
  });

  it('a full set of category indicators without an intercept is not reported as collinear', () => {
    // Indicators for levels A, B, C sum to the column of ones the model leaves out.
    const levels = [0, 1, 2, 0, 1, 2, 0, 0, 1, 2, 1, 2];
    const normal = gaussian(mulberry32(9));
    const x = levels.map((l) => [l === 0 ? 1 : 0, l === 1 ? 1 : 0, l === 2 ? 1 : 0, normal()]);
    const result = collinearity(x, undefined, undefined, { intercept: false });
    result.terms.forEach((t, j) => expectRelative(t.uncenteredVif ?? Number.NaN, referenceVif(x, j, false)));
    result.terms.slice(0, 3).forEach((t) => expect(t.undefinedBecause).toBe('spans-intercept'));
    expect(result.conditionNumber).toBeLessThan(Infinity);
  });

  it('a predictor far from 0 beside a full set of indicators, no intercept: its VIF is that of the model with an intercept', () => {
    // The indicators span the intercept, so the model and x's standard error are those of the
    // model with an intercept and two indicators; only the uncentered VIF grows with x's mean.
    const levels = [0, 1, 2, 0, 1, 2, 0, 0, 1, 2, 1, 2, 0, 1, 2];
    const normal = gaussian(mulberry32(21));
    const grind = levels.map((l) => 300 + 4 * l + 5 * normal());
    const noIntercept = collinearity(
      levels.map((l, i) => [l === 0 ? 1 : 0, l === 1 ? 1 : 0, l === 2 ? 1 : 0, grind[i]]),
      undefined,
      undefined,
      { intercept: false },
    );
    const withIntercept = levels.map((l, i) => [l === 1 ? 1 : 0, l === 2 ? 1 : 0, grind[i]]);
    const centered = referenceVif(withIntercept, 2, true);
    expectRelative(noIntercept.terms[3].vif, centered);
    expect(noIntercept.terms[3].uncenteredVif).toBeGreaterThan(10 * centered);
  });

  it('does not change when a column is multiplied by 1e200', () => {
    const x = correlatedPredictors(10, 30);
    const scaled = x.map((r) => [r[0] * 1e200, r[1], r[2], r[3]]);
    const a = collinearity(x);
    const b = collinearity(scaled);
    a.terms.forEach((t, j) => expectRelative(b.terms[j].vif, t.vif, 1e-12));
    expectRelative(b.conditionNumber, a.conditionNumber, 1e-12);
  });
});

describe('collinearity of a model: from its packed predictors, and from its fit', () => {
  const x = correlatedPredictors(17, 60);
  const y = x.map((row, i) => row[0] - row[2] + Math.sin(i));
  const w = positiveWeights(18, 60);

  function packedOnly(rows: number[][], weights?: number[], names?: string[]): ModelData {
    const p = rows[0].length;
    const values = Float64Array.from(rows.flat());
    const data = {
      y,
      get x(): number[][] {
        throw new Error('the rows were built');
      },
      names,
      weights,
    } as ModelData;
    registerPackedData(data, { y: Float64Array.from(y), predictors: { values, rows: rows.length, p }, weights: weights && Float64Array.from(weights) });
    return data;
  }

  it('modelCollinearity reads the packed numbers, never the rows, and equals collinearity of the rows', () => {
    for (const weights of [undefined, w]) {
      for (const intercept of [true, false]) {
        const settings = { intercept };
        expect(modelCollinearity(packedOnly(x, weights, ['a', 'b', 'c', 'd']), settings)).toEqual(collinearity(x, ['a', 'b', 'c', 'd'], weights, settings));
      }
    }
  });

  it('collinearityOfFit agrees with collinearity of the rows, weighted or not, without an intercept too', () => {
    // Numbers no other request here examines, so that the fit's own factorization is what is checked.
    const fitted = correlatedPredictors(19, 60);
    for (const weights of [undefined, w]) {
      for (const intercept of [true, false]) {
        const data = { y, x: fitted, weights };
        const ofFit = collinearityOfFit(data, solveModel(data, { intercept }));
        const direct = collinearity(fitted, undefined, weights, { intercept });
        expect(ofFit.hasIntercept).toBe(intercept);
        ofFit.terms.forEach((t, j) => {
          expect(t.name).toBe(direct.terms[j].name);
          expectRelative(t.vif, direct.terms[j].vif, 1e-12);
          expect(t.uncenteredVif === undefined).toBe(direct.terms[j].uncenteredVif === undefined);
        });
        expectRelative(ofFit.conditionNumber, direct.conditionNumber, 1e-12);
      }
    }
  });

  it('collinearityOfFit: an exact combination and a constant column read as collinearity reads them', () => {
    const rows = correlatedPredictors(20, 60).map((r) => [r[0], r[2], r[0] - 2 * r[2], 5, r[3]]);
    const data = { y, x: rows };
    const ofFit = collinearityOfFit(data, solveModel(data));
    const direct = collinearity(rows);
    expect(ofFit.terms.map((t) => t.undefinedBecause)).toEqual(['collinear', 'collinear', 'collinear', 'constant', undefined]);
    expect(direct.terms.map((t) => t.undefinedBecause)).toEqual(ofFit.terms.map((t) => t.undefinedBecause));
    expectRelative(ofFit.terms[4].vif, direct.terms[4].vif, 1e-12);
    expect(ofFit.conditionNumber).toBe(Infinity);
  });

  it('collinearityOfFit names the terms as this data names them, though the cached fit was first asked for under other names', () => {
    const named = correlatedPredictors(22, 30);
    solveModel({ y: y.slice(0, 30), x: named, names: ['p', 'q', 'r', 's'] });
    const data = { y: y.slice(0, 30), x: named, names: ['a', 'b', 'c', 'd'] };
    expect(collinearityOfFit(data, solveModel(data)).terms.map((t) => t.name)).toEqual(['a', 'b', 'c', 'd']);
  });

  it("is examined once for equal numbers: other objects, another response, from a fit or not; names are each caller's own", () => {
    const shared = correlatedPredictors(23, 50);
    const first = modelCollinearity({ y: shared.map(() => 0), x: shared });
    expect(modelCollinearity({ y: shared.map((r) => r[0]), x: shared.map((r) => [...r]) })).toBe(first);
    const data = { y: shared.map((r, i) => r[1] + Math.cos(i)), x: shared };
    expect(collinearityOfFit(data, solveModel(data))).toBe(first);
    const renamed = modelCollinearity({ y: data.y, x: shared, names: ['a', 'b', 'c', 'd'] });
    expect(renamed.terms.map((t) => t.name)).toEqual(['a', 'b', 'c', 'd']);
    expect(renamed.terms.map((t) => t.vif)).toEqual(first.terms.map((t) => t.vif));
    // Other weights or another intercept setting are other questions.
    expect(modelCollinearity({ y: data.y, x: shared, weights: positiveWeights(24, 50) })).not.toBe(first);
    expect(modelCollinearity({ y: data.y, x: shared }, { intercept: false }).hasIntercept).toBe(false);
  });

  it('refuses what collinearity refuses, on every request: names not one per column, a non-finite value', () => {
    const rows = correlatedPredictors(25, 20);
    expect(() => modelCollinearity({ y: [], x: rows, names: ['a'] })).toThrow(/names/);
    const bad = rows.map((r, i) => (i === 3 ? [r[0], Number.NaN, r[2], r[3]] : r));
    for (let k = 0; k < 2; k++) expect(() => modelCollinearity({ y: [], x: bad })).toThrow(/finite/);
  });
});

describe('collinearity: condition number', () => {
  it('matches ml-matrix singular values of the unit-scaled design with the intercept column', () => {
    const x = correlatedPredictors(11, 40);
    const result = collinearity(x);
    const reference = referenceCondition(x, true);
    expectRelative(result.conditionNumber, reference.kappa);
    result.singularValues.forEach((s, k) => expectRelative(s, reference.values[k]));
  });

  it('weighted and without an intercept, likewise', () => {
    const x = correlatedPredictors(12, 30);
    const w = positiveWeights(13, 30);
    expectRelative(collinearity(x, undefined, w).conditionNumber, referenceCondition(x, true, w).kappa);
    expectRelative(collinearity(x, undefined, undefined, { intercept: false }).conditionNumber, referenceCondition(x, false).kappa);
  });

  it('is 1 for orthogonal columns of equal norm (a 2² factorial with intercept), whose VIFs are 1', () => {
    const x = [
      [1, 1],
      [-1, 1],
      [1, -1],
      [-1, -1],
      [1, 1],
      [-1, 1],
      [1, -1],
      [-1, -1],
    ];
    const result = collinearity(x);
    expect(Math.abs(result.conditionNumber - 1)).toBeLessThan(1e-14);
    for (const t of result.terms) expect(Math.abs(t.vif - 1)).toBeLessThan(1e-14);
  });

  it('grows with near-collinearity: a nearly repeated column gives a large number that ml-matrix confirms', () => {
    const base = correlatedPredictors(14, 30);
    const normal = gaussian(mulberry32(15));
    const x = base.map((r) => [r[0], r[0] + 1e-4 * normal(), r[2]]);
    const result = collinearity(x);
    expect(result.conditionNumber).toBeGreaterThan(1e3);
    expectRelative(result.conditionNumber, referenceCondition(x, true).kappa, 1e-6);
  });
});

describe('singularValues (one-sided Jacobi)', () => {
  it('2×2 closed form: σ₁σ₂ = |det| and σ₁² + σ₂² = ‖A‖²_F', () => {
    const a = Float64Array.from([3, 7, 0, 0.002]);
    const [s1, s2] = singularValues(a, 2, 2);
    expectRelative(s1 * s2, 3 * 0.002, 1e-14);
    expectRelative(s1 * s1 + s2 * s2, 9 + 49 + 0.002 ** 2, 1e-14);
    expect(s1).toBeGreaterThan(s2);
  });

  it('matches ml-matrix on random square matrices up to 8×8', () => {
    const normal = gaussian(mulberry32(16));
    for (const q of [1, 3, 5, 8]) {
      const rows = Array.from({ length: q }, () => Array.from({ length: q }, () => normal()));
      const ours = singularValues(Float64Array.from(rows.flat()), q, q);
      const theirs = [...new SingularValueDecomposition(new Matrix(rows)).diagonal].sort((x, y) => y - x);
      // ml-matrix is accurate to ~ε·σ_max, so compare relative to the largest value.
      ours.forEach((s, k) => expect(Math.abs(s - theirs[k])).toBeLessThanOrEqual(1e-12 * theirs[0]));
    }
  });

  it('keeps a tiny singular value of a graded triangular matrix to high relative accuracy', () => {
    // diag(1, 1e-8) times a rotation has singular values exactly 1 and 1e-8.
    const c = Math.cos(0.3);
    const s = Math.sin(0.3);
    const a = Float64Array.from([c, -s, 1e-8 * s, 1e-8 * c]);
    const [big, small] = singularValues(a, 2, 2);
    expectRelative(big, 1, 1e-14);
    expectRelative(small, 1e-8, 1e-12);
  });
});
