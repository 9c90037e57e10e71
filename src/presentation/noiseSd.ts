import type { NoiseSdVerdict } from '../engine';

/** How a known-σ entry is named in a message: the pane's field or a cell function's argument. */
export interface NoiseSdEntry {
  /** "Known σ" beside the pane's field, "noise_sd" in a cell's error. */
  name: string;
  /** What to leave empty to estimate σ: "the field", "noise_sd". */
  where: string;
  /** The entry as typed, or as the cell holds it. */
  shown: string;
}

/**
 * The one wording of the known-σ rule (engine/noiseSd.ts), for the pane's field and for
 * noise_sd in a cell, so both say the same thing about the same entry. Undefined when the entry
 * is accepted.
 */
export function noiseSdMessage(verdict: NoiseSdVerdict, entry: NoiseSdEntry): string | undefined {
  const { name, where, shown } = entry;
  switch (verdict.kind) {
    case 'estimate':
    case 'known':
      return undefined;
    case 'zero':
      return `${name} cannot be 0: noise-free measurements leave nothing to estimate. Leave ${where} empty to estimate σ from the data.`;
    case 'negative':
      return `${name} is a standard deviation, so it must be positive; got ${shown}.`;
    case 'decimal-comma':
      return `Use a point as the decimal separator in ${name}: ${shown.replace(',', '.')} rather than ${shown}.`;
    case 'not-finite':
      return `${name} must be a finite number; got ${shown}.`;
    case 'not-a-number':
      return `${name} must be a number, such as 0.35, or left empty to estimate σ; got ${shown}.`;
  }
}
