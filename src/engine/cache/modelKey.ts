import { COVARIANCE_KINDS } from '../settings';
import type { FitSettings, ModelData } from '../types';
import { packedDataOf, type PackedData, type PackedPredictors } from './packedPredictors';

/**
 * The numeric content of a model request (names are not part of it), as the sequence of numbers
 * settings, y, x row-major, weights, so that equal requests compare equal byte for byte, with a
 * 53-bit hash of it. The cache compares the content itself on every hit, so a hash collision can
 * cost time but never return another model's numbers. The parts are read where they lie (the
 * request's own arrays): a lookup copies nothing, and only a key that is stored is copied
 * (storedKey), and not even then when its parts are a model frame's packed arrays.
 */
export interface ModelKey {
  hash: number;
  /** Always four or three parts: the settings header, y, x row-major, and the weights if any. */
  parts: readonly ArrayLike<number>[];
  /** How many numbers the parts hold together. */
  length: number;
  text: string;
  /**
   * For each part, whether a stored key may keep it as it is: the key's own fresh arrays and a
   * frame's registered packed arrays, which nothing changes; a caller's arrays are copied.
   */
  keepable: readonly boolean[];
  /**
   * The predictors as this key packed them from rows of one width, as many as y: what a fit of
   * these numbers reads instead of the rows again. Undefined for a frame's packed data (whose
   * own packing serves) and for rows a fit must refuse, which it then reads itself to say why.
   */
  rowsPacking?: PackedPredictors;
}

/**
 * A key as the cache keeps it, part for part: copies, so a caller's later edit cannot change it,
 * or the packed arrays themselves when those cannot change.
 */
export interface StoredKey {
  hash: number;
  parts: readonly Float64Array[];
  length: number;
  text: string;
}

export function modelKey(data: ModelData, settings: FitSettings | undefined, tag: string): ModelKey {
  // Packed numbers (from the model frame) are read whole, without touching a row.
  const packed = packedDataOf(data);
  if (packed !== undefined) return packedKey(packed, settings, tag);
  // Shapes are validated after the lookup, so read defensively: a ragged request only has to
  // produce some key, and the fit then reports what is wrong with it.
  const n = data.y.length;
  const p = data.x[0]?.length ?? 0;
  const { values, wellShaped } = rowsPacked(data.x, n, p);
  const parts: ArrayLike<number>[] = [settingsHeader(n, p, settings, data.weights !== undefined), data.y, values];
  const keepable = [true, false, true];
  if (data.weights !== undefined) {
    const whole = data.weights.length === n;
    parts.push(whole ? data.weights : Float64Array.from({ length: n }, (_, i) => data.weights?.[i] ?? Number.NaN));
    keepable.push(!whole);
  }
  const key = keyOf(parts, `${data.x.length}\u0000${data.weights?.length ?? -1}\u0000${tag}`, keepable);
  return wellShaped && data.x.length === n ? { ...key, rowsPacking: { values, rows: n, p } } : key;
}

/** The same key as from the data's rows: its parts are the packed arrays themselves. */
function packedKey(packed: PackedData, settings: FitSettings | undefined, tag: string): ModelKey {
  const { y, predictors, weights } = packed;
  const n = y.length;
  const parts: ArrayLike<number>[] = [settingsHeader(n, predictors.p, settings, weights !== undefined), y, predictors.values];
  if (weights !== undefined) parts.push(weights);
  return keyOf(
    parts,
    `${predictors.rows}\u0000${weights?.length ?? -1}\u0000${tag}`,
    parts.map(() => true),
  );
}

function keyOf(parts: readonly ArrayLike<number>[], text: string, keepable: readonly boolean[]): ModelKey {
  let length = 0;
  for (const part of parts) length += part.length;
  return { hash: hashContent(parts, text), parts, length, text, keepable };
}

/** The settings and shape, the key's first numbers. */
export function settingsHeader(n: number, p: number, settings: FitSettings | undefined, hasWeights: boolean): Float64Array {
  const header = new Float64Array(7);
  header[0] = n;
  header[1] = p;
  header[2] = settings?.intercept === false ? 0 : 1;
  header[3] = settings?.level ?? 0.95;
  header[4] = settings?.knownSigma ?? -1;
  header[5] = hasWeights ? 1 : 0;
  // A robust fit of the same data is a different result (other SEs, covariance, reference), so the kind is part of the key.
  header[6] = COVARIANCE_KINDS.indexOf(settings?.covariance ?? 'classical');
  return header;
}

/**
 * The first n rows, p numbers each, row-major; a missing row or anything but a number reads as
 * NaN. wellShaped: every row was there with exactly p numbers, so the packing stands for the rows.
 */
function rowsPacked(x: readonly (readonly number[])[], n: number, p: number): { values: Float64Array; wellShaped: boolean } {
  const values = new Float64Array(n * p);
  let wellShaped = true;
  for (let i = 0, at = 0; i < n; i++, at += p) {
    const row = x[i];
    if (row !== undefined && row.length === p) {
      for (let j = 0; j < p; j++) {
        const value: unknown = row[j];
        if (typeof value === 'number') values[at + j] = value;
        else {
          // Not a number (a JavaScript caller's null or text): NaN in the key, and the fit reads the row to name it.
          values[at + j] = Number.NaN;
          wellShaped = false;
        }
      }
      continue;
    }
    wellShaped = false;
    for (let j = 0; j < p; j++) values[at + j] = row?.[j] ?? Number.NaN;
  }
  return { values, wellShaped };
}

export function storedKey(key: ModelKey): StoredKey {
  const parts = key.parts.map((part, k) => {
    if (key.keepable[k] && part instanceof Float64Array) return part;
    const copy = new Float64Array(part.length);
    copy.set(part);
    return copy;
  });
  return { hash: key.hash, parts, length: key.length, text: key.text };
}

/** Equal bit patterns, number by number (so −0 differs from 0, and NaN equals the same NaN). */
export function sameKey(stored: StoredKey, key: ModelKey): boolean {
  if (stored.hash !== key.hash || stored.text !== key.text || stored.length !== key.length || stored.parts.length !== key.parts.length) return false;
  for (let k = 0; k < key.parts.length; k++) {
    const part = key.parts[k];
    const kept = stored.parts[k];
    // A stored key that kept a frame's packed array meets that very array again on a lookup of the same frame.
    if (part === kept) continue;
    if (part.length !== kept.length) return false;
    // Each kind of part has its own loop, so every loop reads one kind of array.
    const same = part instanceof Float64Array ? samePacked(part, kept) : sameNumbers(part, kept);
    if (!same) return false;
  }
  return true;
}

function samePacked(part: Float64Array, kept: Float64Array): boolean {
  for (let i = 0; i < part.length; i++) if (!sameBits(part[i], kept[i])) return false;
  return true;
}

function sameNumbers(part: ArrayLike<number>, kept: Float64Array): boolean {
  for (let i = 0; i < part.length; i++) if (!sameBits(part[i], kept[i])) return false;
  return true;
}

const twoNumbers = new Float64Array(2);
const twoNumbersWords = new Uint32Array(twoNumbers.buffer);

/** Numbers compare equal exactly when their bits do, but for ±0 and NaN: those compare bits. */
function sameBits(a: number, b: number): boolean {
  if (a === b) return a !== 0 || 1 / a === 1 / b;
  if (a === a || b === b) return false;
  twoNumbers[0] = a;
  twoNumbers[1] = b;
  return twoNumbersWords[0] === twoNumbersWords[2] && twoNumbersWords[1] === twoNumbersWords[3];
}

/** Numbers that are no Float64Array are hashed through this block, a block at a time. */
const BLOCK = 4096;
const blockNumbers = new Float64Array(BLOCK);
const blockWords = new Uint32Array(blockNumbers.buffer);

/**
 * Two FNV-1a-style streams over the bit patterns (so −0 and 0, and NaN payloads, stay distinct):
 * one over each number's low word, one over its high word, so each number costs two multiplies.
 */
function hashContent(parts: readonly ArrayLike<number>[], text: string): number {
  const state = new Uint32Array([0x811c9dc5, 0x01000193 ^ 0x5bd1e995]);
  for (const part of parts) {
    if (part instanceof Float64Array) {
      hashWords(new Uint32Array(part.buffer, part.byteOffset, part.length * 2), part.length * 2, state);
      continue;
    }
    for (let start = 0; start < part.length; start += BLOCK) {
      const count = Math.min(BLOCK, part.length - start);
      for (let i = 0; i < count; i++) blockNumbers[i] = part[start + i];
      hashWords(blockWords, count * 2, state);
    }
  }
  let h1 = state[0];
  let h2 = state[1];
  for (let i = 0; i < text.length; i++) {
    h1 = Math.imul(h1 ^ text.charCodeAt(i), 0x01000193);
    h2 = Math.imul(h2 ^ text.charCodeAt(i), 0x5bd1e995) ^ (h2 >>> 15);
  }
  return (h1 >>> 0) * 0x200000 + ((h2 >>> 0) & 0x1fffff);
}

/** Folds `count` words (an even count: low, high, low, …) into the two streams held in `state`. */
function hashWords(words: Uint32Array, count: number, state: Uint32Array): void {
  let h1 = state[0] | 0;
  let h2 = state[1] | 0;
  for (let i = 0; i < count; i += 2) {
    h1 = Math.imul(h1 ^ words[i], 0x01000193);
    h2 = Math.imul(h2 ^ words[i + 1], 0x5bd1e995) ^ (h2 >>> 15);
  }
  state[0] = h1;
  state[1] = h2;
}
