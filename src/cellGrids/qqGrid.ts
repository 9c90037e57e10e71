import type { ModelFrame, NormalScores } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const QQ_HEADER = ['Normal quantile', 'Studentized residual', 'Row'];

/** Sorted points of the normal Q–Q plot, each traced to its row as PLUMB.RESIDUALS numbers it. */
export function qqGrid(points: NormalScores, frame: ModelFrame): Grid {
  const { normalQuantile, studentized, rowIndex } = points;
  const { usedRows } = frame;
  const m = rowIndex.length;
  const grid: Grid = new Array<Grid[number]>(m + 1);
  grid[0] = [...QQ_HEADER];
  for (let k = 0; k < m; k++) grid[k + 1] = [finiteOrBlank(normalQuantile[k]), finiteOrBlank(studentized[k]), usedRows[rowIndex[k]]];
  return grid;
}
