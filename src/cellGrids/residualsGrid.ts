import type { ModelFrame, ResidualDiagnostics, UndefinedReason } from '../engine';
import { FLAG_TEXT } from '../presentation';
import { flagsAt, type ResidualFlag, screenCutoffs } from '../presentation/thresholds';
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
  const { fitted, residual, standardized, studentized, leverage, cooksDistance, dffits, undefinedBecause } = diagnostics;
  const cutoffs = screenCutoffs(diagnostics);
  const grid: Grid = new Array<Grid[number]>(diagnostics.n + 1);
  grid[0] = [...RESIDUALS_HEADER];
  for (let i = 0; i < diagnostics.n; i++) {
    const flags = flagsAt(cutoffs, leverage[i], studentized[i], cooksDistance[i], undefinedBecause[i]);
    grid[i + 1] = [
      frame.usedRows[i],
      frame.data.y[i],
      finiteOrBlank(fitted[i]),
      finiteOrBlank(residual[i]),
      finiteOrBlank(standardized[i]),
      finiteOrBlank(studentized[i]),
      finiteOrBlank(leverage[i]),
      finiteOrBlank(cooksDistance[i]),
      finiteOrBlank(dffits[i]),
      flagText(flags, undefinedBecause[i]),
    ];
  }
  return grid;
}

/** The screens' flags (src/presentation/thresholds.ts) and why a value is blank. */
function flagText(flags: readonly ResidualFlag[], reason: UndefinedReason | undefined): string {
  if (flags.length === 0) return reason === undefined ? '' : REASON_TEXT[reason];
  const parts = flags.map((f) => FLAG_TEXT[f]);
  if (reason !== undefined) parts.push(REASON_TEXT[reason]);
  return parts.join(', ');
}
