/**
 * No answer carries NaN, an infinity, or a null the documentation does not promise,
 * over a generated corpus of 2,000 mutated offsets files (the demo hulls and a points
 * table, with cells, rows, units and perpendiculars changed at random to extreme, tiny,
 * zero, malformed and out-of-range values, one to three changes a file, from a fixed
 * seed). Each file goes through the service in-process (inject): the hydrostatic table
 * on every file, the check on every fourth; the sheet, the Bonjean data, the sectional
 * areas, the CSV forms and a stored copy written back in feet-inches-eighths on every
 * twentieth; and the command line on every twentieth. (So the run stays a few seconds.)
 *
 * The outside reference for "documented" is the OpenAPI document's own schemas (zod,
 * whose z.number() takes finite numbers only, and .nullable() only where README says a
 * value may be null): every 2xx JSON answer must parse with its route's result schema.
 * Every other answer must be a 4xx problem document: never a 5xx.
 */
import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { z } from 'zod';
import { main } from '../../cli/main.js';
import type { CliIo } from '../../cli/io.js';
import { buildApp } from '../../server/app.js';
import { COMPUTATIONS } from '../../server/computations/index.js';
import { HullRecordSchema } from '../../server/responseSchemas.js';
import { csvHeaders } from '../fixtures/serverHelpers.js';

const demo = (name: string): string => readFileSync(new URL(`../../offsets-demo/${name}`, import.meta.url), 'utf8');
const POINTS = [
  '# name: points launch',
  'x,y,z,knuckle',
  ...[0, 1, 2, 3, 4].flatMap((x) => [`${x},0,0,1`, `${x},0.6,0.2,1`, `${x},0.9,0.6,0`, `${x},1,1.2,1`]),
].join('\n');
const BASES = [demo('workboat.csv'), demo('workboat-ftin.csv'), demo('survey-launch.csv'), POINTS];

/** Park and Miller's minimal standard generator (CACM 31(10), 1988): the same corpus every run. */
function generator(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 16807) % 2147483647) / 2147483647;
}

const CELLS = ['1e308', '-1e308', '1e-320', '5e-324', '0', '-0', '1e20', '9999.9999', '10000.1', '-5000', 'NaN', 'Infinity', '1e999', '0x10', '0b1', '', ' ', 'abc', '3-4-5+', `${'9'.repeat(320)}-0-0`, '1'.repeat(400), '-1', '1e-9', '=1+2', '"1,5"'];
const META = ['# units: mm', '# units: ft', '# units: in', '# units: ft-in-8', '# ap: -1e308', '# fp: 1e308', '# ap: 0', '# fp: 1e-300', '# ap: 20000', '# name: a,=1+2'];

function mutate(text: string, rnd: () => number): string {
  const lines = text.split('\n');
  const pick = <T>(a: readonly T[]): T => a[Math.floor(rnd() * a.length)]!;
  const changes = 1 + Math.floor(rnd() * 3);
  for (let c = 0; c < changes; c++) {
    const table = lines.map((_l, k) => k).filter((k) => lines[k]!.trim() !== '' && !lines[k]!.startsWith('#'));
    if (table.length < 2) break;
    const kind = rnd();
    const at = pick(table.slice(1));
    if (kind < 0.55) {
      const cells = lines[at]!.split(',');
      cells[Math.floor(rnd() * cells.length)] = pick(CELLS);
      lines[at] = cells.join(',');
    } else if (kind < 0.65) {
      lines[at] = lines[at]!.split(',').map((v, j) => (j === 0 ? v : '0')).join(',');
    } else if (kind < 0.72) {
      lines.splice(at, 1);
    } else if (kind < 0.78) {
      lines.splice(at, 0, lines[at]!);
    } else if (kind < 0.85) {
      lines.splice(table[0]!, 0, pick(META));
    } else if (kind < 0.92) {
      // Every number of a row scaled by a large or tiny factor.
      const f = pick([1e6, 1e-6, 1e300, 1e-300]);
      lines[at] = lines[at]!.split(',').map((v) => (Number.isFinite(Number(v)) && v.trim() !== '' ? String(Number(v) * f) : v)).join(',');
    } else {
      const cells = lines[table[0]!]!.split(',');
      cells[1 + Math.floor(rnd() * (cells.length - 1))] = pick(CELLS);
      lines[table[0]!] = cells.join(',');
    }
  }
  return lines.join('\n');
}

const N = 2000;
const rnd = generator(20261202);
const corpus = Array.from({ length: N }, (_, k) => mutate(BASES[k % BASES.length]!, rnd));
const schemaOf = (name: string): z.ZodType => COMPUTATIONS.find((c) => c.name === name)!.result;

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
});
afterAll(async () => {
  await app.close();
});

/** Findings: a 5xx, a 2xx answer its schema refuses, or NaN or Infinity in a CSV. */
const faults: string[] = [];
function look(k: number, what: string, status: number, body: string, schema?: z.ZodType): void {
  if (status >= 500) faults.push(`file ${k}, ${what}: ${status} ${body.slice(0, 200)}`);
  else if (status < 300 && schema !== undefined) {
    const r = schema.safeParse(JSON.parse(body));
    if (!r.success) faults.push(`file ${k}, ${what}: ${JSON.stringify(r.error.issues.slice(0, 2))}`);
  } else if (status < 300 && /\b(NaN|Infinity|null)\b/.test(body.split('\n').filter((l) => !l.startsWith('#')).join('\n'))) {
    faults.push(`file ${k}, ${what}: a CSV cell holds NaN, Infinity or null`);
  }
}

describe(`a corpus of ${N} mutated offsets files`, () => {
  test('mutates every file', () => {
    expect(new Set(corpus).size).toBeGreaterThan(N * 0.9);
    expect(corpus.filter((c) => BASES.includes(c)).length).toBeLessThan(N / 100);
  });

  test('gets no 5xx and no NaN, Infinity or undocumented null from the service', async () => {
    for (let k = 0; k < N; k++) {
      const payload = corpus[k]!;
      const drafts = k % 7 === 0 ? '5e-324,0.5' : '0.3,1.5';
      const post = (url: string) => app.inject({ method: 'POST', url, headers: csvHeaders, payload });
      let r = await post(`/v1/hydrostatics?drafts=${drafts}`);
      look(k, 'hydrostatics', r.statusCode, r.body, schemaOf('hydrostatics'));
      if (k % 4 !== 0) continue;
      r = await post('/v1/check');
      look(k, 'check', r.statusCode, r.body, schemaOf('check'));
      if (k % 20 !== 0) continue;
      for (const [name, query] of [['sheet', 'draft=0.5'], ['bonjean', 'drafts=0.5'], ['areas', 'draft=0.5']] as const) {
        r = await post(`/v1/${name}?${query}`);
        look(k, name, r.statusCode, r.body, schemaOf(name));
        r = await post(`/v1/${name}?${query}&format=csv`);
        look(k, `${name} csv`, r.statusCode, r.body);
      }
      r = await post(`/v1/hydrostatics?drafts=${drafts}&format=csv`);
      look(k, 'hydrostatics csv', r.statusCode, r.body);
      r = await post('/v1/hulls');
      look(k, 'store', r.statusCode, r.body, HullRecordSchema);
      if (r.statusCode === 201) {
        const { id } = JSON.parse(r.body) as { id: string };
        const back = await app.inject({ method: 'GET', url: `/v1/hulls/${id}?format=csv&units=ft-in-8` });
        look(k, 'stored copy in ft-in-8', back.statusCode, back.body);
        await app.inject({ method: 'DELETE', url: `/v1/hulls/${id}` });
      }
    }
    expect(faults).toEqual([]);
  }, 60_000);

  test('gets no NaN, Infinity or undocumented null from the command line', async () => {
    const found: string[] = [];
    for (let k = 0; k < N; k += 20) {
      for (const format of ['json', 'csv']) {
        let out = '';
        const io: CliIo = {
          stdout: { write: (t: string) => (out += t), isTTY: false },
          stderr: { write: () => undefined },
          readStdin: async () => new TextEncoder().encode(corpus[k]!),
          readFile: async () => new Uint8Array(),
          env: {},
        };
        const code = await main(['hydrostatics', '-', '--drafts', '0.3,0.5,1,1.5', '--format', format], io);
        if (code === 1) found.push(`file ${k}: internal fault`);
        if (code !== 0) continue;
        if (format === 'json') {
          const r = schemaOf('hydrostatics').safeParse(JSON.parse(out));
          if (!r.success) found.push(`file ${k}, json: ${JSON.stringify(r.error.issues.slice(0, 2))}`);
        } else if (/\b(NaN|Infinity|null)\b/.test(out)) found.push(`file ${k}, csv: NaN, Infinity or null`);
      }
    }
    expect(found).toEqual([]);
  });
});
