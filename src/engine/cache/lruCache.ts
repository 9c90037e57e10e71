/**
 * A least-recently-used cache bounded both by entry count and by an estimate of bytes held.
 * Map iteration order is insertion order, so re-inserting on use keeps the oldest entry first.
 */
export class LruCache<K, V> {
  private readonly entries = new Map<K, { value: V; bytes: number }>();
  private bytesHeld = 0;

  constructor(
    private readonly maxEntries: number,
    private readonly maxBytes: number,
  ) {}

  get(key: K): V | undefined {
    const entry = this.entries.get(key);
    if (entry === undefined) return undefined;
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.value;
  }

  set(key: K, value: V, bytes: number): void {
    const previous = this.entries.get(key);
    if (previous !== undefined) {
      this.bytesHeld -= previous.bytes;
      this.entries.delete(key);
    }
    if (bytes > this.maxBytes) return;
    this.entries.set(key, { value, bytes });
    this.bytesHeld += bytes;
    while (this.entries.size > this.maxEntries || this.bytesHeld > this.maxBytes) {
      const oldest = this.entries.keys().next().value as K;
      this.bytesHeld -= this.entries.get(oldest)!.bytes;
      this.entries.delete(oldest);
    }
  }

  clear(): void {
    this.entries.clear();
    this.bytesHeld = 0;
  }

  get size(): number {
    return this.entries.size;
  }

  get bytes(): number {
    return this.bytesHeld;
  }
}
