import { normalQuantile, normalUpperTail } from '../distributions/normal';

/**
 * Shapiro & Wilk's W (Biometrika 52, 1965) with Royston's approximations for its coefficients and
 * its null distribution: Royston, "Remark AS R94: A remark on algorithm AS 181: the W-test for
 * normality", Applied Statistics 44 (1995) 547–551, valid for 3 ≤ n ≤ 5000.
 *
 * W = (Σ aᵢx₍ᵢ₎)² / Σ(xᵢ − x̄)² over the ordered sample. The coefficients a start from the
 * expected normal order statistics, approximated by mᵢ = Φ⁻¹((i − 3/8)/(n + 1/4)); the two most
 * extreme (one for n ≤ 5) are polynomials in u = 1/√n, and the rest are mᵢ rescaled so that
 * Σaᵢ² = 1. The p-value is the upper tail of a normal approximation to a transform of 1 − W:
 * log(1 − W) for n ≥ 12, and −log(γ − log(1 − W)) for 4 ≤ n ≤ 11; for n = 3 the null
 * distribution is known exactly, P = (6/π)(asin √W − asin √(3/4)).
 *
 * Meant for the raw residuals of a fit. They are not independent (their covariance is σ²(I − H)),
 * so the p-value is a guide, not an exact size; and a large n flags departures too small to matter.
 */
export interface ShapiroWilk {
  /** W, in [0, 1]; 1 for a sample that lies exactly on the normal scores. */
  statistic: number;
  /** P(W ≤ w) under normality. */
  pValue: number;
  n: number;
  undefinedBecause: ShapiroWilkReason | undefined;
}

/**
 * - too-few: fewer than 3 values.
 * - too-many: more than 5000 values, beyond the range of Royston's approximations.
 * - constant: every value is the same, so W is 0/0.
 */
export type ShapiroWilkReason = 'too-few' | 'too-many' | 'constant';

export const SHAPIRO_WILK_MIN_N = 3;
export const SHAPIRO_WILK_MAX_N = 5000;

// Royston (1995): coefficients of the polynomials, lowest power first.
/** a₍ₙ₎ − mₙ/‖m‖ as a polynomial in u = 1/√n. */
const LARGEST_COEFFICIENT = [0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056];
/** a₍ₙ₋₁₎ − mₙ₋₁/‖m‖ in u (n > 5). */
const SECOND_COEFFICIENT = [0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];
/** 4 ≤ n ≤ 11: γ, the mean and the log standard deviation, polynomials in n. */
const SMALL_GAMMA = [-2.273, 0.459];
const SMALL_MEAN = [0.544, -0.39978, 0.025054, -6.714e-4];
const SMALL_LOG_SD = [1.3822, -0.77857, 0.062767, -0.0020322];
/** n ≥ 12: the mean and the log standard deviation of log(1 − W), polynomials in log n. */
const LARGE_MEAN = [-1.5861, -0.31082, -0.083751, 0.0038915];
const LARGE_LOG_SD = [-0.4803, -0.082676, 0.0030302];

function polynomial(coefficients: readonly number[], x: number): number {
  let sum = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) sum = sum * x + coefficients[k];
  return sum;
}

export function shapiroWilk(values: ArrayLike<number>): ShapiroWilk {
  const n = values.length;
  const nan = Number.NaN;
  if (n < SHAPIRO_WILK_MIN_N) return { statistic: nan, pValue: nan, n, undefinedBecause: 'too-few' };
  if (n > SHAPIRO_WILK_MAX_N) return { statistic: nan, pValue: nan, n, undefinedBecause: 'too-many' };
  const x = Array.from(values).sort((a, b) => a - b);
  const range = x[n - 1] - x[0];
  if (!(range > 0)) return { statistic: nan, pValue: nan, n, undefinedBecause: 'constant' };

  const a = coefficients(n);
  const oneMinusW = oneMinusSquaredCorrelation(a, x, range);
  const statistic = 1 - oneMinusW;
  return { statistic, pValue: pValueOf(n, statistic, oneMinusW), n, undefinedBecause: undefined };
}

/** The coefficients aᵢ for the ordered sample, antisymmetric (aₙ₊₁₋ᵢ = −aᵢ) with Σaᵢ² = 1. */
function coefficients(n: number): Float64Array {
  const a = new Float64Array(n);
  if (n === 3) {
    a[0] = -Math.SQRT1_2;
    a[2] = Math.SQRT1_2;
    return a;
  }
  const m = Float64Array.from({ length: n }, (_, i) => normalQuantile((i + 1 - 0.375) / (n + 0.25)));
  let sumSquares = 0;
  for (const mi of m) sumSquares += mi * mi;
  const norm = Math.sqrt(sumSquares);
  const u = 1 / Math.sqrt(n);
  const last = polynomial(LARGEST_COEFFICIENT, u) + m[n - 1] / norm;
  let fixed = 1;
  let rest = sumSquares - 2 * m[n - 1] ** 2;
  a[n - 1] = last;
  let polynomialCount = 1;
  if (n > 5) {
    const second = polynomial(SECOND_COEFFICIENT, u) + m[n - 2] / norm;
    a[n - 2] = second;
    rest -= 2 * m[n - 2] ** 2;
    fixed -= 2 * second * second;
    polynomialCount = 2;
  }
  fixed -= 2 * last * last;
  // The middle coefficients share what is left of Σaᵢ² = 1 in proportion to mᵢ².
  const scale = Math.sqrt(rest / fixed);
  for (let i = polynomialCount; i < n - polynomialCount; i++) a[i] = m[i] / scale;
  for (let k = 1; k <= polynomialCount; k++) a[k - 1] = -a[n - k];
  return a;
}

/**
 * 1 − W as 1 − r², r the correlation of a and x: Σa = 0 and Σa² = 1 make r² equal to W, and
 * (√(SaSx) − Sax)(√(SaSx) + Sax)/(SaSx) keeps the digits of 1 − W when W is within 1e-10 of 1,
 * which large normal samples reach. x is divided by its range first so that the sums are of order 1.
 */
function oneMinusSquaredCorrelation(a: Float64Array, x: readonly number[], range: number): number {
  const n = x.length;
  let meanA = 0;
  let meanX = 0;
  for (let i = 0; i < n; i++) {
    meanA += a[i];
    meanX += x[i] / range;
  }
  meanA /= n;
  meanX /= n;
  let saa = 0;
  let sxx = 0;
  let sax = 0;
  for (let i = 0; i < n; i++) {
    const da = a[i] - meanA;
    const dx = x[i] / range - meanX;
    saa += da * da;
    sxx += dx * dx;
    sax += da * dx;
  }
  const root = Math.sqrt(saa * sxx);
  return Math.max(0, ((root - sax) * (root + sax)) / (saa * sxx));
}

function pValueOf(n: number, w: number, oneMinusW: number): number {
  if (n === 3) {
    // W is at least 3/4 for n = 3; rounding may put it a hair below.
    const p = (6 / Math.PI) * (Math.asin(Math.sqrt(w)) - Math.asin(Math.sqrt(0.75)));
    return Math.min(1, Math.max(0, p));
  }
  if (oneMinusW === 0) return 1;
  const y = Math.log(oneMinusW);
  if (n <= 11) {
    const gamma = polynomial(SMALL_GAMMA, n);
    // log(1 − W) at or beyond γ lies outside the transform's range: W is smaller than any the
    // approximation covers, and the p-value is as small as it can say.
    if (y >= gamma) return 0;
    const transformed = -Math.log(gamma - y);
    return normalUpperTail((transformed - polynomial(SMALL_MEAN, n)) / Math.exp(polynomial(SMALL_LOG_SD, n)));
  }
  const logN = Math.log(n);
  return normalUpperTail((y - polynomial(LARGE_MEAN, logN)) / Math.exp(polynomial(LARGE_LOG_SD, logN)));
}
