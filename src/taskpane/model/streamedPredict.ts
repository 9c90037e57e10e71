import { intervalsAround, type ModelFit, type Prediction } from '../../engine';

/** A prediction's numbers; which values lie outside the data is judged by the caller, who has their ranges. */
export type Intervals = Omit<Prediction, 'outsideRange' | 'hiddenExtrapolation'>;

/** What a prediction needs of a streamed fit: its covariance, the multiplier and σ for intervals. */
export interface CovarianceFit {
  fit: ModelFit;
  multiplier: number;
  inferenceSigma: number;
}

/**
 * A prediction at x₀ (in fit order, with the leading 1 when there is an intercept) from the fit's
 * covariance alone: x₀ᵀb, the mean interval m·√(x₀ᵀCx₀) and the new-case interval
 * m·√(x₀ᵀCx₀ + σ²), which is what predict() computes from the factorization. With an aliased
 * term C has NaN entries and every number is NaN.
 */
export function intervalsFromCovariance(x0: readonly number[], { fit, multiplier, inferenceSigma }: CovarianceFit): Intervals {
  let estimate = 0;
  let quadratic = 0;
  x0.forEach((a, i) => {
    estimate += a * fit.terms[i].estimate;
    x0.forEach((b, j) => {
      quadratic += a * fit.covariance[i][j] * b;
    });
  });
  if (!Number.isFinite(quadratic)) {
    return { estimate: Number.NaN, meanLow: Number.NaN, meanHigh: Number.NaN, newLow: Number.NaN, newHigh: Number.NaN, leverage: Number.NaN };
  }
  return {
    ...intervalsAround(estimate, quadratic, inferenceSigma * inferenceSigma, multiplier),
    // C = σ²(XᵀWX)⁻¹ for the σ the intervals use, so x₀ᵀCx₀/σ² is the engine's leverage.
    leverage: quadratic / (inferenceSigma * inferenceSigma),
  };
}
