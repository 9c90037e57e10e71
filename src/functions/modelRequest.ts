import { buildModelFrame, classifyCell, EngineError, type FitSettings, type FrameOrigins, type ModelFrame, type RangeOrigin } from '../engine';
import { parseSettings, type RangeArgument, toCellGrid } from './cellInput';

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

/** origins: where the ranges sit on their worksheets, so messages and row numbers are the user's. */
export function readModel(
  knownY: RangeArgument,
  xBlocks: { range: RangeArgument; argument: string }[],
  s: SettingArguments,
  origins?: FrameOrigins,
): ModelRequest {
  const settings = parseSettings(s.level, s.intercept, s.knownSigma, s.robust);
  const weights = s.weights === null || s.weights === undefined ? undefined : toCellGrid(s.weights, 'weights');
  const frame = buildModelFrame({
    y: toCellGrid(knownY, 'response'),
    x: xBlocks.map((b) => toCellGrid(b.range, b.argument)),
    xArguments: xBlocks.map((b) => b.argument),
    weights: weights !== undefined && weights.length > 0 ? weights : undefined,
    intercept: settings.intercept ?? true,
    origins,
  });
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
  const x = toCellGrid(knownX, 'predictors');
  if (x.length === 0 || x[0].length === 0) throw new EngineError('no-rows', 'predictors is empty: select the predictor columns.');
  const weightRows = s.weights === null || s.weights === undefined ? 0 : toCellGrid(s.weights, 'weights').length;
  if (weightRows > 0 && weightRows !== x.length) {
    throw new EngineError('shape', `predictors has ${x.length} rows but weights has ${weightRows}; select the same rows for both.`);
  }
  const hasHeader = x.length > 1 && x[0].every((cell) => classifyCell(cell).kind === 'text');
  const standIn = x.map((_, i): unknown[] => [hasHeader && i === 0 ? 'y' : 0]);
  // The stand-in sits beside predictors, so rows are numbered by predictors' worksheet rows.
  return readModel(standIn, [{ range: knownX, argument: 'predictors' }], s, { y: origins?.x, x: [origins?.x], weights: origins?.weights });
}
