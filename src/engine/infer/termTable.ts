import type { TermEstimate } from '../types';
import type { CoefficientReference } from './referenceDistribution';

/**
 * One row per term. With SE = 0 (a perfect fit) the statistic is ±∞ and p is 0, as NIST
 * certifies for Wampler1; an estimate of exactly 0 then has no sign and its statistic is NaN.
 * A term marked in `leverageOne` has a NaN SE (see robustCovariance) and says why.
 */
export function termTable(
  names: readonly string[],
  estimates: ArrayLike<number>,
  standardErrors: readonly number[],
  reference: CoefficientReference,
  level: number,
  leverageOne: readonly boolean[] = [],
): TermEstimate[] {
  const multiplier = reference.multiplier(level);
  return names.map((name, j) => {
    const estimate = estimates[j];
    const standardError = standardErrors[j];
    if (Number.isNaN(estimate)) {
      return {
        name,
        estimate: Number.NaN,
        standardError: Number.NaN,
        statistic: Number.NaN,
        pValue: Number.NaN,
        ciLow: Number.NaN,
        ciHigh: Number.NaN,
        cvPercent: Number.NaN,
        aliased: true,
      };
    }
    const statistic = estimate / standardError;
    const halfWidth = multiplier * standardError;
    const because = leverageOne[j] === true ? { undefinedBecause: 'leverage-one' as const } : {};
    return {
      name,
      estimate,
      standardError,
      statistic,
      pValue: Number.isNaN(statistic) ? Number.NaN : reference.twoSidedP(statistic),
      ciLow: estimate - halfWidth,
      ciHigh: estimate + halfWidth,
      cvPercent: (100 * standardError) / Math.abs(estimate),
      aliased: false,
      ...because,
    };
  });
}
