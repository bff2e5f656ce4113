/**
 * The stability commands of the command line (float, cross-curves, gz, and the
 * hydrostatic table by displacement or at a trim) on a box barge written as an offsets
 * file, run in-process through `main(argv, io)` with fake streams, against closed forms:
 *
 * - Archimedes: the box floats a displacement Δ at the draft T = Δ / (ρ L B), where its
 *   volume L B T is Δ / ρ; its centre of buoyancy is at mid-length and KB = T / 2; with
 *   G on the vertical through B (LCG = L / 2) it floats level (geometry of the box).
 * - BMt = I / ∇ = (L B³ / 12) / (L B T) = B² / (12 T) (E. C. Tupper, Introduction to
 *   Naval Architecture, 5th ed. 2013, ch. 4; from memory), so GM0 = KB + BM - KG, less
 *   FSM / Δ for a free surface (the virtual rise of G; same chapter, from memory).
 * - The wall-sided formula GZ = sin φ (GM + ½ BM tan² φ), exact for a wall-sided hull
 *   while the deck edge stays dry and the bilge wet, tan φ < min(T, D - T) / (B / 2)
 *   (C. B. Barrass and D. R. Derrett, Ship Stability for Masters and Mates, 7th ed.
 *   2012, the chapter on the wall-sided formula; from memory); KN = GZ + KG sin φ
 *   (the project's conventions), so KN = sin φ (KB + BM + ½ BM tan² φ), free of KG.
 * - Beyond it, at T = D / 2: the waterline halves the rectangle at every heel, so it
 *   runs through the rectangle's centre (an area of a centrally symmetric figure is
 *   halved, for one direction, only by the line through the centre); the immersed part
 *   is the rectangle clipped by that line, its centroid by the shoelace formula
 *   (plane geometry). The areas under that curve are integrated here by Simpson's rule
 *   on 2,000 panels.
 * - The trimmed box, derived here: with draft T amidships and trim t (aft minus forward)
 *   the draft at x is d(x) = T - t (x - xm) / L, linear, so while it stays between the
 *   keel and the deck at both ends the volume B ∫ d dx = L B T whatever the trim; the
 *   moment B ∫ (x - xm) d dx = -B t L² / 12 puts the LCB at xm - t L / (12 T); and
 *   B ∫ d² / 2 dx gives KB = T / 2 + t² / (24 T). The waterplane (its projection on the
 *   horizontal, as the table gives it) is still the rectangle L x B.
 * - Floating free to trim with no KG, the balance is LCB = LCG (the project's
 *   conventions for float), so by the last line the trim is t = 12 T (xm - LCG) / L.
 *
 * Tolerances: the box's sections are straight lines, which the reading integrates exactly,
 * and the solvers stop at 1e-10 of the volume or finer, so 1e-9 relative (1e-12 m at 0)
 * unless a line says why it is looser; the written answer has 12 significant digits.
 */
import { rmSync } from 'node:fs';
import { dirname } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { writeBoxBargeCsv } from '../fixtures/boxBargeCsv.js';
import '../helpers/relClose.js';
import { csvComments, csvTable, runCli } from '../helpers/runCli.js';
import { boxWallSidedKn } from '../fixtures/wallSided.js';

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const XM = L / 2;
const BOX = writeBoxBargeCsv({ L, B, D });
afterAll(() => rmSync(dirname(BOX), { recursive: true, force: true }));

const RAD = Math.PI / 180;
const REL = 1e-9;
const ABS = 1e-12;
/** Draft of the box floating Δ, m (Archimedes). */
const draftOf = (displacement: number): number => displacement / (RHO * L * B);
/** KN by the wall-sided formula at draft T, m. */
const knWallSided = (T: number, deg: number): number => boxWallSidedKn(B, T, deg);

/** The part of a polygon on the side f <= 0 of a line (Sutherland-Hodgman, one edge). */
function clip(poly: readonly [number, number][], f: (p: [number, number]) => number): [number, number][] {
  const out: [number, number][] = [];
  poly.forEach((a, i) => {
    const b = poly[(i + 1) % poly.length]!;
    const fa = f(a);
    const fb = f(b);
    if (fa <= 0) out.push(a);
    if (fa < 0 !== fb < 0 && fa !== fb) {
      const t = fa / (fa - fb);
      out.push([a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])]);
    }
  });
  return out;
}

/** Centroid of a polygon by the shoelace formula. */
function centroid(poly: readonly [number, number][]): [number, number] {
  let a = 0;
  let cx = 0;
  let cy = 0;
  poly.forEach(([x0, y0], i) => {
    const [x1, y1] = poly[(i + 1) % poly.length]!;
    const c = x0 * y1 - x1 * y0;
    a += c;
    cx += (x0 + x1) * c;
    cy += (y0 + y1) * c;
  });
  return [cx / (3 * a), cy / (3 * a)];
}

/** GZ of the box floating at T = D / 2 at any heel: the rectangle clipped by the line through its centre. */
function gzHalfDepth(deg: number, kg: number): number {
  const phi = deg * RAD;
  const rect: [number, number][] = [[-B / 2, 0], [B / 2, 0], [B / 2, D], [-B / 2, D]];
  // Below the waterline: -y sin φ + (z - D/2) cos φ <= 0 (starboard, +y, goes down).
  const [yB, zB] = centroid(clip(rect, ([y, z]) => -y * Math.sin(phi) + (z - D / 2) * Math.cos(phi)));
  return yB * Math.cos(phi) + zB * Math.sin(phi) - kg * Math.sin(phi);
}

/** Composite Simpson's rule on n panels (n even). */
function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let k = 1; k < n; k++) s += (k % 2 === 1 ? 4 : 2) * f(a + k * h);
  return (s * h) / 3;
}

/** The criteria ids, in the order of the project's conventions (IMO 2008 IS Code, Part A, 2.2). */
const CRITERIA_IDS = ['area-0-30', 'area-0-40', 'area-30-40', 'gz-at-30', 'angle-of-max-gz', 'gm0'];

interface GzJson {
  caution: string;
  gm0: number;
  kgEffective: number;
  points: { heel: number; gz: number }[];
  maxGz: number;
  angleOfMaxGz: number;
  vanishingAngle: number | null;
  criteria: { id: string; required: number; actual: number; unit: string; pass: boolean }[];
}

describe('float on a box barge', () => {
  const displacement = 41;
  const T = draftOf(displacement);

  test('with G amidships the box floats level and upright at T = Δ / (ρ L B), B under G', async () => {
    const r = await runCli(['float', BOX, '--displacement', String(displacement), '--lcg', String(XM), '--format', 'json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, number | string | null>;
    expect(j['caution']).toBe(CAUTION);
    expect(j['draft']).toBeRelClose(T, REL);
    expect(j['draftAft']).toBeRelClose(T, REL);
    expect(j['draftFwd']).toBeRelClose(T, REL);
    expect(j['trim']).toBeRelClose(0, 0, ABS);
    expect(j['heel']).toBe(0);
    expect(j['lcb']).toBeRelClose(XM, REL);
    expect(j['vcb']).toBeRelClose(T / 2, REL);
    // No KG given: the answer says so with null, not a number of its own.
    expect(j['kg']).toBeNull();
  });

  test('as CSV: the caution first, one row under headers that carry units; as a table, the caution last', async () => {
    const r = await runCli(['float', BOX, '--displacement', String(displacement), '--lcg', String(XM)]);
    expect(r.code).toBe(0);
    expect(csvComments(r.out)[0]).toBe(CAUTION);
    const { header, rows } = csvTable(r.out);
    // Units after each name, as the conventions' CSV headers (volume_m3) write them.
    expect(header).toEqual(['displacement_t', 'lcg_m', 'tcg_m', 'kg_m', 'draftAft_m', 'draftFwd_m', 'trim_m', 'heel_deg', 'draft_m', 'lcb_m', 'tcb_m', 'vcb_m', 'gm_m']);
    expect(rows).toHaveLength(1);
    expect(Number(rows[0]![header.indexOf('draft_m')])).toBeRelClose(T, REL);
    const table = await runCli(['float', BOX, '--displacement', String(displacement), '--lcg', String(XM)], { ttyOut: true });
    expect(table.code).toBe(0);
    expect(table.out.trimEnd().split('\n').at(-1)).toBe(CAUTION);
  });

  test('with G aft of amidships it trims by the stern until LCB = LCG: t = 12 T (xm - LCG) / L, the draft amidships still T', async () => {
    const lcg = 4.8;
    const r = await runCli(['float', BOX, '--displacement', String(displacement), '--lcg', String(lcg), '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, number>;
    const t = (12 * T * (XM - lcg)) / L;
    // The balance stops within 1e-9 L of B under G, which moves the trim by about 1e-8 m.
    expect(j['trim']).toBeRelClose(t, 0, 1e-7);
    expect(j['draft']).toBeRelClose(T, 0, 1e-7);
    expect(j['draftAft']).toBeRelClose(T + t / 2, 0, 1e-7);
    expect(j['draftFwd']).toBeRelClose(T - t / 2, 0, 1e-7);
    expect(j['lcb']).toBeRelClose(lcg, 0, 1e-7);
  });
});

describe('cross-curves on a box barge', () => {
  // Two loads whose waterlines keep the deck edge dry and the bilge wet to 24 degrees.
  const displacements = [41, 45];
  const heels = [0, 5, 10, 15, 20];

  test('KN is 0 upright and follows the wall-sided formula, one CSV row per displacement and a KN column per heel', async () => {
    const r = await runCli(['cross-curves', BOX, '--displacements', displacements.join(','), '--heels', heels.join(',')]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(csvComments(r.out)[0]).toBe(CAUTION);
    const { header, rows } = csvTable(r.out);
    expect(header).toEqual(['displacement_t', ...heels.map((h) => `kn_${h}deg_m`)]);
    expect(rows.map((row) => Number(row[0]))).toEqual(displacements);
    rows.forEach((row, i) => {
      const T = draftOf(displacements[i]!);
      expect(Math.tan(20 * RAD), '20 degrees within the wall-sided range').toBeLessThan(Math.min(T, D - T) / (B / 2));
      heels.forEach((h, k) => expect(Number(row[k + 1]), `KN at ${h} degrees`).toBeRelClose(knWallSided(T, h), REL, ABS));
    });
  });

  test('as JSON, one row per displacement and heel; free to trim the box stays level, and KN to port is the mirror of KN to starboard', async () => {
    const level = await runCli(['cross-curves', BOX, '--displacements', '41', '--heels', '-15,0,15', '--format', 'json']);
    const free = await runCli(['cross-curves', BOX, '--displacements', '41', '--heels', '-15,0,15', '--free-trim', '--format', 'json']);
    for (const r of [level, free]) {
      expect(r.code).toBe(0);
      const j = JSON.parse(r.out) as { caution: string; trim: string; rows: { displacement: number; heel: number; kn: number; draft: number; trim: number }[] };
      expect(j.caution).toBe(CAUTION);
      expect(j.trim).toBe(r === level ? 'level' : 'free');
      expect(j.rows.map((x) => x.heel)).toEqual([-15, 0, 15]);
      // KN at -φ is -KN at φ: the hull is symmetric about its centreline (conventions' signs).
      expect(j.rows[0]!.kn).toBeRelClose(-knWallSided(draftOf(41), 15), REL);
      expect(j.rows[1]!.kn).toBeRelClose(0, 0, ABS);
      expect(j.rows[2]!.kn).toBeRelClose(knWallSided(draftOf(41), 15), REL);
      // The box is the same end for end, so its upright LCB keeps it level as it heels.
      for (const x of j.rows) expect(x.trim).toBeRelClose(0, 0, 1e-9);
    }
  });
});

describe('cross-curves with a value typed twice', () => {
  test('a heel or displacement given twice is one CSV column or row, with the same KN', async () => {
    const r = await runCli(['cross-curves', BOX, '--displacements', '41,45,41', '--heels', '0,10,5,10']);
    expect(r.code).toBe(0);
    const { header, rows } = csvTable(r.out);
    expect(header).toEqual(['displacement_t', 'kn_0deg_m', 'kn_10deg_m', 'kn_5deg_m']);
    expect(rows.map((row) => Number(row[0]))).toEqual([41, 45]);
    // The wall-sided formula, as above.
    rows.forEach((row, i) => [0, 10, 5].forEach((h, k) => expect(Number(row[k + 1])).toBeRelClose(knWallSided(draftOf([41, 45][i]!), h), REL, ABS)));
  });
});

describe('gz on a box barge', () => {
  // At T = D / 2 the clipped rectangle gives GZ at every heel (see the module note).
  const displacement = RHO * L * B * (D / 2);
  const T = D / 2;
  const kg = 1.5;
  const bm = (B * B) / (12 * T);
  const gm0 = T / 2 + bm - kg;

  test('GM0 = KB + BM - KG; GZ by the wall-sided formula to 25 degrees and the clipped rectangle to 90', async () => {
    const r = await runCli(['gz', BOX, '--displacement', String(displacement), '--kg', String(kg), '--heels', '0:5:90', '--format', 'json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as GzJson;
    expect(j.gm0).toBeRelClose(gm0, REL);
    for (const p of j.points) {
      if (p.heel <= 25) expect(p.gz, `GZ at ${p.heel} degrees, wall-sided`).toBeRelClose(Math.sin(p.heel * RAD) * (gm0 + 0.5 * bm * Math.tan(p.heel * RAD) ** 2), REL, ABS);
      expect(p.gz, `GZ at ${p.heel} degrees, clipped rectangle`).toBeRelClose(gzHalfDepth(p.heel, kg), REL, 1e-11);
    }
    // The wall-sided range ends where the deck edge meets the water: tan φ = (D - T) / (B / 2).
    expect(Math.atan((D - T) / (B / 2)) / RAD).toBeGreaterThan(25);
  });

  test('a free-surface moment lowers GM0 by FSM / Δ', async () => {
    const fsm = 4.1;
    const r = await runCli(['gz', BOX, '--displacement', String(displacement), '--kg', String(kg), '--fsm', String(fsm), '--heels', '0,10', '--format', 'json']);
    const j = JSON.parse(r.out) as GzJson;
    expect(j.kgEffective).toBeRelClose(kg + fsm / displacement, REL);
    expect(j.gm0).toBeRelClose(gm0 - fsm / displacement, REL);
    expect(j.points[1]!.gz).toBeRelClose(gzHalfDepth(10, kg + fsm / displacement), REL);
  });

  test('each criterion of the conventions is judged on the curve: its actual value as the curve integrated here gives it', async () => {
    const j = JSON.parse((await runCli(['gz', BOX, '--displacement', String(displacement), '--kg', String(kg), '--format', 'json'])).out) as GzJson;
    expect(j.criteria.map((c) => c.id)).toEqual(CRITERIA_IDS);
    const f = (deg: number): number => gzHalfDepth(deg, kg);
    // The largest GZ and its angle, found on a grid of 0.01 degrees.
    let best = { deg: 0, gz: -Infinity };
    for (let k = 0; k <= 9000; k++) if (f(k / 100) > best.gz) best = { deg: k / 100, gz: f(k / 100) };
    // GZ runs with a kink where the deck edge immerses (26.6 degrees): the command's curve, on a
    // grid of 2.5 degrees, comes within 1e-4 m.rad of the areas and 0.25 degrees of the angle.
    const expected: Record<string, [number, number]> = {
      'area-0-30': [simpson(f, 0, 30) * RAD, 1e-4],
      'area-0-40': [simpson(f, 0, 40) * RAD, 1e-4],
      'area-30-40': [simpson(f, 30, 40) * RAD, 1e-4],
      'gz-at-30': [best.gz, 1e-3],
      'angle-of-max-gz': [best.deg, 0.25],
      gm0: [gm0, 1e-9],
    };
    // The thresholds of the IMO 2008 IS Code, Part A, 2.2.1 to 2.2.4 (from memory).
    const imo: Record<string, number> = { 'area-0-30': 0.055, 'area-0-40': 0.09, 'area-30-40': 0.03, 'gz-at-30': 0.2, 'angle-of-max-gz': 25, gm0: 0.15 };
    for (const c of j.criteria) {
      const [value, tol] = expected[c.id]!;
      expect(c.actual, c.id).toBeRelClose(value, 0, tol);
      expect(c.required, c.id).toBe(imo[c.id]);
      expect(c.pass, c.id).toBe(c.actual >= c.required);
    }
    expect(j.maxGz).toBeRelClose(best.gz, 0, 1e-3);
    // The angle of vanishing stability: where the clipped rectangle's GZ comes back to 0.
    let [lo, hi] = [40, 90];
    for (let k = 0; k < 60; k++) [lo, hi] = f((lo + hi) / 2) > 0 ? [(lo + hi) / 2, hi] : [lo, (lo + hi) / 2];
    expect(j.vanishingAngle).toBeRelClose(lo, 0, 1e-3);
  });

  test('the verdicts and the caution are in every form: text, CSV (units in the headers) and JSON', async () => {
    const args = ['gz', BOX, '--displacement', String(displacement), '--kg', String(kg), '--heels', '0:10:40'];
    const json = JSON.parse((await runCli([...args, '--format', 'json'])).out) as GzJson;
    const verdict = new Map(json.criteria.map((c) => [c.id, c.pass ? 'pass' : 'FAIL']));
    expect(json.caution).toBe(CAUTION);
    const csv = await runCli(args);
    expect(csv.code).toBe(0);
    const comments = csvComments(csv.out);
    expect(comments[0]).toBe(CAUTION);
    expect(csvTable(csv.out).header).toEqual(['heel_deg', 'gz_m', 'area_m_rad']);
    const text = await runCli(args, { ttyOut: true });
    expect(text.code).toBe(0);
    const lines = text.out.split('\n');
    expect(lines.filter((l) => l.trim() !== '').at(-1)).toBe(CAUTION);
    for (const id of CRITERIA_IDS) {
      const line = new RegExp(`^criterion ${id} \\(.*\\): required at least [0-9.]+ \\S+; actual -?[0-9.e-]+ \\S+: (pass|FAIL)$`);
      for (const [form, ls] of [['csv', comments], ['text', lines]] as const) {
        const found = ls.filter((l) => line.test(l));
        expect(found, `${id} in ${form}`).toHaveLength(1);
        expect(found[0]!.endsWith(verdict.get(id)!), `${id} in ${form}`).toBe(true);
      }
    }
  });
});

describe('hydrostatics by displacement and at a trim', () => {
  const displacements = [20.5, 41, 61.5];

  test('--displacements gives the rows of --drafts at T = Δ / (ρ L B)', async () => {
    const byDisplacement = await runCli(['hydrostatics', BOX, '--displacements', displacements.join(','), '--format', 'json']);
    const drafts = displacements.map(draftOf);
    const byDraft = await runCli(['hydrostatics', BOX, '--drafts', drafts.join(','), '--format', 'json']);
    expect(byDisplacement.code).toBe(0);
    const a = (JSON.parse(byDisplacement.out) as { caution: string; rows: Record<string, number>[] });
    const b = (JSON.parse(byDraft.out) as { rows: Record<string, number>[] }).rows;
    expect(a.caution).toBe(CAUTION);
    a.rows.forEach((row, i) => {
      expect(row['draft']).toBeRelClose(drafts[i]!, REL);
      expect(row['displacement']).toBeRelClose(displacements[i]!, REL);
      expect(row['trim']).toBe(0);
      for (const [k, v] of Object.entries(b[i]!)) expect(row[k], `${k} at ${displacements[i]} t`).toBeRelClose(v, REL, ABS);
    });
  });

  test('--trim: the volume stays L B T, the LCB moves to xm - t L / (12 T), KB to T / 2 + t² / (24 T)', async () => {
    const T = 1;
    const t = 0.4;
    const r = await runCli(['hydrostatics', BOX, '--drafts', String(T), '--trim', String(t), '--format', 'json']);
    expect(r.code).toBe(0);
    const row = (JSON.parse(r.out) as { rows: Record<string, number>[] }).rows[0]!;
    expect(row['draft']).toBeRelClose(T, REL);
    expect(row['draftAft']).toBeRelClose(T + t / 2, REL);
    expect(row['draftFwd']).toBeRelClose(T - t / 2, REL);
    expect(row['trim']).toBeRelClose(t, REL);
    expect(row['volume']).toBeRelClose(L * B * T, REL);
    expect(row['lcb']).toBeRelClose(XM - (t * L) / (12 * T), REL);
    expect(row['vcb']).toBeRelClose(T / 2 + (t * t) / (24 * T), REL);
    expect(row['waterplaneArea']).toBeRelClose(L * B, REL);
    expect(row['lcf']).toBeRelClose(XM, REL);
    expect(row['iT']).toBeRelClose((L * B ** 3) / 12, REL);
    // And by displacement at the same trim: the draft amidships that floats L B T.
    const back = await runCli(['hydrostatics', BOX, '--displacements', String(RHO * L * B * T), '--trim', String(t), '--format', 'json']);
    expect((JSON.parse(back.out) as { rows: Record<string, number>[] }).rows[0]!['draft']).toBeRelClose(T, REL);
  });

  test('the error estimate is refused at a trim, naming both options, and taken at trim 0', async () => {
    const r = await runCli(['hydrostatics', BOX, '--drafts', '1', '--trim', '0.4', '--error-estimate']);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/--error-estimate .*level table.*--trim/);
    const level = await runCli(['hydrostatics', BOX, '--drafts', '1', '--trim', '0', '--error-estimate']);
    expect(level.code).toBe(0);
  });
});
