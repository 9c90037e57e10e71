/**
 * The preview workbook's spreadsheet behaviour: formulas with A1 references, spilling, blocked
 * spills, recalculation of dependents, and errors with messages. The functions here are small
 * stand-ins registered for the test, so each expectation is computed by hand.
 */
import { describe, expect, it } from 'vitest';
import { CustomFunctionsError } from '../../../src/preview/workbook/customFunctionError';
import { createWorkbook } from '../../../src/preview/workbook/workbook';

function setup() {
  const wb = createWorkbook('Data');
  wb.addSheet('Planned batches');
  // SUMCOL: one column of column sums of a range; SCALE: a range times a scalar.
  wb.registerFunction('SUMCOL', (range: unknown) => {
    const grid = range as unknown[][];
    return grid[0].map((_, j) => [grid.reduce((s, row) => s + (typeof row[j] === 'number' ? (row[j] as number) : 0), 0)]);
  });
  wb.registerFunction('SCALE', (range: unknown, factor: unknown) => (range as number[][]).map((r) => r.map((v) => v * (factor as number))));
  wb.registerFunction('FAIL', () => {
    throw new CustomFunctionsError('#VALUE!', 'response is empty: select the column of responses.');
  });
  wb.setFunctionShapes([
    {
      id: 'SCALE',
      parameters: [
        { dimensionality: 'matrix', optional: false },
        { dimensionality: 'scalar', optional: false },
      ],
    },
  ]);
  wb.setInputs('Data', 0, 0, [
    [1, 2],
    [3, 4],
    [5, 6],
  ]);
  return wb;
}

const at = (sheet: string, row: number, column: number) => ({ sheet, row, column });

describe('preview workbook', () => {
  it('spills a function result from its cell', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    expect(wb.valueAt(at('Data', 0, 3))).toBe(9);
    expect(wb.valueAt(at('Data', 1, 3))).toBe(12);
    expect(wb.inputAt(at('Data', 0, 3))).toBe('=PLUMB.SUMCOL(A1:B3)');
    expect(wb.inputAt(at('Data', 1, 3))).toBeNull();
  });

  it('reads quoted sheet names and absolute references, and passes a one-cell scalar argument as a value', () => {
    const wb = setup();
    wb.setInputs('Planned batches', 0, 0, [[10]]);
    wb.setInputs('Data', 5, 0, [["=PLUMB.SCALE(Data!$A$1:$B$2, 'Planned batches'!$A$1)"]]);
    expect(wb.valueAt(at('Data', 5, 0))).toBe(10);
    expect(wb.valueAt(at('Data', 6, 1))).toBe(40);
  });

  it('recalculates dependents, and their dependents, when a cell is edited', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    wb.setInputs('Data', 0, 5, [['=PLUMB.SCALE(D1:D2, 2)']]);
    expect(wb.valueAt(at('Data', 1, 5))).toBe(24);
    wb.setInputs('Data', 2, 1, [[16]]);
    expect(wb.valueAt(at('Data', 1, 3))).toBe(22);
    expect(wb.valueAt(at('Data', 1, 5))).toBe(44);
  });

  it('recalculates a formula that names its sheet in another case when that sheet is edited', () => {
    // Excel reads sheet names regardless of case (common practice, no source): `data!` is the sheet "Data".
    const wb = setup();
    wb.setInputs('Planned batches', 0, 0, [['=PLUMB.SUMCOL(data!A1:B3)']]);
    expect(wb.valueAt(at('Planned batches', 1, 0))).toBe(12);
    wb.setInputs('Data', 2, 1, [[16]]);
    expect(wb.valueAt(at('Planned batches', 1, 0))).toBe(22);
  });

  it('shows #BUSY! while a returned promise is pending, then its grid; a promise overtaken by a later edit is dropped', async () => {
    // A custom function may return a Promise, which Excel awaits, the cell showing #BUSY! meanwhile
    // ("Receive and handle data with custom functions"; "Batch custom function calls for a remote
    // service": each call returns a promise resolved when the batch answers; "Custom function sample
    // using web worker"): how PLUMB's formula worker answers (src/functions/offThread).
    const wb = setup();
    const answers: ((grid: number[][]) => void)[] = [];
    wb.registerFunction('LATER', () => new Promise<number[][]>((resolve) => answers.push(resolve)));
    wb.setInputs('Data', 0, 3, [['=PLUMB.LATER(A1:B3)']]);
    expect(wb.valueAt(at('Data', 0, 3))).toMatchObject({ error: '#BUSY!' });
    wb.setInputs('Data', 2, 1, [[16]]);
    expect(answers.length).toBe(2);
    answers[1]([[2], [3]]);
    answers[0]([[7], [7], [7]]);
    await Promise.resolve();
    await Promise.resolve();
    expect(wb.valueAt(at('Data', 0, 3))).toBe(2);
    expect(wb.valueAt(at('Data', 1, 3))).toBe(3);
    expect(wb.valueAt(at('Data', 2, 3))).toBeNull();
  });

  it('shows #SPILL! when the result would overwrite a cell, and spills once the cell is cleared', () => {
    const wb = setup();
    wb.setInputs('Data', 1, 3, [['in the way']]);
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    expect(wb.valueAt(at('Data', 0, 3))).toMatchObject({ error: '#SPILL!' });
    wb.setInputs('Data', 1, 3, [[null]]);
    expect(wb.valueAt(at('Data', 0, 3))).toBe(9);
    expect(wb.valueAt(at('Data', 1, 3))).toBe(12);
  });

  it('reads a range row by row as valueAt reads each cell: inputs, formula results, spilled values and blanks', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    const range = { sheet: 'data', top: 0, left: 1, bottom: 3, right: 4 };
    const cellByCell = [0, 1, 2, 3].map((row) => [1, 2, 3, 4].map((column) => wb.valueAt(at('Data', row, column))));
    expect(wb.valuesIn(range)).toEqual(cellByCell);
    expect(cellByCell).toEqual([
      [2, null, 9, null],
      [4, null, 12, null],
      [6, null, null, null],
      [null, null, null, null],
    ]);
  });

  it('counts a values revision on entries and recalculated results, not on selection or formats', () => {
    const wb = setup();
    const start = wb.valuesRevision();
    wb.select({ sheet: 'Data', top: 2, left: 2, bottom: 2, right: 2 });
    wb.setNumberFormats('Data', 0, 0, [['0.00']]);
    expect(wb.valuesRevision()).toBe(start);
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    const afterEntry = wb.valuesRevision();
    expect(afterEntry).toBeGreaterThan(start);
    wb.setInputs('Data', 0, 0, [[10]]);
    expect(wb.valuesRevision()).toBeGreaterThan(afterEntry);
  });

  it('updates a spill that keeps its area in place, and blocks it once a value is typed into it', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.SCALE(A1:B3, 10)']]);
    wb.setInputs('Data', 2, 1, [[7]]);
    expect(wb.valueAt(at('Data', 2, 4))).toBe(70);
    expect(wb.valueAt(at('Data', 1, 3))).toBe(30);
    // Excel: a spill whose range is no longer empty shows #SPILL! and none of its values (common practice (no source)).
    wb.setInputs('Data', 2, 4, [['typed']]);
    expect(wb.valueAt(at('Data', 0, 3))).toMatchObject({ error: '#SPILL!' });
    expect(wb.valueAt(at('Data', 1, 3))).toBeNull();
    expect(wb.valueAt(at('Data', 2, 4))).toBe('typed');
    wb.setInputs('Data', 2, 4, [[null]]);
    expect(wb.valueAt(at('Data', 2, 4))).toBe(70);
  });

  it('shows a thrown error with its message, an unknown function as #NAME?, a bad sheet as #REF!', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.FAIL()'], ['=PLUMB.NOPE(A1)'], ['=PLUMB.SUMCOL(Nowhere!A1:A2)'], ['=PLUMB.SUMCOL(A1:']]);
    expect(wb.valueAt(at('Data', 0, 3))).toEqual({ error: '#VALUE!', message: 'response is empty: select the column of responses.' });
    expect(wb.valueAt(at('Data', 1, 3))).toMatchObject({ error: '#NAME?' });
    expect(wb.valueAt(at('Data', 2, 3))).toMatchObject({ error: '#REF!' });
    expect(wb.valueAt(at('Data', 3, 3))).toMatchObject({ error: '#NAME?' });
  });

  it('evaluates formulas entered before their function is registered once it is', () => {
    const wb = createWorkbook('Data');
    wb.setInputs('Data', 0, 0, [[2], ['=PLUMB.LATE(A1)']]);
    expect(wb.valueAt(at('Data', 1, 0))).toMatchObject({ error: '#NAME?' });
    wb.registerFunction('late', (r: unknown) => (r as number[][])[0][0] * 3);
    expect(wb.valueAt(at('Data', 1, 0))).toBe(6);
  });

  // OfficeDev/office-js issue 1503 (by design): null in a returned array shows as 0. Blanks in
  // range arguments arrive as null (issues 4702, 5262; test/preview/workbook/functionArguments.test.ts).
  it('passes blanks as null and shows null results as 0, as Excel does', () => {
    const wb = createWorkbook('Data');
    let seen: unknown;
    wb.registerFunction('PEEK', (r: unknown) => {
      seen = r;
      return [[null, 'x']];
    });
    wb.setInputs('Data', 0, 0, [[1, null]]);
    wb.setInputs('Data', 2, 0, [['=PLUMB.PEEK(A1:B1)']]);
    expect(seen).toEqual([[1, null]]);
    expect(wb.valueAt(at('Data', 2, 0))).toBe(0);
    expect(wb.valueAt(at('Data', 2, 1))).toBe('x');
  });

  // Common practice (no source): in Excel "=B2" on an empty B2 shows 0, and so does every blank
  // cell of a spilled "=B2:B4"; the report must not rely on such references to carry blanks.
  it('shows a reference to an empty cell as 0, alone and inside a spilled range', () => {
    const wb = createWorkbook('Data');
    wb.setInputs('Data', 0, 1, [[5], [null], ['text']]);
    wb.setInputs('Data', 0, 4, [['=B2', '=B1:B3']]);
    expect(wb.valueAt(at('Data', 0, 4))).toBe(0);
    expect([0, 1, 2].map((row) => wb.valueAt(at('Data', row, 5)))).toEqual([5, 0, 'text']);
  });

  it('keeps sheet names unique and valid, and never deletes the last sheet', () => {
    const wb = createWorkbook('Data');
    expect(() => wb.addSheet('data')).toThrow(/already exists/);
    expect(() => wb.addSheet('a/b')).toThrow(/not a valid sheet name/);
    expect(() => wb.deleteSheet('Data')).toThrow(/at least one sheet/);
    wb.addSheet('Report');
    expect(wb.sheetNames()).toEqual(['Data', 'Report']);
  });

  it('reports the used extent including spilled values', () => {
    const wb = setup();
    wb.setInputs('Data', 0, 3, [['=PLUMB.SUMCOL(A1:B3)']]);
    expect(wb.usedExtent('Data')).toEqual({ rows: 3, columns: 4 });
  });
});

describe('text-formatted cells', () => {
  it('keep an entry that starts with "=" as text, as Excel does', () => {
    const wb = createWorkbook('Data');
    wb.setNumberFormats('Data', 0, 0, [['@']]);
    wb.setInputs('Data', 0, 0, [['=PLUMB.ANY(A2)']]);
    expect(wb.valueAt({ sheet: 'Data', row: 0, column: 0 })).toBe('=PLUMB.ANY(A2)');
  });
});
