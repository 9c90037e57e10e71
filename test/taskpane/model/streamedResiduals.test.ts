/**
 * The residual table of a values report, computed block by block in a second pass, against the
 * in-memory fit's residuals on the same cells (seeded random data; the engine's residuals are
 * checked against outside sources in test/engine), with an added set out of sheet order, no
 * intercept, and a skipped row that must keep its place in the Row numbers.
 */
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../../src/engine';
import { type BlockSources, convertBlock } from '../../../src/taskpane/model/blockRows';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import { analyzeStreamed } from '../../../src/taskpane/model/streamedAnalysis';
import { residualRows } from '../../../src/taskpane/model/streamedResiduals';
import { StreamFold } from '../../../src/taskpane/model/streamFold';
import { randomProblem } from '../../support/random';

const n = 300;
const { y, x } = randomProblem(12, n, 3);
const sheetRef = (left: number) => ({ sheet: 'Data', top: 0, left, bottom: n, right: left });
const sources = { response: sheetRef(0), predictors: [sheetRef(1), sheetRef(2), sheetRef(3)], weights: undefined };
// Row 6 of the data (sheet row 7) is blank in y and must be skipped, keeping the others' numbers.
const column = (values: (number | string)[], name: string) => [[name], ...values.map((v) => [v])];
const yCells = y.map((v, i) => (i === 5 ? '' : v));
const values = {
  response: column(yCells, 'y'),
  predictors: [0, 1, 2].map((j) =>
    column(
      x.map((r) => r[j]),
      ['a', 'b', 'c'][j],
    ),
  ),
  weights: undefined,
};

/** The blocks folded as a streamed read folds them. */
function folded(blockSources: BlockSources) {
  const fold = new StreamFold(blockSources, n + 1);
  for (const b of blocks(64)) fold.add(b.values, b.offset);
  return fold.result();
}

function blocks(size: number) {
  const out = [];
  for (let offset = 0; offset < n + 1; offset += size) {
    const slice = (grid: unknown[][]) => grid.slice(offset, offset + size);
    out.push({ offset, values: { response: slice(values.response), predictors: values.predictors.map(slice), weights: undefined } });
  }
  return out;
}

describe('residualRows', () => {
  it.each<[string, PaneChoices]>([
    ['default', EMPTY_CHOICES],
    ['added set first in the sheet', { ...EMPTY_CHOICES, added: [0] }],
    ['no intercept', { ...EMPTY_CHOICES, intercept: false }],
  ])('matches the in-memory residuals row by row: %s', (_name, choices) => {
    const analysis = analyzeStreamed(folded(sources), choices);
    const table = blocks(64).flatMap((b) => residualRows(convertBlock(b.values, sources, analysis.header, b.offset), analysis));
    const keep = y.map((_, i) => i !== 5);
    const memory = fitModel({ y: y.filter((_, i) => keep[i]), x: x.filter((_, i) => keep[i]) }, { intercept: choices.intercept });
    expect(table).toHaveLength(n - 1);
    expect(table.slice(4, 6).map((r) => r[0])).toEqual([6, 8]);
    table.forEach(([, fitted, residual], i) => {
      expect(Math.abs(fitted - memory.fitted[i])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(memory.fitted[i])));
      expect(Math.abs(residual - memory.residuals[i])).toBeLessThanOrEqual(1e-9 * memory.sigma);
    });
  });

  it('names each row by its worksheet row when the data start further down the sheet', () => {
    // The same cells with their header on sheet row 10: the blank y is on sheet row 16.
    const lowerRef = (left: number) => ({ sheet: 'Data', top: 9, left, bottom: n + 9, right: left });
    const lower = { response: lowerRef(0), predictors: [lowerRef(1), lowerRef(2), lowerRef(3)], weights: undefined };
    const analysis = analyzeStreamed(folded(lower), EMPTY_CHOICES);
    const table = blocks(64).flatMap((b) => residualRows(convertBlock(b.values, lower, analysis.header, b.offset), analysis));
    expect(table.slice(0, 6).map((r) => r[0])).toEqual([11, 12, 13, 14, 15, 17]);
    expect(table[table.length - 1][0]).toBe(n + 10);
  });
});
