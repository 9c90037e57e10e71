/**
 * A typed address on a sheet the workbook lacks is named on its own field, against the preview
 * host. Excel's side: "Excel.WorksheetCollection", getItemOrNullObject(key) returns an object whose
 * isNullObject is true when the sheet does not exist; "OfficeExtension.ClientObject", isNullObject
 * may be read only after context.sync() (Microsoft Learn). Sheet names match without case.
 */
import { describe, expect, it } from 'vitest';
import { missingSheetProblems } from '../../../src/taskpane/excel/readRanges';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import { freshWorkbook } from '../../preview/shim/harness';

function workbookWithSheets() {
  const model = freshWorkbook();
  model.addSheet('Data');
  model.addSheet('Planned batches');
  return model;
}

describe('missingSheetProblems', () => {
  it('says nothing when every sheet exists, whatever the case the name was typed in', async () => {
    workbookWithSheets();
    const choices = { ...EMPTY_CHOICES, response: 'Data!B1:B40', predictors: 'data!C1:D40', newRows: "'Planned batches'!B2:C4" };
    expect(await missingSheetProblems(choices)).toEqual([]);
  });

  it('names the missing sheet on each field that uses it', async () => {
    workbookWithSheets();
    const choices = {
      ...EMPTY_CHOICES,
      response: 'Dta!B2:B40',
      predictors: 'Data!C2:C40, Dta!E2:E40',
      weights: 'Data!F2:F40',
      newRows: "'Planned bathces'!B2:C4",
    };
    const problems = await missingSheetProblems(choices);
    expect(problems.map((p) => p.field)).toEqual(['response', 'predictors', 'newRows']);
    expect(problems[0].message).toMatch(/^There is no sheet named Dta\. /);
    expect(problems[1].message).toMatch(/^There is no sheet named Dta\. /);
    expect(problems[2].message).toMatch(/^There is no sheet named Planned bathces\. /);
  });

  it('names a field once per missing sheet, however many of its areas are on it', async () => {
    workbookWithSheets();
    const problems = await missingSheetProblems({ ...EMPTY_CHOICES, response: 'Data!B2:B9', predictors: 'Old!C2:C9, Old!E2:E9, Gone!F2:F9' });
    expect(problems.map((p) => [p.field, p.message.split('.')[0]])).toEqual([
      ['predictors', 'There is no sheet named Old'],
      ['predictors', 'There is no sheet named Gone'],
    ]);
  });

  it('leaves empty fields and text that is no address to the address checks', async () => {
    workbookWithSheets();
    expect(await missingSheetProblems({ ...EMPTY_CHOICES, response: 'not an address', predictors: 'B2:B9' })).toEqual([]);
  });

  it('sees a sheet removed since the address was typed', async () => {
    const model = workbookWithSheets();
    const choices = { ...EMPTY_CHOICES, response: 'Data!B2:B9', predictors: 'Data!C2:C9' };
    expect(await missingSheetProblems(choices)).toEqual([]);
    model.renameSheet('Data', 'Data (old)');
    expect((await missingSheetProblems(choices)).map((p) => p.field)).toEqual(['response', 'predictors']);
  });
});
