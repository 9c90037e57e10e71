import { modelCache } from './fitModel';
import { resetDesignBasis } from './infer/designBasis';
import { resetEqualVarianceResiduals } from './infer/equalVarianceResiduals';
import { resetResidualDiagnostics } from './infer/influence';
import { resetNormalScores } from './infer/normalScores';
import { resetSharedCollinearity } from './infer/sharedCollinearity';

/**
 * Clears every cache the engine keeps beyond the lifetime of the objects it was handed: the fits,
 * the collinearity memo (content-keyed, so it outlives the fits it came from), the last design
 * basis, equal-variance residuals and residual diagnostics, and the normal scores' last order and
 * quantiles. The per-fit memos (leverages, Durbin–Watson moments, the
 * extrapolation span) are keyed on the fit's solution object and go with it. For timing a formula
 * cold and for freeing memory.
 */
export function resetCaches(): void {
  modelCache.reset();
  resetSharedCollinearity();
  resetDesignBasis();
  resetEqualVarianceResiduals();
  resetResidualDiagnostics();
  resetNormalScores();
}
