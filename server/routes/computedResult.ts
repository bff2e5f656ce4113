/**
 * The result of a computation as data, for a route that draws or prints it (a stability
 * plot, the report): computed as the computation's own route computes it, on the request
 * thread or in a worker by its declared cost (compute.ts answerOf), in SI with every
 * digit, and read back from its JSON.
 */
import type { FastifyRequest } from 'fastify';
import type { ServiceContext } from '../context.js';
import type { LoadedHull } from '../hullInput.js';
import { uploadOf } from '../plugins/uploadBody.js';
import type { HullMeta } from '../store/hullStore.js';
import { computationNamed, type ComputeJob, type HullSource } from '../jobs/job.js';
import { answerOf } from './compute.js';

/** SI, every digit, all fields. */
const AS_DATA = { units: 'si', digits: 17, plainHeader: false } as const;

/** Where a hull given to a route comes from, as a worker would read it, and the bytes of its body (0 for a stored hull). */
export interface HullAt {
  readonly h: LoadedHull;
  /** Made only when the work goes to a worker. */
  readonly source: () => HullSource;
  readonly bytes: number;
}

/** A stored hull: its model, and its upload's text for the notes on how it is written. */
export function storedHullAt(ctx: ServiceContext, meta: HullMeta): HullAt {
  const h = ctx.cache.get(meta);
  return {
    h,
    bytes: 0,
    source: () => {
      const src = ctx.store.source(meta.id);
      return { kind: 'stored', modelText: JSON.stringify(h.hull), form: meta.form, units: meta.units, sourceText: src !== undefined && src.mediaType === 'text/csv' ? src.bytes.toString('utf8') : undefined };
    },
  };
}

/** Offsets in a request's body: the file itself, or the model read from {"offsets": ...}. */
export function postedHullAt(req: FastifyRequest, h: LoadedHull): HullAt {
  const upload = uploadOf(req);
  const source = (): HullSource => (upload.mediaType === 'text/csv' ? { kind: 'csv', text: upload.text } : { kind: 'stored', modelText: JSON.stringify(h.hull), form: 'model', units: 'm' });
  return { h, bytes: upload.bytes.length, source };
}

/** The JSON result of computation `name` with `params` on the hull. */
export async function computedResult(ctx: ServiceContext, req: FastifyRequest, name: string, params: unknown, at: HullAt): Promise<unknown> {
  const c = computationNamed(name);
  const job = (source: HullSource): ComputeJob => ({ kind: 'compute', computation: c.name, source, params, format: 'json', filename: c.name, output: AS_DATA });
  // On this thread the loaded hull is used and the source is never made.
  const here: HullSource = { kind: 'stored', modelText: '', form: 'model', units: 'm' };
  const answer = await answerOf(ctx, req, c, job(here), at.bytes, () => at.h, () => job(at.source()));
  return JSON.parse(answer.body);
}
