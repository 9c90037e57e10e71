import { logGamma } from './gammaFunctions';
import { upperIncompleteGamma } from './incompleteGamma';
import { logGammaRatio } from './logBeta';
import type { BetaPoint } from './point';

/** The expansion is asymptotic; the paper stops after this many terms. */
const MAX_TERMS = 30;

/**
 * `partial` + I_x(a, b) for a ≥ 15 and b ≤ 1, by the asymptotic expansion of Didonato & Morris
 * 1992 (ACM TOMS 708, BGRAT). `partial` is what the caller has already summed of the result (by
 * the upward recurrence); it only enters the stopping rule, which is relative to the total.
 *
 * With t = e^(−s), I_x(a, b) = 1/B(a, b) · ∫_{s₀}^∞ e^(−νs)·s^(b−1)·φ(s) ds, where s₀ = −log x,
 * ν = a + (b−1)/2 and φ(s) = (sinh(s/2)/(s/2))^(b−1) = Σ dₙ·(s/2)^(2n) is even in s. Term by term
 * this gives
 *   I_x(a, b) = Γ(a+b)/(Γ(a)·ν^b) · Σ dₙ · Γ(b + 2n, z)/(Γ(b)·(2ν)^(2n)),  z = ν·s₀,
 * whose n = 0 term is the incomplete gamma Q(b, z). The dₙ follow from the power series of
 * sinh(u)/u raised to the power b − 1; the incomplete gamma terms from
 * Γ(c + 2, z) = c(c + 1)·Γ(c, z) + z^c·e^(−z)·(c + 1 + z).
 * Only log x enters, never 1 − x, so x within 1e-7 of 1 (a = 5e6) costs nothing.
 */
export function largeAExpansion(a: number, b: number, p: BetaPoint, partial: number, eps: number): number {
  const bMinus1 = b - 1;
  const nu = a + 0.5 * bMinus1;
  const logX = p.logX;
  const z = -nu * logX;
  // r = z^b·e^(−z)/Γ(b) and the prefactor u = r·Γ(a+b)/(Γ(a)·ν^b).
  const logR = b * Math.log(z) - z - logGamma(b);
  const r = Math.exp(logR);
  // u/r = 1 + O(1/a²): once r underflows, so does this part of the result.
  if (r === 0) return partial;
  const u = Math.exp(logR - logGammaRatio(b, a) - b * Math.log(nu));
  const q = upperIncompleteGamma(b, z, logR, eps);

  const scaledPartial = partial / u;
  const v = 0.25 / (nu * nu); // 1/(2ν)²
  const halfLogXSquared = 0.25 * logX * logX; // (s₀/2)²
  let j = q / r; // Γ(b + 2n, z)/(Γ(b)·(2ν)^(2n)·r)
  let sum = j;
  let zPower = 1; // (s₀/2)^(2n) = z^(2n)/(2ν)^(2n)
  const sinhCoefficients: number[] = [1]; // cₙ = 1/(2n+1)!, the coefficients of sinh(u)/u in u²
  const d: number[] = [1];
  for (let n = 1; n <= MAX_TERMS; n++) {
    const c = b + 2 * (n - 1);
    j = (c * (c + 1) * j + (z + c + 1) * zPower) * v;
    zPower *= halfLogXSquared;
    sinhCoefficients[n] = sinhCoefficients[n - 1]! / (2 * n * (2 * n + 1));
    // Power of a series (J. C. P. Miller's recurrence): dₙ = (b−1)·cₙ + (1/n)·Σ_{i<n} (i·b − n)·cᵢ·d_{n−i}.
    let s = 0;
    for (let i = 1; i < n; i++) s += (i * b - n) * sinhCoefficients[i]! * d[n - i]!;
    d[n] = bMinus1 * sinhCoefficients[n]! + s / n;
    const term = d[n]! * j;
    sum += term;
    if (Math.abs(term) <= eps * (sum + scaledPartial)) break;
  }
  return partial + u * sum;
}
