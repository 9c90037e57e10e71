/**
 * The one wording of the known-σ rule, for the pane's field and for noise_sd in a cell: each
 * refusal says why and what to do, naming the entry as the user knows it (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { judgeNoiseSd } from '../../src/engine';
import { noiseSdMessage } from '../../src/presentation';

const field = (typed: string) => noiseSdMessage(judgeNoiseSd(typed), { name: 'Known σ', where: 'the field', shown: typed.trim() });
const cell = (typed: string) => noiseSdMessage(judgeNoiseSd(typed), { name: 'noise_sd', where: 'noise_sd', shown: typed.trim() });

describe('noiseSdMessage', () => {
  it('accepts an empty entry and a positive number', () => {
    expect(field('')).toBeUndefined();
    expect(field(' 0.35 ')).toBeUndefined();
    expect(cell('2e-3')).toBeUndefined();
  });

  it('words each refusal, the same sentence for the field and the cell', () => {
    expect(field('0')).toBe('Known σ cannot be 0: noise-free measurements leave nothing to estimate. Leave the field empty to estimate σ from the data.');
    expect(cell('0')).toBe('noise_sd cannot be 0: noise-free measurements leave nothing to estimate. Leave noise_sd empty to estimate σ from the data.');
    expect(field('-1')).toBe('Known σ is a standard deviation, so it must be positive; got -1.');
    expect(cell('1e999')).toBe('noise_sd must be a finite number; got 1e999.');
    expect(field('abc')).toBe('Known σ must be a number, such as 0.35, or left empty to estimate σ; got abc.');
    expect(cell(' 1,5 ')).toBe('Use a point as the decimal separator in noise_sd: 1.5 rather than 1,5.');
  });
});
