import type { LeastSquaresSolution } from '../fit/leastSquares';

/**
 * Jarque & Bera, "Efficient tests for normality, homoscedasticity and serial independence of
 * regression residuals" (Economics Letters 6, 1980) and "A test for normality of observations and
 * regression residuals" (International Statistical Review 55, 1987):
 * JB = n/6·(S² + (K − 3)²/4), S and K the skewness and kurtosis of the residuals from central
 * moments with divisor n, referred to χ²(2), whose upper tail is exp(−JB/2).
 *
 * The moments are taken about the residuals' mean, which is 0 for an unweighted model with an
 * intercept (the papers' case) and is not assumed otherwise. Weights: on uᵢ = √wᵢ·eᵢ, the
 * residuals that share one variance under the model.
 */
export interface JarqueBera {
  statistic: number;
  skewness: number;
  kurtosis: number;
  pValue: number;
  undefinedBecause: 'exact-fit' | undefined;
}

export function jarqueBera(solution: LeastSquaresSolution): JarqueBera {
  const nan = Number.NaN;
  if (solution.perfectFit) return { statistic: nan, skewness: nan, kurtosis: nan, pValue: nan, undefinedBecause: 'exact-fit' };
  const u = Array.from(solution.residuals, (e, i) => ((solution.design.rootWeights?.[i] ?? 1) * e) / solution.yScale);
  const n = u.length;
  const mean = u.reduce((s, v) => s + v, 0) / n;
  let m2 = 0;
  let m3 = 0;
  let m4 = 0;
  for (const v of u) {
    const d = v - mean;
    m2 += d * d;
    m3 += d * d * d;
    m4 += d * d * d * d;
  }
  m2 /= n;
  m3 /= n;
  m4 /= n;
  const skewness = m3 / m2 ** 1.5;
  const kurtosis = m4 / (m2 * m2);
  const statistic = (n / 6) * (skewness ** 2 + (kurtosis - 3) ** 2 / 4);
  return { statistic, skewness, kurtosis, pValue: Math.exp(-statistic / 2), undefinedBecause: undefined };
}
