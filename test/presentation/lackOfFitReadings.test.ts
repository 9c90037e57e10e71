/**
 * The lack-of-fit reading (NIST/SEMATECH e-Handbook §4.4.4; Draper & Smith 1998 §2.1): the verdict
 * against pure error, or why there was no test, most often because no setting repeats.
 */
import { describe, expect, it } from 'vitest';
import { type AssumptionChecks, assumptionChecks } from '../../src/engine';
import { lackOfFitReading } from '../../src/presentation';
import { randomProblem } from '../support/random';

describe('lack-of-fit reading', () => {
  const x = [1, 1, 2, 2, 3, 3, 4, 4, 5, 5].map((v) => [v]);

  it('a curve through replicated settings misses their means; a line does not', () => {
    const curve = assumptionChecks({ y: x.map(([v], i) => v * v + (i % 2 === 0 ? 0.1 : -0.1)), x }).lackOfFit;
    expect(lackOfFitReading(curve)).toMatch(
      /^the model misses the means of repeated settings by more than their own spread explains \(p [<=] 0\.\d{4}\): consider another shape, such as a curve or an interaction$/,
    );
    const line = assumptionChecks({ y: x.map(([v], i) => 1 + v + (i % 2 === 0 ? 0.1 : -0.1) + 0.01 * v * v), x }).lackOfFit;
    expect(lackOfFitReading(line)).toMatch(/^no sign of lack of fit: the model follows the means of repeated settings within their spread \(p = 0\.\d{4}\)$/);
  });

  it('says why there is no test', () => {
    expect(lackOfFitReading(assumptionChecks(randomProblem(67, 20, 2)).lackOfFit)).toBe(
      'no two rows share the same predictor values: without repeats there is no pure error to test the fit against',
    );
    const base = assumptionChecks(randomProblem(67, 20, 2)).lackOfFit;
    const as = (verdict: AssumptionChecks['lackOfFit']['verdict']) => lackOfFitReading({ ...base, verdict });
    expect(as('no-lack-df')).toBe('the model has as many parameters as there are distinct predictor settings: nothing is left to test');
    expect(as('replicates-agree')).toBe('rows with the same predictor values agree exactly: no pure error to test the fit against');
    expect(as('exact-fit')).toMatch(/^exact fit/);
  });
});
