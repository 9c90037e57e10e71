/**
 * The streamed analysis against the in-memory one on the same cells: the fit, the fit without an
 * intercept, the nested test of an added set that is not at the right end, known σ, and
 * predictions from the covariance against predict(). Seeded random data; the engine's own
 * numbers are checked against outside sources in test/engine.
 */
import { describe, expect, it } from 'vitest';
import { compareNested, predict } from '../../../src/engine';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import type { BlockSources } from '../../../src/taskpane/model/blockRows';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import { analyzeStreamed, type StreamedData } from '../../../src/taskpane/model/streamedAnalysis';
import { StreamFold } from '../../../src/taskpane/model/streamFold';
import { randomProblem } from '../../support/random';

const n = 500;
const p = 3;
const { y, x } = randomProblem(7, n, p);

const sheetColumn = (left: number) => ({ sheet: 'Data', top: 0, bottom: n, left, right: left });
const sources: BlockSources = { response: sheetColumn(0), predictors: [1, 2, 3].map(sheetColumn), weights: undefined };

/** Columns of sheet values (header first), folded in blocks of `blockRows` as a streamed read folds them. */
function folded(columns: unknown[][], blockSources: BlockSources, blockRows: number): StreamedData {
  const fold = new StreamFold(blockSources, columns[0].length);
  for (let offset = 0; offset < columns[0].length; offset += blockRows) {
    const block = columns.map((c) => c.slice(offset, offset + blockRows).map((v) => [v]));
    fold.add({ response: block[0], predictors: block.slice(1), weights: undefined }, offset);
  }
  return fold.result();
}

function streamed(blockRows: number): StreamedData {
  return folded([['y', ...y], ...[0, 1, 2].map((j) => [['a', 'b', 'c'][j], ...x.map((r) => r[j])])], sources, blockRows);
}

const cells = {
  response: [['y'], ...y.map((v) => [v])],
  predictorColumns: [0, 1, 2].map((j) => [[['a', 'b', 'c'][j]], ...x.map((r) => [r[j]])]),
  weights: undefined,
  sources: {
    response: { sheet: 'Data', top: 0, bottom: n, left: 0, right: 0 },
    predictors: [1, 2, 3].map((column) => ({ sheet: 'Data', top: 0, bottom: n, left: column, right: column })),
    weights: undefined,
  },
};

const close = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));

describe('analyzeStreamed', () => {
  const cases: [string, PaneChoices][] = [
    ['default', EMPTY_CHOICES],
    ['no intercept', { ...EMPTY_CHOICES, intercept: false }],
    ['added set in the middle', { ...EMPTY_CHOICES, added: [1] }],
    ['known sigma, 90%', { ...EMPTY_CHOICES, knownSigma: '1.5', level: 0.9, added: [0, 2] }],
  ];

  it.each(cases)('matches the in-memory analysis: %s', (_name, choices) => {
    const memory = analyzeCells(cells, choices);
    const stream = analyzeStreamed(streamed(128), choices);
    expect(stream.fit?.terms.map((t) => t.name)).toEqual(memory.fit?.terms.map((t) => t.name));
    stream.fit?.terms.forEach((t, i) => {
      const m = memory.fit?.terms[i];
      if (m === undefined) throw new Error('missing term');
      close(t.estimate, m.estimate);
      close(t.standardError, m.standardError);
      close(t.ciLow, m.ciLow);
    });
    close(stream.fit?.rSquared ?? Number.NaN, memory.fit?.rSquared ?? 0);
    close(stream.fit?.fStatistic ?? Number.NaN, memory.fit?.fStatistic ?? 0);
    if (choices.added.length > 0) {
      expect(stream.addedNames).toEqual(memory.addedNames);
      const m = memory.nested;
      const s = stream.nested;
      if (m === undefined || s === undefined) throw new Error('nested test missing');
      close(s.f, m.f);
      close(s.pValue, m.pValue);
      close(s.rssBase, m.rssBase);
      expect([s.dfNumerator, s.dfDenominator, s.addedHelp]).toEqual([m.dfNumerator, m.dfDenominator, m.addedHelp]);
      expect(Math.abs(s.fCritical - m.fCritical)).toBeLessThan(1e-6 * m.fCritical);
    }
  });

  it('reports robust standard errors as unavailable rather than giving classical ones under their name', () => {
    const stream = analyzeStreamed(streamed(100), { ...EMPTY_CHOICES, robust: 'HC3' });
    expect(stream.fit).toBeUndefined();
    expect(stream.fitError).toMatch(/Robust standard errors need every row/);
  });

  it('says when the added column is a copy of a base column, as compareNested does', () => {
    const a = x.map((r) => r[0]);
    const data = folded([y, a, a], { ...sources, predictors: sources.predictors.slice(0, 2) }, n);
    const stream = analyzeStreamed(data, { ...EMPTY_CHOICES, added: [1] });
    expect(stream.nested).toBeUndefined();
    expect(stream.nestedError).toBe(
      (() => {
        try {
          compareNested({ y, base: x.map((r) => [r[0]]), added: x.map((r) => [r[0]]) });
        } catch (error) {
          return (error as Error).message;
        }
        return 'no error';
      })(),
    );
  });
});

describe('streamed predictions', () => {
  const newRows = (cells: (number | string)[][]) => ({ cells, labelCells: undefined, sheetRows: cells.map((_, i) => 31 + i) });

  it('gives predict()’s estimates and intervals from the covariance, in fit order', () => {
    const choices = { ...EMPTY_CHOICES, added: [0] };
    const grid = [
      ['a', 'b', 'c'],
      [0.5, -1, 2],
      [1, '', 3],
      [-2, 0.25, 0],
    ];
    const { predictions } = analyzeStreamed({ ...streamed(64), newRows: newRows(grid) }, choices);
    // The repeated header row is not a new row; the blank one is kept, unpredicted.
    expect(predictions.map((p) => p.label)).toEqual(['Row 32', 'Row 33', 'Row 34']);
    expect(predictions[1].notPredicted).toBe('Not predicted: a blank in b.');
    // The fit puts the added column last, so predict() is given the columns in that order.
    const reorder = (r: number[]) => [r[1], r[2], r[0]];
    const expected = predict({ y, x: x.map(reorder) }, [reorder([0.5, -1, 2]), reorder([-2, 0.25, 0])]);
    [predictions[0], predictions[2]].forEach((got, i) => {
      close(got.estimate, expected[i].estimate);
      close(got.meanLow, expected[i].meanLow);
      close(got.newHigh, expected[i].newHigh);
    });
  });

  it('names a new cell that is not a number by its worksheet row', () => {
    const analysis = analyzeStreamed({ ...streamed(64), newRows: newRows([[1, 'x', 2]]) }, EMPTY_CHOICES);
    expect(analysis.predictions).toEqual([]);
    expect(analysis.predictionError).toBe('New row 31 ("b") holds the text "x"; it needs a number.');
  });
});
