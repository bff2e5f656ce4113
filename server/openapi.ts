/**
 * The OpenAPI 3.1 document of the service, made from the route declarations and their
 * zod schemas (z.toJSONSchema, JSON Schema 2020-12, which OpenAPI 3.1 uses as is).
 * Named schemas go to components/schemas: request bodies as zod reads them (io
 * "input": defaults may be left out), answers as the service writes them ("output").
 */
import { z } from 'zod';
import { CAUTION } from '../core/common/caution.js';
import { HullModelSchema } from '../core/hull/hullModel.js';
import { HydrostaticRowSchema } from '../core/upright/hydrostaticFields.js';
import { AreasResultSchema } from './computations/areas.js';
import { BonjeanResultSchema } from './computations/bonjean.js';
import { CheckResultSchema } from './computations/check.js';
import { SheetResultSchema } from './computations/sheet.js';
import { PROBLEM_MEDIA_TYPE, ProblemSchema } from './problem.js';
import {
  HealthSchema,
  HullListItemSchema,
  HullListSchema,
  HullRecordSchema,
  HullSummarySchema,
  HullWithOffsetsSchema,
  HydrostaticResultSchema,
} from './responseSchemas.js';
import { openapiPath, type RouteSpec } from './routes/routeSpec.js';
import { HullIdParams } from './routes/storedHull.js';
import { SERVICE_LIMITS } from './serviceLimits.js';

type Json = Record<string, unknown>;

const REF = (id: string): string => `#/components/schemas/${id}`;

/** Schemas named in the document; any other schema is written inline. */
const RESPONSE_NAMES: readonly [string, z.ZodType][] = [
  ['HullModel', HullModelSchema],
  ['HydrostaticRow', HydrostaticRowSchema],
  ['HullSummary', HullSummarySchema],
  ['HydrostaticResult', HydrostaticResultSchema],
  ['SheetResult', SheetResultSchema],
  ['BonjeanResult', BonjeanResultSchema],
  ['AreasResult', AreasResultSchema],
  ['CheckResult', CheckResultSchema],
  ['HullListItem', HullListItemSchema],
  ['HullList', HullListSchema],
  ['HullRecord', HullRecordSchema],
  ['HullWithOffsets', HullWithOffsetsSchema],
  ['Health', HealthSchema],
  ['Problem', ProblemSchema],
];

function tidy(schema: unknown): Json {
  const { $schema: _s, $id: _i, ...rest } = schema as Json;
  return rest;
}

/** Convert a set of schemas in one pass, so shared ones become $refs. */
function convert(named: readonly [string, z.ZodType][], io: 'input' | 'output'): Json {
  const registry = z.registry<{ id: string }>();
  for (const [id, schema] of named) registry.add(schema, { id });
  const out = z.toJSONSchema(registry, { uri: REF, io, unrepresentable: 'any' }) as { schemas: Record<string, unknown> };
  return Object.fromEntries(Object.entries(out.schemas).map(([k, v]) => [k, tidy(v)]));
}

function nameOf(schema: z.ZodType, named: readonly [string, z.ZodType][]): string | undefined {
  return named.find(([, s]) => s === schema)?.[0];
}

const bodyId = (spec: RouteSpec): string => `${spec.operationId[0]!.toUpperCase()}${spec.operationId.slice(1)}Body`;

function parameters(spec: RouteSpec, jsonBodyNote: boolean): Json[] {
  const params: Json[] = [];
  for (const m of spec.url.matchAll(/:([A-Za-z_]\w*)/g)) {
    const name = m[1]!;
    const shape: Record<string, z.ZodType> = (spec.params ?? HullIdParams).shape;
    const schema = shape[name];
    if (schema === undefined) throw new Error(`route ${spec.url} declares no schema for its path parameter ${name}`);
    params.push({ name, in: 'path', required: true, description: schema.description, schema: tidy(z.toJSONSchema(schema, { io: 'input' })) });
  }
  const jsonOnly = new Set(spec.jsonQuery === undefined ? [] : Object.keys(spec.jsonQuery.shape));
  for (const [name, schema] of Object.entries(spec.query?.shape ?? {})) {
    const s = schema as z.ZodType;
    const json = tidy(z.toJSONSchema(s, { io: 'input', unrepresentable: 'any' }));
    const optional = s.safeParse(undefined).success;
    const { description, ...rest } = json;
    const note = jsonBodyNote && !jsonOnly.has(name) ? ' (with a CSV body; with a JSON body it goes in the body)' : '';
    params.push({ name, in: 'query', required: !optional, description: `${String(description ?? s.description ?? '')}${note}`, schema: rest });
  }
  return params;
}

function operation(spec: RouteSpec, requestNames: readonly [string, z.ZodType][]): Json {
  const op: Json = {
    operationId: spec.operationId,
    tags: [spec.tag],
    summary: spec.summary,
    description: spec.description,
  };
  const params = parameters(spec, spec.jsonQuery !== undefined);
  if (params.length > 0) op.parameters = params;
  if (spec.body !== undefined) {
    const content: Json = {};
    if (spec.body.csv) content['text/csv'] = { schema: { type: 'string', description: 'an offsets file, grid or points form (see the conventions)' } };
    if (spec.body.json !== undefined) content['application/json'] = { schema: { $ref: REF(nameOf(spec.body.json, requestNames)!) } };
    op.requestBody = { required: true, description: `at most ${SERVICE_LIMITS.bodyLimit} bytes`, content };
  }
  const responses: Json = {};
  for (const [status, r] of Object.entries(spec.responses)) {
    const res: Json = { description: r.description };
    const content: Json = {};
    if (r.json !== undefined) {
      const name = nameOf(r.json, RESPONSE_NAMES);
      content['application/json'] = { schema: name === undefined ? tidy(z.toJSONSchema(r.json, { io: 'output' })) : { $ref: REF(name) } };
    }
    if (r.csv !== undefined) content['text/csv'] = { schema: { type: 'string', description: r.csv } };
    if (r.other !== undefined) content[r.other.mediaType] = { schema: { type: 'string', description: r.other.description } };
    if (Object.keys(content).length > 0) res.content = content;
    if (r.headers !== undefined) {
      res.headers = Object.fromEntries(
        r.headers.map((h) => (typeof h === 'string' ? [h, { schema: { type: 'string' } }] : [h.name, { description: h.description, schema: { type: 'string' } }])),
      );
    }
    responses[status] = res;
  }
  for (const status of spec.problems) {
    responses[String(status)] = { description: 'a problem document naming each issue', content: { [PROBLEM_MEDIA_TYPE.split(';')[0]!]: { schema: { $ref: REF('Problem') } } } };
  }
  op.responses = responses;
  return op;
}

export function buildOpenapi(routes: readonly RouteSpec[]): Json {
  const requestNames: [string, z.ZodType][] = [['HullModelInput', HullModelSchema]];
  for (const spec of routes) if (spec.body?.json !== undefined) requestNames.push([bodyId(spec), spec.body.json]);
  // Two routes may share a body schema (POST and PUT of a hull): name it once.
  const uniqueRequests = requestNames.filter(([, s], i) => requestNames.findIndex(([, t]) => t === s) === i);
  const paths: Record<string, Json> = {};
  for (const spec of routes) {
    const p = openapiPath(spec.url);
    paths[p] ??= {};
    paths[p]![spec.method.toLowerCase()] = operation(spec, uniqueRequests);
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Halfbreadth',
      version: '1.0.0',
      summary: 'Hydrostatics from a table of offsets',
      description:
        'Turns a table of offsets (grid or points form) into upright hydrostatic particulars by Simpson\'s rules, ' +
        'with the calculation sheet, Bonjean data and the sectional-area curve behind them, ' +
        'and keeps hulls in a store. Lengths in m (or feet with units=imperial), densities in t/m3; every x from the offsets\' origin. ' +
        'Every computation also takes units=, fields=, digits= and header=plain. Failures are RFC 9457 problem documents whose ' +
        `type is /problems/<slug>.\n\n${CAUTION}`,
    },
    tags: [
      { name: 'compute', description: 'computations on offsets in the body or on a stored hull' },
      { name: 'hulls', description: 'the hull store' },
      { name: 'service', description: 'health, this document and the API page' },
    ],
    paths,
    components: { schemas: { ...convert(RESPONSE_NAMES, 'output'), ...convert(uniqueRequests, 'input') } },
  };
}

/** The document as committed in openapi/openapi.json. */
export function openapiText(routes: readonly RouteSpec[]): string {
  return `${JSON.stringify(buildOpenapi(routes), null, 2)}\n`;
}
