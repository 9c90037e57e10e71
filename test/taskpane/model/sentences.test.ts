/** The plain-language readings, on a small fit whose numbers the test computes itself. */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, fitModel } from '../../../src/engine';
import { fitSentence, readable, splitUnit, termSentence } from '../../../src/taskpane/model/sentences';

const frame = buildModelFrame({
  y: [['Yield (%)'], [10], [12.1], [13.9], [16.2], [18], [19.8], [22.1], [24]],
  x: [[['Steep (h)', 'Origin'], [1, 'North'], [2, 'South'], [3, 'North'], [4, 'South'], [5, 'North'], [6, 'South'], [7, 'North'], [8, 'South']]],
  intercept: true,
});
const fit = fitModel(frame.data);

describe('sentences', () => {
  it('splits a unit from a header', () => {
    expect(splitUnit('Steep time (h)')).toEqual({ name: 'Steep time', unit: 'h' });
    expect(splitUnit('Yield')).toEqual({ name: 'Yield', unit: undefined });
  });

  it('reads a numeric term per unit, with its interval and verdict', () => {
    const t = fit.terms[1];
    expect(termSentence(t, frame, 0.95)).toBe(
      `Steep: each extra hour changes yield by +${readable(t.estimate)} points (95% CI ${readable(t.ciLow)} to ${readable(t.ciHigh)}). Clear of zero.`,
    );
  });

  it('reads a categorical term against its reference level', () => {
    const t = fit.terms[2];
    expect(termSentence(t, frame, 0.9)).toMatch(/^Origin South vs North: yield is (higher|lower) by .* points \(90% CI /);
  });

  it('summarises the fit with rows, R² and the overall F test', () => {
    expect(fitSentence(fit, frame)).toContain(`Fitted on 8 rows: R² = ${readable(fit.rSquared)}`);
  });
});
