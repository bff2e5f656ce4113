/**
 * The plots of core/plots/plotCatalogue.ts as SVG: `GET /v1/hulls/{id}/plots/<name>.svg`
 * on a stored hull (with an ETag) and `POST /v1/plots/<name>.svg` on offsets in the
 * body (an offsets file as text/csv, or {"offsets": <hull model>} as JSON), with the
 * query parameters of the matching computation.
 */
import type { FastifyReply, FastifyRequest } from 'fastify';
import { z } from 'zod';
import { SEA_WATER_DENSITY } from '../../core/common/constants.js';
import { deckAssumedAt } from '../../core/offsets/readingWarnings.js';
import { HULL_PLOTS, type HullPlot, type HullPlotParams, type PlotParam } from '../../core/plots/plotCatalogue.js';
import type { DeckEdges } from '../../core/stability/stabilityInput.js';
import type { ServiceContext } from '../context.js';
import { computationNamed } from '../jobs/job.js';
import { computedResult, postedHullAt, storedHullAt, type HullAt } from './computedResult.js';
import { HullModelSchema } from '../../core/hull/hullModel.js';
import { answerNotModified, etagOf } from '../etag.js';
import { hullFromCsv, hullFromJson, loadHull, type LoadedHull } from '../hullInput.js';
import { parseJsonText, uploadOf } from '../plugins/uploadBody.js';
import { DensityQuery, DraftQuery, DraftsQuery, FIELD_CODES } from '../requestFields.js';
import { parseOrFail, requireObject } from '../validate.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

export const SVG_MEDIA_TYPE = 'image/svg+xml; charset=utf-8';
/** An SVG answer runs nothing and loads nothing, even when opened on its own. */
const SVG_POLICY = "default-src 'none'; style-src 'unsafe-inline'";

/** The query field of each parameter a plot takes (core/plots/plotCatalogue.ts); the stability ones are the computations' own. */
function fieldOf(plot: HullPlot, param: PlotParam): z.ZodType {
  switch (param) {
    case 'drafts':
      return DraftsQuery.optional().describe(
        plot.name === 'bonjean'
          ? 'extra heights, m, at which each station\'s area is also drawn: values and ranges from:step:to'
          : 'drafts, m: values and ranges from:step:to (default: about twenty round drafts from the keel to the lowest deck edge)',
      );
    case 'draft':
      return DraftQuery;
    case 'density':
      return DensityQuery;
    default: {
      const c = computationNamed(plot.of!.computation);
      return c.query.shape[param] as z.ZodType;
    }
  }
}

/** The query of a plot: the parameters of the computation it draws. */
function plotQuery(plot: HullPlot): z.ZodObject {
  return z.object(Object.fromEntries(plot.takes.map((t) => [t, fieldOf(plot, t)]))).strict();
}

function paramsOf(q: Record<string, unknown>): HullPlotParams {
  const out: Record<string, unknown> = { density: (q['density'] as number | undefined) ?? SEA_WATER_DENSITY };
  for (const [k, v] of Object.entries(q)) if (v !== undefined && k !== 'density') out[k] = v;
  return out as unknown as HullPlotParams;
}

/** Canonical text of the parameters, for the ETag. */
function keyOf(p: HullPlotParams): string {
  return JSON.stringify(Object.entries(p).sort(([a], [b]) => a.localeCompare(b)));
}

/**
 * The SVG of a plot. A plot of a computation is computed as that computation is (on this
 * thread or in a worker, by its declared cost; computedResult.ts) and drawn here from its
 * JSON; the others are drawn from the hull at once.
 */
async function renderPlot(ctx: ServiceContext, req: FastifyRequest, plot: HullPlot, params: HullPlotParams, at: HullAt): Promise<string> {
  if (plot.of === undefined) return plot.render(at.h.prepared, { ...params, deck: deckOf(at.h) });
  return plot.of.draw(at.h.hull.name, await computedResult(ctx, req, plot.of.computation, params, at));
}

function sendSvg(reply: FastifyReply, svg: string, filename: string): FastifyReply {
  return reply.type(SVG_MEDIA_TYPE).header('content-security-policy', SVG_POLICY).header('content-disposition', `inline; filename="${filename}"`).send(svg);
}

/** The hull in a POST body: an offsets file, or {"offsets": <hull model>}. */
export function postedHull(req: FastifyRequest): LoadedHull {
  const upload = uploadOf(req);
  if (upload.mediaType === 'text/csv') return loadHull(hullFromCsv(upload.text));
  const body = parseOrFail(PostedModel, requireObject(parseJsonText(upload.text), '{"offsets": <hull model>}'), FIELD_CODES);
  return loadHull(hullFromJson(body.offsets));
}

/** The deck edges the offsets leave unsaid (heeled plots refuse them). */
const deckOf = (h: LoadedHull): DeckEdges => ({ assumedAt: deckAssumedAt(h.notes()) });

const PostedModel = z.object({ offsets: z.custom<unknown>((v) => v !== undefined, { error: 'offsets is required: the hull model, lengths in m' }) }).strict();
export const PostedModelDocument = z.object({ offsets: HullModelSchema }).strict();

function getRoute(plot: HullPlot): RouteSpec {
  const query = plotQuery(plot);
  return {
    method: 'GET',
    url: `/v1/hulls/:id/plots/${plot.name}.svg`,
    operationId: `plot${plot.name.replace(/(^|-)(\w)/g, (_m, _d, c: string) => c.toUpperCase())}OfStoredHull`,
    tag: 'compute',
    summary: `Plot of a stored hull: ${plot.name}`,
    description: `SVG of ${plot.summary}, with axis titles and units, a title and description for screen readers and the caution.`,
    query,
    responses: {
      200: { description: 'the plot', other: { mediaType: 'image/svg+xml', description: 'an SVG document' }, headers: ['ETag'] },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404, 422],
    handler: async (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const params = paramsOf(parseOrFail(query, req.query, FIELD_CODES));
      const etag = etagOf([meta.hash, meta.name, 'plot', plot.name, keyOf(params)]);
      if (answerNotModified(req, reply, etag)) return reply;
      let answer = ctx.answers.get(etag);
      if (answer === undefined) {
        answer = { mediaType: SVG_MEDIA_TYPE, body: await renderPlot(ctx, req, plot, params, storedHullAt(ctx, meta)), filename: `${meta.id}-${plot.name}.svg` };
        ctx.answers.set(etag, answer);
      }
      return sendSvg(reply, answer.body, answer.filename ?? `${plot.name}.svg`);
    },
  };
}

function postRoute(plot: HullPlot): RouteSpec {
  const query = plotQuery(plot);
  return {
    method: 'POST',
    url: `/v1/plots/${plot.name}.svg`,
    operationId: `plot${plot.name.replace(/(^|-)(\w)/g, (_m, _d, c: string) => c.toUpperCase())}OfOffsets`,
    tag: 'compute',
    summary: `Plot of offsets in the body: ${plot.name}`,
    description: `SVG of ${plot.summary}. The body is an offsets file (text/csv) or {"offsets": <hull model>}; the parameters go in the query.`,
    query,
    body: { csv: true, json: PostedModelDocument },
    responses: { 200: { description: 'the plot', other: { mediaType: 'image/svg+xml', description: 'an SVG document' } } },
    problems: [400, 413, 415, 422],
    handler: async (req, reply, ctx) => {
      const params = paramsOf(parseOrFail(query, req.query, FIELD_CODES));
      return sendSvg(reply, await renderPlot(ctx, req, plot, params, postedHullAt(req, postedHull(req))), `${plot.name}.svg`);
    },
  };
}

export const PLOT_ROUTES: readonly RouteSpec[] = [...HULL_PLOTS.map(postRoute), ...HULL_PLOTS.map(getRoute)];
