import type { ModelFit, ModelFrame } from '../../engine';
import { formatLevel, formatNumber } from '../../presentation';
import type { LabelledPrediction } from './paneAnalysis';
import { classicalNote, splitUnit } from './sentences';

/** The smallest and largest value of one numeric predictor over the rows used. */
export interface ObservedRange {
  min: number;
  max: number;
}

/** One new row's card, as text. */
export interface PredictionCard {
  label: string;
  inputs: string;
  estimate: string;
  meanInterval: string;
  newInterval: string;
  /** Extrapolation, in words: empty when the row lies within the data. */
  flags: string[];
}

export interface CardContext {
  responseName: string;
  level: number;
  /** Each numeric predictor's observed range, by name, where the analysis knows it. */
  observed: ReadonlyMap<string, ObservedRange>;
}

/** A value from the cells (an input, a data row's extreme) as the user wrote it when it is whole, else to three digits. */
function cellNumber(value: number): string {
  return Number.isInteger(value) && Math.abs(value) < 1e15 ? String(value).replace('-', '−') : formatNumber(value);
}

/** "21.0" and "%" → "21.0%"; "14" and "h" → "14 h". */
function withUnit(number: string, unit: string | undefined): string {
  if (unit === undefined) return number;
  return unit === '%' ? `${number}%` : `${number} ${unit}`;
}

/** "Steep time (h)" with 14 → "Steep time 14 h"; text values (categories) as they are. */
function quantity(name: string, value: number | string): string {
  const { name: bare, unit } = splitUnit(name);
  return typeof value === 'string' ? `${bare} ${value}` : `${bare} ${withUnit(cellNumber(value), unit)}`;
}

function span(range: ObservedRange, unit: string | undefined): string {
  return withUnit(`${cellNumber(range.min)}–${cellNumber(range.max)}`, unit);
}

function rangeFlag(name: string, value: number | string | undefined, observed: ObservedRange | undefined): string {
  const { name: bare, unit } = splitUnit(name);
  const what = value === undefined ? bare : quantity(name, value);
  const where = observed === undefined ? 'outside the range of the data used' : `outside the observed ${span(observed, unit)}`;
  return `${what} lies ${where}: the prediction extrapolates.`;
}

/** Why a prediction beyond the data deserves less trust than its interval suggests. */
function extrapolationFlags(prediction: LabelledPrediction, observed: ReadonlyMap<string, ObservedRange>): string[] {
  const flags = prediction.outsideRange.map((name) => rangeFlag(name, prediction.inputs.find((input) => input.name === name)?.value, observed.get(name)));
  if (prediction.hiddenExtrapolation) {
    // Leverage above every row used, with each value inside its own range (hidden extrapolation).
    flags.push(
      'Each value lies within its observed range, but this combination lies outside the data’s pattern (hidden extrapolation): the prediction extrapolates.',
    );
  }
  return flags;
}

/** The text of one new row's card: what goes in, what comes out, and how far to trust it. */
export function predictionCard(prediction: LabelledPrediction, context: CardContext): PredictionCard {
  const level = formatLevel(context.level);
  const inputs = prediction.inputs.map((input) => quantity(input.name, input.value)).join(', ');
  const response = splitUnit(context.responseName);
  const amount = (value: number) => withUnit(formatNumber(value), response.unit);
  const unpredicted = prediction.notPredicted ?? (Number.isFinite(prediction.estimate) ? undefined : 'Not predicted.');
  return {
    label: prediction.label,
    inputs: `Inputs: ${inputs}.`,
    estimate: unpredicted ?? `Predicted ${response.name.toLowerCase()}: ${amount(prediction.estimate)}.`,
    meanInterval:
      unpredicted !== undefined ? '' : `${level} interval for the average at these inputs: ${amount(prediction.meanLow)} to ${amount(prediction.meanHigh)}.`,
    newInterval: unpredicted !== undefined ? '' : `${level} interval for one new measurement: ${amount(prediction.newLow)} to ${amount(prediction.newHigh)}.`,
    flags: extrapolationFlags(prediction, context.observed),
  };
}

/** Said once above the cards under robust standard errors, whose correction the prediction intervals do not carry. */
export function predictionIntervalsNote(fit: ModelFit): string | undefined {
  return fit.covarianceKind === 'classical' ? undefined : `Prediction intervals${classicalNote(fit)}.`;
}

/** Ranges kept by a streamed read, one per predictor in sheet order. */
export function rangesByName(names: readonly string[], min: readonly number[], max: readonly number[]): Map<string, ObservedRange> {
  return new Map(names.map((name, j) => [name, { min: min[j], max: max[j] }]));
}

/**
 * Each numeric predictor's range over the rows used, from the model frame (the rows the fit
 * saw). Categorical columns have no range: a new level is refused before any prediction.
 */
export function observedRanges(frame: Pick<ModelFrame, 'columns' | 'termColumns' | 'data'>): Map<string, ObservedRange> {
  const ranges = new Map<string, ObservedRange>();
  frame.columns.forEach((column, c) => {
    const term = frame.termColumns.indexOf(c);
    if (column.kind !== 'numeric' || term < 0 || frame.data.x.length === 0) return;
    let min = Infinity;
    let max = -Infinity;
    for (const row of frame.data.x) {
      min = Math.min(min, row[term]);
      max = Math.max(max, row[term]);
    }
    ranges.set(column.name, { min, max });
  });
  return ranges;
}
