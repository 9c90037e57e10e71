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
      x: [[['Steep', 'Grind'], [1, 5], [2, 3], [3, 4]]],
      intercept: true,
    });
    expect(frame.hasHeader).toBe(true);
    expect(frame.responseName).toBe('Yield');
    expect(frame.termNames).toEqual(['Intercept', 'Steep', 'Grind']);
    expect(frame.usedRows).toEqual([2, 3, 4]);
    expect(frame.data.y).toEqual([1, 2, 4]);
  });

  it('numbers in the first row mean no header: names default to y and x1…xp', () => {
    const frame = buildModelFrame({ y: [[1], [2], [4]], x: [[[1, 5], [2, 3], [3, 4]]], intercept: true });
    expect(frame.hasHeader).toBe(false);
    expect(frame.responseName).toBe('y');
    expect(frame.termNames).toEqual(['Intercept', 'x1', 'x2']);
    expect(frame.usedRows).toEqual([1, 2, 3]);
  });

  it('a header over y with a number over an x column is an error that names the cell', () => {
    expect(() => buildModelFrame({ y: [['Yield'], [1], [2]], x: [[[7], [1], [2]]], intercept: true })).toThrow(
      'known_y starts with a header but known_x row 1, column 1 holds 7',
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
    expect(frame.data.x).toEqual([[0, 1], [0, 0], [1, 0], [0, 1], [0, 0]]);
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
    expect(() =>
      buildModelFrame({ y, x: [[['Temp'], [90], ['n/a'], [94], [91], [93]]], intercept: true }),
    ).toThrow('known_x row 3, column 1 ("Temp") holds the text "n/a".');
  });
});
