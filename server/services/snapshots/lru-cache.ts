/**
 * A least-recently-used cache bounded by the total length of its values (characters of a string,
 * bytes of a Buffer), for values that never change once made (serialized snapshots). A Map keeps
 * insertion order, so the first key is the least recently used one.
 */
export class SizedLru<V extends { readonly length: number }> {
  private readonly entries = new Map<string, V>();
  private size = 0;

  constructor(private readonly maxSize: number) {}

  get(key: string): V | undefined {
    const value = this.entries.get(key);
    if (value === undefined) return undefined;
    this.entries.delete(key);
    this.entries.set(key, value);
    return value;
  }

  set(key: string, value: V): void {
    const old = this.entries.get(key);
    if (old !== undefined) {
      this.entries.delete(key);
      this.size -= old.length;
    }
    if (value.length > this.maxSize) return;
    this.entries.set(key, value);
    this.size += value.length;
    for (const [k, v] of this.entries) {
      if (this.size <= this.maxSize) break;
      this.entries.delete(k);
      this.size -= v.length;
    }
  }

  /** Number of entries held. */
  get count(): number {
    return this.entries.size;
  }
}
