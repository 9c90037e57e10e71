import type { LeastSquaresSolution } from '../fit/leastSquares';
import { fUpperTail } from './referenceDistribution';

/**
 * What goodness of fit needs to know about the rows themselves, beyond the factorization: taken
 * from the design in memory, or accumulated block by block when rows are streamed.
 */
export interface RowTotals {
  n: number;
  hasIntercept: boolean;
  /** Σw(y − ȳ_w)² with an intercept, Σwy² without, both divided by yScale². */
  scaledTss: number;
  /** Σ log wᵢ (0 without weights). */
  logWeightSum: number;
}

export interface FitSummary {
  rss: number;
  rSquared: number;
  adjustedRSquared: number;
  fStatistic: number;
  fPValue: number;
  fDf: [number, number];
  logLikelihood: number;
  aic: number;
  bic: number;
}

/**
 * Goodness of fit. With an intercept R², the model SS and F are centered on the (weighted) mean;
 * without one they are uncentered, as NIST certifies for NoInt1/NoInt2. Sums of squares are taken
 * in units of yScale² so that data near 1e300 do not overflow before the ratios are formed.
 * The likelihood is Gaussian with var(yᵢ) = σ²/wᵢ; AIC and BIC count σ as a parameter unless
 * it is known.
 */
export function fitSummary(solution: LeastSquaresSolution, knownSigma: number | undefined, totals: RowTotals): FitSummary {
  const { yScale, scaledRss } = solution;
  const { n, scaledTss } = totals;
  const rank = solution.qr.accepted.length;
  const interceptDf = totals.hasIntercept ? 1 : 0;
  const residualDf = n - rank;

  const rSquared = scaledTss > 0 ? 1 - scaledRss / scaledTss : Number.NaN;
  const adjustedRSquared = 1 - ((1 - rSquared) * (n - interceptDf)) / residualDf;

  const modelDf = rank - interceptDf;
  const dfDenominator = knownSigma === undefined ? residualDf : Number.POSITIVE_INFINITY;
  const scaledModelSs = Math.max(0, scaledTss - scaledRss);
  const errorScale = knownSigma === undefined ? scaledRss / residualDf : (knownSigma / yScale) ** 2;
  const fStatistic = modelDf > 0 ? scaledModelSs / modelDf / errorScale : Number.NaN;
  const fPValue = modelDf > 0 ? fUpperTail(fStatistic, modelDf, dfDenominator) : Number.NaN;

  const logWeights = totals.logWeightSum;
  const logLikelihood =
    knownSigma === undefined
      ? 0.5 * logWeights - (n / 2) * (Math.log(2 * Math.PI) + 2 * Math.log(yScale) + Math.log(scaledRss / n) + 1)
      : 0.5 * logWeights - (n / 2) * Math.log(2 * Math.PI * knownSigma ** 2) - scaledRss / (2 * (knownSigma / yScale) ** 2);
  const k = rank + (knownSigma === undefined ? 1 : 0);

  return {
    rss: scaledRss * yScale * yScale,
    rSquared,
    adjustedRSquared,
    fStatistic,
    fPValue,
    fDf: [modelDf, dfDenominator],
    logLikelihood,
    aic: -2 * logLikelihood + 2 * k,
    bic: -2 * logLikelihood + Math.log(n) * k,
  };
}

/** The totals of the rows held in memory by an ordinary fit. */
export function rowTotalsOf(solution: LeastSquaresSolution): RowTotals {
  const { design } = solution;
  let logWeightSum = 0;
  if (design.rootWeights !== undefined) for (const r of design.rootWeights) logWeightSum += 2 * Math.log(r);
  return { n: design.matrix.rows, hasIntercept: design.hasIntercept, scaledTss: scaledTotalSumOfSquares(solution), logWeightSum };
}

/** Σw(y − ȳ_w)² with an intercept, Σwy² without, both divided by yScale². */
function scaledTotalSumOfSquares(solution: LeastSquaresSolution): number {
  const { design, yScale } = solution;
  const n = design.matrix.rows;
  const w = (i: number): number => (design.rootWeights === undefined ? 1 : design.rootWeights[i] ** 2);
  if (!design.hasIntercept) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += (design.y[i] / yScale) ** 2;
    return sum;
  }
  let weightSum = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    weightSum += w(i);
    mean += w(i) * (design.response[i] / yScale);
  }
  mean /= weightSum;
  // Second pass with the correction term of the corrected two-pass algorithm (Chan, Golub & LeVeque 1983).
  let sum = 0;
  let correction = 0;
  for (let i = 0; i < n; i++) {
    const d = design.response[i] / yScale - mean;
    sum += w(i) * d * d;
    correction += w(i) * d;
  }
  return sum - (correction * correction) / weightSum;
}
