/**
 * Reference values for the distribution tests, evaluated in 320-bit fixed point (fixedPoint.ts) so
 * that they are good to far below the 1e-12 tolerance, including x^a with a = 5e6. Each uses a
 * representation different from the implementation's methods and shares no code with src/.
 * Results are returned as doubles, carried as logarithms until the last step so that tails down
 * to 1e-300 keep their relative accuracy.
 */
import { atan, div, expToDouble, type Fixed, fromDouble, fromInteger, ln, mul, ONE, PI, sqrt, toDouble } from './fixedPoint';

/** Terms below this fraction of the running sum end a series (2^-130 ≈ 7e-40). */
const SERIES_TOLERANCE_SHIFT = 130n;
const MAX_TERMS = 3_000_000;

/** Bernoulli numbers B_0..B_2n as exact fractions, from Σ_{k≤m} C(m+1, k)·B_k = 0 (common practice, no source). */
function bernoulli(count: number): Array<[bigint, bigint]> {
  const gcd = (p: bigint, q: bigint): bigint => {
    let [u, v] = [p < 0n ? -p : p, q < 0n ? -q : q];
    while (v) [u, v] = [v, u % v];
    return u;
  };
  const b: Array<[bigint, bigint]> = [[1n, 1n]];
  for (let m = 1; m <= count; m++) {
    let num = 0n;
    let den = 1n;
    let binom = 1n; // C(m+1, k)
    for (let k = 0; k < m; k++) {
      const [bn, bd] = b[k]!;
      num = num * bd + binom * bn * den;
      den *= bd;
      const g = gcd(num, den);
      num /= g;
      den /= g;
      binom = (binom * BigInt(m + 1 - k)) / BigInt(k + 1);
    }
    // B_m = −Σ/(m+1)
    const n2 = -num;
    const d2 = den * BigInt(m + 1);
    const g = gcd(n2, d2);
    b.push([n2 / g, d2 / g]);
  }
  return b;
}

const BERNOULLI = bernoulli(40);
export const bernoulliForTest = (n: number): [bigint, bigint] => BERNOULLI[n]!;

const HALF_LN_2PI: Fixed = ln(2n * PI) / 2n;
const STIRLING_FROM = fromInteger(100);

/**
 * ln Γ(z) for z > 0: shifted to z ≥ 100, then Stirling's series with B_2..B_40 (A&S 6.1.40, from
 * memory), whose truncation error there is below 1e-66.
 */
export function lnGamma(z: Fixed): Fixed {
  let product = ONE;
  let w = z;
  while (w < STIRLING_FROM) {
    product = mul(product, w);
    w += ONE;
  }
  const lnW = ln(w);
  let series = 0n;
  const w2 = mul(w, w);
  let power = w; // w^(2k−1)
  for (let k = 1; k <= 20; k++) {
    const [bn, bd] = BERNOULLI[2 * k]!;
    series += div((bn << 320n) / (bd * BigInt(2 * k * (2 * k - 1))), power);
    power = mul(power, w2);
  }
  const stirling = mul(w - ONE / 2n, lnW) - w + HALF_LN_2PI + series;
  return product === ONE ? stirling : stirling - ln(product);
}

function lnBeta(a: Fixed, b: Fixed): Fixed {
  return lnGamma(a) + lnGamma(b) - lnGamma(a + b);
}

/**
 * Σ_{n≥0} Π_{k<n} ratio(k) for a ratio that decreases to a limit below 1 once it is below 1; stops
 * when the geometric bound on the remainder falls under 2^-130 of the sum.
 */
function positiveSeries(ratio: (k: number) => Fixed): Fixed {
  let term = ONE;
  let sum = ONE;
  for (let k = 0; k < MAX_TERMS; k++) {
    const r = ratio(k);
    term = mul(term, r);
    sum += term;
    if (r < ONE && mul(term, r) < mul(ONE - r, sum >> SERIES_TOLERANCE_SHIFT)) return sum;
  }
  throw new Error('series did not converge');
}

/** A point x in (0, 1) with its complement, both exact doubles (the caller's x + y must be 1). */
function exactPoint(x: number, y: number): { x: Fixed; y: Fixed } {
  const fx = fromDouble(x);
  const fy = fromDouble(y);
  if (fx + fy !== ONE) throw new Error(`x + y ≠ 1 exactly for x=${x}, y=${y}`);
  return { x: fx, y: fy };
}

/**
 * I_x(a, b) = x^a·y^b/(a·B(a, b)) · Σ_{n≥0} (a+b)_n/(a+1)_n · x^n (DLMF 8.17.8, from memory): all
 * terms positive, so it is accurate for the lower tail whenever it converges in reasonable time
 * (x not too close to 1).
 */
function lowerBySeries(a: Fixed, b: Fixed, x: Fixed, y: Fixed): number {
  const sum = positiveSeries((k) => div(mul(a + b + fromInteger(k), x), a + ONE + fromInteger(k)));
  return expToDouble(mul(a, ln(x)) + mul(b, ln(y)) - ln(a) - lnBeta(a, b) + ln(sum));
}

/** Both tails of the beta distribution at x by DLMF 8.17.8, each summed in its own variable. */
export function betaTailsBySeries(a: number, b: number, x: number, y: number): { lower: number; upper: number } {
  const p = exactPoint(x, y);
  const fa = fromDouble(a);
  const fb = fromDouble(b);
  return { lower: lowerBySeries(fa, fb, p.x, p.y), upper: lowerBySeries(fb, fa, p.y, p.x) };
}

/** The lower tail alone by DLMF 8.17.8 (for points where the upper one would be too slow). */
export function betaLowerBySeries(a: number, b: number, x: number, y: number): number {
  const p = exactPoint(x, y);
  return lowerBySeries(fromDouble(a), fromDouble(b), p.x, p.y);
}

function lnBinomial(n: number, k: number): Fixed {
  return lnGamma(fromInteger(n + 1)) - lnGamma(fromInteger(k + 1)) - lnGamma(fromInteger(n - k + 1));
}

/**
 * Both tails for integer a, b by the binomial identity I_x(a, b) = P(Binomial(a+b−1, x) ≥ a)
 * (A&S 26.5.24, from memory): the lower tail sums j = a..n of C(n, j)·x^j·y^(n−j) and the upper
 * is the same sum for (b, a, y), each a finite sum of positive terms.
 */
export function betaTailsByBinomial(a: number, b: number, x: number, y: number): { lower: number; upper: number } {
  return { lower: betaLowerByBinomial(a, b, x, y), upper: betaLowerByBinomial(b, a, y, x) };
}

/** The lower tail alone by the binomial identity: b terms, however large a is. */
export function betaLowerByBinomial(a: number, b: number, x: number, y: number): number {
  if (!Number.isInteger(a) || !Number.isInteger(b)) throw new Error('integer parameters only');
  const p = exactPoint(x, y);
  const n = a + b - 1;
  // Σ_{j=a}^{n}; the ratio of consecutive terms is exact in fixed point.
  let sum = ONE;
  let term = ONE;
  for (let j = a; j < n; j++) {
    term = mul(term, div(mul(fromInteger(n - j), p.x), mul(fromInteger(j + 1), p.y)));
    sum += term;
  }
  const lead = lnBinomial(n, a) + mul(fromInteger(a), ln(p.x)) + mul(fromInteger(n - a), ln(p.y));
  return expToDouble(lead + ln(sum));
}

/** Odds w = df1·f/df2 and the logs of x = 1/(1+w), y = w/(1+w), all from the exact inputs. */
function fPoint(f: number, df1: number, df2: number): { lnX: Fixed; lnY: Fixed; y: Fixed } {
  const w = div(mul(fromDouble(df1), fromDouble(f)), fromDouble(df2));
  const lnOnePlusW = ln(ONE + w);
  return { lnX: -lnOnePlusW, lnY: ln(w) - lnOnePlusW, y: div(w, ONE + w) };
}

/**
 * P(F > f) = I_x(ν2/2, ν1/2) by DLMF 8.17.8 at the exact point x = ν2/(ν2 + ν1·f), for any df. It
 * converges quickly where x is well below 1 (f > 1 and df1 not small against df2).
 */
export function fUpperBySeries(f: number, df1: number, df2: number): number {
  const { lnX, lnY, y } = fPoint(f, df1, df2);
  const a = fromDouble(df2) / 2n;
  const b = fromDouble(df1) / 2n;
  const x = ONE - y;
  const sum = positiveSeries((k) => div(mul(a + b + fromInteger(k), x), a + ONE + fromInteger(k)));
  return expToDouble(mul(a, lnX) + mul(b, lnY) - ln(a) - lnBeta(a, b) + ln(sum));
}

/**
 * P(F > f) for even df1 = 2m by Abramowitz & Stegun 26.6.4 (from memory):
 *   x^(ν2/2) · Σ_{k<m} C(ν2/2 + k − 1, k)·y^k,  x = ν2/(ν2 + ν1·f), y = 1 − x,
 * a finite sum of positive terms (the ratio of consecutive terms is (ν2/2 + k)/(k + 1)·y).
 */
export function fUpperEvenDf1(f: number, df1: number, df2: number): number {
  if (df1 % 2 !== 0) throw new Error('even df1 only');
  const { lnX, y } = fPoint(f, df1, df2);
  const a = fromDouble(df2) / 2n;
  let term = ONE;
  let sum = ONE;
  for (let k = 0; k < df1 / 2 - 1; k++) {
    term = div(mul(term, mul(a + fromInteger(k), y)), fromInteger(k + 1));
    sum += term;
  }
  return expToDouble(mul(a, lnX) + ln(sum));
}

/** P(F(2, ν) > f) = (1 + 2f/ν)^(−ν/2), the exact closed form (common practice, no source). */
export function fUpperTwoDf1(f: number, nu: number): number {
  const half = fromDouble(nu) / 2n;
  return expToDouble(-mul(half, ln(ONE + div(fromDouble(f), half))));
}

/**
 * P(|T| > t) for integer ν by Abramowitz & Stegun 26.7.3/26.7.4 (from memory). With θ = atan(t/√ν)
 * and z = cos²θ = ν/(ν + t²):
 *   ν even: A = sinθ·Σ_{k<ν/2} c_k z^k,                    c_k = (2k−1)!!/(2k)!!
 *   ν odd:  A = (2/π)·[θ + sinθ cosθ·Σ_{k<(ν−1)/2} d_k z^k], d_k = (2k)!!/(2k+1)!!
 * and P = 1 − A. Where that difference would cancel (P < 2^-100) the equivalent tail of the same
 * positive series is summed instead: Σ_{k≥0} c_k z^k = 1/sinθ and sinθ cosθ·Σ_{k≥0} d_k z^k = π/2 − θ.
 */
export function tTwoSided(t: number, nu: number): number {
  if (!Number.isInteger(nu) || nu < 1) throw new Error('integer ν ≥ 1 only');
  const even = nu % 2 === 0;
  const start = even ? nu / 2 : (nu - 1) / 2;
  const coefficientRatio = (k: number): Fixed =>
    even ? div(fromInteger(2 * k + 1), fromInteger(2 * k + 2)) : div(fromInteger(2 * k + 2), fromInteger(2 * k + 3));
  const ft = fromDouble(t);
  const fnu = fromInteger(nu);
  const t2 = mul(ft, ft);
  const r2 = fnu + t2; // ν + t²
  const z = div(fnu, r2);
  const r = sqrt(r2);
  const sinTheta = div(ft, r);
  const cosTheta = div(sqrt(fnu), r);

  let finiteSum = 0n;
  let coefficient = ONE;
  let zPower = ONE;
  for (let k = 0; k < start; k++) {
    finiteSum += mul(coefficient, zPower);
    coefficient = mul(coefficient, coefficientRatio(k));
    zPower = mul(zPower, z);
  }
  const a = even ? mul(sinTheta, finiteSum) : mul(div(2n * ONE, PI), atan(div(ft, sqrt(fnu))) + mul(mul(sinTheta, cosTheta), finiteSum));
  if (ONE - a > ONE >> 100n) return toDouble(ONE - a);

  // Tail: leading coefficient c_start (or d_start) times z^start, then the positive remainder.
  const tail = positiveSeries((k) => mul(coefficientRatio(start + k), z));
  const lnZ = ln(fnu) - ln(r2);
  const lnR = ln(r2) / 2n;
  const lnSin = ln(ft) - lnR;
  let lnP = ln(coefficient) + BigInt(start) * lnZ + ln(tail) + lnSin;
  if (!even) lnP += ln(div(2n * ONE, PI)) + ln(sqrt(fnu)) - lnR;
  return expToDouble(lnP);
}
