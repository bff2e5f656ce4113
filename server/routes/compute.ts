/**
 * The computation routes, two per computation of computations/index.ts:
 * `POST /v1/<name>` on offsets in the body (stateless) and `GET /v1/hulls/{id}/<name>`
 * on a stored hull (with an ETag, answered 304 when the client's copy is current).
 */
import type { FastifyRequest } from 'fastify';
import { HalfbreadthError, fail } from '../../core/common/errors.js';
import { COMPUTATIONS } from '../computations/index.js';
import { formatsOf, requestSchemas, type AnyComputation } from '../computations/computation.js';
import { answerNotModified, etagOf } from '../etag.js';
import { hullFromCsv, hullFromJson, loadHull, type LoadedHull } from '../hullInput.js';
import { chooseFormat } from '../negotiate.js';
import { uploadOf } from '../plugins/uploadBody.js';
import { FIELD_CODES, type Format } from '../requestFields.js';
import { parseOrFail, requireObject } from '../validate.js';
import { renderResult, sendAnswer, sendResult } from './answer.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

const COMPUTE_PROBLEMS = [400, 406, 413, 415, 422];

/** With a JSON body the parameters go in the body: say so when they are in the query. */
function paramsNotInQuery(c: AnyComputation, req: FastifyRequest): void {
  const query = req.query as Record<string, unknown>;
  for (const key of Object.keys(c.query.shape)) {
    if (Object.hasOwn(query, key)) fail('HYD_BAD_ARGUMENT', [key], `${key}: with a JSON body, give ${key} in the body beside offsets, not in the query`);
  }
}

/** Read the body's hull; offsets that break a rule are the answer for a computation that says so (the check). */
function readBodyHull(c: AnyComputation, read: () => LoadedHull): { hull: LoadedHull } | { invalid: unknown } {
  try {
    return { hull: read() };
  } catch (e) {
    if (e instanceof HalfbreadthError && c.invalid !== undefined) return { invalid: c.invalid(e) };
    throw e;
  }
}

function postRoute(c: AnyComputation): RouteSpec {
  const s = requestSchemas(c);
  return {
    method: 'POST',
    url: `/v1/${c.name}`,
    operationId: `${c.name}OfOffsets`,
    tag: 'compute',
    summary: `${c.summary} of offsets in the body`,
    description: `${c.description} The body is an offsets file (text/csv, parameters in the query) or a JSON object {"offsets": <hull model>, ...parameters}.`,
    query: s.query,
    jsonQuery: s.jsonQuery,
    body: { csv: true, json: s.jsonBodyDocument },
    responses: { 200: { description: c.summary, json: c.result, ...(c.csv ? { csv: 'the same table as CSV, the caution on its first line' } : {}) } },
    problems: COMPUTE_PROBLEMS,
    handler: (req, reply) => {
      const upload = uploadOf(req);
      let format: Format;
      let params: unknown;
      let read: () => LoadedHull;
      if (upload.mediaType === 'text/csv') {
        const q = parseOrFail(s.query, req.query, FIELD_CODES);
        format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
        params = q;
        read = () => loadHull(hullFromCsv(upload.text));
      } else {
        paramsNotInQuery(c, req);
        const q = parseOrFail(s.jsonQuery, req.query, FIELD_CODES);
        format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
        const body = parseOrFail(s.jsonBody, requireObject(upload.json, `{"offsets": <hull model>${Object.keys(c.body.shape).map((k) => `, "${k}"`).join('')}}`), FIELD_CODES);
        params = body;
        read = () => loadHull(hullFromJson(body.offsets));
      }
      const got = readBodyHull(c, read);
      const result = 'hull' in got ? c.run(got.hull, params) : got.invalid;
      return sendResult(reply, c, result, format, c.name);
    },
  };
}

function getRoute(c: AnyComputation): RouteSpec {
  const s = requestSchemas(c);
  return {
    method: 'GET',
    url: `/v1/hulls/:id/${c.name}`,
    operationId: `${c.name}OfStoredHull`,
    tag: 'compute',
    summary: `${c.summary} of a stored hull`,
    description: `${c.description} Answers carry an ETag; send it back in If-None-Match to get 304 when nothing has changed.`,
    query: s.query,
    responses: {
      200: { description: c.summary, json: c.result, ...(c.csv ? { csv: 'the same table as CSV, the caution on its first line' } : {}), headers: ['ETag'] },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404, 406, 422],
    handler: (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseOrFail(s.query, req.query, FIELD_CODES);
      const format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
      const etag = etagOf([meta.hash, meta.name, c.name, c.key(q), format]);
      if (answerNotModified(req, reply, etag)) return reply;
      let answer = ctx.answers.get(etag);
      if (answer === undefined) {
        answer = renderResult(c, c.run(ctx.cache.get(meta), q), format, `${meta.id}-${c.name}`);
        ctx.answers.set(etag, answer);
      }
      return sendAnswer(reply, answer);
    },
  };
}

/** Routes of every computation: stateless first, then on stored hulls. */
export const COMPUTE_ROUTES: readonly RouteSpec[] = [...COMPUTATIONS.map(postRoute), ...COMPUTATIONS.map(getRoute)];
