import { COVARIANCE_KINDS } from '../settings';
import type { FitSettings, ModelData } from '../types';

/**
 * The numeric content of a model request (names are not part of it), packed so that equal requests compare equal byte for
 * byte, with a 53-bit hash of it. The cache compares the content itself on every hit, so a hash
 * collision can cost time but never return another model's numbers.
 */
export interface ModelKey {
  hash: number;
  numbers: Float64Array;
  text: string;
}

export function modelKey(data: ModelData, settings: FitSettings | undefined, tag: string): ModelKey {
  // Shapes are validated after the lookup, so read defensively: a ragged request only has to
  // produce some key, and the fit then reports what is wrong with it.
  const n = data.y.length;
  const p = data.x[0]?.length ?? 0;
  const hasWeights = data.weights !== undefined;
  const numbers = new Float64Array(7 + n * (1 + p + (hasWeights ? 1 : 0)));
  numbers[0] = n;
  numbers[1] = p;
  numbers[2] = settings?.intercept === false ? 0 : 1;
  numbers[3] = settings?.level ?? 0.95;
  numbers[4] = settings?.knownSigma ?? -1;
  numbers[5] = hasWeights ? 1 : 0;
  // A robust fit of the same data is a different result (other SEs, covariance, reference), so the kind is part of the key.
  numbers[6] = COVARIANCE_KINDS.indexOf(settings?.covariance ?? 'classical');
  let at = 7;
  for (let i = 0; i < n; i++) numbers[at++] = data.y[i];
  for (let i = 0; i < n; i++) for (let j = 0; j < p; j++) numbers[at++] = data.x[i]?.[j] ?? Number.NaN;
  if (data.weights !== undefined) for (let i = 0; i < n; i++) numbers[at++] = data.weights[i] ?? Number.NaN;
  const text = `${data.x.length}\u0000${data.weights?.length ?? -1}\u0000${tag}`;
  return { hash: hashContent(numbers, text), numbers, text };
}

export function sameKey(a: ModelKey, b: ModelKey): boolean {
  if (a.hash !== b.hash || a.text !== b.text || a.numbers.length !== b.numbers.length) return false;
  const wa = new Uint32Array(a.numbers.buffer, a.numbers.byteOffset, a.numbers.length * 2);
  const wb = new Uint32Array(b.numbers.buffer, b.numbers.byteOffset, b.numbers.length * 2);
  for (let i = 0; i < wa.length; i++) if (wa[i] !== wb[i]) return false;
  return true;
}

/** Two FNV-1a streams over the bit patterns (so −0 and 0, and NaN payloads, stay distinct). */
function hashContent(numbers: Float64Array, text: string): number {
  const words = new Uint32Array(numbers.buffer, numbers.byteOffset, numbers.length * 2);
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193 ^ 0x5bd1e995;
  for (let i = 0; i < words.length; i++) {
    h1 = Math.imul(h1 ^ words[i], 0x01000193);
    h2 = Math.imul(h2 ^ words[i], 0x5bd1e995) ^ (h2 >>> 15);
  }
  for (let i = 0; i < text.length; i++) {
    h1 = Math.imul(h1 ^ text.charCodeAt(i), 0x01000193);
    h2 = Math.imul(h2 ^ text.charCodeAt(i), 0x5bd1e995) ^ (h2 >>> 15);
  }
  return (h1 >>> 0) * 0x200000 + ((h2 >>> 0) & 0x1fffff);
}
