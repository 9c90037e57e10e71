import { ddAdd, ddDiv, ddMul, ddSqrt, pair } from './doubleDouble';
import type { ExtendedColumn } from './exactPowers';

/**
 * Householder least squares carried out entirely in double-double arithmetic (Hida, Li & Bailey
 * 2001), for designs too ill-conditioned for double precision. Householder QR is backward stable
 * (Björck 1996, Numerical Methods for Least Squares Problems, §2.4), so its forward error is
 * about κ·u (κ² · residual term for the SDs); with u ≈ 1e-32 even κ ≈ 1e10 leaves 20 digits, and
 * the results rounded to double are then correct to double precision.
 *
 * The input is the design as given (doubles, or double-double where a column is known more
 * exactly than double, see exactPowers.ts), with its column scales and y's scale: the scaled
 * entries x/s are formed in double-double so that scaling adds no rounding of its own.
 */
export interface PreciseLeastSquares {
  /** Coefficients in the data's units (b·yScale/s, formed in double-double), rounded to double. */
  coefficients: Float64Array;
  /** Upper-triangular R of the scaled columns, row-major rank × rank, rounded to double. */
  r: Float64Array;
  /** R⁻¹, row-major rank × rank, inverted in double-double then rounded. */
  rInverse: Float64Array;
  /** ‖y/yScale − X S⁻¹ b‖², summed in double-double then rounded. */
  scaledRss: number;
}

/**
 * `columns` are the accepted design columns (each of length n; a Float64Array is exact as it
 * stands) and `scales` their norms; the caller has already decided which columns are aliased, so
 * this never drops one.
 */
export function preciseLeastSquares(
  columns: readonly (Float64Array | ExtendedColumn)[],
  scales: ArrayLike<number>,
  y: Float64Array,
  yScale: number,
): PreciseLeastSquares {
  const n = y.length;
  const q = columns.length;
  const width = q + 1;
  // Column-major working matrix [X S⁻¹ | y/yScale], split into hi and lo parts.
  const hi = new Float64Array(n * width);
  const lo = new Float64Array(n * width);
  const t = pair();
  for (let j = 0; j < width; j++) {
    const column = j < q ? columns[j] : y;
    const source = column instanceof Float64Array ? column : column.hi;
    const low = column instanceof Float64Array ? undefined : column.lo;
    const scale = splitScale(j < q ? scales[j] : yScale);
    for (let i = 0; i < n; i++) {
      const lowPart = low === undefined ? 0 : timesPowerOfTwo(low[i], -scale.exponent);
      ddDiv(timesPowerOfTwo(source[i], -scale.exponent), lowPart, scale.mantissa, 0, t);
      hi[j * n + i] = t[0];
      lo[j * n + i] = t[1];
    }
  }

  const acc = pair();
  for (let k = 0; k < q; k++) {
    const base = k * n;
    // ‖x[k..]‖ in double-double; columns have unit norm, so squares neither overflow nor underflow.
    acc[0] = 0;
    acc[1] = 0;
    for (let i = k; i < n; i++) {
      ddMul(hi[base + i], lo[base + i], hi[base + i], lo[base + i], t);
      ddAdd(acc[0], acc[1], t[0], t[1], acc);
    }
    ddSqrt(acc[0], acc[1], t);
    const alphaHi = hi[base + k];
    const alphaLo = lo[base + k];
    // β takes the sign opposite to α so that v_k = α − β involves no cancellation.
    const betaHi = alphaHi >= 0 ? -t[0] : t[0];
    const betaLo = alphaHi >= 0 ? -t[1] : t[1];
    ddAdd(alphaHi, alphaLo, -betaHi, -betaLo, t);
    const vkHi = t[0];
    const vkLo = t[1];
    // With v = x − βe_k, vᵀv = −2β·v_k, so H = I − 2vvᵀ/(vᵀv) = I + vvᵀ/(β·v_k).
    ddMul(betaHi, betaLo, vkHi, vkLo, t);
    const denomHi = t[0];
    const denomLo = t[1];
    for (let c = k + 1; c < width; c++) {
      const cb = c * n;
      ddMul(vkHi, vkLo, hi[cb + k], lo[cb + k], acc);
      for (let i = k + 1; i < n; i++) {
        ddMul(hi[base + i], lo[base + i], hi[cb + i], lo[cb + i], t);
        ddAdd(acc[0], acc[1], t[0], t[1], acc);
      }
      ddDiv(acc[0], acc[1], denomHi, denomLo, acc);
      const fHi = acc[0];
      const fLo = acc[1];
      // target += f·v, with v_k held apart from the column's stored x_k.
      ddMul(fHi, fLo, vkHi, vkLo, t);
      ddAdd(hi[cb + k], lo[cb + k], t[0], t[1], t);
      hi[cb + k] = t[0];
      lo[cb + k] = t[1];
      for (let i = k + 1; i < n; i++) {
        ddMul(fHi, fLo, hi[base + i], lo[base + i], t);
        ddAdd(hi[cb + i], lo[cb + i], t[0], t[1], t);
        hi[cb + i] = t[0];
        lo[cb + i] = t[1];
      }
    }
    hi[base + k] = betaHi;
    lo[base + k] = betaLo;
  }

  // R in double-double, row-major.
  const rHi = new Float64Array(q * q);
  const rLo = new Float64Array(q * q);
  for (let i = 0; i < q; i++) {
    for (let j = i; j < q; j++) {
      rHi[i * q + j] = hi[j * n + i];
      rLo[i * q + j] = lo[j * n + i];
    }
  }

  const yb = q * n;
  const bHi = new Float64Array(q);
  const bLo = new Float64Array(q);
  for (let i = q - 1; i >= 0; i--) {
    acc[0] = hi[yb + i];
    acc[1] = lo[yb + i];
    for (let j = i + 1; j < q; j++) {
      ddMul(rHi[i * q + j], rLo[i * q + j], bHi[j], bLo[j], t);
      ddAdd(acc[0], acc[1], -t[0], -t[1], acc);
    }
    ddDiv(acc[0], acc[1], rHi[i * q + i], rLo[i * q + i], acc);
    bHi[i] = acc[0];
    bLo[i] = acc[1];
  }

  acc[0] = 0;
  acc[1] = 0;
  for (let i = q; i < n; i++) {
    ddMul(hi[yb + i], lo[yb + i], hi[yb + i], lo[yb + i], t);
    ddAdd(acc[0], acc[1], t[0], t[1], acc);
  }
  const scaledRss = acc[0] + acc[1];

  // R⁻¹ column by column: X_cc = 1/R_cc, X_ic = −(Σ_{k>i} R_ik X_kc)/R_ii.
  const invHi = new Float64Array(q * q);
  const invLo = new Float64Array(q * q);
  for (let c = 0; c < q; c++) {
    ddDiv(1, 0, rHi[c * q + c], rLo[c * q + c], t);
    invHi[c * q + c] = t[0];
    invLo[c * q + c] = t[1];
    for (let i = c - 1; i >= 0; i--) {
      acc[0] = 0;
      acc[1] = 0;
      for (let k = i + 1; k <= c; k++) {
        ddMul(rHi[i * q + k], rLo[i * q + k], invHi[k * q + c], invLo[k * q + c], t);
        ddAdd(acc[0], acc[1], t[0], t[1], acc);
      }
      ddDiv(-acc[0], -acc[1], rHi[i * q + i], rLo[i * q + i], acc);
      invHi[i * q + c] = acc[0];
      invLo[i * q + c] = acc[1];
    }
  }

  const round = (h: Float64Array, l: Float64Array) => Float64Array.from(h, (v, i) => v + l[i]);
  return {
    coefficients: Float64Array.from(bHi, (v, i) => {
      const column = splitScale(scales[i]);
      const response = splitScale(yScale);
      ddMul(v, bLo[i], response.mantissa, 0, t);
      ddDiv(t[0], t[1], column.mantissa, 0, t);
      return timesPowerOfTwo(t[0] + t[1], response.exponent - column.exponent);
    }),
    r: round(rHi, rLo),
    rInverse: round(invHi, invLo),
    scaledRss,
  };
}

/**
 * s = mantissa·2^exponent with the mantissa near 1. Scales span 1e±300, where Dekker's
 * splitting overflows; the power of two is applied exactly apart, and only the mantissa enters
 * double-double arithmetic.
 */
function splitScale(s: number): { mantissa: number; exponent: number } {
  const exponent = Math.round(Math.log2(s));
  return { mantissa: timesPowerOfTwo(s, -exponent), exponent };
}

/** x·2^k, exact whenever x and the result are normal: two halves keep each factor finite. */
function timesPowerOfTwo(x: number, k: number): number {
  const half = Math.trunc(k / 2);
  return x * 2 ** half * 2 ** (k - half);
}
