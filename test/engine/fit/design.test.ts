/**
 * The weighted design: rows or packed predictors give the same columns, and the column sums of
 * squares gathered on the way are the ones a norm of each column would take. Common practice (no
 * source): the design is X with a leading column of ones, column-major.
 */
import { describe, expect, it } from 'vitest';
import { buildDesign, type PackedRows } from '../../../src/engine/fit/design';
import { EngineError } from '../../../src/engine/errors';
import { randomProblem } from '../../support/random';

function packedOf(x: number[][]): PackedRows {
  const p = x[0]?.length ?? 0;
  return { values: Float64Array.from(x.flat()), rows: x.length, p };
}

describe('buildDesign', () => {
  it('lays rows out as columns after the intercept', () => {
    const design = buildDesign(
      [1, 2, 3],
      [
        [4, 5],
        [6, 7],
        [8, 9],
      ],
      true,
      ['a', 'b'],
      undefined,
    );
    expect(design.names).toEqual(['Intercept', 'a', 'b']);
    expect(Array.from(design.matrix.data)).toEqual([1, 1, 1, 4, 6, 8, 5, 7, 9]);
    expect(design.columnSquares && Array.from(design.columnSquares)).toEqual([3, 16 + 36 + 64, 25 + 49 + 81]);
  });

  it('builds the same design, bit for bit, from packed predictors as from rows', () => {
    const { y, x } = randomProblem(7, 300, 5);
    for (const intercept of [true, false]) {
      const fromRows = buildDesign(y, x, intercept, undefined, undefined);
      const fromPacked = buildDesign(y, packedOf(x), intercept, undefined, undefined);
      expect(fromPacked.matrix).toEqual(fromRows.matrix);
      expect(fromPacked.columnSquares).toEqual(fromRows.columnSquares);
      expect(fromPacked.names).toEqual(fromRows.names);
    }
  });

  it('gathers each column sum of squares in row order, as a norm of the column adds them', () => {
    const { y, x } = randomProblem(11, 1000, 4);
    const design = buildDesign(y, x, true, undefined, undefined);
    const { rows, cols, data } = design.matrix;
    for (let j = 0; j < cols; j++) {
      let sum = 0;
      for (let i = 0; i < rows; i++) sum += data[j * rows + i] * data[j * rows + i];
      expect(design.columnSquares?.[j]).toBe(sum);
    }
  });

  it('leaves the sums out of a weighted design, whose columns change after they are taken', () => {
    const design = buildDesign([1, 2, 3], [[1], [2], [3]], true, undefined, [1, 4, 9]);
    expect(design.columnSquares).toBeUndefined();
    expect(Array.from(design.matrix.data)).toEqual([1, 2, 3, 1, 4, 9]);
  });

  it('names the first non-finite cell, in row order, whichever way the predictors come', () => {
    const x = [
      [1, 2],
      [3, Number.NaN],
      [Number.POSITIVE_INFINITY, 4],
    ];
    for (const predictors of [x, packedOf(x)]) {
      expect(() => buildDesign([1, 2, 3], predictors, true, undefined, undefined)).toThrow(EngineError);
      expect(() => buildDesign([1, 2, 3], predictors, true, undefined, undefined)).toThrow('x column 2 in row 2 is NaN');
    }
  });

  it('refuses packed predictors with another row count than y', () => {
    expect(() => buildDesign([1, 2], packedOf([[1], [2], [3]]), true, undefined, undefined)).toThrow('y has 2 rows but x has 3');
  });
});
