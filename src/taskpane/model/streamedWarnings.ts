import type { ModelFit } from '../../engine';
import type { StreamedData } from './streamedAnalysis';

const FEW_RESIDUAL_DF = 5;

/** The warnings of dataWarnings() that can be told without the rows: aliasing, few df, skipped rows. */
export function streamedWarnings(fit: ModelFit | undefined, data: StreamedData): string[] {
  const warnings: string[] = [];
  if (fit !== undefined) {
    if (fit.residualDf < FEW_RESIDUAL_DF) {
      warnings.push(`Only ${fit.n} rows for ${fit.rank} parameters: with ${fit.residualDf} residual degrees of freedom every interval is very wide.`);
    }
    const aliased = fit.terms.filter((t) => t.aliased).map((t) => t.name);
    if (aliased.length > 0) warnings.push(`Cannot be estimated (a combination of other columns, or constant): ${aliased.join(', ')}.`);
  }
  if (data.skipped > 0) {
    const shown = data.skippedExamples.map((s) => `row ${s.row} (${s.reason})`);
    const more = data.skipped > shown.length ? ` and ${data.skipped - shown.length} more` : '';
    warnings.push(`${data.skipped} row${data.skipped === 1 ? '' : 's'} left out: ${shown.join(', ')}${more}.`);
  }
  return warnings;
}
