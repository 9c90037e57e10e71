import {
  type AssumptionChecks,
  assumptionChecks,
  buildModelFrame,
  type CellGrid,
  compareNested,
  EngineError,
  type FitSettings,
  fitModel,
  type ModelFit,
  type ModelFrame,
  type NestedComparison,
  type RangeOrigin,
} from '../../engine';
import type { RangeRef } from '../../addressing/a1';
import type { BlockSources } from './blockRows';
import type { PaneChoices } from './choices';
import { knownSigmaOf } from './noiseSdField';
import { dataWarnings } from './warnings';

/** The cells the pane has read, one grid per chosen range, and the ranges they were read from. */
export interface ReadData {
  response: CellGrid;
  predictorColumns: CellGrid[];
  weights: CellGrid | undefined;
  sources: BlockSources;
}

export interface PaneAnalysis {
  frame: ModelFrame;
  fit: ModelFit | undefined;
  fitError: string | undefined;
  nested: NestedComparison | undefined;
  nestedError: string | undefined;
  addedNames: string[];
  settings: FitSettings;
  warnings: string[];
  checks: AssumptionChecks | undefined;
}

export function settingsOf(choices: PaneChoices): FitSettings {
  return {
    level: choices.level,
    intercept: choices.intercept,
    knownSigma: knownSigmaOf(choices.knownSigma),
    covariance: choices.robust,
  };
}

function message(error: unknown): string {
  return error instanceof EngineError ? error.message : `Unexpected problem: ${String(error)}`;
}

function originOf(range: RangeRef): RangeOrigin {
  return { sheet: range.sheet, row: range.top, column: range.left };
}

/**
 * Everything the pane shows about the data and the model, from the engine (and so from the same
 * cache as the cell functions). Base predictors come first and added ones last, the order the
 * report's formulas use. Each column goes in as its own block with its worksheet origin, so rows
 * are numbered as the sheet numbers them and a bad cell is named by its address.
 */
export function analyze(data: ReadData, choices: PaneChoices): PaneAnalysis {
  const settings = settingsOf(choices);
  const isAdded = (j: number) => choices.added.includes(j);
  const order = data.predictorColumns.map((_, j) => j).sort((a, b) => Number(isAdded(a)) - Number(isAdded(b)));
  const { sources } = data;
  const frame = buildModelFrame({
    y: data.response,
    x: order.map((j) => data.predictorColumns[j]),
    weights: data.weights,
    intercept: choices.intercept,
    origins: {
      y: originOf(sources.response),
      x: order.map((j) => originOf(sources.predictors[j])),
      weights: sources.weights === undefined ? undefined : originOf(sources.weights),
    },
  });
  let fit: ModelFit | undefined;
  let fitError: string | undefined;
  try {
    fit = fitModel(frame.data, settings);
  } catch (error) {
    fitError = message(error);
  }

  const addedSources = new Set(order.map((j, position) => (isAdded(j) ? position : -1)).filter((p) => p >= 0));
  const inAdded = frame.termColumns.map((c) => addedSources.has(c));
  let nested: NestedComparison | undefined;
  let nestedError: string | undefined;
  if (fit !== undefined && addedSources.size > 0) {
    try {
      const { x, y, weights } = frame.data;
      nested = compareNested(
        { y, base: x.map((r) => r.filter((_, j) => !inAdded[j])), added: x.map((r) => r.filter((_, j) => inAdded[j])), weights },
        settings,
      );
    } catch (error) {
      nestedError = message(error);
    }
  }
  let checks: AssumptionChecks | undefined;
  if (fit !== undefined) {
    try {
      checks = assumptionChecks(frame.data, settings, frame.usedRows);
    } catch {
      // The checks need what the fit needed; when they cannot run, the fit's own message stands.
      checks = undefined;
    }
  }
  return {
    frame,
    fit,
    checks,
    fitError,
    nested,
    nestedError,
    addedNames: frame.columns.filter((_, c) => addedSources.has(c)).map((c) => c.name),
    settings,
    warnings: dataWarnings(frame, fit),
  };
}
