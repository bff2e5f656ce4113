/**
 * Imperial answers of every command of the command line and every computed route of the
 * service, against the SI answers converted with the declared factors.
 *
 * The factors are written here as literals (the international yard and pound agreement
 * of 1959: 1 ft = 0.3048 m, 1 in = 2.54 cm, 1 lb = 0.45359237 kg, so 1 long ton =
 * 2240 lb = 1.0160469088 t), and the unit of every number is taken from the name of its
 * field as the conventions' table and the sheet's definitions give it (UNIT_OF), not from
 * the project's own unit declarations. Both answers are asked for with 17 digits, so the
 * comparison is of the conversion alone. Drafts are typed in feet-inches-eighths for the
 * imperial answers (4-3-0 = 4.25 ft = 1.2954 m; 3-0-0 = 3 ft = 0.9144 m).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { buildApp } from '../../server/app.js';
import { csvHeaders } from '../fixtures/serverHelpers.js';
import { relativeError } from '../helpers/relClose.js';
import { runCli } from '../helpers/runCli.js';

const FOOT = 0.3048;
const LONG_TON = 1.0160469088;
const FACTOR: Readonly<Record<string, number>> = {
  m: 1 / FOOT,
  m2: 1 / FOOT ** 2,
  m3: 1 / FOOT ** 3,
  m4: 1 / FOOT ** 4,
  t: 1 / LONG_TON,
  't/cm': 2.54 / LONG_TON,
  't.m/cm': 2.54 / (LONG_TON * FOOT),
  '-': 1,
};

/** The unit of each field, by name: the conventions' field table, the sheet's products by their definitions, counts and ratios none. */
const UNIT_OF: Readonly<Record<string, string>> = {
  draft: 'm', volume: 'm3', displacement: 't', lcb: 'm', vcb: 'm', waterplaneArea: 'm2', lcf: 'm', iT: 'm4', iL: 'm4',
  bmt: 'm', bml: 'm', kmt: 'm', kml: 'm', tpc: 't/cm', mct1cm: 't.m/cm', lwl: 'm', bwl: 'm', am: 'm2',
  cb: '-', cm: '-', cp: '-', cwp: '-', wettedSurface: 'm2',
  ap: 'm', fp: 'm', lbp: 'm', amidships: 'm', x: 'm', z: 'm', keel: 'm', deck: 'm', area: 'm2', momentZ: 'm3', fraction: '-',
  spacing: 'm', commonFactor: 'm', halfBreadth: 'm', lever: 'm', multiplier: '-', station: '-',
  areaSM: 'm2', areaSMLever: 'm3', momentZSM: 'm3', ySM: 'm', ySMLever: 'm2', ySMLever2: 'm3', y3SM: 'm3',
  product: 'm', sum: 'm', waterlineHalfBreadth: 'm', sectionArea: 'm2', zFrom: 'm', zTo: 'm', from: 'm', to: 'm', heights: 'm',
  lowestKeel: 'm', lowestDeck: 'm', lowest: 'm', highest: 'm', above: 'm', atMost: 'm', value: 'm', suggested: 'm',
  // Counts and indices.
  stations: '-', waterlines: '-', points: '-', knuckles: '-', point: '-', lines: '-', line: '-', column: '-',
  // Density stays in t/m3 in both systems.
  density: '-',
};
const IMPERIAL_NAME: Readonly<Record<string, string>> = { tpc: 'tpi', mct1cm: 'mti' };

/** Every number of `si` against the same place of `imp`, converted by the unit its field's name gives; returns how many were compared. */
function expectConverted(si: unknown, imp: unknown, key = '', path = ''): number {
  if (typeof si === 'number') {
    const unit = UNIT_OF[key];
    if (unit === undefined) throw new Error(`no unit is known here for the field '${key}' (${path})`);
    const want = si * FACTOR[unit]!;
    const got = imp as number;
    const ok = Math.abs(got - want) <= 1e-9 * Math.max(1e-3, Math.abs(want)) || relativeError(got, want) < 1e-12;
    expect(ok, `${path}: imperial ${got}, SI ${si} x ${FACTOR[unit]} = ${want}`).toBe(true);
    return 1;
  }
  if (Array.isArray(si)) {
    expect(Array.isArray(imp), path).toBe(true);
    expect((imp as unknown[]).length, path).toBe(si.length);
    return si.reduce<number>((n, v, i) => n + expectConverted(v, (imp as unknown[])[i], key, `${path}[${i}]`), 0);
  }
  if (si !== null && typeof si === 'object') {
    let n = 0;
    for (const [k, v] of Object.entries(si)) {
      const name = IMPERIAL_NAME[k] ?? k;
      expect(imp as object, `${path}.${name}`).toHaveProperty([name]);
      n += expectConverted(v, (imp as Record<string, unknown>)[name], k, `${path}.${k}`);
    }
    return n;
  }
  return 0;
}

const WORKBOAT = fileURLToPath(new URL('../../offsets-demo/workboat.csv', import.meta.url));
const WORKBOAT_TEXT = readFileSync(WORKBOAT, 'utf8');

async function cli(argv: string[]): Promise<unknown> {
  const { code, out, err } = await runCli(argv);
  expect(code, err).toBe(0);
  return JSON.parse(out);
}

describe('every command in imperial units is its SI answer converted', () => {
  test.each([
    ['hydrostatics', ['--drafts', '0.9144,1.2954'], ['--drafts', '3-0-0,4-3-0']],
    ['sheet', ['--draft', '1.2954'], ['--draft', '4-3-0']],
    ['bonjean', ['--drafts', '1.2954'], ['--drafts', '4.25']],
    ['areas', ['--draft', '1.2954'], ['--draft', '4-3-0']],
    ['check', [], []],
  ])('%s', async (command, siArgs, impArgs) => {
    const common = [command, WORKBOAT, '--format', 'json', '--digits', '17'];
    const si = await cli([...common, ...siArgs]);
    const imp = (await cli([...common, ...impArgs, '--units', 'imperial'])) as { units: string };
    expect(imp.units).toBe('imperial');
    expect(expectConverted(si, imp)).toBeGreaterThan(command === 'check' ? 10 : 20);
  });
});

describe('every computed route with units=imperial is its SI answer converted', () => {
  let app: FastifyInstance;
  beforeAll(async () => {
    app = await buildApp({ dataDir: ':memory:', logger: false });
    const put = await app.inject({ method: 'PUT', url: '/v1/hulls/workboat', headers: csvHeaders, payload: WORKBOAT_TEXT });
    expect(put.statusCode).toBe(201);
  });
  afterAll(async () => {
    await app.close();
  });

  const body = async (url: string): Promise<unknown> => {
    const res = await app.inject({ method: 'GET', url });
    expect(res.statusCode, res.body).toBe(200);
    return JSON.parse(res.body);
  };

  test.each([
    ['hydrostatics', 'drafts=0.9144,1.2954', 'drafts=3-0-0:1-3-0:4-3-0'],
    ['sheet', 'draft=1.2954', 'draft=4-3-0'],
    ['bonjean', 'drafts=1.2954', 'drafts=4-3-0'],
    ['areas', 'draft=1.2954', 'draft=4.25'],
    ['check', '', ''],
  ])('GET /v1/hulls/{id}/%s', async (name, siQuery, impQuery) => {
    const si = await body(`/v1/hulls/workboat/${name}?${siQuery}&digits=17`);
    const imp = (await body(`/v1/hulls/workboat/${name}?${impQuery}&digits=17&units=imperial`)) as { units: string };
    expect(imp.units).toBe('imperial');
    expect(expectConverted(si, imp)).toBeGreaterThan(name === 'check' ? 5 : 20);
  });

  test('POST with a JSON body: drafts in feet, the answer in feet and long tons', async () => {
    const model = (JSON.parse((await app.inject({ method: 'GET', url: '/v1/hulls/workboat' })).body) as { offsets: unknown }).offsets;
    const post = async (units: string, drafts: number[]): Promise<unknown> => {
      const res = await app.inject({ method: 'POST', url: `/v1/hydrostatics?digits=17${units}`, payload: { offsets: model, drafts } });
      expect(res.statusCode, res.body).toBe(200);
      return JSON.parse(res.body);
    };
    expectConverted(await post('', [0.9144, 1.2954]), await post('&units=imperial', [3, 4.25]));
  });

  test('the CSV says its units in its headers and its lines', async () => {
    const res = await app.inject({ method: 'GET', url: '/v1/hulls/workboat/hydrostatics?drafts=4-3-0&units=imperial&format=csv&fields=draft,displacement,tpi,mti' });
    const lines = res.body.split('\r\n');
    expect(lines).toContain('draft_ft,displacement_LT,tpi_LT_per_in,mti_LTft_per_in');
    expect(res.body).toContain('AP at x = 0 ft; amidships at x = ');
    expect(lines.find((l) => l.startsWith('4.25,'))).toBeDefined();
  });
});
