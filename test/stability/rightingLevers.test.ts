/**
 * Righting levers and the criteria (core/stability/rightingLevers.ts, core/stability/criteria.ts).
 *
 * Sources:
 * - The criteria's kinds and thresholds: IMO 2008 Intact Stability Code, resolution
 *   MSC.267(85), Part A, 2.2 (from memory, as in core/stability/criteria.ts).
 * - Synthetic curves whose areas and peaks are worked here in closed form (elementary
 *   calculus): GZ = k φ has area k φ²/2; a parabola peaks where its derivative vanishes.
 * - The box barge's GZ beyond the wall-sided range, the downflooding angle: the rectangle
 *   clipped by the waterline with polygon-clipping and d3-polygon (registry packages;
 *   test/fixtures/polygonReference.ts).
 * - Symmetry: a hull symmetric about its centreline has GZ(-φ) = -GZ(φ); one symmetric
 *   fore and aft has its upright LCB amidships and floats heeled at no trim, so free and
 *   level trim agree (elementary geometry).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError } from '../../core/common/errors.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { IMO_2008_GENERAL, judge, readCriteriaSet } from '../../core/stability/criteria.js';
import { crossCurves } from '../../core/stability/crossCurves.js';
import { readCurve, rightingLevers } from '../../core/stability/rightingLevers.js';
import { boxBarge, parabolicHull } from '../fixtures/hulls.js';
import { offsetForArea, partBelow } from '../fixtures/polygonReference.js';
import '../helpers/relClose.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;
const rho = 1.025;
const RAD = Math.PI / 180;
const GRID = [...Array.from({ length: 17 }, (_, k) => 2.5 * k), 45, 50, 55, 60, 65, 70, 75, 80, 85, 90];

/** Read a curve given as a function of the heel in degrees, on the grid the GZ work uses. */
function read(gz: (deg: number) => number, downflooding: number | null = null) {
  return readCurve(GRID, GRID.map(gz), gz, downflooding);
}

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (isHalfbreadthError(e)) return `${e.issues[0]!.code} ${JSON.stringify(e.issues[0]!.path)} ${e.issues[0]!.message}`;
    throw e;
  }
  return 'no error';
}

describe('each criterion passes just above its threshold and fails just below', () => {
  const verdict = (id: string, actual: Parameters<typeof judge>[1]) => judge(IMO_2008_GENERAL, actual).find((c) => c.id === id)!;
  const base = { 'area-0-30': 1, 'area-0-40': 1, 'area-30-40': 1, 'gz-at-30': 1, 'angle-of-max-gz': 40, gm0: 1 };

  test('area from 0 to 30 degrees: GZ = k φ, area k (π/6)²/2 set 0.1 % either side of 0.055 m.rad', () => {
    for (const [f, pass] of [[1.001, true], [0.999, false]] as const) {
      const k = (2 * 0.055 * f) / (Math.PI / 6) ** 2;
      const r = read((deg) => k * deg * RAD);
      expect(r.actual['area-0-30']).toBeRelClose(0.055 * f, 1e-12);
      expect(verdict('area-0-30', { ...base, 'area-0-30': r.actual['area-0-30'] }).pass).toBe(pass);
    }
  });

  test('area from 0 to 40 degrees, and to the downflooding angle when that is less', () => {
    for (const [f, pass] of [[1.001, true], [0.999, false]] as const) {
      const k = (2 * 0.09 * f) / (40 * RAD) ** 2;
      const r = read((deg) => k * deg * RAD);
      expect(verdict('area-0-40', { ...base, 'area-0-40': r.actual['area-0-40'] }).pass).toBe(pass);
    }
    // A downflooding angle of 35 degrees ends the area there: k (35°)²/2.
    const k = 0.5;
    expect(read((deg) => k * deg * RAD, 35).actual['area-0-40']).toBeRelClose((k * (35 * RAD) ** 2) / 2, 1e-12);
  });

  test('area from 30 to 40 degrees: a constant GZ c gives c × 10 degrees', () => {
    for (const [f, pass] of [[1.001, true], [0.999, false]] as const) {
      const c = (0.03 * f) / (10 * RAD);
      const r = read(() => c);
      expect(r.actual['area-30-40']).toBeRelClose(0.03 * f, 1e-12);
      expect(verdict('area-30-40', { ...base, 'area-30-40': r.actual['area-30-40'] }).pass).toBe(pass);
    }
  });

  test('GZ at 30 degrees or more: the largest there, 0.2 m either side by 0.1 %', () => {
    for (const [f, pass] of [[1.001, true], [0.999, false]] as const) {
      // A parabola peaking at 50 degrees with 0.2 f m.
      const r = read((deg) => 0.2 * f - 1e-4 * (deg - 50) ** 2);
      expect(r.actual['gz-at-30']).toBeRelClose(0.2 * f, 1e-12);
      expect(verdict('gz-at-30', { ...base, 'gz-at-30': r.actual['gz-at-30'] }).pass).toBe(pass);
    }
  });

  test('the angle of the largest GZ: a parabola peaking 0.1 degree either side of 25', () => {
    for (const [peak, pass] of [[25.1, true], [24.9, false]] as const) {
      const r = read((deg) => 0.5 - 1e-4 * (deg - peak) ** 2);
      expect(r.angleOfMaxGz).toBeCloseTo(peak, 9);
      expect(verdict('angle-of-max-gz', { ...base, 'angle-of-max-gz': r.angleOfMaxGz }).pass).toBe(pass);
    }
  });

  test('GM0 of 0.15 m passes and 0.1499 m fails', () => {
    expect(verdict('gm0', { ...base, gm0: 0.15 }).pass).toBe(true);
    expect(verdict('gm0', { ...base, gm0: 0.1499 }).pass).toBe(false);
  });
});

describe('criteria sets', () => {
  test('a set of the same kinds with other numbers changes the verdicts', () => {
    const own = readCriteriaSet({ name: 'harbour craft rule', source: 'test', criteria: [{ id: 'gm0', required: 0.35 }, { id: 'area-0-30', required: 0.04 }] });
    const actual = { 'area-0-30': 0.05, 'area-0-40': 0, 'area-30-40': 0, 'gz-at-30': 0, 'angle-of-max-gz': 0, gm0: 0.3 };
    expect(judge(IMO_2008_GENERAL, actual).find((c) => c.id === 'gm0')!.pass).toBe(true);
    const mine = judge(own, actual);
    expect(mine.map((c) => [c.id, c.pass])).toEqual([['area-0-30', true], ['gm0', false]]);
  });

  test('a malformed set is an error naming the field', () => {
    expect(codeOf(() => readCriteriaSet({ name: 'x', criteria: [{ id: 'area-0-50', required: 1 }] }))).toMatch(/^HYD_CRITERIA \["criteria","criteria",0,"id"\]/);
    expect(codeOf(() => readCriteriaSet({ name: 'x', criteria: [{ id: 'gm0', required: 'high' }] }))).toMatch(/^HYD_CRITERIA \["criteria","criteria",0,"required"\]/);
    expect(codeOf(() => readCriteriaSet({ name: 'x', criteria: [{ id: 'gm0', required: 1 }, { id: 'gm0', required: 2 }] }))).toMatch(/gm0 is given twice/);
    expect(codeOf(() => readCriteriaSet({ criteria: [] }))).toMatch(/^HYD_CRITERIA/);
  });
});

describe('the GZ curve of a loading', () => {
  const L = 20;
  const B = 6;
  const D = 4;
  const T = 1.3;
  const box = prepareHull(boxBarge(L, B, D, 11, 5));
  const displacement = rho * L * B * T;
  const rect: [number, number][] = [[B / 2, 0], [B / 2, D], [-B / 2, D], [-B / 2, 0]];

  test('on a box barge: GZ = KN - KG sin φ with KN of the clipped rectangle, GM0 = KB + BM - KG - FSM/Δ', () => {
    const kg = 2;
    const fsm = 15;
    const r = rightingLevers(box, { displacement, kg, fsm, heels: [0, 10, 30, 50, 70] }, rho);
    const kgEff = kg + fsm / displacement;
    expect(r.kgEffective).toBeRelClose(kgEff, 1e-15);
    expect(r.gm0).toBeRelClose(T / 2 + (B * B) / (12 * T) - kgEff, 1e-9);
    for (const pt of r.points) {
      const phi = pt.heel * RAD;
      const part = partBelow(rect, phi, offsetForArea(rect, phi, B * T));
      expect(pt.gz, `heel ${pt.heel}`).toBeCloseTo(part.y * Math.cos(phi) + part.z * Math.sin(phi) - kgEff * Math.sin(phi), 9);
    }
  });

  test('the downflooding angle is where an opening meets the water, the hull free to trim', () => {
    // An opening on the starboard side 3 m up: the waterline reaches it at the heel where
    // the clipped rectangle's line passes through (3, 3).
    const o = { x: 10, y: 3, z: 3 };
    const r = rightingLevers(box, { displacement, kg: 2, openings: [o] }, rho);
    const margin = (deg: number): number => {
      const phi = deg * RAD;
      return -o.y * Math.sin(phi) + o.z * Math.cos(phi) - offsetForArea(rect, phi, B * T);
    };
    let lo = 0;
    let hi = 90;
    for (let it = 0; it < 60; it++) {
      const mid = 0.5 * (lo + hi);
      if (margin(mid) > 0) lo = mid;
      else hi = mid;
    }
    expect(r.downfloodingAngle!).toBeCloseTo(lo, 3);
    // The areas then end at it where it is under 40 degrees.
    expect(r.downfloodingAngle!).toBeLessThan(40);
  });

  test('GZ to port is minus GZ to starboard, on the demo workboat', () => {
    const p = prepareHull(demo('workboat.csv'));
    const r = rightingLevers(p, { displacement: 40, kg: 1.5, heels: [-60, -30, -10, 10, 30, 60] }, rho);
    const gz = new Map(r.points.map((pt) => [pt.heel, pt.gz]));
    for (const h of [10, 30, 60]) expect(gz.get(-h)!).toBeCloseTo(-gz.get(h)!, 6);
  });

  test('a hull symmetric fore and aft gives the same cross curves free to trim and at level trim', () => {
    const p = prepareHull(parabolicHull(24, 6, 1.5, 2.5, 21, 11));
    const heels = [0, 15, 30, 45, 60];
    const level = crossCurves(p, [60, 90], heels, rho, 'level');
    const free = crossCurves(p, [60, 90], heels, rho, 'free');
    free.forEach((row, k) => {
      expect(row.kn).toBeCloseTo(level[k]!.kn, 7);
      expect(Math.abs(row.trim!)).toBeLessThan(1e-6);
    });
  });

  test('a KG high enough for a negative GM0 is answered, with GM0 below zero and the criteria failed', () => {
    const r = rightingLevers(box, { displacement, kg: 4 }, rho);
    expect(r.gm0).toBeLessThan(0);
    expect(r.criteria.find((c) => c.id === 'gm0')!.pass).toBe(false);
    expect(r.criteria.every((c) => typeof c.pass === 'boolean')).toBe(true);
  });

  test('G a little above the metacentre: the box lolls to tan φ = √(-2 GM0 / BM), where the wall-sided GZ is zero', () => {
    // GZ = sin φ (GM0 + ½ BM tan² φ) (the wall-sided formula; C. B. Barrass & D. R. Derrett,
    // Ship Stability for Masters and Mates, 7th ed., 2012, from memory) is zero at
    // tan² φ = -2 GM0 / BM. At KG 3.1 m: GM0 = 0.65 + 2.3077 - 3.1 = -0.142 m, a loll of
    // about 19.3°, where the deck edge (2.7 m above the water) stays dry and the bilge wet.
    const BM = (B * B) / (12 * T);
    const kg = 3.1;
    const r = rightingLevers(box, { displacement, kg }, rho);
    const gm0 = T / 2 + BM - kg;
    expect(r.gm0).toBeRelClose(gm0, 1e-6);
    const loll = Math.atan(Math.sqrt((-2 * gm0) / BM)) / RAD;
    expect(r.lollAngle!).toBeCloseTo(loll, 2);
    // And no angle of loll where GM0 is above zero, or where GZ never comes back above zero.
    expect(rightingLevers(box, { displacement, kg: 2 }, rho).lollAngle).toBeNull();
    expect(read((deg) => -0.01 * Math.sin(deg * RAD)).lollAngle).toBeNull();
  });

  test('bad loadings are clear errors: heels out of range, a load too heavy, an opening outside the hull', () => {
    expect(codeOf(() => rightingLevers(box, { displacement, kg: 2, heels: [10, 200] }, rho))).toMatch(/^HYD_ANGLE_RANGE \["heels",1\] heel 200 degrees is outside -180 to 180/);
    expect(codeOf(() => rightingLevers(box, { displacement: 1e6, kg: 2 }, rho))).toMatch(/^HYD_LOAD_OUT_OF_RANGE \["displacement"\]/);
    expect(codeOf(() => rightingLevers(box, { displacement, kg: 2, openings: [{ x: 25, y: 0, z: 3 }] }, rho))).toMatch(/^HYD_OPENING \["openings",0\] opening 1 \(25, 0, 3\): x = 25 m is outside the hull's length/);
    expect(codeOf(() => rightingLevers(box, { displacement, kg: 2, openings: [{ x: 5, y: 0, z: 1 }] }, rho))).toMatch(/^HYD_OPENING .*at or below the upright waterline/);
  });

  test('a grid table that stops at its top waterline without a deck edge is refused for heeled work', () => {
    const grid = readOffsetsCsv(['# units: m', 'x,0,1,2', '0,1,1,1', '5,1,1,1', '10,1,1,1'].join('\n'));
    const p = prepareHull(grid.hull);
    const assumedAt = grid.notes.filter((n) => n.code === 'HYD_DECK_AT_TOP_WATERLINE').map((n) => n.station!);
    expect(assumedAt).toEqual([0, 1, 2]);
    expect(codeOf(() => rightingLevers(p, { displacement: 10, kg: 1, deck: { assumedAt } }, rho))).toMatch(/^HYD_DECK_NOT_GIVEN .*x = 0, 5, 10 m/);
    // The same table with its deck edges given is taken.
    const given = readOffsetsCsv(['# units: m', 'x,deck_z,deck_y,0,1,2', '0,2,1,1,1,1', '5,2,1,1,1,1', '10,2,1,1,1,1'].join('\n'));
    expect(given.notes).toEqual([]);
  });
});
