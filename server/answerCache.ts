/**
 * Answers of computations on stored hulls, kept by their ETag: the tag fixes the hull
 * (content hash and name), the computation, the query and the form, so a kept answer is
 * the answer. Repeated requests (a spreadsheet refreshing its web query, a page showing
 * one table) then cost no computation and no serialisation. Bounded by total size, least
 * recently used first out.
 *
 * An answer is kept only when its tag is asked for a second time: a tag seen once is
 * only remembered (a short string). Answers asked for once, such as a table whose drafts
 * change with every request, would otherwise fill the cache with strings that live long
 * enough to reach the old generation of the heap, and their collection cost the compute
 * path more than a quarter of its time (measured with npm run bench:http and a profile).
 */
export interface KeptAnswer {
  readonly mediaType: string;
  readonly body: string;
  readonly filename?: string;
}

export class AnswerCache {
  private readonly map = new Map<string, KeptAnswer>();
  private bytes = 0;
  /** Tags asked for once, not yet kept; forgotten all at once when there are many. */
  private seen = new Set<string>();
  private static readonly SEEN_MAX = 10_000;

  constructor(readonly maxBytes: number) {}

  get(etag: string): KeptAnswer | undefined {
    const a = this.map.get(etag);
    if (a !== undefined) {
      this.map.delete(etag);
      this.map.set(etag, a);
    }
    return a;
  }

  /** Offer an answer: kept when its tag was asked for before, else only the tag is remembered. */
  set(etag: string, answer: KeptAnswer): void {
    if (!this.seen.delete(etag)) {
      if (this.seen.size >= AnswerCache.SEEN_MAX) this.seen = new Set();
      this.seen.add(etag);
      return;
    }
    // Strings are two bytes a character at most; the length is a fair bound on memory.
    const size = answer.body.length;
    if (size > this.maxBytes / 4) return;
    const old = this.map.get(etag);
    if (old !== undefined) {
      this.bytes -= old.body.length;
      this.map.delete(etag);
    }
    this.map.set(etag, answer);
    this.bytes += size;
    for (const [k, v] of this.map) {
      if (this.bytes <= this.maxBytes) break;
      this.map.delete(k);
      this.bytes -= v.body.length;
    }
  }

  get size(): number {
    return this.map.size;
  }
}
