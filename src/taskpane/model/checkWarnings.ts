import type { AssumptionChecks } from '../../engine';

export interface CheckWarning {
  text: string;
  /** Offer the one-click switch to robust standard errors. */
  suggestsRobust: boolean;
}

/** Largest Cook's distance past which one row steers the fit (Cook & Weisberg 1982). */
const LARGE_COOKS = 1;
/** VIF past which a term's standard error is inflated enough to say so (common practice). */
const LARGE_VIF = 10;

/** The checks that failed, in words, for the pane's result cards. */
export function checkWarnings(checks: AssumptionChecks, usedRows: readonly number[]): CheckWarning[] {
  const warnings: CheckWarning[] = [];
  const failed = (p: number) => Number.isFinite(p) && p < checks.alpha;
  if (failed(checks.breuschPagan.pValue)) {
    warnings.push({ text: `Residual spread changes with the predictors (Breusch–Pagan ${pText(checks.breuschPagan.pValue)}): consider robust standard errors.`, suggestsRobust: true });
  }
  if (failed(checks.durbinWatson.pTwoSided)) {
    warnings.push({ text: `Residuals in neighbouring rows are related (Durbin–Watson d = ${checks.durbinWatson.statistic.toFixed(2)}, ${pText(checks.durbinWatson.pTwoSided)}): standard errors may be too small.`, suggestsRobust: false });
  }
  if (failed(checks.jarqueBera.pValue)) {
    warnings.push({ text: `Residuals depart from a normal shape (Jarque–Bera ${pText(checks.jarqueBera.pValue)}): read intervals with care, most of all with few rows.`, suggestsRobust: false });
  }
  if (checks.largestCooksDistance > LARGE_COOKS && checks.largestCooksRow >= 0) {
    warnings.push({ text: `Row ${usedRows[checks.largestCooksRow]} steers the fit (Cook's distance ${checks.largestCooksDistance.toFixed(2)}): check that row's data.`, suggestsRobust: false });
  }
  if (checks.largestVif > LARGE_VIF) {
    warnings.push({ text: `${checks.largestVifTerm ?? 'A term'} is largely explained by the other predictors (VIF ${Number.isFinite(checks.largestVif) ? checks.largestVif.toFixed(1) : '∞'}): its standard error is inflated.`, suggestsRobust: false });
  }
  return warnings;
}

function pText(p: number): string {
  return p < 0.001 ? 'p < 0.001' : `p = ${p.toPrecision(2)}`;
}
