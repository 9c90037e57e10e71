import { judgeNoiseSd } from '../../engine';

/**
 * The pane's wording for the known-σ field, over the rule the cell functions apply too
 * (engine/noiseSd.ts), so the field refuses exactly what noise_sd refuses in a cell.
 */
export function noiseSdProblem(typed: string): string | undefined {
  const verdict = judgeNoiseSd(typed);
  switch (verdict.kind) {
    case 'estimate':
    case 'known':
      return undefined;
    case 'zero':
      return 'Known σ cannot be 0: noise-free measurements leave nothing to estimate. Leave the field empty to estimate σ from the data.';
    case 'negative':
      return 'Known σ is a standard deviation, so it must be positive.';
    case 'decimal-comma':
      return `Use a point as the decimal separator: ${typed.trim().replace(',', '.')} rather than ${typed.trim()}.`;
    case 'not-finite':
      return 'Known σ must be a finite number.';
    case 'not-a-number':
      return 'Known σ must be a number, such as 0.35, or left empty to estimate it.';
  }
}

/** The known σ the field asks for; undefined when it is empty (estimate σ) or refused. */
export function knownSigmaOf(typed: string): number | undefined {
  const verdict = judgeNoiseSd(typed);
  return verdict.kind === 'known' ? verdict.sigma : undefined;
}
