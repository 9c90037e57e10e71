/**
 * log Γ and its relatives, accurate enough that the incomplete beta built on them stays within a
 * few units of 1e-15 relative. The incomplete beta needs 1/Γ(1 + a) − 1 and log Γ(1 + a) to full
 * *relative* accuracy for tiny a (its small-parameter branches are otherwise lost to cancellation),
 * which is why log Γ(1 + a) is summed from its Taylor series rather than shifted up to Stirling's
 * range.
 */

export const HALF_LOG_2PI = 0.9189385332046728; // ½·log(2π)
export const EULER_GAMMA = 0.5772156649015329;

/** Stirling's series below is used from this argument up (Didonato & Morris 1992 use 8 too). */
export const STIRLING_MIN = 8;

/**
 * ω(z) = log Γ(z) − [(z − ½)·log z − z + ½·log 2π] for z ≥ STIRLING_MIN, from the Bernoulli-number
 * series B₂ₖ / (2k(2k − 1)·z^(2k−1)), k = 1..8; the first omitted term is below 1e-16 at z = 8.
 */
export function stirlingCorrection(z: number): number {
  const r = 1 / z;
  const r2 = r * r;
  return r * (1 / 12 + r2 * (-1 / 360 + r2 * (1 / 1260 + r2 * (-1 / 1680 + r2 * (1 / 1188 + r2 * (-691 / 360360 + r2 * (1 / 156 + r2 * (-3617 / 122400))))))));
}

function stirlingLogGamma(z: number): number {
  return (z - 0.5) * Math.log(z) - z + HALF_LOG_2PI + stirlingCorrection(z);
}

/**
 * ζ(k) − 1 for k = 2..MAX_ZETA by the Euler–Maclaurin formula with N = 20 and B₂..B₁₂:
 *   Σ_{n=2}^{N−1} n^−k + N^(1−k)/(k−1) + N^−k/2 + Σ_j B₂ⱼ/(2j)!·k(k+1)…(k+2j−2)·N^(1−k−2j),
 * whose first omitted term is below 1e-19 relative for every k here.
 */
const MAX_ZETA = 30;
const ZETA_MINUS_ONE: readonly number[] = (() => {
  const n = 20;
  const bernoulliOverFactorial = [1 / 12, -1 / 720, 1 / 30240, -1 / 1209600, 1 / 47900160, -691 / 1307674368000];
  const out: number[] = [];
  for (let k = 2; k <= MAX_ZETA; k++) {
    let sum = 0;
    for (let m = n - 1; m >= 2; m--) sum += m ** -k;
    sum += n ** (1 - k) / (k - 1) + n ** -k / 2;
    let rising = k; // k(k+1)…(k+2j−2)
    for (let j = 1; j <= bernoulliOverFactorial.length; j++) {
      sum += bernoulliOverFactorial[j - 1]! * rising * n ** (1 - k - 2 * j);
      rising *= (k + 2 * j - 1) * (k + 2 * j);
    }
    out[k] = sum;
  }
  return out;
})();

/**
 * log Γ(1 + a) for |a| ≤ ½ from log Γ(1 + a) = −log(1 + a) + a(1 − γ) + Σ_{k≥2} (−1)^k (ζ(k) − 1) a^k/k
 * (A&S 6.1.33 with the log(1 + a) series split off, from memory). The terms shrink like (a/2)^k,
 * and near a = 0 nothing cancels beyond a factor of two, so the result is relatively accurate.
 */
function logGammaOnePlusSeries(a: number): number {
  let sum = 0;
  let power = -a; // (−a)^k
  for (let k = 2; k <= MAX_ZETA; k++) {
    power *= -a;
    sum += (ZETA_MINUS_ONE[k]! * power) / k;
  }
  return -Math.log1p(a) + a * (1 - EULER_GAMMA) + sum;
}

/**
 * log Γ(1 + a) for a > −1, to full relative accuracy near its zeros a = 0 and a = 1 (the paper's
 * GAMLN1 covers −0.2 ≤ a ≤ 1.25; the recurrences here extend it). Above ½ the argument is stepped
 * down with Γ(1 + a) = a·Γ(a); from STIRLING_MIN on, Stirling's series takes over.
 */
export function logGammaOnePlus(a: number): number {
  if (a < -0.5) return logGammaOnePlusSeries(a + 1) - Math.log1p(a);
  if (a <= 0.5) return logGammaOnePlusSeries(a);
  if (a + 1 >= STIRLING_MIN) return stirlingLogGamma(a + 1);
  let product = 1;
  let w = a;
  while (w > 0.5) {
    product *= w;
    w -= 1;
  }
  return Math.log(product) + logGammaOnePlusSeries(w);
}

/** 1/Γ(1 + a) − 1 to full relative accuracy, for a > −1 (the paper's GAM1). */
export function reciprocalGammaOnePlusMinusOne(a: number): number {
  return Math.expm1(-logGammaOnePlus(a));
}

/** log Γ(z) for z > 0. */
export function logGamma(z: number): number {
  if (Number.isNaN(z) || z <= 0) return Number.NaN;
  if (z === Number.POSITIVE_INFINITY) return Number.POSITIVE_INFINITY;
  if (z >= STIRLING_MIN) return stirlingLogGamma(z);
  return z < 0.5 ? logGammaOnePlus(z) - Math.log(z) : logGammaOnePlus(z - 1);
}

/**
 * ψ(z) = d log Γ(z)/dz for z > 0 (the paper's PSI, needed by the tiny-a series): stepped up with
 * ψ(z) = ψ(z + 1) − 1/z to z ≥ 10, then the asymptotic series
 * log z − 1/(2z) − Σ B₂ₖ/(2k·z^2k), k = 1..7 (A&S 6.3.18, from memory), good to 1e-17 there.
 */
export function digamma(z: number): number {
  let shift = 0;
  let w = z;
  while (w < 10) {
    shift -= 1 / w;
    w += 1;
  }
  const r2 = 1 / (w * w);
  const series = r2 * (1 / 12 + r2 * (-1 / 120 + r2 * (1 / 252 + r2 * (-1 / 240 + r2 * (1 / 132 + r2 * (-691 / 32760 + r2 / 12))))));
  return shift + Math.log(w) - 0.5 / w - series;
}
