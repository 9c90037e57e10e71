/**
 * The term and nested-test readings shared by TERMS, NESTED and the pane's cards. A test that does
 * not reject is absence of evidence, not evidence of absence (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import type { TermEstimate } from '../../src/engine';
import { intervalVerdict, nestedReading, termReading } from '../../src/presentation';

const term = (change: Partial<TermEstimate>): TermEstimate => ({
  name: 'Dose',
  estimate: 1.2,
  standardError: 0.3,
  statistic: 4,
  pValue: 0.001,
  ciLow: 0.6,
  ciHigh: 1.8,
  cvPercent: 25,
  aliased: false,
  undefinedBecause: undefined,
  ...change,
});

describe('term readings', () => {
  it('an interval clear of zero on either side, or one that spans it', () => {
    expect(intervalVerdict({ ciLow: 0.6, ciHigh: 1.8 })).toBe('clear of zero');
    expect(intervalVerdict({ ciLow: -1.8, ciHigh: -0.6 })).toBe('clear of zero');
    expect(intervalVerdict({ ciLow: -0.1, ciHigh: 1.8 })).toBe('could be zero');
  });

  it('gives the reason beside a blank number', () => {
    expect(termReading(term({}), false)).toBe('clear of zero');
    expect(termReading(term({ aliased: true }), false)).toBe('aliased');
    expect(termReading(term({ undefinedBecause: 'leverage-one' }), false)).toBe('no HC3 SE: a row with leverage 1 determines this term');
    expect(termReading(term({}), true)).toBe('clear of zero (exact fit: SE is 0, so t and CV % are undefined)');
    expect(termReading(term({ estimate: 0, ciLow: -1, ciHigh: 1 }), false)).toBe('could be zero (estimate is exactly 0, so CV % is undefined)');
  });

  it('reads a nested test that does not reject as no evidence, never as no effect', () => {
    expect(nestedReading({ addedHelp: true })).toBe('added terms help');
    expect(nestedReading({ addedHelp: false })).toBe('no evidence they add anything: the smaller model is enough');
  });
});
