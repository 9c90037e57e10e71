/**
 * PLUMB.PREDICT's extrapolation column, through the any[][] interface Excel uses. The designs are
 * worked by hand (common practice, no source): a value beyond a column's smallest and largest
 * fitting value is outside the data; a point inside every range but off the line the data follow
 * has a leverage above every fitting row's and is hidden extrapolation.
 */
import { describe, expect, it } from 'vitest';
import { predict } from '../../src/functions/functions';
import { HIDDEN_EXTRAPOLATION_TEXT } from '../../src/cellGrids/predictGrid';
import { column, columns } from '../support/cells';

describe('PLUMB.PREDICT extrapolation column', () => {
  // Temp and Dose rise together (Dose ≈ Temp / 10): (50, 1) is inside both ranges but far off that line.
  const temp = [10, 20, 30, 40, 50, 15, 25, 35, 45];
  const dose = [1.1, 2, 2.9, 4.1, 5, 1.4, 2.6, 3.4, 4.6];
  const yield_ = [3.1, 5.2, 7.1, 9.3, 11.2, 4.0, 6.1, 8.2, 10.1];
  const y = column('Yield', yield_);
  const x = columns(
    ['Temp', 'Dose'],
    temp.map((t, i) => [t, dose[i]]),
  );

  it('is headed Extrapolation and names the predictors beyond the data by header', () => {
    const out = predict(y, x, [
      [30, 3],
      [60, 3],
      [70, 9],
    ]);
    expect(out[0][5]).toBe('Extrapolation');
    expect(out[1][5]).toBe('');
    expect(out[2][5]).toBe('Outside the data: Temp');
    expect(out[3][5]).toBe('Outside the data: Temp, Dose');
  });

  it('says hidden when every value is inside its range but the mix is unlike any row used', () => {
    const out = predict(y, x, [[50, 1.1]]);
    expect(out[1][5]).toBe(HIDDEN_EXTRAPOLATION_TEXT);
    expect(typeof out[1][0]).toBe('number');
  });

  it('names a category by its column, once, whichever indicator is concerned', () => {
    // Batch codes as two indicators (B, C against A); Temp 80 lies beyond 10–40.
    const withBatch = columns(
      ['Temp', 'Batch'],
      [
        [10, 'A'],
        [20, 'B'],
        [30, 'C'],
        [40, 'A'],
        [15, 'B'],
        [25, 'C'],
        [35, 'A'],
      ],
    );
    const out = predict(column('Yield', [3, 5.5, 7.2, 9, 4.4, 6.3, 8]), withBatch, [[80, 'B']]);
    expect(out[1][5]).toBe('Outside the data: Temp');
  });

  it('leaves the column blank for a row with a blank input', () => {
    const out = predict(y, x, [[null, 3]]);
    expect(out[1]).toEqual(['', '', '', '', '', '']);
  });
});
