/**
 * Error values inside the arguments, as Excel passes them once functions.json sets
 * allowErrorForDataTypeAny ("Handle and return errors from your custom function", Errors as custom
 * function inputs; "Manually create JSON metadata for custom functions", allowErrorForDataTypeAny).
 * The docs do not say in which form an error arrives, so every form they show is passed: a
 * CustomFunctions.Error ({ code, message }, "CustomFunctions.Error class") and an
 * Excel.ErrorCellValue ({ type: "Error", basicValue, errorType }, "Excel.ErrorCellValue" in the
 * Excel JavaScript API reference), with and without its optional basicValue.
 * Rule (issue 13, contract C4): #N/A in a used cell skips and counts its row; any other error
 * gives #VALUE! naming the cell by its worksheet address; an error in a setting names the setting.
 */
import { describe, expect, it } from 'vitest';
import { collinearity, estimates, fitStats, predict, terms } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';

const ERROR_FORMS: [string, (code: string, errorType: string) => unknown][] = [
  ['CustomFunctions.Error', (code) => ({ code, message: '' })],
  ['Excel.ErrorCellValue', (code, errorType) => ({ type: 'Error', basicType: 'Error', basicValue: code, errorType })],
  ['Excel.ErrorCellValue without basicValue', (_, errorType) => ({ type: 'Error', errorType })],
];

// Invented data (no source): six rows of yield against steep time and temperature.
const y = [['Yield'], [10.1], [11.3], [12.2], [12.9], [14.4], [15.1], [15.8]];
const x = [
  ['Steep', 'Temp'],
  [12, 90],
  [14, 91],
  [16, 90],
  [18, 93],
  [20, 92],
  [22, 95],
  [24, 94],
];
const without = (grid: unknown[][], row: number) => grid.filter((_, i) => i !== row);
const addresses = { parameterAddresses: ['Data!B4:B11', 'Data!C4:D11', '', '', '', 'Data!F4:F11', ''] };

function rowsSkipped(grid: unknown[][]): unknown {
  return grid.find((r) => r[0] === 'Rows skipped')?.[1];
}

describe.each(ERROR_FORMS)('an error argument as %s', (_, errorOf) => {
  it('#N/A in response skips that row and counts it, giving the fit without that row', () => {
    const withNa = y.map((r, i) => (i === 3 ? [errorOf('#N/A', 'NotAvailable')] : r));
    expect(rowsSkipped(fitStats(withNa, x))).toBe(1);
    const expected = estimates(without(y, 3), without(x, 3));
    estimates(withNa, x).forEach(([b], j) => expect(b).toBeCloseTo(expected[j][0] as number, 12));
  });

  it('#N/A in predictors or in weights skips that row too', () => {
    const xNa = x.map((r, i) => (i === 5 ? [errorOf('#N/A', 'NotAvailable'), r[1]] : r));
    expect(rowsSkipped(fitStats(y, xNa))).toBe(1);
    const weights = y.map((_, i) => [i === 0 ? 'w' : i === 2 ? errorOf('#N/A', 'NotAvailable') : 1]);
    expect(rowsSkipped(fitStats(y, x, null, null, null, weights))).toBe(1);
  });

  it('#DIV/0! in predictors gives #VALUE! naming the cell by its worksheet address', () => {
    const xDiv = x.map((r, i) => (i === 4 ? [r[0], errorOf('#DIV/0!', 'Div0')] : r));
    const error = thrownBy(() => terms(y, xDiv, null, null, null, undefined, null, addresses));
    expect(error.code).toBe('#VALUE!');
    // Row 5 of C4:D11 is sheet row 8; the second column is D.
    expect(error.message).toBe('predictors cell Data!D8 ("Temp") holds the error #DIV/0!. Use a number, or leave the cell blank to skip the row.');
  });

  it('#REF! in response and #NUM! in weights are named by address too', () => {
    const yRef = y.map((r, i) => (i === 1 ? [errorOf('#REF!', 'Ref')] : r));
    expect(thrownBy(() => terms(yRef, x, null, null, null, undefined, null, addresses)).message).toMatch(
      /^response cell Data!B5 \("Yield"\) holds the error #REF!/,
    );
    const weights = y.map((_, i) => [i === 0 ? 'w' : i === 6 ? errorOf('#NUM!', 'Num') : 1]);
    expect(thrownBy(() => terms(y, x, null, null, null, weights, null, addresses)).message).toMatch(
      /^weights cell Data!F10 \("weight"\) holds the error #NUM!/,
    );
  });

  it('an error in a setting gives #VALUE! naming the setting', () => {
    const cases: [string, () => unknown][] = [
      ['level', () => terms(y, x, errorOf('#N/A', 'NotAvailable'))],
      ['intercept', () => terms(y, x, null, [[errorOf('#DIV/0!', 'Div0')]])],
      ['noise_sd', () => terms(y, x, null, null, errorOf('#NUM!', 'Num'))],
      ['robust', () => terms(y, x, null, null, null, undefined, errorOf('#VALUE!', 'Value'))],
    ];
    for (const [name, call] of cases) {
      const error = thrownBy(call);
      expect(error.code).toBe('#VALUE!');
      expect(error.message).toMatch(new RegExp(`^${name} is the error #`));
    }
  });

  it('#N/A in a row of new_rows leaves that prediction blank; #DIV/0! there is named by address', () => {
    const newX = [
      [13, 90],
      [errorOf('#N/A', 'NotAvailable'), 91],
    ];
    const grid = predict(y, x, newX);
    expect(grid[1].slice(0, 5).every((cell) => typeof cell === 'number')).toBe(true);
    expect(grid[2]).toEqual(['', '', '', '', '', '']);
    const invocation = { parameterAddresses: ['Data!B4:B11', 'Data!C4:D11', 'Plan!A2:B3'] };
    expect(thrownBy(() => predict(y, x, [[13, errorOf('#DIV/0!', 'Div0')]], null, null, null, undefined, null, invocation)).message).toMatch(
      /^new_rows cell Plan!B2 \("Temp"\) holds the error #DIV\/0!/,
    );
  });

  it('PLUMB.COLLINEARITY names a bad predictors cell by address as well', () => {
    const xDiv = x.map((r, i) => (i === 2 ? [errorOf('#DIV/0!', 'Div0'), r[1]] : r));
    const invocation = { parameterAddresses: ["'Run sheet'!C4:D11"] };
    expect(thrownBy(() => collinearity(xDiv, null, null, null, undefined, null, invocation)).message).toMatch(/^predictors cell 'Run sheet'!C6 \("Steep"\)/);
  });
});

describe('an argument that is no error value', () => {
  it('an object that is neither an error nor a value is #VALUE!, quoted as such in a setting', () => {
    // An entity data type in a cell (custom-functions-data-types-concepts) is nothing a fit can use.
    const entity = { type: 'Entity', text: 'Kenya' };
    expect(thrownBy(() => terms(y, x, entity)).message).toBe(
      'level must be a number between 0 and 1, such as 0.95 for 95%; got a value that is neither a number nor text.',
    );
    expect(
      thrownBy(() =>
        terms(
          y.map((r, i) => (i === 2 ? [entity] : r)),
          x,
        ),
      ).message,
    ).toMatch(/^response row 3 \("Yield"\) holds the error #VALUE!/);
  });
});
