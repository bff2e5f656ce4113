/**
 * Entity tags of answers on stored hulls: a digest of what fixes the answer (the hull's
 * content hash and name, the route, the normalised query, the form of the answer), so
 * the tag is known before anything is computed and a matching If-None-Match is
 * answered 304 at once. Comparison is weak, as RFC 9110 (13.1.2) asks of If-None-Match.
 */
import type { FastifyReply, FastifyRequest } from 'fastify';
import { sha256 } from './store/hullStore.js';

export function etagOf(parts: readonly string[]): string {
  return `"${sha256(parts.join('\u0000')).slice(0, 32)}"`;
}

const opaque = (tag: string): string => tag.trim().replace(/^W\//, '');

export function matchesIfNoneMatch(req: FastifyRequest, etag: string): boolean {
  const header = req.headers['if-none-match'];
  if (header === undefined) return false;
  if (header.trim() === '*') return true;
  const want = opaque(etag);
  return header.split(',').some((t) => opaque(t) === want);
}

/** Set the validators of a cacheable answer; true when the client's copy is current and a 304 has been sent. */
export function answerNotModified(req: FastifyRequest, reply: FastifyReply, etag: string): boolean {
  reply.header('etag', etag).header('cache-control', 'no-cache');
  if (!matchesIfNoneMatch(req, etag)) return false;
  reply.code(304).send();
  return true;
}

/** The tag of a stored hull as `GET /v1/hulls/{id}` gives it, in a unit and form. */
export function hullTag(meta: { readonly hash: string; readonly name: string }, units: string, format: string): string {
  return etagOf([meta.hash, meta.name, 'hull', units, format]);
}

/**
 * `If-Match` on a write to a stored hull (RFC 9110, 13.1.1): the write goes ahead only
 * when the header names the hull as it is now, by any tag a GET of it gives (the record
 * in any unit and form, or the upload's), or is `*`. Comparison is strong: a weak tag
 * never matches. True when there is no header (a plain write) or it matches.
 */
export function ifMatchHolds(req: FastifyRequest, current: readonly string[]): boolean {
  const header = req.headers['if-match'];
  if (header === undefined) return true;
  if (header.trim() === '*') return true;
  const tags = header.split(',').map((t) => t.trim());
  return tags.some((t) => !t.startsWith('W/') && current.includes(t));
}
