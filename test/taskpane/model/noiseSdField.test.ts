/**
 * The pane's known-σ field over the rule noise_sd follows in the cells (src/engine/noiseSd.ts).
 * Common practice (no source): a standard deviation is a positive number.
 */
import { describe, expect, it } from 'vitest';
import { knownSigmaOf, noiseSdProblem } from '../../../src/taskpane/model/noiseSdField';

describe('known σ field', () => {
  it('accepts empty (estimate σ) and positive numbers with a decimal point', () => {
    expect(noiseSdProblem('')).toBeUndefined();
    expect(knownSigmaOf('')).toBeUndefined();
    expect(noiseSdProblem('0.35')).toBeUndefined();
    expect(knownSigmaOf('0.35')).toBe(0.35);
  });

  it('refuses abc, -1, 0 and 0,35, saying why, and never passes them on as a σ', () => {
    // The words noise_sd gets in a cell (presentation/noiseSd.ts), with the field's name.
    expect(noiseSdProblem('abc')).toBe('Known σ must be a number, such as 0.35, or left empty to estimate σ; got abc.');
    expect(noiseSdProblem('-1')).toBe('Known σ is a standard deviation, so it must be positive; got -1.');
    expect(noiseSdProblem('0')).toMatch(/^Known σ cannot be 0: .* Leave the field empty to estimate σ from the data\.$/);
    expect(noiseSdProblem(' 0,35 ')).toBe('Use a point as the decimal separator in Known σ: 0.35 rather than 0,35.');
    for (const typed of ['abc', '-1', '0', '0,35']) expect(knownSigmaOf(typed)).toBeUndefined();
  });
});
