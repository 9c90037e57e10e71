import type { ModelFrame, Prediction } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const PREDICT_HEADER = ['Prediction', 'Mean low', 'Mean high', 'New low', 'New high', 'Extrapolation'];

/** What the last column says of a row whose values all lie inside the data but whose mix does not. */
export const HIDDEN_EXTRAPOLATION_TEXT = 'Hidden: unlike any row used';

/**
 * One row per new row; a row that could not be predicted (blank input, not estimable) has "" for its
 * numbers. columnNames: for each column of the model's x (coded columns, in fit order), the header
 * of the predictor it comes from, so that a category's indicators are named by their column.
 */
export function predictGrid(predictions: (Prediction | undefined)[], withHeader: boolean, columnNames: readonly string[]): Grid {
  const rows = predictions.map((p) =>
    p === undefined
      ? PREDICT_HEADER.map(() => '')
      : [...[p.estimate, p.meanLow, p.meanHigh, p.newLow, p.newHigh].map(finiteOrBlank), extrapolationText(p, columnNames)],
  );
  return withHeader ? [[...PREDICT_HEADER], ...rows] : rows;
}

/** "" when the row lies within the data; otherwise the predictors beyond their range, or the hidden case. */
export function extrapolationText(p: Prediction, columnNames: readonly string[]): string {
  if (p.outsideRange.length > 0) {
    const names = [...new Set(p.outsideRange.map((j) => columnNames[j]))];
    return `Outside the data: ${names.join(', ')}`;
  }
  return p.hiddenExtrapolation ? HIDDEN_EXTRAPOLATION_TEXT : '';
}

/** The header of the predictor behind each column of the frame's x. */
export function frameColumnNames(frame: ModelFrame): string[] {
  return frame.termColumns.map((c) => frame.columns[c].name);
}
