/**
 * New rows predicted the same way from cells and from a stream: the same labels, estimates and
 * outside-range flags (a value beyond the rows used is extrapolation, common practice, no
 * source). Hidden extrapolation (every value inside its range, but a leverage above every row
 * used: common practice, no source) needs every row's leverage, so only the cells path judges it
 * and the stream says it did not. Invented data (no source).
 */
import { describe, expect, it } from 'vitest';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import { rowLabel } from '../../../src/taskpane/model/newRowPredictions';
import { bothSources } from './bothSources';

// Two predictors that rise together, so a row low in one and high in the other is unlike the data.
const y = [3.1, 4.2, 5.0, 6.3, 6.9, 8.1, 9.2, 9.8, 11.1, 12.0, 13.2, 13.8, 15.1, 16.2];
const a = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14];
const b = [2, 1, 4, 3, 6, 5, 8, 7, 10, 9, 12, 11, 14, 13];
const newRows = {
  cells: [
    ['a', 'b'],
    [7, 7],
    [20, 7],
    [1, 14],
  ],
  labelCells: ['Name', 'P-01', 'P-02', 'P-03'],
  sheetRows: [30, 31, 32, 33],
};

describe('new-row predictions from both sources', () => {
  const { cells, streamed } = bothSources(
    ['y', ...y],
    [
      ['a', ...a],
      ['b', ...b],
    ],
    EMPTY_CHOICES,
    newRows,
  );
  const close = (got: number, want: number) => expect(Math.abs(got - want)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(want)));

  it('labels, estimates and flags values outside the data alike', () => {
    expect(streamed.predictions.map((p) => [p.label, p.sheetRow, p.outsideRange])).toEqual(cells.predictions.map((p) => [p.label, p.sheetRow, p.outsideRange]));
    expect(cells.predictions.map((p) => p.outsideRange)).toEqual([[], ['a'], []]);
    streamed.predictions.forEach((p, i) => {
      close(p.estimate, cells.predictions[i].estimate);
      close(p.newHigh, cells.predictions[i].newHigh);
    });
  });

  it('flags hidden extrapolation from cells, and says the stream did not check it', () => {
    expect(cells.predictions.map((p) => p.hiddenExtrapolation)).toEqual([false, false, true]);
    expect(streamed.predictions.every((p) => !p.hiddenExtrapolation)).toBe(true);
    expect(streamed.unchecked.some((t) => t.includes('hidden extrapolation') && t.includes('not checked'))).toBe(true);
  });

  it('names a row by its worksheet row when the cell left of it holds no text', () => {
    expect(rowLabel(12, 40)).toBe('Row 40');
    expect(rowLabel(null, 41)).toBe('Row 41');
    expect(rowLabel(' B-7 ', 42)).toBe('B-7');
  });
});
