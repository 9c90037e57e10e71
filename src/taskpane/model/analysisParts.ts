import { EngineError, type FitSettings } from '../../engine';
import type { PaneChoices } from './choices';
import { knownSigmaOf } from './noiseSdField';

export function settingsOf(choices: PaneChoices): FitSettings {
  return {
    level: choices.level,
    intercept: choices.intercept,
    knownSigma: knownSigmaOf(choices.knownSigma),
    covariance: choices.robust,
  };
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
