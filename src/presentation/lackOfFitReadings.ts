import type { AssumptionChecks } from '../engine';
import { formatP } from './pValues';

/** Lack of fit against pure error in words: what the test compares, or why it could not be run. */
export function lackOfFitReading(lof: AssumptionChecks['lackOfFit']): string {
  switch (lof.verdict) {
    case 'exact-fit':
      return 'exact fit: every residual is 0, so there is nothing to test';
    case 'no-replicates':
      return 'no two rows share the same predictor values: without repeats there is no pure error to test the fit against';
    case 'no-lack-df':
      return 'the model has as many parameters as there are distinct predictor settings: nothing is left to test';
    case 'replicates-agree':
      return 'rows with the same predictor values agree exactly: no pure error to test the fit against';
    case 'lack-of-fit':
      return `the model misses the means of repeated settings by more than their own spread explains (${formatP(lof.pValue)}): consider another shape, such as a curve or an interaction`;
    case 'none':
      return `no sign of lack of fit: the model follows the means of repeated settings within their spread (${formatP(lof.pValue)})`;
  }
}
