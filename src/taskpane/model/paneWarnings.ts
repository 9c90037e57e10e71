import type { AssumptionChecks, ModelFit, SkippedRow } from '../../engine';
import { checkWarnings } from './checkWarnings';

/** One warning for the pane: about the data read, or a residual check that failed. */
export interface PaneWarning {
  text: string;
  about: 'data' | 'checks';
  /** Offer the one-click switch to robust standard errors. */
  suggestsRobust: boolean;
}

/**
 * What each source can tell about the predictor columns over the rows used. Cells look at every
 * row; a stream keeps each column's minimum and maximum and the R of the rows, which are enough.
 */
export interface ColumnFacts {
  /** Terms whose value is the same in every row used. */
  constant: string[];
  /** Pairs of terms equal in every row used. */
  identical: [string, string][];
}

export interface WarningInput {
  fit: ModelFit | undefined;
  columns: ColumnFacts;
  /** A categorical column that keeps one indicator per level because the model has no intercept. */
  spanning: string | undefined;
  rowsSkipped: number;
  /** The first few rows left out, by worksheet row. */
  skippedExamples: readonly SkippedRow[];
  /** The residual checks (their rows numbered by worksheet row), when the rows were there to check. */
  checks: AssumptionChecks | undefined;
}

/** Fewer residual degrees of freedom than this leave σ̂ and every interval very uncertain (common practice, no source). */
const FEW_RESIDUAL_DF = 5;
/** Skipped rows named in the warning; the rest are counted. */
export const SKIPPED_EXAMPLES = 5;

const data = (text: string): PaneWarning => ({ text, about: 'data', suggestsRobust: false });

/**
 * Problems worth saying before anyone reads the numbers, for either source: first what the data
 * do to the model, then the residual checks that failed (checkWarnings' words).
 */
export function paneWarnings({ fit, columns, spanning, rowsSkipped, skippedExamples, checks }: WarningInput): PaneWarning[] {
  const warnings: PaneWarning[] = [];
  for (const name of columns.constant) warnings.push(data(`${name} is constant in the rows used, so its effect cannot be estimated.`));
  for (const [a, b] of columns.identical) warnings.push(data(`${a} and ${b} hold the same values: only one of them can be estimated.`));
  if (fit !== undefined) {
    if (spanning !== undefined && !fit.settings.intercept) {
      warnings.push(
        data(
          `Without an intercept, ${spanning} keeps one indicator per level and they sum to 1: this is the same model as with an intercept (same fitted values, same estimates and standard errors for the other predictors), written with one mean per level; only R² and F are measured from 0 instead of from the mean.`,
        ),
      );
    }
    if (fit.residualDf < FEW_RESIDUAL_DF) {
      warnings.push(
        data(`Only ${fit.n} rows for ${fit.parameters} parameters: with ${fit.residualDf} residual degrees of freedom every interval is very wide.`),
      );
    }
    const aliased = fit.terms.filter((t) => t.aliased).map((t) => t.name);
    if (aliased.length > 0) warnings.push(data(`Cannot be estimated (a combination of other columns): ${aliased.join(', ')}.`));
  }
  if (rowsSkipped > 0) {
    const shown = skippedExamples.slice(0, SKIPPED_EXAMPLES).map((s) => `row ${s.row} (${s.reason})`);
    const more = rowsSkipped > shown.length ? ` and ${rowsSkipped - shown.length} more` : '';
    warnings.push(data(`${rowsSkipped} row${rowsSkipped === 1 ? '' : 's'} left out: ${shown.join(', ')}${more}.`));
  }
  if (checks !== undefined) {
    for (const w of checkWarnings(checks)) warnings.push({ text: w.text, about: 'checks', suggestsRobust: w.suggestsRobust });
  }
  return warnings;
}
