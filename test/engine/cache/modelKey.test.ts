/**
 * The content-addressed key: a model frame's packed predictors and the same numbers as plain rows
 * give one key, and any changed number, bit pattern or setting gives another. Common practice (no
 * source): a content-addressed cache must hit on equal content and miss on any difference.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, modelCache, fitModel } from '../../../src/engine';
import { modelKey, sameKey, storedKey } from '../../../src/engine/cache/modelKey';
import type { ModelData } from '../../../src/engine';
import { randomProblem } from '../../support/random';

const { y, x } = randomProblem(15, 40, 3);
const frame = buildModelFrame({ y: y.map((v) => [v]), x: [x], intercept: true });
const plain: ModelData = { y: [...y], x: x.map((row) => [...row]) };

describe('modelKey', () => {
  it('keys a frame (predictors packed) and the same numbers as rows alike', () => {
    const packed = modelKey(frame.data, {}, '');
    const rows = modelKey(plain, {}, '');
    expect(packed.hash).toBe(rows.hash);
    expect(sameKey(storedKey(rows), packed)).toBe(true);
    expect(sameKey(storedKey(packed), rows)).toBe(true);
  });

  it('a frame and plain rows of the same numbers share one fit', () => {
    modelCache.reset();
    fitModel(frame.data);
    fitModel(plain);
    expect(modelCache.stats()).toMatchObject({ fits: 1, hits: 1 });
  });

  it('any one changed number, -0 for 0, or a setting is another key', () => {
    const stored = storedKey(modelKey(plain, {}, ''));
    const changedX: ModelData = { y: plain.y, x: plain.x.map((row, i) => (i === 39 ? [row[0], row[1], row[2] + 1e-12] : row)) };
    expect(sameKey(stored, modelKey(changedX, {}, ''))).toBe(false);
    const changedY: ModelData = { y: plain.y.map((v, i) => (i === 0 ? v * (1 + Number.EPSILON) : v)), x: plain.x };
    expect(sameKey(stored, modelKey(changedY, {}, ''))).toBe(false);
    const zeros: ModelData = { y: [0, 1, 2], x: [[0], [1], [3]] };
    const negativeZero: ModelData = { y: [-0, 1, 2], x: [[0], [1], [3]] };
    expect(sameKey(storedKey(modelKey(zeros, {}, '')), modelKey(negativeZero, {}, ''))).toBe(false);
    expect(sameKey(stored, modelKey(plain, { level: 0.9 }, ''))).toBe(false);
    expect(sameKey(stored, modelKey({ ...plain, weights: plain.y.map(() => 1) }, {}, ''))).toBe(false);
  });

  it('hands its packing of well-shaped rows to the fit, and none for a frame or rows a fit must refuse', () => {
    const key = modelKey(plain, {}, '');
    expect(key.rowsPacking).toMatchObject({ rows: 40, p: 3 });
    expect(Array.from(key.rowsPacking?.values.subarray(3, 6) ?? [])).toEqual(plain.x[1]);
    expect(modelKey(frame.data, {}, '').rowsPacking).toBeUndefined();
    expect(modelKey({ y: [1, 2, 3], x: [[1], [2, 5], [3]] }, {}, '').rowsPacking).toBeUndefined();
    expect(modelKey({ y: [1, 2, 3], x: [[1], [2], [3], [4]] }, {}, '').rowsPacking).toBeUndefined();
    const withNull = { y: [1, 2, 3], x: [[1], [null], [3]] } as unknown as ModelData;
    expect(modelKey(withNull, {}, '').rowsPacking).toBeUndefined();
  });

  it('a fit of rows holding null refuses them, though equal rows with 0 there were fitted before', () => {
    modelCache.reset();
    fitModel({ y: [1, 2, 4, 3], x: [[1], [0], [3], [4]] });
    const withNull = { y: [1, 2, 4, 3], x: [[1], [null], [3], [4]] } as unknown as ModelData;
    expect(() => fitModel(withNull)).toThrow('x column 1 in row 2');
  });

  it('a stored key keeps its numbers when the caller edits its arrays afterwards', () => {
    const data: ModelData = { y: [1, 2, 4, 3], x: [[1], [2], [3], [4]] };
    const stored = storedKey(modelKey(data, {}, ''));
    data.y[2] = 5;
    expect(sameKey(stored, modelKey(data, {}, ''))).toBe(false);
    data.y[2] = 4;
    expect(sameKey(stored, modelKey(data, {}, ''))).toBe(true);
  });

  it('compares long parts across the blocks they are read in', () => {
    // Longer than one read block (4096 numbers), so a difference past the first block must count.
    const n = 9000;
    const long: ModelData = { y: Array.from({ length: n }, (_, i) => i % 7), x: Array.from({ length: n }, (_, i) => [i]) };
    const stored = storedKey(modelKey(long, {}, ''));
    const edited: ModelData = { y: long.y.map((v, i) => (i === n - 1 ? v + 1 : v)), x: long.x };
    expect(sameKey(stored, modelKey(edited, {}, ''))).toBe(false);
    expect(sameKey(stored, modelKey({ y: [...long.y], x: long.x }, {}, ''))).toBe(true);
  });

  it('keys a weighted frame (weights packed) and the same numbers as rows alike', () => {
    const weights = y.map((_, i) => 1 + (i % 3));
    const weighted = buildModelFrame({ y: y.map((v) => [v]), x: [x], weights: weights.map((w) => [w]), intercept: true });
    const rows: ModelData = { ...plain, weights };
    const packed = modelKey(weighted.data, {}, '');
    expect(packed.hash).toBe(modelKey(rows, {}, '').hash);
    expect(sameKey(storedKey(modelKey(rows, {}, '')), packed)).toBe(true);
    expect(sameKey(storedKey(modelKey(plain, {}, '')), packed)).toBe(false);
  });
});
