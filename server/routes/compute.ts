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
import type { FastifyReply, FastifyRequest } from 'fastify';
import type { z } from 'zod';
import type { UnitSystem } from '../../core/common/units.js';
import { selectColumns } from '../../core/report/answerForm.js';
import { converterFor } from '../../core/report/unitConversion.js';
import { outputKey, outputOf, unitsOfQuery, type AnswerQuery } from '../answerQuery.js';
import type { HullMeta } from '../store/hullStore.js';
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
import { FIELD_CODES } from '../requestFields.js';
import { parseOrFail } from '../validate.js';
import { sendAnswer } from './answer.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

const COMPUTE_PROBLEMS = [400, 406, 413, 415, 422, 503];

/** What every computation's route says of the shared query fields. */
export const ANSWER_NOTE =
  'Shared query fields: units=imperial (feet, long tons, TPI, MTI; drafts typed in feet, decimal or feet-inches-eighths), fields= (the table\'s columns, in order), ' +
  'digits= (significant digits, 3 to 17, default 12), header=plain (CSV with the header first and the caution last), and with an offsets file in the body ' +
  'inputUnits= (the unit of a file that gives none). Every x is measured from the offsets\' origin; the CSV\'s # lines give the AP and amidships in it.';


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
export async function answerOf(
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
  const conv = await converterFor(job.output.units);
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
      const input = readSource(c, job);
      params = input.params;
      model = input.read.hull;
      ready = () => loadHull(input.read);
    } catch (e) {
      if (e instanceof HalfbreadthError && c.invalid !== undefined) return renderResult(c, c.invalid(e), params, job, conv);
      throw e;
    }
  }
  const cost = c.cost(model, params);
  checkAnswerSize(c.name, cost, ctx.limits.maxAnswerCells);
  if (cost.work > ctx.limits.inlineWork) return inWorker(cost.work);
  return computeAnswer(c, ready(), params, job, conv);
}

const CSV_DOC = 'the same table as CSV: the caution and the # lines saying what it is of (the datum of x among them) first, then the header and rows; with header=plain the header first and the caution last';

/** Parse a query with the schema of its unit system: the lengths in it are read as metres, or as feet with units=imperial. */
function parseQuery(schema: (units: UnitSystem) => z.ZodObject, req: FastifyRequest): AnswerQuery & Record<string, unknown> {
  return parseOrFail(schema(unitsOfQuery(req.query)), req.query, FIELD_CODES) as AnswerQuery & Record<string, unknown>;
}

/** Refuse fields the answer does not have, before anything is computed (a 400 naming the columns there are, in the answer's names: tpi with units=imperial). */
async function checkFields(c: AnyComputation, params: unknown, q: AnswerQuery): Promise<void> {
  if (q.fields !== undefined) selectColumns(c.form(params), { fields: q.fields }, await converterFor(q.units ?? 'si'));
}

function postRoute(c: AnyComputation): RouteSpec {
  const s = requestSchemas(c);
  return {
    method: 'POST',
    url: `/v1/${c.name}`,
    operationId: `${c.name}OfOffsets`,
    tag: 'compute',
    summary: `${c.summary} of offsets in the body`,
    description: `${c.description} The body is an offsets file (text/csv, parameters in the query) or a JSON object {"offsets": <hull model>, ...parameters}. ${ANSWER_NOTE}`,
    query: s.csvQuery,
    jsonQuery: s.jsonQuery,
    body: { csv: true, json: s.jsonBodyDocument },
    responses: { 200: { description: c.summary, json: c.result, ...(c.jsonOnly !== true ? { csv: CSV_DOC } : {}) } },
    problems: COMPUTE_PROBLEMS,
    handler: async (req, reply, ctx) => {
      const upload = uploadOf(req);
      let q: AnswerQuery & Record<string, unknown>;
      let params: unknown;
      let source: HullSource;
      if (upload.mediaType === 'text/csv') {
        q = parseQuery((u) => requestSchemas(c, u).csvQuery, req);
        params = q;
        source = { kind: 'csv', text: upload.text };
        await checkFields(c, params, q);
      } else {
        paramsNotInQuery(c, req);
        q = parseOrFail(s.jsonQuery, req.query, FIELD_CODES) as AnswerQuery & Record<string, unknown>;
        source = { kind: 'json', text: upload.text };
        await checkFields(c, {}, q);
      }
      const format = chooseFormat(req, q.format, formatsOf(c));
      const job: ComputeJob = { kind: 'compute', computation: c.name, source, params, format, filename: c.name, output: outputOf(q), inputUnits: q.inputUnits };
      return sendAnswer(reply, await answerOf(ctx, req, c, job, upload.bytes.length));
    },
  };
}

/**
 * The answer of a computation on a stored hull, kept by its ETag: what getRoute and the
 * single-value route share. `etagParts` fix the answer besides the hull.
 */
export async function storedAnswer(ctx: ServiceContext, req: FastifyRequest, reply: FastifyReply, c: AnyComputation, meta: HullMeta, params: unknown, job: Pick<ComputeJob, 'format' | 'output'>, etagParts: readonly string[]): Promise<KeptAnswer | undefined> {
  const etag = etagOf([meta.hash, meta.name, c.name, ...etagParts]);
  if (answerNotModified(req, reply, etag)) return undefined;
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
      params,
      format: job.format,
      output: job.output,
      filename: `${meta.id}-${c.name}`,
    });
    const withModel = (): ComputeJob => stored(ctx.store.modelText(meta.id) ?? '{}');
    answer =
      meta.bytes <= ctx.limits.inlineBytes
        ? await answerOf(ctx, req, c, stored(''), 0, () => ctx.cache.get(meta), withModel)
        : await answerOf(ctx, req, c, withModel(), meta.bytes);
    ctx.answers.set(etag, answer);
  }
  return answer;
}

function getRoute(c: AnyComputation): RouteSpec {
  const s = requestSchemas(c);
  return {
    method: 'GET',
    url: `/v1/hulls/:id/${c.name}`,
    operationId: `${c.name}OfStoredHull`,
    tag: 'compute',
    summary: `${c.summary} of a stored hull`,
    description: `${c.description} ${ANSWER_NOTE} Answers carry an ETag; send it back in If-None-Match to get 304 when nothing has changed.`,
    query: s.query,
    responses: {
      200: { description: c.summary, json: c.result, ...(c.jsonOnly !== true ? { csv: CSV_DOC } : {}), headers: ['ETag'] },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404, 406, 422, 503],
    handler: async (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseQuery((u) => requestSchemas(c, u).query, req);
      await checkFields(c, q, q);
      const format = chooseFormat(req, q.format, formatsOf(c));
      const output = outputOf(q);
      const answer = await storedAnswer(ctx, req, reply, c, meta, q, { format, output }, [c.key(q), format, outputKey(output)]);
      return answer === undefined ? reply : sendAnswer(reply, answer);
    },
  };
}

/** Routes of every computation: stateless first, then on stored hulls. */
export const COMPUTE_ROUTES: readonly RouteSpec[] = [...COMPUTATIONS.map(postRoute), ...COMPUTATIONS.map(getRoute)];
