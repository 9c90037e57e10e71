import type { PaneAnalysis } from '../model/paneAnalysis';
import { formatCount } from '../../presentation';
import { WarningList } from './WarningList';

function categoricalText(analysis: PaneAnalysis): string | undefined {
  if (analysis.source !== 'cells') return undefined;
  const described = analysis.frame.columns.flatMap((c) =>
    c.kind === 'categorical' ? [`${c.name} (${c.levels.length} levels, compared with ${c.reference ?? 'zero'})`] : [],
  );
  return described.length === 0 ? undefined : `Categorical: ${described.join('; ')}.`;
}

/** What the pane understood of the data, however they were read: headers, rows used and skipped, categories. */
export function AnalysisSummary({ analysis }: { analysis: PaneAnalysis }) {
  const { skippedExamples, rowsSkipped } = analysis;
  const examples = skippedExamples.slice(0, 3).map((s) => `row ${s.row}: ${s.reason}`);
  const categorical = categoricalText(analysis);
  return (
    <div class="data-summary" aria-label="What was read">
      <p>
        {analysis.hasHeader
          ? `Headers found: response "${analysis.responseName}", predictors ${analysis.predictorNames.map((n) => `"${n}"`).join(', ')}.`
          : 'No header row found: columns are named x1, x2, …'}
      </p>
      <p>
        Rows used: <strong>{formatCount(analysis.rowsUsed)}</strong>. Rows skipped: <strong>{formatCount(rowsSkipped)}</strong>
        {examples.length > 0 && ` (${examples.join('; ')}${rowsSkipped > examples.length ? '; …' : ''})`}.
      </p>
      {categorical !== undefined && <p>{categorical}</p>}
      {analysis.source === 'streamed' && (
        <p class="hint">
          Large data: read in blocks and fitted without keeping the rows. Standard errors are classical, and the report is written as values (use Refresh after
          the data change).
        </p>
      )}
      {analysis.unchecked.map((text) => (
        <p key={text} class="hint">
          {text}
        </p>
      ))}
      <WarningList warnings={analysis.warnings.filter((w) => w.about === 'data').map((w) => w.text)} />
    </div>
  );
}
