/**
 * A small least-recently-used map: a Map keeps insertion order, so the first key is the
 * one used longest ago; a hit moves its key to the end.
 */
export class Lru<K, V> {
  private readonly map = new Map<K, V>();

  constructor(readonly capacity: number) {
    if (!(capacity >= 1)) throw new RangeError('an LRU needs room for at least one entry');
  }

  get(key: K): V | undefined {
    const v = this.map.get(key);
    if (v !== undefined) {
      this.map.delete(key);
      this.map.set(key, v);
    }
    return v;
  }

  set(key: K, value: V): void {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.capacity) this.map.delete(this.map.keys().next().value as K);
  }

  delete(key: K): void {
    this.map.delete(key);
  }

  /** Drop every entry whose key passes `test`. */
  deleteWhere(test: (key: K) => boolean): void {
    for (const k of [...this.map.keys()]) if (test(k)) this.map.delete(k);
  }

  get size(): number {
    return this.map.size;
  }
}
