import type { ModelFit, ModelFrame } from '../../engine';

/** Fewer residual degrees of freedom than this leave σ̂ and every interval very uncertain. */
const FEW_RESIDUAL_DF = 5;

/** Problems worth saying before anyone reads the numbers: they change what the numbers mean. */
export function dataWarnings(frame: ModelFrame, fit: ModelFit | undefined): string[] {
  const warnings: string[] = [];
  const { x } = frame.data;
  const names = frame.data.names ?? [];
  names.forEach((name, j) => {
    if (x.length > 1 && x.every((row) => row[j] === x[0][j])) warnings.push(`${name} is constant in the rows used, so its effect cannot be estimated.`);
  });
  for (let a = 0; a < names.length; a++) {
    for (let b = a + 1; b < names.length; b++) {
      if (x.every((row) => row[a] === row[b])) warnings.push(`${names[a]} and ${names[b]} hold the same values: only one of them can be estimated.`);
    }
  }
  if (fit !== undefined) {
    const spanning = fit.settings.intercept ? undefined : frame.columns.find((c) => c.kind === 'categorical' && c.reference === undefined);
    if (spanning !== undefined) {
      warnings.push(
        `Without an intercept, ${spanning.name} keeps one indicator per level and they sum to 1: this is the same model as with an intercept (same fitted values, same estimates and standard errors for the other predictors), written with one mean per level; only R² and F are measured from 0 instead of from the mean.`,
      );
    }
    if (fit.residualDf < FEW_RESIDUAL_DF) {
      warnings.push(`Only ${fit.n} rows for ${fit.rank} parameters: with ${fit.residualDf} residual degrees of freedom every interval is very wide.`);
    }
    const aliased = fit.terms.filter((t) => t.aliased).map((t) => t.name);
    if (aliased.length > 0) warnings.push(`Cannot be estimated (a combination of other columns): ${aliased.join(', ')}.`);
  }
  if (frame.skipped.length > 0) {
    const shown = frame.skipped.slice(0, 5).map((s) => `row ${s.row} (${s.reason})`);
    const more = frame.skipped.length > 5 ? ` and ${frame.skipped.length - 5} more` : '';
    warnings.push(`${frame.skipped.length} row${frame.skipped.length === 1 ? '' : 's'} left out: ${shown.join(', ')}${more}.`);
  }
  return warnings;
}
