import type { AssumptionChecks, ModelFrame } from '../engine';
import { finiteOrBlank, type Grid, type GridCell } from './gridCell';

/** Two columns, label and value; every blank value has a reading or neighbour that says why. */
export function checksGrid(checks: AssumptionChecks, frame: ModelFrame): Grid {
  const { durbinWatson: dw, breuschPagan: bp, jarqueBera: jb } = checks;
  const rows: [string, GridCell][] = [
    ['Durbin–Watson', finiteOrBlank(dw.statistic)],
    ['DW expected d', finiteOrBlank(dw.mean)],
    ['DW p-value (ρ > 0)', finiteOrBlank(dw.pPositive)],
    ['DW p-value (two-sided)', finiteOrBlank(dw.pTwoSided)],
    ['DW reading', dw.reading],
    ['Breusch–Pagan LM', finiteOrBlank(bp.statistic)],
    ['BP df', finiteOrBlank(bp.df)],
    ['BP p-value', finiteOrBlank(bp.pValue)],
    ['BP reading', bp.reading],
    ['Jarque–Bera', finiteOrBlank(jb.statistic)],
    ['JB p-value', finiteOrBlank(jb.pValue)],
    ['JB reading', jb.reading],
    ["Largest Cook's distance", finiteOrBlank(checks.largestCooksDistance)],
    ['at row', cooksRow(checks, frame)],
    ['High-leverage rows', checks.highLeverageRows],
    ['Largest VIF', finiteOrBlank(checks.largestVif)],
    ['for term', vifTerm(checks)],
    ['Overall reading', checks.overall],
  ];
  return rows;
}

/** The row as PLUMB.RESIDUALS numbers it: its worksheet row, or its place in the input range. */
function cooksRow(checks: AssumptionChecks, frame: ModelFrame): GridCell {
  if (checks.largestCooksRow >= 0) return frame.usedRows[checks.largestCooksRow];
  return checks.durbinWatson.undefinedBecause === 'exact-fit' ? 'none: exact fit, every residual is 0' : 'none: every row has leverage 1';
}

function vifTerm(checks: AssumptionChecks): GridCell {
  if (checks.largestVifTerm === undefined) return 'none: the model has no predictors';
  return checks.largestVifReason === undefined ? checks.largestVifTerm : `${checks.largestVifTerm} (${checks.largestVifReason})`;
}
