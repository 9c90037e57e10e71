import erfc from '@stdlib/math-base-special-erfc';

/**
 * log(1 + u) − u without the cancellation of the direct form near u = 0 (the paper's RLOG1 is its
 * negative). The series in s = u/(2 + u) (from log(1+u) = 2·atanh(s)) converges like s² ≤ 1/9 on
 * |u| ≤ ½, and all its terms share a sign so nothing cancels.
 */
export function log1pmx(u: number): number {
  if (Math.abs(u) > 0.5) return Math.log1p(u) - u;
  const s = u / (2 + u);
  const s2 = s * s;
  let power = s * s2;
  let sum = 0;
  for (let k = 3; k < 80; k += 2) {
    const term = power / k;
    sum += term;
    if (Math.abs(term) <= 1e-17 * Math.abs(sum)) break;
    power *= s2;
  }
  return -u * s + 2 * sum;
}

/** Below this, exp(log) is subnormal and a factor multiplied onto it would lose digits. */
const LOG_SMALLEST_NORMAL = -708;

/**
 * e^logLead · factor for factor > 0. Multiplying keeps the exponent exact (adding log(factor) to a
 * logLead of −578 would round it by up to 5.7e-14, a relative error of the same size); only where
 * e^logLead would be subnormal is the factor moved into the exponent.
 */
export function expTimes(logLead: number, factor: number): number {
  return logLead > LOG_SMALLEST_NORMAL ? Math.exp(logLead) * factor : Math.exp(logLead + Math.log(factor));
}

const INV_SQRT_PI = 0.5641895835477563; // 1/√π

/**
 * e^(z²)·erfc(z) for z ≥ 0 (the paper's ERFC1 with its scaling flag set). Below 2 the product is
 * formed directly (z² ≤ 4, so rounding z² costs at most 4ε); from 2 up, where erfc would
 * eventually underflow, Laplace's continued fraction
 *   √π·e^(z²)·erfc(z) = 1/(z + (1/2)/(z + 1/(z + (3/2)/(z + …))))   (A&S 7.1.14, from memory)
 * converges in under 60 terms, evaluated by the modified Lentz method.
 */
export function erfcScaled(z: number): number {
  if (z < 2) return Math.exp(z * z) * erfc(z);
  let value = z;
  let c = z;
  let d = 0;
  for (let n = 1; n < 200; n++) {
    d = 1 / (z + (n / 2) * d);
    c = z + n / 2 / c;
    const delta = c * d;
    value *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return INV_SQRT_PI / value;
}
