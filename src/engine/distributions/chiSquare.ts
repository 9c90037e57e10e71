import gammainc from '@stdlib/math-base-special-gammainc';
import gammaincinv from '@stdlib/math-base-special-gammaincinv';

/**
 * χ² with df degrees of freedom: the reference distribution of the overall and nested F tests
 * when σ is known (F with an infinite denominator df is χ²/df1). The upper tail comes straight
 * from the upper regularized incomplete gamma Q(df/2, x/2), never as 1 − cdf.
 */
export function chiSquareUpperTail(x: number, df: number): number {
  if (Number.isNaN(x) || !(df > 0)) return Number.NaN;
  if (x <= 0) return 1;
  if (x === Number.POSITIVE_INFINITY) return 0;
  return gammainc(x / 2, df / 2, true, true);
}

/** x with P(χ² > x) = upperTail. */
export function chiSquareUpperQuantile(upperTail: number, df: number): number {
  if (!(upperTail >= 0 && upperTail <= 1) || !(df > 0)) return Number.NaN;
  if (upperTail === 0) return Number.POSITIVE_INFINITY;
  if (upperTail === 1) return 0;
  return 2 * gammaincinv(upperTail, df / 2, true);
}
