import { INTERCEPT_NAME, type ModelFit } from '../engine';
import { decimalsFor, MINUS, roundedParts } from '../presentation';
import type { Grid } from './gridCell';

/** One coefficient to the decimals its standard error warrants; the sign apart, for " + " or " − ". */
function rounded(estimate: number, standardError: number): { negative: boolean; digits: string } {
  return roundedParts(estimate, decimalsFor(standardError));
}

/**
 * The fitted equation as one line of text, "Fitted [Yield] = 12.34 + 0.456·[Grind size] − …",
 * names from the headers in the order of the term table, each coefficient to about three
 * significant digits of its standard error. Aliased terms have no estimate: they are named
 * after the equation as left out, so the line never shows a coefficient the fit does not have.
 */
export function fittedEquation(responseName: string, fit: Pick<ModelFit, 'terms'>): string {
  const parts: string[] = [];
  const leftOut: string[] = [];
  for (const term of fit.terms) {
    if (term.aliased || !Number.isFinite(term.estimate)) {
      leftOut.push(`[${term.name}]`);
      continue;
    }
    const { negative, digits } = rounded(term.estimate, term.standardError);
    const value = term.name === INTERCEPT_NAME ? digits : `${digits}·[${term.name}]`;
    if (parts.length === 0) parts.push(negative ? `${MINUS}${value}` : value);
    else parts.push(`${negative ? MINUS : '+'} ${value}`);
  }
  const equation = `Fitted [${responseName}] = ${parts.length === 0 ? '0' : parts.join(' ')}`;
  return leftOut.length === 0 ? equation : `${equation} (aliased, left out: ${leftOut.join(', ')})`;
}

/** PLUMB.EQUATION's one cell. */
export function equationGrid(responseName: string, fit: Pick<ModelFit, 'terms'>): Grid {
  return [[fittedEquation(responseName, fit)]];
}
