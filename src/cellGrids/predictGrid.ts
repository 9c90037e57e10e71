import type { Prediction } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const PREDICT_HEADER = ['Prediction', 'Mean low', 'Mean high', 'New low', 'New high'];

/** One row per new row; a row that could not be predicted (blank input, not estimable) is all "". */
export function predictGrid(predictions: (Prediction | undefined)[], withHeader: boolean): Grid {
  const rows = predictions.map((p) =>
    p === undefined ? PREDICT_HEADER.map(() => '') : [p.estimate, p.meanLow, p.meanHigh, p.newLow, p.newHigh].map(finiteOrBlank),
  );
  return withHeader ? [[...PREDICT_HEADER], ...rows] : rows;
}
