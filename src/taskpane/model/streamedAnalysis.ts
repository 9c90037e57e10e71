import {
  type AccumulatedRows,
  EngineError,
  type FitSettings,
  fCriticalValue,
  fitAccumulated,
  type ModelFit,
  type NestedComparison,
  NOTHING_ADDED_MESSAGE,
  type SkippedRow,
} from '../../engine';
import { failureMessage, fitOrder, settingsOf } from './analysisParts';
import { type BlockSources, type BlockValues, detectHeader } from './blockRows';
import type { PaneChoices } from './choices';
import { labelled, type LabelledPrediction, type NewRowsRead, type PredictorColumn, readNewRowInputs } from './newRowPredictions';
import type { StreamedAnalysis } from './paneAnalysis';
import { type ColumnFacts, paneWarnings } from './paneWarnings';
import { selectColumns, trailingCorner } from './selectColumns';
import { intervalsFromCovariance } from './streamedPredict';

/** What a streamed read leaves: the first row, the R of [1 | X | y] in sheet order, each column's range, the skipped rows. */
export interface StreamedData {
  /** The first row of every chosen column, where a header would be, and the ranges they come from. */
  first: BlockValues;
  sources: BlockSources;
  /** Rows in the chosen ranges, header included. */
  totalRows: number;
  accumulated: AccumulatedRows;
  /** Smallest and largest value of each predictor (sheet order) over the rows used. */
  min: number[];
  max: number[];
  skipped: number;
  skippedExamples: SkippedRow[];
  newRows?: NewRowsRead;
}

/** What R and the column ranges can tell without the rows; relative tolerance for two R columns to be one. */
const SAME_COLUMN = 1e-13;

/**
 * Constant columns from their ranges; repeated ones from R, whose columns are equal exactly when
 * the data's columns are (same Gram matrix), within rounding, and whose ranges agree.
 */
function columnFacts(data: StreamedData, order: readonly number[], names: readonly string[]): ColumnFacts {
  const { r, size } = data.accumulated;
  const column = (j: number) => Array.from({ length: size }, (_, i) => r[i * size + j + 1]);
  const norm = (v: readonly number[]) => Math.hypot(...v);
  const constant = order.filter((j) => data.min[j] === data.max[j]).map((j) => names[j]);
  const identical: [string, string][] = [];
  order.forEach((a, k) => {
    for (const b of order.slice(k + 1)) {
      if (data.min[a] !== data.min[b] || data.max[a] !== data.max[b]) continue;
      const ca = column(a);
      const cb = column(b);
      const difference = norm(ca.map((v, i) => v - cb[i]));
      if (difference <= SAME_COLUMN * norm(ca)) identical.push([names[a], names[b]]);
    }
  });
  return { constant, identical };
}

/** What a stream cannot check, said with its results. */
export const STREAMED_UNCHECKED = [
  'Large data: the residual checks (the outlier test and influential rows, Durbin–Watson, Breusch–Pagan, Shapiro–Wilk, lack of fit) need every row at once and were not run.',
  'Large data: hidden extrapolation (a new row’s combination of values unlike the data, judged by leverage) needs every row’s leverage and was not checked; values outside each column’s range were.',
];

/**
 * The streamed source of the pane's analysis: every model is solved from the accumulated R
 * alone, so changing the intercept or the added set needs no second read.
 */
export function analyzeStreamed(data: StreamedData, choices: PaneChoices): StreamedAnalysis {
  const settings = settingsOf(choices);
  const { accumulated } = data;
  const order = fitOrder(data.first.predictors.length, choices.added);
  const header = detectHeader(data.first, data.sources, data.totalRows, order);
  const names = header.predictorNames;
  const lead = choices.intercept ? [0] : [];
  const rColumns = [...lead, ...order.map((j) => j + 1)];
  const inSheetOrder = choices.intercept && order.every((j, k) => j === k);
  const full = inSheetOrder ? accumulated : selectColumns(accumulated, rColumns, choices.intercept);
  let fit: ModelFit | undefined;
  let fitError: string | undefined;
  let multiplier = Number.NaN;
  let inferenceSigma = Number.NaN;
  try {
    const solved = fitAccumulated(
      full,
      settings,
      order.map((j) => names[j]),
    );
    fit = solved.fit;
    multiplier = solved.reference.multiplier(solved.fit.settings.level);
    inferenceSigma = solved.inferenceSigma;
  } catch (error) {
    fitError = failureMessage(error);
  }
  let nested: NestedComparison | undefined;
  let nestedError: string | undefined;
  if (fit !== undefined && choices.added.length > 0) {
    try {
      nested = nestedStreamed(full, fit, rColumns.length - choices.added.length, settings);
    } catch (error) {
      nestedError = failureMessage(error);
    }
  }
  const columns: PredictorColumn[] = names.map((name) => ({ name, levels: undefined }));
  let predictions: LabelledPrediction[] = [];
  let predictionError: string | undefined;
  if (fit !== undefined && data.newRows !== undefined) {
    const solved = { fit, multiplier, inferenceSigma };
    const fitNames = order.map((j) => names[j]);
    try {
      predictions = readNewRowInputs(data.newRows, columns, header.hasHeader).map((input) => {
        if (input.blank !== undefined) return labelled(input, undefined, fitNames);
        const row = order.map((j) => input.cells[j].value as number);
        const outsideRange = order.map((j, k) => (row[k] < data.min[j] || row[k] > data.max[j] ? k : -1)).filter((k) => k >= 0);
        const prediction = intervalsFromCovariance([...(choices.intercept ? [1] : []), ...row], solved);
        // Hidden extrapolation needs every row's leverage, which R alone does not give: not checked (STREAMED_UNCHECKED).
        return labelled(input, { ...prediction, outsideRange, hiddenExtrapolation: false }, fitNames);
      });
    } catch (error) {
      predictionError = failureMessage(error);
    }
  }
  const dataRows = data.totalRows - (header.hasHeader ? 1 : 0);
  return {
    source: 'streamed',
    header,
    order,
    multiplier,
    inferenceSigma,
    dataRows,
    responseName: header.responseName,
    hasHeader: header.hasHeader,
    predictorNames: names,
    rowsUsed: accumulated.n,
    rowsSkipped: data.skipped,
    skippedExamples: data.skippedExamples,
    fit,
    fitError,
    nested,
    nestedError,
    addedNames: order.filter((j) => choices.added.includes(j)).map((j) => names[j]),
    settings,
    warnings: paneWarnings({
      fit,
      columns: columnFacts(data, order, names),
      spanning: undefined,
      rowsSkipped: data.skipped,
      skippedExamples: data.skippedExamples,
      checks: undefined,
    }),
    unchecked: STREAMED_UNCHECKED,
    predictions,
    predictionError,
  };
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
    throw new EngineError('nothing-added', NOTHING_ADDED_MESSAGE);
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
