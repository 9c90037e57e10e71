import { copySummary } from '../model/copySummary';
import { isReading } from '../state/selectors';
import { CopySummary } from './CopySummary';
import type { SectionProps } from './sectionProps';

/** Write report, Freeze a copy and Refresh with what the last of them did, and the summary to copy. */
export function ReportSection({ state, analysis, commands }: Pick<SectionProps, 'state' | 'analysis' | 'commands'>) {
  const { saved, status } = state;
  return (
    <section aria-labelledby="report-heading">
      <h2 id="report-heading">Report</h2>
      <div class="actions">
        <button type="button" class="primary" onClick={commands.writeReport} disabled={typeof analysis !== 'object'}>
          Write report
        </button>
        <button type="button" onClick={commands.freeze}>
          Freeze a copy
        </button>
        {saved !== undefined && (
          <button type="button" onClick={commands.refresh} disabled={isReading(state)} aria-label={`Refresh the values report "${saved.sheetName}"`}>
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
      {typeof analysis === 'object' && analysis.fit !== undefined && <CopySummary text={copySummary(analysis.responseName, analysis.fit)} />}
    </section>
  );
}
