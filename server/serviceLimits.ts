/**
 * Limits of the HTTP service, declared once. The hull-size limits are core's
 * (core/common/limits.ts); these bound what one request may cost the service.
 */
export const SERVICE_LIMITS = {
  /** Largest request body, bytes: 16 MiB, room for the largest hull core/common/limits.ts allows in grid form. */
  bodyLimit: 16 * 1024 * 1024,
  /** A client must send its whole request within this time, ms (slow senders are cut off). */
  requestTimeout: 30_000,
  /** An idle socket is closed after this time, ms. */
  connectionTimeout: 60_000,
  /** Keep-alive sockets wait this long for the next request, ms. */
  keepAliveTimeout: 5_000,
  /** Shutdown waits this long for requests in flight before it gives up, ms. */
  shutdownGrace: 10_000,
  /** Prepared hulls kept in memory (least recently used go first). */
  preparedCacheSize: 32,
  /** Characters of computed answers kept for repeated requests. */
  answerCacheChars: 8 * 1024 * 1024,
  /** Longest drafts text in a query, characters. */
  maxDraftsText: 20_000,
  /** Longest hull id, characters (ids are 16 url-safe characters; demo hulls have readable ones). */
  maxIdLength: 64,
} as const;
