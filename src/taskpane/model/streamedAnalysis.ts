import {
  type AccumulatedRows,
  EngineError,
  type FitSettings,
  fCriticalValue,
  fitAccumulated,
  type ModelFit,
  type NestedComparison,
  type SkippedRow,
} from '../../engine';
import { settingsOf } from './analysis';
import type { BlockHeader } from './blockRows';
import type { PaneChoices } from './choices';
import { selectColumns, trailingCorner } from './selectColumns';
import { streamedWarnings } from './streamedWarnings';

/** What a streamed read leaves: the header, the R of [1 | X | y] in sheet order, and the skipped rows. */
export interface StreamedData {
  header: BlockHeader;
  accumulated: AccumulatedRows;
  skipped: number;
  skippedExamples: SkippedRow[];
}

export interface StreamedAnalysis {
  kind: 'streamed';
  header: BlockHeader;
  skipped: number;
  /** Predictor indexes (sheet order) in fit order: base ones first, added ones last. */
  order: number[];
  fit: ModelFit | undefined;
  fitError: string | undefined;
  /** t (or z) multiplier and σ for prediction intervals. */
  multiplier: number;
  inferenceSigma: number;
  nested: NestedComparison | undefined;
  nestedError: string | undefined;
  addedNames: string[];
  settings: FitSettings;
  warnings: string[];
}

function message(error: unknown): string {
  return error instanceof EngineError ? error.message : `Unexpected problem: ${String(error)}`;
}

/**
 * The streamed counterpart of analyze(): every model is solved from the accumulated R alone, so
 * changing the intercept or the added set needs no second read.
 */
export function analyzeStreamed(data: StreamedData, choices: PaneChoices): StreamedAnalysis {
  const settings = settingsOf(choices);
  const { header, accumulated } = data;
  const isAdded = (j: number) => choices.added.includes(j);
  const order = header.predictorNames.map((_, j) => j).sort((a, b) => Number(isAdded(a)) - Number(isAdded(b)));
  const lead = choices.intercept ? [0] : [];
  const columns = [...lead, ...order.map((j) => j + 1)];
  const inSheetOrder = choices.intercept && order.every((j, k) => j === k);
  const full = inSheetOrder ? accumulated : selectColumns(accumulated, columns, choices.intercept);
  const result: StreamedAnalysis = {
    kind: 'streamed',
    header,
    skipped: data.skipped,
    order,
    fit: undefined,
    fitError: undefined,
    multiplier: Number.NaN,
    inferenceSigma: Number.NaN,
    nested: undefined,
    nestedError: undefined,
    addedNames: order.filter(isAdded).map((j) => header.predictorNames[j]),
    settings,
    warnings: [],
  };
  try {
    const solved = fitAccumulated(
      full,
      settings,
      order.map((j) => header.predictorNames[j]),
    );
    result.fit = solved.fit;
    result.multiplier = solved.reference.multiplier(solved.fit.settings.level);
    result.inferenceSigma = solved.inferenceSigma;
  } catch (error) {
    result.fitError = message(error);
  }
  if (result.fit !== undefined && choices.added.length > 0) {
    try {
      result.nested = nestedStreamed(full, result.fit, columns.length - choices.added.length, settings);
    } catch (error) {
      result.nestedError = message(error);
    }
  }
  result.warnings = streamedWarnings(result.fit, data);
  return result;
}

/** The extra-sum-of-squares F of the last columns of `full` (in fit order), as compareNested computes it from rows. */
function nestedStreamed(full: AccumulatedRows, fullFit: ModelFit, baseColumns: number, settings: FitSettings): NestedComparison {
  const intercept = settings.intercept ?? true;
  const base = fitAccumulated(
    selectColumns(
      full,
      Array.from({ length: baseColumns }, (_, c) => c),
      intercept,
    ),
    settings,
  ).fit;
  const dfNumerator = fullFit.rank - base.rank;
  if (dfNumerator <= 0) {
    throw new EngineError('nothing-added', 'The added columns are combinations of the base columns, so they cannot change the fit: there is nothing to test.');
  }
  const corner = fitAccumulated(trailingCorner(full, baseColumns, base.rank), { ...settings, intercept: false }).fit;
  if (corner.fDf[0] !== dfNumerator) {
    throw new EngineError('nothing-added', 'The added columns are nearly combinations of the base columns: the test cannot separate them.');
  }
  const dfDenominator = corner.fDf[1];
  const critical = fCriticalValue(fullFit.settings.level, dfNumerator, dfDenominator);
  return {
    f: corner.fStatistic,
    dfNumerator,
    dfDenominator,
    pValue: corner.fPValue,
    fCritical: critical,
    rssBase: base.rss,
    rssFull: fullFit.rss,
    addedHelp: corner.fStatistic > critical,
  };
}
