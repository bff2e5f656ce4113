/**
 * The hull store over HTTP: create (POST, 201 with Location), list, read (JSON with the
 * model, or the offsets as CSV), the upload byte for byte, replace (PUT) and delete.
 */
import type { FastifyReply, FastifyRequest } from 'fastify';
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import { fail } from '../../core/common/errors.js';
import { hullSummary } from '../../core/report/formatHydrostatics.js';
import { jsonText } from '../jsonText.js';
import { LengthUnitSchema } from '../../core/common/units.js';
import { writeOffsetsCsv } from '../../core/offsets/writeOffsets.js';
import type { ServiceContext } from '../context.js';
import { answerNotModified, etagOf } from '../etag.js';
import { hullFromCsv, hullFromJson, renamed, type ReadHull } from '../hullInput.js';
import { chooseFormat, CSV_MEDIA_TYPE, JSON_MEDIA_TYPE } from '../negotiate.js';
import { uploadOf } from '../plugins/uploadBody.js';
import { FIELD_CODES, FormatQuery, NameField } from '../requestFields.js';
import { HullListSchema, HullRecordSchema, HullWithOffsetsSchema } from '../responseSchemas.js';
import { HullModelSchema } from '../../core/hull/hullModel.js';
import { serviceFail } from '../serviceErrors.js';
import type { HullMeta, NewHull } from '../store/hullStore.js';
import { parseOrFail, requireObject } from '../validate.js';
import type { RouteSpec } from './routeSpec.js';
import { requireHullMeta } from './storedHull.js';

const UploadQuery = z.object({ name: NameField }).strict();
const UploadJsonBody = z
  .object({
    offsets: z.custom<unknown>((v) => v !== undefined, { error: 'offsets is required: the hull model, lengths in m' }),
    name: NameField,
  })
  .strict();
const UploadJsonBodyDocument = UploadJsonBody.extend({ offsets: HullModelSchema });

const ReadQuery = z
  .object({
    format: FormatQuery,
    units: LengthUnitSchema.optional().describe('length unit of the offsets when they are written as CSV (default m)'),
  })
  .strict();
const EmptyQuery = z.object({}).strict();

/** The hull in a request body, with the name given beside it if any. */
function uploadedHull(req: FastifyRequest): NewHull {
  const upload = uploadOf(req);
  const q = parseOrFail(UploadQuery, req.query, FIELD_CODES);
  let read: ReadHull;
  let name = q.name;
  if (upload.mediaType === 'text/csv') {
    read = hullFromCsv(upload.text);
  } else {
    const body = parseOrFail(UploadJsonBody, requireObject(upload.json, '{"offsets": <hull model>, "name"?}'), FIELD_CODES);
    if (body.name !== undefined && name !== undefined) fail('HYD_BAD_ARGUMENT', ['name'], 'name: given both in the query and in the body; give it once');
    name ??= body.name;
    read = hullFromJson(body.offsets);
  }
  const r = renamed(read, name);
  return { model: r.hull, form: r.form, units: r.units, mediaType: upload.mediaType, source: upload.bytes };
}

function record(meta: HullMeta, hull: NewHull['model']): z.infer<typeof HullRecordSchema> {
  const s = hullSummary(hull);
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
      sheet: `${self}/sheet?draft=`,
      bonjean: `${self}/bonjean`,
      areas: `${self}/areas?draft=`,
      check: `${self}/check`,
    },
    caution: CAUTION,
  };
}

const sendJson = (reply: FastifyReply, value: unknown): FastifyReply => reply.type(JSON_MEDIA_TYPE).send(jsonText(value));

function create(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  const h = uploadedHull(req);
  const meta = ctx.store.create(h);
  return sendJson(reply.code(201).header('location', `/v1/hulls/${meta.id}`), record(meta, h.model));
}

function replace(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  const id = requireHullMeta(ctx.store, req).id;
  const h = uploadedHull(req);
  const meta = ctx.store.replace(id, h);
  if (meta === undefined) serviceFail('HYD_HULL_NOT_FOUND', ['id'], `no hull is stored under id "${id}"`);
  ctx.cache.forget(id);
  return sendJson(reply, record(meta, h.model));
}

function remove(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  parseOrFail(EmptyQuery, req.query);
  const meta = requireHullMeta(ctx.store, req);
  ctx.store.delete(meta.id);
  ctx.cache.forget(meta.id);
  return reply.code(204).send();
}

function list(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  parseOrFail(EmptyQuery, req.query);
  const hulls = ctx.store.list().map((m) => ({ id: m.id, name: m.name, created: m.created, updated: m.updated, hash: m.hash, stations: m.stations }));
  return sendJson(reply, { hulls, caution: CAUTION });
}

function read(req: FastifyRequest, reply: FastifyReply, ctx: ServiceContext): FastifyReply {
  const meta = requireHullMeta(ctx.store, req);
  const q = parseOrFail(ReadQuery, req.query, FIELD_CODES);
  const format = chooseFormat(req, q.format);
  const units = q.units ?? 'm';
  if (answerNotModified(req, reply, etagOf([meta.hash, meta.name, 'hull', units, format]))) return reply;
  const hull = ctx.cache.get(meta).hull;
  if (format === 'csv') {
    return reply.type(CSV_MEDIA_TYPE).header('content-disposition', `inline; filename="${meta.id}.csv"`).send(writeOffsetsCsv(hull, { units }));
  }
  return sendJson(reply, { ...record(meta, hull), offsets: hull });
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
    responses: { 201: { description: 'stored', json: HullRecordSchema, headers: ['Location'] } },
    problems: [400, 413, 415, 422],
    handler: create,
  },
  {
    method: 'GET',
    url: '/v1/hulls',
    operationId: 'listHulls',
    tag: 'hulls',
    summary: 'List the stored hulls',
    description: 'Every stored hull, oldest first.',
    query: EmptyQuery,
    responses: { 200: { description: 'the stored hulls', json: HullListSchema } },
    problems: [400],
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
    summary: 'Replace a stored hull',
    description: 'New offsets for a stored hull; its id and creation time stay.',
    query: UploadQuery,
    body: UPLOAD_BODY,
    responses: { 200: { description: 'replaced', json: HullRecordSchema } },
    problems: [400, 404, 413, 415, 422],
    handler: replace,
  },
  {
    method: 'DELETE',
    url: '/v1/hulls/:id',
    operationId: 'deleteHull',
    tag: 'hulls',
    summary: 'Delete a stored hull',
    description: 'Remove the hull and its upload.',
    query: EmptyQuery,
    responses: { 204: { description: 'deleted' } },
    problems: [400, 404],
    handler: remove,
  },
];
