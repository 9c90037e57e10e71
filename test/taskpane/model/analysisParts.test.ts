/**
 * The results say when a refused known-σ entry leaves σ estimated (issue #14). The rule of what
 * is refused is engine/noiseSd.ts's, tested in noiseSdField.test.ts; here only that the notice
 * follows it and the fit's settings agree with it (common practice (no source)).
 */
import { describe, expect, it } from 'vitest';
import { settingsOf, unusedSigmaNotice } from '../../../src/taskpane/model/analysisParts';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';

describe('unusedSigmaNotice', () => {
  it('says a refused entry is not used and σ is estimated, as the fit does', () => {
    for (const typed of ['0', '-1', '0,35', 'abc']) {
      const choices = { ...EMPTY_CHOICES, knownSigma: typed };
      expect(settingsOf(choices).knownSigma).toBeUndefined();
      const notice = unusedSigmaNotice(choices);
      expect(notice).toContain(`"${typed}"`);
      expect(notice).toMatch(/^Known σ not used: .*σ is estimated from the data\.$/);
    }
  });

  it('says nothing while the field is empty or holds a σ the fit uses', () => {
    expect(unusedSigmaNotice({ ...EMPTY_CHOICES, knownSigma: '' })).toBeUndefined();
    const used = { ...EMPTY_CHOICES, knownSigma: '0.35' };
    expect(settingsOf(used).knownSigma).toBe(0.35);
    expect(unusedSigmaNotice(used)).toBeUndefined();
  });
});
