/**
 * The hull at any waterplane (core/stability/inclinedHydrostatics.ts, core/hull/sectionCut.ts)
 * against outside answers.
 *
 * Sources:
 * - Wall-sided formula GZ = sin φ (GM + ½ BM tan² φ), exact for a wall-sided hull while
 *   neither the deck edge immerses nor the bilge emerges: C. B. Barrass & D. R. Derrett,
 *   Ship Stability for Masters and Mates, 7th ed. (2012), the chapter on the wall-sided
 *   formula; E. C. Tupper, Introduction to Naval Architecture, 5th ed. (2013), ch. 4 (both
 *   from memory). With KG taken out, KN = sin φ (KB + BM + ½ BM tan² φ).
 * - Beyond that, and for polygonal sections at any heel: polygon-clipping and d3-polygon
 *   (general-purpose geometry packages from the registry; test/fixtures/polygonReference.ts).
 * - A horizontal circular cylinder: the centre of buoyancy lies on the line from the axis
 *   down the waterplane's normal, so KN = R sin φ at every heel and displacement
 *   (elementary geometry).
 * - At zero trim and heel, the upright table of the same hull: the same section reading,
 *   so equal to rounding.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import type { HullModel } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { Section } from '../../core/hull/section.js';
import { sectionBoundary } from '../../core/hull/sectionBoundary.js';
import { cutSection } from '../../core/hull/sectionCut.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { crossCurves } from '../../core/stability/crossCurves.js';
import { inclinedHydrostatics, waterplaneOf } from '../../core/stability/inclinedHydrostatics.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { boxBarge, circularCylinder, linspace, parabolicHull } from '../fixtures/hulls.js';
import { offsetForArea, partBelow } from '../fixtures/polygonReference.js';
import { relativeError } from '../helpers/relClose.js';
import '../helpers/relClose.js';
import { wallSidedGz } from '../fixtures/wallSided.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;
const RAD = Math.PI / 180;

describe('a section cut by an inclined line', () => {
  // A hard-chine section drawn as straight lines: flat of keel 0.2 wide each side, a V
  // bottom to the chine at (1.2, 0.5), a flared side to the deck edge at (1.5, 1.6).
  // Straight segments are fitted as themselves, so the section is this polygon exactly.
  const points = [
    { y: 0.2, z: 0, knuckle: false },
    { y: 1.2, z: 0.5, knuckle: true },
    { y: 1.5, z: 1.6, knuckle: false },
  ];
  const polygon: [number, number][] = [[0.2, 0], [1.2, 0.5], [1.5, 1.6], [-1.5, 1.6], [-1.2, 0.5], [-0.2, 0]];
  const bd = sectionBoundary(new Section(points));

  test.each([0, 10, 35, 60, 90, 120, 170, -25])('at %i degrees of heel its area and moments are the polygon clipped by the line', (deg) => {
    const phi = deg * RAD;
    for (const h of [-1, -0.2, 0.1, 0.4, 0.9, 1.4, 2]) {
      const ours = cutSection(bd, Math.sin(phi), Math.cos(phi), h);
      const ref = partBelow(polygon, phi, h);
      // The polygon library's own rounding, about 1e-12 of the section.
      expect(Math.abs(ours.area - ref.area), `h ${h}`).toBeLessThan(1e-10);
      if (ref.area > 1e-9) {
        expect(ours.momentY / ours.area).toBeCloseTo(ref.y, 9);
        expect(ours.momentZ / ours.area).toBeCloseTo(ref.z, 9);
      }
    }
  });

  test('the waterline chord is the line across the section: the breadth at a level waterline, and across a heeled box', () => {
    const box = sectionBoundary(new Section([{ y: 3, z: 0 }, { y: 3, z: 4 }]));
    // Level at 1.3 m: 6 m across, centred.
    const level = cutSection(box, 0, 1, 1.3);
    expect(level.chord).toBeCloseTo(6, 12);
    expect(level.chordS).toBeCloseTo(0, 12);
    // Heeled 20 degrees through the middle of the sides: 6 / cos 20 long.
    const phi = 20 * RAD;
    const heeled = cutSection(box, Math.sin(phi), Math.cos(phi), 1.3 * Math.cos(phi));
    expect(heeled.chord).toBeRelClose(6 / Math.cos(phi), 1e-12);
    // A flat of bottom lying on a level waterline is the waterplane's breadth there.
    const touching = cutSection(box, 0, 1, 0);
    expect(touching.area).toBe(0);
    expect(touching.chord).toBeCloseTo(6, 12);
  });
});

describe('at zero trim and heel, the upright table', () => {
  test.each([
    ['demo workboat (grid, keel and deck columns)', demo('workboat.csv'), [1.0, 1.05, 1.4, 1.8]],
    ['demo survey launch (points, chines)', demo('survey-launch.csv'), [0.2, 0.45, 0.6, 0.9]],
    ['parabolic hull', parabolicHull(30, 8, 2, 3, 21, 13), [0.5, 1.3, 2]],
  ] as const)('%s: volume, centres, waterplane and its moments to 1e-9', (_name, hull, drafts) => {
    const p = prepareHull(hull);
    for (const d of drafts) {
      const u = hydrostaticsAt(p, d);
      const i = inclinedHydrostatics(p, waterplaneOf(p, d, 0, 0));
      const pairs: [number, number, string][] = [
        [i.volume, u.volume, 'volume'],
        [i.xB, u.lcb, 'lcb'],
        [i.zB, u.vcb, 'vcb'],
        [i.waterplaneArea, u.waterplaneArea, 'waterplaneArea'],
        [i.xF, u.lcf, 'lcf'],
        [i.iT, u.iT, 'iT'],
        [i.iL, u.iL, 'iL'],
      ];
      for (const [a, b, what] of pairs) expect(relativeError(a, b), `${what} at ${d} m`).toBeLessThan(1e-9);
      expect(Math.abs(i.yB)).toBeLessThan(1e-12 * p.perp.lbp);
    }
  });
});

describe('a box barge heeled', () => {
  const L = 20;
  const B = 6;
  const D = 4;
  const T = 1.3;
  const p = prepareHull(boxBarge(L, B, D, 11, 5));
  const rho = 1.025;
  const displacement = rho * L * B * T;
  const KB = T / 2;
  const BM = (B * B) / (12 * T); // I / V = (L B³ / 12) / (L B T)

  test('KN follows the wall-sided formula until the bilge emerges (tan φ = 2T / B, 23.4 degrees)', () => {
    const heels = [2, 5, 10, 15, 20, 23];
    const rows = crossCurves(p, [displacement], heels, rho);
    rows.forEach((r) => {
      const exact = wallSidedGz(KB + BM, BM, r.heel);
      // Exact for this hull: the sections are rectangles, the volume is met to 1e-10.
      expect(r.kn, `heel ${r.heel}`).toBeRelClose(exact, 1e-9);
    });
  });

  test('beyond, at any heel to 180 degrees, KN is that of the rectangle clipped by the waterline', () => {
    const rect: [number, number][] = [[B / 2, 0], [B / 2, D], [-B / 2, D], [-B / 2, 0]];
    const heels = [30, 45, 60, 75, 90, 105, 135, 160, 180];
    const rows = crossCurves(p, [displacement], heels, rho);
    rows.forEach((r) => {
      const phi = r.heel * RAD;
      // The same immersed area at every station (a prism): find the line that leaves B T below it.
      const h = offsetForArea(rect, phi, B * T);
      const part = partBelow(rect, phi, h);
      const kn = part.y * Math.cos(phi) + part.z * Math.sin(phi);
      expect(Math.abs(r.kn - kn), `heel ${r.heel}`).toBeLessThan(1e-9);
    });
  });

  test('GZ at a heel to port is minus GZ to starboard', () => {
    const rows = crossCurves(p, [displacement], [-40, -15, 15, 40], rho);
    expect(rows[0]!.kn).toBeCloseTo(-rows[3]!.kn, 12);
    expect(rows[1]!.kn).toBeCloseTo(-rows[2]!.kn, 12);
  });
});

describe('a horizontal circular cylinder', () => {
  test('KN = R sin φ at every heel and displacement, within the error of its offsets', () => {
    // 41 waterlines over the diameter: the circle's vertical tangents at the ends are what
    // the sections' parabolas follow worst (core/upright accuracy tests: h^1.5 there).
    // Measured at most 0.21 % of R; the bound is about three times that.
    const R = 1.5;
    const L = 10;
    const p = prepareHull(circularCylinder(L, R, linspace(0, 2 * R, 41), 5));
    const rho = 1.025;
    const fill = [0.2, 0.5, 0.8];
    const heels = [0, 15, 30, 60, 90, 120, 150, 180];
    const rows = crossCurves(p, fill.map((f) => rho * L * Math.PI * R * R * f), heels, rho);
    for (const r of rows) expect(Math.abs(r.kn - R * Math.sin(r.heel * RAD)), `heel ${r.heel}, ${r.displacement} t`).toBeLessThan(0.006 * R);
  });
});
