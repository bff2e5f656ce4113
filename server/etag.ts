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
