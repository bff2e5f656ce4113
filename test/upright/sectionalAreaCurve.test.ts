/**
 * The sectional-area curve (core/upright/sectionalAreaCurve.ts, core/report/formatAreas.ts) against
 * closed forms.
 *
 * Sources (outside the project): the parabolic hull's sectional area B (1 - xi^2)(2T/3)
 * and prismatic coefficient 2/3 (the area under a parabola is 2/3 of its bounding
 * rectangle); the centroid of a triangle at 2/3 of its length from the apex (elementary
 * mechanics, common practice, no source).
 */
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { areasCsv, areasResult, areasText } from '../../core/report/formatAreas.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { parabolicHull, planWedge } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

describe('the sectional-area curve', () => {
  test('the parabolic hull has areas B (1 - xi^2)(2T/3), its LCB amidships and Cp = 2/3', () => {
    const L = 20;
    const B = 4;
    const T = 1.5;
    const c = sectionalAreaCurve(prepareHull(parabolicHull(L, B, T, 2 * T, 21, 11)), T);
    for (const s of c.stations) {
      const xi = (2 * s.x) / L - 1;
      expect(s.area, `x = ${s.x}`).toBeRelClose(B * (1 - xi * xi) * ((2 * T) / 3), 1e-13, 1e-14);
      expect(s.fraction, `x = ${s.x}`).toBeRelClose(1 - xi * xi, 1e-13, 1e-14);
    }
    expect(c.am).toBeRelClose((B * 2 * T) / 3, 1e-13);
    expect(c.volume).toBeRelClose((4 / 9) * L * B * T, 1e-13);
    expect(c.lcb).toBeRelClose(L / 2, 1e-13);
    expect(c.cp).toBeRelClose(2 / 3, 1e-13);
  });

  test('a wedge in plan has a triangular curve with its centroid two thirds along', () => {
    const L = 12;
    const c = sectionalAreaCurve(prepareHull(planWedge(L, 3, 2, 13, 5)), 1);
    // Area 3 (x / L) x 1: a triangle from 0 at x = 0 to 3 m2 at x = L.
    for (const s of c.stations) expect(s.area).toBeRelClose((3 * s.x) / L, 1e-13, 1e-15);
    expect(c.lcb).toBeRelClose((2 * L) / 3, 1e-13);
  });
});

describe('the sectional-area curve in its forms', () => {
  const L = 12;
  // 12 stations, 12/11 m apart: the LCB (x = 8) falls between the stations at 7.636 and 8.727 m.
  const hull = planWedge(L, 3, 2, 12, 5);
  const r = areasResult(hull, sectionalAreaCurve(prepareHull(hull), 1));

  test('JSON carries the caution and the LCB', () => {
    expect(r.caution).toBe(CAUTION);
    expect(r.lcb).toBeRelClose(8, 1e-13);
  });

  test('CSV gives the LCB in its leading lines and one row per station', () => {
    const csv = areasCsv(r);
    expect(csv.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    expect(csv).toMatch(/# lcb \(its centroid\): x = 8 m/);
    const rows = Papa.parse<string[]>(csv.split('\r\n').filter((l) => !l.startsWith('#')).join('\n'), { skipEmptyLines: true }).data;
    expect(rows[0]).toEqual(['x_m', 'area_m2', 'fraction']);
    expect(rows).toHaveLength(13);
  });

  test('the text form marks the LCB between the stations that straddle it', () => {
    const lines = areasText(r).split('\n');
    const at = lines.findIndex((l) => l.includes('<-- LCB'));
    expect(at).toBeGreaterThan(0);
    expect(lines[at - 1]!.trim().startsWith('7.636')).toBe(true);
    expect(lines[at]!.trim().startsWith('8.000')).toBe(true);
    expect(lines[at + 1]!.trim().startsWith('8.727')).toBe(true);
    expect(areasText(r).trimEnd().endsWith(CAUTION)).toBe(true);
  });
});
