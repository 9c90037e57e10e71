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

/** The names the pane gives the columns: headers, else worksheet columns (a column without a header is named so too). */
function namesText(analysis: PaneAnalysis): string {
  const predictors = analysis.predictorNames.map((n) => `"${n}"`).join(', ');
  if (analysis.hasHeader) return `Headers found: response "${analysis.responseName}", predictors ${predictors}.`;
  const gathered = analysis.source === 'cells' ? '; predictors the live report gathers from separate areas, by their column on the report sheet' : '';
  return `No header row found: columns are named by their worksheet column, response "${analysis.responseName}", predictors ${predictors}${gathered}.`;
}

/** What the pane understood of the data, however they were read: headers, rows used and skipped, categories. */
export function AnalysisSummary({ analysis }: { analysis: PaneAnalysis }) {
  const { skippedExamples, rowsSkipped } = analysis;
  const examples = skippedExamples.slice(0, 3).map((s) => `row ${s.row}: ${s.reason}`);
  const categorical = categoricalText(analysis);
  return (
    <div class="data-summary" aria-label="What was read">
      <p>{namesText(analysis)}</p>
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
