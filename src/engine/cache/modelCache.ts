import type { FitSettings, ModelData } from '../types';
import { LruCache } from './lruCache';
import { modelKey, sameKey, settingsHeader, type StoredKey, storedKey } from './modelKey';
import { packedDataOf, type PackedPredictors } from './packedPredictors';

export interface CacheStats {
  /** Fits computed (cache misses) since the last reset. */
  fits: number;
  hits: number;
  entries: number;
  bytes: number;
}

interface Entry<T> {
  key: StoredKey;
  value: T;
}

/**
 * Where the entry for a data object under some settings (their header numbers) was found: its
 * hash and its stored key, which the entry keeps for as long as the cache holds it (and which
 * holds nothing of the fit, so remembering it keeps no evicted fit alive).
 */
interface Remembered {
  header: Float64Array;
  hash: number;
  key: StoredKey;
}

/** Settings variants remembered per data object (level, intercept, σ, robust kind in use at once). */
const MAX_REMEMBERED = 8;

/**
 * Content-addressed memo of fits: equal data and settings give the very same result object,
 * so many formulas over the same ranges cost one fit, and the pane and the cells cannot disagree.
 * Data whose numbers are registered packed (a model frame's, which cannot change) are also
 * remembered by the object itself, so asking again with the same object and settings finds its
 * entry without hashing or comparing the numbers, for as long as the cache still holds it.
 */
export class ModelCache<T> {
  private readonly store: LruCache<number, Entry<T>>;
  private byData = new WeakMap<ModelData, Remembered[]>();
  private fits = 0;
  private hits = 0;

  constructor(maxEntries: number, maxBytes: number) {
    this.store = new LruCache(maxEntries, maxBytes);
  }

  /**
   * The entry for data under settings, computed on a miss. compute receives the key's packing of
   * data's rows when the key made one (see ModelKey.rowsPacking), so the rows are read once.
   */
  getOrCompute(data: ModelData, settings: FitSettings, compute: (rowsPacking: PackedPredictors | undefined) => T, sizeOf: (value: T) => number): T {
    const packed = packedDataOf(data);
    const header = packed === undefined ? undefined : settingsHeader(packed.y.length, packed.predictors.p, settings, packed.weights !== undefined);
    const remembered = header === undefined ? undefined : this.rememberedEntry(data, header);
    if (remembered !== undefined) {
      this.hits++;
      return remembered.value;
    }
    const key = modelKey(data, settings, '');
    const found = this.store.get(key.hash);
    let entry: Entry<T>;
    if (found !== undefined && sameKey(found.key, key)) {
      this.hits++;
      entry = found;
    } else {
      entry = { key: storedKey(key), value: compute(key.rowsPacking) };
      this.fits++;
      this.store.set(key.hash, entry, 8 * key.length + sizeOf(entry.value));
    }
    if (header !== undefined) this.remember(data, { header, hash: key.hash, key: entry.key });
    return entry.value;
  }

  /** The entry remembered for this data object under these settings, if the cache still holds it. */
  private rememberedEntry(data: ModelData, header: Float64Array): Entry<T> | undefined {
    const list = this.byData.get(data);
    const at = list?.findIndex((r) => sameNumbers(r.header, header)) ?? -1;
    if (list === undefined || at < 0) return undefined;
    const { hash, key } = list[at];
    // An entry evicted, replaced or cleared since is no longer the cache's answer.
    const found = this.store.get(hash);
    if (found?.key === key) return found;
    list.splice(at, 1);
    return undefined;
  }

  private remember(data: ModelData, remembered: Remembered): void {
    const list = this.byData.get(data) ?? [];
    list.push(remembered);
    if (list.length > MAX_REMEMBERED) list.shift();
    this.byData.set(data, list);
  }

  stats(): CacheStats {
    return { fits: this.fits, hits: this.hits, entries: this.store.size, bytes: this.store.bytes };
  }

  reset(): void {
    this.store.clear();
    this.byData = new WeakMap();
    this.fits = 0;
    this.hits = 0;
  }
}

/** Equal numbers, element by element, as Object.is compares them (so −0 differs from 0). */
function sameNumbers(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}
