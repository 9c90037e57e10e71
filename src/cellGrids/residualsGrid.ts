import type { ModelFrame, ResidualDiagnostics, UndefinedReason } from '../engine';
import { FLAG_TEXTS, flagBitsAt, screenCutoffs } from '../presentation/thresholds';
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
  const { n, fitted, residual, standardized, studentized, leverage, cooksDistance, dffits, undefinedBecause } = diagnostics;
  const { usedRows } = frame;
  const observed = frame.data.y;
  const cutoffs = screenCutoffs(diagnostics);
  const grid: Grid = new Array<Grid[number]>(n + 1);
  grid[0] = [...RESIDUALS_HEADER];
  // Each row is one literal and its flag text one of the shared strings of FLAG_TEXTS, so a row
  // costs no object beyond itself and its numbers: a table can have 50,000 of them.
  for (let i = 0; i < n; i++) {
    const reason = undefinedBecause[i];
    const flags = FLAG_TEXTS[flagBitsAt(cutoffs, leverage[i], studentized[i], cooksDistance[i], reason)];
    grid[i + 1] = [
      usedRows[i],
      observed[i],
      finiteOrBlank(fitted[i]),
      finiteOrBlank(residual[i]),
      finiteOrBlank(standardized[i]),
      finiteOrBlank(studentized[i]),
      finiteOrBlank(leverage[i]),
      finiteOrBlank(cooksDistance[i]),
      finiteOrBlank(dffits[i]),
      reason === undefined ? flags : withReason(flags, reason),
    ];
  }
  return grid;
}

/** The screens' flags (src/presentation/thresholds.ts) and then why a value is blank. */
function withReason(flags: string, reason: UndefinedReason): string {
  return flags === '' ? REASON_TEXT[reason] : `${flags}, ${REASON_TEXT[reason]}`;
}
