import type { Collinearity, TermCollinearity } from '../engine';
import { COLLINEARITY_REASON_TEXT, conditionReading } from '../presentation';
import { finiteOrBlank, type Grid, type GridCell } from './gridCell';

export const COLLINEARITY_HEADER = ['Term', 'VIF', 'Tolerance'];
/** Without an intercept: the centered VIF (the inflation of the standard error) first, the uncentered one labelled beside it. */
export const NO_INTERCEPT_COLLINEARITY_HEADER = ['Term', 'VIF (centered)', 'Tolerance', 'VIF (uncentered)'];

/**
 * One row per predictor term, then the condition number with its reading in the third column.
 * A term with no VIF (constant, an exact combination of the others, or standing in for the
 * intercept) shows the reason where its tolerance would be, so the blank beside it is explained.
 */
export function collinearityGrid(result: Collinearity): Grid {
  const termRow = (t: TermCollinearity): GridCell[] => [
    t.name,
    finiteOrBlank(t.vif),
    t.undefinedBecause === undefined ? finiteOrBlank(t.tolerance) : COLLINEARITY_REASON_TEXT[t.undefinedBecause],
  ];
  const condition: GridCell[] = ['Condition number', finiteOrBlank(result.conditionNumber), conditionReading(result.conditionNumber)];
  if (result.hasIntercept) return [[...COLLINEARITY_HEADER], ...result.terms.map(termRow), condition];
  return [[...NO_INTERCEPT_COLLINEARITY_HEADER], ...result.terms.map((t) => [...termRow(t), finiteOrBlank(t.uncenteredVif ?? Number.NaN)]), [...condition, '']];
}
