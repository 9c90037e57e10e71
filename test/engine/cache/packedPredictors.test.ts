/**
 * predictorValues: the predictors of any ModelData as one row-major array, the model frame's own
 * registered array when it has one. Common practice (no source): packing must keep every number
 * and its position, and a memo must not outlive a replaced input.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame } from '../../../src/engine';
import { packedPredictorsOf, predictorValues } from '../../../src/engine/cache/packedPredictors';
import type { ModelData } from '../../../src/engine';

describe('predictorValues', () => {
  it('packs plain rows row-major, a missing number as NaN', () => {
    const data: ModelData = { y: [1, 2, 3], x: [[1, -0], [3, 4], [5]] };
    const packed = predictorValues(data);
    expect(packed.rows).toBe(3);
    expect(packed.p).toBe(2);
    expect(Array.from(packed.values)).toEqual([1, -0, 3, 4, 5, Number.NaN]);
    expect(Object.is(packed.values[1], -0)).toBe(true);
  });

  it('packs a data object once, and again when its x is replaced', () => {
    const data: ModelData = { y: [1, 2], x: [[1], [2]] };
    const first = predictorValues(data);
    expect(predictorValues(data)).toBe(first);
    data.x = [[7], [8]];
    const second = predictorValues(data);
    expect(second).not.toBe(first);
    expect(Array.from(second.values)).toEqual([7, 8]);
  });

  it("returns a model frame's registered array itself", () => {
    const frame = buildModelFrame({
      y: [[1], [2], [4], [3]],
      x: [
        [
          [1, 2],
          [2, 1],
          [3, 5],
          [4, 4],
        ],
      ],
      intercept: true,
    });
    const registered = packedPredictorsOf(frame.data);
    expect(registered).toBeDefined();
    const packed = predictorValues(frame.data);
    expect(packed).toBe(registered);
    expect(Array.from(packed.values)).toEqual(frame.data.x.flat());
  });

  it('handles data without predictors', () => {
    const packed = predictorValues({ y: [1, 2], x: [[], []] });
    expect(packed).toMatchObject({ rows: 2, p: 0 });
    expect(packed.values.length).toBe(0);
  });
});
