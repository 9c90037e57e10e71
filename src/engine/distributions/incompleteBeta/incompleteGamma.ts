import { reciprocalGammaOnePlusMinusOne } from './gammaFunctions';

/**
 * The regularized upper incomplete gamma ratio Q(a, x) = Γ(a, x)/Γ(a) for 0 < a ≤ 1, to relative
 * accuracy (Didonato & Morris 1992, ACM TOMS 708, GRAT1; the large-a expansion needs only Q).
 * `logR` is log(x^a·e^(−x)/Γ(a)), which the caller has already formed more accurately than this
 * function could.
 *
 * For x < 1.1, P(a, x) = x^a/Γ(a + 1)·(1 − J) with J = a·x·Σ_{n≥0} (−x)^n/((a+n+1)·(n+1)!), and
 * when P is near 1 (a small against 1/|log x|) Q is formed as (x^a·J − (x^a − 1))·g − h with
 * h = 1/Γ(1+a) − 1, g = 1 + h, so that its leading terms cancel exactly in the algebra, not in
 * floating point; elsewhere P is not near 1 and Q = 1 − P loses little. For x ≥ 1.1,
 * Q = r·(Legendre's continued fraction). The paper's shortcut through erf/erfc at a = ½ is not
 * taken: the general branches are as accurate there.
 */
export function upperIncompleteGamma(a: number, x: number, logR: number, eps: number): number {
  if (x < 1.1) {
    // J by its alternating series, written as in the paper around the sum of the terms from x³ on.
    let n = 3;
    let c = x;
    let sum = x / (a + 3);
    const tolerance = (0.1 * eps) / (a + 1);
    for (;;) {
      n += 1;
      c = (-c * x) / n;
      const term = c / (a + n);
      sum += term;
      if (Math.abs(term) <= tolerance) break;
    }
    const j = a * x * ((sum / 6 - 0.5 / (a + 2)) * x + 1 / (a + 1));
    const z = a * Math.log(x);
    const h = reciprocalGammaOnePlusMinusOne(a);
    const g = 1 + h;
    const pNearOne = x >= 0.25 ? a < x / 2.59 : z > -0.13394;
    if (pNearOne) {
      const l = Math.expm1(z); // x^a − 1
      return Math.max(0, ((1 + l) * j - l) * g - h);
    }
    return 1 - Math.exp(z) * g * (1 - j);
  }
  // Q/r = 1/(x + (1−a)/(1 + 1/(x + (2−a)/(1 + 2/(x + …))))) by its convergents, two steps at a time.
  let aOdd = 1;
  let bOdd = x;
  let aEven = 1;
  let bEven = x + (1 - a);
  let value: number;
  for (let c = 1; ; c++) {
    aOdd = x * aEven + c * aOdd;
    bOdd = x * bEven + c * bOdd;
    const odd = aOdd / bOdd;
    aEven = aOdd + (c + 1 - a) * aEven;
    bEven = bOdd + (c + 1 - a) * bEven;
    value = aEven / bEven;
    if (Math.abs(value - odd) < eps * value) break;
    // Rescale so the convergents' numerators and denominators cannot overflow.
    aOdd /= bEven;
    bOdd /= bEven;
    aEven /= bEven;
    bEven = 1;
  }
  return Math.exp(logR) * value;
}
