import type { FitSettings, ModelData } from '../types';
import { LruCache } from './lruCache';
import { modelKey, sameKey, type StoredKey, storedKey } from './modelKey';

export interface CacheStats {
  /** Fits computed (cache misses) since the last reset. */
  fits: number;
  hits: number;
  entries: number;
  bytes: number;
}

/**
 * Content-addressed memo of fits: equal data and settings give the very same result object,
 * so many formulas over the same ranges cost one fit, and the pane and the cells cannot disagree.
 */
export class ModelCache<T> {
  private readonly store: LruCache<number, { key: StoredKey; value: T }>;
  private fits = 0;
  private hits = 0;

  constructor(maxEntries: number, maxBytes: number) {
    this.store = new LruCache(maxEntries, maxBytes);
  }

  getOrCompute(data: ModelData, settings: FitSettings, compute: () => T, sizeOf: (value: T) => number): T {
    const key = modelKey(data, settings, '');
    const found = this.store.get(key.hash);
    if (found !== undefined && sameKey(found.key, key)) {
      this.hits++;
      return found.value;
    }
    const value = compute();
    this.fits++;
    this.store.set(key.hash, { key: storedKey(key), value }, 8 * key.length + sizeOf(value));
    return value;
  }

  stats(): CacheStats {
    return { fits: this.fits, hits: this.hits, entries: this.store.size, bytes: this.store.bytes };
  }

  reset(): void {
    this.store.clear();
    this.fits = 0;
    this.hits = 0;
  }
}
