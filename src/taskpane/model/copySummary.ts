import type { ModelFit } from '../../engine';
import { fittedEquation } from '../../cellGrids/equationGrid';
import { decimalsFor, formatCount, formatDecimals, formatNumber, formatShare } from '../../presentation';

function estimateText(term: ModelFit['terms'][number]): string {
  if (term.aliased || !Number.isFinite(term.estimate)) return 'aliased, not estimated';
  if (!Number.isFinite(term.standardError)) return `${formatNumber(term.estimate)} ± (no standard error)`;
  const decimals = decimalsFor(term.standardError);
  return `${formatDecimals(term.estimate, decimals)} ± ${formatDecimals(term.standardError, decimals)}`;
}

function standardErrorsText(fit: ModelFit): string {
  if (fit.covarianceKind !== 'classical') return `robust (${fit.covarianceKind})`;
  return fit.settings.knownSigma === undefined ? 'classical' : `classical, with σ known to be ${formatNumber(fit.settings.knownSigma)}`;
}

/**
 * The model in a few lines of plain text, to paste into a lab report or onto a slide: the fitted
 * equation with its numbers, one line per term with its estimate ± standard error (both to about
 * three significant digits of the standard error), and the size and spread of the fit. Names are
 * padded so the table lines up in a fixed-width font.
 */
export function copySummary(responseName: string, fit: ModelFit): string {
  const width = Math.max('Term'.length, ...fit.terms.map((t) => t.name.length));
  const row = (left: string, right: string) => `${left.padEnd(width)}  ${right}`;
  const r2 = fit.settings.intercept ? `R² = ${formatNumber(fit.rSquared)}` : `uncentered R² (no intercept) = ${formatShare(fit.rSquared)}`;
  return [
    fittedEquation(responseName, fit),
    '',
    row('Term', 'Estimate ± standard error'),
    ...fit.terms.map((t) => row(t.name, estimateText(t))),
    '',
    `${formatCount(fit.n)} rows; ${r2}; σ̂ = ${formatNumber(fit.sigma)}; standard errors ${standardErrorsText(fit)}.`,
  ].join('\n');
}
