/**
 * Double-double arithmetic: a value is the unevaluated sum hi + lo of two doubles with
 * |lo| ≤ ½ulp(hi), giving about 106 significant bits. Built on the error-free transformations
 * TwoSum (Knuth, TAOCP vol. 2, §4.2.2) and TwoProd (Dekker 1971, "A floating-point technique for
 * extending the available precision", with Veltkamp splitting because JavaScript has no FMA),
 * combined as in Hida, Li & Bailey (2001), "Algorithms for quad-double precision floating point
 * arithmetic" (the QD library's dd_real).
 *
 * Every function writes its result into `out[0]` (hi) and `out[1]` (lo) so that inner loops reuse
 * one scratch pair instead of allocating an object per operation.
 */
export type Pair = Float64Array;

export function pair(): Pair {
  return new Float64Array(2);
}

/** Knuth's TwoSum: s + e = a + b exactly, for any ordering of |a|, |b| (barring overflow). */
export function twoSum(a: number, b: number, out: Pair): void {
  const s = a + b;
  const bb = s - a;
  out[0] = s;
  out[1] = a - (s - bb) + (b - bb);
}

/** Dekker's FastTwoSum: exact when |a| ≥ |b| (or a = 0); three flops instead of six. */
export function quickTwoSum(a: number, b: number, out: Pair): void {
  const s = a + b;
  out[0] = s;
  out[1] = b - (s - a);
}

/**
 * Veltkamp's splitting constant 2²⁷ + 1: a·C − (a·C − a) leaves the top 26 bits of a, so the
 * product of two halves is exact. Valid while |a| < 2⁹⁹⁶ (a·C must not overflow), which the
 * unit-norm-scaled designs this serves are far inside.
 */
const SPLITTER = 134217729;

/** Dekker's TwoProd: p + e = a·b exactly (barring overflow and underflow). */
export function twoProd(a: number, b: number, out: Pair): void {
  const p = a * b;
  let t = SPLITTER * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLITTER * b;
  const bh = t - (t - b);
  const bl = b - bh;
  out[0] = p;
  out[1] = ah * bh - p + ah * bl + al * bh + al * bl;
}

/** (ah + al) + (bh + bl), the "IEEE" accurate sum of Hida, Li & Bailey (relative error ≈ 2⁻¹⁰⁶). */
export function ddAdd(ah: number, al: number, bh: number, bl: number, out: Pair): void {
  twoSum(ah, bh, out);
  const s1 = out[0];
  let s2 = out[1];
  twoSum(al, bl, out);
  const t1 = out[0];
  const t2 = out[1];
  s2 += t1;
  quickTwoSum(s1, s2, out);
  const u1 = out[0];
  const u2 = out[1] + t2;
  quickTwoSum(u1, u2, out);
}

/** (ah + al)·(bh + bl); the al·bl term is below the working precision and dropped. */
export function ddMul(ah: number, al: number, bh: number, bl: number, out: Pair): void {
  twoProd(ah, bh, out);
  const p = out[0];
  const e = out[1] + (ah * bl + al * bh);
  quickTwoSum(p, e, out);
}

/**
 * (ah + al)/(bh + bl) by three correction steps of long division in doubles (Hida, Li & Bailey's
 * accurate division): each quotient digit's remainder is formed exactly enough with ddMul/ddAdd.
 */
export function ddDiv(ah: number, al: number, bh: number, bl: number, out: Pair): void {
  const q1 = ah / bh;
  ddMul(q1, 0, bh, bl, out);
  ddAdd(ah, al, -out[0], -out[1], out);
  const q2 = out[0] / bh;
  const rh = out[0];
  const rl = out[1];
  ddMul(q2, 0, bh, bl, out);
  ddAdd(rh, rl, -out[0], -out[1], out);
  const q3 = out[0] / bh;
  quickTwoSum(q1, q2, out);
  ddAdd(out[0], out[1], q3, 0, out);
}

/**
 * √(ah + al) by Karp & Markstein's single Newton correction of the double square root:
 * with x ≈ 1/√a, √a ≈ a·x + (a − (a·x)²)·x/2, the residual taken in double-double.
 */
export function ddSqrt(ah: number, al: number, out: Pair): void {
  if (!(ah > 0)) {
    out[0] = ah === 0 ? 0 : Number.NaN;
    out[1] = 0;
    return;
  }
  const x = 1 / Math.sqrt(ah);
  const ax = ah * x;
  twoProd(ax, ax, out);
  ddAdd(ah, al, -out[0], -out[1], out);
  const correction = out[0] * x * 0.5;
  twoSum(ax, correction, out);
}
