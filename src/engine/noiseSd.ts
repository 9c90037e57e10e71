/**
 * The one rule for a known noise standard deviation, shared by the cell functions and the pane
 * so both accept and refuse the same entries. It returns a verdict code only: each adapter words
 * its own message, because the engine holds no UI text.
 *
 * Empty means "estimate σ from the data". Anything else must be a positive, finite number, in
 * text written with a point as the decimal separator. 0 is refused rather than taken as
 * "estimate": a noise-free model is no model of measurements, and a typed 0 is more likely a
 * slip than a request for the default.
 */
export type NoiseSdVerdict =
  | { kind: 'estimate' }
  | { kind: 'known'; sigma: number }
  | { kind: 'zero' }
  | { kind: 'negative' }
  | { kind: 'not-finite' }
  | { kind: 'decimal-comma' }
  | { kind: 'not-a-number' };

/** A plain decimal number as text: digits with an optional point, sign and exponent. */
const DECIMAL_POINT_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
/** The same number written with a comma as the decimal separator, as in much of Europe. */
const DECIMAL_COMMA_NUMBER = /^[+-]?(\d+,\d*|,\d+)([eE][+-]?\d+)?$/;

export function judgeNoiseSd(value: number | string | null | undefined): NoiseSdVerdict {
  if (value === null || value === undefined) return { kind: 'estimate' };
  if (typeof value === 'number') return judgeNumber(value);
  const text = value.trim();
  if (text === '') return { kind: 'estimate' };
  if (DECIMAL_POINT_NUMBER.test(text)) return judgeNumber(Number(text));
  if (DECIMAL_COMMA_NUMBER.test(text)) return { kind: 'decimal-comma' };
  return { kind: 'not-a-number' };
}

function judgeNumber(sigma: number): NoiseSdVerdict {
  if (Number.isNaN(sigma)) return { kind: 'not-a-number' };
  if (!Number.isFinite(sigma)) return { kind: 'not-finite' };
  if (sigma === 0) return { kind: 'zero' };
  if (sigma < 0) return { kind: 'negative' };
  return { kind: 'known', sigma };
}
