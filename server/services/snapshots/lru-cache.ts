/**
 * A least-recently-used cache of strings bounded by their total length, for values that never
 * change once made (serialized snapshots). A Map keeps insertion order, so the first key is the
 * least recently used one.
 */
export class TextLru {
  private readonly entries = new Map<string, string>();
  private size = 0;

  constructor(private readonly maxChars: number) {}

  get(key: string): string | undefined {
    const value = this.entries.get(key);
    if (value === undefined) return undefined;
    this.entries.delete(key);
    this.entries.set(key, value);
    return value;
  }

  set(key: string, value: string): void {
    const old = this.entries.get(key);
    if (old !== undefined) {
      this.entries.delete(key);
      this.size -= old.length;
    }
    if (value.length > this.maxChars) return;
    this.entries.set(key, value);
    this.size += value.length;
    for (const [k, v] of this.entries) {
      if (this.size <= this.maxChars) break;
      this.entries.delete(k);
      this.size -= v.length;
    }
  }

  /** Number of entries held. */
  get count(): number {
    return this.entries.size;
  }
}
