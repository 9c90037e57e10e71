import type { StreamedAnalysis } from '../model/streamedAnalysis';
import { WarningList } from './WarningList';

/** What a streamed read understood: headers, rows used and skipped, and what large data change. */
export function StreamedSummary({ analysis, dataRows }: { analysis: StreamedAnalysis; dataRows: number }) {
  const { header } = analysis;
  return (
    <div class="data-summary" aria-label="What was read">
      <p>
        {header.hasHeader
          ? `Headers found: response "${header.responseName}", predictors ${header.predictorNames.map((n) => `"${n}"`).join(', ')}.`
          : 'No header row found: columns are named x1, x2, …'}
      </p>
      <p>
        Rows used: <strong>{(dataRows - analysis.skipped).toLocaleString('en-US')}</strong>. Rows skipped:{' '}
        <strong>{analysis.skipped.toLocaleString('en-US')}</strong>.
      </p>
      <p class="hint">
        Large data: read in blocks and fitted without keeping the rows. Standard errors are classical, the residual checks are not run, and the report is
        written as values (use Refresh after the data change).
      </p>
      <WarningList warnings={analysis.warnings} />
    </div>
  );
}
