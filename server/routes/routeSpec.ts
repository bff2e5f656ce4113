/**
 * A route declared once: what Fastify registers and what the OpenAPI document
 * (server/openapi.ts) and the API page (server/docsPage.ts) describe. Handlers take
 * the shared context as an argument, so the declarations are plain constants that the
 * document can read without a running service.
 */
import type { FastifyInstance, FastifyReply, FastifyRequest } from 'fastify';
import type { z } from 'zod';
import type { ServiceContext } from '../context.js';

export type Method = 'GET' | 'POST' | 'PUT' | 'DELETE';

export interface ResponseDoc {
  readonly description: string;
  /** Schema of a JSON answer. */
  readonly json?: z.ZodType;
  /** The answer may also be CSV (text/csv), chosen by Accept or format=csv. */
  readonly csv?: string;
  /** Some other media type, described in words. */
  readonly other?: { readonly mediaType: string; readonly description: string };
  /** Response headers: a name, or a name with what it carries. */
  readonly headers?: readonly (string | { readonly name: string; readonly description: string })[];
}

export interface RouteSpec {
  readonly method: Method;
  /** Fastify pattern, e.g. `/v1/hulls/:id`. */
  readonly url: string;
  readonly operationId: string;
  readonly tag: 'compute' | 'hulls' | 'service';
  readonly summary: string;
  readonly description: string;
  /** Path parameters; a stored hull's `id` when left out. */
  readonly params?: z.ZodObject;
  readonly query?: z.ZodObject;
  /** Query when the body is JSON, if it differs. */
  readonly jsonQuery?: z.ZodObject;
  /** The body: an offsets file as text/csv and/or a JSON object. */
  readonly body?: { readonly csv: boolean; readonly json?: z.ZodType };
  readonly responses: Readonly<Record<number, ResponseDoc>>;
  /** Statuses of problem documents the route can answer with. */
  readonly problems: readonly number[];
  readonly handler: (req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext) => unknown;
}

export function registerRoutes(app: FastifyInstance, specs: readonly RouteSpec[], ctx: ServiceContext): void {
  for (const spec of specs) {
    app.route({ method: spec.method, url: spec.url, handler: (req, reply) => spec.handler(req, reply, ctx) });
  }
}

/** `/v1/hulls/:id` as OpenAPI writes it, `/v1/hulls/{id}`. */
export function openapiPath(url: string): string {
  return url.replace(/:([A-Za-z_]\w*)/g, '{$1}');
}
