import { logMinTimesBeta } from './logBeta';
import type { BetaPoint } from './point';

/**
 * I_x(a, b) by its power series in x (Didonato & Morris 1992, ACM TOMS 708, BPSER):
 *   I_x(a, b) = x^a/(a·B(a, b)) · [1 + a·Σ_{j≥1} (1−b)(2−b)…(j−b)/j! · x^j/(a + j)],
 * used where it converges quickly: b ≤ 1 or b·x ≤ 0.7.
 */
export function powerSeries(a: number, b: number, p: BetaPoint, eps: number): number {
  // log(a·B(a, b)) = log(m·B) + log(a/m), m = min(a, b); see logMinTimesBeta for why.
  const logLead = a * p.logX - logMinTimesBeta(a, b) - Math.log(a / Math.min(a, b));
  const lead = Math.exp(logLead);
  if (lead === 0 || a <= 0.1 * eps) return lead;
  const tolerance = eps / a;
  let coefficient = 1;
  let sum = 0;
  for (let j = 1; ; j++) {
    coefficient *= (1 - b / j) * p.x;
    const term = coefficient / (a + j);
    sum += term;
    if (Math.abs(term) <= tolerance) break;
  }
  return lead * (1 + a * sum);
}
