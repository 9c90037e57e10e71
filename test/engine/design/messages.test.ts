/**
 * The engine's messages about the data speak the user's words: column headers and worksheet
 * rows. Each case is small enough to count by hand; the wording is this add-in's own.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type CellValue, EngineError, fitModel } from '../../../src/engine';

function messageOf(action: () => unknown): string {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineError);
    return (error as Error).message;
  }
  throw new Error('expected an EngineError');
}

const column = (header: string, values: readonly CellValue[]): CellValue[][] => [[header], ...values.map((v) => [v])];

describe('no complete rows', () => {
  it('names the column that is blank in every row', () => {
    const message = messageOf(() =>
      buildModelFrame({
        y: column('Yield', [1, 2, 3]),
        x: [
          [
            ['Temp', 'Dose'],
            [10, null],
            [20, ''],
            [30, null],
          ],
        ],
        intercept: true,
      }),
    );
    expect(message).toBe('No complete rows: Dose is blank or #N/A in every row. Select the column that holds the values.');
  });

  it('names each column with blanks, and in how many rows, when none is blank throughout', () => {
    // Rows 2 and 4 lack Temp, row 3 lacks the weight: no row is complete.
    const message = messageOf(() =>
      buildModelFrame({
        y: column('Yield', [1, 2, 3]),
        x: [column('Temp', [null, 5, { errorCode: '#N/A' }])],
        weights: column('w', [1, null, 1]),
        intercept: true,
      }),
    );
    expect(message).toBe('No complete rows: every row has a blank or #N/A in Temp (2 rows) or weights (1 row).');
  });

  it('without headers names the column by its argument and worksheet column', () => {
    const message = messageOf(() =>
      buildModelFrame({
        y: [[1], [2]],
        x: [
          [
            [1, null],
            [2, null],
          ],
        ],
        intercept: true,
        origins: { y: { sheet: 'Data', row: 4, column: 1 }, x: [{ sheet: 'Data', row: 4, column: 2 }] },
      }),
    );
    expect(message).toBe('No complete rows: predictors column D is blank or #N/A in every row. Select the column that holds the values.');
  });
});

describe('a text column with a level per row', () => {
  const rows = 12;
  const batch = Array.from({ length: rows }, (_, i) => `B-${100 + i}`);
  const temp = Array.from({ length: rows }, (_, i) => 10 + i);

  it('is named as looking like an identifier, with its levels against the rows', () => {
    const message = messageOf(() =>
      buildModelFrame({
        y: column(
          'Yield',
          temp.map((t) => t / 2),
        ),
        x: [[['Temp', 'Batch'], ...temp.map((t, i) => [t, batch[i]])]],
        intercept: true,
      }),
    );
    expect(message).toMatch(/^Batch looks like an identifier: 12 levels for 12 rows, /);
    expect(message).toContain('Leave Batch out of the predictors');
  });

  it('counts the rows used when some were left out', () => {
    // 13 rows, one skipped for a blank Temp: 12 levels over the 12 rows used.
    const message = messageOf(() =>
      buildModelFrame({
        y: column('Yield', [...temp, 1]),
        x: [[['Temp', 'Batch'], ...temp.map((t, i) => [t, batch[i]]), [null, 'B-999']]],
        intercept: true,
      }),
    );
    expect(message).toMatch(/^Batch looks like an identifier: 12 levels for 12 rows used, /);
  });

  it('is an ordinary category when some level repeats', () => {
    const repeated = batch.map((b, i) => (i === 0 ? batch[1] : b));
    const frame = buildModelFrame({ y: column('Yield', temp), x: [column('Batch', repeated)], intercept: true });
    expect(frame.columns[0]).toMatchObject({ kind: 'categorical' });
  });
});

describe('too few rows', () => {
  it('counts every parameter of the model, aliased ones too, and names them', () => {
    // 3 rows, intercept + a, b, c: 4 parameters, of which at most 3 are estimable (rank 3).
    const message = messageOf(() =>
      fitModel({
        y: [1, 2, 4],
        x: [
          [1, 0, 2],
          [2, 1, 0],
          [3, 5, 1],
        ],
        names: ['a', 'b', 'c'],
      }),
    );
    expect(message).toBe(
      "3 rows cannot fit the model's 4 parameters (Intercept, a, b, c) with any left over to measure the noise: the model needs more rows than parameters. Give at least 5 rows, or fewer predictors.",
    );
  });

  it('counts without listing when the model has many parameters', () => {
    const x = [0, 1, 2].map((i) => Array.from({ length: 9 }, (_, j) => ((i + 1) * (j + 3)) % 7));
    const message = messageOf(() => fitModel({ y: [1, 2, 3], x }));
    expect(message).toBe(
      "3 rows cannot fit the model's 10 parameters with any left over to measure the noise: the model needs more rows than parameters. Give at least 11 rows, or fewer predictors.",
    );
  });

  it('says 1 row, not 1 rows', () => {
    expect(messageOf(() => fitModel({ y: [3], x: [[]] }))).toBe(
      "1 row cannot fit the model's 1 parameter (Intercept) with any left over to measure the noise: the model needs more rows than parameters. Give at least 2 rows, or fewer predictors.",
    );
  });
});
