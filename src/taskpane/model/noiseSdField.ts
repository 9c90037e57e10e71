import { judgeNoiseSd } from '../../engine';
import { noiseSdMessage } from '../../presentation';

/**
 * The known-σ field's problem, by the rule the cell functions apply too (engine/noiseSd.ts) and in
 * the words noise_sd gets in a cell (presentation/noiseSd.ts), so the field refuses exactly what
 * noise_sd refuses, for the same reason.
 */
export function noiseSdProblem(typed: string): string | undefined {
  return noiseSdMessage(judgeNoiseSd(typed), { name: 'Known σ', where: 'the field', shown: typed.trim() });
}

/** The known σ the field asks for; undefined when it is empty (estimate σ) or refused. */
export function knownSigmaOf(typed: string): number | undefined {
  const verdict = judgeNoiseSd(typed);
  return verdict.kind === 'known' ? verdict.sigma : undefined;
}
