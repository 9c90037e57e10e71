/**
 * Worksheet.onChanged, after "Work with events using the Excel JavaScript API" and the
 * "Excel.WorksheetChangedEventArgs interface" page: a handler added (and synced) runs after cells
 * of its sheet change, with the changed address; remove() stops it; recalculation is no change.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { afterPendingWork, freshWorkbook } from './harness';

describe('Worksheet.onChanged', () => {
  let model: PreviewWorkbook;
  beforeEach(() => {
    model = freshWorkbook();
    model.addSheet('Data');
    model.setInputs('Data', 0, 0, [[1], [2]]);
    model.setInputs('Sheet1', 0, 0, [['=SUM(Data!A1:A2)']]);
  });

  const watch = async (sheet: string, seen: string[]) =>
    Excel.run(async (context) => {
      const result = context.workbook.worksheets.getItem(sheet).onChanged.add(async (args) => {
        seen.push(`${args.changeType} ${args.address}`);
      });
      await context.sync();
      return result;
    });

  it('calls the handler after an edit on its sheet only, with the address without the sheet', async () => {
    const seen: string[] = [];
    await watch('Data', seen);
    model.setInputs('Data', 1, 0, [[5]]);
    expect(seen).toEqual([]); // raised after the change, not inside it
    await afterPendingWork();
    expect(seen).toEqual(['RangeEdited A2']);
    model.setInputs('Sheet1', 4, 1, [['x']]);
    await afterPendingWork();
    expect(seen).toEqual(['RangeEdited A2']); // Sheet1 changed (its SUM recalculated too): not Data's event
  });

  it('raises nothing before the add is synced, and nothing once remove() is synced', async () => {
    const seen: string[] = [];
    await Excel.run(async (context) => {
      const result = context.workbook.worksheets.getItem('Data').onChanged.add(async (args) => {
        seen.push(args.address);
      });
      model.setInputs('Data', 0, 0, [[9]]);
      await afterPendingWork();
      expect(seen).toEqual([]);
      await context.sync();
      model.setInputs('Data', 0, 0, [[8]]);
      await afterPendingWork();
      expect(seen).toEqual(['A1']);
      result.remove();
      await context.sync();
    });
    model.setInputs('Data', 0, 0, [[7]]);
    await afterPendingWork();
    expect(seen).toEqual(['A1']);
  });

  it('refuses a handler on a sheet that does not exist at the sync (ItemNotFound)', async () => {
    await expect(watch('Nowhere', [])).rejects.toMatchObject({ code: 'ItemNotFound' });
  });
});
