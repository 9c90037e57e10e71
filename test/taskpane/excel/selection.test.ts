/**
 * Use selection against the preview host: several areas and whole columns, as Excel reports
 * them ("Excel.Workbook": getSelectedRange throws when several areas are selected,
 * getSelectedRanges returns them all; "Excel.Worksheet": getUsedRangeOrNullObject(valuesOnly)).
 */
import { describe, expect, it } from 'vitest';
import { MAX_ROWS } from '../../../src/addressing/a1';
import { selectedAreas } from '../../../src/taskpane/excel/selection';
import { clipChoiceAddresses } from '../../../src/taskpane/excel/usedRows';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import { freshHost, freshWorkbook } from '../../preview/shim/harness';

/** Sheet "Data": a header row and rows 2–7 in columns A:D, so the used range is A1:D7. */
function dataWorkbook() {
  const model = freshWorkbook();
  model.addSheet('Data');
  model.setInputs('Data', 0, 0, [['y', 'a', 'b', 'c'], ...Array.from({ length: 6 }, (_, i) => [i, i * 2, i * 3, i * 4])]);
  return model;
}

describe('selectedAreas', () => {
  it('gives one area as Excel writes it', async () => {
    const model = dataWorkbook();
    model.select({ sheet: 'Data', top: 1, left: 1, bottom: 6, right: 1 });
    expect(await selectedAreas()).toEqual(['Data!B2:B7']);
  });

  it('gives every area of a multi-area selection, where getSelectedRange would throw', async () => {
    const model = dataWorkbook();
    model.selectAreas([
      { sheet: 'Data', top: 0, left: 1, bottom: 6, right: 1 },
      { sheet: 'Data', top: 0, left: 3, bottom: 6, right: 3 },
    ]);
    expect(await selectedAreas()).toEqual(['Data!B1:B7', 'Data!D1:D7']);
  });

  it('clips whole columns among several areas, leaving the others as selected', async () => {
    const model = dataWorkbook();
    model.selectAreas([
      { sheet: 'Data', top: 0, left: 0, bottom: MAX_ROWS - 1, right: 0 },
      { sheet: 'Data', top: 2, left: 2, bottom: 4, right: 2 },
    ]);
    expect(await selectedAreas()).toEqual(['Data!A1:A7', 'Data!C3:C5']);
  });

  it('clips a whole column (Data!B:B) to the rows of the sheet’s used range', async () => {
    const model = dataWorkbook();
    model.select({ sheet: 'Data', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 2 });
    expect(await selectedAreas()).toEqual(['Data!B1:C7']);
  });

  it('refuses a whole column of an empty sheet, saying what to select', async () => {
    const model = dataWorkbook();
    model.addSheet('Empty');
    model.select({ sheet: 'Empty', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 1 });
    await expect(selectedAreas()).rejects.toThrow('Empty!B:B is a whole column of a sheet with no data: select the cells that hold the data.');
  });
});

describe('clipChoiceAddresses', () => {
  it('clips typed whole columns in every field to the same used rows and leaves other text as typed', async () => {
    dataWorkbook();
    const choices = { ...EMPTY_CHOICES, response: 'Data!A:A', predictors: 'Data!B2:B7, Data!$C:$D', weights: '' };
    const clipped = await clipChoiceAddresses(choices);
    expect(clipped.response).toBe('Data!A1:A7');
    expect(clipped.predictors).toBe('Data!B2:B7,Data!C1:D7');
    expect(clipped.weights).toBe('');
    const untouched = { ...choices, response: 'Data!A1:A7', predictors: 'Data!B1:B7,  Data!C1:C7' };
    expect(await clipChoiceAddresses(untouched)).toBe(untouched);
  });
});

describe('selectedAreas while a cell is being edited', () => {
  it.each(['InvalidOperation', 'InvalidOperationInCellEditMode'] as const)('says what to do when the batch fails with %s', async (code) => {
    const { model } = freshHost({ cellEditErrorCode: code });
    model.addSheet('Data');
    model.select({ sheet: 'Data', top: 0, left: 0, bottom: 3, right: 0 });
    model.setCellEditMode(true);
    await expect(selectedAreas()).rejects.toThrow(
      `Excel could not read the selection (${code}). If a cell is being edited, finish it with Enter or Esc, select the range again and press Use selection.`,
    );
  });
});
