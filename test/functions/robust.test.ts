/**
 * The robust setting through the cell interface. Expected numbers come from the engine's robust
 * fit, itself checked against the sandwich formulas of White (1980) and MacKinnon & White (1985)
 * in test/engine/infer/robustCovariance.test.ts; here what is checked is the parsing of the fifth
 * setting, which functions honour it, and the words the user sees.
 */
import { describe, expect, it } from 'vitest';
import { type CovarianceKind, fitModel } from '../../src/engine';
import { covariance, intervals, stdErrors, terms } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';
import { gaussian, mulberry32, randomProblem } from '../support/random';

const { y: base, x } = randomProblem(101, 40, 2);
const normal = gaussian(mulberry32(102));
// Noise that grows with |x1|, so that every robust kind gives other SEs than the classical one.
const y = base.map((v, i) => v + 2 * Math.abs(x[i][0]) * normal());
const yCells = [['Yield'], ...y.map((v) => [v])];
const xCells = [['Steep', 'Temp'], ...x];
const none = null;

function engine(kind: CovarianceKind) {
  return fitModel({ y, x, names: ['Steep', 'Temp'] }, { covariance: kind });
}

describe('robust, the fifth setting', () => {
  it.each([
    [true, 'HC3'],
    [1, 'HC3'],
    ['HC0', 'HC0'],
    ['hc1', 'HC1'],
    [' Hc3 ', 'HC3'],
    [[['HC1']], 'HC1'],
  ] as const)('%j gives %s, named in the TERMS header', (value, kind) => {
    const table = terms(yCells, xCells, none, none, none, null as unknown as undefined, value);
    expect(table[0][2]).toBe(`Std error (${kind})`);
    expect(table.slice(1).map((r) => r[2])).toEqual(engine(kind).terms.map((t) => t.standardError));
  });

  it.each([false, 0, '', null, undefined, 'classical', 'CLASSICAL'])('%j gives the classical "Std error"', (value) => {
    const table = terms(yCells, xCells, none, none, none, null as unknown as undefined, value);
    expect(table[0][2]).toBe('Std error');
    expect(table).toEqual(terms(yCells, xCells));
  });

  it('STDERRORS, INTERVALS and COVARIANCE honour it', () => {
    const fit = engine('HC3');
    expect(stdErrors(yCells, xCells, none, none, none, undefined, true).map((r) => r[0])).toEqual(fit.terms.map((t) => t.standardError));
    expect(intervals(yCells, xCells, 0.9, none, none, undefined, 'HC3')).toEqual(
      fitModel({ y, x }, { covariance: 'HC3', level: 0.9 }).terms.map((t) => [t.ciLow, t.ciHigh]),
    );
    expect(covariance(yCells, xCells, none, none, none, undefined, true)).toEqual(fit.covariance);
    expect(covariance(yCells, xCells, none, none, none, undefined, true)).not.toEqual(covariance(yCells, xCells));
  });

  it('with noise_sd the robust SEs win and TERMS still says t', () => {
    const table = terms(yCells, xCells, none, none, 3, undefined, true);
    expect(table[0].slice(2, 4)).toEqual(['Std error (HC3)', 't']);
    expect(table.slice(1).map((r) => r[2])).toEqual(engine('HC3').terms.map((t) => t.standardError));
  });

  it('explains a blank HC3 SE caused by a row of leverage 1', () => {
    // The third column marks one row only, so that row alone determines its coefficient.
    const xMarked = [['Steep', 'Temp', 'Trial'], ...x.map((r, i) => [...r, i === 4 ? 1 : 0])];
    const table = terms(yCells, xMarked, none, none, none, undefined, true);
    expect(table[4].slice(2, 7)).toEqual(['', '', '', '', '']);
    expect(table[4][8]).toBe('no HC3 SE: a row with leverage 1 determines this term');
    expect(typeof table[1][2]).toBe('number');
  });

  it.each([
    ['HC2', 'HC2'],
    [2, '2'],
    ['yes', 'yes'],
    [0.5, '0.5'],
  ])('rejects %j with a message listing what it accepts', (value, shown) => {
    const error = thrownBy(() => terms(yCells, xCells, none, none, none, undefined, value));
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toBe(
      `robust must be FALSE (classical standard errors), TRUE (HC3), or one of the texts "HC0", "HC1", "HC3", "classical"; got ${shown}.`,
    );
  });
});
