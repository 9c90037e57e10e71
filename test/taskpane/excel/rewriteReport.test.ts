/**
 * Refresh's rewrite of a values report against the strict preview host: its cell writes go in
 * requests within the payload limit (RequestPayloadSizeLimitExceeded, "Error handling with the
 * application-specific JavaScript APIs"; lowered here so a small plan crosses it), in order, and
 * cells the new plan no longer has are emptied.
 */
import { describe, expect, it } from 'vitest';
import { rewriteReport } from '../../../src/taskpane/excel/rewriteReport';
import type { ReportCell, ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { freshHost } from '../../preview/shim/harness';

const label = (row: number, text: string): ReportCell => ({ row, column: 0, kind: 'label', text });
const plan = (cells: ReportCell[]): ReportPlan => ({ cells, formats: [], charts: [], specification: 'test' });

describe('rewriteReport against the strict host', () => {
  it('writes a plan heavier than one request allows, every cell, and empties the rows it dropped', async () => {
    const { model } = freshHost({ payloadLimitBytes: 30_000 });
    model.addSheet('Report');
    const previous = Array.from({ length: 402 }, (_, row) => label(row, `old ${row}`));
    model.setInputs(
      'Report',
      0,
      0,
      previous.map((c) => [c.kind === 'label' ? c.text : '']),
    );
    // 400 labels of about 200 characters: some 90 kB of text, three times the lowered limit.
    const next = Array.from({ length: 400 }, (_, row) => label(row, `${row}:${'w'.repeat(200)}`));
    await rewriteReport('Report', previous, plan(next));
    for (const row of [0, 199, 399]) expect(model.valueAt({ sheet: 'Report', row, column: 0 })).toBe(`${row}:${'w'.repeat(200)}`);
    expect(model.inputAt({ sheet: 'Report', row: 400, column: 0 })).toBeNull();
    expect(model.inputAt({ sheet: 'Report', row: 401, column: 0 })).toBeNull();
  });

  it('refuses a sheet that is gone, writing nothing', async () => {
    const { model } = freshHost();
    const before = model.sheetNames();
    await expect(rewriteReport('Report', [], plan([label(0, 'x')]))).rejects.toThrow('The report sheet "Report" is no longer there: write a new report.');
    expect(model.sheetNames()).toEqual(before);
  });
});
