import { buildModelFrame, classifyCell, EngineError, type FitSettings, type FrameInput, type FrameOrigins, type ModelFrame, type RangeOrigin } from '../engine';
import { errorCodeOf, parseSettings, type RangeArgument, rangeRows, toCellGrid, toCellValue } from './cellInput';

/** What every PLUMB function reads first: its ranges as a model frame, and the shared settings. */
export interface ModelRequest {
  frame: ModelFrame;
  settings: FitSettings;
}

export interface SettingArguments {
  level: unknown;
  intercept: unknown;
  knownSigma: unknown;
  weights: RangeArgument | null | undefined;
  robust?: unknown;
}

/**
 * origins: where the ranges sit on their worksheets, so messages and row numbers are the user's.
 * The ranges go to the engine as Excel passed them, read in one pass when all-numeric; only
 * otherwise are their cells turned into CellValues (toCellGrid, whose checks word a range that is
 * no range of cells) for the engine's general read.
 */
export function readModel(
  knownY: RangeArgument,
  xBlocks: { range: RangeArgument; argument: string }[],
  s: SettingArguments,
  origins?: FrameOrigins,
): ModelRequest {
  const settings = parseSettings(s.level, s.intercept, s.knownSigma, s.robust);
  const intercept = settings.intercept ?? true;
  const xArguments = xBlocks.map((b) => b.argument);
  const asCells = (): FrameInput => {
    const weights = s.weights === null || s.weights === undefined ? undefined : toCellGrid(s.weights, 'weights');
    return {
      y: toCellGrid(knownY, 'response'),
      x: xBlocks.map((b) => toCellGrid(b.range, b.argument)),
      xArguments,
      weights: weights !== undefined && weights.length > 0 ? weights : undefined,
      intercept,
      origins,
    };
  };
  const weights = s.weights ?? [];
  // A range that is no array at all is worded by toCellGrid before anything else is read.
  const allArrays = Array.isArray(knownY) && Array.isArray(weights) && xBlocks.every((b) => Array.isArray(b.range));
  const frame = allArrays
    ? buildModelFrame({
        y: knownY,
        x: xBlocks.map((b) => b.range),
        xArguments,
        weights: weights.length > 0 ? weights : undefined,
        intercept,
        origins,
        errorCodeOf,
        asCells,
      })
    : buildModelFrame(asCells());
  return { frame, settings };
}

/**
 * For functions that take predictors only (PLUMB.COLLINEARITY): predictors read through readModel
 * with a stand-in response of zeros, so headers, blanks, categorical coding and weights behave
 * exactly as in every other function. Without a response to tell, row 1 is a header when every
 * cell in it is text (a text header on every column is what the other functions require too).
 * The zeros' values never reach a result: callers use only the frame's x, names and weights.
 */
export function readPredictors(knownX: RangeArgument, s: SettingArguments, origins?: { x?: RangeOrigin; weights?: RangeOrigin }): ModelRequest {
  // Only the rows are checked here and only row 1's cells read: readModel reads every cell.
  const x = rangeRows(knownX, 'predictors');
  if (x.length === 0 || x[0].length === 0) throw new EngineError('no-rows', 'predictors is empty: select the predictor columns.');
  const weightRows = rangeRows(s.weights, 'weights').length;
  if (weightRows > 0 && weightRows !== x.length) {
    throw new EngineError('shape', `predictors has ${x.length} rows but weights has ${weightRows}; select the same rows for both.`);
  }
  const hasHeader = x.length > 1 && x[0].every((cell) => classifyCell(toCellValue(cell)).kind === 'text');
  // One row of zero stands for every data row: read only, it spares an array per row.
  const zeroRow: unknown[] = [0];
  const standIn = x.map((_, i): unknown[] => (hasHeader && i === 0 ? ['y'] : zeroRow));
  // The stand-in sits beside predictors, so rows are numbered by predictors' worksheet rows.
  return readModel(standIn, [{ range: knownX, argument: 'predictors' }], s, { y: origins?.x, x: [origins?.x], weights: origins?.weights });
}
