import type { AssumptionChecks } from '../../engine';
import { durbinWatsonPText, formatFixed, formatP, LARGE_VIF, unusualRows, unusualRowsReading } from '../../presentation';

export interface CheckWarning {
  text: string;
  /** Offer the one-click switch to robust standard errors. */
  suggestsRobust: boolean;
}

/**
 * The checks that failed, in words, for the pane's result cards, on the same verdicts as CHECKS'
 * readings. Outlying rows (the Bonferroni outlier test) and influential rows come first, named by
 * worksheet row (the checks were given the frame's rows), since one such row can produce every
 * other signal; then spread, autocorrelation, the normal shape (Shapiro–Wilk up to 5000 rows,
 * Jarque–Bera above), lack of fit and collinearity.
 */
export function checkWarnings(checks: AssumptionChecks): CheckWarning[] {
  const warnings: CheckWarning[] = [];
  const unusual = unusualRows(checks);
  if (unusual.length > 0) {
    const reading = unusualRowsReading(unusual);
    warnings.push({ text: `${reading[0].toUpperCase()}${reading.slice(1)}.`, suggestsRobust: false });
  }
  if (checks.breuschPagan.verdict === 'uneven-spread') {
    warnings.push({
      text: `Residual spread changes with the predictors (Breusch–Pagan ${formatP(checks.breuschPagan.pValue)}): consider robust standard errors.`,
      suggestsRobust: true,
    });
  }
  const dw = checks.durbinWatson;
  if (dw.verdict === 'positive-autocorrelation' || dw.verdict === 'negative-autocorrelation') {
    // The same two-sided p, in the same format, as CHECKS' "DW p-value (two-sided)" row and its reading.
    warnings.push({
      text: `Residuals in neighbouring rows are related (Durbin–Watson d = ${formatFixed(dw.statistic, 2)}, ${durbinWatsonPText(dw)}): standard errors may be too small.`,
      suggestsRobust: false,
    });
  }
  const normality =
    checks.shapiroWilk.verdict === 'non-normal'
      ? `Shapiro–Wilk ${formatP(checks.shapiroWilk.pValue)}`
      : checks.jarqueBera.verdict === 'non-normal'
        ? `Jarque–Bera ${formatP(checks.jarqueBera.pValue)}`
        : undefined;
  if (normality !== undefined) {
    warnings.push({
      text: `Residuals depart from a normal shape (${normality}): read intervals with care, most of all with few rows.`,
      suggestsRobust: false,
    });
  }
  if (checks.lackOfFit.verdict === 'lack-of-fit') {
    warnings.push({
      text: `The model misses the means of rows that repeat the same predictor values by more than their own spread explains (lack of fit ${formatP(checks.lackOfFit.pValue)}): consider another shape, such as a curve or an interaction.`,
      suggestsRobust: false,
    });
  }
  if (checks.largestVif > LARGE_VIF) {
    // largestVif is the centered VIF, the factor by which collinearity inflates the variance.
    warnings.push({
      text: `${checks.largestVifTerm ?? 'A term'} is largely explained by the other predictors (centered VIF ${formatFixed(checks.largestVif, 1)}): its standard error is inflated.`,
      suggestsRobust: false,
    });
  }
  return warnings;
}
