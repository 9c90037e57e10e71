/**
 * The one rule for new rows, shared by PLUMB.PREDICT and the pane (common practice (no source):
 * new rows are laid out like the predictors; a repeated header row is not data; a blank leaves
 * its row unpredicted but in place, so results stay in step with the sheet).
 */
import { describe, expect, it } from 'vitest';
import { readNewRowValues } from '../../../src/engine';

const columns = [
  { name: 'Temp', levels: undefined },
  { name: 'Origin', levels: ['North', 'South'] },
];
const naming = { row: (i: number) => `row ${i + 10}`, cell: (i: number, j: number) => `cell ${'BC'[j]}${i + 10}` };

describe('readNewRowValues', () => {
  it('skips a first row that repeats the headers (in any case) and keeps a blank row in place', () => {
    const rows = readNewRowValues(
      [
        ['temp', 'ORIGIN'],
        [21, 'North'],
        [null, 'South'],
        [23.5, 'South'],
      ],
      columns,
      true,
      naming,
    );
    expect(rows).toEqual([
      { position: 1, values: [21, 'North'], blankIn: undefined },
      { position: 2, values: undefined, blankIn: 'Temp' },
      { position: 3, values: [23.5, 'South'], blankIn: undefined },
    ]);
  });

  it('reads the first row as data when the model has no headers', () => {
    expect(readNewRowValues([['Temp', 'North']], [{ name: 'Temp', levels: ['Temp'] }, columns[1]], false, naming)[0].position).toBe(0);
  });

  it('names the cell and says what its column needs', () => {
    expect(() => readNewRowValues([['hot', 'North']], columns, true, naming)).toThrow('cell B10 ("Temp") holds the text "hot"; it needs a number.');
    expect(() => readNewRowValues([[20, 3]], columns, true, naming)).toThrow('cell C10 ("Origin") holds 3; it needs one of the levels North, South.');
  });

  it('refuses rows laid out unlike the predictors, and no rows at all', () => {
    expect(() => readNewRowValues([[20]], columns, true, naming)).toThrow('row 10 has 1 columns; predictors has 2. Lay new rows out like predictors.');
    expect(() => readNewRowValues([], columns, true, naming)).toThrow('The new rows are empty');
  });
});
