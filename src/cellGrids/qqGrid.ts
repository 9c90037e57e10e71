import type { ModelFrame, NormalScorePoint } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const QQ_HEADER = ['Normal quantile', 'Studentized residual', 'Row'];

/** Sorted points of the normal Q–Q plot, each traced to its row as PLUMB.RESIDUALS numbers it. */
export function qqGrid(points: NormalScorePoint[], frame: ModelFrame): Grid {
  return [[...QQ_HEADER], ...points.map((p) => [finiteOrBlank(p.normalQuantile), finiteOrBlank(p.studentized), frame.usedRows[p.rowIndex]])];
}
