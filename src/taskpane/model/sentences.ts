import type { ModelFit, ModelFrame, NestedComparison, TermEstimate } from '../../engine';
import { formatCount, formatLevel, formatNumber, formatP, formatShare, formatSigned, intervalVerdict } from '../../presentation';

/** What the sentences need of the data: a ModelFrame, or its stand-in for a streamed fit. */
export interface SentenceFrame {
  responseName: string;
  columns: ModelFrame['columns'];
  skipped: { length: number };
}

/** "Steep time (h)" → name "Steep time", unit "h". */
export function splitUnit(label: string): { name: string; unit: string | undefined } {
  const m = /^(.*?)\s*\(([^()]+)\)\s*$/.exec(label);
  return m ? { name: m[1], unit: m[2] } : { name: label, unit: undefined };
}

function responseAmount(amount: string, responseUnit: string | undefined): string {
  if (responseUnit === '%') return `${amount} points`;
  return responseUnit === undefined ? amount : `${amount} ${responseUnit}`;
}

/** One plain-language sentence per term, with its interval and verdict. */
export function termSentence(term: TermEstimate, frame: SentenceFrame, level: number): string {
  const response = splitUnit(frame.responseName);
  const ci = `${formatLevel(level)} CI ${formatNumber(term.ciLow)} to ${formatNumber(term.ciHigh)}`;
  const verdict = intervalVerdict(term) === 'clear of zero' ? 'Clear of zero.' : 'Could be zero.';
  if (term.aliased) return `${term.name}: cannot be estimated, because it is a combination of other columns.`;
  if (term.name === 'Intercept') {
    return `Intercept: the model's ${response.name.toLowerCase()} when every numeric predictor is 0 (at the reference levels) is ${responseAmount(formatNumber(term.estimate), response.unit)} (${ci}); often outside the data, so rarely meaningful on its own.`;
  }
  const category = frame.columns.find((c) => c.kind === 'categorical' && term.name.startsWith(`${c.name}: `));
  if (category !== undefined && category.kind === 'categorical') {
    const levelName = term.name.slice(category.name.length + 2);
    const against = category.reference === undefined ? 'zero' : category.reference;
    // Signed like its interval, so the size and the interval never read in opposite directions.
    return `${category.name} ${levelName} vs ${against}: ${response.name.toLowerCase()} differs by ${responseAmount(formatSigned(term.estimate), response.unit)}, other predictors held fixed (${ci}). ${verdict}`;
  }
  const predictor = splitUnit(term.name);
  const step = predictor.unit === undefined ? 'each extra unit' : `each extra ${unitWord(predictor.unit)}`;
  // An association within the data, not an effect of changing the predictor: say so in the sentence.
  return `${predictor.name}: ${step} is associated with ${responseAmount(formatSigned(term.estimate), response.unit)} of ${response.name.toLowerCase()}, other predictors held fixed (${ci}). ${verdict}`;
}

const UNIT_WORDS: Record<string, string> = { h: 'hour', min: 'minute', s: 'second', days: 'day', d: 'day' };
function unitWord(unit: string): string {
  return UNIT_WORDS[unit] ?? unit;
}

export function fitSentence(fit: ModelFit, frame: SentenceFrame): string {
  const response = splitUnit(frame.responseName);
  const skipped = frame.skipped.length > 0 ? ` (${formatCount(frame.skipped.length)} skipped)` : '';
  const sigma = `typical scatter σ̂ = ${responseAmount(formatNumber(fit.sigma), response.unit)}`;
  // Without an intercept R² compares with Σy², not with the spread about the mean: label it, and
  // never round it to a bare 1 that reads as a perfect fit.
  const rSquared = fit.settings.intercept
    ? `R² = ${formatNumber(fit.rSquared)}, adjusted ${formatNumber(fit.adjustedRSquared)}`
    : `uncentered R² (no intercept, measured from 0) = ${formatShare(fit.rSquared)}, adjusted ${formatShare(fit.adjustedRSquared)}`;
  return `Fitted on ${formatCount(fit.n)} rows${skipped}: ${rSquared}; ${sigma}. ${fit.settings.intercept ? 'All slopes zero?' : 'All coefficients zero?'} F = ${formatNumber(fit.fStatistic)}, ${formatP(fit.fPValue)}${classicalNote(fit)}.`;
}

/** Under robust standard errors the F tests stay classical; say so beside them. */
export function classicalNote(fit: ModelFit): string {
  return fit.covarianceKind === 'classical' ? '' : ` (classical standard errors, not ${fit.covarianceKind})`;
}

/** `fit` is the larger model's: its covariance kind says whether the note on classical standard errors is due. */
export function nestedSentence(result: NestedComparison, addedNames: readonly string[], level: number, fit?: ModelFit): string {
  const what = addedNames.join(', ');
  const classical = fit === undefined ? '' : classicalNote(fit);
  const numbers = `F = ${formatNumber(result.f)} on ${result.dfNumerator} and ${Number.isFinite(result.dfDenominator) ? result.dfDenominator : '∞'} df, ${formatP(result.pValue)}; critical F at ${formatLevel(level)} is ${formatNumber(result.fCritical)}${classical}`;
  // A test that does not reject shows no evidence of an effect, not that the effect is absent.
  return result.addedHelp
    ? `${what} earns its place: ${numbers}. The added terms help.`
    : `No evidence that ${what} adds anything: ${numbers}. The smaller model is enough.`;
}
