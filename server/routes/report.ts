/**
 * The printable report (core/document/reportHtml.ts) as one HTML document:
 * `GET /v1/hulls/{id}/report` on a stored hull, `POST /v1/report` on offsets in the
 * body. The input's sha256 is the stored upload's hash, or that of the body.
 */
import { createHash } from 'node:crypto';
import { z } from 'zod';
import { PAPER_SIZES, reportDate, reportHtml } from '../../core/document/reportHtml.js';
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
  })
  .strict();

function render(h: LoadedHull, sha256: string, q: z.output<typeof ReportQuery>): string {
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
    description: 'One self-contained HTML document for print (A4 or US letter): particulars, offsets, lines, hydrostatic table and curves, Bonjean and sectional areas, the sha256 of the body, the date, and the caution on every page.',
    query: ReportQuery,
    body: { csv: true, json: PostedModelDocument },
    responses: ANSWER,
    problems: [400, 413, 415, 422],
    handler: (req, reply) => {
      const q = parseOrFail(ReportQuery, req.query, FIELD_CODES);
      const sha = createHash('sha256').update(uploadOf(req).bytes).digest('hex');
      return reply.type(HTML).header('content-security-policy', REPORT_POLICY).send(render(postedHull(req), sha, q));
    },
  },
  {
    method: 'GET',
    url: '/v1/hulls/:id/report',
    operationId: 'reportOfStoredHull',
    tag: 'compute',
    summary: 'Printable report of a stored hull',
    description: 'One self-contained HTML document for print (A4 or US letter): particulars, offsets, lines, hydrostatic table and curves, Bonjean and sectional areas, the sha256 of the stored upload, the date, and the caution on every page.',
    query: ReportQuery,
    responses: ANSWER,
    problems: [400, 404, 422],
    handler: (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseOrFail(ReportQuery, req.query, FIELD_CODES);
      return reply
        .type(HTML)
        .header('content-security-policy', REPORT_POLICY)
        .header('content-disposition', `inline; filename="${meta.id}-report.html"`)
        .send(render(ctx.cache.get(meta), meta.hash, q));
    },
  },
];
