/**
 * A values report (large data) written and refreshed against the strict preview host: each waits
 * while the user edits a cell instead of failing ("Excel.RunOptions", delayForCellEdit), and a
 * refresh whose residual table fails half way leaves the report's own cells as they were, with
 * no half table. Expected estimates are the engine's streamed fit of the same invented rows
 * (common practice (no source)).
 */
import { afterEach, describe, expect, it } from 'vitest';
import type { PreviewWorkbook } from '../../src/preview/workbook/workbook';
import { RESIDUAL_TABLE_LEFT, RESIDUAL_TABLE_TOP } from '../../src/taskpane/model/residualTableLayout';
import { refreshValuesReport, writeValuesReport } from '../../src/taskpane/valuesReport';
import { injectTableWriteFailure } from './excel/faults';
import { afterPendingWork, freshHost } from '../preview/shim/harness';
import { streamedFixture } from './excel/streamedFixture';

/** The intercept's estimate as the report shows it: the row after the "Term" header. */
function shownIntercept(model: PreviewWorkbook, sheet: string): unknown {
  for (let row = 0; row < 80; row++) {
    if (model.valueAt({ sheet, row, column: 0 }) === 'Term') return model.valueAt({ sheet, row: row + 1, column: 1 });
  }
  throw new Error('no term table on the report');
}

const firstEntry = (sheet: string) => ({ sheet, row: RESIDUAL_TABLE_TOP + 1, column: RESIDUAL_TABLE_LEFT });

describe('values report against the strict host', () => {
  let restore = (): void => undefined;
  afterEach(() => restore());

  it('writes, and later refreshes, while the user edits a cell: each waits for the edit to end and then completes', async () => {
    const { model } = freshHost({ syncDelayMs: 1 });
    const { ranges, choices, analysis } = await streamedFixture(model, { rows: 2_000, predictors: 2 });
    const before = model.sheetNames();
    model.setCellEditMode(true);
    const writing = writeValuesReport(ranges, choices, analysis);
    await afterPendingWork();
    expect(model.sheetNames()).toEqual(before);
    model.setCellEditMode(false);
    const saved = await writing;
    expect(saved.residualRows).toBe(2_000);
    expect(shownIntercept(model, saved.sheetName)).toBe(analysis.fit?.terms[0].estimate);

    model.setInputs('Data', 1, 0, [[1_000]]);
    model.setCellEditMode(true);
    const refreshing = refreshValuesReport(saved, () => undefined, new AbortController().signal);
    await afterPendingWork();
    expect(shownIntercept(model, saved.sheetName)).toBe(analysis.fit?.terms[0].estimate);
    model.setCellEditMode(false);
    await refreshing;
    expect(shownIntercept(model, saved.sheetName)).not.toBe(analysis.fit?.terms[0].estimate);
  });

  it('keeps the report’s cells and clears the table when a refresh’s table write fails, saying so', async () => {
    const { model } = freshHost({ syncDelayMs: 1 });
    const { ranges, choices, analysis } = await streamedFixture(model, { rows: 2_000, predictors: 2 });
    const saved = await writeValuesReport(ranges, choices, analysis);
    const intercept = shownIntercept(model, saved.sheetName);
    expect(model.valueAt(firstEntry(saved.sheetName))).toBe(2);
    model.setInputs('Data', 1, 0, [[1_000]]);
    const counts = injectTableWriteFailure(1);
    restore = counts.restore;
    await expect(refreshValuesReport(saved, () => undefined, new AbortController().signal)).rejects.toThrow(
      'Refresh stopped (injected failure of a table write). The report keeps its previous results and its residual table was cleared: press Refresh again.',
    );
    expect(shownIntercept(model, saved.sheetName)).toBe(intercept);
    expect(model.inputAt(firstEntry(saved.sheetName))).toBeNull();
    expect(counts.writesAfterFailure).toBe(0);
  });
});
