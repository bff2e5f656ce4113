/** Finding the stored hull a URL names: 404 with a problem document when there is none. */
import type { FastifyRequest } from 'fastify';
import { z } from 'zod';
import type { HullStore, HullMeta } from '../store/hullStore.js';
import { serviceFail } from '../serviceErrors.js';
import { SERVICE_LIMITS } from '../serviceLimits.js';

export const HullIdParams = z.object({
  id: z.string().describe('id of a stored hull (from POST /v1/hulls or GET /v1/hulls)'),
});

const ID = new RegExp(`^[A-Za-z0-9_-]{1,${SERVICE_LIMITS.maxIdLength}}$`);

export function hullIdOf(req: FastifyRequest): string {
  const id = (req.params as { id?: unknown }).id;
  if (typeof id !== 'string' || !ID.test(id)) {
    const shown = typeof id === 'string' ? JSON.stringify(id.slice(0, 80)) : 'nothing';
    serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id ${shown}: ids are 1 to ${SERVICE_LIMITS.maxIdLength} letters, digits, - or _`);
  }
  return id;
}

export function requireHullMeta(store: HullStore, req: FastifyRequest): HullMeta {
  const id = hullIdOf(req);
  const meta = store.meta(id);
  if (meta === undefined) serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id "${id}"; GET /v1/hulls lists them`);
  return meta;
}
