/**
 * One warnings module for both ways of reading the data: the same cells give the same data
 * warnings whether they were held as cells or streamed in blocks. Without an intercept, a
 * categorical column that keeps one indicator per level spans the constant, so the model is the
 * model with an intercept written with one mean per level (common practice, no source). A
 * constant predictor, or two predictors with the same values, cannot be estimated apart (common
 * practice, no source). Invented data (no source).
 */
import { describe, expect, it } from 'vitest';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import type { PaneAnalysis } from '../../../src/taskpane/model/paneAnalysis';
import { bothSources, sourcesFor } from './bothSources';

// Yield against grind size and origin.
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

function categoricalWarnings(intercept: boolean): string[] {
  const analysis = analyzeCells(
    {
      response: grid.map((r) => [r[0]]),
      predictorColumns: [grid.map((r) => [r[1]]), grid.map((r) => [r[2]])],
      weights: undefined,
      sources: sourcesFor(2, grid.length),
    },
    { ...EMPTY_CHOICES, intercept },
  );
  return analysis.warnings.map((w) => w.text);
}

/** The data warnings, in order: the residual checks run on the cells path only. */
const dataTexts = (analysis: PaneAnalysis) => analysis.warnings.filter((w) => w.about === 'data').map((w) => w.text);

const y = [3.1, 4.2, 5.0, 6.3, 6.9, 8.1, 9.2, 9.8, 11.1, 12.0, 13.2, 13.8, 15.1, 16.2];
const a = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14];
const b = [2, 1, 4, 3, 6, 5, 8, 7, 10, 9, 12, 11, 14, 13];

describe('paneWarnings', () => {
  it('says that a no-intercept model with every level of a category is the model with an intercept', () => {
    expect(categoricalWarnings(false).find((w) => w.startsWith('Without an intercept'))).toBe(
      'Without an intercept, Origin keeps one indicator per level and they sum to 1: this is the same model as with an intercept (same fitted values, same estimates and standard errors for the other predictors), written with one mean per level; only R² and F are measured from 0 instead of from the mean.',
    );
    expect(categoricalWarnings(true).some((w) => w.startsWith('Without an intercept'))).toBe(false);
  });

  // The streamed path used to say only "cannot be estimated (… or constant)": it now names a
  // constant column from its range, as the cells path does from its rows.
  it('names a constant predictor on both paths alike', () => {
    const constant = a.map(() => 5);
    const { cells, streamed } = bothSources(
      ['y', ...y],
      [
        ['a', ...a],
        ['c', ...constant],
      ],
      EMPTY_CHOICES,
    );
    const said = 'c is constant in the rows used, so its effect cannot be estimated.';
    expect(dataTexts(cells)).toContain(said);
    expect(dataTexts(streamed)).toEqual(dataTexts(cells));
  });

  it('names two predictors with the same values on both paths alike', () => {
    const { cells, streamed } = bothSources(
      ['y', ...y],
      [
        ['a', ...a],
        ['b', ...b],
        ['copy', ...a],
      ],
      EMPTY_CHOICES,
    );
    const said = 'a and copy hold the same values: only one of them can be estimated.';
    expect(dataTexts(cells)).toContain(said);
    expect(dataTexts(streamed)).toEqual(dataTexts(cells));
  });

  it('lists skipped rows and few residual degrees of freedom in the same words on both paths', () => {
    const short = ['y', 3.1, '', 5.0, 6.3, '#N/A', 8.1];
    const { cells, streamed } = bothSources(
      short,
      [
        ['a', 1, 2, 3, 4, 5, 6],
        ['b', 2, 1, 4, 3, 6, 5],
      ],
      EMPTY_CHOICES,
      undefined,
      3,
    );
    const texts = dataTexts(cells);
    expect(texts).toContain('2 rows left out: row 3 (blank in y), row 6 (#N/A in y).');
    expect(texts.some((t) => t.startsWith('Only 4 rows for 3 parameters'))).toBe(true);
    expect(dataTexts(streamed)).toEqual(texts);
  });

  it('says on the streamed path what it could not check', () => {
    const { cells, streamed } = bothSources(
      ['y', ...y],
      [
        ['a', ...a],
        ['b', ...b],
      ],
      EMPTY_CHOICES,
    );
    expect(cells.unchecked).toEqual([]);
    expect(streamed.unchecked.some((t) => t.includes('residual checks') && t.includes('were not run'))).toBe(true);
    expect(streamed.unchecked.some((t) => t.startsWith('Large data: hidden extrapolation'))).toBe(true);
  });
});
