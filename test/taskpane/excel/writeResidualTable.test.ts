/**
 * The residual table beside a values report, against the strict preview host whose syncs settle
 * a macrotask later, as a real host's do: each block is written, and awaited, before the next is
 * read, so the first failure stops every later read and write and the caller can remove the sheet
 * knowing nothing more will land on it. Expected entries come from the engine's own fit of the
 * same invented rows (common practice (no source)).
 */
import { afterEach, describe, expect, it } from 'vitest';
import { tablePieces } from '../../../src/taskpane/model/residualTableLayout';
import { writeResidualTable } from '../../../src/taskpane/excel/writeResidualTable';
import { writeValuesReport } from '../../../src/taskpane/valuesReport';
import { injectTableWriteFailure } from './faults';
import { streamedFixture } from './streamedFixture';
import { freshHost } from '../../preview/shim/harness';

describe('writeResidualTable against a host whose syncs take time', () => {
  let restore = (): void => undefined;
  afterEach(() => restore());

  it('writes every used row’s entry, in order, from several read blocks', async () => {
    const { model } = freshHost({ syncDelayMs: 1 });
    const rows = 30_000;
    const { ranges, analysis } = await streamedFixture(model, { rows, predictors: 5 });
    model.addSheet('Report');
    const written = await writeResidualTable('Report', ranges, analysis, () => undefined, new AbortController().signal);
    expect(written).toBe(rows);
    const fit = analysis.fit;
    if (fit === undefined) throw new Error('the fixture must fit');
    for (const entry of [0, 1, 23_999, rows - 1]) {
      const piece = tablePieces(entry, 1)[0];
      const top = { sheet: 'Report', row: piece.top, column: piece.left };
      // Data row `entry` is sheet row entry + 2 (header in row 1).
      expect(model.valueAt(top)).toBe(entry + 2);
    }
  });

  it('names each entry by its worksheet row, wherever the data start, skipping a blank row', async () => {
    // Sheet row 15 is "row 15" (common practice (no source): the number at the sheet's left edge).
    const { model } = freshHost();
    const { ranges, analysis } = await streamedFixture(model, { rows: 40, predictors: 2, headerRow: 10, blankResponses: [4] });
    model.addSheet('Report');
    const written = await writeResidualTable('Report', ranges, analysis, () => undefined, new AbortController().signal);
    expect(written).toBe(39);
    const rowsShown = Array.from({ length: written }, (_, entry) => {
      const piece = tablePieces(entry, 1)[0];
      return model.valueAt({ sheet: 'Report', row: piece.top, column: piece.left });
    });
    // Header in sheet row 10, data in rows 11–50, the response of row 15 blank.
    expect(rowsShown).toEqual([11, 12, 13, 14, ...Array.from({ length: 35 }, (_, k) => 16 + k)]);
  });

  it('stops at the first failed write: no later block is read or written', async () => {
    const { model } = freshHost({ syncDelayMs: 1 });
    const { ranges, analysis } = await streamedFixture(model, { rows: 50_000, predictors: 5 });
    model.addSheet('Report');
    const counts = injectTableWriteFailure(1);
    restore = counts.restore;
    await expect(writeResidualTable('Report', ranges, analysis, () => undefined, new AbortController().signal)).rejects.toThrow(
      'injected failure of a table write',
    );
    expect(counts.failed).toBe(true);
    expect(counts.writesAfterFailure).toBe(0);
    expect(counts.loadsAfterFailure).toBe(0);
  });

  it('leaves no report sheet when a table write fails inside Write report, and nothing lands on it afterwards', async () => {
    const { model } = freshHost({ syncDelayMs: 1 });
    const { ranges, choices, analysis } = await streamedFixture(model, { rows: 50_000, predictors: 5 });
    const before = model.sheetNames();
    const counts = injectTableWriteFailure(1);
    restore = counts.restore;
    await expect(writeValuesReport(ranges, choices, analysis)).rejects.toThrow('injected failure of a table write');
    expect(model.sheetNames()).toEqual(before);
    expect(counts.writesAfterFailure).toBe(0);
  });
});
