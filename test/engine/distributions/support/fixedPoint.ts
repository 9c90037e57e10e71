/**
 * Reals as BigInt multiples of 2^-320 (about 96 decimal digits), for reference values that must be
 * far more accurate than the double-precision code they check. Integer parts are unbounded, so
 * large sums and products are exact up to the 2^-320 truncation of each operation. Tiny results are
 * never held in this form: they are carried as logarithms and converted by `expToDouble`.
 *
 * Nothing here shares code or constants with src/: ln 2 and π are computed from their series.
 */

export type Fixed = bigint;

const BITS = 320n;
export const ONE: Fixed = 1n << BITS;

export function fromInteger(n: number | bigint): Fixed {
  return BigInt(n) << BITS;
}

/** The exact value of a double; throws if it has bits below 2^-320 (use logarithms for those). */
export function fromDouble(d: number): Fixed {
  if (!Number.isFinite(d)) throw new Error(`not finite: ${d}`);
  if (d === 0) return 0n;
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, d);
  const bits = view.getBigUint64(0);
  const negative = bits >> 63n === 1n;
  const biased = (bits >> 52n) & 0x7ffn;
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = biased === 0n ? fraction : fraction | (1n << 52n);
  const shift = (biased === 0n ? 1n : biased) - 1075n + BITS; // value = mantissa·2^(e − 1075)
  let v: bigint;
  if (shift >= 0n) v = mantissa << shift;
  else {
    if (mantissa & ((1n << -shift) - 1n)) throw new Error(`${d} has bits below 2^-320`);
    v = mantissa >> -shift;
  }
  return negative ? -v : v;
}

/** Nearest double (BigInt → Number conversion rounds to nearest); only for |v| well above 2^-267. */
export function toDouble(v: Fixed): number {
  return Number(v) / 2 ** 320;
}

export function mul(a: Fixed, b: Fixed): Fixed {
  return (a * b) >> BITS;
}

export function div(a: Fixed, b: Fixed): Fixed {
  return (a << BITS) / b;
}

function bitLength(v: bigint): bigint {
  return BigInt(v.toString(2).length);
}

/** Σ_{k≥0} s^(2k+1)/(2k+1), i.e. atanh(s), for |s| ≤ 1/3. */
function atanhSeries(s: Fixed): Fixed {
  const s2 = mul(s, s);
  let power = s;
  let sum = 0n;
  for (let k = 1n; power !== 0n; k += 2n) {
    sum += power / k;
    power = mul(power, s2);
  }
  return sum;
}

/** ln 2 = 2·atanh(1/3). */
export const LN2: Fixed = 2n * atanhSeries(div(ONE, fromInteger(3)));

/** Natural logarithm of v > 0: v = 2^k·m with m in [1, 2), ln m = 2·atanh((m − 1)/(m + 1)). */
export function ln(v: Fixed): Fixed {
  if (v <= 0n) throw new Error('ln of a non-positive number');
  const k = bitLength(v) - 1n - BITS;
  const m = k >= 0n ? v >> k : v << -k;
  return k * LN2 + 2n * atanhSeries(div(m - ONE, m + ONE));
}

/** e^r by its Taylor series, for |r| ≤ ½. */
function expSmall(r: Fixed): Fixed {
  let term = ONE;
  let sum = ONE;
  for (let n = 1n; term !== 0n; n++) {
    term = mul(term, r) / n;
    sum += term;
  }
  return sum;
}

/** Splits v = k·ln 2 + r with |r| ≤ ln 2 / 2. */
function reduce(v: Fixed): { k: bigint; r: Fixed } {
  const twice = (2n * v) / LN2; // floor toward zero of 2v/ln 2
  const k = (twice + (twice >= 0n ? 1n : -1n)) / 2n;
  return { k, r: v - k * LN2 };
}

export function exp(v: Fixed): Fixed {
  const { k, r } = reduce(v);
  const e = expSmall(r);
  return k >= 0n ? e << k : e >> -k;
}

/** e^v as the nearest double, for any v whose exponential is a normal double. */
export function expToDouble(v: Fixed): number {
  const { k, r } = reduce(v);
  const m = toDouble(expSmall(r)); // in [0.7, 1.42]
  const kn = Number(k);
  // Scale in two steps so that neither factor under- or overflows on its own.
  const half = Math.trunc(kn / 2);
  return m * 2 ** half * 2 ** (kn - half);
}

export function sqrt(v: Fixed): Fixed {
  if (v < 0n) throw new Error('sqrt of a negative number');
  if (v === 0n) return 0n;
  const n = v << BITS; // sqrt(v·2^320)·… keeps the 2^-320 scaling
  let x = 1n << (bitLength(n) / 2n + 1n);
  for (;;) {
    const next = (x + n / x) >> 1n;
    if (next >= x) return x;
    x = next;
  }
}

/** atan(u) for any real u: halve the angle (atan u = 2·atan(u/(1 + √(1+u²)))) until |u| ≤ 1/4. */
export function atan(u: Fixed): Fixed {
  let halvings = 0n;
  const quarter = ONE / 4n;
  while (u > quarter || u < -quarter) {
    u = div(u, ONE + sqrt(ONE + mul(u, u)));
    halvings++;
  }
  const u2 = mul(u, u);
  let power = u;
  let sum = 0n;
  for (let k = 1n; power !== 0n; k += 2n) {
    sum += (k % 4n === 1n ? power : -power) / k;
    power = mul(power, u2);
  }
  return sum << halvings;
}

/** π = 16·atan(1/5) − 4·atan(1/239) (Machin's formula, common practice, no source). */
export const PI: Fixed = 16n * atan(div(ONE, fromInteger(5))) - 4n * atan(div(ONE, fromInteger(239)));
