/**
 * Batches while the user edits a cell, after "Delay execution while cell is being edited": with
 * delayForCellEdit false (the default) the batch fails with InvalidOperation; with true it waits
 * and runs after the edit is committed or cancelled. The Excel.RunOptions signature is
 * Excel.run(options, batch) ("Excel.RunOptions").
 */
import { describe, expect, it } from 'vitest';
import { afterPendingWork, freshHost, officeError } from './harness';

const write = (text: string) => async (context: Excel.RequestContext) => {
  context.workbook.worksheets.getItem('Sheet1').getRange('A1').values = [[text]];
  await context.sync();
};

describe('cell edit mode', () => {
  it('rejects a batch without delayForCellEdit with InvalidOperation and applies none of it', async () => {
    const { model } = freshHost();
    model.setCellEditMode(true);
    const error = await officeError(Excel.run(write('typed meanwhile')));
    expect(error.code).toBe('InvalidOperation');
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBeNull();
  });

  it('can raise InvalidOperationInCellEditMode instead, the other code the error table lists', async () => {
    const { model } = freshHost({ cellEditErrorCode: 'InvalidOperationInCellEditMode' });
    model.setCellEditMode(true);
    expect((await officeError(Excel.run({ delayForCellEdit: false }, write('x')))).code).toBe('InvalidOperationInCellEditMode');
  });

  it('holds a batch run with delayForCellEdit until the edit ends, then runs it', async () => {
    const { model } = freshHost();
    model.setCellEditMode(true);
    let settled = false;
    const run = Excel.run({ delayForCellEdit: true }, write('after the edit')).then(() => {
      settled = true;
    });
    await afterPendingWork();
    expect(settled).toBe(false);
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBeNull();
    model.setCellEditMode(false);
    await run;
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe('after the edit');
  });

  it('fails a later sync of a running batch when editing starts between its syncs', async () => {
    const { model } = freshHost();
    const error = await officeError(
      Excel.run(async (context) => {
        const cell = context.workbook.worksheets.getItem('Sheet1').getRange('A1');
        cell.values = [['one']];
        await context.sync();
        model.setCellEditMode(true);
        cell.values = [['two']];
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidOperation');
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe('one');
  });

  it('runs batches as usual once no cell is being edited', async () => {
    const { model } = freshHost();
    model.setCellEditMode(true);
    model.setCellEditMode(false);
    await Excel.run(write('fine'));
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe('fine');
  });
});

describe('a batch whose work is all synced', () => {
  // From memory: Office.js sends no request for a sync with nothing queued.
  it('is not failed by an edit that starts after its last sync: the final implicit sync sends nothing', async () => {
    const { model } = freshHost();
    await Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Sheet1').getRange('A1').values = [['done']];
      await context.sync();
      model.setCellEditMode(true);
    });
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe('done');
  });
});
