/**
 * Issue 14: without a header row the cell functions name a column as the user finds it on the
 * sheet, by the worksheet column of its parameter address ("Custom functions parameter options",
 * Detect the address of a parameter); only an argument without an address (an array constant)
 * keeps its place in the fit, x1, x2, … A blank header cell among headers is named the same way.
 * Seeded random data; the statistics are checked against outside sources elsewhere.
 */
import { describe, expect, it } from 'vitest';
import { terms } from '../../src/functions/functions';
import { randomProblem } from '../support/random';

const { y, x } = randomProblem(71, 12, 2);
const yCells: unknown[][] = y.map((v) => [v]);
const xCells: unknown[][] = x.map((row) => [...row]);
const at = (...addresses: string[]) => ({ parameterAddresses: [...addresses, '', '', '', '', ''] }) as CustomFunctions.Invocation;
const termNames = (grid: unknown[][]) => grid.slice(1).map((row) => row[0]);

describe('column names from parameter addresses', () => {
  it('names headerless predictors by their worksheet columns', () => {
    const grid = terms(yCells, xCells, undefined, undefined, undefined, undefined, undefined, at('Data!B4:B15', 'Data!D4:E15'));
    expect(termNames(grid as unknown[][])).toEqual(['Intercept', 'column D', 'column E']);
  });

  it('keeps x1, x2 for predictors given as an array constant', () => {
    const grid = terms(yCells, xCells, undefined, undefined, undefined, undefined, undefined, at('Data!B4:B15', ''));
    expect(termNames(grid as unknown[][])).toEqual(['Intercept', 'x1', 'x2']);
  });

  it('names a blank header cell among headers by its worksheet column', () => {
    const grid = terms(
      [['Yield'], ...yCells],
      [['Temp', ''], ...xCells],
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
      at('Data!B3:B15', 'Data!AB3:AC15'),
    );
    expect(termNames(grid as unknown[][])).toEqual(['Intercept', 'Temp', 'column AC']);
  });
});
