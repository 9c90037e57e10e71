/**
 * PLUMB.COMPARE through the cell interface. Expected numbers come from the engine's single-model
 * fit (checked against NIST and ml-matrix elsewhere), fitted here on the very rows COMPARE must
 * use; the layout, names and messages are this add-in's own wording.
 */
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../src/engine';
import { compare } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';
import { gaussian, mulberry32, randomProblem } from '../support/random';

const HEADER = ['Candidate', 'Terms', 'Residual df', 'Sigma-hat', 'Adjusted R²', 'AIC', 'BIC', 'ΔBIC'];
const n = 36;
const { x } = randomProblem(201, n, 2);
const normal = gaussian(mulberry32(202));
const origins = ['Kenya', 'Peru', 'Java'];
const origin = x.map((_, i) => origins[i % 3]);
const shift: Record<string, number> = { Kenya: 0, Peru: 1.5, Java: -1 };
const y = x.map((r, i) => 3 + 2 * r[0] + shift[origin[i]] + 0.4 * normal());
const yCells = [['Yield'], ...y.map((v) => [v])];
const xCells = [['Steep', 'Temp', 'Origin'], ...x.map((r, i) => [...r, origin[i]])];

/** Steep and the two Origin indicators (Java is the reference level, first in sorted order). */
function coded(i: number, steep: boolean, temp: boolean, withOrigin: boolean): number[] {
  return [...(steep ? [x[i][0]] : []), ...(temp ? [x[i][1]] : []), ...(withOrigin ? [origin[i] === 'Kenya' ? 1 : 0, origin[i] === 'Peru' ? 1 : 0] : [])];
}

describe('PLUMB.COMPARE', () => {
  const grid = [
    [1, 0, 0],
    [1, 0, 1],
    [0, 0, 0],
    [true, true, true],
    [false, true, false],
  ];
  const table = compare(yCells, xCells, grid);

  it('lays out one row per candidate under the header, best BIC first, with ΔBIC from the best', () => {
    expect(table[0]).toEqual(HEADER);
    expect(table).toHaveLength(6);
    const bics = table.slice(1).map((r) => r[6] as number);
    expect(bics).toEqual([...bics].sort((a, b) => a - b));
    expect(table[1][7]).toBe(0);
    table.slice(1).forEach((r) => expect(r[7]).toBe((r[6] as number) - bics[0]));
    // The data were made from steep time and origin, so that candidate (row 2) wins.
    expect(table[1].slice(0, 2)).toEqual([2, 'Steep, Origin']);
  });

  it('names the columns each candidate includes, or "intercept only"', () => {
    const named = Object.fromEntries(table.slice(1).map((r) => [r[0], r[1]]));
    expect(named).toEqual({ 1: 'Steep', 2: 'Steep, Origin', 3: 'intercept only', 4: 'Steep, Temp, Origin', 5: 'Temp' });
  });

  it('fits a categorical column with all its indicators, and matches the fit of that model alone', () => {
    const row = table.find((r) => r[0] === 2)!;
    const alone = fitModel({ y, x: y.map((_, i) => coded(i, true, false, true)) });
    expect(row.slice(2)).toEqual([alone.residualDf, alone.sigma, alone.adjustedRSquared, alone.aic, alone.bic, row[7]]);
    expect(alone.residualDf).toBe(n - 4);
  });

  it('fits every candidate on the rows complete in all of predictors, even columns it leaves out', () => {
    // Row 3's Temp is blank: the Steep-only candidate must still drop that row, so its likelihood
    // is comparable with the candidates that use Temp.
    const holed = xCells.map((r, i) => (i === 3 ? [r[0], '', r[2]] : r));
    const [, first] = compare(yCells, holed, [[1, 0, 0]]);
    const keep = (_: unknown, i: number) => i !== 2;
    const alone = fitModel({ y: y.filter(keep), x: x.filter(keep).map((r) => [r[0]]) });
    expect(first.slice(2, 7)).toEqual([alone.residualDf, alone.sigma, alone.adjustedRSquared, alone.aic, alone.bic]);
  });

  it('applies the shared settings to every candidate', () => {
    const weights = y.map((_, i) => 1 + (i % 4));
    const w = [['w'], ...weights.map((v) => [v])];
    const [, first] = compare(yCells, xCells, [[1, 0, 0]], null, false, 0.5, w, true);
    const alone = fitModel({ y, x: x.map((r) => [r[0]]), weights }, { intercept: false, knownSigma: 0.5 });
    expect(first[6]).toBe(alone.bic);
  });
});

describe('PLUMB.COMPARE input errors', () => {
  const cases: [string, unknown[][] | null, string][] = [
    [
      'a grid narrower than predictors',
      [[1, 0]],
      'candidates has 2 columns but predictors has 3: give one 1/0 column per column of predictors, in the same order (a text column counts once, whatever its number of levels).',
    ],
    ['an empty grid', [], 'candidates is empty: give one row per candidate model, with a 1 or 0 for each of the 3 columns of predictors.'],
    ['an omitted grid', null, 'candidates is empty: give one row per candidate model, with a 1 or 0 for each of the 3 columns of predictors.'],
    [
      'a 2',
      [
        [1, 0, 0],
        [1, 2, 0],
      ],
      'candidates row 2, column 2 ("Temp") holds 2: use 1 or TRUE to include that column of predictors, 0 or FALSE to leave it out.',
    ],
    [
      'a text',
      [[1, 'yes', 0]],
      'candidates row 1, column 2 ("Temp") holds the text "yes": use 1 or TRUE to include that column of predictors, 0 or FALSE to leave it out.',
    ],
    [
      'a blank',
      [[1, 0, '']],
      'candidates row 1, column 3 ("Origin") holds a blank: use 1 or TRUE to include that column of predictors, 0 or FALSE to leave it out.',
    ],
  ];

  it.each(cases)('%s', (_label, grid, message) => {
    const error = thrownBy(() => compare(yCells, xCells, grid as unknown[][]));
    expect(error).toEqual({ code: '#VALUE!', message });
  });

  it('names the candidate that cannot be fitted', () => {
    const error = thrownBy(() =>
      compare(yCells.slice(0, 4), xCells.slice(0, 4), [
        [1, 0, 0],
        [1, 1, 1],
      ]),
    );
    expect(error.message).toBe(
      "Candidate 2: 3 rows cannot fit the model's 5 parameters (Intercept, Steep, Temp, Origin: Kenya, Origin: Peru) with any left over to measure the noise: the model needs more rows than parameters. Give at least 6 rows, or fewer predictors.",
    );
  });
});
