/**
 * Every route of the service through `inject`: status, media type and whole bodies, in
 * JSON and CSV.
 *
 * Sources of the expected values (outside the project):
 * - A rectangular box L x B floating at draft T (closed form, by direct integration;
 *   the same formulae in any naval-architecture text, e.g. E. C. Tupper, Introduction to
 *   Naval Architecture, ch. 3-4, from memory): V = L B T, KB = T/2, LCB = LCF = L/2,
 *   Aw = L B, IT = L B^3 / 12, IL = B L^3 / 12, BMt = B^2 / (12 T), BMl = L^2 / (12 T),
 *   TPC = rho Aw / 100, MCT1cm = rho V BMl / (100 L), Cb = Cm = Cp = Cwp = 1, wetted
 *   surface = L B + 2 L T + 2 B T (bottom, sides and the two immersed end faces, as the
 *   project's conventions count it).
 * - HTTP semantics: RFC 9110 (201 with Location, 204 without body, ETag and
 *   If-None-Match giving 304, 405 with Allow, 406), RFC 9457 (problem documents),
 *   RFC 4180 (text/csv, header=present).
 * - The CSV is read back with papaparse, a general CSV library from the registry.
 */
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { CAUTION } from '../../core/common/caution.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { buildApp } from '../../server/app.js';
import { boxBarge } from '../fixtures/hulls.js';
import { boxCsv, csvHeaders, expectProblem, jsonHeaders } from '../fixtures/serverHelpers.js';
import { expectFieldsRelClose } from '../helpers/relClose.js';
import { readFileSync } from 'node:fs';

// Sums of a few dozen Simpson products of exactly representable offsets: rounding only,
// and answers written to 12 significant digits (at most half a unit in the 12th, 5e-12).
const ROUNDING = 6e-12;

/** The box's closed-form particulars at draft T, density rho (see the sources above). */
function boxRow(L: number, B: number, T: number, rho: number): Record<string, number> {
  const V = L * B * T;
  const bml = (L * L) / (12 * T);
  return {
    draft: T,
    volume: V,
    displacement: rho * V,
    lcb: L / 2,
    vcb: T / 2,
    waterplaneArea: L * B,
    lcf: L / 2,
    iT: (L * B ** 3) / 12,
    iL: (B * L ** 3) / 12,
    bmt: (B * B) / (12 * T),
    bml,
    kmt: T / 2 + (B * B) / (12 * T),
    kml: T / 2 + bml,
    tpc: (rho * L * B) / 100,
    mct1cm: (rho * V * bml) / (100 * L),
    lwl: L,
    bwl: B,
    am: B * T,
    cb: 1,
    cm: 1,
    cp: 1,
    cwp: 1,
    wettedSurface: L * B + 2 * L * T + 2 * B * T,
  };
}

const BOX = boxCsv('test box', 10, 4, 2);
const boxHull = { name: 'test box', stations: 11, waterlines: 5, ap: 0, fp: 10, lbp: 10 };

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
});
afterAll(async () => {
  await app.close();
});

describe('POST /v1/hydrostatics', () => {
  test('a box given as an offsets file answers its closed-form particulars in JSON', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1,1.5', headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    const body = JSON.parse(res.body);
    expect(Object.keys(body)).toEqual(['hull', 'density', 'caution', 'rows', 'notes']);
    expect(body.hull).toEqual(boxHull);
    expect(body.density).toBe(1.025);
    expect(body.caution).toBe(CAUTION);
    expect(body.rows).toHaveLength(3);
    [0.5, 1, 1.5].forEach((T, k) => {
      expect(Object.keys(body.rows[k]).sort()).toEqual(Object.keys(boxRow(10, 4, T, 1.025)).sort());
      expectFieldsRelClose(body.rows[k], boxRow(10, 4, T, 1.025), ROUNDING);
    });
  });

  test('density changes displacement, TPC and MCT1cm in proportion, and nothing geometric', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1&density=1.0', headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    const body = JSON.parse(res.body);
    expect(body.density).toBe(1);
    expectFieldsRelClose(body.rows[0], boxRow(10, 4, 1, 1.0), ROUNDING);
  });

  test('a JSON body with the model gives the same table as the offsets file', async () => {
    const model = boxBarge(10, 4, 2, 11, 5);
    model.name = 'test box';
    const json = await app.inject({ method: 'POST', url: '/v1/hydrostatics', headers: jsonHeaders, payload: { offsets: model, drafts: [0.5, 1, 1.5] } });
    const csv = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1,1.5', headers: csvHeaders, payload: BOX });
    expect(json.statusCode).toBe(200);
    expect(JSON.parse(json.body)).toEqual(JSON.parse(csv.body));
  });

  test('ranges in the drafts list are expanded (0.5:0.25:1.5 gives five drafts)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5:0.25:1.5', headers: csvHeaders, payload: BOX });
    expect(JSON.parse(res.body).rows.map((r: { draft: number }) => r.draft)).toEqual([0.5, 0.75, 1, 1.25, 1.5]);
  });

  test('Accept: text/csv gives CSV whose first line is the caution and whose values equal the JSON', async () => {
    const url = '/v1/hydrostatics?drafts=0.5,1';
    const csv = await app.inject({ method: 'POST', url, headers: { ...csvHeaders, accept: 'text/csv' }, payload: BOX });
    const json = await app.inject({ method: 'POST', url, headers: csvHeaders, payload: BOX });
    expect(csv.statusCode).toBe(200);
    expect(csv.headers['content-type']).toBe('text/csv; charset=utf-8; header=present');
    const lines = csv.body.split('\r\n');
    expect(lines[0]).toBe(`# ${CAUTION}`);
    expect(lines[1]).toBe('# hull: test box');
    expect(lines[2]).toBe('# density: 1.025 t/m3');
    const parsed = Papa.parse<string[]>(lines.filter((l) => !l.startsWith('#') && l !== '').join('\n'));
    const [header, ...data] = parsed.data;
    expect(header!.slice(0, 3)).toEqual(['draft_m', 'volume_m3', 'displacement_t']);
    const rows = JSON.parse(json.body).rows as Record<string, number>[];
    data.forEach((cells, k) => {
      // Each CSV header is the JSON field name with its unit as a suffix.
      header!.forEach((h, c) => {
        const key = Object.keys(rows[k]!).find((f) => h === f || h.startsWith(`${f}_`))!;
        expect(Number(cells[c]), h).toBe(rows[k]![key]);
      });
    });
  });

  test('format=csv in the query wins over Accept, and format=json over Accept: text/csv', async () => {
    const a = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1&format=csv', headers: { ...csvHeaders, accept: 'application/json' }, payload: BOX });
    expect(a.headers['content-type']).toMatch(/^text\/csv/);
    const b = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1&format=json', headers: { ...csvHeaders, accept: 'text/csv' }, payload: BOX });
    expect(b.headers['content-type']).toMatch(/^application\/json/);
  });

  test('Accept with q-values picks the preferred form; one the route cannot give is 406', async () => {
    const csv = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1', headers: { ...csvHeaders, accept: 'application/json;q=0.5, text/csv' }, payload: BOX });
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const any = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1', headers: { ...csvHeaders, accept: '*/*' }, payload: BOX });
    expect(any.headers['content-type']).toMatch(/^application\/json/);
    const none = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1', headers: { ...csvHeaders, accept: 'text/html' }, payload: BOX });
    const doc = expectProblem(none, 406);
    expect(doc.type).toBe('/problems/not-acceptable');
    expect(doc.errors).toEqual([{ code: 'HYD_NOT_ACCEPTABLE', path: ['headers', 'accept'], message: expect.stringContaining('application/json or text/csv') }]);
  });
});

describe('POST /v1/check', () => {
  test('sound offsets are valid, with the hull and its particulars', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    expect(JSON.parse(res.body)).toEqual({
      valid: true,
      hull: boxHull,
      // 11 stations x 5 waterlines; the box's keel is the baseline and its deck edge is at D = 2 m.
      particulars: { form: 'grid', units: 'm', points: 55, knuckles: 0, lowestKeel: 0, lowestDeck: 2 },
      issues: [],
      // Constant offsets make straight lines: nothing to call unfair (common practice, no source).
      warnings: [],
      caution: CAUTION,
    });
  });

  test('one offset pushed out of a fair line is a warning, with its place and the fair value', async () => {
    // Station x = 5 m (line 9), waterline z = 1 m (column 4): half-breadth 2 m pushed out to 2.3 m.
    const bumped = BOX.replace('\n5,2,2,2,2,2\n', '\n5,2,2,2.3,2,2\n');
    const res = await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: bumped });
    const body = JSON.parse(res.body);
    expect(body.valid).toBe(true);
    expect(body.warnings).toHaveLength(1);
    const w = body.warnings[0];
    expect(w).toMatchObject({ code: 'HYD_UNFAIR_OFFSET', path: ['stations', 5, 'points', 2, 'y'], x: 5, z: 1, offset: 'halfBreadth', value: 2.3 });
    // Its neighbours along the waterline and the section all lie at 2 m: the fair value is 2 m.
    expect(w.suggested).toBeRelClose(2, 1e-9);
  });

  test('broken offsets are an answer, not a failure: every issue with its line and column', async () => {
    const broken = BOX.replace('\n1,2,2,2,2,2\n', '\n1,2,-2,2,2,2\n').replace('\n3,2,2,2,2,2\n', '\n3,2,2,abc,2,2\n');
    const res = await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: broken });
    expect(res.statusCode).toBe(200);
    const body = JSON.parse(res.body);
    expect(body.valid).toBe(false);
    expect(body.hull).toBeNull();
    expect(body.particulars).toBeNull();
    expect(body.warnings).toEqual([]);
    expect(body.caution).toBe(CAUTION);
    // Lines: 1 name, 2 units, 3 header, 4 station x = 0, 5 x = 1, 7 x = 3; column 3 is z = 0.5, column 4 z = 1.
    expect(body.issues.map((i: { code: string; path: unknown[] }) => [i.code, i.path])).toEqual([
      ['HYD_HALF_BREADTH_NEGATIVE', ['offsets', 5, 3]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 7, 4]],
    ]);
  });

  test('a JSON model is checked too, its issues at paths in the model', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/check', headers: jsonHeaders, payload: { offsets: { stations: [{ x: 0, points: [] }] } } });
    const body = JSON.parse(res.body);
    expect(body.valid).toBe(false);
    expect(body.issues.map((i: { code: string; path: unknown[] }) => [i.code, i.path])).toEqual([
      ['HYD_TOO_FEW_STATIONS', ['offsets', 'stations']],
      ['HYD_STATION_TOO_FEW_POINTS', ['offsets', 'stations', 0, 'points']],
    ]);
  });

  test('a table in millimetres without its units line, and keels taken at a waterline, are warned of', async () => {
    // Read as metres the length is 10,000 m, longer than any vessel; its rows start with a
    // blank and a flat of bottom, so each keel was taken at the 500 (mm) waterline.
    const mm = ['x,0,500,1000', '0,,800,1000', '5000,,900,1100', '10000,,800,1000'].join('\n');
    const body = JSON.parse((await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: mm })).body);
    expect(body.valid).toBe(true);
    expect(body.warnings.map((w: { code: string }) => w.code)).toEqual(['HYD_KEEL_AT_WATERLINE', 'HYD_KEEL_AT_WATERLINE', 'HYD_KEEL_AT_WATERLINE', 'HYD_PROPORTIONS']);
    // Line 2, column 3: the 800 at the 500 waterline, the row's lowest defined cell.
    expect(body.warnings[0].path).toEqual(['offsets', 2, 3]);
    expect(body.warnings[3].message).toContain('mm (10 m)');
    // A stored copy of the same file gets the same warnings (its upload is read again for them).
    const stored = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: mm });
    const { id } = JSON.parse(stored.body) as { id: string };
    const again = JSON.parse((await app.inject({ method: 'GET', url: `/v1/hulls/${id}/check` })).body);
    expect(again.warnings).toEqual(body.warnings);
  });

  test('the check has no CSV form: format=csv is 406', async () => {
    expectProblem(await app.inject({ method: 'POST', url: '/v1/check?format=csv', headers: csvHeaders, payload: BOX }), 406);
  });
});

describe('the hull store', () => {
  test('POST /v1/hulls answers 201 with Location and the whole record; the upload is kept byte for byte', async () => {
    const upload = Buffer.from(`\uFEFF${BOX.replace(/\n/g, '\r\n')}`, 'utf8');
    const res = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: upload });
    expect(res.statusCode).toBe(201);
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    const body = JSON.parse(res.body);
    expect(res.headers.location).toBe(`/v1/hulls/${body.id}`);
    const self = `/v1/hulls/${body.id}`;
    expect(body).toEqual({
      id: expect.stringMatching(/^[A-Za-z0-9_-]{16}$/),
      name: 'test box',
      created: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
      updated: body.created,
      hash: (await import('node:crypto')).createHash('sha256').update(upload).digest('hex'),
      stations: 11,
      waterlines: 5,
      ap: 0,
      fp: 10,
      lbp: 10,
      form: 'grid',
      units: 'm',
      mediaType: 'text/csv',
      bytes: upload.length,
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
    });
    const src = await app.inject({ method: 'GET', url: `${self}/source` });
    expect(src.statusCode).toBe(200);
    expect(src.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(Buffer.compare(src.rawPayload, upload)).toBe(0);
  });

  test('GET /v1/hulls lists the stored hulls, oldest first', async () => {
    const a = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls?name=first', headers: csvHeaders, payload: BOX })).body);
    const b = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: jsonHeaders, payload: { offsets: boxBarge(10, 4, 2), name: 'second' } })).body);
    const res = await app.inject({ method: 'GET', url: '/v1/hulls' });
    expect(res.statusCode).toBe(200);
    const body = JSON.parse(res.body);
    expect(Object.keys(body)).toEqual(['hulls', 'caution']);
    const pick = ({ id, name, created, updated, hash, stations }: Record<string, unknown>) => ({ id, name, created, updated, hash, stations });
    const ids = body.hulls.map((h: { id: string }) => h.id);
    expect(ids.indexOf(a.id)).toBeLessThan(ids.indexOf(b.id));
    expect(body.hulls.find((h: { id: string }) => h.id === a.id)).toEqual(pick(a));
    expect(body.hulls.find((h: { id: string }) => h.id === b.id)).toEqual(pick(b));
    expect(a.name).toBe('first');
    expect(b.name).toBe('second');
    expect(b.form).toBe('model');
  });

  test('GET /v1/hulls/{id} gives the model, and as CSV offsets that read back to the very same hull', async () => {
    const demo = readFileSync(new URL('../../offsets-demo/survey-launch.csv', import.meta.url), 'utf8');
    const created = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: demo })).body);
    const expected = readOffsetsCsv(demo).hull;
    const json = await app.inject({ method: 'GET', url: `/v1/hulls/${created.id}` });
    expect(json.statusCode).toBe(200);
    const body = JSON.parse(json.body);
    expect(body).toEqual({ ...created, offsets: expected });
    const csv = await app.inject({ method: 'GET', url: `/v1/hulls/${created.id}`, headers: { accept: 'text/csv' } });
    expect(csv.statusCode).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(readOffsetsCsv(csv.body).hull).toEqual(expected);
  });

  test('PUT replaces the offsets under the same id and creation time; DELETE removes the hull (204, then 404)', async () => {
    const created = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: BOX })).body);
    const url = `/v1/hulls/${created.id}`;
    const longer = boxCsv('longer box', 20, 4, 2);
    const put = await app.inject({ method: 'PUT', url, headers: csvHeaders, payload: longer });
    expect(put.statusCode).toBe(200);
    const replaced = JSON.parse(put.body);
    expect(replaced).toMatchObject({ id: created.id, created: created.created, name: 'longer box', lbp: 20 });
    expect(replaced.hash).not.toBe(created.hash);
    const table = JSON.parse((await app.inject({ method: 'GET', url: `${url}/hydrostatics?drafts=1` })).body);
    expectFieldsRelClose(table.rows[0], boxRow(20, 4, 1, 1.025), ROUNDING);

    const del = await app.inject({ method: 'DELETE', url });
    expect(del.statusCode).toBe(204);
    expect(del.body).toBe('');
    expectProblem(await app.inject({ method: 'GET', url }), 404);
    expectProblem(await app.inject({ method: 'DELETE', url }), 404);
    // A PUT where no hull is stored creates one, but only under an id of the slug form; the service's own ids are not slugs.
    const again = expectProblem(await app.inject({ method: 'PUT', url, headers: csvHeaders, payload: BOX }), 400);
    expect(again.errors[0]!.message).toContain('must be a slug');
  });
});

describe('computations on a stored hull', () => {
  let id: string;
  beforeAll(async () => {
    id = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: BOX })).body).id;
  });

  test('GET .../hydrostatics answers the same table as the stateless route, with an ETag', async () => {
    const stored = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/hydrostatics?drafts=0.5:0.5:1.5&density=1.025` });
    const direct = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1,1.5', headers: csvHeaders, payload: BOX });
    expect(stored.statusCode).toBe(200);
    expect(stored.headers.etag).toMatch(/^"[0-9a-f]{32}"$/);
    expect(stored.headers['cache-control']).toBe('no-cache');
    expect(JSON.parse(stored.body)).toEqual(JSON.parse(direct.body));
  });

  test('If-None-Match with the ETag answers 304 without a body; another query or form has another tag', async () => {
    const url = `/v1/hulls/${id}/hydrostatics?drafts=1`;
    const first = await app.inject({ method: 'GET', url });
    const again = await app.inject({ method: 'GET', url, headers: { 'if-none-match': first.headers.etag as string } });
    expect(again.statusCode).toBe(304);
    expect(again.body).toBe('');
    expect(again.headers.etag).toBe(first.headers.etag);
    const weak = await app.inject({ method: 'GET', url, headers: { 'if-none-match': `"other", W/${first.headers.etag as string}` } });
    expect(weak.statusCode).toBe(304);
    const other = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/hydrostatics?drafts=1.5`, headers: { 'if-none-match': first.headers.etag as string } });
    expect(other.statusCode).toBe(200);
    const csv = await app.inject({ method: 'GET', url: `${url}&format=csv` });
    expect(csv.headers.etag).not.toBe(first.headers.etag);
    // The same drafts written another way are the same query.
    const same = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/hydrostatics?drafts=1.0&density=1.025` });
    expect(same.headers.etag).toBe(first.headers.etag);
  });

  test('GET .../hydrostatics?format=csv is a spreadsheet-ready CSV with a file name', async () => {
    const res = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/hydrostatics?drafts=1&format=csv` });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-disposition']).toBe(`inline; filename="${id}-hydrostatics.csv"`);
    expect(res.body.startsWith(`# ${CAUTION}\r\n`)).toBe(true);
  });

  test('GET .../check describes the stored hull', async () => {
    const res = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/check` });
    expect(res.statusCode).toBe(200);
    expect(JSON.parse(res.body)).toEqual({
      valid: true,
      hull: boxHull,
      particulars: { form: 'grid', units: 'm', points: 55, knuckles: 0, lowestKeel: 0, lowestDeck: 2 },
      issues: [],
      // Constant offsets make straight lines: nothing to call unfair (common practice, no source).
      warnings: [],
      caution: CAUTION,
    });
  });

  test('a hull name that begins with = cannot become a spreadsheet formula in the CSV', async () => {
    const named = JSON.parse((await app.inject({ method: 'POST', url: `/v1/hulls?name=${encodeURIComponent('=HYPERLINK("http://x.invalid","y")')}`, headers: csvHeaders, payload: BOX })).body);
    expect(named.name).toBe('=HYPERLINK("http://x.invalid","y")');
    const res = await app.inject({ method: 'GET', url: `/v1/hulls/${named.id}/hydrostatics?drafts=1&format=csv` });
    // OWASP, "CSV Injection": a cell must not begin with = + - @ tab or CR unless it is a number.
    for (const row of Papa.parse<string[]>(res.body).data) {
      for (const cell of row) if (!Number.isFinite(Number(cell))) expect(cell, cell).not.toMatch(/^[=+\-@\t\r]/);
    }
  });
});

describe('the service routes', () => {
  test('GET /healthz', async () => {
    const res = await app.inject({ method: 'GET', url: '/healthz' });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(JSON.parse(res.body)).toEqual({ status: 'ok', caution: CAUTION });
  });

  test('GET /openapi.json serves the committed document', async () => {
    const res = await app.inject({ method: 'GET', url: '/openapi.json' });
    expect(res.statusCode).toBe(200);
    expect(JSON.parse(res.body)).toEqual(JSON.parse(readFileSync(new URL('../../openapi/openapi.json', import.meta.url), 'utf8')));
  });

  test('GET /docs is a page listing every route and the caution, loading nothing', async () => {
    const res = await app.inject({ method: 'GET', url: '/docs' });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(res.headers['content-security-policy']).toBe("default-src 'none'; style-src 'unsafe-inline'");
    for (const route of [
      'POST /v1/hydrostatics',
      'GET /v1/hulls/{id}/hydrostatics',
      'POST /v1/sheet',
      'GET /v1/hulls/{id}/sheet',
      'POST /v1/bonjean',
      'GET /v1/hulls/{id}/bonjean',
      'POST /v1/areas',
      'GET /v1/hulls/{id}/areas',
      'POST /v1/hulls',
      'DELETE /v1/hulls/{id}',
      'POST /v1/check',
    ]) {
      expect(res.body).toContain(`<code>${route}</code>`);
    }
    expect(res.body).toContain(CAUTION.replace(/'/g, '&#39;'));
  });

  test('a problem type URI leads to a page saying what it means; an unknown one is 404', async () => {
    const res = await app.inject({ method: 'GET', url: '/problems/draft-out-of-range' });
    expect(res.statusCode).toBe(200);
    expect(res.body).toContain('HYD_DRAFT_OUT_OF_RANGE');
    expect(res.body).toContain('422');
    expectProblem(await app.inject({ method: 'GET', url: '/problems/no-such-thing' }), 404);
  });

  test('a method a path does not answer is 405 with Allow', async () => {
    const res = await app.inject({ method: 'PATCH', url: '/v1/hulls/abc' });
    const doc = expectProblem(res, 405);
    expect(res.headers.allow).toBe('DELETE, GET, HEAD, PUT');
    expect(doc.errors).toEqual([{ code: 'HYD_METHOD_NOT_ALLOWED', path: ['method'], message: 'PATCH is not answered at /v1/hulls/abc; it answers DELETE, GET, HEAD, PUT' }]);
  });
});
