/**
 * Cells to model frame: header detection, missing rows and categorical coding, each checked
 * against a small case worked out by hand in the comments.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame } from '../../../src/engine';

describe('header detection', () => {
  it('a text first row over numbers names the response and the terms', () => {
    const frame = buildModelFrame({
      y: [['Yield'], [1], [2], [4]],
      x: [
        [
          ['Steep', 'Grind'],
          [1, 5],
          [2, 3],
          [3, 4],
        ],
      ],
      intercept: true,
    });
    expect(frame.hasHeader).toBe(true);
    expect(frame.responseName).toBe('Yield');
    expect(frame.termNames).toEqual(['Intercept', 'Steep', 'Grind']);
    expect(frame.usedRows).toEqual([2, 3, 4]);
    expect(frame.data.y).toEqual([1, 2, 4]);
  });

  it('numbers in the first row mean no header: names default to y and x1…xp', () => {
    const frame = buildModelFrame({
      y: [[1], [2], [4]],
      x: [
        [
          [1, 5],
          [2, 3],
          [3, 4],
        ],
      ],
      intercept: true,
    });
    expect(frame.hasHeader).toBe(false);
    expect(frame.responseName).toBe('y');
    expect(frame.termNames).toEqual(['Intercept', 'x1', 'x2']);
    expect(frame.usedRows).toEqual([1, 2, 3]);
  });

  it('a header over y with a number over an x column is an error that names the cell', () => {
    expect(() => buildModelFrame({ y: [['Yield'], [1], [2]], x: [[[7], [1], [2]]], intercept: true })).toThrow(
      'response starts with a header but predictors row 1, column 1 holds 7',
    );
  });
});

describe('missing rows', () => {
  it('a blank, "", null or #N/A anywhere in a row leaves the whole row out, with the reason', () => {
    // Rows 2–6 of the range; rows 3 (blank x), 4 (#N/A y) and 6 ("" weight) are skipped.
    const frame = buildModelFrame({
      y: [['y'], [1], [2], [{ errorCode: '#N/A' }], [5], [6]],
      x: [[['a'], [10], [null], [30], [40], [50]]],
      weights: [['w'], [1], [1], [1], [2], ['']],
      intercept: true,
    });
    expect(frame.usedRows).toEqual([2, 5]);
    expect(frame.skipped).toEqual([
      { row: 3, reason: 'blank in a' },
      { row: 4, reason: '#N/A in y' },
      { row: 6, reason: 'blank in weight' },
    ]);
    expect(frame.data.y).toEqual([1, 5]);
    expect(frame.data.x).toEqual([[10], [40]]);
    expect(frame.data.weights).toEqual([1, 2]);
  });
});

describe('categorical coding', () => {
  // Levels sorted: Brazil < Ethiopia < Kenya; Brazil is the reference level.
  const origin = [['Origin'], ['Kenya'], ['Brazil'], ['Ethiopia'], ['Kenya'], ['Brazil']];
  const y = [['y'], [1], [2], [3], [4], [5]];

  it('codes an all-text column as 0/1 indicators against its first sorted level', () => {
    const frame = buildModelFrame({ y, x: [origin], intercept: true });
    expect(frame.termNames).toEqual(['Intercept', 'Origin: Ethiopia', 'Origin: Kenya']);
    expect(frame.data.x).toEqual([
      [0, 1],
      [0, 0],
      [1, 0],
      [0, 1],
      [0, 0],
    ]);
    expect(frame.columns[0]).toEqual({ kind: 'categorical', name: 'Origin', levels: ['Brazil', 'Ethiopia', 'Kenya'], reference: 'Brazil' });
  });

  it('without an intercept the first categorical column keeps all its levels', () => {
    const frame = buildModelFrame({ y, x: [origin], intercept: false });
    expect(frame.termNames).toEqual(['Origin: Brazil', 'Origin: Ethiopia', 'Origin: Kenya']);
    expect(frame.data.x[0]).toEqual([0, 0, 1]);
  });

  it('mixes numeric and categorical columns, keeping range order and tracking blocks', () => {
    const frame = buildModelFrame({
      y,
      x: [[['Temp'], [90], [92], [94], [91], [93]], origin],
      intercept: true,
    });
    expect(frame.termNames).toEqual(['Intercept', 'Temp', 'Origin: Ethiopia', 'Origin: Kenya']);
    expect(frame.termBlocks).toEqual([0, 1, 1]);
    expect(frame.data.x[2]).toEqual([94, 1, 0]);
  });

  it('text in a mostly numeric column is a bad value, not a category', () => {
    expect(() => buildModelFrame({ y, x: [[['Temp'], [90], ['n/a'], [94], [91], [93]]], intercept: true })).toThrow(
      'predictors row 3, column 1 ("Temp") holds the text "n/a".',
    );
  });
});

describe('worksheet origins (issue 13, contract C5)', () => {
  // "Custom functions parameter options", Detect the address of a parameter: the cell functions
  // learn each range's address (e.g. Data!B9:B14); the pane knows its own. Header on sheet row 9.
  const origins = {
    y: { sheet: 'Data', row: 8, column: 1 },
    x: [{ sheet: 'Data', row: 8, column: 3 }],
    weights: { sheet: 'Data', row: 8, column: 6 },
  };
  const y = [['y'], [1], [2], [{ errorCode: '#N/A' }], [5], [6]];
  const x = [
    [
      ['a', 'b'],
      [10, 1],
      [null, 2],
      [30, 3],
      [40, 5],
      [50, 4],
    ],
  ];
  const weights = [['w'], [1], [1], [1], [2], [1]];

  it('numbers used and skipped rows by worksheet row', () => {
    const frame = buildModelFrame({ y, x, weights, intercept: true, origins });
    expect(frame.usedRows).toEqual([10, 13, 14]);
    expect(frame.skipped).toEqual([
      { row: 11, reason: 'blank in a' },
      { row: 12, reason: '#N/A in y' },
    ]);
  });

  it('names a bad cell by its worksheet address, in each range by its own origin', () => {
    const badX = [
      [
        ['a', 'b'],
        [10, 1],
        [20, 'n/a'],
        [30, 3],
        [40, 5],
        [50, 4],
      ],
    ];
    expect(() => buildModelFrame({ y, x: badX, intercept: true, origins })).toThrow('predictors cell Data!E11 ("b") holds the text "n/a".');
    const badY = [['y'], [1], [{ errorCode: '#DIV/0!' }], [3], [5], [6]];
    expect(() => buildModelFrame({ y: badY, x, intercept: true, origins })).toThrow('response cell Data!B11 ("y") holds the error #DIV/0!.');
    const badW = [['w'], [1], [1], [1], [-2], [1]];
    expect(() => buildModelFrame({ y, x, weights: badW, intercept: true, origins })).toThrow(
      'weights cell Data!G13 is -2; every weight must be a positive number.',
    );
  });

  it('names a number over a predictor column by address when y has a header', () => {
    expect(() => buildModelFrame({ y: [['y'], [1], [2]], x: [[[7], [1], [2]]], intercept: true, origins })).toThrow(
      'response starts with a header but predictors cell Data!D9 holds 7',
    );
  });

  it('several x blocks each use their own origin; a block without one is named by position', () => {
    const twoBlocks = [
      [['a'], [1], [2], [3], [4], [5]],
      [['b'], [1], [2], [true], [4], [5]],
    ];
    const named = { ...origins, x: [origins.x[0], { sheet: 'Other sheet', row: 0, column: 25 }] };
    expect(() => buildModelFrame({ y, x: twoBlocks, intercept: true, origins: named })).toThrow(`predictors cell 'Other sheet'!Z4 ("b") holds TRUE.`);
    expect(() => buildModelFrame({ y, x: twoBlocks, intercept: true, origins: { y: origins.y } })).toThrow('predictors row 4, column 1 ("b") holds TRUE.');
  });

  // Issue 14: a column without a header is named as the user finds it on the sheet (common practice (no source)).
  it('without a header row, names each column by its worksheet column; a block without an origin keeps x by its place', () => {
    const headerless = { y: y.slice(1), x: [x[0].slice(1)] };
    const frame = buildModelFrame({ ...headerless, intercept: true, origins });
    expect(frame.responseName).toBe('column B');
    expect(frame.termNames).toEqual(['Intercept', 'column D', 'column E']);
    expect(frame.skipped).toEqual([
      { row: 10, reason: 'blank in column D' },
      { row: 11, reason: '#N/A in column B' },
    ]);
    const second = [[1], [2], [3], [4], [5]];
    const mixed = buildModelFrame({ y: headerless.y, x: [headerless.x[0], second], intercept: true, origins: { y: origins.y, x: [origins.x[0]] } });
    expect(mixed.termNames).toEqual(['Intercept', 'column D', 'column E', 'x3']);
    expect(buildModelFrame({ ...headerless, intercept: true }).responseName).toBe('y');
  });

  it('names a blank header cell by its worksheet column, or by xNamedAt where the caller says the fit reads it', () => {
    const blankHeader = [x[0].map((row, i) => (i === 0 ? ['a', ''] : row))];
    expect(buildModelFrame({ y, x: blankHeader, intercept: true, origins }).termNames).toEqual(['Intercept', 'a', 'column E']);
    const gathered = buildModelFrame({ y, x: blankHeader, intercept: true, origins: { ...origins, xNamedAt: [24] } });
    expect(gathered.termNames).toEqual(['Intercept', 'a', 'column Z']);
    // Messages still name the cell where it is.
    expect(() =>
      buildModelFrame({ y, x: [blankHeader[0].map((row, i) => (i === 2 ? [20, true] : row))], intercept: true, origins: { ...origins, xNamedAt: [24] } }),
    ).toThrow('predictors cell Data!E11 ("column Z") holds TRUE.');
  });

  it('without origins rows stay 1-based positions in the range', () => {
    expect(buildModelFrame({ y, x, weights, intercept: true }).usedRows).toEqual([2, 5, 6]);
  });
});
