/**
 * The stability routes' other forms through `inject`: imperial answers, ETags, the
 * stability plots and the report's stability, the demo survey launch stored and posted,
 * and the codes their problems carry.
 *
 * Sources (outside the project):
 * - Unit factors from mathjs's unit definitions (a unit library from the registry): the
 *   foot in metres and the long ton, 2240 lb, in tonnes.
 * - HTTP: RFC 9110, 13.1.2 (If-None-Match) and 15.4.5 (304 Not Modified).
 * - A box barge L x B x D at draft T, wall-sided (E. C. Tupper, Introduction to Naval
 *   Architecture, 5th ed., 2013, ch. 4; from memory): KB = T/2, BM = B^2 / (12 T),
 *   GZ = sin phi (GM + BM tan^2 phi / 2) and KN = sin phi (KB + BM + BM tan^2 phi / 2)
 *   until the deck edge immerses or the bilge emerges. The plots are read back from their
 *   own tick labels (test/helpers/svgRead.ts) and held to these.
 * - The demo survey launch, a hull with no closed form, against the principles the
 *   figures must obey: Archimedes (at its floating position the hull displaces the load,
 *   and with no KG its LCB is the LCG); metacentric theory (GZ / sin phi tends to
 *   GM0 = KMt - KG as the heel tends to zero: Tupper, ch. 4, from memory); and the
 *   conventions' GZ = KN - KG sin phi.
 * Where an answer is compared with the same computation by another road (a stored hull
 * and its posted offsets, the report's figure and the plot route's SVG), the check is of
 * the plumbing; core's tests hold the numbers and the drawings to closed forms.
 */
import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { unit } from 'mathjs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { ERROR_CODES } from '../../core/common/errors.js';
import { buildApp } from '../../server/app.js';
import { preloadDemo } from '../../server/preloadDemo.js';
import { BAD_REQUESTS } from '../fixtures/badRequests.js';
import { csvHeaders, deckedBoxCsv } from '../fixtures/serverHelpers.js';
import { relClose } from '../helpers/relClose.js';
import { all, attr, axisScale, hasVertex, parseSvg, pathVertices, textOf } from '../helpers/svgRead.js';
import { boxMetacentre, wallSidedGz } from '../fixtures/wallSided.js';

const FT = unit(1, 'ft').toNumber('m');
const INCH_CM = unit(1, 'in').toNumber('cm');
const LT = unit(2240, 'lbm').toNumber('t');
/** Imperial value per SI value, by the SI unit of a field: feet, long tons, and TPI and MTI per inch. */
const PER_SI: Readonly<Record<string, number>> = {
  m: 1 / FT, m2: 1 / FT ** 2, m3: 1 / FT ** 3, m4: 1 / FT ** 4, t: 1 / LT, 't.m': 1 / (LT * FT), 'm.rad': 1 / FT, 't/cm': INCH_CM / LT, 't.m/cm': INCH_CM / (LT * FT), '-': 1,
};
/** Fields named for their unit, renamed in imperial answers (TPC becomes TPI, MCT 1 cm MTI). */
const IMPERIAL_NAME: Readonly<Record<string, string>> = { tpc: 'tpi', mct1cm: 'mti' };
/** The SI unit of each number of the stability answers, by its field's name (the conventions' field table and the answers' schemas). */
const UNIT_OF: Readonly<Record<string, string>> = {
  ap: 'm', fp: 'm', lbp: 'm', stations: '-', waterlines: '-', density: '-',
  displacement: 't', displacements: 't', lcg: 'm', tcg: 'm', kg: 'm', draftAft: 'm', draftFwd: 'm', trim: 'm', heel: '-', draft: 'm',
  lcb: 'm', tcb: 'm', vcb: 'm', volume: 'm3', longitudinal: 'm', transverse: 'm', kn: 'm',
  fsm: 't.m', kgEffective: 'm', gm0: 'm', gm: 'm', gz: 'm', area: 'm.rad', maxGz: 'm', angleOfMaxGz: '-', vanishingAngle: '-', lollAngle: '-', downfloodingAngle: '-',
  waterplaneArea: 'm2', lcf: 'm', iT: 'm4', iL: 'm4', bmt: 'm', bml: 'm', kmt: 'm', kml: 'm', tpc: 't/cm', mct1cm: 't.m/cm',
  lwl: 'm', bwl: 'm', am: 'm2', wettedSurface: 'm2', cb: '-', cm: '-', cp: '-', cwp: '-',
};

/**
 * Every number of the SI answer against the same place of the imperial one, converted by
 * its field's unit; the criteria stay in the rule's units (m.rad, m, deg) in both. Inputs
 * typed in feet and long tons convert back to the SI inputs only to the last bit, and a
 * solved figure moves with them by about that much: 1e-9 relative, 1e-12 absolute near zero.
 */
function expectConverted(si: unknown, imp: unknown, key = '', path = ''): number {
  if (typeof si === 'number') {
    const u = UNIT_OF[key];
    if (u === undefined) throw new Error(`no unit is known here for '${key}' (${path})`);
    const want = si * PER_SI[u]!;
    expect(relClose(imp as number, want, { rel: 1e-9, abs: 1e-12 }), `${path}: imperial ${String(imp)}, SI ${si} gives ${want}`).toBe(true);
    return 1;
  }
  if (Array.isArray(si)) {
    expect((imp as unknown[]).length, path).toBe(si.length);
    return si.reduce<number>((n, v, i) => n + expectConverted(v, (imp as unknown[])[i], key, `${path}[${i}]`), 0);
  }
  if (si !== null && typeof si === 'object') {
    let n = 0;
    for (const [k, v] of Object.entries(si)) {
      const other = (imp as Record<string, unknown>)[IMPERIAL_NAME[k] ?? k];
      if (k === 'criteria') {
        // The rule's units whatever the answer's: the same verdicts, to the same figures.
        const a = v as { id: string; required: number; actual: number; unit: string; pass: boolean }[];
        const b = other as typeof a;
        expect(b.map((c) => [c.id, c.required, c.unit, c.pass])).toEqual(a.map((c) => [c.id, c.required, c.unit, c.pass]));
        a.forEach((c, i) => expect(relClose(b[i]!.actual, c.actual, { rel: 1e-9, abs: 1e-12 }), `${c.id} in ${c.unit}`).toBe(true));
        continue;
      }
      n += expectConverted(v, other, k, `${path}.${k}`);
    }
    return n;
  }
  if (si !== imp) expect(imp, path).toEqual(si);
  return 0;
}

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const RAD = Math.PI / 180;
const BOX = deckedBoxCsv('forms box', L, B, D);
const at = (T: number): number => RHO * L * B * T;
const boxGz = (T: number, kg: number, deg: number): number => {
  const { km, bm } = boxMetacentre(B, T);
  return wallSidedGz(km - kg, bm, deg);
};
const SURVEY_LAUNCH = readFileSync(new URL('../../offsets-demo/survey-launch.csv', import.meta.url), 'utf8');

let app: FastifyInstance;
let id: string;
beforeAll(async () => {
  // Every computation on the request thread: the demo launch's GZ curve would go to a
  // worker thread, whose start costs a second; workerThreads.test.ts holds the two roads equal.
  app = await buildApp({ limits: { inlineWork: 1e9 } });
  preloadDemo(app.halfbreadth.store, new URL('../../offsets-demo', import.meta.url).pathname);
  id = (JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: BOX })).body) as { id: string }).id;
});
afterAll(async () => {
  await app.close();
});

async function get(url: string): Promise<{ body: string; etag: string; json: () => Record<string, any> }> {
  const res = await app.inject({ method: 'GET', url });
  expect(res.statusCode, `${url}: ${res.body}`).toBe(200);
  return { body: res.body, etag: String(res.headers.etag), json: () => JSON.parse(res.body) as Record<string, any> };
}

describe('units=imperial', () => {
  // SI inputs, and the same in feet and long tons.
  const T = 1;
  test.each([
    ['float', { displacement: at(T), lcg: 4.8, kg: 1.2, tcg: 0.1 }, ''],
    ['cross-curves', { displacements: [at(0.6), at(1.2)], heels: [0, 10, 30] }, '&trim=free'],
    ['gz', { displacement: at(T), kg: 1.1, fsm: 1.5, heels: [0, 15, 45], openings: [[2, 1.5, 1.9]] }, ''],
    ['hydrostatics', { displacements: [at(0.7), at(1.3)], trim: 0.3 }, ''],
  ] as const)('%s: the imperial answer is the SI answer converted, the criteria in the rule\'s units', async (name, params, extra) => {
    const PER: Record<string, number> = { displacement: 1 / LT, displacements: 1 / LT, lcg: 1 / FT, kg: 1 / FT, tcg: 1 / FT, trim: 1 / FT, fsm: 1 / (LT * FT), openings: 1 / FT, heels: 1 };
    const query = (factor: (k: string) => number) =>
      Object.entries(params)
        .map(([k, v]) => {
          const f = factor(k);
          const text = Array.isArray(v) ? v.map((e) => (Array.isArray(e) ? e.map((c) => c * f).join(',') : e * f)).join(k === 'openings' ? ';' : ',') : String((v as number) * f);
          return `${k}=${text}`;
        })
        .join('&');
    const si = (await get(`/v1/hulls/${id}/${name}?${query(() => 1)}${extra}&digits=17`)).json();
    const imp = (await get(`/v1/hulls/${id}/${name}?${query((k) => PER[k]!)}${extra}&digits=17&units=imperial`)).json();
    expect(imp.units).toBe('imperial');
    const { units: _u, fields: _f, ...rest } = imp;
    expect(expectConverted(si, rest)).toBeGreaterThan(10);
  });

  test('the CSV headers say feet, long tons and ft.rad', async () => {
    const head = async (q: string) => (await get(`/v1/hulls/${id}/${q}&units=imperial&format=csv`)).body.split('\r\n').find((l) => !l.startsWith('#'));
    expect(await head('cross-curves?displacements=40&heels=0,10')).toBe('displacement_LT,kn_0deg_ft,kn_10deg_ft');
    expect(await head('gz?displacement=40&kg=3.5&heels=0,10')).toBe('heel_deg,gz_ft,area_ft_rad');
    expect(await head('float?displacement=40&lcg=16')).toBe('displacement_LT,lcg_ft,tcg_ft,kg_ft,draftAft_ft,draftFwd_ft,trim_ft,heel_deg,draft_ft,lcb_ft,tcb_ft,vcb_ft,gm_ft');
  });
});

describe('ETags on the stability routes of a stored hull', () => {
  test.each([
    ['float', `displacement=${at(1)}&lcg=5`, `displacement=${at(1)}&lcg=4.9`],
    ['cross-curves', `displacements=${at(1)}&heels=0,10`, `displacements=${at(1)}&heels=0,20`],
    ['gz', `displacement=${at(1)}&kg=1&heels=0,10`, `displacement=${at(1)}&kg=1.1&heels=0,10`],
    ['hydrostatics', `displacements=${at(1)}&trim=0.2`, `displacements=${at(1)}&trim=0.3`],
    ['plots/gz.svg', `displacement=${at(1)}&kg=1`, `displacement=${at(1)}&kg=1.1`],
    ['plots/cross-curves.svg', `displacements=${at(1)}`, `displacements=${at(1.1)}`],
  ])('%s: a repeat with If-None-Match is 304 with no body; another query is another tag', async (name, query, other) => {
    const url = `/v1/hulls/${id}/${name}?${query}`;
    const first = await get(url);
    expect(first.etag).toMatch(/^"[0-9a-f]{32}"$/);
    const again = await app.inject({ method: 'GET', url, headers: { 'if-none-match': first.etag } });
    expect(again.statusCode).toBe(304);
    expect(again.body).toBe('');
    expect(again.headers.etag).toBe(first.etag);
    const changed = await app.inject({ method: 'GET', url: `/v1/hulls/${id}/${name}?${other}`, headers: { 'if-none-match': first.etag } });
    expect(changed.statusCode).toBe(200);
    expect(changed.headers.etag).not.toBe(first.etag);
    if (!name.startsWith('plots/')) {
      // The answer's form is part of the tag (units=imperial would retype the query's lengths in feet).
      for (const form of ['&format=csv', '&digits=5']) expect((await get(`${url}${form}`)).etag).not.toBe(first.etag);
    }
  });
});

/** The caution as the plot prints it: its lines joined. */
const cautionOf = (svg: string): string =>
  all(parseSvg(svg), 'text')
    .filter((t) => attr(t, 'data-role') === 'caution')
    .map((t) => all(t, 'tspan').map(textOf).join(' '))
    .join(' ');

describe('the stability plots', () => {
  const T = 1;
  const kg = 1;

  test('gz.svg draws the wall-sided GZ of the box, carries the caution, and posted offsets draw the same', async () => {
    const url = `plots/gz.svg?displacement=${at(T)}&kg=${kg}`;
    const stored = await get(`/v1/hulls/${id}/${url}`);
    const posted = await app.inject({ method: 'POST', url: `/v1/${url}`, headers: csvHeaders, payload: BOX });
    expect(posted.statusCode).toBe(200);
    expect(posted.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    expect(posted.body).toBe(stored.body);
    expect(cautionOf(stored.body)).toBe(CAUTION);
    const doc = parseSvg(stored.body);
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    const v = pathVertices(attr(all(doc, 'path').find((p) => attr(p, 'data-curve') === 'gz')!, 'd'));
    // Wall-sided until the deck edge immerses at tan phi = (D - T) / (B/2), 26.6 degrees.
    for (const h of [5, 10, 15, 20, 25]) expect(hasVertex(v, sx(h), sy(boxGz(T, kg, h))), `GZ at ${h} deg`).toBe(true);
  });

  test('cross-curves.svg draws KN of the box at each displacement, one curve per heel, with the caution', async () => {
    const Ts = [0.6, 1, 1.4];
    const url = `plots/cross-curves.svg?displacements=${Ts.map(at).join(',')}&heels=0,5,10`;
    const stored = await get(`/v1/hulls/${id}/${url}`);
    const posted = await app.inject({ method: 'POST', url: `/v1/${url}`, headers: csvHeaders, payload: BOX });
    expect(posted.body).toBe(stored.body);
    expect(cautionOf(stored.body)).toBe(CAUTION);
    const doc = parseSvg(stored.body);
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    for (const h of [5, 10]) {
      const v = pathVertices(attr(all(doc, 'path').find((p) => attr(p, 'data-curve') === `heel ${h}`)!, 'd'));
      for (const t of Ts) expect(hasVertex(v, sx(at(t)), sy(boxGz(t, 0, h))), `KN at ${h} deg, ${at(t)} t`).toBe(true);
    }
  });

  test('the report prints the same cross curves and GZ figures, the verdicts and the caution; a negative GM0 fails', async () => {
    const cross = `displacements=${at(0.6)},${at(1)}&heels=0,10,20`;
    const html = (await get(`/v1/hulls/${id}/report?${cross}&displacement=${at(T)}&kg=${kg}`)).body;
    expect(html).toContain('<h2>Cross curves of stability</h2>');
    expect(html).toContain(`<figure>${(await get(`/v1/hulls/${id}/plots/cross-curves.svg?${cross}`)).body}</figure>`);
    expect(html).toContain(`<figure>${(await get(`/v1/hulls/${id}/plots/gz.svg?displacement=${at(T)}&kg=${kg}`)).body}</figure>`);
    expect(html).toContain(CAUTION.replace(/'/g, '&#39;'));
    expect(html).not.toContain('FAIL');
    // KG 2 m: GM0 = KB + BM - KG = 0.5 + 1.333 - 2 < 0.
    expect((await get(`/v1/hulls/${id}/report?displacement=${at(T)}&kg=2`)).body).toContain('FAIL');
  });
});

describe('the demo survey launch (demo-survey-launch)', () => {
  const url = (q: string) => `/v1/hulls/demo-survey-launch/${q}`;
  const displacement = 4;

  test('float and cross-curves on the stored demo hull answer what its offsets file answers posted', async () => {
    for (const q of [`float?displacement=${displacement}&lcg=4&kg=0.9&tcg=0.05`, `cross-curves?displacements=3,5&heels=0,15,30&trim=free`]) {
      const posted = await app.inject({ method: 'POST', url: `/v1/${q}`, headers: csvHeaders, payload: SURVEY_LAUNCH });
      expect(posted.statusCode, posted.body).toBe(200);
      expect((await get(url(q))).body).toBe(posted.body);
    }
  });

  test('Archimedes: at its floating position the trimmed table gives the load as its displacement, and the LCB at the LCG', async () => {
    const f = (await get(url(`float?displacement=${displacement}&lcg=4&digits=17`))).json();
    expect(Math.abs(f.trim)).toBeGreaterThan(0.1);
    const row = (await get(url(`hydrostatics?drafts=${f.draft}&trim=${f.trim}&digits=17`))).json().rows[0];
    // The floating position is solved to 1e-10 of the volume and 1e-9 of the length.
    expect(row.displacement).toBeRelClose(displacement, 1e-9);
    expect(row.lcb).toBeRelClose(4, 1e-9);
  });

  test('metacentric theory: KN / sin(phi) at 0.1 degrees is KMt, and the GZ curve is KN - KG sin(phi) with GM0 = KMt - KG', async () => {
    const kg = 0.9;
    const kmt = (await get(url(`hydrostatics?displacements=${displacement}&digits=17`))).json().rows[0].kmt as number;
    // Below about 0.4 degrees, where the chine at x = 5.5 m (z = 0.385 m) leaves the water;
    // the curve's own tan^2 term is about 1e-6 of KMt there, and the upright table's
    // waterplane moment and the heeled sections' moments, two quadratures, agree to about 1e-6.
    const small = (await get(url(`cross-curves?displacements=${displacement}&heels=0.1&digits=17`))).json().rows[0];
    expect(small.kn / Math.sin(0.1 * RAD)).toBeRelClose(kmt, 1e-5);
    const heels = [0.1, 15, 30];
    const gz = (await get(url(`gz?displacement=${displacement}&kg=${kg}&heels=${heels.join(',')}&digits=17`))).json();
    expect(gz.gm0).toBeRelClose(kmt - kg, 1e-12);
    expect(gz.criteria.find((c: { id: string }) => c.id === 'gm0').actual).toBe(gz.gm0);
    const cross = (await get(url(`cross-curves?displacements=${displacement}&heels=${heels.join(',')}&trim=free&digits=17`))).json();
    heels.forEach((h, k) => expect(gz.points[k].gz, `GZ at ${h} deg`).toBeRelClose(cross.rows[k].kn - kg * Math.sin(h * RAD), 1e-9));
  });
});

describe('the codes of the stability problems', () => {
  const errorsDoc = readFileSync(new URL('../../docs/errors.md', import.meta.url), 'utf8');
  const stability = BAD_REQUESTS.filter((b) => /\/(float|cross-curves|gz|report|plots\/(gz|cross-curves)\.svg)\b|displacements=|trim=/.test(String(b.request.url)));

  test('each is in the catalogue and in docs/errors.md with the status it is answered with', () => {
    expect(stability.length).toBeGreaterThanOrEqual(30);
    for (const b of stability) {
      expect(Object.hasOwn(ERROR_CODES, b.code), b.code).toBe(true);
      const row = errorsDoc.split('\n').find((l) => l.startsWith(`| \`${b.code}\` |`));
      expect(row, b.code).toBeDefined();
      expect(row!.trim().split('|').at(-2)!.trim(), `${b.title}: ${b.code}`).toBe(String(b.status));
    }
  });
});
