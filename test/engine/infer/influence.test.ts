/**
 * Residual diagnostics. Sources: an independent oracle built with ml-matrix (npm, general-purpose
 * linear algebra) that forms H = X(XᵀX)⁻¹Xᵀ and takes the deleted quantities from their
 * definitions, by actually refitting without each row, so the engine's closed forms are checked
 * rather than restated; the delivery-time example of Montgomery, Peck & Vining, Introduction to
 * Linear Regression Analysis (Wiley), chapter 6 (from memory); and identities that are common
 * practice (no source).
 */
import { Matrix, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { maxCooksDistance, residualDiagnostics, type ResidualDiagnostics } from '../../../src/engine';
import { resetResidualDiagnostics } from '../../../src/engine/infer/influence';
import { highLeverageCount, residualFlags } from '../../../src/presentation';
import { mulberry32, randomProblem } from '../../support/random';

interface Reference {
  leverage: number[];
  residual: number[];
  standardized: number[];
  studentized: number[];
  cooksDistance: number[];
  dffits: number[];
}

/** Weighted least squares as OLS on √w·X, √w·y: coefficients and weighted RSS. */
function wls(x: number[][], y: number[], w: number[]): { beta: Matrix; rss: number; xtxInverse: Matrix } {
  const xw = new Matrix(x.map((row, i) => row.map((v) => v * Math.sqrt(w[i]))));
  const yw = Matrix.columnVector(y.map((v, i) => v * Math.sqrt(w[i])));
  const xtxInverse = inverse(xw.transpose().mmul(xw));
  const beta = xtxInverse.mmul(xw.transpose()).mmul(yw);
  const fitted = new Matrix(x).mmul(beta);
  const rss = y.reduce((s, v, i) => s + w[i] * (v - fitted.get(i, 0)) ** 2, 0);
  return { beta, rss, xtxInverse };
}

function reference(xData: number[][], y: number[], w: number[], knownSigma?: number): Reference {
  const x = xData.map((row) => [1, ...row]);
  const n = x.length;
  const p = x[0].length;
  const full = wls(x, y, w);
  const xw = new Matrix(x.map((row, i) => row.map((v) => v * Math.sqrt(w[i]))));
  const hat = xw.mmul(full.xtxInverse).mmul(xw.transpose());
  const fittedAt = (beta: Matrix, i: number) => x[i].reduce((s, v, j) => s + v * beta.get(j, 0), 0);
  const s = knownSigma ?? Math.sqrt(full.rss / (n - p));
  const out: Reference = { leverage: [], residual: [], standardized: [], studentized: [], cooksDistance: [], dffits: [] };
  for (let i = 0; i < n; i++) {
    const h = hat.get(i, i);
    const e = y[i] - fittedAt(full.beta, i);
    const keep = (_: unknown, k: number) => k !== i;
    const deleted = wls(x.filter(keep), y.filter(keep), w.filter(keep));
    const sDeleted = Math.sqrt(deleted.rss / (n - 1 - p));
    const shift = full.beta.clone().sub(deleted.beta);
    const xtwx = xw.transpose().mmul(xw);
    out.leverage.push(h);
    out.residual.push(e);
    out.standardized.push((Math.sqrt(w[i]) * e) / (s * Math.sqrt(1 - h)));
    out.studentized.push((Math.sqrt(w[i]) * e) / (sDeleted * Math.sqrt(1 - h)));
    // Cook's definition: the shift of the whole coefficient vector when row i is left out.
    out.cooksDistance.push(shift.transpose().mmul(xtwx).mmul(shift).get(0, 0) / (p * s * s));
    // DFFITS' definition: the shift of row i's own fitted value, in deleted-σ units.
    out.dffits.push((Math.sqrt(w[i]) * (fittedAt(full.beta, i) - fittedAt(deleted.beta, i))) / (sDeleted * Math.sqrt(h)));
  }
  return out;
}

function expectRelative(actual: number[], expected: number[], tol: number): void {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((a, i) => expect(Math.abs(a - expected[i])).toBeLessThanOrEqual(tol * Math.max(Math.abs(expected[i]), 1e-3)));
}

function column(d: ResidualDiagnostics, key: 'leverage' | 'residual' | 'standardized' | 'studentized' | 'cooksDistance' | 'dffits'): number[] {
  return d.rows.map((r) => r[key]);
}

function expectMatches(d: ResidualDiagnostics, ref: Reference): void {
  expectRelative(column(d, 'leverage'), ref.leverage, 1e-9);
  expectRelative(column(d, 'residual'), ref.residual, 1e-9);
  expectRelative(column(d, 'standardized'), ref.standardized, 1e-9);
  expectRelative(column(d, 'studentized'), ref.studentized, 1e-9);
  expectRelative(column(d, 'cooksDistance'), ref.cooksDistance, 1e-9);
  expectRelative(column(d, 'dffits'), ref.dffits, 1e-9);
}

const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);

describe('residual diagnostics against an ml-matrix oracle (definitions, leave-one-out refits)', () => {
  it.each([
    [1, 20, 2],
    [2, 35, 4],
    [3, 12, 1],
  ])('unweighted, seed %i: n = %i, %i predictors', (seed, n, p) => {
    const { y, x } = randomProblem(seed, n, p);
    expectMatches(
      residualDiagnostics({ y, x }),
      reference(
        x,
        y,
        y.map(() => 1),
      ),
    );
  });

  it.each([4, 5])('weighted, seed %i: every formula is that of OLS on √w·y and √w·X', (seed) => {
    const { y, x } = randomProblem(seed, 25, 3);
    const uniform = mulberry32(seed + 100);
    const weights = y.map(() => 0.2 + 5 * uniform());
    const d = residualDiagnostics({ y, x, weights });
    expectMatches(d, reference(x, y, weights));
    const unweighted = residualDiagnostics({ y, x });
    expect(Math.abs(d.rows[0].leverage - unweighted.rows[0].leverage)).toBeGreaterThan(1e-6);
  });

  it('with σ known: standardized residuals and Cook use σ, studentized and DFFITS still use σ̂₍ᵢ₎', () => {
    const { y, x } = randomProblem(6, 30, 2);
    const weights = y.map((_, i) => 1 + (i % 3));
    const d = residualDiagnostics({ y, x, weights }, { knownSigma: 0.7 });
    expect(d.sigmaKnown).toBe(true);
    expectMatches(d, { ...reference(x, y, weights), ...pick(reference(x, y, weights, 0.7)) });
  });
});

function pick(ref: Reference): Pick<Reference, 'standardized' | 'cooksDistance'> {
  return { standardized: ref.standardized, cooksDistance: ref.cooksDistance };
}

describe('delivery-time example (Montgomery, Peck & Vining, chapter 6; from memory)', () => {
  const time = [
    16.68, 11.5, 12.03, 14.88, 13.75, 18.11, 8, 17.83, 79.24, 21.5, 40.33, 21, 13.5, 19.75, 24, 29, 15.35, 19, 9.5, 35.1, 17.9, 52.32, 18.75, 19.83, 10.75,
  ];
  const cases = [7, 3, 3, 4, 6, 7, 2, 7, 30, 5, 16, 10, 4, 6, 9, 10, 6, 7, 3, 17, 10, 26, 9, 8, 4];
  const distance = [560, 220, 340, 80, 150, 330, 110, 210, 1460, 605, 688, 215, 255, 462, 448, 776, 200, 132, 36, 770, 140, 810, 450, 635, 150];

  it('observation 9: e = 7.4197, h = 0.49829, standardized 3.2138, R-student 4.3108; flagged on all three counts', () => {
    const d = residualDiagnostics({ y: time, x: cases.map((c, i) => [c, distance[i]]) });
    const nine = d.rows[8];
    expect(nine.residual).toBeCloseTo(7.4197, 4);
    expect(nine.leverage).toBeCloseTo(0.49829, 5);
    expect(nine.standardized).toBeCloseTo(3.2138, 4);
    expect(nine.studentized).toBeCloseTo(4.3108, 4);
    expect(residualFlags(nine, d)).toEqual(['high-leverage', 'outlier', 'influential']);
    expect(maxCooksDistance(d)).toBe(nine.cooksDistance);
    expect(highLeverageCount(d)).toBe(2);
  });
});

describe('identities and edge cases (common practice)', () => {
  it('leverages sum to p, the number of estimated parameters, weighted or not and with an aliased column', () => {
    const { y, x } = randomProblem(7, 40, 3);
    expect(sum(column(residualDiagnostics({ y, x }), 'leverage'))).toBeCloseTo(4, 12);
    const weights = y.map((_, i) => 1 + i);
    expect(sum(column(residualDiagnostics({ y, x, weights }), 'leverage'))).toBeCloseTo(4, 12);
    const aliased = residualDiagnostics({ y, x: x.map((r) => [...r, r[0] - r[2]]) });
    expect(aliased.p).toBe(4);
    expect(sum(column(aliased, 'leverage'))).toBeCloseTo(4, 12);
    expectRelative(column(aliased, 'studentized'), column(residualDiagnostics({ y, x }), 'studentized'), 1e-9);
  });

  it('gives two rows with the same x the same leverage, and twins alone on a dummy exactly 1/2 each', () => {
    const { y, x } = randomProblem(8, 20, 2);
    const withTwin = [...x, x[3]];
    const d = residualDiagnostics({ y: [...y, y[3] + 0.5], x: withTwin });
    expect(d.rows[20].leverage).toBeCloseTo(d.rows[3].leverage, 12);
    expect(d.rows[3].leverage).toBeLessThanOrEqual(0.5);

    // Twins alone on a dummy: the dummy fits their mean, so each row carries half of its own fit.
    const dummy = x.map((r, i) => [...(i === 6 ? x[5] : r), i === 5 || i === 6 ? 1 : 0]);
    const pair = residualDiagnostics({ y, x: dummy });
    expect(pair.rows[5].leverage).toBeCloseTo(0.5, 12);
    expect(pair.rows[6].leverage).toBeCloseTo(0.5, 12);
  });

  it('leaves the scale-free diagnostics unchanged when y is multiplied by 1e200', () => {
    const { y, x } = randomProblem(9, 15, 2);
    const base = residualDiagnostics({ y, x });
    const huge = residualDiagnostics({ y: y.map((v) => v * 1e200), x });
    for (const key of ['leverage', 'standardized', 'studentized', 'cooksDistance', 'dffits'] as const) {
      expectRelative(column(huge, key), column(base, key), 1e-10);
    }
  });

  it('a row alone on its dummy has leverage 1: its scaled values are NaN with the reason, the others are fine', () => {
    const { y, x } = randomProblem(10, 15, 1);
    const d = residualDiagnostics({ y, x: x.map((r, i) => [...r, i === 4 ? 1 : 0]) });
    const row = d.rows[4];
    expect(1 - row.leverage).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(row.residual)).toBeLessThan(1e-12);
    for (const v of [row.standardized, row.studentized, row.cooksDistance, row.dffits]) expect(Number.isNaN(v)).toBe(true);
    expect(row.undefinedBecause).toBe('leverage-one');
    expect(residualFlags(row, d)).toContain('high-leverage');
    d.rows.filter((_, i) => i !== 4).forEach((r) => expect(Number.isFinite(r.dffits)).toBe(true));
  });

  it('a perfect fit: residuals 0, scaled values NaN and marked exact-fit; with σ known the standardized are 0', () => {
    const x = [[1], [2], [3], [4], [5], [7]];
    const y = x.map(([v]) => 3 - 2 * v);
    const d = residualDiagnostics({ y, x });
    for (const row of d.rows) {
      expect(row.residual).toBe(0);
      expect(Number.isNaN(row.standardized) && Number.isNaN(row.studentized)).toBe(true);
      expect(Number.isNaN(row.cooksDistance) && Number.isNaN(row.dffits)).toBe(true);
      expect(row.undefinedBecause).toBe('exact-fit');
      expect(residualFlags(row, d)).not.toContain('outlier');
    }
    const known = residualDiagnostics({ y, x }, { knownSigma: 1 });
    for (const row of known.rows) {
      expect(row.standardized).toBe(0);
      expect(row.cooksDistance).toBe(0);
      expect(Number.isNaN(row.studentized)).toBe(true);
    }
  });

  it('n = p + 1: σ̂₍ᵢ₎ has no df, so studentized and DFFITS are NaN, and every |standardized| is 1', () => {
    const x = [[1.5], [2], [4.5]];
    const y = [1, 3, 2];
    const d = residualDiagnostics({ y, x });
    for (const row of d.rows) {
      expect(Number.isNaN(row.studentized) && Number.isNaN(row.dffits)).toBe(true);
      expect(row.undefinedBecause).toBe('no-deleted-df');
      // The residual space is one line, so each residual carries all of RSS in proportion to 1 − hᵢ.
      expect(Math.abs(row.standardized)).toBeCloseTo(1, 12);
      expect(Number.isFinite(row.cooksDistance)).toBe(true);
    }
  });

  it('a row whose removal leaves an exact fit: studentized NaN, flagged outlier with the reason', () => {
    const x = [[1], [2], [3], [4], [5], [6], [7]];
    const y = x.map(([v], i) => 1 + v + (i === 3 ? 5 : 0));
    const d = residualDiagnostics({ y, x });
    expect(d.rows[3].undefinedBecause).toBe('rest-fit-exactly');
    expect(residualFlags(d.rows[3], d)).toContain('outlier');
    expect(Number.isNaN(d.rows[3].studentized)).toBe(true);
    expect(Number.isFinite(d.rows[3].standardized)).toBe(true);
    expect(d.rows.filter((r) => residualFlags(r, d).includes('outlier'))).toHaveLength(1);
  });
});

describe('the last diagnostics kept', () => {
  it('gives the same diagnostics again for the same fit until reset, then equal ones computed afresh', () => {
    const { y, x } = randomProblem(21, 20, 2);
    const first = residualDiagnostics({ y, x });
    expect(residualDiagnostics({ y, x })).toBe(first);
    resetResidualDiagnostics();
    const afresh = residualDiagnostics({ y, x });
    expect(afresh).not.toBe(first);
    expect(Array.from(afresh.studentized)).toEqual(Array.from(first.studentized));
  });
});
