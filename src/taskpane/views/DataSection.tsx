import { analysisProblem } from '../state/readFailure';
import { isReading } from '../state/selectors';
import { AnalysisSummary } from './AnalysisSummary';
import { RangeChoice } from './RangeChoice';
import { ReadProgress } from './ReadProgress';
import type { SectionProps } from './sectionProps';

/** The response and predictor ranges, the read with its progress, and what was read. */
export function DataSection(props: SectionProps) {
  const { state, analysis, commands } = props;
  const { reading, status } = state;
  return (
    <section aria-labelledby="data-heading">
      <h2 id="data-heading">Data</h2>
      <RangeChoice {...props} field="response" id="response" label="Response (one column)" hint="Include the header cell to name it." />
      <RangeChoice
        {...props}
        field="predictors"
        id="predictors"
        label="Predictors"
        hint="One or more column areas with the response's rows. Text columns are categorical."
        appendable
      />
      <button type="button" class="primary" onClick={commands.readAndFit} disabled={isReading(state)}>
        Read data and fit
      </button>
      {reading !== undefined && <ReadProgress read={reading.read} total={reading.total} onCancel={commands.cancelRead} />}
      {status.kind === 'busy' && (
        <div class="progress" role="status">
          <progress aria-label={status.what} />
          <span>{status.what}</span>
        </div>
      )}
      {/* A failure that names a field sits beside that field instead. */}
      {typeof analysis === 'string' && analysisProblem(analysis) === undefined && (
        <p class="problem" role="alert">
          {analysis}
        </p>
      )}
      {typeof analysis === 'object' && <AnalysisSummary analysis={analysis} />}
    </section>
  );
}
