/**
 * The pane's in-memory analysis names rows as the sheet numbers them (sheet row 10 is "row 10",
 * wherever the chosen ranges start; common practice (no source): a user finds a row by the
 * number at the sheet's left edge), and skips and counts blank and #N/A rows in the form
 * Range.values hands them over: a blank as "" and an error cell as its text, "#N/A" (from memory).
 */
import { describe, expect, it } from 'vitest';
import type { RangeRef } from '../../../src/addressing/a1';
import { analyzeCells, type ReadData } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import { randomProblem } from '../../support/random';

const { y, x } = randomProblem(31, 12, 2);
/** Columns from sheet row 10 (header) down to row 22, on a sheet whose name needs quotes. */
const at = (left: number): RangeRef => ({ sheet: 'Batch log', top: 9, bottom: 21, left, right: left });

function cells(yCells: (number | string)[], aCells: (number | string)[]): ReadData {
  return {
    response: [['Yield'], ...yCells.map((v) => [v])],
    predictorColumns: [
      [['Temp'], ...aCells.map((v) => [v])],
      [['Time'], ...x.map((r) => [r[1]])],
    ],
    weights: undefined,
    sources: { response: at(0), predictors: [at(2), at(4)], weights: undefined },
  };
}

describe('analyze', () => {
  it('skips and counts blank and #N/A rows, naming them by their worksheet rows', () => {
    // Data rows 0..11 sit on sheet rows 11..22: a blank y on row 13, #N/A in Temp on row 17.
    const yCells = y.map((v, i) => (i === 2 ? '' : v));
    const aCells = x.map((r, i) => (i === 6 ? '#N/A' : r[0]));
    const analysis = analyzeCells(cells(yCells, aCells), EMPTY_CHOICES);
    expect(analysis.frame.skipped).toEqual([
      { row: 13, reason: 'blank in Yield' },
      { row: 17, reason: '#N/A in Temp' },
    ]);
    expect(analysis.frame.usedRows).toEqual([11, 12, 14, 15, 16, 18, 19, 20, 21, 22]);
    expect(analysis.fit?.n).toBe(10);
    expect(analysis.warnings.map((w) => w.text)).toContain('2 rows left out: row 13 (blank in Yield), row 17 (#N/A in Temp).');
  });

  it('names a bad cell by its worksheet address', () => {
    const aCells = x.map((r, i) => (i === 3 ? 'n/a' : r[0]));
    expect(() => analyzeCells(cells(y, aCells), EMPTY_CHOICES)).toThrow(/'Batch log'!C14 \("Temp"\)/);
  });

  it('keeps the worksheet rows when the added set changes the column order', () => {
    const aCells = x.map((r, i) => (i === 6 ? '#N/A' : r[0]));
    const analysis = analyzeCells(cells(y, aCells), { ...EMPTY_CHOICES, added: [0] });
    expect(analysis.frame.skipped).toEqual([{ row: 17, reason: '#N/A in Temp' }]);
    expect(analysis.fit?.terms.map((t) => t.name)).toEqual(['Intercept', 'Time', 'Temp']);
    expect(analysis.addedNames).toEqual(['Temp']);
  });
});
