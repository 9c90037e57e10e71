import { erfcScaled, log1pmx } from './elementary';
import { betaStirlingCorrection } from './logBeta';

/** Number of coefficients dₙ the expansion may use (the paper's NUM + 1). */
const MAX_ORDER = 21;
const TWO_OVER_SQRT_PI = 1.1283791670955126; // 2/√π
const INV_TWO_SQRT_2 = 0.3535533905932738; // 2^(−3/2)

/**
 * I_x(a, b) for a, b both large and x near the mean (0 ≤ λ ≤ 0.03·min(a, b)), by the asymptotic
 * expansion of Didonato & Morris 1992 (ACM TOMS 708, BASYM). Only λ = a − (a+b)·x is used, so the
 * caller's λ carries all the information about the point.
 *
 * With m = min(a, b), h = m/max(a, b), w₀ = 1/√(m(1 + h)) and v = μ/m for the integration variable
 * μ = a − (a+b)t, the exponent −log(t^a(1−t)^b / (x₀^a y₀^b)) is f(v) = v²/(2w₀²)·A(v) with
 *   A(v) = 1 + Σ_{j≥1} a⁰ⱼ vʲ,  a⁰ⱼ = 2(1 + (−1)ʲ h^(j+1)) / ((j+2)(1+h))  for a < b,
 * (and the mirror image for a ≥ b), which the recurrences below produce with r₀ = 1/(1+h) and
 * r₁ = (b − a)/max(a, b). Substituting ζ² = f turns the integral into ∫_{ζ₀}^∞ e^(−ζ²)·G(√2·w₀·ζ) dζ
 * with ζ₀ = √f(λ) and G(ρ) = ρ/v(ρ) = Σ dₙρⁿ: the series of v(ρ) comes from Lagrange inversion
 * (cᵢ = [vⁱ]A^(−(i+1)/2)/(i+1)) and dₙ from its reciprocal. The remaining integrals
 * Jₙ ∝ ∫_{ζ₀}^∞ ζⁿ e^(−ζ²) dζ obey a two-term recurrence started from erfc(ζ₀), so
 *   I_x(a, b) = (2/√π)·e^(−f)·e^(−BCORR(a,b)) · Σ dₙ·w₀ⁿ·Jₙ.
 */
export function asymptoticExpansion(a: number, b: number, lambda: number, eps: number): number {
  const smallerFirst = a < b;
  const h = smallerFirst ? a / b : b / a;
  const r0 = 1 / (1 + h);
  const r1 = (b - a) / (smallerFirst ? b : a);
  const w0 = 1 / Math.sqrt((smallerFirst ? a : b) * (1 + h));

  const f = -(a * log1pmx(-lambda / a) + b * log1pmx(lambda / b));
  const t = Math.exp(-f);
  if (t === 0) return 0;
  const z0 = Math.sqrt(f);
  const z2 = f + f;

  const a0: number[] = [0, (2 / 3) * r1];
  const c: number[] = [0, -0.5 * a0[1]!];
  const d: number[] = [0, -c[1]!];
  const b0: number[] = [];
  let j0 = (0.5 / TWO_OVER_SQRT_PI) * erfcScaled(z0);
  let j1 = INV_TWO_SQRT_2;
  let sum = j0 + d[1]! * w0 * j1;

  let s = 1; // 1 + h² + … + hⁿ
  const h2 = h * h;
  let hn = 1; // hⁿ
  let w = w0; // w₀ⁿ
  let zEven = Math.SQRT2 * z0; // (√2·ζ₀)·(2ζ₀²)^k, feeds J of even order
  let zOdd = z2; // (2ζ₀²)^(k+1), feeds J of odd order
  for (let n = 2; n < MAX_ORDER; n += 2) {
    hn *= h2;
    a0[n] = (2 * r0 * (1 + h * hn)) / (n + 2);
    s += hn;
    a0[n + 1] = (2 * r1 * s) / (n + 3);
    for (let i = n; i <= n + 1; i++) {
      // b⁰ = coefficients of A^r, r = −(i+1)/2 (power of a series by Miller's recurrence).
      const r = -0.5 * (i + 1);
      b0[1] = r * a0[1]!;
      for (let m = 2; m <= i; m++) {
        let bsum = 0;
        for (let k = 1; k < m; k++) bsum += (k * r - (m - k)) * a0[k]! * b0[m - k]!;
        b0[m] = r * a0[m]! + bsum / m;
      }
      c[i] = b0[i]! / (i + 1);
      let dsum = 0;
      for (let k = 1; k < i; k++) dsum += d[i - k]! * c[k]!;
      d[i] = -(dsum + c[i]!);
    }
    j0 = INV_TWO_SQRT_2 * zEven + (n - 1) * j0;
    j1 = INV_TWO_SQRT_2 * zOdd + n * j1;
    zEven *= z2;
    zOdd *= z2;
    w *= w0;
    const t0 = d[n]! * w * j0;
    w *= w0;
    const t1 = d[n + 1]! * w * j1;
    sum += t0 + t1;
    if (Math.abs(t0) + Math.abs(t1) <= eps * sum) break;
  }
  return TWO_OVER_SQRT_PI * t * Math.exp(-betaStirlingCorrection(a, b)) * sum;
}
