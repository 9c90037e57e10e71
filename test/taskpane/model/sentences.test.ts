/** The plain-language readings, on a small fit whose numbers the test computes itself. */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, compareNested, fitModel } from '../../../src/engine';
import { formatNumber as readable, formatP } from '../../../src/presentation';
import { fitSentence, nestedSentence, splitUnit, termSentence } from '../../../src/taskpane/model/sentences';

const frame = buildModelFrame({
  y: [['Yield (%)'], [10], [12.1], [13.9], [16.2], [18], [19.8], [22.1], [24]],
  x: [
    [
      ['Steep (h)', 'Origin'],
      [1, 'North'],
      [2, 'South'],
      [3, 'North'],
      [4, 'South'],
      [5, 'North'],
      [6, 'South'],
      [7, 'North'],
      [8, 'South'],
    ],
  ],
  intercept: true,
});
const fit = fitModel(frame.data);

describe('sentences', () => {
  it('splits a unit from a header', () => {
    expect(splitUnit('Steep time (h)')).toEqual({ name: 'Steep time', unit: 'h' });
    expect(splitUnit('Yield')).toEqual({ name: 'Yield', unit: undefined });
  });

  // A regression slope describes an association among the rows with the other predictors held
  // fixed, not the effect of changing the predictor (common practice, no source).
  it('reads a numeric term per unit as an association, other predictors held fixed', () => {
    const t = fit.terms[1];
    const sentence = termSentence(t, frame, 0.95);
    expect(sentence).toBe(
      `Steep: each extra hour is associated with +${readable(t.estimate)} points of yield, other predictors held fixed (95% CI ${readable(t.ciLow)} to ${readable(t.ciHigh)}). Clear of zero.`,
    );
    expect(sentence).not.toMatch(/changes/);
  });

  // Significant trailing zeros are shown: 1.50, not 1.5 (common practice, no source).
  it('keeps the trailing zeros of the size and its interval, both signed alike', () => {
    const t = { ...fit.terms[1], estimate: 1.5, ciLow: 1.2, ciHigh: 1.8 };
    expect(termSentence(t, frame, 0.95)).toBe(
      'Steep: each extra hour is associated with +1.50 points of yield, other predictors held fixed (95% CI 1.20 to 1.80). Clear of zero.',
    );
    const negative = { ...fit.terms[1], estimate: -0.25, ciLow: -0.4, ciHigh: -0.1 };
    expect(termSentence(negative, frame, 0.95)).toContain('is associated with -0.250 points of yield, other predictors held fixed (95% CI -0.400 to -0.100)');
  });

  it('reads a categorical term against its reference level, its size signed like its interval', () => {
    const t = fit.terms[2];
    const sign = t.estimate > 0 ? '+' : '';
    expect(termSentence(t, frame, 0.9)).toBe(
      `Origin South vs North: yield differs by ${sign}${readable(t.estimate)} points, other predictors held fixed (90% CI ${readable(t.ciLow)} to ${readable(t.ciHigh)}). ${t.ciLow > 0 || t.ciHigh < 0 ? 'Clear of zero.' : 'Could be zero.'}`,
    );
  });

  it('summarises the fit with rows, R² and the overall F test', () => {
    expect(fitSentence(fit, frame)).toContain(`Fitted on 8 rows: R² = ${readable(fit.rSquared)}`);
    // The one p-value rule of the pane, the reports and the cells (presentation/pValues.ts).
    expect(fitSentence(fit, frame)).toContain(`All slopes zero? F = ${readable(fit.fStatistic)}, ${formatP(fit.fPValue)}.`);
    expect(formatP(fit.fPValue)).toBe('p < 0.0001');
  });

  // Without an intercept R² is 1 − RSS/Σy² (NIST StRD, NoInt1 certified values are of this kind),
  // which is near 1 for data far from 0 and must not pass for the usual R².
  it('labels the uncentered R² of a model without an intercept and never rounds it to a bare 1', () => {
    const noIntercept = fitModel(
      { y: [100.1, 100.9, 102.2, 102.8, 104.1, 105.2], x: [[1], [2], [3], [4], [5], [6]].map(([v]) => [v, 1]) },
      { intercept: false },
    );
    const sentence = fitSentence(noIntercept, { responseName: 'Yield', columns: [], skipped: { length: 0 } });
    expect(sentence).toContain('uncentered R² (no intercept, measured from 0) = 0.9999');
    expect(sentence).not.toMatch(/R² = 1,/);
    // Without an intercept the overall F tests every coefficient, as FITSTATS labels it.
    expect(sentence).toContain('All coefficients zero? F = ');
    expect(sentence).not.toContain('All slopes zero?');
  });

  // Under HC3 only the terms' standard errors change; the overall and nested F tests are the
  // classical ones (MacKinnon & White 1985 give the HC covariance, not a robust F).
  it('says beside the F tests that they stay classical under robust standard errors', () => {
    const robust = fitModel(frame.data, { covariance: 'HC3' });
    expect(fitSentence(robust, frame)).toContain('(classical standard errors, not HC3)');
    expect(fitSentence(fit, frame)).not.toContain('classical');
  });

  // A test that does not reject is absence of evidence, not evidence of absence (common practice, no source).
  it('reads a nested test that does not reject as no evidence, never as no effect', () => {
    const y = [3.1, 4.8, 7.15, 9.05, 10.9, 13.2, 14.85, 16.95];
    const base = [[1], [2], [3], [4], [5], [6], [7], [8]];
    const added = [[1], [1], [-1], [-1], [1], [1], [-1], [-1]];
    const result = compareNested({ y, base, added });
    expect(result.addedHelp).toBe(false);
    const sentence = nestedSentence(result, ['Noise'], 0.95, fitModel({ y, x: base.map((r, i) => [...r, ...added[i]]) }, { covariance: 'HC3' }));
    expect(sentence).toMatch(
      /^No evidence that Noise adds anything: F = .*, p = 0\.\d{4}; critical F at 95% is .*\(classical standard errors, not HC3\)\. The smaller model is enough\.$/,
    );
    expect(sentence).not.toMatch(/does not earn|no effect/);
  });
});
