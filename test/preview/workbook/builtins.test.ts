/**
 * The worksheet functions and the operator the report's chart guide cells use, by Microsoft
 * Support's pages: "MIN function" and "MAX function" (only numbers in a reference are used;
 * empty cells, logical values and text are ignored; no numbers gives 0; error values cause
 * errors), "COUNT function" (empty cells, logical values, text and error values in a reference
 * are not counted) and "How to correct a #DIV/0! error" (dividing by zero or by an empty cell).
 * Expected values are worked by hand.
 */
import { describe, expect, it } from 'vitest';
import { CustomFunctionsError } from '../../../src/preview/workbook/customFunctionError';
import { createWorkbook } from '../../../src/preview/workbook/workbook';

const at = (row: number, column: number) => ({ sheet: 'Data', row, column });

function withColumn() {
  const wb = createWorkbook('Data');
  // A1:A6: 4, blank, "text", TRUE, -2.5, 7
  wb.setInputs('Data', 0, 0, [[4], [null], ['text'], [true], [-2.5], [7]]);
  return wb;
}

describe('preview worksheet functions', () => {
  it('MIN and MAX use only the numbers of a reference, over several arguments', () => {
    const wb = withColumn();
    wb.setInputs('Data', 0, 2, [['=MIN(A1:A6)'], ['=MAX(A1:A6)'], ['=MIN(A1:A2, 3)'], ['=max(A2:A4)']]);
    expect(wb.valueAt(at(0, 2))).toBe(-2.5);
    expect(wb.valueAt(at(1, 2))).toBe(7);
    expect(wb.valueAt(at(2, 2))).toBe(3);
    // No numbers at all: 0.
    expect(wb.valueAt(at(3, 2))).toBe(0);
  });

  it('COUNT counts only numbers, skipping error values that MIN passes on', () => {
    const wb = withColumn();
    wb.registerFunction('FAIL', () => {
      throw new CustomFunctionsError('#N/A', 'nothing here');
    });
    wb.setInputs('Data', 6, 0, [['=PLUMB.FAIL()']]);
    wb.setInputs('Data', 0, 2, [['=COUNT(A1:A7)'], ['=MIN(A1:A7)']]);
    expect(wb.valueAt(at(0, 2))).toBe(3);
    expect(wb.valueAt(at(1, 2))).toMatchObject({ error: '#N/A' });
  });

  it('divides, with #DIV/0! for a zero or empty divisor', () => {
    const wb = withColumn();
    wb.setInputs('Data', 0, 2, [['=4/COUNT(A1:A6)'], ['=A1/A2'], ['=A6/A1/2'], ['=A1/0']]);
    expect(wb.valueAt(at(0, 2))).toBeCloseTo(4 / 3, 15);
    expect(wb.valueAt(at(1, 2))).toEqual({ error: '#DIV/0!' });
    // Left to right: (7 / 4) / 2.
    expect(wb.valueAt(at(2, 2))).toBe(0.875);
    expect(wb.valueAt(at(3, 2))).toEqual({ error: '#DIV/0!' });
  });

  it('recalculates when a cell it reads changes', () => {
    const wb = withColumn();
    wb.setInputs('Data', 0, 2, [['=MAX(A1:A6)'], ['=4/COUNT(A1:A6)']]);
    wb.setInputs('Data', 1, 0, [[20]]);
    expect(wb.valueAt(at(0, 2))).toBe(20);
    expect(wb.valueAt(at(1, 2))).toBe(1);
  });

  it('refuses what Excel would convert or spill, rather than guess', () => {
    const wb = withColumn();
    wb.setInputs('Data', 0, 2, [['=MIN("3", 5)'], ['=A1:A2/2'], ['=A3/2'], ['=COUNT(A1, )']]);
    for (let row = 0; row < 4; row++) expect(wb.valueAt(at(row, 2))).toMatchObject({ error: '#VALUE!' });
  });
});
