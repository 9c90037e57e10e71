/**
 * PLUMB.GATHER (issue 13, contract C3): areas side by side as one block, blanks as "" and errors
 * as the same errors, so a fit over the gathered block equals the fit over the source cells.
 * Shapes follow "Custom functions parameter options" (Repeating parameters: the arguments arrive
 * as one array of 2-D arrays) and "Handle and return errors from your custom function" (errors
 * inside a returned array; custom messages only with #VALUE! and #N/A; #REF! and #NAME? are input
 * errors only). A null in a returned array shows as 0 (OfficeDev/office-js issue 1503), so no
 * cell may be null.
 */
import { describe, expect, it } from 'vitest';
import { estimates, fitStats, gather } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';

// Invented data (no source).
const yield_ = [['Yield'], [10.1], [null], [12.2], [12.9], [14.4], [15.1], [15.8], [16.9]];
const steep = [['Steep'], [12], [14], [16], [null], [20], [22], [24], [25]];
const temp = [
  ['Temp', 'Grind'],
  [90, 3],
  [91, 4],
  [{ code: '#N/A' }, 3],
  [93, 5],
  [92, 4],
  [95, 5],
  [94, 3],
  [96, 4],
];

describe('PLUMB.GATHER', () => {
  it('joins areas left to right, row by row, keeping numbers, text and booleans', () => {
    const grid = gather([
      [['a'], [1]],
      [
        ['b', 'c'],
        [true, 'x'],
      ],
    ]);
    expect(grid).toEqual([
      ['a', 'b', 'c'],
      [1, true, 'x'],
    ]);
  });

  it('turns blanks into "" (never null, which Excel would show as 0)', () => {
    const grid = gather([steep]);
    expect(grid[4]).toEqual(['']);
    expect(grid.flat().some((cell) => cell === null || cell === undefined)).toBe(false);
  });

  it('keeps an error cell as the same error, with no custom message unless #VALUE! or #N/A', () => {
    const grid = gather([[[{ code: '#N/A' }], [{ code: '#DIV/0!' }], [{ type: 'Error', basicValue: '#NUM!', errorType: 'Num' }]]]);
    expect(grid.map((r) => (r[0] as { code: string }).code)).toEqual(['#N/A', '#DIV/0!', '#NUM!']);
    expect((grid[1][0] as { message?: string }).message ?? '').toBe('');
  });

  it('passes a #VALUE! or #N/A message on, and drops one that another code cannot carry', () => {
    const grid = gather([[[{ code: '#VALUE!', message: 'response is empty' }], [{ code: '#DIV/0!', message: 'ignored' }]]]);
    expect((grid[0][0] as { message?: string }).message).toBe('response is empty');
    expect((grid[1][0] as { message?: string }).message ?? '').toBe('');
  });

  it('an error a function cannot return (#REF!, #SPILL!) becomes #VALUE! whose message names it', () => {
    const grid = gather([[[{ code: '#REF!' }], [{ type: 'Error', errorType: 'Spill' }]]]);
    expect(grid.map((r) => (r[0] as { code: string }).code)).toEqual(['#VALUE!', '#VALUE!']);
    expect((grid[0][0] as { message: string }).message).toContain('#REF!');
    expect((grid[1][0] as { message: string }).message).toContain('#SPILL!');
  });

  it('a fit over the gathered block equals the fit over the same data in one block', () => {
    // Rows with the blank y, the blank steep and the #N/A temp are skipped in both.
    const gathered = gather([steep, temp]);
    const oneBlock = steep.map((r, i) => [r[0], temp[i][0], temp[i][1]]);
    expect(fitStats(yield_, gathered)).toEqual(fitStats(yield_, oneBlock));
    expect(estimates(yield_, gathered)).toEqual(estimates(yield_, oneBlock));
    expect(fitStats(yield_, gathered).find((r) => r[0] === 'Rows skipped')?.[1]).toBe(3);
  });

  it('refuses areas with different numbers of rows, naming them by address', () => {
    const error = thrownBy(() => gather([steep, temp.slice(0, 5)], { parameterAddresses: ['Data!C2:C10', 'Data!E2:F6'] }));
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toBe('PLUMB.GATHER: area 2 (Data!E2:F6) has 5 rows but area 1 (Data!C2:C10) has 9; give areas with the same rows.');
  });

  it('refuses no areas, and an omitted area, with #VALUE!', () => {
    expect(thrownBy(() => gather([])).message).toMatch(/needs one or more areas/);
    expect(thrownBy(() => gather([steep, null as unknown as unknown[][]])).message).toBe('PLUMB.GATHER: area 2 is empty; give each area as a range.');
  });

  it('takes a single value as a 1×1 area', () => {
    expect(gather([5 as unknown as unknown[][]])).toEqual([[5]]);
  });
});
