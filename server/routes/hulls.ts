/**
 * The hull store over HTTP: create (POST, 201 with Location), list, read (JSON with the
 * model, or the offsets as CSV), the upload byte for byte, replace (PUT) and delete.
 */
import type { FastifyReply, FastifyRequest } from 'fastify';
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import { hullSummary, type HullSummary } from '../../core/report/formatHydrostatics.js';
import { jsonText } from '../jsonText.js';
import { LENGTH_UNITS, LengthUnitSchema } from '../../core/common/units.js';
import { writeOffsetsCsv } from '../../core/offsets/writeOffsets.js';
import type { ServiceContext } from '../context.js';
import { answerNotModified, hullTag, ifMatchHolds } from '../etag.js';
import { readUpload, UploadJsonBody, type ReadOutcome } from '../jobs/job.js';
import { chooseFormat, CSV_MEDIA_TYPE, JSON_MEDIA_TYPE } from '../negotiate.js';
import { uploadOf } from '../plugins/uploadBody.js';
import { FIELD_CODES, FormatQuery, NameField } from '../requestFields.js';
import { FieldsQuery, HeaderQuery, InputUnitsQuery, outputOf } from '../answerQuery.js';
import { answerCsv, answerJson, shapeAnswer, type AnswerForm } from '../../core/report/answerForm.js';
import { SI_CONVERTER } from '../../core/report/unitConversion.js';
import { fail } from '../../core/common/errors.js';
import { SERVICE_LIMITS } from '../serviceLimits.js';
import { HullListSchema, HullRecordSchema, HullWithOffsetsSchema } from '../responseSchemas.js';
import { HullModelSchema, type HullModel } from '../../core/hull/hullModel.js';
import { serviceFail } from '../serviceErrors.js';
import type { HullForm, HullMeta, NewHull } from '../store/hullStore.js';
import { parseOrFail } from '../validate.js';
import type { RouteSpec } from './routeSpec.js';
import { hullIdOf, requireHullMeta } from './storedHull.js';

const UploadQuery = z.object({ name: NameField, inputUnits: InputUnitsQuery }).strict();

/**
 * The form of an id a user chooses for a new hull (PUT /v1/hulls/{id}): a slug of 1 to 64
 * lowercase letters, digits and hyphens, beginning and ending with a letter or digit
 * (`my-launch`, `hull-2`). Ids the service makes itself (POST) are 16 URL-safe characters.
 */
export const SLUG = new RegExp(`^[a-z0-9](?:[a-z0-9-]{0,${SERVICE_LIMITS.maxIdLength - 2}}[a-z0-9])?$`);
export const SLUG_TEXT = `1 to ${SERVICE_LIMITS.maxIdLength} lowercase letters, digits and hyphens, beginning and ending with a letter or digit (e.g. my-launch-2)`;

/** The stored hulls as a table (answerForm.ts): `GET /v1/hulls`, in JSON or CSV, with fields and a plain header. */
const LIST_FORM: AnswerForm<{ hulls: readonly Record<string, unknown>[]; caution: string }> = {
  units: {},
  columns: [
    { key: 'id', unit: '', label: 'id' },
    { key: 'name', unit: '', label: 'name' },
    { key: 'created', unit: '', label: 'created' },
    { key: 'updated', unit: '', label: 'updated' },
    { key: 'stations', unit: '-', label: 'stations' },
    { key: 'hash', unit: '', label: 'sha256' },
  ],
  rowsKey: 'hulls',
  lines: () => ['the stored hulls oldest first'],
};

const ListQuery = z.object({ format: FormatQuery, fields: FieldsQuery, header: HeaderQuery }).strict();
const UploadJsonBodyDocument = UploadJsonBody.extend({ offsets: HullModelSchema });

const ReadQuery = z
  .object({
    format: FormatQuery,
    units: LengthUnitSchema.optional().describe('length unit of the offsets when they are written as CSV (default m)'),
  })
  .strict();
const EmptyQuery = z.object({}).strict();

/** An upload read for the store, and the summary its record gives. */
interface Upload {
  readonly hull: NewHull;
  readonly summary: HullSummary;
}

/**
 * The hull in a request body, with the name given beside it if any. A small body is read
 * on this thread; a large one in a worker thread, which gives back the model's JSON text.
 */
async function uploadedHull(req: FastifyRequest, ctx: ServiceContext): Promise<Upload> {
  const upload = uploadOf(req);
  const q = parseOrFail(UploadQuery, req.query, FIELD_CODES);
  const source = upload.mediaType === 'text/csv' ? ({ kind: 'csv', text: upload.text } as const) : ({ kind: 'json', text: upload.text } as const);
  const kept = { mediaType: upload.mediaType, source: upload.bytes };
  if (upload.bytes.length <= ctx.limits.inlineBytes) {
    const r = readUpload(source, q.name, q.inputUnits);
    return { hull: { model: r.hull, form: r.form, units: r.units, ...kept }, summary: hullSummary(r.hull) };
  }
  const r = (await ctx.pool.run({ kind: 'read', source, name: q.name, inputUnits: q.inputUnits })) as ReadOutcome;
  return {
    hull: { model: { text: r.modelText, name: r.summary.name, stationCount: r.summary.stations }, form: r.form as HullForm, units: r.units, ...kept },
    summary: r.summary,
  };
}

/** The tags a GET of the hull gives now: the record in every unit and form, and the upload's. */
function currentTags(meta: HullMeta): string[] {
  const tags = [`"${meta.hash}"`];
  for (const units of LENGTH_UNITS) for (const format of ['json', 'csv']) tags.push(hullTag(meta, units, format));
  return tags;
}

/** 412 when If-Match names another version of the hull than the stored one. */
function requireIfMatch(req: FastifyRequest, meta: HullMeta): void {
  if (!ifMatchHolds(req, currentTags(meta))) {
    serviceFail(
      'HYD_PRECONDITION_FAILED',
      ['headers', 'if-match'],
      `hull "${meta.id}" has changed since the version If-Match names (it was last written ${meta.updated}); GET it again, and send its new ETag`,
    );
  }
}

function record(meta: HullMeta, s: HullSummary): z.infer<typeof HullRecordSchema> {
  const self = `/v1/hulls/${meta.id}`;
  return {
    id: meta.id,
    name: meta.name,
    created: meta.created,
    updated: meta.updated,
    hash: meta.hash,
    stations: meta.stations,
    waterlines: s.waterlines,
    ap: s.ap,
    fp: s.fp,
    lbp: s.lbp,
    form: meta.form,
    units: meta.units as z.infer<typeof HullRecordSchema>['units'],
    mediaType: meta.mediaType,
    bytes: meta.bytes,
    links: {
      self,
      source: `${self}/source`,
      hydrostatics: `${self}/hydrostatics?drafts=`,
      value: `${self}/hydrostatics/{field}?draft=`,
      sheet: `${self}/sheet?draft=`,
      bonjean: `${self}/bonjean`,
      areas: `${self}/areas?draft=`,
      check: `${self}/check`,
    },
    caution: CAUTION,
  };
}

const sendJson = (reply: FastifyReply, value: unknown): FastifyReply => reply.type(JSON_MEDIA_TYPE).send(jsonText(value));

async function create(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): Promise<FastifyReply> {
  const h = await uploadedHull(req, ctx);
  const meta = ctx.store.create(h.hull);
  return sendJson(reply.code(201).header('location', `/v1/hulls/${meta.id}`).header('etag', hullTag(meta, 'm', 'json')), record(meta, h.summary));
}

/** `If-None-Match: *` on a PUT: write only if no hull is stored under the id (RFC 9110, 13.1.2). */
const createOnly = (req: FastifyRequest): boolean => req.headers['if-none-match']?.trim() === '*';

/**
 * PUT: new offsets under an id. A hull stored there is replaced (its id and creation time
 * stay; If-Match guards against lost updates); where none is, one is created under the id
 * (201), which must then be a slug (SLUG). If-Match with no hull there, or If-None-Match: *
 * with one, is 412.
 */
async function put(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): Promise<FastifyReply> {
  const id = hullIdOf(req);
  const before = ctx.store.meta(id);
  if (before === undefined) {
    if (!SLUG.test(id)) fail('HYD_BAD_ARGUMENT', ['id'], `no hull is stored under id "${id}", and a new hull's id must be a slug: ${SLUG_TEXT}`);
    if (req.headers['if-match'] !== undefined) {
      serviceFail('HYD_PRECONDITION_FAILED', ['headers', 'if-match'], `no hull is stored under id "${id}", so If-Match cannot hold; leave it out to create the hull`);
    }
  } else {
    if (createOnly(req)) serviceFail('HYD_PRECONDITION_FAILED', ['headers', 'if-none-match'], `a hull is stored under id "${id}" already, and If-None-Match: * asks to create one only where none is`);
    requireIfMatch(req, before);
  }
  const h = await uploadedHull(req, ctx);
  // Read again after the upload was read (perhaps in a worker): another write may have come between.
  const now = ctx.store.meta(id);
  if (now === undefined) {
    if (before !== undefined) serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id "${id}": it was deleted while this request was read`);
    const meta = ctx.store.create(h.hull, id);
    return sendJson(reply.code(201).header('location', `/v1/hulls/${meta.id}`).header('etag', hullTag(meta, 'm', 'json')), record(meta, h.summary));
  }
  if (before === undefined && createOnly(req)) serviceFail('HYD_PRECONDITION_FAILED', ['headers', 'if-none-match'], `a hull was stored under id "${id}" while this request was read`);
  requireIfMatch(req, now);
  const meta = ctx.store.replace(now.id, h.hull);
  if (meta === undefined) serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id "${now.id}"`);
  ctx.cache.forget(now.id);
  return sendJson(reply.header('etag', hullTag(meta, 'm', 'json')), record(meta, h.summary));
}

function remove(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  parseOrFail(EmptyQuery, req.query);
  const meta = requireHullMeta(ctx.store, req);
  requireIfMatch(req, meta);
  ctx.store.delete(meta.id);
  ctx.cache.forget(meta.id);
  return reply.code(204).send();
}

async function list(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): Promise<FastifyReply> {
  const q = parseOrFail(ListQuery, req.query, FIELD_CODES);
  const format = chooseFormat(req, q.format);
  const hulls = ctx.store.list().map((m) => ({ id: m.id, name: m.name, created: m.created, updated: m.updated, hash: m.hash, stations: m.stations }));
  const output = outputOf({ fields: q.fields, header: q.header });
  const a = shapeAnswer(LIST_FORM, { hulls, caution: CAUTION }, output, SI_CONVERTER);
  if (format === 'csv') return reply.type(CSV_MEDIA_TYPE).header('content-disposition', 'inline; filename="hulls.csv"').send(answerCsv(a));
  return sendJson(reply, answerJson(a));
}

async function read(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): Promise<FastifyReply> {
  const meta = requireHullMeta(ctx.store, req);
  const q = parseOrFail(ReadQuery, req.query, FIELD_CODES);
  const format = chooseFormat(req, q.format);
  const units = q.units ?? 'm';
  if (answerNotModified(req, reply, hullTag(meta, units, format))) return reply;
  const small = meta.bytes <= ctx.limits.inlineBytes;
  if (format === 'csv') {
    const csv = small
      ? writeOffsetsCsv(ctx.store.get(meta.id)!.model, { units })
      : ((await ctx.pool.run({ kind: 'export', modelText: ctx.store.modelText(meta.id) ?? '{}', units })) as string);
    return reply.type(CSV_MEDIA_TYPE).header('content-disposition', `inline; filename="${meta.id}.csv"`).send(csv);
  }
  if (small) {
    const hull = ctx.store.get(meta.id)!.model;
    return sendJson(reply, { ...record(meta, hullSummary(hull)), offsets: hull });
  }
  // A large model is not parsed here: its stored JSON text goes into the answer as it is.
  const text = ctx.store.modelText(meta.id) ?? '{}';
  const summary = JSON.parse(text, (k, v: unknown) => (k === 'points' ? [] : v)) as HullModel;
  const head = jsonText(record(meta, hullSummary(summary)));
  return reply.type(JSON_MEDIA_TYPE).send(`${head.slice(0, -1)},"offsets":${text}}`);
}

function source(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  const meta = requireHullMeta(ctx.store, req);
  parseOrFail(EmptyQuery, req.query);
  if (answerNotModified(req, reply, `"${meta.hash}"`)) return reply;
  const src = ctx.store.source(meta.id);
  if (src === undefined) serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id "${meta.id}"`);
  const ext = src.mediaType === 'text/csv' ? 'csv' : 'json';
  return reply
    .type(src.mediaType === 'text/csv' ? 'text/csv; charset=utf-8' : JSON_MEDIA_TYPE)
    .header('content-disposition', `attachment; filename="${meta.id}.${ext}"`)
    .send(src.bytes);
}

const UPLOAD_BODY = { csv: true, json: UploadJsonBodyDocument } as const;

export const HULL_ROUTES: readonly RouteSpec[] = [
  {
    method: 'POST',
    url: '/v1/hulls',
    operationId: 'storeHull',
    tag: 'hulls',
    summary: 'Store a hull',
    description: 'Store offsets (an offsets file as text/csv, or {"offsets": <hull model>, "name"?} as JSON). The upload is kept byte for byte.',
    query: UploadQuery,
    body: UPLOAD_BODY,
    responses: { 201: { description: 'stored', json: HullRecordSchema, headers: ['Location', 'ETag'] } },
    problems: [400, 413, 415, 422, 503],
    handler: create,
  },
  {
    method: 'GET',
    url: '/v1/hulls',
    operationId: 'listHulls',
    tag: 'hulls',
    summary: 'List the stored hulls',
    description: 'Every stored hull, oldest first, as JSON or as CSV (format=csv or Accept: text/csv): one row per hull, id, name, created, updated, stations, hash; fields= and header=plain as for the computations.',
    query: ListQuery,
    responses: { 200: { description: 'the stored hulls', json: HullListSchema, csv: 'one row per hull: id, name, created, updated, stations, hash_sha256; the caution on the first line (last with header=plain)' } },
    problems: [400, 406],
    handler: list,
  },
  {
    method: 'GET',
    url: '/v1/hulls/:id',
    operationId: 'readHull',
    tag: 'hulls',
    summary: 'Read a stored hull',
    description: 'The hull with its model (JSON), or its offsets as an offsets file (text/csv) that reads back to the same hull.',
    query: ReadQuery,
    responses: {
      200: { description: 'the hull', json: HullWithOffsetsSchema, csv: 'the offsets as an offsets file', headers: ['ETag'] },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404, 406],
    handler: read,
  },
  {
    method: 'GET',
    url: '/v1/hulls/:id/source',
    operationId: 'readHullSource',
    tag: 'hulls',
    summary: 'The upload of a stored hull, byte for byte',
    description: 'The body as it was stored, with its media type; its sha256 is the hull\'s hash.',
    query: EmptyQuery,
    responses: {
      200: { description: 'the upload', other: { mediaType: 'text/csv', description: 'or application/json, as uploaded' }, headers: ['ETag'] },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404],
    handler: source,
  },
  {
    method: 'PUT',
    url: '/v1/hulls/:id',
    operationId: 'replaceHull',
    tag: 'hulls',
    summary: 'Store a hull under a chosen id, or replace a stored hull',
    description:
      `New offsets under an id. Where no hull is stored under it, one is created there (201, Location): the id must then be a slug, ${SLUG_TEXT}. ` +
      'Where one is, it is replaced; its id and creation time stay. Send If-Match with the ETag of a GET of the hull: when the hull has ' +
      'changed since, the answer is 412 and nothing is written (no lost update); without If-Match the last writer wins. If-None-Match: * creates ' +
      'only (412 when a hull is there); If-Match where none is gets 412.',
    query: UploadQuery,
    body: UPLOAD_BODY,
    responses: {
      200: { description: 'replaced', json: HullRecordSchema, headers: ['ETag'] },
      201: { description: 'created under the id', json: HullRecordSchema, headers: ['Location', 'ETag'] },
    },
    problems: [400, 404, 412, 413, 415, 422, 503],
    handler: put,
  },
  {
    method: 'DELETE',
    url: '/v1/hulls/:id',
    operationId: 'deleteHull',
    tag: 'hulls',
    summary: 'Delete a stored hull',
    description: 'Remove the hull and its upload. With If-Match, only the version it names (412 otherwise).',
    query: EmptyQuery,
    responses: { 204: { description: 'deleted' } },
    problems: [400, 404, 412],
    handler: remove,
  },
];
