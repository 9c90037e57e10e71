import { useMemo, useRef, useState } from 'preact/hooks';
import { freezeActiveReport } from './excel/freezeCopy';
import { ReadCancelled } from './excel/readRowBlocks';
import { selectedAreas } from './excel/selection';
import { clipChoiceAddresses } from './excel/usedRows';
import { sheetsOf, watchSheets } from './excel/watchData';
import { writeReport } from './excel/writeReport';
import { analyze } from './model/analysis';
import { EMPTY_CHOICES, type FieldProblem, type PaneChoices, type ResolvedRanges, resolveRanges, singleAreaProblem } from './model/choices';
import { noiseSdProblem } from './model/noiseSdField';
import { planReport } from './model/reportPlan';
import { analyzeStreamed } from './model/streamedAnalysis';
import { type PaneData, readData } from './readData';
import { changedReadInputs, staleMessage } from './staleness';
import { refreshValuesReport, type SavedValuesReport, writeValuesReport } from './valuesReport';
import { DataSummary } from './views/DataSummary';
import { RangeField } from './views/RangeField';
import { ReadProgress } from './views/ReadProgress';
import { ResultCards } from './views/ResultCards';
import { StreamedSummary } from './views/StreamedSummary';
import { useOfficeTheme } from './views/useOfficeTheme';

type Status = { kind: 'idle' } | { kind: 'busy'; what: string } | { kind: 'done'; message: string } | { kind: 'failed'; message: string };

function failure(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** The one analysis of read data under the current choices: the cards show it and Write report writes it. */
function analysisOf(data: PaneData, choices: PaneChoices) {
  try {
    return data.kind === 'cells' ? analyze(data.data, choices) : analyzeStreamed(data.data, choices);
  } catch (error) {
    return failure(error);
  }
}

/** The guided pane: data, settings, comparison and prediction choices, results in words, and the report. */
export function App() {
  useOfficeTheme();
  const [choices, setChoices] = useState<PaneChoices>(EMPTY_CHOICES);
  const [problems, setProblems] = useState<FieldProblem[]>([]);
  const [data, setData] = useState<PaneData | undefined>(undefined);
  /** The (clipped) choices the data were read with: a later change of a range makes the results stale. */
  const [readChoices, setReadChoices] = useState<PaneChoices | undefined>(undefined);
  /** Set when cells on the data's sheets change after the read. */
  const [dataChanged, setDataChanged] = useState(false);
  const stopWatching = useRef<(() => Promise<void>) | undefined>(undefined);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });
  const [reading, setReading] = useState<{ read: number; total: number } | undefined>(undefined);
  const [saved, setSaved] = useState<SavedValuesReport | undefined>(undefined);
  const cancel = useRef<AbortController | undefined>(undefined);

  const update = (patch: Partial<PaneChoices>) => setChoices((c) => ({ ...c, ...patch }));
  const problemFor = (field: keyof PaneChoices) => problems.find((p) => p.field === field)?.message;
  const analysis = useMemo(() => (data === undefined ? undefined : analysisOf(data, choices)), [data, choices]);
  const stale = readChoices === undefined ? undefined : staleMessage(changedReadInputs(readChoices, choices), dataChanged);
  // Checked as the user types, by the rule noise_sd follows in the cells.
  const sigmaProblem = noiseSdProblem(choices.knownSigma);

  const useSelection =
    (field: 'response' | 'predictors' | 'weights' | 'newRows', append = false) =>
    async () => {
      try {
        const areas = await selectedAreas();
        const problem = singleAreaProblem(field, areas);
        setProblems((found) => [...found.filter((p) => p.field !== field), ...(problem === undefined ? [] : [problem])]);
        if (problem !== undefined) return;
        const address = areas.join(',');
        setChoices((c) => ({
          ...c,
          [field]: append && c[field].trim() !== '' ? `${c[field]},${address}` : address,
          ...(field === 'predictors' ? { added: [] } : {}),
        }));
      } catch (error) {
        setStatus({ kind: 'failed', message: failure(error) });
      }
    };

  /** The choices with whole columns clipped to the rows in use (the fields show it), resolved to ranges. */
  const resolveChosen = async (): Promise<{ ranges: ResolvedRanges; chosen: PaneChoices } | undefined> => {
    let chosen: PaneChoices;
    try {
      chosen = await clipChoiceAddresses(choices);
    } catch (error) {
      setStatus({ kind: 'failed', message: failure(error) });
      return undefined;
    }
    if (chosen !== choices) setChoices(chosen);
    const { ranges, problems: found } = resolveRanges(chosen);
    setProblems(found);
    return ranges === undefined ? undefined : { ranges, chosen };
  };

  /** Runs a block read with the progress bar and Cancel; a cancelled read leaves nothing behind. */
  const withReading = async (run: (progress: (read: number, total: number) => void, signal: AbortSignal) => Promise<void>) => {
    const controller = new AbortController();
    cancel.current = controller;
    try {
      await run((read, total) => setReading({ read, total }), controller.signal);
    } catch (error) {
      setStatus(error instanceof ReadCancelled ? { kind: 'failed', message: 'Reading cancelled' } : { kind: 'failed', message: failure(error) });
    } finally {
      cancel.current = undefined;
      setReading(undefined);
    }
  };

  /** Reads the chosen ranges; the results then describe exactly these choices. */
  const readChosen = async ({ ranges, chosen }: { ranges: ResolvedRanges; chosen: PaneChoices }): Promise<PaneData | undefined> => {
    let read: PaneData | undefined;
    await withReading(async (progress, signal) => {
      read = await readData(ranges, progress, signal);
    });
    if (read !== undefined) {
      setData(read);
      setReadChoices(chosen);
      setDataChanged(false);
      await watchDataSheets(ranges);
    }
    return read;
  };

  /** Watches the sheets just read, and no longer those of an earlier read. */
  const watchDataSheets = async (ranges: ResolvedRanges) => {
    try {
      await stopWatching.current?.();
      stopWatching.current = undefined;
      stopWatching.current = await watchSheets(sheetsOf(ranges), () => setDataChanged(true));
    } catch {
      // Without change events the pane cannot flag data edits; Write report still reads the data
      // again first, so the report and the cards agree regardless.
      stopWatching.current = undefined;
    }
  };

  const readAndFit = async () => {
    const resolved = await resolveChosen();
    if (resolved === undefined) return;
    setData(undefined);
    setReadChoices(undefined);
    setStatus({ kind: 'idle' });
    await readChosen(resolved);
  };

  const report = async () => {
    if (analysis === undefined || typeof analysis === 'string' || data === undefined) return;
    const resolved = await resolveChosen();
    if (resolved === undefined) return;
    const { ranges, chosen } = resolved;
    // The data are read again first, so the cards show exactly what the report writes even after
    // a range or a data cell changed.
    const current = await readChosen(resolved);
    if (current === undefined) return;
    const written = analysisOf(current, chosen);
    if (typeof written === 'string') {
      setStatus({ kind: 'failed', message: `No report was written: ${written}` });
      return;
    }
    setStatus({ kind: 'busy', what: 'Writing the report…' });
    try {
      if ('kind' in written && current.kind === 'streamed') {
        const valuesReport = await writeValuesReport(ranges, chosen, written, current.dataRows);
        setSaved(valuesReport);
        setStatus({
          kind: 'done',
          message: `Report written to the new sheet "${valuesReport.sheetName}" as values: the data are too large for live formulas. Use Refresh after the data change.`,
        });
        return;
      }
      if ('kind' in written) return;
      const name = await writeReport((sheetName) => planReport({ sheetName, ranges, choices: chosen, analysis: written, writtenAt: new Date() }));
      setStatus({
        kind: 'done',
        message: `Report written to the new sheet "${name}". Its formulas stay live: edit the data or its settings cells and it recalculates.`,
      });
    } catch (error) {
      setStatus({ kind: 'failed', message: `No report was written: ${failure(error)}` });
    }
  };

  const refresh = async () => {
    if (saved === undefined) return;
    setStatus({ kind: 'idle' });
    await withReading(async (progress, signal) => {
      const updated = await refreshValuesReport(saved, progress, signal);
      setSaved(updated);
      setStatus({ kind: 'done', message: `Report "${updated.sheetName}" refreshed from the data.` });
    });
  };

  const freeze = async () => {
    setStatus({ kind: 'busy', what: 'Copying values…' });
    try {
      const name = await freezeActiveReport(new Date());
      setStatus({ kind: 'done', message: `Values-only copy written to "${name}": it reads the same in Excel without Plumbline.` });
    } catch (error) {
      setStatus({ kind: 'failed', message: failure(error) });
    }
  };

  const predictorNames =
    data?.kind === 'streamed'
      ? data.data.header.predictorNames
      : data?.data.predictorColumns.map((column, j) => {
          const first = column[0]?.[0];
          return typeof analysis === 'object' && 'frame' in analysis && analysis.frame.hasHeader && typeof first === 'string' ? first : `x${j + 1}`;
        });

  return (
    <main class="pane">
      <h1>Plumbline</h1>
      <section aria-labelledby="data-heading">
        <h2 id="data-heading">Data</h2>
        <RangeField
          id="response"
          label="Response (one column)"
          hint="Include the header cell to name it."
          value={choices.response}
          problem={problemFor('response')}
          onChange={(response) => update({ response })}
          onUseSelection={useSelection('response')}
        />
        <RangeField
          id="predictors"
          label="Predictors"
          hint="One or more column areas with the response's rows. Text columns are categorical."
          value={choices.predictors}
          problem={problemFor('predictors')}
          onChange={(predictors) => update({ predictors, added: [] })}
          onUseSelection={useSelection('predictors')}
          onAddSelection={useSelection('predictors', true)}
        />
        <button type="button" class="primary" onClick={readAndFit} disabled={reading !== undefined}>
          Read data and fit
        </button>
        {reading !== undefined && <ReadProgress read={reading.read} total={reading.total} onCancel={() => cancel.current?.abort()} />}
        {status.kind === 'busy' && (
          <div class="progress" role="status">
            <progress aria-label={status.what} />
            <span>{status.what}</span>
          </div>
        )}
        {typeof analysis === 'string' && (
          <p class="problem" role="alert">
            {analysis}
          </p>
        )}
        {typeof analysis === 'object' &&
          ('kind' in analysis ? (
            data?.kind === 'streamed' && <StreamedSummary analysis={analysis} dataRows={data.dataRows} />
          ) : (
            <DataSummary analysis={analysis} />
          ))}
      </section>

      <section aria-labelledby="settings-heading">
        <h2 id="settings-heading">Settings</h2>
        <div class="field">
          <label for="level">Confidence level</label>
          <input
            id="level"
            type="number"
            min="0.5"
            max="0.999"
            step="0.01"
            value={choices.level}
            onChange={(e) => update({ level: Number((e.currentTarget as HTMLInputElement).value) })}
          />
          {problemFor('level') && (
            <p class="problem" role="alert">
              {problemFor('level')}
            </p>
          )}
        </div>
        <div class="field checkbox">
          <input
            id="intercept"
            type="checkbox"
            checked={choices.intercept}
            onChange={(e) => update({ intercept: (e.currentTarget as HTMLInputElement).checked })}
          />
          <label for="intercept">Fit an intercept</label>
        </div>
        <div class="field">
          <label for="known-sigma">Known σ (leave empty to estimate it)</label>
          <input
            id="known-sigma"
            type="text"
            inputMode="decimal"
            value={choices.knownSigma}
            aria-invalid={sigmaProblem !== undefined}
            aria-describedby={sigmaProblem === undefined ? undefined : 'known-sigma-problem'}
            onInput={(e) => update({ knownSigma: (e.currentTarget as HTMLInputElement).value })}
          />
          {sigmaProblem !== undefined && (
            <p id="known-sigma-problem" class="problem" role="alert">
              {sigmaProblem}
            </p>
          )}
        </div>
        <div class="field">
          <label for="robust">Standard errors</label>
          <select
            id="robust"
            value={choices.robust}
            onChange={(e) => update({ robust: (e.currentTarget as HTMLSelectElement).value as PaneChoices['robust'] })}
          >
            <option value="classical">Classical (constant spread)</option>
            <option value="HC3">Robust HC3 (recommended when spread varies)</option>
            <option value="HC1">Robust HC1</option>
            <option value="HC0">Robust HC0</option>
          </select>
        </div>
        <RangeField
          id="weights"
          label="Weights (optional)"
          hint="A column of positive weights with the response's rows."
          value={choices.weights}
          problem={problemFor('weights')}
          onChange={(weights) => update({ weights })}
          onUseSelection={useSelection('weights')}
        />
      </section>

      <section aria-labelledby="compare-heading">
        <h2 id="compare-heading">Compare</h2>
        {predictorNames === undefined ? (
          <p class="hint">Read the data first; then tick the predictors whose contribution you want tested, for example "does bean age add anything?".</p>
        ) : (
          <fieldset>
            <legend>Test whether these added predictors help</legend>
            {predictorNames.map((name, j) => (
              <div class="field checkbox" key={name}>
                <input
                  id={`added-${j}`}
                  type="checkbox"
                  checked={choices.added.includes(j)}
                  onChange={(e) =>
                    update({
                      added: (e.currentTarget as HTMLInputElement).checked ? [...choices.added, j].sort((a, b) => a - b) : choices.added.filter((k) => k !== j),
                    })
                  }
                />
                <label for={`added-${j}`}>{name}</label>
              </div>
            ))}
          </fieldset>
        )}
      </section>

      <section aria-labelledby="predict-heading">
        <h2 id="predict-heading">Predict</h2>
        <RangeField
          id="new-rows"
          label="New rows (optional)"
          hint="Laid out like the predictors, with or without the header row."
          value={choices.newRows}
          problem={problemFor('newRows')}
          onChange={(newRows) => update({ newRows })}
          onUseSelection={useSelection('newRows')}
        />
      </section>

      <section aria-labelledby="results-heading" aria-live="polite">
        <h2 id="results-heading">Results</h2>
        {stale !== undefined && typeof analysis === 'object' && (
          <p class="stale" role="status">
            {stale}
          </p>
        )}
        {typeof analysis === 'object' ? (
          <ResultCards analysis={analysis} level={choices.level} onUseRobust={choices.robust === 'classical' ? () => update({ robust: 'HC3' }) : undefined} />
        ) : (
          <p class="hint">Results appear here once the data are read.</p>
        )}
      </section>

      <section aria-labelledby="report-heading">
        <h2 id="report-heading">Report</h2>
        <div class="actions">
          <button type="button" class="primary" onClick={report} disabled={typeof analysis !== 'object'}>
            Write report
          </button>
          <button type="button" onClick={freeze}>
            Freeze a copy
          </button>
          {saved !== undefined && (
            <button type="button" onClick={refresh} disabled={reading !== undefined} aria-label={`Refresh the values report "${saved.sheetName}"`}>
              Refresh
            </button>
          )}
        </div>
        <p class="hint">
          Write report adds a new sheet of live formulas (for large data, of values, which Refresh re-reads and rewrites). Freeze a copy turns the active report
          into plain values, for colleagues without Plumbline.
        </p>
        {status.kind === 'done' && (
          <p class="done" role="status">
            {status.message}
          </p>
        )}
        {status.kind === 'failed' && (
          <p class="problem" role="alert">
            {status.message}
          </p>
        )}
      </section>
    </main>
  );
}
