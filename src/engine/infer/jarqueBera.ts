import type { LeastSquaresSolution } from '../fit/leastSquares';
import { equalVarianceResiduals } from './equalVarianceResiduals';

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
  const u = equalVarianceResiduals(solution);
  const n = u.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += u[i];
  const mean = sum / n;
  let m2 = 0;
  let m3 = 0;
  let m4 = 0;
  for (let i = 0; i < n; i++) {
    const d = u[i] - mean;
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
