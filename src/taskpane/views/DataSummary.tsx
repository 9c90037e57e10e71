import type { PaneAnalysis } from '../model/analysis';
import { WarningList } from './WarningList';

/** What the pane understood of the cells: headers, rows used and skipped, categorical columns. */
export function DataSummary({ analysis }: { analysis: PaneAnalysis }) {
  const { frame } = analysis;
  const categorical = frame.columns.filter((c) => c.kind === 'categorical');
  return (
    <div class="data-summary" aria-label="What was read">
      <p>
        {frame.hasHeader
          ? `Headers found: response "${frame.responseName}", predictors ${frame.columns.map((c) => `"${c.name}"`).join(', ')}.`
          : 'No header row found: columns are named x1, x2, …'}
      </p>
      <p>
        Rows used: <strong>{frame.usedRows.length}</strong>. Rows skipped: <strong>{frame.skipped.length}</strong>
        {frame.skipped.length > 0 &&
          ` (${frame.skipped
            .slice(0, 3)
            .map((s) => `row ${s.row}: ${s.reason}`)
            .join('; ')}${frame.skipped.length > 3 ? '; …' : ''})`}
        .
      </p>
      {categorical.length > 0 && (
        <p>
          Categorical:{' '}
          {categorical.map((c) => (c.kind === 'categorical' ? `${c.name} (${c.levels.length} levels, compared with ${c.reference ?? 'zero'})` : '')).join('; ')}
          .
        </p>
      )}
      <WarningList warnings={analysis.warnings} />
    </div>
  );
}
