import { EngineError, type FitSettings } from '../../engine';
import type { PaneChoices } from './choices';
import { knownSigmaOf, noiseSdProblem } from './noiseSdField';

export function settingsOf(choices: PaneChoices): FitSettings {
  return {
    level: choices.level,
    intercept: choices.intercept,
    knownSigma: knownSigmaOf(choices.knownSigma),
    covariance: choices.robust,
  };
}

/**
 * While the known-σ field holds an entry it refuses, the fit estimates σ (settingsOf): the results
 * say so, so they are not read as fitted with the σ typed. Undefined when the entry is used or empty.
 */
export function unusedSigmaNotice(choices: PaneChoices): string | undefined {
  if (noiseSdProblem(choices.knownSigma) === undefined) return undefined;
  return `Known σ not used: "${choices.knownSigma.trim()}" is not a σ the fit can take (see the Known σ field), so σ is estimated from the data.`;
}

/** An engine error's own words; anything else is a bug, said as such. */
export function failureMessage(error: unknown): string {
  return error instanceof EngineError ? error.message : `Unexpected problem: ${String(error)}`;
}

/**
 * Predictor indexes (sheet order) in the order both sources fit them and both reports' formulas
 * read them: base predictors first, the added set last, each group in sheet order.
 */
export function fitOrder(predictors: number, added: readonly number[]): number[] {
  const isAdded = (j: number) => added.includes(j);
  return Array.from({ length: predictors }, (_, j) => j).sort((a, b) => Number(isAdded(a)) - Number(isAdded(b)));
}
