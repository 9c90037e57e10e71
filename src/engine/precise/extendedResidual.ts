import type { ColumnMajorMatrix } from '../linalg/columnMajor';
import { ROW_TILE } from '../linalg/rowTiles';

/**
 * Veltkamp's splitting constant 2²⁷ + 1 (see doubleDouble.ts): x·C − (x·C − x) keeps the top 26
 * bits of x, so products of the halves are exact.
 */
const SPLITTER = 134217729;

/**
 * r = (y − X·b)/yScale over the given columns of X, with each row's sum formed in double-double and
 * only then rounded: Ogita, Rump & Oishi's Dot2 ("Accurate sum and dot product", SIAM J. Sci.
 * Comput. 26, 2005), TwoProd for every x·b and TwoSum for every subtraction, their errors added
 * apart. The rounded r is then accurate to a few units of its own last place however much of y the
 * fit cancels, which is what iterative refinement needs (Higham, Accuracy and Stability of
 * Numerical Algorithms, 2nd ed., §12.1 and ch. 20).
 *
 * When `gradient` is given it receives Xᵀr (over the same columns) from the same sweep. Rows are
 * taken in tiles, so the tile of X read for r is still in cache for Xᵀr.
 *
 * The caller keeps |x|, |b| and |x·b| well inside 2^±900 (Veltkamp's split overflows near 2⁹⁹⁶,
 * and error terms near the underflow threshold lose their low bits).
 */
export function extendedResidual(
  matrix: ColumnMajorMatrix,
  columns: readonly number[],
  coefficients: Float64Array,
  y: Float64Array,
  yScale: number,
  residual: Float64Array,
  gradient?: Float64Array,
): void {
  const n = matrix.rows;
  const data = matrix.data;
  const q = columns.length;
  const highs = new Float64Array(q);
  const lows = new Float64Array(q);
  for (let a = 0; a < q; a++) {
    const b = coefficients[a];
    const t = SPLITTER * b;
    highs[a] = t - (t - b);
    lows[a] = b - highs[a];
  }
  const sums = new Float64Array(ROW_TILE);
  const errors = new Float64Array(ROW_TILE);
  gradient?.fill(0);
  for (let from = 0; from < n; from += ROW_TILE) {
    const length = Math.min(ROW_TILE, n - from);
    for (let i = 0; i < length; i++) {
      sums[i] = y[from + i];
      errors[i] = 0;
    }
    let a = 0;
    // Two columns per sweep of the tile: the running sums are loaded and stored half as often.
    for (; a + 1 < q; a += 2) {
      const b = coefficients[a];
      const bHigh = highs[a];
      const bLow = lows[a];
      const c = coefficients[a + 1];
      const cHigh = highs[a + 1];
      const cLow = lows[a + 1];
      const base = columns[a] * n + from;
      const next = columns[a + 1] * n + from;
      for (let i = 0; i < length; i++) {
        const x = data[base + i];
        const z = data[next + i];
        // TwoProd: x·b = p + pe and z·c = o + oe exactly.
        const p = x * b;
        let t = SPLITTER * x;
        const xHigh = t - (t - x);
        const xLow = x - xHigh;
        const pe = xHigh * bHigh - p + xHigh * bLow + xLow * bHigh + xLow * bLow;
        const o = z * c;
        t = SPLITTER * z;
        const zHigh = t - (t - z);
        const zLow = z - zHigh;
        const oe = zHigh * cHigh - o + zHigh * cLow + zLow * cHigh + zLow * cLow;
        // TwoSum twice: s − p = d + de, then d − o = f + fe exactly.
        const s = sums[i];
        const d = s - p;
        let v = d - s;
        const de = s - (d - v) + (-p - v);
        const f = d - o;
        v = f - d;
        const fe = d - (f - v) + (-o - v);
        sums[i] = f;
        errors[i] += de + fe - pe - oe;
      }
    }
    for (; a < q; a++) {
      const b = coefficients[a];
      const bHigh = highs[a];
      const bLow = lows[a];
      const base = columns[a] * n + from;
      for (let i = 0; i < length; i++) {
        const x = data[base + i];
        // TwoProd: x·b = product + productError exactly.
        const product = x * b;
        const t = SPLITTER * x;
        const xHigh = t - (t - x);
        const xLow = x - xHigh;
        const productError = xHigh * bHigh - product + xHigh * bLow + xLow * bHigh + xLow * bLow;
        // TwoSum: s − product = difference + sumError exactly.
        const s = sums[i];
        const difference = s - product;
        const virtual = difference - s;
        const sumError = s - (difference - virtual) + (-product - virtual);
        sums[i] = difference;
        errors[i] += sumError - productError;
      }
    }
    for (let i = 0; i < length; i++) residual[from + i] = (sums[i] + errors[i]) / yScale;
    if (gradient !== undefined) {
      for (let a = 0; a < q; a++) {
        const base = columns[a] * n + from;
        let dot = 0;
        for (let i = 0; i < length; i++) dot += data[base + i] * residual[from + i];
        gradient[a] += dot;
      }
    }
  }
}
