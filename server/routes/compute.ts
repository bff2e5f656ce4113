/**
 * The computation routes, two per computation of computations/index.ts:
 * `POST /v1/<name>` on offsets in the body (stateless) and `GET /v1/hulls/{id}/<name>`
 * on a stored hull (with an ETag, answered 304 when the client's copy is current).
 *
 * Where the work runs: a small body (or stored upload) is read on the request thread
 * and the computation's declared cost decides; work up to SERVICE_LIMITS.inlineWork (a
 * table of a few dozen drafts) is done here, where handing it to a thread would cost
 * more than it saves, and anything heavier, or any large body, goes to the worker
 * threads (server/jobs/), so the request thread stays free.
 */
import type { FastifyRequest } from 'fastify';
import { HalfbreadthError, fail } from '../../core/common/errors.js';
import { COMPUTATIONS } from '../computations/index.js';
import { formatsOf, requestSchemas, type AnyComputation } from '../computations/computation.js';
import { checkAnswerSize } from '../computations/cost.js';
import type { ServiceContext } from '../context.js';
import { answerNotModified, etagOf } from '../etag.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { loadHull, type LoadedHull } from '../hullInput.js';
import { computeAnswer, readSource, renderResult, type ComputeJob, type HullSource } from '../jobs/job.js';
import type { KeptAnswer } from '../answerCache.js';
import { chooseFormat } from '../negotiate.js';
import { uploadOf } from '../plugins/uploadBody.js';
import { FIELD_CODES, type Format } from '../requestFields.js';
import { parseOrFail } from '../validate.js';
import { sendAnswer } from './answer.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

const COMPUTE_PROBLEMS = [400, 406, 413, 415, 422, 503];

/** With a JSON body the parameters go in the body: say so when they are in the query. */
function paramsNotInQuery(c: AnyComputation, req: FastifyRequest): void {
  const query = req.query as Record<string, unknown>;
  for (const key of Object.keys(c.query.shape)) {
    if (Object.hasOwn(query, key)) fail('HYD_BAD_ARGUMENT', [key], `${key}: with a JSON body, give ${key} in the body beside offsets, not in the query`);
  }
}

/**
 * Run a job in a worker thread, stopped if the client closes its connection before the
 * answer is ready (nobody would read it).
 */
async function inWorkerFor(ctx: ServiceContext, req: FastifyRequest, job: ComputeJob): Promise<KeptAnswer> {
  const ac = new AbortController();
  const gone = (): void => ac.abort();
  const socket = req.socket;
  socket?.once('close', gone);
  try {
    return (await ctx.pool.run(job, ac.signal)) as KeptAnswer;
  } finally {
    socket?.off('close', gone);
  }
}

/**
 * The answer of a job: on this thread when it is small, else in a worker. `loaded` gives
 * the hull when it is at hand already (a stored hull from the cache), else it is read
 * here from a small source; `forWorker` is the job as a worker takes it (a stored
 * hull's model text is fetched only when it goes there).
 */
async function answerOf(
  ctx: ServiceContext,
  req: FastifyRequest,
  c: AnyComputation,
  job: ComputeJob,
  bytes: number,
  loaded?: () => LoadedHull,
  forWorker: () => ComputeJob = () => job,
): Promise<KeptAnswer> {
  const inWorker = async (work?: number): Promise<KeptAnswer> => {
    req.log.info({ computation: c.name, bytes, work }, 'computation sent to a worker thread');
    return inWorkerFor(ctx, req, forWorker());
  };
  if (bytes > ctx.limits.inlineBytes) return inWorker();
  // The cost is judged on the hull as read, before it is prepared (fitting its sections is work too).
  let model: HullModel;
  let ready: () => LoadedHull;
  let params = job.params;
  if (loaded !== undefined) {
    const h = loaded();
    model = h.hull;
    ready = () => h;
  } else {
    try {
      const input = readSource(c, job.source, job.params);
      params = input.params;
      model = input.read.hull;
      ready = () => loadHull(input.read);
    } catch (e) {
      if (e instanceof HalfbreadthError && c.invalid !== undefined) return renderResult(c, c.invalid(e), job.format, job.filename);
      throw e;
    }
  }
  const cost = c.cost(model, params);
  checkAnswerSize(c.name, cost, ctx.limits.maxAnswerCells);
  if (cost.work > ctx.limits.inlineWork) return inWorker(cost.work);
  return computeAnswer(c, ready(), params, job.format, job.filename);
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
    handler: async (req, reply, ctx) => {
      const upload = uploadOf(req);
      let format: Format;
      let params: unknown;
      let source: HullSource;
      if (upload.mediaType === 'text/csv') {
        const q = parseOrFail(s.query, req.query, FIELD_CODES);
        format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
        params = q;
        source = { kind: 'csv', text: upload.text };
      } else {
        paramsNotInQuery(c, req);
        const q = parseOrFail(s.jsonQuery, req.query, FIELD_CODES);
        format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
        source = { kind: 'json', text: upload.text };
      }
      const job: ComputeJob = { kind: 'compute', computation: c.name, source, params, format, filename: c.name };
      return sendAnswer(reply, await answerOf(ctx, req, c, job, upload.bytes.length));
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
    problems: [400, 404, 406, 422, 503],
    handler: async (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseOrFail(s.query, req.query, FIELD_CODES);
      const format = chooseFormat(req, q.format as Format | undefined, formatsOf(c));
      const etag = etagOf([meta.hash, meta.name, c.name, c.key(q), format]);
      if (answerNotModified(req, reply, etag)) return reply;
      let answer = ctx.answers.get(etag);
      if (answer === undefined) {
        // A large stored hull is not read on this thread at all: its model's text goes to a worker.
        const sourceText = (): string | undefined => {
          if (c.usesNotes !== true) return undefined;
          const src = ctx.store.source(meta.id);
          return src !== undefined && src.mediaType === 'text/csv' ? src.bytes.toString('utf8') : undefined;
        };
        const stored = (modelText: string): ComputeJob => ({
          kind: 'compute',
          computation: c.name,
          source: { kind: 'stored', modelText, form: meta.form, units: meta.units, sourceText: modelText === '' ? undefined : sourceText() },
          params: q,
          format,
          filename: `${meta.id}-${c.name}`,
        });
        const withModel = (): ComputeJob => stored(ctx.store.modelText(meta.id) ?? '{}');
        answer =
          meta.bytes <= ctx.limits.inlineBytes
            ? await answerOf(ctx, req, c, stored(''), 0, () => ctx.cache.get(meta), withModel)
            : await answerOf(ctx, req, c, withModel(), meta.bytes);
        ctx.answers.set(etag, answer);
      }
      return sendAnswer(reply, answer);
    },
  };
}

/** Routes of every computation: stateless first, then on stored hulls. */
export const COMPUTE_ROUTES: readonly RouteSpec[] = [...COMPUTATIONS.map(postRoute), ...COMPUTATIONS.map(getRoute)];
