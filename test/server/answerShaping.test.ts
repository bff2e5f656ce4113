/**
 * The shared answer fields of the service, through inject with whole bodies: `fields`
 * choosing and ordering columns, `digits`, `header=plain` for a spreadsheet's web query,
 * the single-value route for a cell, a hull stored under an id of one's own, and the
 * store listed as CSV.
 *
 * The hull is a box barge L x B x D = 10 x 4 x 2 m (11 stations, waterlines every 0.5 m),
 * whose figures are closed forms (sources: hydrostatic definitions of E. C. Tupper,
 * Introduction to Naval Architecture, 5th ed., 2013, ch. 3-4; geometry):
 *   displacement = rho L B T; wetted surface = L B + 2 L T + 2 B T (bottom, sides, ends);
 *   TPC = rho L B / 100 (t/cm); TPI = TPC x 2.54 / 1.0160469088 (1 in = 2.54 cm,
 *   1 long ton = 1.0160469088 t, by the 1959 yard and pound agreement).
 */
import Papa from 'papaparse';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { buildApp } from '../../server/app.js';
import { boxCsv, csvHeaders, expectProblem } from '../fixtures/serverHelpers.js';
import '../helpers/relClose.js';

const BOX = boxCsv('test box', 10, 4, 2);
const DATUM = "x and every position along the length are measured from the offsets' origin (positive forward): AP at x = 0 m; amidships at x = 5 m; FP at x = 10 m; LBP 10 m; 11 stations";
const CSV_TYPE = 'text/csv; charset=utf-8; header=present';

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp({ dataDir: ':memory:', logger: false });
  const put = await app.inject({ method: 'PUT', url: '/v1/hulls/test-box', headers: csvHeaders, payload: BOX });
  expect(put.statusCode, put.body).toBe(201);
});
afterAll(async () => {
  await app.close();
});

const get = (url: string, headers: Record<string, string> = {}) => app.inject({ method: 'GET', url, headers });

/** The whole JSON answer of the box's hydrostatic table: the rows and fields asked for, in SI, with no notes. */
const tableAnswer = (density: number, rows: Record<string, number>[], fields: { key: string; unit: string; label: string }[]) => ({
  hull: { name: 'test box', stations: 11, waterlines: 5, ap: 0, fp: 10, lbp: 10 },
  density,
  caution: CAUTION,
  rows,
  notes: [],
  units: 'si',
  fields,
});

describe('fields choose and order the columns', () => {
  test('a CSV of two columns, whole: the caution and what the table is of, the header, the rows', async () => {
    const res = await get('/v1/hulls/test-box/hydrostatics?drafts=1,1.5&fields=displacement,wettedSurface&format=csv');
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(CSV_TYPE);
    // rho L B T = 1.025 x 40 x 1 = 41 and 61.5 t; L B + 2 L T + 2 B T = 40 + 20 + 8 = 68 and 40 + 30 + 12 = 82 m2.
    expect(res.body).toBe(
      [`# ${CAUTION}`, '# hull: test box', '# density: 1.025 t/m3', `# ${DATUM}`, 'displacement_t,wettedSurface_m2', '41,68', '61.5,82', ''].join('\r\n'),
    );
  });

  test('in another order, and in JSON the rows hold those keys alone, with units and fields said', async () => {
    const res = await get('/v1/hulls/test-box/hydrostatics?drafts=1&fields=wettedSurface,draft');
    expect(JSON.parse(res.body)).toEqual(
      tableAnswer(1.025, [{ wettedSurface: 68, draft: 1 }], [
        { key: 'wettedSurface', unit: 'm2', label: 'WSA' },
        { key: 'draft', unit: 'm', label: 'Draft' },
      ]),
    );
  });

  test('a column the answer has not is a 400 naming the ones it has, before anything is computed', async () => {
    const doc = expectProblem(await get('/v1/hulls/test-box/hydrostatics?drafts=1&fields=displacement,freeboard'), 400);
    expect(doc.errors).toEqual([
      {
        code: 'HYD_BAD_ARGUMENT',
        path: ['fields'],
        message:
          "fields: 'freeboard' is not a column of this answer; its columns are draft, volume, displacement, lcb, vcb, waterplaneArea, lcf, iT, iL, bmt, bml, kmt, kml, tpc, mct1cm, lwl, bwl, am, cb, cm, cp, cwp, wettedSurface",
      },
    ]);
    expectProblem(await get('/v1/hulls/test-box/hydrostatics?drafts=1&fields=draft,draft'), 400);
    expectProblem(await get('/v1/hulls/test-box/check?fields=draft'), 400);
  });

  test('every table answer takes them: the sheet, Bonjean data and the areas', async () => {
    const sheet = await get('/v1/hulls/test-box/sheet?draft=1&fields=station,multiplier,area&format=csv&header=plain');
    const rows = Papa.parse<string[]>(sheet.body.split('\r\n').filter((l) => l !== '' && !l.startsWith('#')).join('\n')).data;
    // Simpson's first rule over ten equal intervals: 1, 4, 2, ..., 4, 1; each section B T = 4 m2; a sum row of 4 x 30.
    expect(rows).toEqual([
      ['station', 'multiplier', 'area_m2'],
      ...[1, 4, 2, 4, 2, 4, 2, 4, 2, 4, 1].map((m, i) => [String(i), String(m), '4']),
      ['', '', ''],
    ]);
    const bonjean = await get('/v1/hulls/test-box/bonjean?fields=z,area&format=csv&header=plain');
    expect(bonjean.body.split('\r\n').slice(0, 3)).toEqual(['z_m,area_m2', '0,0', '0.5,2']);
    const areas = JSON.parse((await get('/v1/hulls/test-box/areas?draft=1&fields=area')).body);
    expect(areas.stations.every((s: Record<string, number>) => Object.keys(s).join() === 'area' && s['area'] === 4)).toBe(true);
  });
});

describe('digits', () => {
  test('3 significant digits, whole JSON body', async () => {
    // rho L B T = 1.03 x 40 x 1.1 = 45.32 t, to 3 digits 45.3; TPC = 1.03 x 40 / 100 = 0.412.
    const res = await get('/v1/hulls/test-box/hydrostatics?drafts=1.1&density=1.03&fields=displacement,tpc&digits=3');
    expect(JSON.parse(res.body)).toEqual(
      tableAnswer(1.03, [{ displacement: 45.3, tpc: 0.412 }], [
        { key: 'displacement', unit: 't', label: 'Displ.' },
        { key: 'tpc', unit: 't/cm', label: 'TPC' },
      ]),
    );
  });

  test('the default writes no binary noise, and 17 digits give the double', async () => {
    // 1.025 x 40 x 1.3 is 53.3 exactly, which a double computes with noise in the 16th digit.
    const clean = JSON.parse((await get('/v1/hulls/test-box/hydrostatics?drafts=1.3&fields=displacement')).body);
    expect(clean.rows).toEqual([{ displacement: 53.3 }]);
    const full = JSON.parse((await get('/v1/hulls/test-box/hydrostatics?drafts=1.3&fields=displacement&digits=17')).body);
    expect(full.rows[0].displacement).toBeRelClose(53.3, 1e-14);
    for (const bad of ['2', '18', '6.5', 'six']) {
      const doc = expectProblem(await get(`/v1/hulls/test-box/hydrostatics?drafts=1&digits=${bad}`), 400);
      expect(doc.errors[0]!.message).toContain('is not a whole number of significant digits from 3 to 17');
    }
  });
});

describe('header=plain', () => {
  test('the column header first, the rows, then the # lines with the caution last: whole body', async () => {
    const res = await get('/v1/hulls/test-box/hydrostatics?drafts=1,1.5&fields=displacement,wettedSurface&format=csv&header=plain');
    expect(res.body).toBe(['displacement_t,wettedSurface_m2', '41,68', '61.5,82', '# hull: test box', '# density: 1.025 t/m3', `# ${DATUM}`, `# ${CAUTION}`, ''].join('\r\n'));
  });
});

describe('one figure for a spreadsheet cell', () => {
  test('text/plain, the number alone, the caution in a response header', async () => {
    const res = await get('/v1/hulls/test-box/hydrostatics/displacement?draft=1');
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('text/plain; charset=utf-8');
    expect(res.headers['halfbreadth-caution']).toBe(CAUTION);
    expect(res.headers['etag']).toMatch(/^"[0-9a-f]{32}"$/);
    expect(res.body).toBe('41');
    const again = await get('/v1/hulls/test-box/hydrostatics/displacement?draft=1', { 'if-none-match': String(res.headers['etag']) });
    expect(again.statusCode).toBe(304);
  });

  test('in imperial units, by its imperial name, with the draft in feet-inches-eighths', async () => {
    const res = await get('/v1/hulls/test-box/hydrostatics/tpi?draft=3-3-3&units=imperial&digits=17');
    expect(Number(res.body)).toBeRelClose((0.41 * 2.54) / 1.0160469088, 1e-14);
    expect(res.headers['halfbreadth-caution']).toBe(CAUTION);
    // 4-0-0 is 4 ft = 1.2192 m: rho L B T = 1.025 x 40 x 1.2192 t, in long tons.
    const disp = await get('/v1/hulls/test-box/hydrostatics/displacement?draft=4-0-0&units=imperial');
    expect(Number(disp.body)).toBeRelClose((1.025 * 40 * 1.2192) / 1.0160469088, 1e-11);
  });

  test('a field the table has not is a 400 naming those it has; the route\'s documentation carries the caution', async () => {
    const doc = expectProblem(await get('/v1/hulls/test-box/hydrostatics/freeboard?draft=1'), 400);
    expect(doc.errors[0]!.message).toContain("'freeboard' is not a column of this answer; its columns are draft, volume");
    const openapi = JSON.parse((await get('/openapi.json')).body);
    const op = openapi.paths['/v1/hulls/{id}/hydrostatics/{field}'].get;
    expect(op.description).toContain(CAUTION);
    expect(op.responses['200'].headers['Halfbreadth-Caution'].description).toContain(CAUTION);
  });
});

describe('a hull under an id of one\'s own', () => {
  test('stored with PUT, listed in CSV, read back, replaced; If-None-Match: * creates only', async () => {
    const created = await app.inject({ method: 'PUT', url: '/v1/hulls/my-launch-2', headers: csvHeaders, payload: boxCsv('my launch', 6, 2, 1) });
    expect(created.statusCode).toBe(201);
    expect(created.headers.location).toBe('/v1/hulls/my-launch-2');
    const record = JSON.parse(created.body);
    expect(record.id).toBe('my-launch-2');

    const list = await get('/v1/hulls?format=csv');
    expect(list.statusCode).toBe(200);
    expect(list.headers['content-type']).toBe(CSV_TYPE);
    const json = JSON.parse((await get('/v1/hulls')).body) as { hulls: { id: string; name: string; created: string; updated: string; stations: number; hash: string }[] };
    expect(json.hulls.map((h) => h.id)).toEqual(['test-box', 'my-launch-2']);
    expect(list.body).toBe(
      [
        `# ${CAUTION}`,
        '# the stored hulls oldest first',
        'id,name,created,updated,stations,hash',
        ...json.hulls.map((h) => [h.id, h.name, h.created, h.updated, h.stations, h.hash].join(',')),
        '',
      ].join('\r\n'),
    );
    const plain = await get('/v1/hulls?format=csv&header=plain&fields=id,stations');
    expect(plain.body).toBe(['id,stations', 'test-box,11', 'my-launch-2,11', '# the stored hulls oldest first', `# ${CAUTION}`, ''].join('\r\n'));

    const back = JSON.parse((await get('/v1/hulls/my-launch-2')).body);
    expect(back).toMatchObject({ id: 'my-launch-2', name: 'my launch', lbp: 6 });
    // The box 6 x 2 at 0.5 m: rho L B T = 1.025 x 6 x 2 x 0.5 = 6.15 t.
    expect((await get('/v1/hulls/my-launch-2/hydrostatics/displacement?draft=0.5')).body).toBe('6.15');

    const replaced = await app.inject({ method: 'PUT', url: '/v1/hulls/my-launch-2', headers: csvHeaders, payload: boxCsv('my launch', 8, 2, 1) });
    expect(replaced.statusCode).toBe(200);
    expect(JSON.parse(replaced.body)).toMatchObject({ id: 'my-launch-2', created: record.created, lbp: 8 });
    expectProblem(await app.inject({ method: 'PUT', url: '/v1/hulls/my-launch-2', headers: { ...csvHeaders, 'if-none-match': '*' }, payload: BOX }), 412);
    expectProblem(await app.inject({ method: 'PUT', url: '/v1/hulls/new-one', headers: { ...csvHeaders, 'if-match': '"abc"' }, payload: BOX }), 412);
    expect((await get('/v1/hulls/new-one')).statusCode).toBe(404);
  });

  test('an id that is not a slug is refused, saying the form', async () => {
    for (const id of ['My-Launch', '-launch', 'launch-', 'a_b']) {
      const doc = expectProblem(await app.inject({ method: 'PUT', url: `/v1/hulls/${id}`, headers: csvHeaders, payload: BOX }), 400);
      expect(doc.errors[0]!.message).toContain('must be a slug: 1 to 64 lowercase letters, digits and hyphens, beginning and ending with a letter or digit');
    }
  });
});

describe('offsets in the body', () => {
  test('inputUnits names the unit of a file without one; a file that gives another is 422 naming both', async () => {
    const mm = ['x,0,500,1000,1500,2000', ...[0, 1000, 2000, 3000, 4000, 5000, 6000, 7000, 8000, 9000, 10000].map((x) => `${x},2000,2000,2000,2000,2000`)].join('\n');
    const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1&inputUnits=mm&fields=displacement', headers: csvHeaders, payload: mm });
    expect(JSON.parse(res.body).rows).toEqual([{ displacement: 41 }]);
    const clash = expectProblem(await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=1&inputUnits=mm', headers: csvHeaders, payload: `# units: m\n${mm}` }), 422);
    expect(clash.errors[0]).toMatchObject({ code: 'HYD_UNITS_CONFLICT', path: ['offsets', 1] });
    expect(clash.errors[0]!.message).toContain('says m but the request names mm');
    // Stored with inputUnits, the hull is read in millimetres for good.
    const stored = await app.inject({ method: 'PUT', url: '/v1/hulls/mm-box?inputUnits=mm', headers: csvHeaders, payload: mm });
    expect(JSON.parse(stored.body)).toMatchObject({ units: 'mm', lbp: 10 });
    expect((await get('/v1/hulls/mm-box/check')).statusCode).toBe(200);
  });

  test('a semicolon export with decimal commas gives the table of its plain CSV', async () => {
    // As a spreadsheet saves it: BOM, CRLF, comment rows padded to the table's six columns.
    const rows = BOX.trimEnd().split('\n').map((l) => (l.startsWith('#') ? `${l};;;;;` : l.replace(/,/g, ';').replace(/\./g, ',')));
    const semicolons = `\uFEFF${rows.join('\r\n')}\r\n`;
    expect(semicolons).toContain('# units: m;;;;;\r\nx;0;0,5;1;1,5;2\r\n');
    const a = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1.5', headers: csvHeaders, payload: semicolons });
    const b = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5,1.5', headers: csvHeaders, payload: BOX });
    expect(a.statusCode, a.body).toBe(200);
    expect(a.body).toBe(b.body);
  });
});
