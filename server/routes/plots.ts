/**
 * The plots of core/plots/plotCatalogue.ts as SVG: `GET /v1/hulls/{id}/plots/<name>.svg`
 * on a stored hull (with an ETag) and `POST /v1/plots/<name>.svg` on offsets in the
 * body (an offsets file as text/csv, or {"offsets": <hull model>} as JSON), with the
 * query parameters of the matching computation.
 */
import type { FastifyReply, FastifyRequest } from 'fastify';
import { z } from 'zod';
import { SEA_WATER_DENSITY } from '../../core/common/constants.js';
import { HULL_PLOTS, type HullPlot, type HullPlotParams } from '../../core/plots/plotCatalogue.js';
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

/** The query of a plot: the parameters of the computation it draws. */
function plotQuery(plot: HullPlot): z.ZodObject {
  const shape: Record<string, z.ZodType> = {};
  if (plot.takes.includes('drafts')) {
    shape['drafts'] = DraftsQuery.optional().describe(
      plot.name === 'bonjean'
        ? 'extra heights, m, at which each station\'s area is also drawn: values and ranges from:step:to'
        : 'drafts, m: values and ranges from:step:to (default: about twenty round drafts from the keel to the lowest deck edge)',
    );
  }
  if (plot.takes.includes('draft')) shape['draft'] = DraftQuery;
  if (plot.takes.includes('density')) shape['density'] = DensityQuery;
  return z.object(shape).strict();
}

function paramsOf(q: Record<string, unknown>): HullPlotParams {
  return {
    ...(q['drafts'] === undefined ? {} : { drafts: q['drafts'] as number[] }),
    ...(q['draft'] === undefined ? {} : { draft: q['draft'] as number }),
    density: (q['density'] as number | undefined) ?? SEA_WATER_DENSITY,
  };
}

/** Canonical text of the parameters, for the ETag. */
function keyOf(p: HullPlotParams): string {
  return `drafts=${p.drafts?.join(',') ?? ''}&draft=${p.draft ?? ''}&density=${p.density}`;
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
    handler: (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const params = paramsOf(parseOrFail(query, req.query, FIELD_CODES));
      const etag = etagOf([meta.hash, meta.name, 'plot', plot.name, keyOf(params)]);
      if (answerNotModified(req, reply, etag)) return reply;
      let answer = ctx.answers.get(etag);
      if (answer === undefined) {
        answer = { mediaType: SVG_MEDIA_TYPE, body: plot.render(ctx.cache.get(meta).prepared, params), filename: `${meta.id}-${plot.name}.svg` };
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
    handler: (req, reply) => {
      const params = paramsOf(parseOrFail(query, req.query, FIELD_CODES));
      return sendSvg(reply, plot.render(postedHull(req).prepared, params), `${plot.name}.svg`);
    },
  };
}

export const PLOT_ROUTES: readonly RouteSpec[] = [...HULL_PLOTS.map(postRoute), ...HULL_PLOTS.map(getRoute)];
