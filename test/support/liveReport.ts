/**
 * What the pane does for Write report, in the preview host in Node: resolve the choices, read the
 * cells, analyse them and write the live report. For tests that need a real report on a sheet
 * (start the host with plumbPreview first).
 */
import { writeReport } from '../../src/taskpane/excel/writeReport';
import { analyzeCells } from '../../src/taskpane/model/analysis';
import { type PaneChoices, resolveRanges } from '../../src/taskpane/model/choices';
import type { CellsAnalysis } from '../../src/taskpane/model/paneAnalysis';
import { planReport, type ReportPlan } from '../../src/taskpane/model/reportPlan';
import { readData } from '../../src/taskpane/readData';

export async function writeLiveReportFor(choices: PaneChoices, writtenAt = new Date('2026-12-03T10:00:00Z')) {
  const { ranges } = resolveRanges(choices);
  if (ranges === undefined) throw new Error('bad test ranges');
  const read = await readData(ranges, () => undefined, new AbortController().signal, false);
  if (read.kind !== 'cells') throw new Error('expected the in-memory read');
  const analysis: CellsAnalysis = analyzeCells(read.data, choices);
  let planned: ReportPlan | undefined;
  const sheet = await writeReport((sheetName) => {
    planned = planReport({ sheetName, ranges, choices, analysis, writtenAt });
    return planned;
  });
  if (planned === undefined) throw new Error('no plan');
  return { sheet, plan: planned, analysis, ranges, cells: read.data };
}
