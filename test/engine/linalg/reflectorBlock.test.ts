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
import { ReflectorBlock } from '../../../src/engine/linalg/reflectorBlock';
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

describe('the reflector block shared by every factorization', () => {
  it('gives each of two factorizations in turn what it gives alone, whatever the other’s size', () => {
    const small = design();
    const alone = factorInPlace({ ...small, data: Float64Array.from(small.data) }, 1e-12, 1);
    // A taller matrix factored in between must leave nothing behind for the next one.
    const normal = gaussian(mulberry32(5));
    const tall = 3 * n;
    const other = Float64Array.from({ length: tall * 6 }, () => normal() / Math.sqrt(tall));
    factorInPlace({ rows: tall, cols: 6, data: other }, 1e-12, 1);
    const again = factorInPlace({ ...small, data: Float64Array.from(small.data) }, 1e-12, 1);
    expect(again.accepted).toEqual(alone.accepted);
    expect(Array.from(again.r)).toEqual(Array.from(alone.r));
    expect(Array.from(again.taus)).toEqual(Array.from(alone.taus));
  });
});

describe('ReflectorBlock', () => {
  it('holds no reflector after it is attached to new storage or detached', () => {
    const block = new ReflectorBlock();
    const data = Float64Array.from({ length: 8 }, (_, i) => (i === 0 ? 1 : 0.25));
    block.attach(data, 4).add(0, 0, 1, 1);
    expect(block.size).toBe(1);
    block.attach(data, 4);
    expect(block.size).toBe(0);
    block.add(0, 0, 1, 1);
    block.detach();
    expect(block.size).toBe(0);
    // With nothing held, applying the block leaves the columns as they are.
    const before = Array.from(data);
    block.attach(data, 4).applyTo(1, 1);
    expect(Array.from(data)).toEqual(before);
  });

  it('refuses to prepare a column while a full block is pending, which it could not take together', () => {
    const rows = 8;
    const data = Float64Array.from({ length: rows * 5 }, (_, i) => ((i * 7) % 5) / 5);
    const block = new ReflectorBlock().attach(data, rows);
    for (let a = 0; a < 4; a++) block.add(a * rows, a, 1, 1);
    expect(() => block.prepareColumn(4, 4)).toThrow('a full block is applied');
  });
});
