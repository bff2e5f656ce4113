/**
 * The integration over the immersed length (core/upright/waterlinePlan.ts): where the
 * waterline ends between stations and where the station spacing changes.
 *
 * Sources (outside the project): the raked-bow barge's particulars are the integrals of a
 * polyhedron, a box with a 45-degree wedge at the bow, worked in `bargeExact` below by
 * elementary calculus; the definitions of the particulars (BM = I/V, MCT 1 cm =
 * Δ·BML/(100·LBP), the coefficients) are those of the project's conventions (E. C.
 * Tupper, Introduction to Naval Architecture, 5th ed., 2013, ch. 2-4, from memory).
 */
import { describe, expect, test } from 'vitest';
import { SEA_WATER_DENSITY } from '../../core/common/constants.js';
import type { HullModel, Station } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import type { HydrostaticRow } from '../../core/upright/hydrostaticFields.js';
import { hydrostaticsAt, hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { waterlinePlan } from '../../core/upright/waterlinePlan.js';
import { relativeError } from '../helpers/relClose.js';
import '../helpers/relClose.js';

// ---------------------------------------------------------------- the raked-bow barge

/** A 29 m wall-sided barge, 9 m beam, 3 m deep; flat keel to x = 27 m, then a 45-degree rake to the stem at x = 29 m. */
const BARGE = { beam: 9, depth: 3, parallel: 27, rise: 2 } as const;
const keelOf = (x: number): number => Math.max(0, x - BARGE.parallel);

/** Stations every 3 m to 27 m, then `bow` (28 and 29 m, or quarter stations). */
function bargeStations(bow: readonly number[]): number[] {
  return [0, 3, 6, 9, 12, 15, 18, 21, 24, 27, ...bow];
}

/** The barge in the grid form: a half-breadth of 4.5 m from the keel up, blank below it. */
function bargeGrid(bow: readonly number[], waterlines: readonly number[]): string {
  const rows = bargeStations(bow).map((x) => [x, ...waterlines.map((z) => (z < keelOf(x) - 1e-12 ? '' : BARGE.beam / 2))].join(','));
  return ['# name: raked-bow barge', '# units: m', `x,${waterlines.join(',')}`, ...rows].join('\n');
}

/** The barge in the points form, its flat of bottom drawn out to a knuckle at the bilge. */
function bargePoints(bow: readonly number[]): string {
  const rows = bargeStations(bow).flatMap((x) => {
    const k = keelOf(x);
    return [`${x},0,${k},0`, `${x},${BARGE.beam / 2},${k},1`, `${x},${BARGE.beam / 2},${BARGE.depth},0`];
  });
  return ['# name: raked-bow barge', '# units: m', 'x,y,z,knuckle', ...rows].join('\n');
}

/**
 * The polyhedron's particulars at draft d (0 < d <= 3), sea water. The immersed body is
 * the box 27 x 9 x d and, beyond x = 27, the wedge under the rake: with u = x - 27 its
 * section is 9 (d - u) for u up to ue = min(d, 2); above d = 2 the stem at x = 29 is a
 * square face 9 x (d - 2).
 */
function bargeExact(d: number): HydrostaticRow {
  const B = BARGE.beam;
  const L0 = BARGE.parallel;
  const ue = Math.min(d, BARGE.rise);
  const xe = L0 + ue;
  // ∫0^ue 9 (d - u) du, ∫ (27 + u) 9 (d - u) du, ∫ 9 (d - u)(d + u)/2 du
  const wedgeV = B * (d * ue - (ue * ue) / 2);
  const wedgeMx = B * (L0 * d * ue - (L0 * ue * ue) / 2 + (d * ue * ue) / 2 - (ue * ue * ue) / 3);
  const wedgeMz = (B * (d * d * ue - (ue * ue * ue) / 3)) / 2;
  const volume = B * L0 * d + wedgeV;
  const lcb = (B * L0 * d * (L0 / 2) + wedgeMx) / volume;
  const vcb = ((B * L0 * d * d) / 2 + wedgeMz) / volume;
  const waterplaneArea = B * xe;
  const iT = (B ** 3 * xe) / 12;
  const iL = (B * xe ** 3) / 12; // a rectangle about its own middle
  const lbp = L0 + BARGE.rise; // ap and fp are the end stations
  const displacement = SEA_WATER_DENSITY * volume;
  const bmt = iT / volume;
  const bml = iL / volume;
  const am = B * d; // amidships, x = 14.5 m, is in the box
  // Wetted: the bottom (its rake sloping at 45 degrees), the sides, the transom and, above 2 m, the stem face.
  const wettedSurface = B * L0 + B * Math.SQRT2 * ue + 2 * (L0 * d + d * ue - (ue * ue) / 2) + B * d + (d > BARGE.rise ? B * (d - BARGE.rise) : 0);
  return {
    draft: d,
    volume,
    displacement,
    lcb,
    vcb,
    waterplaneArea,
    lcf: xe / 2,
    iT,
    iL,
    bmt,
    bml,
    kmt: vcb + bmt,
    kml: vcb + bml,
    tpc: (SEA_WATER_DENSITY * waterplaneArea) / 100,
    mct1cm: (displacement * bml) / (100 * lbp),
    lwl: xe,
    bwl: B,
    am,
    cb: volume / (xe * B * d),
    cm: 1,
    cp: volume / (am * xe),
    cwp: 1,
    wettedSurface,
  };
}

const FIELDS = Object.keys(bargeExact(1)) as (keyof HydrostaticRow)[];

/** Worst relative error of any particular against the polyhedron, with the field it is in. */
function worst(row: HydrostaticRow, exact: HydrostaticRow): { field: string; error: number } {
  let out = { field: '', error: 0 };
  for (const k of FIELDS) {
    const e = relativeError(row[k], exact[k]);
    if (!(e <= out.error)) out = { field: k, error: e };
  }
  return out;
}

// Drafts on the tabulated waterlines and between them; at 1 and 2 m the waterline ends on a station.
const DRAFTS = [0.3, 0.5, 0.75, 1.0, 1.2, 1.5, 1.9, 2.0, 2.2, 2.5, 2.75, 3.0];
const EVERY_HALF_METRE = [0, 0.5, 1, 1.5, 2, 2.5, 3];
const EVERY_QUARTER = [0, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 1.75, 2, 2.25, 2.5, 2.75, 3];
const QUARTER_STATIONS = [27.25, 27.5, 27.75, 28, 28.25, 28.5, 28.75, 29];

describe('the raked-bow barge: every particular equals the polyhedron', () => {
  // A hull of planes is integrated exactly: the end pieces read the rake from the straight
  // keel line, and the panels hold polynomials of degree 3 or less. So the bound is
  // rounding, well inside the 0.1 % a working table needs.
  const EXACT = 1e-9;
  const cases: [string, string][] = [
    ['grid form, stations at 28 and 29 m', bargeGrid([28, 29], EVERY_HALF_METRE)],
    ['points form, stations at 28 and 29 m', bargePoints([28, 29])],
    ['grid form, quarter stations in the bow (waterlines every 0.25 m)', bargeGrid(QUARTER_STATIONS, EVERY_QUARTER)],
    ['points form, quarter stations in the bow', bargePoints(QUARTER_STATIONS)],
  ];
  test.each(cases)('%s', (_label, csv) => {
    const p = prepareHull(readOffsetsCsv(csv).hull);
    for (const row of hydrostaticTable(p, DRAFTS)) {
      const w = worst(row, bargeExact(row.draft));
      expect(w.error, `draft ${row.draft} m: ${w.field}`).toBeLessThan(EXACT);
    }
  });

  test('no coefficient exceeds 1 (the old cubic across the step gave Cb = Cwp = 1.096 at 0.5 m)', () => {
    const p = prepareHull(readOffsetsCsv(bargeGrid([28, 29], EVERY_HALF_METRE)).hull);
    for (const row of hydrostaticTable(p, DRAFTS)) for (const k of ['cb', 'cm', 'cp', 'cwp'] as const) expect(row[k]).toBeLessThanOrEqual(1);
  });

  test('the sheet shows the end piece as its own lines and keeps the trade multipliers', () => {
    const p = prepareHull(readOffsetsCsv(bargeGrid([28, 29], EVERY_HALF_METRE)).hull);
    const sheet = calculationSheet(p, 0.5);
    // Stations 0 to 27 m: the first rule on 0-18 m and the second on 18-27 m (nine equal
    // intervals); then the end piece from 27 m to where the waterline ends, 27.5 m.
    const stationLines = sheet.stations.filter((s) => s.kind === 'station');
    expect(stationLines.map((s) => s.x)).toEqual([0, 3, 6, 9, 12, 15, 18, 21, 24, 27]);
    expect(sheet.spacing).toBe(3);
    // h/3 (1, 4, 2, 4, 2, 4, 1) then 3h/8 (1, 3, 3, 1) over h/3 = 9/8 (1, 3, 3, 1), and the end piece adds 0.5/6 / 1 at 27 m.
    expect(stationLines.slice(0, 9).map((s) => s.multiplier)).toEqual([1, 4, 2, 4, 2, 4, 1 + 9 / 8, 27 / 8, 27 / 8]);
    expect(stationLines[9]!.multiplier).toBeRelClose(9 / 8 + 0.5 / 6, 1e-15);
    for (const s of sheet.stations) expect(s.multiplier).toBeGreaterThan(0);
    const end = sheet.stations.at(-1)!;
    expect(end.kind).toBe('end');
    expect(end.x).toBe(27.5);
    expect(end.area).toBe(0);
    expect(end.halfBreadth).toBe(4.5); // the flat raked bow ends the waterplane with its full breadth
    expect(sheet.pieces.at(-1)).toMatchObject({ from: 27, to: 27.5 });
    expect(sheet.ends.at(-1)).toContain('x = 27.5 m');
    expect(sheet.results.volume).toBeRelClose(bargeExact(0.5).volume, 1e-12);
  });
});

// ------------------------------------------------------------- the transom's lower edge

/**
 * A 10 m hull whose keel rises aft to a transom: keel z = 0.4 (1 - x/4)^2 aft of x = 4 m,
 * on the baseline forward of it; a flat of bottom 0.6 + 0.05 x wide each side, then a
 * flaring side y = b + 0.3 s + 0.1 s^2 at a height s above the keel, up to z = 2 m;
 * stations every 0.5 m. The transom's lower edge is at z = 0.4 m.
 */
function transomHull(): HullModel {
  const stations: Station[] = [];
  for (let k = 0; k <= 20; k++) {
    const x = k * 0.5;
    const keel = x < 4 ? 0.4 * (1 - x / 4) ** 2 : 0;
    const b = 0.6 + 0.05 * x;
    const points = [{ y: 0, z: keel, knuckle: false }];
    for (let j = 0; j <= 4; j++) {
      const s = ((2 - keel) * j) / 4;
      points.push({ y: b + 0.3 * s + 0.1 * s * s, z: keel + s, knuckle: j === 0 });
    }
    stations.push({ x, points });
  }
  return { name: 'transom hull', stations };
}

describe('across the transom\'s lower edge the waterplane is continuous', () => {
  test('waterplane area, LCF and IL at the edge -/+ 1e-6 m differ by less than 1e-4', () => {
    const p = prepareHull(transomHull());
    const edge = 0.4;
    const below = hydrostaticsAt(p, edge - 1e-6);
    const above = hydrostaticsAt(p, edge + 1e-6);
    // Below the edge the transom station is dry and the waterline ends just forward of it.
    expect(waterlinePlan(p, edge - 1e-6).ends[0]!.between).toEqual([0, 1]);
    expect(waterlinePlan(p, edge + 1e-6).ends[0]!.between).toBeNull();
    for (const k of ['waterplaneArea', 'lcf', 'iL', 'iT'] as const) {
      expect(relativeError(below[k], above[k]), k).toBeLessThan(1e-4);
    }
  });

  test('the demo workboat has no jump where the waterline reaches its transom (the old sum jumped 0.9 %)', async () => {
    const { readFileSync } = await import('node:fs');
    const p = prepareHull(readOffsetsCsv(readFileSync(new URL('../../offsets-demo/workboat.csv', import.meta.url), 'utf8')).hull);
    // The transom's lower edge: the keel of its aftmost station.
    const edge = p.keel[0]!;
    const below = hydrostaticsAt(p, edge - 1e-6);
    const above = hydrostaticsAt(p, edge + 1e-6);
    // Measured 5e-4 (waterplane, LCF) and 1.8e-3 (IL): the two ways of reading the first interval
    // (the hull between stations 0 and 0.7 m, or the parabola through three stations) differ by
    // the rules' own error on stations 0.7 m apart; the bound is about twice that.
    for (const k of ['waterplaneArea', 'lcf', 'iL'] as const) expect(relativeError(below[k], above[k]), k).toBeLessThan(4e-3);
  });
});
