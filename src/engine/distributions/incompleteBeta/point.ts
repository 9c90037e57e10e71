/**
 * Where the incomplete beta I_x(a, b) is evaluated. Both coordinates x and y = 1 − x are carried,
 * each formed by the caller without a subtraction, together with their logarithms: with a = 5e6 the
 * factor x^a turns a one-ulp error in x into 1e-9 relative, and forming 1 − x from a rounded x loses
 * log10(1/y) digits of y. The logarithms also stay finite where x or y underflows (a t statistic of
 * 1e200 gives y/x ≈ 1e400), so tails such as 1e-200 remain representable.
 */
export interface BetaPoint {
  readonly x: number;
  readonly y: number;
  readonly logX: number;
  readonly logY: number;
}

/**
 * A point from x and y = 1 − x given separately. Each logarithm is taken from whichever coordinate
 * determines it best: log x = log1p(−y) when y is small (Didonato & Morris 1992, ACM TOMS 708, use
 * the same 0.375 switch).
 */
export function pointFromCoordinates(x: number, y: number): BetaPoint {
  return {
    x,
    y,
    logX: y <= 0.375 ? Math.log1p(-y) : Math.log(x),
    logY: x <= 0.375 ? Math.log1p(-x) : Math.log(y),
  };
}

/**
 * The point with odds y/x = w, i.e. x = 1/(1 + w) and y = w/(1 + w); the F statistic gives
 * w = df1·f/df2 directly. `logW` carries log w when w itself over- or underflows.
 */
export function pointFromOdds(w: number, logW: number = Math.log(w)): BetaPoint {
  if (w <= 1) {
    const log1pW = Math.log1p(w);
    return { x: 1 / (1 + w), y: w / (1 + w), logX: -log1pW, logY: logW - log1pW };
  }
  const inv = 1 / w;
  const log1pInv = Math.log1p(inv);
  return { x: inv / (1 + inv), y: 1 / (1 + inv), logX: -logW - log1pInv, logY: -log1pInv };
}

/** The same point seen from the other parameter: I_x(a, b) = 1 − I_y(b, a). */
export function swapCoordinates(p: BetaPoint): BetaPoint {
  return { x: p.y, y: p.x, logX: p.logY, logY: p.logX };
}
