import { EngineError } from './errors';
import type { FitSettings, ResolvedSettings } from './types';

export function resolveSettings(settings: FitSettings = {}): ResolvedSettings {
  const intercept = settings.intercept ?? true;
  const level = settings.level ?? 0.95;
  const knownSigma = settings.knownSigma ?? undefined;
  if (!(level > 0 && level < 1)) {
    throw new EngineError('bad-setting', `The confidence level must be between 0 and 1 (for example 0.95); got ${level}.`);
  }
  if (knownSigma !== undefined && !(knownSigma > 0 && Number.isFinite(knownSigma))) {
    throw new EngineError('bad-setting', `A known sigma must be a positive number; got ${knownSigma}.`);
  }
  return { intercept, level, knownSigma };
}
