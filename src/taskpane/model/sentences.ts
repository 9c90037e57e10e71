import type { ModelFit, ModelFrame, NestedComparison, TermEstimate } from '../../engine';

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

/** Three significant digits, never in exponent form for ordinary magnitudes. */
export function readable(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) return value.toExponential(2);
  return String(Number(value.toPrecision(3)));
}

function signed(value: number): string {
  return value > 0 ? `+${readable(value)}` : readable(value);
}

export function pValueText(p: number): string {
  if (!Number.isFinite(p)) return 'p not defined';
  return p < 0.0001 ? 'p < 0.0001' : `p = ${p.toPrecision(2)}`;
}

function responseAmount(amount: string, responseUnit: string | undefined): string {
  if (responseUnit === '%') return `${amount} points`;
  return responseUnit === undefined ? amount : `${amount} ${responseUnit}`;
}

/** One plain-language sentence per term, with its interval and verdict. */
export function termSentence(term: TermEstimate, frame: SentenceFrame, level: number): string {
  const response = splitUnit(frame.responseName);
  const ci = `${Math.round(level * 100)}% CI ${readable(term.ciLow)} to ${readable(term.ciHigh)}`;
  const verdict = term.ciLow > 0 || term.ciHigh < 0 ? 'Clear of zero.' : 'Could be zero.';
  if (term.aliased) return `${term.name}: cannot be estimated, because it is a combination of other columns.`;
  if (term.name === 'Intercept') {
    return `Intercept: the model's ${response.name.toLowerCase()} when every numeric predictor is 0 (at the reference levels) is ${responseAmount(readable(term.estimate), response.unit)} (${ci}); often outside the data, so rarely meaningful on its own.`;
  }
  const category = frame.columns.find((c) => c.kind === 'categorical' && term.name.startsWith(`${c.name}: `));
  if (category !== undefined && category.kind === 'categorical') {
    const levelName = term.name.slice(category.name.length + 2);
    const against = category.reference === undefined ? 'zero' : category.reference;
    // Signed like its interval, so the size and the interval never read in opposite directions.
    return `${category.name} ${levelName} vs ${against}: ${response.name.toLowerCase()} differs by ${responseAmount(signed(term.estimate), response.unit)}, other predictors held fixed (${ci}). ${verdict}`;
  }
  const predictor = splitUnit(term.name);
  const step = predictor.unit === undefined ? 'each extra unit' : `each extra ${unitWord(predictor.unit)}`;
  // An association within the data, not an effect of changing the predictor: say so in the sentence.
  return `${predictor.name}: ${step} is associated with ${responseAmount(signed(term.estimate), response.unit)} of ${response.name.toLowerCase()}, other predictors held fixed (${ci}). ${verdict}`;
}

const UNIT_WORDS: Record<string, string> = { h: 'hour', min: 'minute', s: 'second', days: 'day', d: 'day' };
function unitWord(unit: string): string {
  return UNIT_WORDS[unit] ?? unit;
}

export function fitSentence(fit: ModelFit, frame: SentenceFrame): string {
  const response = splitUnit(frame.responseName);
  const skipped = frame.skipped.length > 0 ? ` (${frame.skipped.length.toLocaleString('en-US')} skipped)` : '';
  const sigma = `typical scatter σ̂ = ${responseAmount(readable(fit.sigma), response.unit)}`;
  // Without an intercept R² compares with Σy², not with the spread about the mean: label it, and
  // never round it to a bare 1 that reads as a perfect fit.
  const rSquared = fit.settings.intercept
    ? `R² = ${readable(fit.rSquared)}, adjusted ${readable(fit.adjustedRSquared)}`
    : `uncentered R² (no intercept, measured from 0) = ${fraction(fit.rSquared)}, adjusted ${fraction(fit.adjustedRSquared)}`;
  return `Fitted on ${fit.n.toLocaleString('en-US')} rows${skipped}: ${rSquared}; ${sigma}. All slopes zero? F = ${readable(fit.fStatistic)}, ${pValueText(fit.fPValue)}${classicalNote(fit)}.`;
}

/** A share near 1 with enough digits that it never shows as a bare 1 unless it is exactly 1. */
function fraction(value: number): string {
  if (!Number.isFinite(value) || value === 1 || value < 0.999) return readable(value);
  const digits = Math.min(12, Math.ceil(-Math.log10(1 - value)) + 2);
  return value.toFixed(digits);
}

/** Under robust standard errors the F tests stay classical; say so beside them. */
export function classicalNote(fit: ModelFit): string {
  return fit.covarianceKind === 'classical' ? '' : ` (classical standard errors, not ${fit.covarianceKind})`;
}

/** `fit` is the larger model's: its covariance kind says whether the note on classical standard errors is due. */
export function nestedSentence(result: NestedComparison, addedNames: readonly string[], level: number, fit?: ModelFit): string {
  const what = addedNames.join(', ');
  const classical = fit === undefined ? '' : classicalNote(fit);
  const numbers = `F = ${readable(result.f)} on ${result.dfNumerator} and ${Number.isFinite(result.dfDenominator) ? result.dfDenominator : '∞'} df, ${pValueText(result.pValue)}; critical F at ${Math.round(level * 100)}% is ${readable(result.fCritical)}${classical}`;
  // A test that does not reject shows no evidence of an effect, not that the effect is absent.
  return result.addedHelp
    ? `${what} earns its place: ${numbers}. The added terms help.`
    : `No evidence that ${what} adds anything: ${numbers}. The smaller model is enough.`;
}
