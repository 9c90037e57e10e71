/**
 * The pane's list of every check says exactly what PLUMB.CHECKS says (issue #14: one story in the
 * pane, the report and the cells). Data: R's `cars` (dist ~ speed; McNeil 1977, in R's datasets),
 * whose speeds repeat, so lack of fit is tested too, and R's `mtcars` (mpg ~ wt + hp), whose
 * settings do not repeat; values as committed in test/engine/infer/fixtures/checks.json.
 */
import { describe, expect, it } from 'vitest';
import { checks } from '../../src/functions/functions';
import { assumptionChecks, buildModelFrame, type CellGrid } from '../../src/engine';
import { checkList } from '../../src/presentation';
import { column, columns } from '../support/cells';
import { checksFixture, type DurbinWatsonCase } from '../support/checksFixture';

const fixture = checksFixture;

function listAndGrid(c: DurbinWatsonCase) {
  const x = c.design.map((row) => row.slice(1));
  const names = x[0].map((_, j) => `x${j + 1}`);
  const y = column('y', c.y);
  const predictors = columns(names, x);
  const frame = buildModelFrame({ y: y as CellGrid, x: [predictors as CellGrid], intercept: true });
  return { list: checkList(assumptionChecks(frame.data, undefined, frame.usedRows)), grid: checks(y, predictors) as unknown[][] };
}

const readingOf = (grid: unknown[][], label: string) => grid.find((r) => r[0] === label)?.[1];

describe('checkList', () => {
  for (const name of ['lm(dist ~ speed, cars)', 'lm(mpg ~ wt + hp, mtcars)']) {
    it(`gives CHECKS' own readings, outliers first: ${name}`, () => {
      const c = fixture.durbinWatson.find((k) => k.name === name);
      expect(c, name).toBeDefined();
      const { list, grid } = listAndGrid(c as DurbinWatsonCase);
      expect(list.map((l) => l.reading)).toEqual(
        ['Outlier reading', 'DW reading', 'BP reading', 'SW reading', 'LOF reading'].map((label) => readingOf(grid, label)),
      );
      expect(list[0].question).toBe('A row far off the others?');
    });
  }
});
