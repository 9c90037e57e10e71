import { buildModelFrame, type FitSettings, type ModelFrame } from '../engine';
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
}

export function readModel(knownY: RangeArgument, xBlocks: { range: RangeArgument; argument: string }[], s: SettingArguments): ModelRequest {
  const settings = parseSettings(s.level, s.intercept, s.knownSigma);
  const weights = s.weights === null || s.weights === undefined ? undefined : toCellGrid(s.weights, 'weights');
  const frame = buildModelFrame({
    y: toCellGrid(knownY, 'known_y'),
    x: xBlocks.map((b) => toCellGrid(b.range, b.argument)),
    xArguments: xBlocks.map((b) => b.argument),
    weights: weights !== undefined && weights.length > 0 ? weights : undefined,
    intercept: settings.intercept ?? true,
  });
  return { frame, settings };
}
