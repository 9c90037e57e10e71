/**
 * The blocked (compact WY) application inside factorInPlace must give what applying the same
 * reflectors one at a time gives. Sources: Schreiber & Van Loan (1989), "A storage-efficient WY
 * representation for products of Householder transformations", SIAM J. Sci. Stat. Comput. 10
 * (H₁⋯H_s = I − VTVᵀ); Golub & Van Loan, Matrix Computations, §5.1–5.2 (Householder QR, Qᵀa_j is
 * R's column j). The design is seeded; the bound is a modest multiple of n·ε (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { type ColumnMajorMatrix, columnView } from '../../../src/engine/linalg/columnMajor';
import { applyQTranspose, factorInPlace } from '../../../src/engine/linalg/householderQr';
import { gaussian, mulberry32 } from '../../support/random';

const n = 60;
const EPSILON = 2 ** -52;

/** 13 columns of unit norm, 3 and 8 exact combinations of earlier ones, then a carried column. */
function design(): ColumnMajorMatrix {
  const normal = gaussian(mulberry32(77));
  const columns = Array.from({ length: 14 }, () => Array.from({ length: n }, () => normal()));
  columns[3] = columns[0].map((v, i) => v - 2 * columns[2][i]);
  columns[8] = columns[1].map((v, i) => 0.5 * v + columns[6][i]);
  const data = new Float64Array(n * columns.length);
  columns.forEach((column, j) => {
    const norm = Math.hypot(...column);
    column.forEach((v, i) => (data[j * n + i] = v / norm));
  });
  return { rows: n, cols: columns.length, data };
}

describe('factorInPlace with blocks of reflectors', () => {
  const original = design();
  const storage: ColumnMajorMatrix = { ...original, data: Float64Array.from(original.data) };
  const qr = factorInPlace(storage, 1e-12, 1);
  const work = qr.reflectors.length;

  it('drops the two combinations and keeps the other 11 columns in order', () => {
    expect(qr.accepted).toEqual([0, 1, 2, 4, 5, 6, 7, 9, 10, 11, 12]);
    expect(work).toBe(11);
  });

  it('matches the reflectors applied one at a time: Qᵀa_j is R’s column, zero below it', () => {
    qr.accepted.forEach((col, a) => {
      const column = Float64Array.from(columnView(original, col));
      applyQTranspose(qr, column);
      for (let i = 0; i <= a; i++) expect(Math.abs(column[i] - qr.r[i * work + a]), `R[${i}, ${a}]`).toBeLessThan(8 * n * EPSILON);
      for (let i = a + 1; i < n; i++) expect(Math.abs(column[i]), `row ${i} of column ${a}`).toBeLessThan(8 * n * EPSILON);
    });
  });

  it('leaves the carried column as Qᵀ applied to it', () => {
    const direct = Float64Array.from(columnView(original, 13));
    applyQTranspose(qr, direct);
    const carried = columnView(storage, 13);
    for (let i = 0; i < n; i++) expect(Math.abs(carried[i] - direct[i])).toBeLessThan(8 * n * EPSILON);
  });

  it('stores each reflector with zeros above its row and 1 on it', () => {
    qr.reflectors.forEach((v, k) => {
      for (let i = 0; i < k; i++) expect(v[i]).toBe(0);
      expect(v[k]).toBe(1);
    });
  });
});
