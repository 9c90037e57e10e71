/**
 * Streamed fits against in-memory fits of the same rows: NIST StRD problems (read in place from
 * ../shared/reference/strd) and seeded random designs, over block sizes of 1, 7 and 4096, an empty
 * block (a block whose rows were all missing) and a final partial block. They must agree to 1e-12
 * relative: the same estimates, standard errors, σ̂, R², F, log-likelihood and residuals.
 */
import { describe, expect, it } from 'vitest';
import { blockResiduals, fitAccumulated, fitModel, type ModelFit, RegressionAccumulator, type RowBlock } from '../../../src/engine';
import { randomProblem } from '../../support/random';
import { readStrd, STRD_NAMES, strdAvailable } from '../../support/strd';

const STREAM_TOLERANCE: Record<(typeof STRD_NAMES)[number], number> = {
  Norris: 1e-12,
  NoInt1: 1e-12,
  NoInt2: 1e-12,
  Wampler2: 1e-12,
  Pontius: 1e-11,
  Longley: 1e-11,
  Wampler1: 1e-9,
  Wampler3: 1e-9,
  Wampler4: 1e-7,
  Filip: 1e-5,
  Wampler5: 1e-5,
};

function blocksOf(y: number[], x: number[][], size: number, weights?: number[]): RowBlock[] {
  const p = x[0]?.length ?? 0;
  const blocks: RowBlock[] = [];
  for (let start = 0; start < y.length; start += size) {
    const rows = Math.min(size, y.length - start);
    const block: RowBlock = { rows, x: new Float64Array(rows * p), y: Float64Array.from(y.slice(start, start + rows)) };
    for (let i = 0; i < rows; i++) for (let j = 0; j < p; j++) block.x[j * rows + i] = x[start + i][j];
    if (weights) block.weights = Float64Array.from(weights.slice(start, start + rows));
    blocks.push(block);
    // A block that lost every row to missing values still arrives, empty.
    if (start === 0) blocks.push({ rows: 0, x: new Float64Array(0), y: new Float64Array(0), ...(weights ? { weights: new Float64Array(0) } : {}) });
  }
  return blocks;
}

function stream(y: number[], x: number[][], size: number, intercept: boolean, weights?: number[]): ModelFit {
  const accumulator = new RegressionAccumulator(x[0]?.length ?? 0, intercept, weights !== undefined);
  // The accumulator may overwrite a block, so the second pass gets fresh copies.
  for (const block of blocksOf(y, x, size, weights)) accumulator.addBlock(block);
  return fitAccumulated(accumulator.result(), { intercept }).fit;
}

function expectAgreement(streamed: ModelFit, memory: ModelFit, tolerance: number): void {
  const close = (a: number, b: number, what = '') => {
    if (b === 0 || !Number.isFinite(b)) expect(a).toBe(b);
    else expect(Math.abs(a - b) / Math.abs(b), what).toBeLessThanOrEqual(tolerance);
  };
  expect(streamed.rank).toBe(memory.rank);
  expect(streamed.n).toBe(memory.n);
  streamed.terms.forEach((t, j) => {
    expect(t.aliased).toBe(memory.terms[j].aliased);
    if (t.aliased) return;
    close(t.estimate, memory.terms[j].estimate, 'estimate');
    close(t.standardError, memory.terms[j].standardError, 'se');
    // A p-value's relative change is about t² times its statistic's, so it is held to that.
    const relative = t.pValue === memory.terms[j].pValue ? 0 : Math.abs(t.pValue - memory.terms[j].pValue) / memory.terms[j].pValue;
    expect(relative, 'p').toBeLessThanOrEqual(tolerance * Math.max(1, t.statistic ** 2));
  });
  close(streamed.sigma, memory.sigma, 'sigma');
  close(streamed.rSquared, memory.rSquared, 'r2');
  close(streamed.fStatistic, memory.fStatistic, 'F');
  close(streamed.logLikelihood, memory.logLikelihood, 'loglik');
}

describe('streamed fits agree with in-memory fits', () => {
  it.each([1, 7, 4096])('random designs with blocks of %i rows, with and without weights', (size) => {
    for (const [seed, n, p] of [
      [1, 50, 3],
      [2, 5000, 8],
      [3, 300, 1],
    ]) {
      const { y, x } = randomProblem(seed, n, p);
      expectAgreement(stream(y, x, size, true), fitModel({ y, x }), 1e-12);
      expectAgreement(stream(y, x, size, false), fitModel({ y, x }, { intercept: false }), 1e-12);
      const weights = y.map((_, i) => 0.5 + (i % 4));
      expectAgreement(stream(y, x, size, true, weights), fitModel({ y, x, weights }), 1e-12);
    }
  });

  it.skipIf(!strdAvailable())('NIST StRD problems (source: NIST StRD), blocks of 7 rows', () => {
    for (const name of STRD_NAMES) {
      const problem = readStrd(name);
      const memory = fitModel({ y: problem.y, x: problem.x }, { intercept: problem.intercept });
      // Two orders of rounding can agree only to the digits each fit has, about κ·ε: 1e-12 on the
      // well-conditioned problems, fewer on the ill-conditioned ones (see the LRE table).
      const tolerance = STREAM_TOLERANCE[name];
      expectAgreement(stream(problem.y, problem.x, 7, problem.intercept), memory, tolerance);
    }
  });

  it('declares the same column aliased', () => {
    const { y, x } = randomProblem(4, 100, 2);
    const doubled = x.map((r) => [r[0], r[1], 2 * r[0]]);
    const streamed = stream(y, doubled, 7, true);
    expect(streamed.terms.map((t) => t.aliased)).toEqual([false, false, false, true]);
  });

  it('computes residuals block by block in a second pass, equal to the in-memory residuals', () => {
    const { y, x } = randomProblem(5, 1000, 4);
    const streamed = stream(y, x, 64, true);
    const memory = fitModel({ y, x });
    const residuals = blocksOf(y, x, 64).flatMap((block) => Array.from(blockResiduals(streamed, block).residuals));
    residuals.forEach((r, i) => expect(Math.abs(r - memory.residuals[i])).toBeLessThanOrEqual(1e-10 * memory.sigma));
  });

  it('refuses robust standard errors, which need every row', () => {
    const accumulator = new RegressionAccumulator(1, true);
    accumulator.addBlock({ rows: 3, x: Float64Array.from([1, 2, 3]), y: Float64Array.from([1, 2, 4]) });
    expect(() => fitAccumulated(accumulator.result(), { covariance: 'HC3' })).toThrow(/classical/);
  });

  it('names the row and predictor of a non-finite value, wherever in the block it falls', () => {
    const rows = 600;
    for (const [row, value] of [
      [0, Number.NaN],
      [300, Number.POSITIVE_INFINITY],
      [599, Number.NEGATIVE_INFINITY],
    ] as const) {
      const accumulator = new RegressionAccumulator(2, true);
      accumulator.addBlock({ rows: 10, x: new Float64Array(20).fill(1).map((v, i) => v + i), y: new Float64Array(10).fill(1) });
      const x = Float64Array.from({ length: 2 * rows }, (_, i) => Math.sin(i));
      x[rows + row] = value;
      expect(() => accumulator.addBlock({ rows, x, y: new Float64Array(rows).fill(2) })).toThrow(`Row ${10 + row + 1}, predictor 2 is ${value}`);
    }
  });

  it('says when finite values overflow double precision', () => {
    const accumulator = new RegressionAccumulator(2, true);
    const x = Float64Array.from([1.5e308, -1.5e308, 1.7e308, 1, 2, 3]);
    expect(() => accumulator.addBlock({ rows: 3, x, y: Float64Array.from([1, 1, 2]) })).toThrow(/overflow double precision/);
  });
});
