/**
 * The stability routes through `inject` on a box barge: the floating position of a load
 * (`float`), the cross curves (`cross-curves`), the righting levers with the criteria
 * (`gz`) and the hydrostatic table by displacement or at a trim, posted as an offsets file
 * and stored, in JSON and CSV.
 *
 * Sources of the expected values (outside the project):
 * - A box L x B x D floating upright at draft T in water of density rho (closed form, by
 *   direct integration; as in routes.test.ts): T = displacement / (rho L B), KB = T/2,
 *   BM = B^2 / (12 T), LCB = LCF = L/2.
 * - Heeled while wall-sided (the waterline moves on vertical sides: before the deck edge
 *   immerses, tan phi < (D - T) / (B/2), and before the bilge emerges, tan phi < T / (B/2)):
 *   the wall-sided formula GZ = sin phi (GM + BM tan^2 phi / 2) (E. C. Tupper, Introduction
 *   to Naval Architecture, 5th ed., 2013, ch. 4; from memory), so with the conventions'
 *   KN = GZ + KG sin phi, KN = sin phi (KB + BM + BM tan^2 phi / 2). The wedges that emerge
 *   and immerse are equal triangles about the centreline, so the draft on the centreline
 *   stays T (elementary geometry). The area under the curve to phi, by elementary calculus
 *   (the integral of sin^3 phi / cos^2 phi is sec phi + cos phi):
 *   GM (1 - cos phi) + BM (sec phi + cos phi - 2) / 2.
 * - G off the centreline by TCG: the hull lists to where GZ = TCG cos phi, and wall-sided
 *   that is tan phi (GM + BM tan^2 phi / 2) = TCG (Tupper, ch. 4, list; from memory).
 * - Trimmed, the waterline from dA at x = 0 to dF at x = L within the ends: every section
 *   is cut in a rectangle, so the immersed side is a trapezium (elementary geometry). Its
 *   area is L (dA + dF) / 2 = L T, T the draft amidships: the volume L B T whatever the
 *   trim. Its centroid: x = L (dA + 2 dF) / (3 (dA + dF)), which with t = dA - dF =
 *   L tan(theta) is L/2 - L t / (12 T), the LCB moved aft by L^2 tan(theta) / (12 T); and
 *   z = (dA^2 + dA dF + dF^2) / (3 (dA + dF)) = T/2 + t^2 / (24 T). With no KG the balance
 *   along the length is LCB = LCG (B under G), so dA + dF = 2 T and dA + 2 dF = 6 T LCG / L.
 * - The virtual rise of G by a free-surface moment, KG + FSM / displacement, and
 *   GM0 = KB + BM - KG - FSM / displacement (Tupper, ch. 4; from memory).
 * - The criteria's thresholds: the general criteria of the IMO 2008 Intact Stability Code,
 *   resolution MSC.267(85), Part A, 2.2 (from memory, as core/stability/criteria.ts has them).
 * - The CSV read back with papaparse (a CSV library from the registry).
 * Where a stored hull is checked against the same offsets posted, the check is of the
 * plumbing; the core's own tests (test/stability/) hold its numerics against closed forms
 * and polygon clipping beyond the wall-sided range.
 */
import type { FastifyInstance } from 'fastify';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { buildApp } from '../../server/app.js';
import { csvHeaders, deckedBoxCsv, jsonHeaders } from '../fixtures/serverHelpers.js';
import { expectFieldsRelClose } from '../helpers/relClose.js';
import { boxMetacentre, boxWallSidedKn } from '../fixtures/wallSided.js';

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const BOX = deckedBoxCsv('stability box', L, B, D);
const RAD = Math.PI / 180;
/** Displacement at draft T: rho L B T. */
const at = (T: number): number => RHO * L * B * T;
// Answers are written to 12 significant digits (5e-12); a figure the service finds by
// iteration (a draft, a heel, a trim) is solved to about 1e-9 of the length.
const WRITTEN = 6e-12;
const SOLVED = 1e-8;

/** The box's KB, BM and KM at draft T. */
const upright = (T: number) => boxMetacentre(B, T);
/** KN by the wall-sided formula. */
const wallSidedKn = (T: number, deg: number): number => boxWallSidedKn(B, T, deg);

let app: FastifyInstance;
let id: string;
beforeAll(async () => {
  app = await buildApp();
  const stored = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: BOX });
  expect(stored.statusCode).toBe(201);
  id = (JSON.parse(stored.body) as { id: string }).id;
});
afterAll(async () => {
  await app.close();
});

async function post(url: string): Promise<Record<string, any>> {
  const res = await app.inject({ method: 'POST', url, headers: csvHeaders, payload: BOX });
  expect(res.statusCode, res.body).toBe(200);
  expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
  const body = JSON.parse(res.body) as Record<string, any>;
  expect(body.caution).toBe(CAUTION);
  return body;
}

/** A CSV answer: the caution first, then the `#` lines, the header and the rows, read with papaparse. */
async function postCsv(url: string): Promise<{ comments: string[]; header: string[]; rows: string[][] }> {
  const res = await app.inject({ method: 'POST', url: `${url}&format=csv`, headers: csvHeaders, payload: BOX });
  expect(res.statusCode, res.body).toBe(200);
  expect(res.headers['content-type']).toBe('text/csv; charset=utf-8; header=present');
  const lines = res.body.split('\r\n');
  expect(lines[0]).toBe(`# ${CAUTION}`);
  const parsed = Papa.parse<string[]>(lines.filter((l) => !l.startsWith('#') && l !== '').join('\n'));
  const [header, ...rows] = parsed.data;
  return { comments: lines.filter((l) => l.startsWith('#')), header: header!, rows };
}

describe('the floating position of a load', () => {
  test('G at L/2 with no KG: level at the draft displacement / (rho L B), with B under G', async () => {
    const T = 1.1;
    const r = await post(`/v1/float?displacement=${at(T)}&lcg=5`);
    expect(r).toMatchObject({ displacement: at(T), lcg: 5, tcg: 0, kg: null, heel: 0, tcb: 0 });
    expectFieldsRelClose(r, { draftAft: T, draftFwd: T, draft: T, lcb: L / 2, vcb: T / 2 }, SOLVED);
    expect(Math.abs(r.trim)).toBeLessThan(1e-9);
  });

  test('LCG off amidships with no KG: the box trims by the stern to the trapezium whose centroid is under G', async () => {
    const T = 1;
    const lcg = 4.8;
    const dF = (6 * T * lcg) / L - 2 * T;
    const dA = 2 * T - dF;
    const r = await post(`/v1/float?displacement=${at(T)}&lcg=${lcg}`);
    expectFieldsRelClose(r, { draftAft: dA, draftFwd: dF, trim: dA - dF, draft: T, lcb: lcg }, SOLVED);
    expect(r.heel).toBe(0);
  });

  test('KG and a TCG to starboard: it lists to starboard as the wall-sided formula gives, the centreline draft still T', async () => {
    const T = 1;
    const kg = 1.2;
    const tcg = 0.1;
    const { km, bm } = upright(T);
    const gm = km - kg;
    // tan phi (GM + BM tan^2 phi / 2) = TCG, rising in tan phi: bisection.
    let lo = 0;
    let hi = 1;
    for (let k = 0; k < 200; k++) {
      const mid = (lo + hi) / 2;
      if (mid * (gm + (bm * mid * mid) / 2) < tcg) lo = mid;
      else hi = mid;
    }
    const heel = Math.atan(lo) / RAD;
    // Wall-sided at that heel: tan phi below T / (B/2) and (D - T) / (B/2).
    expect(Math.tan(heel * RAD)).toBeLessThan(Math.min(T, D - T) / (B / 2));
    const r = await post(`/v1/float?displacement=${at(T)}&lcg=5&kg=${kg}&tcg=${tcg}`);
    expect(r.kg).toBe(kg);
    expect(r.tcg).toBe(tcg);
    expect(r.heel).toBeRelClose(heel, SOLVED);
    expect(r.heel).toBeGreaterThan(0);
    expect(r.draft).toBeRelClose(T, SOLVED);
    expect(Math.abs(r.trim)).toBeLessThan(1e-9);
  });

  test('the CSV is one row whose header carries the units, its values those of the JSON, and no KG a blank cell', async () => {
    const url = `/v1/float?displacement=${at(1)}&lcg=4.8`;
    const json = await post(url);
    const csv = await postCsv(url);
    expect(csv.header).toEqual(['displacement_t', 'lcg_m', 'tcg_m', 'kg_m', 'draftAft_m', 'draftFwd_m', 'trim_m', 'heel_deg', 'draft_m', 'lcb_m', 'tcb_m', 'vcb_m', 'gm_m']);
    expect(csv.rows).toHaveLength(1);
    csv.header.forEach((h, c) => {
      const key = h.slice(0, h.lastIndexOf('_'));
      expect(csv.rows[0]![c], h).toBe(json[key] === null ? '' : String(json[key]));
    });
  });
});

describe('cross curves', () => {
  const Ts = [0.5, 1, 1.5];
  const heels = [0, 5, 10];

  test('KN is 0 upright and the wall-sided formula at each displacement and heel, level or free to trim, the centreline draft T', async () => {
    // Wall-sided to the largest heel at every draft: tan 10 degrees < 0.5 / 2.
    expect(Math.tan(10 * RAD)).toBeLessThan(Math.min(...Ts.map((T) => Math.min(T, D - T))) / (B / 2));
    for (const trim of ['level', 'free']) {
      const r = await post(`/v1/cross-curves?displacements=${Ts.map(at).join(',')}&heels=${heels.join(',')}&trim=${trim}`);
      expect(r.trim).toBe(trim);
      expect(r.rows).toHaveLength(Ts.length * heels.length);
      Ts.forEach((T, i) =>
        heels.forEach((h, j) => {
          const row = r.rows[i * heels.length + j];
          expect(row.displacement).toBe(at(T));
          expect(row.heel).toBe(h);
          if (h === 0) expect(row.kn).toBe(0);
          else expect(row.kn, `${trim}, ${at(T)} t, ${h} deg`).toBeRelClose(wallSidedKn(T, h), SOLVED);
          expect(row.draft).toBeRelClose(T, SOLVED);
          // A box symmetric fore and aft floats heeled at no trim.
          expect(Math.abs(row.trim)).toBeLessThan(1e-9);
        }),
      );
    }
  });

  test('a heel to port gives KN of the other sign (a hull symmetric about its centreline)', async () => {
    const r = await post(`/v1/cross-curves?displacements=${at(1)}&heels=-10,10`);
    expect(r.rows[0].kn).toBeRelClose(-wallSidedKn(1, 10), SOLVED);
    expect(r.rows[1].kn).toBeRelClose(wallSidedKn(1, 10), SOLVED);
  });

  test('the CSV has one row per displacement and a KN column per heel, each header with its unit, the values those of the JSON', async () => {
    const url = `/v1/cross-curves?displacements=${Ts.map(at).join(',')}&heels=${heels.join(',')}`;
    const json = await post(url);
    const csv = await postCsv(url);
    expect(csv.header).toEqual(['displacement_t', 'kn_0deg_m', 'kn_5deg_m', 'kn_10deg_m']);
    expect(csv.rows.map((r) => Number(r[0]))).toEqual(Ts.map(at));
    Ts.forEach((_T, i) => heels.forEach((_h, j) => expect(Number(csv.rows[i]![j + 1])).toBe(json.rows[i * heels.length + j].kn)));
  });
});

describe('righting levers and the criteria', () => {
  const T = 1;
  const kg = 1;
  const heels = [0, 5, 10, 20];

  test('GM0, GZ and the area to each heel are the wall-sided figures; free surface raises G by FSM / displacement', async () => {
    const { km, bm } = upright(T);
    // Wall-sided to 20 degrees at T = 1: tan 20 degrees < 1 / 2.
    expect(Math.tan(20 * RAD)).toBeLessThan(Math.min(T, D - T) / (B / 2));
    for (const fsm of [0, 2]) {
      const r = await post(`/v1/gz?displacement=${at(T)}&kg=${kg}&fsm=${fsm}&heels=${heels.join(',')}`);
      const kgEffective = kg + fsm / at(T);
      const gm = km - kgEffective;
      expect(r).toMatchObject({ displacement: at(T), kg, fsm, trim: 'free' });
      expect(r.kgEffective).toBeRelClose(kgEffective, WRITTEN);
      expect(r.gm0).toBeRelClose(gm, WRITTEN);
      expect(r.points.map((p: { heel: number }) => p.heel)).toEqual(heels);
      heels.forEach((h, k) => {
        const phi = h * RAD;
        const gz = Math.sin(phi) * (gm + (bm * Math.tan(phi) ** 2) / 2);
        // The area is Simpson's rule on the curve every 2.5 degrees (these heels end whole
        // pairs of steps). The curve's phi^5 term (BM phi^5 / 4 near upright) is not
        // integrated exactly: Simpson's error for phi^5 over two steps h is 4 h^6 / 3, about
        // 1.2e-6 of the area at these heels.
        const area = gm * (1 - Math.cos(phi)) + (bm * (1 / Math.cos(phi) + Math.cos(phi) - 2)) / 2;
        if (h === 0) {
          expect(r.points[k].gz).toBe(0);
          expect(r.areas[k].area).toBe(0);
        } else {
          expect(r.points[k].gz, `GZ at ${h} deg`).toBeRelClose(gz, SOLVED);
          expect(r.areas[k].area, `area to ${h} deg`).toBeRelClose(area, 3e-6);
        }
      });
      const verdict = r.criteria.find((c: { id: string }) => c.id === 'gm0');
      expect(verdict).toEqual({ id: 'gm0', required: 0.15, actual: r.gm0, unit: 'm', pass: true });
    }
  });

  test('the general criteria of the IMO 2008 IS Code are judged by default, with their thresholds and units', async () => {
    const r = await post(`/v1/gz?displacement=${at(T)}&kg=${kg}`);
    expect(r.criteriaSet.name).toMatch(/IMO 2008 Intact Stability Code/);
    expect(r.criteria.map((c: { id: string; required: number; unit: string }) => [c.id, c.required, c.unit])).toEqual([
      ['area-0-30', 0.055, 'm.rad'],
      ['area-0-40', 0.09, 'm.rad'],
      ['area-30-40', 0.03, 'm.rad'],
      ['gz-at-30', 0.2, 'm'],
      ['angle-of-max-gz', 25, 'deg'],
      ['gm0', 0.15, 'm'],
    ]);
    for (const c of r.criteria) expect(c.pass, c.id).toBe(c.actual >= c.required);
    // Every 5 degrees from 0 to 90 when no heels are asked for.
    expect(r.points.map((p: { heel: number }) => p.heel)).toEqual(Array.from({ length: 19 }, (_, k) => 5 * k));
  });

  test('a KG so high that GM0 is negative is an answer, 200, whose GM0 criterion fails', async () => {
    const { km, bm } = upright(T);
    const high = 2;
    const r = await post(`/v1/gz?displacement=${at(T)}&kg=${high}&heels=0,5`);
    expect(r.gm0).toBeRelClose(km - high, WRITTEN);
    expect(r.gm0).toBeLessThan(0);
    // Negative GZ near upright: the wall-sided formula with GM < 0.
    expect(r.points[1].gz).toBeRelClose(Math.sin(5 * RAD) * (km - high + (bm * Math.tan(5 * RAD) ** 2) / 2), SOLVED);
    expect(r.points[1].gz).toBeLessThan(0);
    const gm0 = r.criteria.find((c: { id: string }) => c.id === 'gm0');
    expect(gm0).toEqual({ id: 'gm0', required: 0.15, actual: r.gm0, unit: 'm', pass: false });
    // A criteria set of its own, given as JSON in the query, is judged instead.
    const mine = { name: 'a stricter rule', source: 'written for this test', criteria: [{ id: 'gm0', required: 0.35 }] };
    const own = await post(`/v1/gz?displacement=${at(T)}&kg=${kg}&criteria=${encodeURIComponent(JSON.stringify(mine))}`);
    expect(own.criteriaSet).toEqual({ name: mine.name, source: mine.source });
    expect(own.criteria).toEqual([{ id: 'gm0', required: 0.35, actual: own.gm0, unit: 'm', pass: own.gm0 >= 0.35 }]);
  });

  test('the CSV gives heel, GZ and area with their units, and the verdicts in its # lines', async () => {
    const url = `/v1/gz?displacement=${at(T)}&kg=${kg}&heels=${heels.join(',')}`;
    const json = await post(url);
    const csv = await postCsv(url);
    expect(csv.header).toEqual(['heel_deg', 'gz_m', 'area_m_rad']);
    expect(csv.rows.map((r) => r.map(Number))).toEqual(heels.map((h, k) => [h, json.points[k].gz, json.areas[k].area]));
    for (const c of json.criteria) expect(csv.comments.some((l) => l.startsWith(`# criterion ${c.id} `) && l.endsWith(c.pass ? ': pass' : ': FAIL'))).toBe(true);
  });
});

describe('the hydrostatic table by displacement and at a trim', () => {
  const Ts = [0.5, 1, 1.5];

  test('by displacements: each row at the draft displacement / (rho L B), the same as the table by drafts there', async () => {
    const by = await post(`/v1/hydrostatics?displacements=${Ts.map(at).join(',')}`);
    const drafts = await post(`/v1/hydrostatics?drafts=${Ts.join(',')}`);
    expect(by.displacements).toEqual(Ts.map(at));
    expect(by.trim).toBe(0);
    Ts.forEach((T, k) => {
      const row = by.rows[k];
      expectFieldsRelClose(row, { draft: T, draftAft: T, draftFwd: T, displacement: at(T) }, SOLVED);
      expect(row.trim).toBe(0);
      // Every field of the upright table, at the draft found.
      expectFieldsRelClose(row, drafts.rows[k], SOLVED);
    });
  });

  test('at a trim: the volume of the level box at the draft amidships, the LCB aft by L^2 tan(theta) / (12 T), KB up by t^2 / (24 T)', async () => {
    const t = 0.4;
    const r = await post(`/v1/hydrostatics?drafts=${Ts.join(',')}&trim=${t}`);
    expect(r.trim).toBe(t);
    Ts.forEach((T, k) => {
      // Within the ends: both drafts above the keel and below the deck edge.
      expect(T - t / 2).toBeGreaterThan(0);
      expect(T + t / 2).toBeLessThanOrEqual(D);
      const tanTheta = t / L;
      expectFieldsRelClose(
        r.rows[k],
        { draft: T, draftAft: T + t / 2, draftFwd: T - t / 2, trim: t, volume: L * B * T, displacement: at(T), lcb: L / 2 - (L * L * tanTheta) / (12 * T), vcb: T / 2 + (t * t) / (24 * T), lcf: L / 2 },
        WRITTEN,
      );
    });
    // The displacement of the level box at T floats at T amidships whatever the trim.
    const by = await post(`/v1/hydrostatics?displacements=${at(1)}&trim=${t}`);
    expectFieldsRelClose(by.rows[0], { draft: 1, draftAft: 1 + t / 2, draftFwd: 1 - t / 2 }, SOLVED);
  });

  test('the trimmed table\'s CSV carries the drafts at the perpendiculars with their units', async () => {
    const csv = await postCsv('/v1/hydrostatics?drafts=1&trim=0.4&fields=draft,draftAft,draftFwd,trim,lcb');
    expect(csv.header).toEqual(['draft_m', 'draftAft_m', 'draftFwd_m', 'trim_m', 'lcb_m']);
    expect(csv.rows[0]!.slice(0, 4).map(Number)).toEqual([1, 1.2, 0.8, 0.4]);
  });
});

describe('a stored hull answers what its offsets answer when posted', () => {
  const model = readOffsetsCsv(BOX).hull;

  test.each([
    ['float', `displacement=${at(1)}&lcg=4.8&kg=1.2&tcg=0.1`, { displacement: at(1), lcg: 4.8, kg: 1.2, tcg: 0.1 }],
    ['cross-curves', `displacements=${at(0.5)},${at(1)}&heels=0,10,30&trim=free`, { displacements: [at(0.5), at(1)], heels: [0, 10, 30], trim: 'free' }],
    ['gz', `displacement=${at(1)}&kg=1.1&fsm=1&heels=0,15,45&openings=2,1.5,1.9`, { displacement: at(1), kg: 1.1, fsm: 1, heels: [0, 15, 45], openings: [{ x: 2, y: 1.5, z: 1.9 }] }],
    ['hydrostatics', `displacements=${at(0.7)}&trim=0.2`, { displacements: [at(0.7)], trim: 0.2 }],
  ] as const)('%s: GET on the stored hull, POST of the file and POST of the JSON model agree, in JSON and CSV', async (name, query, body) => {
    const stored = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/${name}?${query}` });
    const posted = await app.inject({ method: 'POST', url: `/v1/${name}?${query}`, headers: csvHeaders, payload: BOX });
    const json = await app.inject({ method: 'POST', url: `/v1/${name}`, headers: jsonHeaders, payload: { offsets: model, ...body } });
    expect(stored.statusCode, stored.body).toBe(200);
    expect(stored.headers.etag).toMatch(/^"[0-9a-f]{32}"$/);
    expect(JSON.parse(stored.body)).toEqual(JSON.parse(posted.body));
    expect(JSON.parse(json.body)).toEqual(JSON.parse(posted.body));
    const storedCsv = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/${name}?${query}&format=csv` });
    const postedCsv = await app.inject({ method: 'POST', url: `/v1/${name}?${query}&format=csv`, headers: csvHeaders, payload: BOX });
    expect(storedCsv.body.startsWith(`# ${CAUTION}\r\n`)).toBe(true);
    expect(storedCsv.body).toBe(postedCsv.body);
  });
});
