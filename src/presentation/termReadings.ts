import type { NestedComparison, TermEstimate } from '../engine';

/** Whether a term's interval excludes zero, in the words the cells and the pane's cards share. */
export function intervalVerdict(t: Pick<TermEstimate, 'ciLow' | 'ciHigh'>): 'clear of zero' | 'could be zero' {
  return t.ciLow > 0 || t.ciHigh < 0 ? 'clear of zero' : 'could be zero';
}

/** The verdict on one term in TERMS, with the reason whenever a number beside it had to be left blank. */
export function termReading(t: TermEstimate, perfectFit: boolean): string {
  if (t.aliased) return 'aliased';
  if (t.undefinedBecause === 'leverage-one') return 'no HC3 SE: a row with leverage 1 determines this term';
  const verdict = intervalVerdict(t);
  if (perfectFit) return `${verdict} (exact fit: SE is 0, so t and CV % are undefined)`;
  if (t.estimate === 0) return `${verdict} (estimate is exactly 0, so CV % is undefined)`;
  return verdict;
}

/** A nested test that does not reject shows no evidence the added terms help, not that they do nothing. */
export function nestedReading(result: Pick<NestedComparison, 'addedHelp'>): string {
  return result.addedHelp ? 'added terms help' : 'no evidence they add anything: the smaller model is enough';
}
