import { HALF_LOG_2PI, logGammaOnePlus, STIRLING_MIN, stirlingCorrection } from './gammaFunctions';

/**
 * ω(a) + ω(b) − ω(a + b) for a, b ≥ STIRLING_MIN, ω the Stirling remainder: the correction that
 * turns Stirling's approximation of B(a, b) into the exact value (the paper's BCORR).
 */
export function betaStirlingCorrection(a: number, b: number): number {
  return stirlingCorrection(a) + stirlingCorrection(b) - stirlingCorrection(a + b);
}

/**
 * log(Γ(b)/Γ(a + b)) for b ≥ STIRLING_MIN (the paper's ALGDIV). Written as
 *   −[(a + b − ½)·log(1 + a/b) + a·(log b − 1) + ω(a + b) − ω(b)]
 * so that the b·log b parts of the two log Γ cancel analytically instead of numerically.
 */
export function logGammaRatio(a: number, b: number): number {
  return -((a + b - 0.5) * Math.log1p(a / b) + a * (Math.log(b) - 1) + stirlingCorrection(a + b) - stirlingCorrection(b));
}

/**
 * log(m·B(a, b)) with m = min(a, b), after the paper's BETALN split into cases. Scaling by the
 * smaller parameter matters when it is tiny: B(a, b) ≈ 1/m there, and log B would carry a large
 * log(1/m) that callers dividing by m would cancel again, losing absolute accuracy.
 */
export function logMinTimesBeta(a: number, b: number): number {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  if (lo >= STIRLING_MIN) {
    // Stirling for all three log Γ: −½·log hi + ½·log 2π + (lo − ½)·log(lo/(lo + hi)) − hi·log(1 + lo/hi) + BCORR.
    return Math.log(lo) - 0.5 * Math.log(hi) + HALF_LOG_2PI + betaStirlingCorrection(lo, hi) + (lo - 0.5) * Math.log(lo / (lo + hi)) - hi * Math.log1p(lo / hi);
  }
  // m·Γ(m) = Γ(1 + m).
  if (hi >= STIRLING_MIN) return logGammaOnePlus(lo) + logGammaRatio(lo, hi);
  // m·B(m, h) = Γ(1 + m)·Γ(1 + h)·(1 + m/h)/Γ(1 + m + h).
  return logGammaOnePlus(lo) + logGammaOnePlus(hi) - logGammaOnePlus(lo + hi) + Math.log1p(lo / hi);
}

/** log B(a, b). */
export function logBeta(a: number, b: number): number {
  return logMinTimesBeta(a, b) - Math.log(Math.min(a, b));
}
