/** The PREDICT grid's layout and its extrapolation text (common practice, no source). */
import { describe, expect, it } from 'vitest';
import type { Prediction } from '../../src/engine';
import { extrapolationText, HIDDEN_EXTRAPOLATION_TEXT, PREDICT_HEADER, predictGrid } from '../../src/cellGrids/predictGrid';

const base: Prediction = {
  estimate: 5,
  meanLow: 4,
  meanHigh: 6,
  newLow: 2,
  newHigh: 8,
  leverage: 0.2,
  outsideRange: [],
  hiddenExtrapolation: false,
};
const NAMES = ['Temp', 'Batch', 'Batch'];

describe('predictGrid', () => {
  it('puts the extrapolation note after the five numbers, under its own header', () => {
    const grid = predictGrid([base, undefined, { ...base, outsideRange: [0] }], true, NAMES);
    expect(grid[0]).toEqual(PREDICT_HEADER);
    expect(grid[0][5]).toBe('Extrapolation');
    expect(grid[1]).toEqual([5, 4, 6, 2, 8, '']);
    expect(grid[2]).toEqual(['', '', '', '', '', '']);
    expect(grid[3][5]).toBe('Outside the data: Temp');
    expect(grid.every((row) => row.length === PREDICT_HEADER.length)).toBe(true);
  });

  it('keeps the note of a row whose numbers are not estimable', () => {
    const nan = Number.NaN;
    const [row] = predictGrid(
      [{ ...base, estimate: nan, meanLow: nan, meanHigh: nan, newLow: nan, newHigh: nan, leverage: nan, outsideRange: [2] }],
      false,
      NAMES,
    );
    expect(row).toEqual(['', '', '', '', '', 'Outside the data: Batch']);
  });

  it('names each predictor once, even when two of its indicator columns are outside', () => {
    expect(extrapolationText({ ...base, outsideRange: [0, 1, 2] }, NAMES)).toBe('Outside the data: Temp, Batch');
  });

  it('says hidden only when no value is outside its range', () => {
    expect(extrapolationText({ ...base, hiddenExtrapolation: true }, NAMES)).toBe(HIDDEN_EXTRAPOLATION_TEXT);
    expect(extrapolationText({ ...base, outsideRange: [0], hiddenExtrapolation: true }, NAMES)).toBe('Outside the data: Temp');
  });
});
