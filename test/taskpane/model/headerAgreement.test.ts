/**
 * The header rule is the engine's own (its model frame decides it for the cell functions), so the
 * pane's two ways of reading data name the columns alike on tricky headers: text that looks like a
 * number, a blank header (named by its worksheet column), a header longer than a cell name may be (cut to
 * engine NAME_LIMIT), and a number where a predictor's header should be (an error naming the
 * cell). Invented data (no source).
 */
import { describe, expect, it } from 'vitest';
import type { CellValue } from '../../../src/engine';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import { bothSources, failureOf, sourcesFor } from './bothSources';

const y = [3.1, 4.2, 5.0, 6.3, 6.9, 8.1, 9.2, 9.8, 11.1, 12.0, 13.2, 13.8, 15.1, 16.2];
const a = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14];
const b = [2, 1, 4, 3, 6, 5, 8, 7, 10, 9, 12, 11, 14, 13];
const c = [5, 3, 6, 2, 7, 1, 8, 4, 9, 6, 3, 7, 2, 8];

function namesBothWays(headers: CellValue[], choices: PaneChoices) {
  const { cells, streamed } = bothSources(
    ['Yield', ...y],
    [a, b, c].map((column, j) => [headers[j], ...column]),
    choices,
  );
  return {
    cells: { predictors: cells.predictorNames, terms: cells.fit?.terms.map((t) => t.name) },
    streamed: { predictors: streamed.predictorNames, terms: streamed.fit?.terms.map((t) => t.name) },
  };
}

describe('one header rule for cells and streams', () => {
  it.each<[string, CellValue[], PaneChoices]>([
    ['text that looks like a number', ['2024', ' 7.5 ', 'c'], EMPTY_CHOICES],
    ['a blank header', ['a', '', 'c'], EMPTY_CHOICES],
    ['a header longer than a name may be', ['a'.repeat(1500), 'b', 'c'], EMPTY_CHOICES],
  ])('names the columns alike: %s', (_case, headers, choices) => {
    const named = namesBothWays(headers, choices);
    expect(named.streamed).toEqual(named.cells);
  });

  it('names a blank-header column by its worksheet column', () => {
    const named = namesBothWays(['a', '', 'c'], EMPTY_CHOICES);
    expect(named.cells.predictors).toEqual(['a', 'column C', 'c']);
  });

  it('names a blank-header column the live report gathers by its column there, as the report’s cell functions see it', () => {
    // The added set puts B after C and D, so the live report gathers C, D, B into Y, Z, AA
    // (reportSources.test.ts runs the report). Streamed data get a values report, read in place.
    const named = namesBothWays(['', 'b', 'c'], { ...EMPTY_CHOICES, added: [0] });
    expect(named.cells.predictors).toEqual(['column AA', 'b', 'c']);
    expect(named.streamed.predictors).toEqual(['column B', 'b', 'c']);
  });

  it('refuses a number as a predictor header under a text response header, in the same words', () => {
    const response = ['Yield', ...y].map((v) => [v]);
    const columns = [
      ['a', ...a],
      [7, ...b],
    ].map((column) => column.map((v) => [v]));
    const sources = sourcesFor(2, y.length + 1);
    const fromCells = failureOf(() => analyzeCells({ response, predictorColumns: columns, weights: undefined, sources }, EMPTY_CHOICES));
    const fromStream = failureOf(() =>
      bothSources(
        ['Yield', ...y],
        [
          ['a', ...a],
          [7, ...b],
        ],
        EMPTY_CHOICES,
      ),
    );
    expect(fromCells).toContain('Data!C1 holds 7');
    expect(fromStream).toBe(fromCells);
  });
});
