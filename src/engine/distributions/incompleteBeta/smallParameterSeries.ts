import { digamma, EULER_GAMMA } from './gammaFunctions';
import type { BetaPoint } from './point';

/**
 * I_x(a, b) for a tiny b (b < eps·min(1, a)) and x ≤ ½ (Didonato & Morris 1992, ACM TOMS 708,
 * FPSER). There 1/B(a, b) = b to within eps, and the power series loses its (1 − b)_j factors:
 *   I_x(a, b) ≈ (b/a)·x^a·[1 + a·Σ_{j≥1} x^j/(a + j)].
 */
export function smallBSeries(a: number, b: number, p: BetaPoint, eps: number): number {
  // For a ≤ 1e-3·eps, x^a is 1 to within eps.
  const power = a > 1e-3 * eps ? Math.exp(a * p.logX) : 1;
  if (power === 0) return 0;
  const tolerance = eps / a;
  let xPower = p.x;
  let sum = 0;
  for (let j = 1; ; j++) {
    const term = xPower / (a + j);
    sum += term;
    if (Math.abs(term) <= tolerance) break;
    xPower *= p.x;
  }
  return (b / a) * power * (1 + a * sum);
}

/**
 * 1 − I_x(a, b) = I_y(b, a) for a tiny a (a ≤ eps·min(1, b)), b·x ≤ 1 and x ≤ ½ (Didonato &
 * Morris 1992, ACM TOMS 708, APSER). To first order in a,
 *   1 − I_x(a, b) = −a·[log x + ψ(b) + γ + Σ_{j≥1} (1−b)(2−b)…(j−b)/j! · x^j/j];
 * for b beyond 2e-2/eps, ψ(b) is log b to within eps and log(b·x) avoids adding two large terms.
 */
export function smallASeries(a: number, b: number, p: BetaPoint, eps: number): number {
  const bx = b * p.x;
  let term = p.x - bx; // (1 − b)·x, the j = 1 term
  const head = b * eps <= 2e-2 ? p.logX + digamma(b) + EULER_GAMMA + term : Math.log(bx) + EULER_GAMMA + term;
  const tolerance = 5 * eps * Math.abs(head);
  let sum = 0;
  for (let j = 2; ; j++) {
    term *= p.x - bx / j;
    const contribution = term / j;
    sum += contribution;
    if (Math.abs(contribution) <= tolerance) break;
  }
  return -a * (head + sum);
}
