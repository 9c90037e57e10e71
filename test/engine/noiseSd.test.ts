/**
 * The noise_sd rule shared by the pane and the cells. The rule itself is the project's choice:
 * empty estimates σ, anything else must be a positive finite number with a point as the decimal
 * separator. Common practice (no source): a standard deviation is positive.
 */
import { describe, expect, it } from 'vitest';
import { judgeNoiseSd } from '../../src/engine/noiseSd';

describe('judgeNoiseSd', () => {
  it('takes empty (blank, spaces, omitted) as "estimate σ"', () => {
    expect(judgeNoiseSd('')).toEqual({ kind: 'estimate' });
    expect(judgeNoiseSd('  ')).toEqual({ kind: 'estimate' });
    expect(judgeNoiseSd(null)).toEqual({ kind: 'estimate' });
  });

  it('accepts positive finite numbers, as numbers or as text with a decimal point', () => {
    expect(judgeNoiseSd(0.35)).toEqual({ kind: 'known', sigma: 0.35 });
    expect(judgeNoiseSd(' 0.35 ')).toEqual({ kind: 'known', sigma: 0.35 });
    expect(judgeNoiseSd('.5')).toEqual({ kind: 'known', sigma: 0.5 });
    expect(judgeNoiseSd('2')).toEqual({ kind: 'known', sigma: 2 });
    expect(judgeNoiseSd('1.5e-3')).toEqual({ kind: 'known', sigma: 0.0015 });
  });

  it('refuses 0, negatives, infinities, text and a decimal comma, each with its own verdict', () => {
    expect(judgeNoiseSd(0)).toEqual({ kind: 'zero' });
    expect(judgeNoiseSd('0')).toEqual({ kind: 'zero' });
    expect(judgeNoiseSd('0.0')).toEqual({ kind: 'zero' });
    expect(judgeNoiseSd(-1)).toEqual({ kind: 'negative' });
    expect(judgeNoiseSd('-1')).toEqual({ kind: 'negative' });
    expect(judgeNoiseSd(Infinity)).toEqual({ kind: 'not-finite' });
    expect(judgeNoiseSd('1e400')).toEqual({ kind: 'not-finite' });
    expect(judgeNoiseSd(Number.NaN)).toEqual({ kind: 'not-a-number' });
    expect(judgeNoiseSd('abc')).toEqual({ kind: 'not-a-number' });
    expect(judgeNoiseSd('0.35 mm')).toEqual({ kind: 'not-a-number' });
    expect(judgeNoiseSd('0,35')).toEqual({ kind: 'decimal-comma' });
    expect(judgeNoiseSd('1.000,5')).toEqual({ kind: 'not-a-number' });
  });
});
