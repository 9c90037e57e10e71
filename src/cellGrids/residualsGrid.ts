import type { ModelFrame, ResidualDiagnostics, RowDiagnostics, UndefinedReason } from '../engine';
import { FLAG_TEXT, residualFlags } from '../presentation';
import { finiteOrBlank, type Grid } from './gridCell';

export const RESIDUALS_HEADER = ['Row', 'Observed', 'Fitted', 'Residual', 'Standardized', 'Studentized', 'Leverage', "Cook's distance", 'DFFITS', 'Flag'];

/** Each text names what a blank above it means, so no blank is left unexplained. */
const REASON_TEXT: Record<UndefinedReason, string> = {
  'leverage-one': 'leverage 1: fit passes through this row',
  'exact-fit': 'exact fit: every residual is 0, so they cannot be scaled',
  'no-deleted-df': 'rows = parameters + 1: nothing left to estimate sigma without this row',
  'rest-fit-exactly': 'the other rows fit exactly: studentized residual is unbounded',
};

/**
 * One row per used data row. Row is numbered as the frame numbers it (the worksheet row when the
 * frame knows where response sits, else the position in the input range, a header counting as
 * row 1), so rows skipped for blanks leave visible gaps and every line traces back to its data.
 * Observed is that row's response, so a chart of observed against fitted needs no reference to
 * the data (which would turn a blank into 0).
 */
export function residualsGrid(diagnostics: ResidualDiagnostics, frame: ModelFrame): Grid {
  return [[...RESIDUALS_HEADER], ...diagnostics.rows.map((row, i) => residualRow(row, diagnostics, frame.usedRows[i], frame.data.y[i]))];
}

function residualRow(row: RowDiagnostics, diagnostics: ResidualDiagnostics, rowNumber: number, observed: number): Grid[number] {
  return [
    rowNumber,
    observed,
    finiteOrBlank(row.fitted),
    finiteOrBlank(row.residual),
    finiteOrBlank(row.standardized),
    finiteOrBlank(row.studentized),
    finiteOrBlank(row.leverage),
    finiteOrBlank(row.cooksDistance),
    finiteOrBlank(row.dffits),
    flagText(row, diagnostics),
  ];
}

/** The screens' flags (src/presentation/thresholds.ts) and why a value is blank. */
function flagText(row: RowDiagnostics, diagnostics: ResidualDiagnostics): string {
  const parts = residualFlags(row, diagnostics).map((f) => FLAG_TEXT[f]);
  if (row.undefinedBecause !== undefined) parts.push(REASON_TEXT[row.undefinedBecause]);
  return parts.join(', ');
}
