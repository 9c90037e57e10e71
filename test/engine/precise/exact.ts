/** Exact rational arithmetic on BigInt, used to check double-double results against the truth. */
export interface Fraction {
  num: bigint;
  den: bigint;
}

const view = new DataView(new ArrayBuffer(8));

/** The exact binary value of a double, as a fraction with a power-of-two denominator. */
export function exactOf(x: number): Fraction {
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? -1n : 1n;
  const exponent = Number((bits >> 52n) & 0x7ffn);
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = exponent === 0 ? fraction : fraction | (1n << 52n);
  const power = (exponent === 0 ? 1 : exponent) - 1075;
  return power >= 0 ? { num: sign * (mantissa << BigInt(power)), den: 1n } : reduce({ num: sign * mantissa, den: 1n << BigInt(-power) });
}

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function reduce(f: Fraction): Fraction {
  if (f.num === 0n) return { num: 0n, den: 1n };
  const g = gcd(f.num, f.den);
  const s = f.den < 0n ? -1n : 1n;
  return { num: (s * f.num) / g, den: (s * f.den) / g };
}

export const add = (a: Fraction, b: Fraction): Fraction => reduce({ num: a.num * b.den + b.num * a.den, den: a.den * b.den });
export const sub = (a: Fraction, b: Fraction): Fraction => add(a, { num: -b.num, den: b.den });
export const mul = (a: Fraction, b: Fraction): Fraction => reduce({ num: a.num * b.num, den: a.den * b.den });
export const div = (a: Fraction, b: Fraction): Fraction => reduce({ num: a.num * b.den, den: a.den * b.num });
export const equal = (a: Fraction, b: Fraction): boolean => a.num * b.den === b.num * a.den;
export const abs = (a: Fraction): Fraction => ({ num: a.num < 0n ? -a.num : a.num, den: a.den });
/** a ≤ b, for positive denominators (which reduce keeps). */
export const lessOrEqual = (a: Fraction, b: Fraction): boolean => a.num * b.den <= b.num * a.den;

/** Solves the square system A x = b exactly by Gaussian elimination over the rationals. */
export function solveExact(a: Fraction[][], b: Fraction[]): Fraction[] {
  const q = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let k = 0; k < q; k++) {
    const pivot = m.findIndex((row, i) => i >= k && row[k].num !== 0n);
    [m[k], m[pivot]] = [m[pivot], m[k]];
    for (let i = k + 1; i < q; i++) {
      const f = div(m[i][k], m[k][k]);
      for (let j = k; j <= q; j++) m[i][j] = sub(m[i][j], mul(f, m[k][j]));
    }
  }
  const x: Fraction[] = new Array<Fraction>(q);
  for (let i = q - 1; i >= 0; i--) {
    let s = m[i][q];
    for (let j = i + 1; j < q; j++) s = sub(s, mul(m[i][j], x[j]));
    x[i] = div(s, m[i][i]);
  }
  return x;
}
