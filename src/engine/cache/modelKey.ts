import { COVARIANCE_KINDS } from '../settings';
import type { FitSettings, ModelData } from '../types';
import { packedPredictorsOf } from './packedPredictors';

/**
 * The numeric content of a model request (names are not part of it), as the sequence of numbers
 * settings, y, x row-major, weights, so that equal requests compare equal byte for byte, with a
 * 53-bit hash of it. The cache compares the content itself on every hit, so a hash collision can
 * cost time but never return another model's numbers. The parts are read where they lie (the
 * request's own arrays): a lookup copies nothing, and only a key that is stored is packed
 * (storedKey).
 */
export interface ModelKey {
  hash: number;
  parts: readonly ArrayLike<number>[];
  /** How many numbers the parts hold together. */
  length: number;
  text: string;
}

/** A key as the cache keeps it: its numbers copied, so a caller's later edit cannot change it. */
export interface StoredKey {
  hash: number;
  numbers: Float64Array;
  text: string;
}

export function modelKey(data: ModelData, settings: FitSettings | undefined, tag: string): ModelKey {
  // Shapes are validated after the lookup, so read defensively: a ragged request only has to
  // produce some key, and the fit then reports what is wrong with it.
  const n = data.y.length;
  // Packed predictors (from the model frame) are read whole, without touching a row.
  const packed = packedPredictorsOf(data);
  const usePacked = packed !== undefined && packed.rows === n;
  const p = usePacked ? packed.p : (data.x[0]?.length ?? 0);
  const hasWeights = data.weights !== undefined;
  const header = new Float64Array(7);
  header[0] = n;
  header[1] = p;
  header[2] = settings?.intercept === false ? 0 : 1;
  header[3] = settings?.level ?? 0.95;
  header[4] = settings?.knownSigma ?? -1;
  header[5] = hasWeights ? 1 : 0;
  // A robust fit of the same data is a different result (other SEs, covariance, reference), so the kind is part of the key.
  header[6] = COVARIANCE_KINDS.indexOf(settings?.covariance ?? 'classical');
  const parts: ArrayLike<number>[] = [header, data.y, usePacked ? packed.values : rowsPacked(data.x, n, p)];
  if (data.weights !== undefined)
    parts.push(data.weights.length === n ? data.weights : Float64Array.from({ length: n }, (_, i) => data.weights?.[i] ?? Number.NaN));
  const length = 7 + n * (1 + p + (hasWeights ? 1 : 0));
  const text = `${usePacked ? packed.rows : data.x.length}\u0000${data.weights?.length ?? -1}\u0000${tag}`;
  return { hash: hashContent(parts, text), parts, length, text };
}

/** x's first n rows, p numbers each, row-major; a missing number reads as NaN. */
function rowsPacked(x: readonly (readonly number[])[], n: number, p: number): Float64Array {
  const values = new Float64Array(n * p);
  let at = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < p; j++) values[at++] = x[i]?.[j] ?? Number.NaN;
  return values;
}

export function storedKey(key: ModelKey): StoredKey {
  const numbers = new Float64Array(key.length);
  let at = 0;
  for (const part of key.parts) {
    numbers.set(part, at);
    at += part.length;
  }
  return { hash: key.hash, numbers, text: key.text };
}

/** Equal bit patterns, number by number (so −0 differs from 0, and NaN equals the same NaN). */
export function sameKey(stored: StoredKey, key: ModelKey): boolean {
  if (stored.hash !== key.hash || stored.text !== key.text || stored.numbers.length !== key.length) return false;
  const numbers = stored.numbers;
  const storedWords = new Uint32Array(numbers.buffer, numbers.byteOffset, numbers.length * 2);
  let at = 0;
  for (const part of key.parts) {
    for (let i = 0; i < part.length; i++, at++) {
      const a = part[i];
      const b = numbers[at];
      // Numbers compare equal exactly when their bits do, but for ±0 and NaN: those compare bits.
      if (a === b ? a === 0 && 1 / a !== 1 / b : !(a !== a && b !== b && sameNaN(a, storedWords, at))) return false;
    }
  }
  return true;
}

const oneNumber = new Float64Array(1);
const oneNumberWords = new Uint32Array(oneNumber.buffer);

function sameNaN(value: number, storedWords: Uint32Array, at: number): boolean {
  oneNumber[0] = value;
  return oneNumberWords[0] === storedWords[2 * at] && oneNumberWords[1] === storedWords[2 * at + 1];
}

/** Numbers that are no Float64Array are read through this block, a block at a time. */
const BLOCK = 4096;
const blockNumbers = new Float64Array(BLOCK);
const blockWords = new Uint32Array(blockNumbers.buffer);

/** Hands the parts' bit patterns to `visit` in order, a block of 32-bit words (an even count) at a time. */
function eachWordBlock(parts: readonly ArrayLike<number>[], visit: (words: Uint32Array, count: number) => void): void {
  for (const part of parts) {
    if (part instanceof Float64Array) {
      visit(new Uint32Array(part.buffer, part.byteOffset, part.length * 2), part.length * 2);
      continue;
    }
    for (let start = 0; start < part.length; start += BLOCK) {
      const count = Math.min(BLOCK, part.length - start);
      for (let i = 0; i < count; i++) blockNumbers[i] = part[start + i];
      visit(blockWords, count * 2);
    }
  }
}

/**
 * Two FNV-1a-style streams over the bit patterns (so −0 and 0, and NaN payloads, stay distinct):
 * one over each number's low word, one over its high word, so each number costs two multiplies.
 */
function hashContent(parts: readonly ArrayLike<number>[], text: string): number {
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193 ^ 0x5bd1e995;
  eachWordBlock(parts, (words, count) => {
    for (let i = 0; i < count; i += 2) {
      h1 = Math.imul(h1 ^ words[i], 0x01000193);
      h2 = Math.imul(h2 ^ words[i + 1], 0x5bd1e995) ^ (h2 >>> 15);
    }
  });
  for (let i = 0; i < text.length; i++) {
    h1 = Math.imul(h1 ^ text.charCodeAt(i), 0x01000193);
    h2 = Math.imul(h2 ^ text.charCodeAt(i), 0x5bd1e995) ^ (h2 >>> 15);
  }
  return (h1 >>> 0) * 0x200000 + ((h2 >>> 0) & 0x1fffff);
}
