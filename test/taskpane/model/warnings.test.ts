/**
 * The data warnings of the pane. Without an intercept, a categorical column that keeps one
 * indicator per level spans the constant, so the model is the model with an intercept written
 * with one mean per level (common practice, no source): the pane says so.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, fitModel } from '../../../src/engine';
import { dataWarnings } from '../../../src/taskpane/model/warnings';

// Invented data (no source): yield against grind size and origin.
const grid: (string | number)[][] = [
  ['Yield', 'Grind', 'Origin'],
  [20.1, 400, 'North'],
  [21.4, 410, 'South'],
  [19.8, 395, 'East'],
  [20.9, 405, 'North'],
  [22.0, 415, 'South'],
  [20.2, 398, 'East'],
  [21.1, 402, 'North'],
  [21.9, 412, 'South'],
];

function warningsFor(intercept: boolean): string[] {
  const frame = buildModelFrame({ y: grid.map((r) => [r[0]]), x: [grid.map((r) => r.slice(1))], intercept });
  return dataWarnings(frame, fitModel(frame.data, { intercept }));
}

describe('dataWarnings', () => {
  it('says that a no-intercept model with every level of a category is the model with an intercept', () => {
    const note = warningsFor(false).find((w) => w.startsWith('Without an intercept'));
    expect(note).toBe(
      'Without an intercept, Origin keeps one indicator per level and they sum to 1: this is the same model as with an intercept (same fitted values, same estimates and standard errors for the other predictors), written with one mean per level; only R² and F are measured from 0 instead of from the mean.',
    );
  });

  it('says nothing of the kind with an intercept', () => {
    expect(warningsFor(true).some((w) => w.startsWith('Without an intercept'))).toBe(false);
  });
});
