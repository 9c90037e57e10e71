/**
 * The distribution of Q = Σ wᵢzᵢ², zᵢ independent standard normal: P(Q < 0) and P(Q > 0), each
 * computed directly, so that a tail of 1e-20 keeps its relative accuracy (never 1 − the other).
 *
 * Method: numerical inversion of the moment generating function M(s) = E[e^{sQ}] =
 * Πᵢ(1 − 2swᵢ)^{−1/2} along a vertical line Re s = c through the saddlepoint (Imhof 1961 inverts
 * the characteristic function along the imaginary axis, c = 0; moving the line to the saddlepoint
 * is Rice's, "Distribution of quadratic forms in normal random variables — evaluation by
 * numerical integration", SIAM J. Sci. Stat. Comput. 1, 1980, and Helstrom's). By the Bromwich
 * inversion of the Laplace transform, for c < 0 inside the strip where M converges,
 *   P(Q < 0) = −(1/π) ∫₀^∞ Re[M(c + iv)/(c + iv)] dv,
 * and for c > 0 the same integral without the minus sign is P(Q > 0). Imhof's form is ½ minus an
 * integral, so a small tail is the difference of two numbers near ½ and has only absolute accuracy;
 * on the line through the saddlepoint of M(s)/s the integrand is largest at v = 0, where it is of
 * the size of the tail itself, so the tail comes out with relative accuracy.
 *
 * Quadrature: v = D·sinh t with D the distance from c to the nearest singularity (the pole of 1/s
 * at 0 or a branch point 1/(2wᵢ)). All singularities lie on the real s axis, so in t the integrand
 * is analytic in the strip |Im t| < π/2 and the trapezoidal rule converges like e^{−π²/h}; the
 * sinh turns the algebraic decay |v|^{−m/2−1} into an exponential one. The step is halved until two
 * successive sums agree to ACCURACY.
 */

export interface QuadraticFormTails {
  /** P(Σ wᵢzᵢ² < 0). */
  below: number;
  /** P(Σ wᵢzᵢ² > 0). */
  above: number;
}

/** Relative agreement of two successive trapezoidal sums at which the finer one is accepted. */
const ACCURACY = 1e-11;
/** A term whose bound is below this fraction of the running sum ends the sum. */
const TRUNCATION = 1e-18;
/** Starting step in t, and the smallest step tried. */
const FIRST_STEP = 0.5;
const SMALLEST_STEP = 1 / 256;

/**
 * Both tails of Σ wᵢzᵢ². Weights may be of any sign and scale (zeros contribute nothing). With no
 * negative weight P(Q < 0) is 0, with no positive weight P(Q > 0) is 0, and with every weight 0
 * both are NaN (Q is 0).
 */
export function quadraticFormTails(weights: ArrayLike<number>): QuadraticFormTails {
  let largest = 0;
  for (let i = 0; i < weights.length; i++) largest = Math.max(largest, Math.abs(weights[i]));
  if (!(largest > 0) || !Number.isFinite(largest)) return { below: Number.NaN, above: Number.NaN };
  // P(Q < 0) is unchanged by a positive scale; max |w| = 1 keeps the saddlepoint of order 1.
  const scaled = Array.from(weights, (w) => w / largest).filter((w) => w !== 0);
  return { below: lowerTail(scaled), above: lowerTail(scaled.map((w) => -w)) };
}

/** P(Σ wᵢzᵢ² < 0) for weights with max |wᵢ| = 1. */
function lowerTail(w: readonly number[]): number {
  let smallest = 0;
  let largest = 0;
  for (const wi of w) {
    smallest = Math.min(smallest, wi);
    largest = Math.max(largest, wi);
  }
  if (smallest === 0) return 0;
  if (largest === 0) return 1;
  // M(s) converges for 1 − 2s·wᵢ > 0 for every i; on the negative side that is s > 1/(2·min w).
  const edge = 1 / (2 * smallest);
  const c = saddlepoint(w, edge);
  const distance = Math.min(-c, c - edge);
  // log|M(c)/c|, factored out of the integrand so that tails near 1e-300 neither under- nor overflow.
  let logAtSaddle = -Math.log(-c);
  for (const wi of w) logAtSaddle -= 0.5 * Math.log1p(-2 * c * wi);

  const integrand = (t: number): { value: number; bound: number } => {
    const v = distance * Math.sinh(t);
    const jacobian = distance * Math.cosh(t);
    // log M(c + iv) − log(c + iv) − logAtSaddle; each factor 1 − 2(c + iv)wᵢ has real part
    // 1 − 2cwᵢ > 0, so the principal logarithms add up without any branch to track.
    let realPart = -0.5 * Math.log(c * c + v * v) - logAtSaddle;
    let angle = -Math.atan2(v, c);
    for (const wi of w) {
      const re = 1 - 2 * c * wi;
      const im = -2 * v * wi;
      realPart -= 0.25 * Math.log(re * re + im * im);
      angle -= 0.5 * Math.atan(im / re);
    }
    const modulus = Math.exp(realPart) * jacobian;
    return { value: modulus * Math.cos(angle), bound: modulus };
  };

  let step = FIRST_STEP;
  let sum = 0.5 * integrand(0).value + sumAt(integrand, step, step);
  let estimate = step * sum;
  for (;;) {
    const half = step / 2;
    // The finer rule's new points lie midway between the old ones.
    sum += sumAt(integrand, half, step);
    const refined = half * sum;
    const converged = Math.abs(refined - estimate) <= ACCURACY * Math.abs(refined);
    step = half;
    estimate = refined;
    if (converged || step <= SMALLEST_STEP) break;
  }
  // P(Q < 0) = −(1/π)·∫Re[M/s]dv, with |M(c)/c| factored out.
  const probability = (-Math.exp(logAtSaddle) * estimate) / Math.PI;
  return Math.min(1, Math.max(0, probability));
}

/** Σ f(first + k·spacing), k = 0, 1, …, until a term's bound is negligible beside the sum so far. */
function sumAt(f: (t: number) => { value: number; bound: number }, first: number, spacing: number): number {
  let sum = 0;
  let scale = Math.abs(f(0).value);
  for (let t = first; ; t += spacing) {
    const term = f(t);
    sum += term.value;
    scale = Math.max(scale, Math.abs(sum));
    if (term.bound <= TRUNCATION * scale || !Number.isFinite(term.bound)) return sum;
  }
}

/**
 * The minimum over c ∈ (edge, 0) of log M(c) − log|c|, where its derivative
 * K'(c) − 1/c = Σ wᵢ/(1 − 2cwᵢ) − 1/c changes sign from − to + (the function is convex and
 * tends to +∞ at both ends). Bisection: only the line's position depends on it, not the answer.
 */
function saddlepoint(w: readonly number[], edge: number): number {
  let low = edge;
  let high = 0;
  for (let iteration = 0; iteration < 60; iteration++) {
    const c = 0.5 * (low + high);
    let slope = -1 / c;
    for (const wi of w) slope += wi / (1 - 2 * c * wi);
    if (slope > 0) high = c;
    else low = c;
  }
  return 0.5 * (low + high);
}
