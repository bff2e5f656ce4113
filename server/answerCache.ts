/**
 * Answers of computations on stored hulls, kept by their ETag: the tag fixes the hull
 * (content hash and name), the computation, the query and the form, so a kept answer is
 * the answer. Repeated requests (a spreadsheet refreshing its web query, a page showing
 * one table) then cost no computation and no serialisation. Bounded by total size, least
 * recently used first out.
 */
export interface KeptAnswer {
  readonly mediaType: string;
  readonly body: string;
  readonly filename?: string;
}

export class AnswerCache {
  private readonly map = new Map<string, KeptAnswer>();
  private bytes = 0;

  constructor(readonly maxBytes: number) {}

  get(etag: string): KeptAnswer | undefined {
    const a = this.map.get(etag);
    if (a !== undefined) {
      this.map.delete(etag);
      this.map.set(etag, a);
    }
    return a;
  }

  set(etag: string, answer: KeptAnswer): void {
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
