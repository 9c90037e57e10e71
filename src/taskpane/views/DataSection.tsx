import { analysisProblem } from '../state/readFailure';
import { isReading } from '../state/selectors';
import { AnalysisSummary } from './AnalysisSummary';
import { RangeField } from './RangeField';
import { ReadProgress } from './ReadProgress';
import { fieldTools, type SectionProps } from './sectionProps';

/** The response and predictor ranges, the read with its progress, and what was read. */
export function DataSection({ state, analysis, dispatch, commands }: SectionProps) {
  const { problem, edit } = fieldTools({ state, analysis, dispatch });
  const { choices, reading, status } = state;
  return (
    <section aria-labelledby="data-heading">
      <h2 id="data-heading">Data</h2>
      <RangeField
        id="response"
        label="Response (one column)"
        hint="Include the header cell to name it."
        value={choices.response}
        problem={problem('response')}
        onChange={(response) => edit({ response })}
        onUseSelection={() => commands.takeSelection('response')}
      />
      <RangeField
        id="predictors"
        label="Predictors"
        hint="One or more column areas with the response's rows. Text columns are categorical."
        value={choices.predictors}
        problem={problem('predictors')}
        onChange={(predictors) => edit({ predictors })}
        onUseSelection={() => commands.takeSelection('predictors')}
        onAddSelection={() => commands.takeSelection('predictors', true)}
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
