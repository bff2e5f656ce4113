/**
 * The floating position for a load and the level drafts of displacements
 * (core/stability/floatingPosition.ts, core/stability/levelDrafts.ts).
 *
 * Sources:
 * - A box barge trimmed: its waterplane and sections are rectangles, so with the waterline
 *   from draft dA at x = 0 to dF at x = L the volume is B L (dA + dF)/2 and the LCB is the
 *   centroid of the trapezium, L (dA + 2 dF) / (3 (dA + dF)) (elementary geometry). With no
 *   KG the balance along the length is LCB = LCG, so dA + dF = 2T and dA + 2 dF = 6 T LCG / L.
 * - Small trims: tan θ = (LCB - LCG) / GML, the trimming moment over the moment to trim
 *   (E. C. Tupper, Introduction to Naval Architecture, 5th ed., 2013, ch. 4; from memory).
 * - Any hull: the balance itself (B on the vertical through G, the volume Δ/ρ), checked here
 *   from the solution's own centre of buoyancy and waterplane.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError } from '../../core/common/errors.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { crossCurves } from '../../core/stability/crossCurves.js';
import { floatingPosition } from '../../core/stability/floatingPosition.js';
import { rightingLevers } from '../../core/stability/rightingLevers.js';
import { inclinedHydrostatics, waterplaneOf } from '../../core/stability/inclinedHydrostatics.js';
import { draftsForDisplacements } from '../../core/stability/levelDrafts.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { boxBarge } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;
const rho = 1.025;

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (isHalfbreadthError(e)) return `${e.issues[0]!.code} ${e.issues[0]!.message}`;
    throw e;
  }
  return 'no error';
}

/** The box barge of the groups below, 20 m x 6 m x 4 m (11 stations, 5 waterlines), loaded to float level at 1.3 m. */
const L = 20;
const B = 6;
const T = 1.3;
const p = prepareHull(boxBarge(L, B, 4, 11, 5));
const displacement = rho * L * B * T;

describe('a box barge with its centre of gravity off its centre of buoyancy', () => {
  test('trims by the trapezium: any trim that keeps the keel under water, without a KG', () => {
    for (const lcg of [9.9, 9.5, 8.8, 11.2]) {
      const fp = floatingPosition(p, { displacement, lcg }, rho);
      const dF = (6 * T * lcg) / L - 2 * T;
      const dA = 2 * T - dF;
      expect(fp.draftAft, `LCG ${lcg}`).toBeRelClose(dA, 1e-8);
      expect(fp.draftFwd, `LCG ${lcg}`).toBeRelClose(dF, 1e-8);
      expect(fp.trim).toBeCloseTo(dA - dF, 8);
      expect(fp.heel).toBe(0);
    }
  });

  test('with a KG, a small trim is the trimming lever over GML', () => {
    const kg = 2;
    const lcg = 9.9; // 0.1 m forward... of LCB 10: a trim by the head
    const fp = floatingPosition(p, { displacement, lcg, kg }, rho);
    const upright = hydrostaticsAt(p, T);
    const gml = upright.kml - kg;
    // tan θ = (LCB - LCG) / GML; trim = L tan θ (by the stern positive).
    const expected = (L * (upright.lcb - lcg)) / gml;
    // The formula is the small-angle one: within 1 % at this trim of about 6 cm.
    expect(fp.trim).toBeRelClose(expected, 0.01);
  });
});

describe('the stability of the balance: GM there, the slope of GZ', () => {
  // A box barge: KB = T/2, BM = B²/(12 T), so upright GM = T/2 + B²/(12 T) - KG; heeled
  // by a TCG within the wall-sided range, GZ(φ) = sin φ (GM + ½ BM tan² φ) - TCG cos φ
  // (the wall-sided formula: C. B. Barrass & D. R. Derrett, Ship Stability for Masters and
  // Mates, 7th ed., 2012, from memory), whose slope at the balance is GM there.
  const BM = (B * B) / (12 * T);

  test('upright, GM is KB + BM - KG, and the balance is stable only while it is above zero', () => {
    for (const kg of [1.5, 2.5, 3.5]) {
      const fp = floatingPosition(p, { displacement, lcg: L / 2, kg }, rho);
      const gm0 = T / 2 + BM - kg;
      expect(fp.heel).toBe(0);
      expect(fp.gm!, `KG ${kg}`).toBeRelClose(gm0, 1e-6, 1e-7);
      expect(fp.stable, `KG ${kg}`).toBe(gm0 > 0);
    }
  });

  test('listed by a TCG, GM is the slope of the wall-sided GZ at the angle of list', () => {
    const kg = 2;
    const gm0 = T / 2 + BM - kg;
    const fp = floatingPosition(p, { displacement, lcg: L / 2, kg, tcg: 0.2 }, rho);
    const phi = (fp.heel * Math.PI) / 180;
    const t = Math.tan(phi);
    // The list itself: GZ(φ) = 0.
    expect(Math.sin(phi) * (gm0 + 0.5 * BM * t * t)).toBeRelClose(0.2 * Math.cos(phi), 1e-6);
    const slope = Math.cos(phi) * (gm0 + 0.5 * BM * t * t) + Math.sin(phi) * BM * t / Math.cos(phi) ** 2 + 0.2 * Math.sin(phi);
    expect(fp.gm!).toBeRelClose(slope, 1e-5);
    expect(fp.stable).toBe(true);
  });

  test.each([
    ['the demo workboat (transom, raked stem, half stations)', 'workboat.csv', 1.4],
    ['the demo survey launch (transom, chine knuckles, forefoot)', 'survey-launch.csv', 0.6],
  ] as const)('%s floated level with G at LCB: GM at the balance is KMt - KG of the upright table to 1e-5', (_name, file, draft) => {
    // GM = KMt - KG for an upright, level balance (E. C. Tupper, Introduction to Naval
    // Architecture, 5th ed., 2013, ch. 4, from memory); the upright table is held to closed
    // forms in test/upright/. The slope of GZ by differences must meet it on real shapes.
    const hull = prepareHull(demo(file));
    const h = hydrostaticsAt(hull, draft, rho);
    const kg = h.vcb;
    const fp = floatingPosition(hull, { displacement: h.displacement, lcg: h.lcb, kg }, rho);
    expect(Math.abs(fp.trim)).toBeLessThan(1e-6);
    expect(fp.gm!).toBeRelClose(h.kmt - kg, 1e-5);
  });

  test('without a KG the height of G is unknown, and so is the stability', () => {
    const fp = floatingPosition(p, { displacement, lcg: L / 2 }, rho);
    expect(fp.gm).toBeNull();
    expect(fp.stable).toBeNull();
  });
});

describe('on any hull the floating position balances', () => {
  test.each([
    ['the demo workboat', demo('workboat.csv'), { displacement: 40, lcg: 6.3, kg: 1.4 }],
    ['the demo workboat, listed by a TCG', demo('workboat.csv'), { displacement: 45, lcg: 6.6, kg: 1.6, tcg: 0.15 }],
    ['the demo survey launch', demo('survey-launch.csv'), { displacement: 4.5, lcg: 4.3, kg: 0.7 }],
    ['the demo survey launch with no KG', demo('survey-launch.csv'), { displacement: 4.5, lcg: 4.0 }],
  ] as const)('%s: B on the vertical through G to 1e-6 of the length, the volume to 1e-9', (_name, hull, load) => {
    const p = prepareHull(hull);
    const fp = floatingPosition(p, load, rho);
    const w = waterplaneOf(p, fp.draft, fp.trim, fp.heel);
    const v = inclinedHydrostatics(p, w);
    expect(v.volume).toBeRelClose(load.displacement / rho, 1e-9);
    // (B - G) parallel to the waterplane's normal n: its cross product with n vanishes.
    const n = [Math.sin(w.trimAngle), -Math.sin(w.heel) * Math.cos(w.trimAngle), Math.cos(w.heel) * Math.cos(w.trimAngle)];
    const g = [load.lcg, 'tcg' in load ? load.tcg : 0, 'kg' in load ? load.kg : v.zB];
    const d = [v.xB - g[0]!, v.yB - g[1]!, v.zB - g[2]!];
    const cross = [d[1]! * n[2]! - d[2]! * n[1]!, d[2]! * n[0]! - d[0]! * n[2]!, d[0]! * n[1]! - d[1]! * n[0]!];
    for (const c of cross) expect(Math.abs(c)).toBeLessThan(1e-6 * p.perp.lbp);
    if ('tcg' in load) expect(fp.heel).toBeGreaterThan(0.1); // listed to starboard
    expect(Math.abs(fp.residuals.volume)).toBeLessThan(1e-9 * (load.displacement / rho));
  });
});

describe('level drafts for displacements', () => {
  test('the upright table at the drafts returned gives back the displacements to 1e-9', () => {
    for (const [hull, list] of [
      [demo('workboat.csv'), [12, 25, 40, 60]],
      [demo('survey-launch.csv'), [1.5, 3, 4.5]],
    ] as const) {
      const p = prepareHull(hull);
      const drafts = draftsForDisplacements(p, list, rho);
      drafts.forEach((d, k) => expect(hydrostaticsAt(p, d, rho).displacement).toBeRelClose(list[k]!, 1e-9));
    }
  });

  test('a displacement the hull cannot float is an error naming it and the limit', () => {
    const p = prepareHull(demo('survey-launch.csv'));
    const msg = codeOf(() => draftsForDisplacements(p, [3, 0, 500], rho));
    expect(msg).toMatch(/^HYD_LOAD_OUT_OF_RANGE displacement 0 t/);
    expect(codeOf(() => floatingPosition(p, { displacement: 500, lcg: 4 }, rho))).toMatch(/HYD_LOAD_OUT_OF_RANGE displacement 500 t is more than the hull can float: wholly immersed to its deck it displaces [\d.]+ t/);
    expect(codeOf(() => floatingPosition(p, { displacement: -1, lcg: 4 }, rho))).toMatch(/HYD_LOAD_OUT_OF_RANGE/);
    expect(codeOf(() => floatingPosition(p, { displacement: 3, lcg: 4, tcg: 0.1 }, rho))).toMatch(/HYD_BAD_ARGUMENT a TCG of 0.1 m heels the hull by an amount that depends on the height of G: give KG/);
  });
});

describe('a load too light to resolve', () => {
  // A box 10 m x 4 m x 2 m encloses 80 m3.
  const p = prepareHull(boxBarge(10, 4, 2, 5, 5));
  const least = 80 * 1e-9 * rho;

  test('below 1e-9 of what the hull displaces wholly immersed, every stability computation refuses it, naming it', () => {
    for (const d of [5e-324, 1e-300, 0.99 * least]) {
      const words = /HYD_LOAD_OUT_OF_RANGE .*too light to float at a draft these offsets resolve: at least 8\.2e-8 t/;
      expect(codeOf(() => floatingPosition(p, { displacement: d, lcg: 5 }, rho))).toMatch(words);
      expect(codeOf(() => crossCurves(p, [1, d], [0, 10], rho))).toMatch(words);
      expect(codeOf(() => rightingLevers(p, { displacement: d, kg: 1 }, rho))).toMatch(words);
      expect(codeOf(() => draftsForDisplacements(p, [d], rho))).toMatch(words);
    }
  });

  test('ten times that floats at the corner of the bilge: KN of the small triangle there (elementary geometry), 0 upright', () => {
    // Heeled phi, the immersed section is a right triangle at the bilge, legs a along the
    // bottom and a tan(phi) up the side, of area a^2 tan(phi) / 2 = V / L; its centroid
    // (B/2 - a/3, a tan(phi) / 3) gives KN = (B/2 - a/3) cos(phi) + (a tan(phi) / 3) sin(phi).
    const d = 10 * least;
    const phi = (10 * Math.PI) / 180;
    const a = Math.sqrt((2 * (d / rho)) / 10 / Math.tan(phi));
    const [upright, heeled] = crossCurves(p, [d], [0, 10], rho);
    expect(Math.abs(upright!.kn)).toBeLessThan(1e-7);
    expect(heeled!.kn).toBeRelClose((2 - a / 3) * Math.cos(phi) + ((a * Math.tan(phi)) / 3) * Math.sin(phi), 1e-6);
    expect(draftsForDisplacements(p, [d], rho)[0]).toBeRelClose(d / (rho * 40), 1e-6);
  });
});

describe('a load with no balance within the hull is refused, never answered', () => {
  // A box 20 m x 6 m x 4 m at draft 1.3 m. Trimmed with its waterline within the ends and
  // the deck, the immersed side is a trapezium or a triangle, whose centroid lies at least
  // L/3 from an end (elementary geometry): an LCG nearer an end than that, or beyond it,
  // has no floating position a table of offsets can give.
  test.each([
    ['G aft of the hull', { displacement, lcg: -5 }, 'lcg'],
    ['G at the aft end', { displacement, lcg: 0 }, 'lcg'],
    ['G 1 m from the fore end', { displacement, lcg: L - 1, kg: 2 }, 'lcg'],
    ['a TCG of 1e300 m', { displacement, lcg: L / 2, kg: 2, tcg: 1e300 }, 'tcg'],
    ['a KG of 1e300 m with a TCG', { displacement, lcg: L / 2, kg: 1e300, tcg: 0.5 }, 'tcg'],
  ] as const)('%s', (_name, load, field) => {
    expect(codeOf(() => floatingPosition(p, load, rho))).toMatch(/^HYD_LOAD_OUT_OF_RANGE no floating position balances the load \(displacement [\d.]+ t, G at x = .*\): /);
    let path: unknown;
    try {
      floatingPosition(p, load, rho);
    } catch (e) {
      if (isHalfbreadthError(e)) path = e.issues[0]!.path;
    }
    expect(path).toEqual([field]);
  });

  test('an LCG just inside the reach of the trapezium still floats, and balances', () => {
    // LCB of the trapezium with dF = 0.1 m: L (dA + 2 dF) / (3 (dA + dF)), dA = 2T - dF.
    const dF = 0.1;
    const dA = 2 * T - dF;
    const lcg = (L * (dA + 2 * dF)) / (3 * (dA + dF));
    const fp = floatingPosition(p, { displacement, lcg }, rho);
    expect(fp.draftFwd).toBeRelClose(dF, 1e-6);
    expect(fp.draftAft).toBeRelClose(dA, 1e-6);
  });
});
