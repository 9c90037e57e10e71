import { type Dispatch, useRef } from 'preact/hooks';
import { EngineError } from '../../engine';
import { freezeActiveReport } from '../excel/freezeCopy';
import { ReadCancelled } from '../excel/readRowBlocks';
import { missingSheetProblems } from '../excel/readRanges';
import { selectedAreas } from '../excel/selection';
import { clipChoiceAddresses } from '../excel/usedRows';
import { sheetsOf, watchSheets } from '../excel/watchData';
import { writeReport } from '../excel/writeReport';
import { type PaneChoices, type ResolvedRanges, resolveRanges, singleAreaProblem } from '../model/choices';
import { analyzeRead } from '../model/paneAnalysis';
import { planReport } from '../model/reportPlan';
import { type PaneData, readData } from '../readData';
import { refreshValuesReport, writeValuesReport } from '../valuesReport';
import type { PaneAction } from './paneActions';
import type { PaneState, RangeFieldName } from './paneState';
import { fieldOfFailure } from './readFailure';

export interface PaneCommands {
  takeSelection(field: RangeFieldName, append?: boolean): Promise<void>;
  readAndFit(): Promise<void>;
  writeReport(): Promise<void>;
  refresh(): Promise<void>;
  freeze(): Promise<void>;
  cancelRead(): void;
}

interface Chosen {
  ranges: ResolvedRanges;
  chosen: PaneChoices;
}

function failure(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** The pane's actions that talk to Excel; each reports what happened through `dispatch`. */
export function usePaneCommands(state: PaneState, dispatch: Dispatch<PaneAction>): PaneCommands {
  const cancel = useRef<AbortController | undefined>(undefined);
  const stopWatching = useRef<(() => Promise<void>) | undefined>(undefined);
  const failed = (message: string) => dispatch({ type: 'status', status: { kind: 'failed', message } });

  /** The choices with whole columns clipped to the rows in use (the fields show it), resolved to ranges. */
  const resolveChosen = async (): Promise<Chosen | undefined> => {
    let chosen: PaneChoices;
    try {
      // A sheet that does not exist is named on its field, before clipping would fail on it with
      // a message that names no field.
      const missing = await missingSheetProblems(state.choices);
      if (missing.length > 0) {
        dispatch({ type: 'checked', chosen: state.choices, problems: missing });
        return undefined;
      }
      chosen = await clipChoiceAddresses(state.choices);
    } catch (error) {
      failed(failure(error));
      return undefined;
    }
    const { ranges, problems } = resolveRanges(chosen);
    dispatch({ type: 'checked', chosen, problems });
    return ranges === undefined ? undefined : { ranges, chosen };
  };

  /**
   * Runs a block read with the progress bar and Cancel; a cancelled read leaves nothing behind. A
   * bad cell met while reading the data (`fromFields`) is shown beside the field it belongs to.
   */
  const withReading = async (run: (progress: (read: number, total: number) => void, signal: AbortSignal) => Promise<void>, fromFields = false) => {
    const controller = new AbortController();
    cancel.current = controller;
    try {
      await run((read, total) => dispatch({ type: 'readProgress', read, total }), controller.signal);
    } catch (error) {
      const problem = fromFields && error instanceof EngineError ? fieldOfFailure(error.message) : undefined;
      if (problem !== undefined) dispatch({ type: 'readRefused', problem });
      else failed(error instanceof ReadCancelled ? 'Reading cancelled' : failure(error));
    } finally {
      cancel.current = undefined;
      dispatch({ type: 'readEnded' });
    }
  };

  /** Watches the sheets just read, and no longer those of an earlier read. */
  const watchDataSheets = async (ranges: ResolvedRanges) => {
    try {
      await stopWatching.current?.();
      stopWatching.current = undefined;
      stopWatching.current = await watchSheets(sheetsOf(ranges), () => dispatch({ type: 'dataEdited' }));
    } catch {
      // Without change events the pane cannot flag data edits; Write report still reads the data
      // again first, so the report and the cards agree regardless.
      stopWatching.current = undefined;
    }
  };

  /** Reads the chosen ranges; the results then describe exactly these choices. */
  const readChosen = async ({ ranges, chosen }: Chosen): Promise<PaneData | undefined> => {
    let read: PaneData | undefined;
    await withReading(async (progress, signal) => {
      read = await readData(ranges, progress, signal);
    }, true);
    if (read !== undefined) {
      dispatch({ type: 'dataRead', data: read, chosen });
      await watchDataSheets(ranges);
    }
    return read;
  };

  const writeFrom = async ({ ranges, chosen }: Chosen, current: PaneData) => {
    const written = analyzeRead(current, chosen);
    if (typeof written === 'string') {
      failed(`No report was written: ${written}`);
      return;
    }
    dispatch({ type: 'status', status: { kind: 'busy', what: 'Writing the report…' } });
    try {
      if (written.source === 'streamed') {
        const saved = await writeValuesReport(ranges, chosen, written);
        dispatch({ type: 'valuesReportSaved', saved });
        const message = `Report written to the new sheet "${saved.sheetName}" as values: the data are too large for live formulas. Use Refresh after the data change.`;
        dispatch({ type: 'status', status: { kind: 'done', message } });
        return;
      }
      const name = await writeReport((sheetName) => planReport({ sheetName, ranges, choices: chosen, analysis: written, writtenAt: new Date() }));
      const message = `Report written to the new sheet "${name}". Its formulas stay live: edit the data or its settings cells and it recalculates.`;
      dispatch({ type: 'status', status: { kind: 'done', message } });
    } catch (error) {
      failed(`No report was written: ${failure(error)}`);
    }
  };

  return {
    takeSelection: async (field, append = false) => {
      try {
        const areas = await selectedAreas();
        const problem = singleAreaProblem(field, areas);
        if (problem !== undefined) dispatch({ type: 'selectionRefused', problem });
        else dispatch({ type: 'selected', field, address: areas.join(','), append });
      } catch (error) {
        failed(failure(error));
      }
    },

    readAndFit: async () => {
      // The earlier results go at once: checking the sheets may wait for a cell edit to end.
      dispatch({ type: 'readStarted' });
      const resolved = await resolveChosen();
      if (resolved === undefined) return;
      await readChosen(resolved);
    },

    writeReport: async () => {
      if (state.data === undefined) return;
      const resolved = await resolveChosen();
      if (resolved === undefined) return;
      // The data are read again first, so the cards show exactly what the report writes even after
      // a range or a data cell changed.
      const current = await readChosen(resolved);
      if (current !== undefined) await writeFrom(resolved, current);
    },

    refresh: async () => {
      const { saved } = state;
      if (saved === undefined) return;
      dispatch({ type: 'status', status: { kind: 'idle' } });
      await withReading(async (progress, signal) => {
        const updated = await refreshValuesReport(saved, progress, signal);
        dispatch({ type: 'valuesReportSaved', saved: updated });
        dispatch({ type: 'status', status: { kind: 'done', message: `Report "${updated.sheetName}" refreshed from the data.` } });
      });
    },

    freeze: async () => {
      dispatch({ type: 'status', status: { kind: 'busy', what: 'Copying values…' } });
      try {
        const name = await freezeActiveReport(new Date());
        dispatch({ type: 'status', status: { kind: 'done', message: `Values-only copy written to "${name}": it reads the same in Excel without Plumbline.` } });
      } catch (error) {
        failed(failure(error));
      }
    },

    cancelRead: () => cancel.current?.abort(),
  };
}
