import { type CellGrid, type CellValue, classifyCell, type NewRowColumn, type Prediction, readNewRowValues } from '../../engine';

/** The new rows as read: their cells (areas joined side by side) and the column just left of them. */
export interface NewRowsRead {
  /** One row per worksheet row of the new rows, the predictors' columns in sheet order. */
  cells: CellGrid;
  /** The cell just left of each row (the label column), undefined when the rows start in column A. */
  labelCells: readonly CellValue[] | undefined;
  /** 1-based worksheet row of each row of `cells`. */
  sheetRows: readonly number[];
}

/** What a predictor column is, for reading and judging a new value in it (sheet order). */
export type PredictorColumn = NewRowColumn;

/** One new row, read: its label, and its values unless a blank leaves it unpredicted. */
export interface NewRowInput {
  label: string;
  /** The label is the text of the cell just left of the row (else it names the worksheet row). */
  labelFromCell: boolean;
  sheetRow: number;
  cells: { name: string; value: number | string }[];
  /** Why the row is not predicted (a blank), else undefined. */
  blank: string | undefined;
}

/** One new row's prediction, named as the user names it (a label column, else its worksheet row). */
export interface LabelledPrediction {
  label: string;
  /** The label is the text of the cell just left of the row (else it names the worksheet row), so a live report can refer to it. */
  labelFromCell: boolean;
  sheetRow: number;
  inputs: { name: string; value: number | string }[];
  estimate: number;
  meanLow: number;
  meanHigh: number;
  newLow: number;
  newHigh: number;
  /** Predictor names whose new value lies outside the range of the rows used. */
  outsideRange: string[];
  /** Every value inside its range, yet the combination lies beyond the rows used (leverage above theirs). */
  hiddenExtrapolation: boolean;
  /** Why there is no prediction (a blank, or a value the model cannot price), else undefined. */
  notPredicted: string | undefined;
}

/**
 * The label of a new row: the text in the column just left of the new rows (P-01, Trial B…),
 * else the worksheet row, the way a user finds the row.
 */
export function rowLabel(cell: CellValue | undefined, sheetRow: number): string {
  const classified = classifyCell(cell);
  return classified.kind === 'text' ? classified.text : `Row ${sheetRow}`;
}

/**
 * The new rows in the predictors' layout, read by the engine's one rule for new rows (as
 * PLUMB.PREDICT reads them), each with its label; messages name the worksheet row.
 */
export function readNewRowInputs(read: NewRowsRead, columns: readonly PredictorColumn[], hasHeader: boolean): NewRowInput[] {
  const naming = { row: (position: number) => `New row ${read.sheetRows[position]}`, cell: (position: number) => `New row ${read.sheetRows[position]}` };
  return readNewRowValues(read.cells, columns, hasHeader, naming).map(({ position, values, blankIn }): NewRowInput => {
    const sheetRow = read.sheetRows[position];
    const labelCell = read.labelCells?.[position];
    const label = rowLabel(labelCell, sheetRow);
    const labelFromCell = classifyCell(labelCell).kind === 'text';
    if (values === undefined) return { label, labelFromCell, sheetRow, cells: [], blank: `a blank in ${blankIn}` };
    return { label, labelFromCell, sheetRow, blank: undefined, cells: values.map((value, j) => ({ name: columns[j].name, value })) };
  });
}

/**
 * A new row's prediction with its label and inputs. The engine's flags index the model's columns
 * (`columnNames`: the predictor behind each, in fit order), and are said here by predictor name.
 */
export function labelled(input: NewRowInput, prediction: Prediction | undefined, columnNames: readonly string[]): LabelledPrediction {
  const base = { label: input.label, labelFromCell: input.labelFromCell, sheetRow: input.sheetRow, inputs: input.cells };
  if (prediction === undefined || input.blank !== undefined) {
    return {
      ...base,
      estimate: Number.NaN,
      meanLow: Number.NaN,
      meanHigh: Number.NaN,
      newLow: Number.NaN,
      newHigh: Number.NaN,
      outsideRange: [],
      hiddenExtrapolation: false,
      notPredicted: `Not predicted: ${input.blank ?? 'no prediction'}.`,
    };
  }
  return {
    ...base,
    estimate: prediction.estimate,
    meanLow: prediction.meanLow,
    meanHigh: prediction.meanHigh,
    newLow: prediction.newLow,
    newHigh: prediction.newHigh,
    outsideRange: [...new Set(prediction.outsideRange.map((j) => columnNames[j]))],
    hiddenExtrapolation: prediction.hiddenExtrapolation,
    notPredicted: Number.isFinite(prediction.estimate) ? undefined : 'Not predicted: it depends on a term that cannot be estimated.',
  };
}
