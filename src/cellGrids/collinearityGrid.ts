import { COLLINEARITY_REASON_TEXT, type Collinearity, conditionReading } from '../engine';
import { finiteOrBlank, type Grid } from './gridCell';

export const COLLINEARITY_HEADER = ['Term', 'VIF', 'Tolerance'];

/**
 * One row per predictor term, then the condition number with its reading in the third column.
 * A term with no VIF (constant, or an exact combination of the others) shows the reason where its
 * tolerance would be, so the blank beside it is explained.
 */
export function collinearityGrid(result: Collinearity): Grid {
  return [
    [...COLLINEARITY_HEADER],
    ...result.terms.map((t) => [
      t.name,
      finiteOrBlank(t.vif),
      t.undefinedBecause === undefined ? finiteOrBlank(t.tolerance) : COLLINEARITY_REASON_TEXT[t.undefinedBecause],
    ]),
    ['Condition number', finiteOrBlank(result.conditionNumber), conditionReading(result.conditionNumber)],
  ];
}
