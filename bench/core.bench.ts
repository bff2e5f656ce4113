/**
 * Timings of the core and the command line, run by `npm run bench` (compiled to
 * dist/bench/core.bench.js). Each figure is the median of many runs after warm-up, so
 * that one slow run (a collection, another process) does not set it.
 *
 *   a. read and validate a grid offsets CSV of 101 stations x 41 waterlines
 *   b. the hydrostatic table for it at 200 drafts: prepareHull, then hydrostaticTable,
 *      and the two together
 *   c. the same at 201 x 81 and at 401 x 161, so that growth with size shows
 *   d. the command line end to end on the demo workboat (a child process each run)
 *   e. stability on the 101 x 41 hull: the table at a trim, the floating position of a
 *      load, cross curves (20 displacements x 19 heels, level and free to trim) and a GZ
 *      curve read against the criteria, each with its target
 *
 * The hulls are made here from a smooth formula (not a drawing): a plan shape
 * 1 - 0.8 xi^4 along the length times a section shape that rises from a quarter of the
 * half-breadth at the keel to the whole at the deck. For e the plan is skewed by
 * (1 + 0.2 xi), fuller forward, so that the hull trims as it heels and free trim has
 * work to do (a hull symmetric fore and aft heels without trimming).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { cpus, loadavg, platform, release } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { hydrostaticsAt, hydrostaticTable } from '../core/upright/hydrostatics.js';
import { crossCurves } from '../core/stability/crossCurves.js';
import { floatingPosition } from '../core/stability/floatingPosition.js';
import { rightingLevers } from '../core/stability/rightingLevers.js';
import { trimmedHydrostaticTable } from '../core/stability/trimmedHydrostatics.js';
import { prepareHull } from '../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../core/offsets/readOffsets.js';

const LENGTH = 20; // m
const BEAM = 6; // m
const DEPTH = 3; // m

/** The half-breadth of the formula hull, m; `skew` makes one end fuller than the other. */
function halfBreadth(x: number, z: number, skew: number): number {
  const xi = (2 * x) / LENGTH - 1;
  const zeta = z / DEPTH;
  const plan = (1 - 0.8 * xi ** 4) * (1 + skew * xi);
  const section = 0.25 + 0.75 * (1 - (1 - zeta) ** 3);
  return (BEAM / 2) * plan * section;
}

/** The formula hull as grid CSV text: `stations` rows by `waterlines` columns, offsets to the millimetre. */
export function gridCsv(stations: number, waterlines: number, skew = 0): string {
  const zs = Array.from({ length: waterlines }, (_, k) => (DEPTH * k) / (waterlines - 1));
  const lines = ['# name: bench hull (formula)', '# units: m', ['x', ...zs.map((z) => z.toFixed(4))].join(',')];
  for (let i = 0; i < stations; i++) {
    const x = (LENGTH * i) / (stations - 1);
    lines.push([x.toFixed(4), ...zs.map((z) => halfBreadth(x, z, skew).toFixed(3))].join(','));
  }
  return lines.join('\n') + '\n';
}

/** `count` drafts evenly spread from just above the keel to the deck edge. */
function drafts(count: number): number[] {
  return Array.from({ length: count }, (_, k) => (DEPTH * (k + 1)) / count);
}

interface Timing {
  median: number;
  /** The fastest run: less moved by other work on the machine than the median. */
  best: number;
  reps: number;
}

/**
 * Median wall time of `f`, ms: a warm-up (so the optimising compiler has settled), then
 * at least `minReps` runs and at least `minMs` of running, at most `maxReps` runs.
 */
function measure(f: () => unknown, minReps = 15, minMs = 400, maxReps = 2000): Timing {
  const warm = performance.now();
  for (let k = 0; k < 5 || (performance.now() - warm < 100 && k < maxReps); k++) f();
  const times: number[] = [];
  const start = performance.now();
  while (times.length < maxReps && (times.length < minReps || performance.now() - start < minMs)) {
    const t0 = process.hrtime.bigint();
    f();
    times.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  times.sort((a, b) => a - b);
  const mid = times.length >> 1;
  const median = times.length % 2 === 1 ? times[mid]! : (times[mid - 1]! + times[mid]!) / 2;
  return { median, best: times[0]!, reps: times.length };
}

/** The project folder: the nearest parent holding package.json (this file runs from dist/bench or bench). */
function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, 'package.json'))) {
    const up = dirname(dir);
    if (up === dir) throw new Error('package.json not found above the bench');
    dir = up;
  }
  return dir;
}

interface Line {
  what: string;
  size: string;
  t: Timing;
  target?: number;
}

const TABLE_DRAFTS = 200;

function coreLines(stations: number, waterlines: number, withTargets: boolean): Line[] {
  const size = `${stations} x ${waterlines}`;
  const text = gridCsv(stations, waterlines);
  const { hull } = readOffsetsCsv(text);
  const prepared = prepareHull(hull);
  const ds = drafts(TABLE_DRAFTS);
  const out: Line[] = [
    { what: 'a. read and validate grid CSV', size, t: measure(() => readOffsetsCsv(text)) },
    { what: 'b. prepareHull', size, t: measure(() => prepareHull(hull)) },
    { what: `b. hydrostaticTable, ${TABLE_DRAFTS} drafts`, size, t: measure(() => hydrostaticTable(prepared, ds)) },
    { what: `b. prepare + table, ${TABLE_DRAFTS} drafts`, size, t: measure(() => hydrostaticTable(prepareHull(hull), ds)) },
  ];
  if (withTargets) out[3]!.target = 5;
  return out;
}

const RHO = 1.025;

function stabilityLines(stations: number, waterlines: number): Line[] {
  const size = `${stations} x ${waterlines}`;
  const prepared = prepareHull(readOffsetsCsv(gridCsv(stations, waterlines, 0.2)).hull);
  const at = (d: number): number => hydrostaticsAt(prepared, d, RHO).displacement;
  const displacements = Array.from({ length: 20 }, (_, k) => at(0.3 + 0.09 * k));
  const heels = Array.from({ length: 19 }, (_, k) => 5 * k);
  const design = hydrostaticsAt(prepared, 1.5, RHO);
  const trimmedDrafts = drafts(TABLE_DRAFTS).map((d) => 0.4 + 0.5 * d);
  return [
    { what: `e. table at 0.2 m trim, ${TABLE_DRAFTS} drafts`, size, t: measure(() => trimmedHydrostaticTable(prepared, trimmedDrafts, 0.2, RHO)) },
    {
      what: 'e. floating position, LCG 0.3 m aft of LCB',
      size,
      t: measure(() => floatingPosition(prepared, { displacement: design.displacement, lcg: design.lcb - 0.3 }, RHO)),
      target: 5,
    },
    { what: 'e. cross curves 20 x 19, level trim', size, t: measure(() => crossCurves(prepared, displacements, heels, RHO, 'level'), 5, 400, 200), target: 150 },
    { what: 'e. cross curves 20 x 19, free trim', size, t: measure(() => crossCurves(prepared, displacements, heels, RHO, 'free'), 5, 400, 200), target: 1500 },
    {
      what: 'e. GZ curve and criteria, KG 2 m',
      size,
      t: measure(() => rightingLevers(prepared, { displacement: design.displacement, kg: 2 }, RHO)),
      target: 30,
    },
  ];
}

function commandLine(root: string): Line {
  const bin = join(root, 'bin', 'halfbreadth.js');
  const args = [bin, 'hydrostatics', join(root, 'offsets-demo', 'workboat.csv'), '--drafts', '0.1:0.01:2.2', '--format', 'csv'];
  const once = (): void => {
    const r = spawnSync(process.execPath, args, { cwd: root, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`the command line failed (exit ${r.status}): ${r.stderr}`);
  };
  // Each run is a whole process start; ten are enough for a median of that.
  return { what: 'd. command line, workboat, 211 drafts', size: 'demo', t: measure(once, 10, 0, 10), target: 500 };
}

function fmt(ms: number): string {
  return ms >= 100 ? ms.toFixed(0) : ms >= 10 ? ms.toFixed(1) : ms.toFixed(2);
}

function report(lines: readonly Line[]): string {
  const rows = lines.map((l) => [
    l.what,
    l.size,
    fmt(l.t.median),
    fmt(l.t.best),
    String(l.t.reps),
    l.target === undefined ? '' : `${l.target < 500 ? '<=' : '<'} ${l.target} ms: ${l.t.median <= l.target ? 'met' : 'MISSED'}`,
  ]);
  const head = ['case', 'size', 'median ms', 'best ms', 'runs', 'target (median)'];
  const w = head.map((h, k) => Math.max(h.length, ...rows.map((r) => r[k]!.length)));
  const line = (r: readonly string[]): string =>
    r.map((c, k) => (k >= 2 && k <= 4 ? c.padStart(w[k]!) : c.padEnd(w[k]!))).join('  ').trimEnd();
  return [line(head), line(w.map((n) => '-'.repeat(n))), ...rows.map(line)].join('\n');
}

function main(): void {
  const root = projectRoot();
  const cpu = cpus();
  const version = (JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string }).version;
  console.log(`Halfbreadth ${version} core benchmark`);
  console.log(`machine: ${cpu[0]?.model ?? 'unknown cpu'}, ${cpu.length} cores, node ${process.version}, ${platform()} ${release()}`);
  // Other work on the machine slows every figure; the load says how much there was.
  console.log(`load average (1 min) at start: ${loadavg()[0]!.toFixed(2)}`);
  console.log('');
  const lines: Line[] = [
    ...coreLines(101, 41, true),
    ...coreLines(201, 81, false),
    ...coreLines(401, 161, false),
    commandLine(root),
    ...stabilityLines(101, 41),
  ];
  console.log(report(lines));
}

main();
