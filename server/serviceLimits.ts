/**
 * Limits of the HTTP service, declared once. The hull-size and physical limits are
 * core's (core/common/limits.ts); these bound what one request may cost the service.
 * README's "Limits" lists every one with the status it gets.
 */
import { availableParallelism } from 'node:os';
import { LIMITS } from '../core/common/limits.js';

export const SERVICE_LIMITS = {
  /** Largest request body, bytes: 16 MiB, room for the largest hull core/common/limits.ts allows in grid form. Counted while the body arrives. */
  bodyLimit: LIMITS.maxInputBytes,
  /** Largest request line and headers together, bytes (431 beyond): room for a drafts list of maxDraftsText characters. */
  maxHeaderSize: 32 * 1024,
  /** A client must send its request line and headers within this time, ms (408 after). */
  headersTimeout: 10_000,
  /** A client must send its whole request, body included, within this time, ms (408 after). */
  requestTimeout: 30_000,
  /** A socket with no traffic at all is closed after this time, ms. */
  connectionTimeout: 30_000,
  /** Keep-alive sockets wait this long for the next request, ms. */
  keepAliveTimeout: 5_000,
  /** How often the server looks for requests past their time, ms: the timeouts above hold to within this. */
  timeoutCheckInterval: 1_000,
  /** A computation is stopped after this time, ms (503). */
  computeTimeout: 20_000,
  /** Shutdown waits this long for requests in flight before it gives up, ms. */
  shutdownGrace: 10_000,
  /** Prepared hulls kept in memory (least recently used go first). */
  preparedCacheSize: 32,
  /** Characters of computed answers kept for repeated requests. */
  answerCacheChars: 8 * 1024 * 1024,
  /** Longest drafts text in a query, characters (a URL of maxHeaderSize carries it). */
  maxDraftsText: 20_000,
  /** Longest hull id, characters (ids are 16 url-safe characters; demo hulls have readable ones). */
  maxIdLength: 64,
  /** Most numbers in one answer (a calculation sheet's ordinates, Bonjean points...), 422 beyond: about 60 MB of JSON at most. */
  maxAnswerCells: 4_000_000,
  /**
   * Work units (about 70 ns each: one section evaluated at one draft) up to which a
   * computation runs on the request thread; above, it goes to the worker threads. A
   * 20-draft table of a demo hull is about 1,000; 40,000 is about 3 ms.
   */
  inlineWork: 40_000,
  /** Bodies (and stored uploads) above this size are read in a worker thread, bytes: reading 64 KiB of offsets takes a few ms. */
  inlineBytes: 64 * 1024,
  /** Worker threads for heavy computations: one fewer than the cores, at least one. */
  workerThreads: Math.max(1, availableParallelism() - 1),
  /** Heavy computations waiting for a worker at most; more get 503 with Retry-After. */
  workerQueue: 8,
  /** Heap of one worker thread, MiB: a computation that needs more is stopped (503). */
  workerHeapMb: 2048,
} as const;

export type ServiceLimits = { -readonly [K in keyof typeof SERVICE_LIMITS]: number };
