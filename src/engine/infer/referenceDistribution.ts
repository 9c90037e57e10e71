import { chiSquareUpperQuantile, chiSquareUpperTail } from '../distributions/chiSquare';
import { fisherFQuantile, fisherFUpperTail, normalQuantile, normalTwoSidedP, studentTQuantile, studentTTwoSidedP } from '../distributions';

/**
 * The distribution a coefficient's statistic is referred to: Student's t on the residual df when
 * σ is estimated, the standard normal when σ is known.
 */
export interface CoefficientReference {
  kind: 't' | 'z';
  twoSidedP(statistic: number): number;
  /** Multiplier of the SE for a two-sided interval at `level`. */
  multiplier(level: number): number;
}

export function coefficientReference(residualDf: number, sigmaKnown: boolean): CoefficientReference {
  if (sigmaKnown) {
    return {
      kind: 'z',
      twoSidedP: (z) => normalTwoSidedP(z),
      multiplier: (level) => -normalQuantile((1 - level) / 2),
    };
  }
  return {
    kind: 't',
    twoSidedP: (t) => studentTTwoSidedP(t, residualDf),
    multiplier: (level) => -studentTQuantile((1 - level) / 2, residualDf),
  };
}

/**
 * Upper tail of an F statistic. With σ known the denominator df is infinite and F·df1 is χ²(df1).
 */
export function fUpperTail(f: number, dfNumerator: number, dfDenominator: number): number {
  if (dfDenominator === Number.POSITIVE_INFINITY) return chiSquareUpperTail(f * dfNumerator, dfNumerator);
  return fisherFUpperTail(f, dfNumerator, dfDenominator);
}

/** The F value exceeded with probability 1 − level. */
export function fCriticalValue(level: number, dfNumerator: number, dfDenominator: number): number {
  if (dfDenominator === Number.POSITIVE_INFINITY) return chiSquareUpperQuantile(1 - level, dfNumerator) / dfNumerator;
  return fisherFQuantile(level, dfNumerator, dfDenominator);
}
