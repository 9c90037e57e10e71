import { ReadCancelled } from './excel/readRowBlocks';
import { rewriteReport } from './excel/rewriteReport';
import { writeReport } from './excel/writeReport';
import { occupiedAddresses } from './excel/occupiedCells';
import { clearResidualTable, deleteSheet, writeResidualTable } from './excel/writeResidualTable';
import type { PaneChoices, ResolvedRanges } from './model/choices';
import { newlyWrittenAddresses } from './model/refreshFootprint';
import type { ReportCell } from './model/reportPlan';
import type { StreamedAnalysis } from './model/paneAnalysis';
import { analyzeStreamed } from './model/streamedAnalysis';
import { planValuesReport } from './model/valuesReportPlan';
import { readData } from './readData';

/** What Refresh needs to redo a values report: where it is, what it was made of, and what it wrote. */
export interface SavedValuesReport {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  cells: ReportCell[];
  /** Rows of the residual table beside the report, so a refresh can clear what it no longer needs. */
  residualRows: number;
}

const noProgress = (): void => undefined;

export async function writeValuesReport(ranges: ResolvedRanges, choices: PaneChoices, analysis: StreamedAnalysis): Promise<SavedValuesReport> {
  let cells: ReportCell[] = [];
  const sheetName = await writeReport((name) => {
    const plan = planValuesReport({ sheetName: name, ranges, choices, analysis, writtenAt: new Date() });
    cells = plan.cells;
    return plan;
  });
  try {
    const residualRows = await writeResidualTable(sheetName, ranges, analysis, noProgress, new AbortController().signal);
    return { sheetName, ranges, choices, cells, residualRows };
  } catch (error) {
    // No half-written report: the sheet this call added goes again.
    await deleteSheet(sheetName);
    throw error;
  }
}

/** Re-reads the report's own ranges with its own choices and rewrites its cells in place. */
export async function refreshValuesReport(
  saved: SavedValuesReport,
  progress: (read: number, total: number) => void,
  signal: AbortSignal,
): Promise<SavedValuesReport> {
  const read = await readData(saved.ranges, progress, signal, true);
  if (read.kind !== 'streamed') throw new Error('unreachable: a forced streamed read came back as cells');
  const analysis = analyzeStreamed(read.data, saved.choices);
  if (analysis.fit === undefined) throw new Error(analysis.fitError ?? 'The data no longer give a fit.');
  const plan = planValuesReport({ sheetName: saved.sheetName, ranges: saved.ranges, choices: saved.choices, analysis, writtenAt: new Date() });
  const fresh = newlyWrittenAddresses(saved.cells, plan.cells, saved.residualRows, analysis.fit.n);
  const occupied = await occupiedAddresses(saved.sheetName, fresh);
  if (occupied.length > 0) {
    throw new Error(
      `Refresh would write over cells filled since the report was written (${occupied.slice(0, 3).join(', ')}${occupied.length > 3 ? ', …' : ''}). Move them, or write a new report.`,
    );
  }
  // The table first: if it stops half way, the report's own cells still match the saved report.
  await clearResidualTable(saved.sheetName, saved.residualRows);
  let residualRows: number;
  try {
    residualRows = await writeResidualTable(saved.sheetName, saved.ranges, analysis, progress, signal);
  } catch (error) {
    // The error to report is the first one; a sheet deleted meanwhile has nothing left to clear.
    await clearResidualTable(saved.sheetName, Math.max(saved.residualRows, analysis.fit.n)).catch(() => undefined);
    const why = error instanceof ReadCancelled ? 'it was cancelled' : error instanceof Error ? error.message : String(error);
    throw new Error(`Refresh stopped (${why}). The report keeps its previous results and its residual table was cleared: press Refresh again.`, {
      cause: error,
    });
  }
  await rewriteReport(saved.sheetName, saved.cells, plan);
  return { ...saved, cells: plan.cells, residualRows };
}
