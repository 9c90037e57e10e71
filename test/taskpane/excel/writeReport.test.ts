/**
 * The report writer against the preview host's Excel API shim in Node: a new sheet only, labels
 * that stay text whatever they start with, and no half-written sheet when a step fails.
 */
import { describe, expect, it } from 'vitest';
import { writeReport } from '../../../src/taskpane/excel/writeReport';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { freshWorkbook } from '../../preview/shim/harness';

const plan = (labels: string[]): ReportPlan => ({
  cells: labels.map((text, row) => ({ row, column: 0, kind: 'label', text })),
  formats: [],
  charts: [],
  specification: 'test',
});

describe('writeReport', () => {
  it('writes onto a new uniquely named sheet and keeps =, +, -, @ and tab labels as text', async () => {
    const model = freshWorkbook();
    model.addSheet('Plumbline report');
    const hostile = ['=SUM(1,2)', '+1', '-2', '@x', '\t=tab'];
    const name = await writeReport(() => plan(hostile));
    expect(name).toBe('Plumbline report 2');
    hostile.forEach((text, row) => {
      expect(model.inputAt({ sheet: name, row, column: 0 })).toBe(text);
      expect(model.valueAt({ sheet: name, row, column: 0 })).toBe(text);
    });
    expect(model.inputAt({ sheet: 'Plumbline report', row: 0, column: 0 })).toBeNull();
  });

  it('removes its new sheet when a step fails, leaving the workbook as it was', async () => {
    const model = freshWorkbook();
    const before = model.sheetNames();
    const bad: ReportPlan = { ...plan(['ok']), cells: [{ row: 0, column: 0, kind: 'formula', formula: '=1' }, { row: -5, column: 0, kind: 'value', value: 1 }] };
    await expect(writeReport(() => bad)).rejects.toBeDefined();
    expect(model.sheetNames()).toEqual(before);
  });
});
