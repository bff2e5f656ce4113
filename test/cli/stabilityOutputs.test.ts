/**
 * The stability commands on the demo survey launch, and the stability options of `plot`
 * and `report`, run in-process through `main(argv, io)` with fake streams, and once as
 * the installed command (a child process).
 *
 * - The launch's figures are compared with the core's rightingLevers called directly on
 *   the same file: a check of the plumbing (options, reading, forms, exit code), not of
 *   the numerics, which test/stability/ and test/cli/stabilityBox.test.ts hold to closed
 *   forms.
 * - The plots and the report are read back as a person reads them (test/helpers/svgRead.ts:
 *   the SVG parsed by @xmldom/xmldom, scales from its own tick labels) on a box barge L x
 *   B x D at draft T = Δ / (ρ L B) (Archimedes), against the wall-sided formula GZ =
 *   sin φ (GM + ½ BM tan² φ), GM = T / 2 + B² / (12 T) - KG, KN = GZ + KG sin φ, exact
 *   while the deck edge is dry and the bilge wet (C. B. Barrass and D. R. Derrett, Ship
 *   Stability for Masters and Mates, 7th ed. 2012, the chapter on the wall-sided formula;
 *   from memory).
 */
import { execFile } from 'node:child_process';
import { readFileSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { afterAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { rightingLevers } from '../../core/stability/rightingLevers.js';
import { writeBoxBargeCsv } from '../fixtures/boxBargeCsv.js';
import { csvComments, runCli } from '../helpers/runCli.js';
import type { Document } from '@xmldom/xmldom';
import { all, attr, axisScale, hasVertex, parseSvg, pathVertices, textOf } from '../helpers/svgRead.js';
import { writtenAll } from '../helpers/written.js';
import { wallSidedGz } from '../fixtures/wallSided.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = fileURLToPath(new URL('../../bin/halfbreadth.js', import.meta.url));
const LAUNCH = fileURLToPath(new URL('../../offsets-demo/survey-launch.csv', import.meta.url));
const LOADING = ['--displacement', '4.5', '--kg', '0.9', '--opening', '5.2,0.8,1.2'];
/** The criteria ids of the project's conventions (IMO 2008 IS Code, Part A, 2.2). */
const CRITERIA_IDS = ['area-0-30', 'area-0-40', 'area-30-40', 'gz-at-30', 'angle-of-max-gz', 'gm0'];
/** A verdict line of the CSV's `#` lines and the text's lines above the table. */
const verdictLine = (id: string) => new RegExp(`^criterion ${id} \\(.*\\): required at least \\S+ \\S+; actual \\S+ \\S+: (pass|FAIL)$`);

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const BOX = writeBoxBargeCsv({ L, B, D });
afterAll(() => rmSync(dirname(BOX), { recursive: true, force: true }));
const RAD = Math.PI / 180;
const T = 1;
const AT_T = RHO * L * B * T;
const KG = 1.5;
const BM = (B * B) / (12 * T);
const GM = T / 2 + BM - KG;
const wallSided = (deg: number): number => wallSidedGz(GM, BM, deg);

describe('gz on the demo survey launch', () => {
  test('answers with each criterion of the conventions and a verdict, and the figures of the core\'s rightingLevers', async () => {
    const r = await runCli(['gz', LAUNCH, ...LOADING, '--format', 'json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, unknown> & { criteria: { id: string; pass: boolean }[] };
    expect(j['caution']).toBe(CAUTION);
    expect(j.criteria.map((c) => c.id)).toEqual(CRITERIA_IDS);
    // Plumbing: the same figures as the core gives for the same file and loading.
    const core = rightingLevers(
      prepareHull(readOffsetsCsv(readFileSync(LAUNCH, 'utf8')).hull),
      { displacement: 4.5, kg: 0.9, openings: [{ x: 5.2, y: 0.8, z: 1.2 }] },
      1.025,
    );
    const compared = ['criteria', 'gm0', 'points', 'areas', 'maxGz', 'angleOfMaxGz', 'vanishingAngle', 'downfloodingAngle', 'criteriaSet'] as const;
    const written = writtenAll(core) as unknown as Record<string, unknown>;
    const pick = (o: Record<string, unknown>) => Object.fromEntries(compared.map((k) => [k, o[k]]));
    expect(pick(j)).toEqual(pick(written));
    // The opening reaches the water at some heel of the curve.
    expect(typeof j['downfloodingAngle']).toBe('number');
  });

  test('the installed command, piped: CSV with the caution first and a verdict line for each criterion, exit 0', async () => {
    const { stdout, stderr } = await promisify(execFile)(process.execPath, [BIN, 'gz', LAUNCH, ...LOADING], { cwd: ROOT, encoding: 'utf8' });
    expect(stderr).toBe('');
    const comments = csvComments(stdout);
    expect(comments[0]).toBe(CAUTION);
    for (const id of CRITERIA_IDS) expect(comments.filter((l) => verdictLine(id).test(l)), id).toHaveLength(1);
  });
});

/** What every plot carries: its caution, as the tspans of the caution text. */
function cautionOf(doc: Document): string {
  const caution = all(doc, 'text').find((t) => attr(t, 'data-role') === 'caution')!;
  return all(caution, 'tspan').map(textOf).join(' ');
}

/** Each wall-sided point of GZ to 25 degrees is a vertex of the drawn curve, at the plot's own scales. */
function expectWallSidedCurve(doc: Document): void {
  const sx = axisScale(doc, 'x');
  const sy = axisScale(doc, 'y');
  const v = pathVertices(attr(all(doc, 'path').find((p) => attr(p, 'data-curve') === 'gz')!, 'd'));
  // 0.05 px: the plot writes its coordinates to two decimals.
  for (const h of [0, 5, 10, 15, 20, 25]) expect(hasVertex(v, sx(h), sy(wallSided(h))), `GZ at ${h} degrees`).toBe(true);
  // GM0 drawn as the tangent reaching GM at one radian (57.3 degrees).
  const tangent = all(doc, 'line').find((l) => attr(l, 'data-role') === 'gm0-tangent')!;
  expect(Math.abs(Number(attr(tangent, 'y2')) - sy(GM))).toBeLessThan(0.05);
  expect(all(doc, 'g').filter((g) => attr(g, 'data-criterion') !== '').map((g) => attr(g, 'data-criterion'))).toEqual(CRITERIA_IDS);
}

describe('plot with the stability options', () => {
  test('plot gz: the GZ curve of the loading, GM0, each verdict and the caution', async () => {
    const r = await runCli(['plot', 'gz', BOX, '--displacement', String(AT_T), '--kg', String(KG), '--heels', '0:5:25']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const doc = parseSvg(r.out);
    expect(cautionOf(doc)).toBe(CAUTION);
    expectWallSidedCurve(doc);
  });

  test('plot cross-curves: a curve per heel through KN = sin φ (KB + BM + ½ BM tan² φ) at each displacement', async () => {
    const displacements = [AT_T, 45];
    const r = await runCli(['plot', 'cross-curves', BOX, '--displacements', displacements.join(','), '--heels', '0,10,20', '--free-trim']);
    expect(r.code).toBe(0);
    const doc = parseSvg(r.out);
    expect(cautionOf(doc)).toBe(CAUTION);
    expect(textOf(all(doc, 'title')[0]!)).toContain('free trim');
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    for (const h of [10, 20]) {
      const v = pathVertices(attr(all(doc, 'path').find((p) => attr(p, 'data-curve') === `heel ${h}`)!, 'd'));
      for (const dis of displacements) {
        const t = dis / (RHO * L * B);
        const bm = (B * B) / (12 * t);
        const kn = Math.sin(h * RAD) * (t / 2 + bm + 0.5 * bm * Math.tan(h * RAD) ** 2);
        expect(hasVertex(v, sx(dis), sy(kn)), `KN at ${h} degrees, ${dis} t`).toBe(true);
      }
    }
  });
});

describe('report with the stability options', () => {
  test('holds the cross curves (free to trim) and the GZ curve (level) with its verdicts, and the caution', async () => {
    // Each trim option governs its own part of the report, so both may be given.
    const r = await runCli(['report', BOX, '--displacements', `${AT_T},45`, '--heels', '0,10,20', '--free-trim', '--displacement', String(AT_T), '--kg', String(KG), '--level-trim']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toContain(CAUTION.replace(/'/g, '&#39;'));
    // The KN table: one row per displacement, KN to the millimetre.
    const row = r.out.match(new RegExp(`<tr><td>${AT_T.toFixed(2)}</td>(?:<td>[^<]*</td>)+</tr>`))![0];
    const cells = [...row.matchAll(/<td>([^<]*)<\/td>/g)].map((m) => Number(m[1]));
    expect(cells.slice(1)).toEqual([0, 10, 20].map((h) => Number((wallSided(h) + KG * Math.sin(h * RAD)).toFixed(3))));
    // The plots, each an inline SVG document.
    const svgs = [...r.out.matchAll(/<svg[\s\S]*?<\/svg>/g)].map((m) => parseSvg(m[0]));
    const cross = svgs.find((d) => textOf(all(d, 'title')[0]!).startsWith('Cross curves'))!;
    expect(textOf(all(cross, 'title')[0]!)).toContain('free trim');
    const gz = svgs.find((d) => all(d, 'path').some((p) => attr(p, 'data-curve') === 'gz'))!;
    expect(cautionOf(gz)).toBe(CAUTION);
    expectWallSidedCurve(gz);
    // The criteria table says GM0 as the closed form gives it, to four figures.
    expect(r.out).toContain(`initial metacentric height GM0: at least 0.15 m required, ${Number(GM.toPrecision(4))} m found: pass`);
    // The GZ curve as a table, heel by heel: the wall-sided formula to the millimetre while
    // the deck edge stays dry (to 25 degrees on this box), and GM0 in the line above it.
    expect(r.out).toContain(`GM0 ${GM.toFixed(3)} m;`);
    for (const h of [5, 10, 15, 20, 25]) {
      const cells = r.out.match(new RegExp(`<tr><td>${h}</td><td>([^<]*)</td><td>([^<]*)</td></tr>`));
      expect(cells, `the GZ table's row at ${h} degrees`).not.toBeNull();
      expect(Number(cells![1])).toBeCloseTo(wallSided(h), 3);
    }
  });
});
