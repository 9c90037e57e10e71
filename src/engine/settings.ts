import { EngineError } from './errors';
import type { CovarianceKind, FitSettings, ResolvedSettings } from './types';

export const COVARIANCE_KINDS: readonly CovarianceKind[] = ['classical', 'HC0', 'HC1', 'HC3'];

export function resolveSettings(settings: FitSettings = {}): ResolvedSettings {
  const intercept = settings.intercept ?? true;
  const level = settings.level ?? 0.95;
  const knownSigma = settings.knownSigma ?? undefined;
  const covariance = settings.covariance ?? 'classical';
  if (!(level > 0 && level < 1)) {
    throw new EngineError('bad-setting', `The confidence level must be between 0 and 1 (for example 0.95); got ${level}.`);
  }
  if (knownSigma !== undefined && !(knownSigma > 0 && Number.isFinite(knownSigma))) {
    throw new EngineError('bad-setting', `A known sigma must be a positive number; got ${knownSigma}.`);
  }
  if (!COVARIANCE_KINDS.includes(covariance)) {
    throw new EngineError('bad-setting', `The covariance must be one of ${COVARIANCE_KINDS.join(', ')}; got ${String(covariance)}.`);
  }
  return { intercept, level, knownSigma, covariance };
}
