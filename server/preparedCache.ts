/**
 * Prepared hulls of the store, kept in a small LRU so that repeated tables of one hull
 * skip reading its model and fitting its sections. The key holds the content hash and
 * the name, which together fix the model: a replaced hull misses and is prepared anew.
 */
import { Lru } from './lru.js';
import { loadHull, sourceReading, type LoadedHull } from './hullInput.js';
import type { HullMeta, HullStore } from './store/hullStore.js';

export class PreparedCache {
  private readonly lru: Lru<string, LoadedHull>;

  constructor(
    private readonly store: HullStore,
    capacity: number,
  ) {
    this.lru = new Lru(capacity);
  }

  /** The loaded hull for `meta` (read from the store just now, in the same synchronous step). */
  get(meta: HullMeta): LoadedHull {
    const key = `${meta.id}\u0000${meta.hash}\u0000${meta.name}`;
    let hit = this.lru.get(key);
    if (hit === undefined) {
      const stored = this.store.get(meta.id);
      if (stored === undefined) throw new Error(`hull ${meta.id} vanished between two reads of one request`);
      const source = sourceReading(stored.mediaType, () => this.store.source(meta.id)?.bytes, stored.units);
      hit = loadHull({ hull: stored.model, form: stored.form, units: stored.units, ...source });
      this.lru.set(key, hit);
    }
    return hit;
  }

  /** Forget a hull (after it is replaced or deleted), so memory is not held for it. */
  forget(id: string): void {
    this.lru.deleteWhere((k) => k.startsWith(`${id}\u0000`));
  }

  get size(): number {
    return this.lru.size;
  }
}
