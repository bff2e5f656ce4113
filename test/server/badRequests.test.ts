/**
 * Bad requests: each answered with the right 4xx problem document (RFC 9457) naming
 * the line and column or the field, while the service keeps answering. Statuses are
 * those RFC 9110 gives the failures (section 15.5); the corpus is test/fixtures/badRequests.ts.
 */
import fc from 'fast-check';
import type { FastifyInstance } from 'fastify';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { buildApp } from '../../server/app.js';
import { CrossCurvesResultSchema, FloatResultSchema, GzResultSchema } from '../../server/stabilitySchemas.js';
import { BAD_REQUESTS, GOOD_OFFSETS, HOSTILE_NAMES } from '../fixtures/badRequests.js';
import { csvHeaders, expectHealthy, expectProblem } from '../fixtures/serverHelpers.js';

let app: FastifyInstance;
let storedId: string;
beforeAll(async () => {
  app = await buildApp();
  const res = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: GOOD_OFFSETS });
  storedId = JSON.parse(res.body).id;
});
afterAll(async () => {
  await app.close();
});

describe('the corpus of bad requests', () => {
  test('holds at least 30 requests', () => {
    expect(BAD_REQUESTS.length).toBeGreaterThanOrEqual(30);
  });

  test.each(BAD_REQUESTS.map((b) => [b.title, b] as const))('%s', async (_title, bad) => {
    const request = { ...bad.request, url: String(bad.request.url).replace('/ID', `/${storedId}`) };
    const res = await app.inject(request);
    const doc = expectProblem(res, bad.status);
    expect(doc.type).toBe(bad.type);
    expect(doc.errors[0]!.code).toBe(bad.code);
    expect(doc.errors[0]!.path).toEqual(bad.path);
    if (bad.detail !== undefined) expect(doc.detail).toMatch(bad.detail);
    await expectHealthy(app);
  });

  test('a bad request leaves the stored hull as it was', async () => {
    const res = await app.inject({ method: 'GET', url: `/v1/hulls/${storedId}/source` });
    expect(res.body).toBe(GOOD_OFFSETS);
  });
});

describe('whole problem documents', () => {
  test('a negative half-breadth: the line, the column, the station and the waterline', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/hydrostatics?drafts=0.5',
      headers: csvHeaders,
      payload: '# name: corpus hull\n# units: m\nx,0,0.5,1\n0,1,-1,1\n1,1,1,1\n2,1,1,1\n',
    });
    expect(JSON.parse(res.body)).toEqual({
      type: '/problems/half-breadth-negative',
      title: 'A half-breadth is below zero.',
      status: 422,
      detail: 'line 4, column 3 (station x = 0 m, WL 0.5 m): half-breadth -1 < 0',
      instance: '/v1/hydrostatics',
      requestId: expect.any(String),
      errors: [{ code: 'HYD_HALF_BREADTH_NEGATIVE', path: ['offsets', 4, 3], message: 'line 4, column 3 (station x = 0 m, WL 0.5 m): half-breadth -1 < 0' }],
      caution: CAUTION,
    });
  });

  test('every issue of a file is reported, in file order', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/hydrostatics?drafts=0.5',
      headers: csvHeaders,
      payload: '# name: corpus hull\n# units: m\nx,0,0.5,1\n0,1,-1,1\n1,1,abc,1\n2,1,,1\n',
    });
    const doc = expectProblem(res, 422);
    expect(doc.errors.map((e) => [e.code, e.path])).toEqual([
      ['HYD_HALF_BREADTH_NEGATIVE', ['offsets', 4, 3]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 5, 3]],
      ['HYD_BLANK_INSIDE_ROW', ['offsets', 6, 3]],
    ]);
    expect(doc.detail).toMatch(/^3 problems; first: line 4, column 3/);
  });

  test('drafts outside the hull are named by their place in the list, all of them', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,-1,0.7,3', headers: csvHeaders, payload: GOOD_OFFSETS });
    const doc = expectProblem(res, 422);
    expect(doc.errors.map((e) => e.path)).toEqual([
      ['drafts', 1],
      ['drafts', 3],
    ]);
    // The corpus hull's keel is at z = 0 and its deck edge at z = 1 m.
    expect(doc.errors[1]!.message).toBe('draft 3 m is outside the hull: it must lie above the lowest keel (z = 0 m) and at or below the lowest deck edge (z = 1 m)');
  });

  test('a JSON syntax error names its line and column (the second comma of line 2 is column 18)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics', headers: { 'content-type': 'application/json' }, payload: '{\n  "drafts": [0.5,,0.6]\n}' });
    const doc = expectProblem(res, 400);
    expect(doc.errors).toEqual([{ code: 'HYD_BODY_UNREADABLE', path: ['body', 2, 18], message: 'line 2, column 18: the body is not valid JSON (unexpected ",0.6]\\n}")' }]);
  });

  test('a problem carries no ETag, even on a route that tags its answers', async () => {
    const res = await app.inject({ method: 'GET', url: `/v1/hulls/${storedId}/hydrostatics?drafts=5` });
    expectProblem(res, 422);
    expect(res.headers.etag).toBeUndefined();
  });
});

describe('names that look like attacks are only text', () => {
  test.each(HOSTILE_NAMES.map((n) => [n]))('%s is stored as given and shown inert', async (name) => {
    const created = await app.inject({ method: 'POST', url: `/v1/hulls?name=${encodeURIComponent(name)}`, headers: csvHeaders, payload: GOOD_OFFSETS });
    expect(created.statusCode).toBe(201);
    const { id } = JSON.parse(created.body);
    // Parameterised SQL: the name comes back exactly and the table is still there.
    const read = JSON.parse((await app.inject({ method: 'GET', url: `/v1/hulls/${id}` })).body);
    expect(read.name).toBe(name);
    expect((await app.inject({ method: 'GET', url: '/v1/hulls' })).statusCode).toBe(200);
    // CSV: no cell that is not a number begins with = + - @ (OWASP, "CSV Injection").
    const csv = (await app.inject({ method: 'GET', url: `/v1/hulls/${id}/hydrostatics?drafts=0.5&format=csv` })).body;
    for (const row of Papa.parse<string[]>(csv).data) {
      for (const cell of row) if (!Number.isFinite(Number(cell))) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
    }
    // JSON is served as JSON, never sniffed as HTML.
    const json = await app.inject({ method: 'GET', url: `/v1/hulls/${id}` });
    expect(json.headers['x-content-type-options']).toBe('nosniff');
    expect(json.headers['content-type']).toBe('application/json; charset=utf-8');
    await expectHealthy(app);
  });

  test('the API page shows no stored name and escapes what it shows', async () => {
    const page = (await app.inject({ method: 'GET', url: '/docs' })).body;
    expect(page).not.toContain('<script');
    expect(page).not.toContain('onerror');
  });
});

describe('arbitrary input never fails the service', () => {
  test('random bytes as an offsets file or a JSON body get a 4xx problem, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ maxLength: 400 }), fc.constantFrom('text/csv', 'application/json'), async (bytes, type) => {
        const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5', headers: { 'content-type': type }, payload: Buffer.from(bytes) });
        expect(res.statusCode).toBeGreaterThanOrEqual(400);
        expect(res.statusCode).toBeLessThan(500);
        expectProblem(res, res.statusCode);
      }),
      { numRuns: 200 },
    );
    await expectHealthy(app);
  });

  test('random query strings on a stored hull get a 200 or a 4xx problem, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 60 }), fc.string({ maxLength: 20 }), async (drafts, density) => {
        const url = `/v1/hulls/${storedId}/hydrostatics?drafts=${encodeURIComponent(drafts)}&density=${encodeURIComponent(density)}`;
        const res = await app.inject({ method: 'GET', url });
        if (res.statusCode !== 200) expectProblem(res, res.statusCode);
        expect(res.statusCode).toBeLessThan(500);
      }),
      { numRuns: 300 },
    );
  });

  test('random drafts for the sheet, the Bonjean data and the areas of a stored hull get a 200 or a 4xx problem, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom('sheet?draft', 'bonjean?drafts', 'areas?draft'), fc.string({ maxLength: 40 }), async (route, value) => {
        const res = await app.inject({ method: 'GET', url: `/v1/hulls/${storedId}/${route}=${encodeURIComponent(value)}` });
        if (res.statusCode !== 200) expectProblem(res, res.statusCode);
        expect(res.statusCode).toBeLessThan(500);
      }),
      { numRuns: 300 },
    );
  });

  test('any load on the stability routes gets a 4xx problem or a 200 whose every figure is a finite number, never a 5xx', async () => {
    // The corpus box with its deck edges (2 m x 2 m x 1 m, 4.1 t wholly immersed), posted.
    const decked = '# units: m\nx,deck_z,deck_y,0,0.5,1\n0,1,1,1,1,1\n1,1,1,1,1,1\n2,1,1,1,1,1\n';
    const value = fc.oneof(fc.double({ min: 1e-9, max: 4.2, noNaN: true }), fc.double({ min: -2, max: 5, noNaN: true }), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.constantFrom(0, 5e-324, 1e-300, 1e300, 4.1, 2));
    const heel = fc.double({ min: -180, max: 180, noNaN: true });
    const routes = {
      float: { url: (v: number[]) => `/v1/float?displacement=${v[0]}&lcg=${v[1]}&kg=${v[2]}&tcg=${v[3]}`, schema: FloatResultSchema },
      gz: { url: (v: number[], h: number) => `/v1/gz?displacement=${v[0]}&kg=${v[1]}&fsm=${Math.abs(v[2]!)}&heels=0,${h}`, schema: GzResultSchema },
      'cross-curves': { url: (v: number[], h: number) => `/v1/cross-curves?displacements=${v[0]},${v[1]}&heels=${h}&trim=${v[2]! > 0 ? 'free' : 'level'}`, schema: CrossCurvesResultSchema },
    };
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...(Object.keys(routes) as (keyof typeof routes)[])), fc.array(value, { minLength: 4, maxLength: 4 }), heel, async (name, v, h) => {
        const url = routes[name].url(v, h);
        const res = await app.inject({ method: 'POST', url, headers: csvHeaders, payload: decked });
        expect(res.statusCode, url).toBeLessThan(500);
        if (res.statusCode !== 200) expectProblem(res, res.statusCode);
        // The result schemas take finite numbers only: a NaN written as null fails here.
        else expect(routes[name].schema.safeParse(JSON.parse(res.body)).success, `${url}: ${res.body.slice(0, 400)}`).toBe(true);
      }),
      { numRuns: 150 },
    );
    await expectHealthy(app);
  });

  test('offsets a little wrong in many ways get a 200 or a 4xx problem, never a 5xx', async () => {
    const cell = fc.oneof(fc.constantFrom('', '0', '1', '-1', 'NaN', '1e400', 'x', '"', '0.5', '2', '#', ' '), fc.double({ noNaN: false }).map(String));
    await fc.assert(
      fc.asyncProperty(fc.array(fc.array(cell, { minLength: 1, maxLength: 5 }), { minLength: 0, maxLength: 6 }), async (rows) => {
        const text = `# units: m\nx,0,0.5,1\n${rows.map((r) => r.join(',')).join('\n')}\n`;
        const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.25', headers: csvHeaders, payload: text });
        if (res.statusCode !== 200) expectProblem(res, res.statusCode);
        expect(res.statusCode).toBeLessThan(500);
      }),
      { numRuns: 300 },
    );
    await expectHealthy(app);
  });
});
