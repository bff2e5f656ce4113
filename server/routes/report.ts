/**
 * The printable report (core/document/reportHtml.ts) as one HTML document:
 * `GET /v1/hulls/{id}/report` on a stored hull, `POST /v1/report` on offsets in the
 * body. The input's sha256 is the stored upload's hash, or that of the body.
 */
import { createHash } from 'node:crypto';
import { z } from 'zod';
import type { FastifyRequest } from 'fastify';
import { fail } from '../../core/common/errors.js';
import { PAPER_SIZES, reportDate, reportHtml, type ReportStability } from '../../core/document/reportHtml.js';
import type { CrossCurveRow } from '../../core/stability/crossCurves.js';
import type { GzResult } from '../../core/stability/rightingLevers.js';
import type { ServiceContext } from '../context.js';
import { CriteriaQuery, DisplacementQuery, DisplacementsQuery, FsmQuery, heelsQuery, LENGTH_FIELDS, OpeningsQuery } from '../stabilityFields.js';
import { computedResult, postedHullAt, storedHullAt, type HullAt } from './computedResult.js';
import type { LoadedHull } from '../hullInput.js';
import { uploadOf } from '../plugins/uploadBody.js';
import { DensityQuery, DraftQuery, DraftsQuery, FIELD_CODES } from '../requestFields.js';
import { parseOrFail } from '../validate.js';
import { postedHull, PostedModelDocument } from './plots.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

const HTML = 'text/html; charset=utf-8';
/** The report is self-contained: it loads nothing and runs no script. */
const REPORT_POLICY = "default-src 'none'; style-src 'unsafe-inline'";

const ReportQuery = z
  .object({
    paper: z.enum(PAPER_SIZES).default('a4').describe('page size for print: a4 or letter'),
    drafts: DraftsQuery.optional().describe('drafts of the hydrostatic table, m: values and ranges from:step:to (default: about twenty round drafts from the keel to the lowest deck edge)'),
    draft: DraftQuery.optional().describe('draft of the sectional-area curve, m (default: the middle draft of the table)'),
    density: DensityQuery,
    displacements: DisplacementsQuery.optional().describe('displacements of the cross curves of stability, t, printed when given: values and ranges from:step:to'),
    heels: heelsQuery('0:10:90'),
    displacement: DisplacementQuery.optional().describe('displacement of the loading whose righting levers and criteria are printed, t (with kg)'),
    kg: LENGTH_FIELDS.kg.optionalQuery,
    fsm: FsmQuery,
    openings: OpeningsQuery,
    criteria: CriteriaQuery,
  })
  .strict();

type ReportParams = z.output<typeof ReportQuery>;

/**
 * The stability the report prints, when asked for: the cross curves at level trim, and the
 * righting levers of a loading free to trim, each computed as its own route computes it.
 */
async function stabilityOf(ctx: ServiceContext, req: FastifyRequest, q: ReportParams, at: HullAt): Promise<ReportStability> {
  if ((q.displacement === undefined) !== (q.kg === undefined)) {
    fail('HYD_BAD_ARGUMENT', [q.kg === undefined ? 'kg' : 'displacement'], 'the righting levers need a loading: give displacement and kg together');
  }
  const cross =
    q.displacements === undefined
      ? undefined
      : ((await computedResult(ctx, req, 'cross-curves', { displacements: q.displacements, heels: q.heels, trim: 'level', density: q.density }, at)) as { rows: CrossCurveRow[] });
  const gz =
    q.displacement === undefined || q.kg === undefined
      ? undefined
      : ((await computedResult(ctx, req, 'gz', { displacement: q.displacement, kg: q.kg, fsm: q.fsm, openings: q.openings, criteria: q.criteria, trim: 'free', density: q.density }, at)) as GzResult);
  return { ...(cross === undefined ? {} : { crossCurves: { rows: cross.rows, trim: 'level' } }), ...(gz === undefined ? {} : { gz: { result: gz } }) };
}

function render(h: LoadedHull, sha256: string, q: ReportParams, stability: ReportStability): string {
  return reportHtml({
    prepared: h.prepared,
    form: h.form,
    units: h.units,
    sha256,
    date: reportDate(new Date()),
    paper: q.paper,
    density: q.density,
    ...(q.drafts === undefined ? {} : { drafts: q.drafts }),
    ...(q.draft === undefined ? {} : { areasDraft: q.draft }),
    stability,
  });
}

const ANSWER = { 200: { description: 'the report', other: { mediaType: 'text/html', description: 'one self-contained HTML document for print' } } };

export const REPORT_ROUTES: readonly RouteSpec[] = [
  {
    method: 'POST',
    url: '/v1/report',
    operationId: 'reportOfOffsets',
    tag: 'compute',
    summary: 'Printable report of offsets in the body',
    description: 'One self-contained HTML document for print (A4 or US letter): particulars, offsets, lines, hydrostatic table and curves, Bonjean and sectional areas, the cross curves and the righting levers with the criteria when asked for, the sha256 of the body, the date, and the caution on every page.',
    query: ReportQuery,
    body: { csv: true, json: PostedModelDocument },
    responses: ANSWER,
    problems: [400, 413, 415, 422],
    handler: async (req, reply, ctx) => {
      const q = parseOrFail(ReportQuery, req.query, FIELD_CODES);
      const sha = createHash('sha256').update(uploadOf(req).bytes).digest('hex');
      const h = postedHull(req);
      const stability = await stabilityOf(ctx, req, q, postedHullAt(req, h));
      return reply.type(HTML).header('content-security-policy', REPORT_POLICY).send(render(h, sha, q, stability));
    },
  },
  {
    method: 'GET',
    url: '/v1/hulls/:id/report',
    operationId: 'reportOfStoredHull',
    tag: 'compute',
    summary: 'Printable report of a stored hull',
    description: 'One self-contained HTML document for print (A4 or US letter): particulars, offsets, lines, hydrostatic table and curves, Bonjean and sectional areas, the cross curves and the righting levers with the criteria when asked for, the sha256 of the stored upload, the date, and the caution on every page.',
    query: ReportQuery,
    responses: ANSWER,
    problems: [400, 404, 422],
    handler: async (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseOrFail(ReportQuery, req.query, FIELD_CODES);
      const at = storedHullAt(ctx, meta);
      const stability = await stabilityOf(ctx, req, q, at);
      return reply
        .type(HTML)
        .header('content-security-policy', REPORT_POLICY)
        .header('content-disposition', `inline; filename="${meta.id}-report.html"`)
        .send(render(at.h, meta.hash, q, stability));
    },
  },
];
