/**
 * Load on the HTTP service, run by `npm run bench:http` (compiled to
 * dist/bench/http.bench.js). The service runs as its own process (dist/server/main.js,
 * logging at info to a file, as in use) on 127.0.0.1 only; autocannon loads it from
 * this process, so the two share the machine's cores as a client and a server would.
 * Each scenario runs for a fixed time after a short warm-up:
 *
 *   a. GET /healthz: the floor, what the framework, logging and a socket cost
 *   b. a stored hull's table at 20 drafts, the same URL every time (the prepared hull
 *      comes from the cache; the table is computed every time)
 *   c. a stored hull's table at 20 drafts that differ on every request (the compute path)
 *   d. the stateless table: the offsets file in the body of every request, read each time
 *
 * Printed: requests/s, p50 and p99 latency, and whether the compute path meets its
 * targets (>= 1,000 req/s with p99 < 25 ms, and >= 80 % of its ideal rate).
 *
 * The ideal rate of the compute path is what one event loop could give if the route
 * cost nothing beyond the bare route (/healthz) and the work itself: 1 / (1 / healthz
 * rate + the in-process time of the same 20-draft table and its JSON text on the
 * prepared hull), both measured in this run, so the machine's load of the moment
 * affects both sides alike.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, openSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { createServer } from 'node:net';
import { cpus, loadavg, platform, release, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';
import { prepareHull } from '../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../core/offsets/readOffsets.js';
import { writeAnswer } from '../core/report/answerForm.js';
import { HYDROSTATICS_FORM, hydrostaticResult } from '../core/report/formatHydrostatics.js';
import { DEFAULT_OUTPUT } from '../core/report/outputOptions.js';
import { SI_CONVERTER } from '../core/report/unitConversion.js';
import { hydrostaticTable } from '../core/upright/hydrostatics.js';

interface Histogram {
  average: number;
  p50: number;
  p99: number;
}
interface Result {
  requests: Histogram;
  latency: Histogram;
  non2xx: number;
  errors: number;
  timeouts: number;
}
interface RawRequest {
  method?: string;
  path?: string;
  headers?: Record<string, string>;
  body?: string;
}
type Autocannon = (opts: {
  url: string;
  connections: number;
  duration: number;
  method?: string;
  headers?: Record<string, string>;
  body?: string;
  requests?: { setupRequest?: (req: RawRequest) => RawRequest }[];
}) => Promise<Result>;

const autocannon = createRequire(import.meta.url)('autocannon') as Autocannon;

const SECONDS = Number(process.env.BENCH_SECONDS ?? 5);
const WARMUP = 1;
const CONNECTIONS = 10;
const HOST = '127.0.0.1';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, HOST, () => {
      const addr = s.address();
      const port = typeof addr === 'object' && addr !== null ? addr.port : 0;
      s.close(() => resolve(port));
    });
  });
}

async function waitForHealth(base: string): Promise<void> {
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(`${base}/healthz`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('the service did not come up');
}

/** 20 drafts from 0.2 m in steps of 0.09 m, shifted: inside the demo workboat (keel 0, deck edge 2.2 m). */
function drafts(shift: number): string {
  return Array.from({ length: 20 }, (_, k) => (0.2 + shift + 0.09 * k).toFixed(9)).join(',');
}

/** Median time, ms, of the 20-draft table of the demo workboat and its JSON text (through the shared output step, as the service writes it), in this process. */
function inProcessTableMs(offsets: string): number {
  const { hull } = readOffsetsCsv(offsets);
  const prepared = prepareHull(hull);
  const times: number[] = [];
  let shift = 0;
  for (let round = 0; round < 30; round++) {
    const t0 = performance.now();
    for (let k = 0; k < 100; k++) {
      const d = drafts(++shift * 1e-9).split(',').map(Number);
      writeAnswer(HYDROSTATICS_FORM, hydrostaticResult(hull, 1.025, hydrostaticTable(prepared, d, 1.025)), 'json', DEFAULT_OUTPUT, SI_CONVERTER);
    }
    times.push((performance.now() - t0) / 100);
  }
  times.sort((a, b) => a - b);
  return times[times.length >> 1]!;
}

/** A shift of the drafts that no request before has used (a nanometre more each time), so no answer can come from a cache. */
let requestCount = 0;
const freshShift = (): number => ++requestCount * 1e-9;

interface Figure {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  bad: number;
}

async function run(name: string, opts: Parameters<Autocannon>[0]): Promise<Figure> {
  await autocannon({ ...opts, duration: WARMUP });
  const r = await autocannon({ ...opts, duration: SECONDS });
  return { name, rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, bad: r.non2xx + r.errors + r.timeouts };
}

const root = fileURLToPath(new URL('../../', import.meta.url));
const dataDir = mkdtempSync(join(tmpdir(), 'halfbreadth-bench-'));
const port = await freePort();
const base = `http://${HOST}:${port}`;
const log = openSync(join(dataDir, 'service.log'), 'w');
const service = spawn(process.execPath, [join(root, 'dist/server/main.js')], {
  env: { ...process.env, PORT: String(port), HOST, HALFBREADTH_DATA: dataDir },
  stdio: ['ignore', log, log],
});

try {
  await waitForHealth(base);
  const hull = `${base}/v1/hulls/demo-workboat/hydrostatics`;
  const offsets = readFileSync(join(root, 'offsets-demo/workboat.csv'), 'utf8');
  const figures: Figure[] = [];
  figures.push(await run('GET /healthz', { url: `${base}/healthz`, connections: CONNECTIONS, duration: SECONDS }));
  figures.push(await run('stored hull, same 20 drafts', { url: `${hull}?drafts=${drafts(0)}`, connections: CONNECTIONS, duration: SECONDS }));
  figures.push(
    await run('stored hull, 20 drafts new each request', {
      url: hull,
      connections: CONNECTIONS,
      duration: SECONDS,
      requests: [{ setupRequest: (req) => ({ ...req, method: 'GET', path: `/v1/hulls/demo-workboat/hydrostatics?drafts=${drafts(freshShift())}` }) }],
    }),
  );
  figures.push(
    await run('offsets in the body, 20 drafts', {
      url: `${base}/v1/hydrostatics?drafts=${drafts(0)}`,
      connections: CONNECTIONS,
      duration: SECONDS,
      method: 'POST',
      headers: { 'content-type': 'text/csv' },
      body: offsets,
    }),
  );

  const tableMs = inProcessTableMs(offsets);
  const cpu = cpus()[0]?.model ?? 'unknown cpu';
  process.stdout.write(`Halfbreadth HTTP bench: ${platform()} ${release()}, ${cpus().length} x ${cpu}, Node ${process.version}, load ${loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
  process.stdout.write(`${CONNECTIONS} connections, ${SECONDS} s per scenario after ${WARMUP} s warm-up, service and load on ${HOST}\n\n`);
  process.stdout.write(`${'scenario'.padEnd(42)}${'req/s'.padStart(9)}${'p50 ms'.padStart(9)}${'p99 ms'.padStart(9)}${'not 2xx'.padStart(9)}\n`);
  for (const f of figures) {
    process.stdout.write(`${f.name.padEnd(42)}${f.rps.toFixed(0).padStart(9)}${f.p50.toFixed(1).padStart(9)}${f.p99.toFixed(1).padStart(9)}${String(f.bad).padStart(9)}\n`);
  }
  const health = figures[0]!;
  const compute = figures[2]!;
  const ideal = 1 / (1 / health.rps + tableMs / 1000);
  const share = compute.rps / ideal;
  process.stdout.write(`\nin process: 20-draft table and its JSON text ${(tableMs * 1000).toFixed(0)} us; ideal compute-path rate ${ideal.toFixed(0)} req/s\n`);
  const checks = [
    [`compute path >= 1000 req/s`, compute.rps >= 1000],
    [`compute path p99 < 25 ms`, compute.p99 < 25],
    [`compute path >= 80 % of its ideal (${(100 * share).toFixed(0)} %)`, share >= 0.8],
    ['every answer 2xx', figures.every((f) => f.bad === 0)],
  ] as const;
  process.stdout.write('\n');
  for (const [what, ok] of checks) process.stdout.write(`${ok ? 'met   ' : 'MISSED'} ${what}\n`);
} finally {
  service.kill('SIGTERM');
  await new Promise((r) => service.once('exit', r));
  rmSync(dataDir, { recursive: true, force: true });
}
