/**
 * The OpenAPI document: generated from the zod schemas, committed, valid OpenAPI 3.1
 * (checked by @seriousme/openapi-schema-validator, a validator from the registry), in
 * step with the routes the app answers, and with the answers themselves. The status
 * table of the problem codes is checked against docs/errors.md.
 */
import { readFileSync } from 'node:fs';
import { Validator } from '@seriousme/openapi-schema-validator';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, expectTypeOf, test } from 'vitest';
import type { z } from 'zod';
import { ERROR_CODES } from '../../core/common/errors.js';
import type { HullSummary } from '../../core/report/formatHydrostatics.js';
import { buildApp } from '../../server/app.js';
import { AreasResultSchema } from '../../server/computations/areas.js';
import { BonjeanResultSchema } from '../../server/computations/bonjean.js';
import { CheckResultSchema } from '../../server/computations/check.js';
import { SheetResultSchema } from '../../server/computations/sheet.js';
import { openapiText } from '../../server/openapi.js';
import { PROBLEM_CODES, ProblemSchema, STATUS_OF_CODE, problemSlug } from '../../server/problem.js';
import { HealthSchema, HullListSchema, HullRecordSchema, HullSummarySchema, HullWithOffsetsSchema, HydrostaticResultSchema } from '../../server/responseSchemas.js';
import { ALL_ROUTES } from '../../server/routes/index.js';
import { openapiPath } from '../../server/routes/routeSpec.js';
import { SERVICE_CODES } from '../../server/serviceErrors.js';
import { boxCsv, csvHeaders } from '../fixtures/serverHelpers.js';

const committedPath = new URL('../../openapi/openapi.json', import.meta.url);
const committed = readFileSync(committedPath, 'utf8');

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
});
afterAll(async () => {
  await app.close();
});

describe('openapi/openapi.json', () => {
  test('is the document the schemas generate (run `npm run openapi` after changing them)', () => {
    expect(committed).toBe(openapiText(ALL_ROUTES));
  });

  test('is valid OpenAPI 3.1', async () => {
    const result = await new Validator().validate(JSON.parse(committed));
    expect(result).toEqual({ valid: true });
    expect(JSON.parse(committed).openapi).toBe('3.1.0');
  });

  test('the validator rejects a broken document, so the check above can fail', async () => {
    const broken = JSON.parse(committed);
    delete broken.info;
    expect((await new Validator().validate(broken)).valid).toBe(false);
  });

  test('lists every route the app answers, and no other', () => {
    const doc = JSON.parse(committed) as { paths: Record<string, Record<string, unknown>> };
    const documented = Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m.toUpperCase()} ${p}`));
    expect(documented.sort()).toEqual(ALL_ROUTES.map((r) => `${r.method} ${openapiPath(r.url)}`).sort());
    for (const r of ALL_ROUTES) expect(app.hasRoute({ method: r.method, url: r.url }), `${r.method} ${r.url}`).toBe(true);
  });

  test('names every problem status a route can answer with the Problem schema', () => {
    const doc = JSON.parse(committed);
    const op = doc.paths['/v1/hulls/{id}/hydrostatics'].get;
    expect(op.responses['404'].content['application/problem+json'].schema).toEqual({ $ref: '#/components/schemas/Problem' });
    expect(Object.keys(op.responses).sort()).toEqual(['200', '304', '400', '404', '406', '422', '503']);
  });
});

describe('answers match the schemas the document is made from', () => {
  test('hydrostatics, check, hull record, list, hull with offsets, health and a problem', async () => {
    const box = boxCsv('schema box', 10, 4, 2);
    const table = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1', headers: csvHeaders, payload: box });
    HydrostaticResultSchema.strict().parse(JSON.parse(table.body));
    CheckResultSchema.strict().parse(JSON.parse((await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: box })).body));
    const created = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: box });
    const record = HullRecordSchema.strict().parse(JSON.parse(created.body));
    HullListSchema.strict().parse(JSON.parse((await app.inject({ method: 'GET', url: '/v1/hulls' })).body));
    HullWithOffsetsSchema.strict().parse(JSON.parse((await app.inject({ method: 'GET', url: `/v1/hulls/${record.id}` })).body));
    HealthSchema.strict().parse(JSON.parse((await app.inject({ method: 'GET', url: '/healthz' })).body));
    ProblemSchema.strict().parse(JSON.parse((await app.inject({ method: 'GET', url: '/v1/hulls/nothing' })).body));
  });

  test('sheet, Bonjean data and sectional areas of a grid hull and of a points hull with knuckles', async () => {
    // The points hull's vertical sheets have knuckles, cut panels and ordinates above the draft.
    for (const file of ['workboat.csv', 'survey-launch.csv']) {
      const offsets = readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8');
      const post = async (url: string): Promise<unknown> => {
        const res = await app.inject({ method: 'POST', url, headers: csvHeaders, payload: offsets });
        expect(res.statusCode, `${file} ${url}: ${res.body.slice(0, 300)}`).toBe(200);
        return JSON.parse(res.body);
      };
      for (const draft of [0.3, 0.45, 1.1]) {
        SheetResultSchema.strict().parse(await post(`/v1/sheet?draft=${draft}`));
        AreasResultSchema.strict().parse(await post(`/v1/areas?draft=${draft}`));
      }
      BonjeanResultSchema.strict().parse(await post('/v1/bonjean?drafts=0.45,1.1'));
    }
  });

  test('the hull summary schema has the type of core\'s HullSummary', () => {
    expectTypeOf<z.infer<typeof HullSummarySchema>>().toEqualTypeOf<HullSummary>();
  });
});

describe('problem codes and statuses', () => {
  test('every code of both catalogues has a status and a slug of its own', () => {
    const codes = [...Object.keys(ERROR_CODES), ...Object.keys(SERVICE_CODES)].sort();
    expect([...PROBLEM_CODES].sort()).toEqual(codes);
    expect(new Set(codes.map((c) => problemSlug(c as never))).size).toBe(codes.length);
    for (const c of PROBLEM_CODES) expect([400, 404, 405, 406, 408, 412, 413, 415, 422, 431, 500, 503]).toContain(STATUS_OF_CODE[c]);
  });

  test('docs/api.md lists every code with its type and status', () => {
    const doc = readFileSync(new URL('../../docs/api.md', import.meta.url), 'utf8');
    const listed = new Map([...doc.matchAll(/^\|\s*`(HYD_[A-Z_]+)`\s*\|\s*`([^`]+)`\s*\|\s*(\d{3})\s*\|/gm)].map((m) => [m[1]!, [m[2]!, Number(m[3])]] as const));
    expect([...listed.keys()].sort()).toEqual([...PROBLEM_CODES].sort());
    for (const c of PROBLEM_CODES) expect(listed.get(c), c).toEqual([`/problems/${problemSlug(c)}`, STATUS_OF_CODE[c]]);
  });

  test('the statuses agree with docs/errors.md', () => {
    const doc = readFileSync(new URL('../../docs/errors.md', import.meta.url), 'utf8');
    const listed = [...doc.matchAll(/^\|\s*`(HYD_[A-Z_]+)`\s*\|.*\|\s*(\d{3})\s*\|\s*$/gm)].map((m) => [m[1]!, Number(m[2])] as const);
    expect(listed.length).toBeGreaterThan(0);
    for (const [code, status] of listed) expect(STATUS_OF_CODE[code as keyof typeof STATUS_OF_CODE], code).toBe(status);
  });
});
