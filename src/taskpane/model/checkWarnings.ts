import { type AssumptionChecks, formatP, LARGE_VIF, unusualRowsReading } from '../../engine';

export interface CheckWarning {
  text: string;
  /** Offer the one-click switch to robust standard errors. */
  suggestsRobust: boolean;
}

/** Largest Cook's distance past which one row steers the fit (Cook & Weisberg 1982). */
const LARGE_COOKS = 1;

/**
 * The checks that failed, in words, for the pane's result cards. Outlying and influential rows
 * come first, named by worksheet row (the checks were given the frame's rows), since one such row
 * can produce every other signal.
 */
export function checkWarnings(checks: AssumptionChecks, usedRows: readonly number[]): CheckWarning[] {
  const warnings: CheckWarning[] = [];
  const failed = (p: number) => Number.isFinite(p) && p < checks.alpha;
  if (checks.unusualRows.length > 0) {
    const reading = unusualRowsReading(checks.unusualRows);
    warnings.push({ text: `${reading[0].toUpperCase()}${reading.slice(1)}.`, suggestsRobust: false });
  }
  if (failed(checks.breuschPagan.pValue)) {
    warnings.push({
      text: `Residual spread changes with the predictors (Breusch–Pagan ${formatP(checks.breuschPagan.pValue)}): consider robust standard errors.`,
      suggestsRobust: true,
    });
  }
  if (failed(checks.durbinWatson.pTwoSided)) {
    // The same two-sided p, in the same format, as CHECKS' "DW p-value (two-sided)" row and its reading.
    warnings.push({
      text: `Residuals in neighbouring rows are related (Durbin–Watson d = ${checks.durbinWatson.statistic.toFixed(2)}, two-sided ${formatP(checks.durbinWatson.pTwoSided)}): standard errors may be too small.`,
      suggestsRobust: false,
    });
  }
  if (failed(checks.jarqueBera.pValue)) {
    warnings.push({
      text: `Residuals depart from a normal shape (Jarque–Bera ${formatP(checks.jarqueBera.pValue)}): read intervals with care, most of all with few rows.`,
      suggestsRobust: false,
    });
  }
  // A row already named above is not named twice.
  if (checks.largestCooksDistance > LARGE_COOKS && checks.largestCooksRow >= 0 && !checks.unusualRows.some((u) => u.index === checks.largestCooksRow)) {
    warnings.push({
      text: `Row ${usedRows[checks.largestCooksRow]} steers the fit (Cook's distance ${checks.largestCooksDistance.toFixed(2)}): check that row's data.`,
      suggestsRobust: false,
    });
  }
  if (checks.largestVif > LARGE_VIF) {
    // largestVif is the centered VIF, the factor by which collinearity inflates the variance.
    warnings.push({
      text: `${checks.largestVifTerm ?? 'A term'} is largely explained by the other predictors (centered VIF ${Number.isFinite(checks.largestVif) ? checks.largestVif.toFixed(1) : '∞'}): its standard error is inflated.`,
      suggestsRobust: false,
    });
  }
  return warnings;
}
