/**
 * The calculation sheet (core/upright/calculationSheet.ts, core/upright/verticalSheet.ts,
 * core/report/formatSheet.ts) against closed-form hulls, the trade's multipliers, and the
 * hydrostatics it sets out.
 *
 * Sources (outside the project):
 * - Closed forms of the box, the V prism and the parabolic hull: integrals worked in the
 *   comments beside each check (elementary calculus).
 * - BMt = B^2 / (12 T) for a box: E. C. Tupper, Introduction to Naval Architecture, 5th
 *   ed. (2013), ch. 4 (from memory); it is I/V with I = L B^3 / 12.
 * - The multipliers 1, 4, 2, 4, ..., 4, 1 and, with half ordinates at the ends,
 *   1/2, 2, 1 1/2, 4, 2, ..., 2, 4, 1 1/2, 2, 1/2: C. B. Barrass & D. R. Derrett, Ship
 *   Stability for Masters and Mates, 7th ed. (2012), ch. 10 (from memory); common
 *   practice on any sheet of areas.
 * The sheet's results are also held to hydrostaticsAt's to 1e-12: the sheet is that
 * sum set out, so any difference beyond rounding is a fault in one of them.
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import { verticalSheet } from '../../core/upright/verticalSheet.js';
import { HalfbreadthError } from '../../core/common/errors.js';
import { sheetCsv, sheetResult, sheetText } from '../../core/report/formatSheet.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { multiplierText } from '../../core/report/multiplierText.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { boxBarge, gridHull, linspace, parabolicHull, vPrism } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;

// Rounding only: the sheet and hydrostaticsAt add the same products in the same order,
// the sheet through multiplier x h/3 instead of the weight, which costs a few ulps.
const SAME_SUM = 1e-12;

const SHEET_KEYS = ['volume', 'displacement', 'lcb', 'vcb', 'waterplaneArea', 'lcf', 'iT', 'iL', 'bmt', 'bml', 'kmt', 'kml', 'tpc', 'mct1cm'] as const;

function expectSheetEqualsHydrostatics(hull: HullModel, draft: number): void {
  const p = prepareHull(hull);
  const sheet = calculationSheet(p, draft);
  const row = hydrostaticsAt(p, draft);
  // Positions are compared relative to the hull's length, so a centroid near x = 0 is not held to 1e-12 of itself.
  const scale = Math.abs(p.perp.lbp);
  for (const k of SHEET_KEYS) {
    const abs = k === 'lcb' || k === 'lcf' ? SAME_SUM * scale : 0;
    expect(sheet.results[k], `${hull.name} at ${draft} m: ${k}`).toBeRelClose(row[k], SAME_SUM, abs);
  }
}

describe('the longitudinal sheet', () => {
  test('a box barge gets the multipliers 1, 4, 2, ..., 4, 1 and its closed-form particulars', () => {
    // Box L = 10, B = 4: volume L B T, VCB T/2, Aw L B, LCB = LCF = L/2, BMt = B^2/(12 T).
    const L = 10;
    const B = 4;
    const T = 1.3;
    const sheet = calculationSheet(prepareHull(boxBarge(L, B, 2, 11, 5)), T);
    expect(sheet.spacing).toBeRelClose(1, 1e-15);
    expect(sheet.stations.map((s) => multiplierText(s.multiplier))).toEqual(['1', '4', '2', '4', '2', '4', '2', '4', '2', '4', '1']);
    expect(sheet.results.volume).toBeRelClose(L * B * T, 1e-13);
    expect(sheet.results.vcb).toBeRelClose(T / 2, 1e-13);
    expect(sheet.results.waterplaneArea).toBeRelClose(L * B, 1e-13);
    expect(sheet.results.lcb).toBeRelClose(L / 2, 1e-13);
    expect(sheet.results.lcf).toBeRelClose(L / 2, 1e-13);
    expect(sheet.results.bmt).toBeRelClose((B * B) / (12 * T), 1e-13);
    // iL of a rectangle about its middle: B L^3 / 12.
    expect(sheet.results.iL).toBeRelClose((B * L ** 3) / 12, 1e-12);
    // Levers are x - amidships.
    expect(sheet.stations.map((s) => s.lever)).toEqual(linspace(-5, 5, 11));
  });

  test('half ordinates at the ends get the multipliers 1/2, 2, 1 1/2, 4, ..., 1 1/2, 2, 1/2', () => {
    const xs = [0, 0.5, 1, 2, 3, 4, 5, 6, 7, 8, 9, 9.5, 10];
    const hull = gridHull('box with half stations', xs, [0, 0.5, 1], () => 1);
    const sheet = calculationSheet(prepareHull(hull), 0.8);
    expect(sheet.spacing).toBe(1);
    expect(sheet.stations.map((s) => multiplierText(s.multiplier))).toEqual(['1/2', '2', '1 1/2', '4', '2', '4', '2', '4', '2', '4', '1 1/2', '2', '1/2']);
    // A box 10 x 2 to 0.8 m: 16 m3.
    expect(sheet.results.volume).toBeRelClose(16, 1e-13);
  });

  test('the parabolic hull gives (4/9) L B T and (2/3) L B, which Simpson integrates exactly', () => {
    // y = (B/2)(1 - xi^2)(1 - zeta^2): sectional area B (1 - xi^2) (2T/3), so
    // volume = B (2T/3) (L/2) (4/3) = (4/9) L B T; Aw = B (L/2)(4/3) = (2/3) L B;
    // VCB: the section's moment 2 (B/2)(1 - xi^2) T^2 (1/2 - 1/12... ) gives KB = 5T/8
    // (integral of z (1 - ((T - z)/T)^2) over [0, T] is 5 T^2 / 12, over the area 2T/3).
    const L = 20;
    const B = 4;
    const T = 1.5;
    const sheet = calculationSheet(prepareHull(parabolicHull(L, B, T, 2 * T, 21, 11)), T);
    expect(sheet.results.volume).toBeRelClose((4 / 9) * L * B * T, 1e-13);
    expect(sheet.results.waterplaneArea).toBeRelClose((2 / 3) * L * B, 1e-13);
    expect(sheet.results.vcb).toBeRelClose((5 * T) / 8, 1e-13);
    expect(sheet.results.lcb).toBeRelClose(L / 2, 1e-13);
  });

  test('its results equal hydrostaticsAt on the demo hulls, at tabulated drafts and between them', () => {
    for (const [file, drafts] of [
      ['workboat.csv', [0.5, 1.3, 1.4, 2.05]],
      ['survey-launch.csv', [0.2, 0.45, 0.6, 1.1]],
      ['workboat-ftin.csv', [0.9, 1.4]],
    ] as const) {
      const hull = demo(file);
      for (const d of drafts) expectSheetEqualsHydrostatics(hull, d);
    }
  });

  test('its results equal hydrostaticsAt on uneven station spacing', () => {
    const xs = [0, 0.3, 1.1, 2, 3.7, 4, 5.5, 7, 7.2];
    expectSheetEqualsHydrostatics(gridHull('uneven', xs, [0, 0.4, 0.9, 1.5], (x, z) => 0.5 + 0.1 * x - 0.01 * x * x + 0.3 * z), 1.1);
  });

  test('multipliers and the spacing are carried clean: exactly 4, and h = 0.7 from stations 0.7 apart', () => {
    // Stations 0, 0.7, 1.4, 2.1, 2.8 m: the differences of these doubles are 0.7 and
    // 0.7000000000000002 (2.1 - 1.4); the sheet reads h = 0.7 and writes 1, 4, 2, 4, 1.
    const hull = gridHull('box', [0, 0.7, 1.4, 2.1, 2.8], [0, 0.5, 1], () => 1);
    const sheet = sheetResult(hull, calculationSheet(prepareHull(hull), 0.8));
    expect(sheet.spacing).toBe(0.7);
    expect(sheet.stations.map((s) => s.multiplier)).toEqual([1, 4, 2, 4, 1]);
    expect(JSON.stringify(sheet.stations.map((s) => s.multiplier))).toBe('[1,4,2,4,1]');
  });

  test('stations in feet-inches-eighths a whole number of sixteenths apart get the trade multipliers exactly', () => {
    // 2 ft 3 9/16 in = 27.5625 in = 0.7000875 m apart (1 in = 0.0254 m exactly): the metres
    // carry rounding, the multipliers do not.
    const csv = ['# units: ft-in-8', 'x,0-0-0,1-0-0,2-0-0', '0-0-0,1-0-0,1-0-0,1-0-0', '2-3-4+,1-0-0,1-0-0,1-0-0', '4-7-1,1-0-0,1-0-0,1-0-0', '6-10-5+,1-0-0,1-0-0,1-0-0', '9-2-2,1-0-0,1-0-0,1-0-0'].join('\n');
    const sheet = calculationSheet(prepareHull(readOffsetsCsv(csv).hull), 0.5);
    expect(sheet.spacing).toBe(0.7000875);
    expect(sheet.stations.map((s) => s.multiplier)).toEqual([1, 4, 2, 4, 1]);
  });

  test('a draft outside the hull is refused with its code', () => {
    const p = prepareHull(boxBarge(10, 4, 2));
    expect(() => calculationSheet(p, 2.5)).toThrow(HalfbreadthError);
    const caught = (() => {
      try {
        calculationSheet(p, -1);
      } catch (e) {
        return e;
      }
      return undefined;
    })();
    expect(caught).toBeInstanceOf(HalfbreadthError);
    expect((caught as HalfbreadthError).issues[0]).toMatchObject({ code: 'HYD_DRAFT_OUT_OF_RANGE', path: ['draft'] });
  });
});

describe('the vertical sheets', () => {
  test('a V section at a tabulated draft gets 1, 4, 2, 4, 1 and the triangle area', () => {
    // y = (B/2) z / D on waterlines 0, 0.5, 1, 1.5, 2: area to T = B T^2 / (2 D).
    const B = 4;
    const D = 2;
    const sheet = calculationSheet(prepareHull(vPrism(10, B, D, 11, 5)), 2);
    const v = sheet.verticals[3]!;
    expect(v.ordinates.map((o) => multiplierText(o.multiplier!))).toEqual(['1', '4', '2', '4', '1']);
    expect(v.spacing).toBe(0.5);
    expect(v.area).toBeRelClose((B * 4) / (2 * D), 1e-13);
    expect(v.cutPanel).toBeNull();
  });

  test('a draft between waterlines is taken along the panel it cuts and still gives the closed-form area', () => {
    // The V section again at T = 1.3 (between 1 and 1.5): B T^2 / (2 D).
    const B = 4;
    const D = 2;
    const T = 1.3;
    const sheet = calculationSheet(prepareHull(vPrism(10, B, D, 11, 5)), T);
    const v = sheet.verticals[5]!;
    expect(v.area).toBeRelClose((B * T * T) / (2 * D), 1e-13);
    expect(v.cutPanel).toEqual({ rule: 'parabola', heights: [1, 1.5, 2], from: 1 });
    expect(v.ordinates.filter((o) => o.aboveDraft).map((o) => o.z)).toEqual([1.5, 2]);
    // Parabolic sections (quadratic in z) are integrated exactly too: 2 (B/2)(1 - xi^2) integral of (1 - zeta^2).
    const L = 20;
    const Tp = 1.5;
    const par = calculationSheet(prepareHull(parabolicHull(L, B, Tp, 2 * Tp, 21, 11)), 1.0);
    const mid = par.verticals[10]!; // xi = 0
    // integral over [0, 1] of 1 - ((1.5 - z)/1.5)^2 dz = 1 - (1.5^3 - 0.5^3) / (3 * 1.5^2) = 0.5185185...
    const exact = B * (1 - (Tp ** 3 - (Tp - 1) ** 3) / (3 * Tp * Tp));
    expect(mid.area).toBeRelClose(exact, 1e-13);
  });

  test('its area equals the section area at every station of the demo hulls', () => {
    for (const [file, drafts] of [
      ['workboat.csv', [0.05, 0.3, 1.0, 1.37, 2.2]],
      ['survey-launch.csv', [0.1, 0.29, 0.33, 0.8, 1.3]],
    ] as const) {
      const p = prepareHull(demo(file));
      for (const d of drafts) {
        const sheet = calculationSheet(p, d);
        sheet.verticals.forEach((v, i) => {
          if (v === null) return; // an end or middle line: no station of its own
          expect(v.area, `${file} station ${i} at ${d} m`).toBeRelClose(v.sectionArea, 1e-12, 1e-15);
          expect(v.sectionArea, `${file} station ${i} at ${d} m against the longitudinal sheet`).toBe(sheet.stations[i]!.area);
        });
      }
    }
  });

  test('a knuckle splits the section into runs and the area is that of the two straight-sided parts', () => {
    // Half-section: V bottom y = 2z to the chine at (1, 0.5), then a vertical side to z = 1.5.
    // Area to T >= 0.5: 2 (0.25 + (T - 0.5)).
    const station = (x: number) => ({
      x,
      points: [
        { y: 0, z: 0, knuckle: false },
        { y: 0.5, z: 0.25, knuckle: false },
        { y: 1, z: 0.5, knuckle: true },
        { y: 1, z: 1, knuckle: false },
        { y: 1, z: 1.5, knuckle: false },
      ],
    });
    const hull: HullModel = { name: 'chine prism', stations: [0, 1, 2, 3, 4].map(station) };
    const sheet = calculationSheet(prepareHull(hull), 0.8);
    const v = sheet.verticals[2]!;
    expect(v.area).toBeRelClose(2 * (0.25 + 0.3), 1e-13);
    // Heights listed 0, 0.25, 0.5, 1, 1.5: intervals 0.25 and 0.5 twice each, so h = 0.5 (the
    // larger on a tie) and the bottom run's h/3 (0.25/3)(1, 4, 1) reads 1/2, 2, ... The chine
    // also carries the side panel's weight: the integral over [0.5, 0.8] of the basis
    // 2 (z - 1)(z - 1.5) of the nodes 0.5, 1, 1.5 is 0.183, so its multiplier is
    // (0.25/3 + 0.183) / (0.5/3) = 1.598.
    expect(v.spacing).toBe(0.5);
    expect(v.ordinates.slice(0, 2).map((o) => multiplierText(o.multiplier!))).toEqual(['1/2', '2']);
    expect(v.ordinates[2]!.multiplier).toBeRelClose(1.598, 1e-12);
  });

  test('a run at one height is taken along the curve and adds no area when it is a flat', () => {
    // Flat of keel given as points (0,0)-(0.4,0), a knuckle, then y = 0.4 + z up the side.
    // Area to T: 2 integral of (0.4 + z) from 0 to T = 2 (0.4 T + T^2 / 2).
    const station = (x: number) => ({
      x,
      points: [
        { y: 0, z: 0, knuckle: false },
        { y: 0.4, z: 0, knuckle: true },
        { y: 0.9, z: 0.5, knuckle: false },
        { y: 1.4, z: 1, knuckle: false },
      ],
    });
    const hull: HullModel = { name: 'flat keel prism', stations: [0, 1, 2].map(station) };
    const T = 0.7;
    const v = calculationSheet(prepareHull(hull), T).verticals[1]!;
    expect(v.curveParts).toHaveLength(1);
    expect(v.curveParts[0]!.area).toBeCloseTo(0, 14);
    expect(v.area).toBeRelClose(2 * (0.4 * T + (T * T) / 2), 1e-13);
    expect(v.ordinates[0]!.multiplier).toBeNull();
  });

  test('a station whose keel is above the draft has an empty sheet, and no line on the longitudinal sheet', () => {
    const p = prepareHull(demo('workboat.csv'));
    // The workboat's transom station (x = 0) has its keel above 0.5 m (the file's first row).
    expect(p.keel[0]).toBeGreaterThan(0.5);
    const v = verticalSheet(p.hull.stations[0]!.points, p.sections[0]!, 0.5);
    expect(v.immersed).toBe(false);
    expect(v.ordinates).toHaveLength(0);
    expect(v.area).toBe(0);
    const sheet = calculationSheet(p, 0.5);
    expect(sheet.stations.some((s) => s.kind === 'station' && s.x === p.x[0])).toBe(false);
    expect(sheet.stations[0]!.kind).toBe('end');
  });
});

describe('the sheet in its forms', () => {
  const hull = boxBarge(10, 4, 2, 11, 5);
  const r = sheetResult(hull, calculationSheet(prepareHull(hull), 1));

  test('JSON carries the caution, the spacing and each station with its multiplier and vertical sheet', () => {
    expect(r.caution).toBe(CAUTION);
    expect(r.spacing).toBeRelClose(1, 1e-15);
    expect(r.stations[1]).toMatchObject({ x: 1, multiplier: 4, multiplierText: '4', halfBreadth: 2 });
    expect(r.stations[1]!.vertical!.ordinates.map((o) => o.multiplierText)).toEqual(['1', '4', '1']);
    expect(r.totals.areaSM).toBeRelClose(4 * 30, 1e-13); // area 4 m2 x sum of multipliers 30
  });

  test('CSV opens with the caution, states h and the results, and ends with a row of sums', () => {
    const csv = sheetCsv(r);
    expect(csv.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    expect(csv).toContain('# h = 1 m (the most common station interval); h/3 = 0.333333333333 m');
    // 10 m x 4 m x 1 m of box: V = L B T = 40 m3, from h/3 x (4 m2 x 30).
    expect(csv).toContain('# volume = h/3 x sum(A.SM) = 0.333333333333 x 120 = 40 m3');
    const rows = Papa.parse<string[]>(csv.split('\r\n').filter((l) => !l.startsWith('#')).join('\n'), { skipEmptyLines: true }).data;
    expect(rows[0]!.slice(0, 8)).toEqual(['kind', 'station', 'x_m', 'lever_m', 'halfBreadth_m', 'area_m2', 'momentZ_m3', 'multiplier']);
    expect(rows).toHaveLength(1 + 11 + 1);
    expect(rows[12]![0]).toBe('sum');
    expect(Number(rows[12]![8])).toBeRelClose(120, 1e-13);
  });

  test('the text form shows the multipliers as fractions, the formulae and the caution', () => {
    const half = gridHull('half stations', [0, 0.5, 1, 2, 3, 4, 5, 5.5, 6], [0, 0.5, 1], () => 1);
    const t = sheetText(sheetResult(half, calculationSheet(prepareHull(half), 0.6)));
    expect(t).toContain('1 1/2');
    expect(t).toContain('volume = h/3 x sum(A.SM) =');
    // The station at x = 0.5 m is half a station space (h = 1 m) from the AP at x = 0.
    expect(t).toContain('Station 1/2 (x = 0.5 m), keel z = 0 m');
    expect(t.trimEnd().endsWith(CAUTION)).toBe(true);
  });
});

describe('multiplier text', () => {
  test('writes the trade fractions and falls back to decimals', () => {
    expect(multiplierText(1)).toBe('1');
    expect(multiplierText(0.5)).toBe('1/2');
    expect(multiplierText(1.5)).toBe('1 1/2');
    expect(multiplierText(17 / 8)).toBe('2 1/8');
    expect(multiplierText(-0.125)).toBe('-1/8');
    expect(multiplierText(4 + 1e-14)).toBe('4');
    expect(multiplierText(1.2345678)).toBe('1.2346');
    expect(multiplierText(Number.NaN)).toBe('-');
  });
});
