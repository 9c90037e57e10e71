/**
 * The streamed analysis against the in-memory one on the same cells: the fit, the fit without an
 * intercept, the nested test of an added set that is not at the right end, known σ, and
 * predictions from the covariance against predict(). Seeded random data; the engine's own
 * numbers are checked against outside sources in test/engine.
 */
import { describe, expect, it } from 'vitest';
import { compareNested, predict, RegressionAccumulator } from '../../../src/engine';
import { analyze } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import { analyzeStreamed, type StreamedData } from '../../../src/taskpane/model/streamedAnalysis';
import { predictStreamed } from '../../../src/taskpane/model/streamedPredict';
import { randomProblem } from '../../support/random';

const n = 500;
const p = 3;
const { y, x } = randomProblem(7, n, p);

function streamed(blockRows: number): StreamedData {
  const accumulator = new RegressionAccumulator(p, true);
  for (let start = 0; start < n; start += blockRows) {
    const rows = Math.min(blockRows, n - start);
    const xs = new Float64Array(rows * p);
    for (let j = 0; j < p; j++) for (let i = 0; i < rows; i++) xs[j * rows + i] = x[start + i][j];
    accumulator.addBlock({ rows, x: xs, y: Float64Array.from(y.slice(start, start + rows)) });
  }
  return {
    header: { hasHeader: true, responseName: 'y', predictorNames: ['a', 'b', 'c'] },
    accumulated: accumulator.result(),
    skipped: 0,
    skippedExamples: [],
  };
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
    const memory = analyze(cells, choices);
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
    const accumulator = new RegressionAccumulator(2, true);
    const a = Float64Array.from(x, (r) => r[0]);
    accumulator.addBlock({ rows: n, x: Float64Array.from([...a, ...a]), y: Float64Array.from(y) });
    const data: StreamedData = {
      header: { hasHeader: false, responseName: 'y', predictorNames: ['x1', 'x2'] },
      accumulated: accumulator.result(),
      skipped: 0,
      skippedExamples: [],
    };
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

describe('predictStreamed', () => {
  it('gives predict()’s estimates and intervals from the covariance, in fit order', () => {
    const choices = { ...EMPTY_CHOICES, added: [0] };
    const stream = analyzeStreamed(streamed(64), choices);
    const grid = [
      ['a', 'b', 'c'],
      [0.5, -1, 2],
      [1, '', 3],
      [-2, 0.25, 0],
    ];
    const { predictions, headerRow } = predictStreamed(grid, stream);
    expect(headerRow).toBe(true);
    expect(predictions[1]).toBeUndefined();
    // The fit puts the added column last, so predict() is given the columns in that order.
    const reorder = (r: number[]) => [r[1], r[2], r[0]];
    const expected = predict({ y, x: x.map(reorder) }, [reorder([0.5, -1, 2]), reorder([-2, 0.25, 0])]);
    [predictions[0], predictions[2]].forEach((got, i) => {
      if (got === undefined) throw new Error('missing prediction');
      close(got.estimate, expected[i].estimate);
      close(got.meanLow, expected[i].meanLow);
      close(got.newHigh, expected[i].newHigh);
    });
  });

  it('names a new cell that is not a number', () => {
    const stream = analyzeStreamed(streamed(64), EMPTY_CHOICES);
    expect(() => predictStreamed([[1, 'x', 2]], stream)).toThrow('New row 1, column 2 ("b") holds the text "x"; it needs a number.');
  });
});
