/**
 * Every way a user can hand the cell functions bad input, with the exact error kind and message
 * they see. Messages are the product here: each must say where the problem is and what to do.
 */
import { describe, expect, it } from 'vitest';
import { fitStats, nestedF, predict, terms } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';

const y = [['Yield'], [10.1], [11.3], [12.2], [12.9], [14.4], [15.1]];
const x = [
  ['Steep', 'Temp'],
  [12, 90],
  [14, 91],
  [16, 90],
  [18, 93],
  [20, 92],
  [22, 95],
];
const yPlain = y.slice(1);
const xPlain = x.slice(1);

const cases: [string, () => unknown, string][] = [
  ['y with two columns', () => terms(x, x), 'response has 2 columns; select a single column of responses.'],
  ['x with fewer rows than y', () => terms(y, x.slice(0, 5)), 'response has 7 rows but predictors has 5; select the same rows for both.'],
  ['empty y', () => terms([], x), 'response is empty: select the column of responses.'],
  [
    'text in y',
    () => terms([['Yield'], [1], ['abc'], [3], [4], [5], [6]], x),
    'response row 3 ("Yield") holds the text "abc". Use a number, or leave the cell blank to skip the row.',
  ],
  [
    'boolean in x',
    () =>
      terms(y, [
        ['Steep', 'Temp'],
        [12, 90],
        [14, true],
        [16, 90],
        [18, 93],
        [20, 92],
        [22, 95],
      ]),
    'predictors row 3, column 2 ("Temp") holds TRUE. Use a number, or leave the cell blank to skip the row.',
  ],
  [
    '#DIV/0! in x',
    () =>
      terms(y, [
        ['Steep', 'Temp'],
        [12, 90],
        [14, 91],
        [{ code: '#DIV/0!' }, 90],
        [18, 93],
        [20, 92],
        [22, 95],
      ]),
    'predictors row 4, column 1 ("Steep") holds the error #DIV/0!. Use a number, or leave the cell blank to skip the row.',
  ],
  [
    '"1,234" typed as text',
    () =>
      terms(y, [
        ['Steep', 'Temp'],
        [12, 90],
        [14, 91],
        [16, 90],
        ['1,234', 93],
        [20, 92],
        [22, 95],
      ]),
    'predictors row 5, column 1 ("Steep") holds the text "1,234". It looks like a number stored as text: re-enter it as a number without separators.',
  ],
  [
    'NaN in y without header',
    () => terms([[1], [Number.NaN], [3], [4]], [[1], [2], [3], [5]]),
    'response row 2 ("y") holds NaN. Use a number, or leave the cell blank to skip the row.',
  ],
  [
    'number over x when y has a header',
    () => terms(y, [[1, 2], ...xPlain]),
    'response starts with a header but predictors row 1, column 1 holds 1: give every predictor column a text header, or select the ranges without headers.',
  ],
  [
    'every row incomplete',
    () => terms([['y'], [null], [''], [1]], [['a'], [1], [2], [null]]),
    'No complete rows: every row has a blank or #N/A in y (2 rows) or a (1 row).',
  ],
  [
    'as many rows as parameters',
    () => terms(yPlain.slice(0, 3), xPlain.slice(0, 3)),
    "3 rows cannot fit the model's 3 parameters (Intercept, x1, x2) with any left over to measure the noise: the model needs more rows than parameters. Give at least 4 rows, or fewer predictors.",
  ],
  [
    'a negative weight',
    () => terms(y, x, null, null, null, [['w'], [1], [1], [-2], [1], [1], [1]]),
    'weights row 4 is -2; every weight must be a positive number.',
  ],
  [
    'a zero weight',
    () => terms(yPlain, xPlain, null, null, null, [[1], [0], [1], [1], [1], [1]]),
    'weights row 2 is 0; every weight must be a positive number.',
  ],
  [
    'text weight',
    () => terms(yPlain, xPlain, null, null, null, [[1], ['heavy'], [1], [1], [1], [1]]),
    'weights row 2 ("weight") holds the text "heavy". Use a number, or leave the cell blank to skip the row.',
  ],
  [
    'weights of another length',
    () => terms(yPlain, xPlain, null, null, null, [[1], [1]]),
    'response has 6 rows but weights has 2; select the same rows for both.',
  ],
  ['two-column weights', () => terms(yPlain, xPlain, null, null, null, xPlain), 'weights has 2 columns; select a single column.'],
  ['level of 95', () => terms(y, x, 95), 'level must be a number between 0 and 1, such as 0.95 for 95%; got 95.'],
  ['level as text', () => terms(y, x, '95%'), 'level must be a number between 0 and 1, such as 0.95 for 95%; got 95%.'],
  ['intercept as text', () => terms(y, x, null, 'yes'), 'intercept must be TRUE or FALSE; got yes.'],
  ['negative known sigma', () => terms(y, x, null, null, -1), 'noise_sd is a standard deviation, so it must be positive; got -1.'],
  ['new_rows of the wrong width', () => predict(y, x, [[1, 2, 3]]), 'new_rows row 1 has 3 columns; predictors has 2. Lay new rows out like predictors.'],
  ['text in new_rows', () => predict(y, x, [[12, 'hot']]), 'new_rows row 1, column 2 ("Temp") holds the text "hot"; it needs a number.'],
  [
    'unknown category in new_rows',
    () => predict([['y'], [1], [2], [3], [5]], [['Origin'], ['Kenya'], ['Peru'], ['Kenya'], ['Peru']], [['Chile']]),
    '"Chile" is not a level of "Origin" in the data (levels: Kenya, Peru).',
  ],
  [
    'added columns that repeat base',
    () => nestedF(y, x, [['Steep again'], [12], [14], [16], [18], [20], [22]]),
    'The added columns are combinations of the base columns, so they cannot change the fit: there is nothing to test.',
  ],
  ['base of another length', () => nestedF(y, x.slice(0, 4), x), 'response has 7 rows but base has 4; select the same rows for both.'],
  ['ragged range', () => fitStats([[1], [2], [3]], [[1], [2, 3], [4]]), 'predictors row 2 has 2 cells; row 1 has 1.'],
];

describe('bad input: #VALUE! with a message that says what to fix', () => {
  it('covers at least 20 cases', () => expect(cases.length).toBeGreaterThanOrEqual(20));

  it.each(cases)('%s', (_name, call, message) => {
    const error = thrownBy(call);
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toBe(message);
  });
});
