/**
 * The calculation sheet, Bonjean data and sectional-area curve over HTTP, through
 * `inject`: status, media type, whole bodies, the caution, and CSV.
 *
 * Two kinds of check, each said where it is made:
 * - Plumbing: for a demo hull the service answers what core's own functions give for
 *   the same offsets (calculationSheet, bonjean, sectionalAreaCurve with their JSON and
 *   CSV forms), in each way of asking (CSV body, JSON body, stored hull). These check
 *   the routes, not the numbers.
 * - Numbers, against closed forms for a rectangular box L x B x D (half-breadth B/2
 *   everywhere) floating at draft T, by direct integration (the same formulae in any
 *   naval-architecture text, e.g. E. C. Tupper, Introduction to Naval Architecture,
 *   ch. 3-4, from memory): V = L B T, KB = T/2, LCB = LCF = L/2, Aw = L B,
 *   IT = L B^3 / 12, IL = B L^3 / 12, BMt = IT / V, BMl = IL / V, TPC = rho Aw / 100,
 *   MCT1cm = rho V BMl / (100 L). A rectangular section of breadth B immersed to height z
 *   has area B z and moment about its base B z^2 / 2 (Bonjean curves of a box); every
 *   station of the box has area B T, so the sectional-area curve is flat, A / Am = 1 and
 *   Cp = 1. Simpson's first rule on 11 equally spaced stations, spacing h, has the
 *   multipliers 1, 4, 2, 4, ..., 2, 4, 1 and the common factor h/3 (common practice, no
 *   source).
 * - HTTP semantics: RFC 9110 (ETag and If-None-Match giving 304), RFC 9457 (problem
 *   documents), RFC 4180 (text/csv); the CSV is read back with papaparse.
 */
import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { writtenAll } from '../helpers/written.js';
import { bonjean } from '../../core/upright/bonjean.js';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import { CAUTION } from '../../core/common/caution.js';
import { areasCsv, areasResult } from '../../core/report/formatAreas.js';
import { bonjeanCsv, bonjeanResult } from '../../core/report/formatBonjean.js';
import { sheetCsv, sheetResult } from '../../core/report/formatSheet.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { buildApp } from '../../server/app.js';
import { boxBarge } from '../fixtures/hulls.js';
import { boxCsv, csvHeaders, expectProblem, jsonHeaders } from '../fixtures/serverHelpers.js';
import { expectFieldsRelClose } from '../helpers/relClose.js';

// Sums of a few dozen Simpson products of exactly representable offsets: rounding only,
// and answers written to 12 significant digits (at most half a unit in the 12th, 5e-12).
const ROUNDING = 6e-12;

const WORKBOAT = readFileSync(new URL('../../offsets-demo/workboat.csv', import.meta.url), 'utf8');
const workboat = readOffsetsCsv(WORKBOAT).hull;
const workboatPrepared = prepareHull(workboat);

/** What the service's JSON gives for a value of core: the same serialisation (NaN as null). */
/** A core result as the service writes it: JSON, numbers to 12 significant digits (test/helpers/written.ts). */
const asJson = (value: unknown): unknown => writtenAll(JSON.parse(JSON.stringify(value)));

/** The box of these tests: L = 10 m, B = 4 m, D = 2 m, 11 stations 1 m apart, waterlines 0.5 m apart. */
const L = 10;
const B = 4;
const D = 2;
const BOX = boxCsv('test box', L, B, D);
const boxHull = { name: 'test box', stations: 11, waterlines: 5, ap: 0, fp: 10, lbp: 10 };
const boxModel = { ...boxBarge(L, B, D, 11, 5), name: 'test box' };

/** The box's closed-form particulars at draft T in water of density rho (see the sources above). */
function boxResults(T: number, rho: number): Record<string, number> {
  const V = L * B * T;
  const iT = (L * B ** 3) / 12;
  const iL = (B * L ** 3) / 12;
  return {
    volume: V,
    displacement: rho * V,
    lcb: L / 2,
    vcb: T / 2,
    waterplaneArea: L * B,
    lcf: L / 2,
    iT,
    iL,
    bmt: iT / V,
    bml: iL / V,
    kmt: T / 2 + iT / V,
    kml: T / 2 + iL / V,
    tpc: (rho * L * B) / 100,
    mct1cm: (rho * V * (iL / V)) / (100 * L),
  };
}

const csvAccept = { ...csvHeaders, accept: 'text/csv' };
const JSON_TYPE = 'application/json; charset=utf-8';
const CSV_TYPE = 'text/csv; charset=utf-8; header=present';

/** The data rows of a CSV answer (after the `#` lines), header first. */
function csvRows(body: string): string[][] {
  return Papa.parse<string[]>(body.split('\r\n').filter((l) => !l.startsWith('#') && l !== '').join('\n')).data;
}

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
});
afterAll(async () => {
  await app.close();
});

describe('POST /v1/sheet', () => {
  test('an offsets file gives the whole sheet in JSON, as core gives it for the same hull (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/sheet?draft=1.3&density=1.0', headers: csvHeaders, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(JSON_TYPE);
    const body = JSON.parse(res.body);
    expect(Object.keys(body)).toEqual(['hull', 'draft', 'density', 'spacing', 'commonFactor', 'amidships', 'levers', 'caution', 'stations', 'pieces', 'ends', 'totals', 'results']);
    expect(body.caution).toBe(CAUTION);
    expect(body.draft).toBe(1.3);
    expect(body.density).toBe(1);
    // One line per station whose lowest point lies below the waterline, read from the model's own points.
    const immersed = workboat.stations.filter((st) => Math.min(...st.points.map((pt) => pt.z)) < 1.3).length;
    expect(body.stations.filter((l: { kind: string }) => l.kind === 'station')).toHaveLength(immersed);
    expect(Object.keys(body.stations[0])).toEqual([
      'kind', 'note', 'station', 'x', 'lever', 'halfBreadth', 'area', 'momentZ', 'multiplier', 'areaSM', 'areaSMLever', 'momentZSM', 'ySM', 'ySMLever', 'ySMLever2', 'y3SM', 'stationText', 'multiplierText', 'vertical',
    ]);
    expect(body).toEqual(asJson(sheetResult(workboat, calculationSheet(workboatPrepared, 1.3, 1.0))));
  });

  test('density defaults to sea water, 1.025 t/m3 (common practice, no source)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/sheet?draft=1.3', headers: csvHeaders, payload: WORKBOAT });
    expect(JSON.parse(res.body).density).toBe(1.025);
  });

  test('a JSON body with the model, draft and density gives the same sheet as the offsets file (plumbing)', async () => {
    const json = await app.inject({ method: 'POST', url: '/v1/sheet', headers: jsonHeaders, payload: { offsets: workboat, draft: 1.3, density: 1.0 } });
    const csv = await app.inject({ method: 'POST', url: '/v1/sheet?draft=1.3&density=1.0', headers: csvHeaders, payload: WORKBOAT });
    expect(json.statusCode).toBe(200);
    expect(json.headers['content-type']).toBe(JSON_TYPE);
    expect(JSON.parse(json.body)).toEqual(JSON.parse(csv.body));
  });

  test('Accept: text/csv gives core\'s CSV of the sheet, the caution on its first line (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/sheet?draft=1.3', headers: csvAccept, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(CSV_TYPE);
    expect(res.body.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    expect(res.body).toBe(sheetCsv(sheetResult(workboat, calculationSheet(workboatPrepared, 1.3))));
  });

  test('a box\'s sheet: Simpson\'s multipliers 1, 4, 2, ..., 4, 1, h/3, and volume L B T with the closed-form particulars', async () => {
    const T = 1.25;
    const res = await app.inject({ method: 'POST', url: `/v1/sheet?draft=${T}`, headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    const body = JSON.parse(res.body);
    expect(body.hull).toEqual(boxHull);
    expect(body.spacing).toBeRelClose(1, ROUNDING);
    expect(body.commonFactor).toBeRelClose(1 / 3, ROUNDING);
    expect(body.amidships).toBe(5);
    const multipliers = [1, 4, 2, 4, 2, 4, 2, 4, 2, 4, 1];
    body.stations.forEach((s: Record<string, number>, i: number) => {
      expect(s.multiplier, `station ${i}`).toBeRelClose(multipliers[i]!, ROUNDING);
      // Each station: half-breadth B/2 at the waterline, area B T (closed form).
      expect(s.halfBreadth).toBeRelClose(B / 2, ROUNDING);
      expect(s.area).toBeRelClose(B * T, ROUNDING);
    });
    expect(body.results.volume).toBeRelClose(L * B * T, ROUNDING);
    expectFieldsRelClose(body.results, boxResults(T, 1.025), ROUNDING);
  });

  test('a draft above the deck edge is 422 naming the draft, in a whole problem document', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/sheet?draft=3', headers: csvHeaders, payload: BOX });
    expectProblem(res, 422);
    const message = 'draft 3 m is outside the hull: it must lie above the lowest keel (z = 0 m) and at or below the lowest deck edge (z = 2 m)';
    expect(JSON.parse(res.body)).toEqual({
      type: '/problems/draft-out-of-range',
      title: 'A draft lies outside the hull (at or below the keel, or above the deck edge).',
      status: 422,
      detail: message,
      instance: '/v1/sheet',
      requestId: expect.any(String),
      errors: [{ code: 'HYD_DRAFT_OUT_OF_RANGE', path: ['draft'], message }],
      caution: CAUTION,
    });
  });

  test.each([
    ['no draft', '/v1/sheet', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a draft that is a word', '/v1/sheet?draft=deep', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a list where one draft is wanted', '/v1/sheet?draft=0.5,1', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a draft given twice', '/v1/sheet?draft=0.5&draft=1', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a draft at the keel', '/v1/sheet?draft=0', 422, 'HYD_DRAFT_OUT_OF_RANGE', ['draft']],
    ['a density in kg/m3', '/v1/sheet?draft=1&density=1025', 400, 'HYD_DENSITY', ['density']],
    ['drafts (a list) for the sheet', '/v1/sheet?draft=1&drafts=1', 400, 'HYD_BAD_ARGUMENT', ['drafts']],
  ])('%s is a problem naming the field', async (_title, url, status, code, path) => {
    const doc = expectProblem(await app.inject({ method: 'POST', url, headers: csvHeaders, payload: BOX }), status);
    expect(doc.errors.map((e) => [e.code, e.path])).toEqual([[code, path]]);
  });

  test('in a JSON body, a draft as text is 400 and one outside the hull 422, each naming the draft', async () => {
    const text = expectProblem(await app.inject({ method: 'POST', url: '/v1/sheet', headers: jsonHeaders, payload: { offsets: boxModel, draft: '1.0' } }), 400);
    expect(text.errors).toEqual([{ code: 'HYD_DRAFT_LIST', path: ['draft'], message: 'draft: draft must be a number of metres, not "1.0"' }]);
    const deep = expectProblem(await app.inject({ method: 'POST', url: '/v1/sheet', headers: jsonHeaders, payload: { offsets: boxModel, draft: 5 } }), 422);
    expect(deep.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_OUT_OF_RANGE', ['draft']]]);
    // 1e999 is a JSON number that reads as Infinity (ECMA-262, JSON.parse).
    const infinite = expectProblem(await app.inject({ method: 'POST', url: '/v1/sheet', headers: jsonHeaders, payload: `{"offsets": ${JSON.stringify(boxModel)}, "draft": 1e999}` }), 400);
    expect(infinite.errors).toEqual([{ code: 'HYD_DRAFT_LIST', path: ['draft'], message: 'draft: draft Infinity is not a finite number of metres; give one draft in m above the baseline, e.g. 1.3' }]);
    const query = expectProblem(await app.inject({ method: 'POST', url: '/v1/sheet?draft=1', headers: jsonHeaders, payload: { offsets: boxModel, draft: 1 } }), 400);
    expect(query.errors.map((e) => [e.code, e.path])).toEqual([['HYD_BAD_ARGUMENT', ['draft']]]);
  });
});

describe('POST /v1/bonjean', () => {
  test('an offsets file gives every station\'s curve in JSON, as core gives it for the same hull (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean', headers: csvHeaders, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(JSON_TYPE);
    const body = JSON.parse(res.body);
    expect(Object.keys(body)).toEqual(['hull', 'caution', 'stations']);
    expect(body.caution).toBe(CAUTION);
    expect(Object.keys(body.stations[0])).toEqual(['x', 'keel', 'deck', 'points']);
    expect(Object.keys(body.stations[0].points[0])).toEqual(['z', 'area', 'momentZ']);
    expect(body).toEqual(asJson(bonjeanResult(workboat, bonjean(workboatPrepared))));
  });

  test('extra heights are added to the curves, as core adds them (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=1.3,1.45', headers: csvHeaders, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(JSON.parse(res.body)).toEqual(asJson(bonjeanResult(workboat, bonjean(workboatPrepared, [1.3, 1.45]))));
  });

  test('a JSON body, with or without heights, gives what the offsets file gives (plumbing)', async () => {
    const plain = await app.inject({ method: 'POST', url: '/v1/bonjean', headers: csvHeaders, payload: WORKBOAT });
    for (const payload of [{ offsets: workboat }, { offsets: workboat, drafts: [] }]) {
      const json = await app.inject({ method: 'POST', url: '/v1/bonjean', headers: jsonHeaders, payload });
      expect(json.statusCode).toBe(200);
      expect(JSON.parse(json.body)).toEqual(JSON.parse(plain.body));
    }
    const extra = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=1.3', headers: csvHeaders, payload: WORKBOAT });
    const json = await app.inject({ method: 'POST', url: '/v1/bonjean', headers: jsonHeaders, payload: { offsets: workboat, drafts: [1.3] } });
    expect(JSON.parse(json.body)).toEqual(JSON.parse(extra.body));
  });

  test('format=csv gives core\'s long-form CSV, the caution on its first line (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=1.3&format=csv', headers: csvHeaders, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(CSV_TYPE);
    expect(res.body.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    expect(csvRows(res.body)[0]).toEqual(['x_m', 'z_m', 'area_m2', 'momentZ_m3']);
    expect(res.body).toBe(bonjeanCsv(bonjeanResult(workboat, bonjean(workboatPrepared, [1.3]))));
  });

  test('a box\'s Bonjean areas are B z and their moments B z^2 / 2 at every height, the extra one included', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=1.3', headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    const body = JSON.parse(res.body);
    expect(body.hull).toEqual(boxHull);
    expect(body.stations).toHaveLength(11);
    for (const s of body.stations as { x: number; keel: number; deck: number; points: { z: number; area: number; momentZ: number }[] }[]) {
      expect([s.keel, s.deck]).toEqual([0, D]);
      // The keel (area 0), the tabulated waterlines 0.5, 1, 1.5, 2 m and the extra height 1.3 m.
      expect(s.points.map((q) => q.z)).toEqual([0, 0.5, 1, 1.3, 1.5, 2]);
      for (const q of s.points) {
        expect(q.area, `x = ${s.x}, z = ${q.z}`).toBeRelClose(B * q.z, ROUNDING);
        expect(q.momentZ, `x = ${s.x}, z = ${q.z}`).toBeRelClose((B * q.z * q.z) / 2, ROUNDING);
      }
    }
  });

  test('in CSV the box\'s areas read back as B z (closed form), one row per station and height', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean', headers: csvAccept, payload: BOX });
    const [, ...rows] = csvRows(res.body);
    expect(rows).toHaveLength(11 * 5);
    for (const [, z, area] of rows) expect(Number(area)).toBeRelClose(B * Number(z), ROUNDING);
  });

  test('heights that meet no station are 422, each named by its place in the list', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=0.5,3,1,-1', headers: csvHeaders, payload: BOX });
    const doc = expectProblem(res, 422);
    expect(doc.errors).toEqual([
      { code: 'HYD_DRAFT_OUT_OF_RANGE', path: ['drafts', 1], message: 'draft 3 m meets no station: Bonjean heights must lie above the lowest keel (z = 0 m) and at or below the highest deck edge (z = 2 m)' },
      { code: 'HYD_DRAFT_OUT_OF_RANGE', path: ['drafts', 3], message: 'draft -1 m meets no station: Bonjean heights must lie above the lowest keel (z = 0 m) and at or below the highest deck edge (z = 2 m)' },
    ]);
  });

  test.each([
    ['a height that is a word', 'drafts=high', 400, 'HYD_DRAFT_LIST', ['drafts', 0]],
    ['an empty heights list', 'drafts=', 400, 'HYD_DRAFT_LIST', ['drafts']],
    ['a height at the keel', 'drafts=0', 422, 'HYD_DRAFT_OUT_OF_RANGE', ['drafts', 0]],
    ['a single draft where heights are taken', 'draft=1', 400, 'HYD_BAD_ARGUMENT', ['draft']],
  ])('%s is a problem naming the field', async (_title, query, status, code, path) => {
    const doc = expectProblem(await app.inject({ method: 'POST', url: `/v1/bonjean?${query}`, headers: csvHeaders, payload: BOX }), status);
    expect(doc.errors.map((e) => [e.code, e.path])).toEqual([[code, path]]);
  });

  test('in a JSON body, a height as text is 400 and one above every deck 422, each named by its place', async () => {
    const text = expectProblem(await app.inject({ method: 'POST', url: '/v1/bonjean', headers: jsonHeaders, payload: { offsets: boxModel, drafts: [1, 'high'] } }), 400);
    expect(text.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_LIST', ['drafts', 1]]]);
    const high = expectProblem(await app.inject({ method: 'POST', url: '/v1/bonjean', headers: jsonHeaders, payload: { offsets: boxModel, drafts: [1, 2.5] } }), 422);
    expect(high.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_OUT_OF_RANGE', ['drafts', 1]]]);
  });
});

describe('POST /v1/areas', () => {
  test('an offsets file gives the curve in JSON, as core gives it for the same hull (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/areas?draft=1.3', headers: csvHeaders, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(JSON_TYPE);
    const body = JSON.parse(res.body);
    expect(Object.keys(body)).toEqual(['hull', 'caution', 'draft', 'stations', 'volume', 'lcb', 'am', 'amidships', 'lwl', 'cp']);
    expect(body.caution).toBe(CAUTION);
    expect(Object.keys(body.stations[0])).toEqual(['x', 'area', 'fraction']);
    expect(body).toEqual(asJson(areasResult(workboat, sectionalAreaCurve(workboatPrepared, 1.3))));
  });

  test('a JSON body gives what the offsets file gives (plumbing)', async () => {
    const json = await app.inject({ method: 'POST', url: '/v1/areas', headers: jsonHeaders, payload: { offsets: workboat, draft: 1.3 } });
    const csv = await app.inject({ method: 'POST', url: '/v1/areas?draft=1.3', headers: csvHeaders, payload: WORKBOAT });
    expect(json.statusCode).toBe(200);
    expect(JSON.parse(json.body)).toEqual(JSON.parse(csv.body));
  });

  test('Accept: text/csv gives core\'s CSV of the curve, the caution on its first line (plumbing)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/areas?draft=1.3', headers: csvAccept, payload: WORKBOAT });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe(CSV_TYPE);
    expect(res.body.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    expect(csvRows(res.body)[0]).toEqual(['x_m', 'area_m2', 'fraction']);
    expect(res.body).toBe(areasCsv(areasResult(workboat, sectionalAreaCurve(workboatPrepared, 1.3))));
  });

  test('a box\'s curve is flat: every area B T, A/Am = 1, volume L B T, LCB L/2, Cp 1', async () => {
    const T = 0.8;
    const body = JSON.parse((await app.inject({ method: 'POST', url: `/v1/areas?draft=${T}`, headers: csvHeaders, payload: BOX })).body);
    expect(body.hull).toEqual(boxHull);
    expect(body.draft).toBe(T);
    expect(body.stations).toHaveLength(11);
    for (const s of body.stations as { x: number; area: number; fraction: number }[]) {
      expect(s.area, `x = ${s.x}`).toBeRelClose(B * T, ROUNDING);
      expect(s.fraction, `x = ${s.x}`).toBeRelClose(1, ROUNDING);
    }
    expectFieldsRelClose(body, { volume: L * B * T, lcb: L / 2, am: B * T, amidships: L / 2, lwl: L, cp: 1 }, ROUNDING);
  });

  test.each([
    ['no draft', '/v1/areas', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a draft that is a word', '/v1/areas?draft=deep', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['an infinite draft', '/v1/areas?draft=Infinity', 400, 'HYD_DRAFT_LIST', ['draft']],
    ['a draft below the keel', '/v1/areas?draft=-0.5', 422, 'HYD_DRAFT_OUT_OF_RANGE', ['draft']],
    ['a draft above the deck edge', '/v1/areas?draft=2.01', 422, 'HYD_DRAFT_OUT_OF_RANGE', ['draft']],
    ['a density, which the curve does not take', '/v1/areas?draft=1&density=1.0', 400, 'HYD_BAD_ARGUMENT', ['density']],
  ])('%s is a problem naming the field', async (_title, url, status, code, path) => {
    const doc = expectProblem(await app.inject({ method: 'POST', url, headers: csvHeaders, payload: BOX }), status);
    expect(doc.errors.map((e) => [e.code, e.path])).toEqual([[code, path]]);
  });

  test('in a JSON body, a missing draft is 400 and one outside the hull 422, each naming the draft', async () => {
    const missing = expectProblem(await app.inject({ method: 'POST', url: '/v1/areas', headers: jsonHeaders, payload: { offsets: boxModel } }), 400);
    expect(missing.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_LIST', ['draft']]]);
    const deep = expectProblem(await app.inject({ method: 'POST', url: '/v1/areas', headers: jsonHeaders, payload: { offsets: boxModel, draft: 2.5 } }), 422);
    expect(deep.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_OUT_OF_RANGE', ['draft']]]);
  });
});

describe('the three on a stored hull', () => {
  let id: string;
  beforeAll(async () => {
    const created = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: WORKBOAT });
    id = JSON.parse(created.body).id;
  });

  test('the hull record links to them', async () => {
    const { links } = JSON.parse((await app.inject({ method: 'GET', url: `/v1/hulls/${id}` })).body);
    expect(links).toMatchObject({ sheet: `/v1/hulls/${id}/sheet?draft=`, bonjean: `/v1/hulls/${id}/bonjean`, areas: `/v1/hulls/${id}/areas?draft=` });
  });

  test.each([
    ['sheet', 'draft=1.3&density=1.0', 'draft=1.3&density=1.0'],
    ['bonjean', 'drafts=1.3,1.45', 'drafts=1.3,1.45'],
    ['bonjean', '', ''],
    ['areas', 'draft=1.3', 'draft=1.3'],
  ])('GET .../%s?%s answers what the stateless route answers, JSON and CSV, with an ETag (plumbing)', async (name, query, postQuery) => {
    const url = `/v1/hulls/${id}/${name}?${query}`;
    const stored = await app.inject({ method: 'GET', url });
    const direct = await app.inject({ method: 'POST', url: `/v1/${name}?${postQuery}`, headers: csvHeaders, payload: WORKBOAT });
    expect(stored.statusCode).toBe(200);
    expect(stored.headers['content-type']).toBe(JSON_TYPE);
    expect(stored.headers.etag).toMatch(/^"[0-9a-f]{32}"$/);
    expect(JSON.parse(stored.body)).toEqual(JSON.parse(direct.body));
    expect(JSON.parse(stored.body).caution).toBe(CAUTION);

    const csv = await app.inject({ method: 'GET', url, headers: { accept: 'text/csv' } });
    const directCsv = await app.inject({ method: 'POST', url: `/v1/${name}?${postQuery}`, headers: csvAccept, payload: WORKBOAT });
    expect(csv.statusCode).toBe(200);
    expect(csv.headers['content-type']).toBe(CSV_TYPE);
    expect(csv.headers['content-disposition']).toBe(`inline; filename="${id}-${name}.csv"`);
    expect(csv.body.startsWith(`# ${CAUTION}\r\n`)).toBe(true);
    expect(csv.body).toBe(directCsv.body);
    expect(csv.headers.etag).not.toBe(stored.headers.etag);

    // RFC 9110, 13.1.2: a current tag in If-None-Match is answered 304 without a body.
    const again = await app.inject({ method: 'GET', url, headers: { 'if-none-match': stored.headers.etag as string } });
    expect(again.statusCode).toBe(304);
    expect(again.body).toBe('');
  });

  test('another draft has another tag; the same draft written another way has the same', async () => {
    const a = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/areas?draft=1.3` });
    const b = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/areas?draft=1.30` });
    const c = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/areas?draft=1.4`, headers: { 'if-none-match': a.headers.etag as string } });
    expect(b.headers.etag).toBe(a.headers.etag);
    expect(c.statusCode).toBe(200);
    expect(c.headers.etag).not.toBe(a.headers.etag);
  });

  test('a draft outside the stored hull is 422 naming the field, without an ETag', async () => {
    for (const [url, path] of [
      [`/v1/hulls/${id}/sheet?draft=9`, ['draft']],
      [`/v1/hulls/${id}/areas?draft=9`, ['draft']],
      [`/v1/hulls/${id}/bonjean?drafts=1,9`, ['drafts', 1]],
    ] as const) {
      const res = await app.inject({ method: 'GET', url });
      const doc = expectProblem(res, 422);
      expect(doc.errors.map((e) => [e.code, e.path])).toEqual([['HYD_DRAFT_OUT_OF_RANGE', path]]);
      expect(res.headers.etag).toBeUndefined();
    }
  });

  test('an unknown hull is 404 on each', async () => {
    for (const name of ['sheet?draft=1', 'bonjean', 'areas?draft=1']) expectProblem(await app.inject({ method: 'GET', url: `/v1/hulls/no-such-hull/${name}` }), 404);
  });
});
