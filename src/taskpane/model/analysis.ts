import {
  assumptionChecks,
  buildModelFrame,
  type CellGrid,
  codeRow,
  compareNested,
  fitModel,
  type ModelFit,
  type ModelFrame,
  type NestedComparison,
  predict,
} from '../../engine';
import { failureMessage, fitOrder, settingsOf } from './analysisParts';
import { type BlockSources, originOf } from './blockRows';
import type { PaneChoices } from './choices';
import { labelled, type LabelledPrediction, type NewRowsRead, type PredictorColumn, readNewRowInputs } from './newRowPredictions';
import type { CellsAnalysis } from './paneAnalysis';
import { type ColumnFacts, paneWarnings } from './paneWarnings';
import { gatheredColumns } from './reportSources';

/** The cells the pane has read, one grid per chosen range, and the ranges they were read from. */
export interface ReadData {
  response: CellGrid;
  predictorColumns: CellGrid[];
  weights: CellGrid | undefined;
  sources: BlockSources;
  newRows?: NewRowsRead;
}

/** Constant and repeated term columns, looked up in every row used. */
function columnFacts(frame: ModelFrame): ColumnFacts {
  const { x } = frame.data;
  const names = frame.data.names ?? [];
  const constant = names.filter((_, j) => x.length > 1 && x.every((row) => row[j] === x[0][j]));
  const identical: [string, string][] = [];
  for (let a = 0; a < names.length; a++) {
    for (let b = a + 1; b < names.length; b++) if (x.every((row) => row[a] === row[b])) identical.push([names[a], names[b]]);
  }
  return { constant, identical };
}

/** Each source column in sheet order, with its coding. */
function predictorColumns(frame: ModelFrame, order: readonly number[]): PredictorColumn[] {
  const columns: PredictorColumn[] = [];
  order.forEach((j, position) => {
    const column = frame.columns[position];
    columns[j] = { name: column.name, levels: column.kind === 'categorical' ? column.levels : undefined };
  });
  return columns;
}

function predictions(frame: ModelFrame, fit: ModelFit, newRows: NewRowsRead, columns: PredictorColumn[], order: readonly number[]): LabelledPrediction[] {
  const inputs = readNewRowInputs(newRows, columns, frame.hasHeader);
  const estimable = inputs.filter((input) => input.blank === undefined);
  const coded = estimable.map((input) =>
    codeRow(
      order.map((j) => input.cells[j].value),
      frame.columns,
    ),
  );
  const predicted = coded.length === 0 ? [] : predict(frame.data, coded, fit.settings);
  const columnNames = frame.termColumns.map((c) => frame.columns[c].name);
  return inputs.map((input) => {
    const at = estimable.indexOf(input);
    return labelled(input, at < 0 ? undefined : predicted[at], columnNames);
  });
}

/**
 * The in-memory source of the pane's analysis, from the engine (and so from the same cache as the
 * cell functions). Base predictors come first and added ones last, the order the report's
 * formulas use. Each column goes in as its own block with its worksheet origin, so rows are
 * numbered as the sheet numbers them and a bad cell is named by its address. A column without a
 * header is named by the worksheet column the live report's formulas will read it from: its own,
 * or, for predictors the report gathers, the report sheet's (reportSources.ts).
 */
export function analyzeCells(data: ReadData, choices: PaneChoices): CellsAnalysis {
  const settings = settingsOf(choices);
  const order = fitOrder(data.predictorColumns.length, choices.added);
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
      xNamedAt: gatheredColumns(order.map((j) => sources.predictors[j])),
    },
  });
  let fit: ModelFit | undefined;
  let fitError: string | undefined;
  try {
    fit = fitModel(frame.data, settings);
  } catch (error) {
    fitError = failureMessage(error);
  }

  const addedPositions = new Set(order.map((j, position) => (choices.added.includes(j) ? position : -1)).filter((p) => p >= 0));
  const inAdded = frame.termColumns.map((c) => addedPositions.has(c));
  let nested: NestedComparison | undefined;
  let nestedError: string | undefined;
  if (fit !== undefined && addedPositions.size > 0) {
    try {
      const { x, y, weights } = frame.data;
      nested = compareNested(
        { y, base: x.map((r) => r.filter((_, j) => !inAdded[j])), added: x.map((r) => r.filter((_, j) => inAdded[j])), weights },
        settings,
      );
    } catch (error) {
      nestedError = failureMessage(error);
    }
  }
  let checks: CellsAnalysis['checks'];
  if (fit !== undefined) {
    try {
      checks = assumptionChecks(frame.data, settings, frame.usedRows);
    } catch {
      // The checks need what the fit needed; when they cannot run, the fit's own message stands.
      checks = undefined;
    }
  }
  const columns = predictorColumns(frame, order);
  let labelledPredictions: LabelledPrediction[] = [];
  let predictionError: string | undefined;
  if (fit !== undefined && data.newRows !== undefined) {
    try {
      labelledPredictions = predictions(frame, fit, data.newRows, columns, order);
    } catch (error) {
      predictionError = failureMessage(error);
    }
  }
  const spanning = frame.columns.find((c) => c.kind === 'categorical' && c.reference === undefined);
  return {
    source: 'cells',
    frame,
    checks,
    responseName: frame.responseName,
    hasHeader: frame.hasHeader,
    predictorNames: columns.map((c) => c.name),
    rowsUsed: frame.usedRows.length,
    rowsSkipped: frame.skipped.length,
    skippedExamples: frame.skipped,
    fit,
    fitError,
    nested,
    nestedError,
    addedNames: frame.columns.filter((_, c) => addedPositions.has(c)).map((c) => c.name),
    settings,
    warnings: paneWarnings({
      fit,
      columns: columnFacts(frame),
      spanning: spanning?.name,
      rowsSkipped: frame.skipped.length,
      skippedExamples: frame.skipped,
      checks,
    }),
    unchecked: [],
    predictions: labelledPredictions,
    predictionError,
  };
}
