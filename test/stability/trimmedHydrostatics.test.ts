/**
 * The hydrostatic table at a trimmed waterline (core/stability/trimmedHydrostatics.ts)
 * against closed forms.
 *
 * Sources:
 * - A box, a wedge in plan and a prism of V sections cut by a sloping plane: the immersed
 *   body's section area varies along the length as a polynomial of degree at most two, so
 *   its volume, moments and the waterplane's moments are integrals of polynomials done by
 *   hand below (elementary calculus); Simpson's rules integrate cubics exactly (any
 *   numerical analysis text, e.g. Burden & Faires, Numerical Analysis, ch. 4, from memory),
 *   so the table must give them to rounding, where the immersed length ends between
 *   stations too.
 * - Trim = draft at AP - draft at FP, positive by the stern; draft amidships half-way
 *   between (the shared conventions; common practice, no source).
 * - On the demo hulls, the hull cut by the same plane through core/stability's inclined
 *   waterplane, a separate reading (sections cut by Green's theorem): agreement to 1e-9.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError, type Issue } from '../../core/common/errors.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { inclinedHydrostatics, waterplaneOf } from '../../core/stability/inclinedHydrostatics.js';
import { draftsForDisplacements } from '../../core/stability/levelDrafts.js';
import { trimmedHydrostaticsAt, trimmedHydrostaticTable } from '../../core/stability/trimmedHydrostatics.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { HYDROSTATIC_FIELDS } from '../../core/upright/hydrostaticFields.js';
import { boxBarge, planWedge, vPrism } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;

/** Exact particulars of a body whose immersed depth is h(x) = hA + (hF - hA) x / L over [0, l], l the wetted length. */
interface Exact {
  volume: number;
  lcb: number;
  kb: number;
  waterplaneArea: number;
  lcf: number;
  bmt: number;
  bml: number;
}

const L = 10;
const B = 4;
const D = 2;

/** The box: every section a rectangle of beam B, so area B h. */
function boxExact(hA: number, hF: number): Exact {
  const s = (hA - hF) / L; // fall of the waterline per metre forward
  const l = hF >= 0 ? L : hA / s;
  const h = (x: number): number => hA - s * x;
  // ∫0^l h = hA l - s l²/2; ∫ x h = hA l²/2 - s l³/3; ∫ h² = (hA³ - h(l)³) / (3 s) (or hA² l if level).
  const v = B * (hA * l - (s * l * l) / 2);
  const mx = B * ((hA * l * l) / 2 - (s * l ** 3) / 3);
  const h2 = s === 0 ? hA * hA * l : (hA ** 3 - h(l) ** 3) / (3 * s);
  return {
    volume: v,
    lcb: mx / v,
    kb: (B * h2) / 2 / v,
    waterplaneArea: B * l,
    lcf: l / 2,
    bmt: (l * B ** 3) / 12 / v,
    bml: (B * l ** 3) / 12 / v,
  };
}

describe('a box barge trimmed', () => {
  const p = prepareHull(boxBarge(L, B, D, 11, 5));

  test.each([
    // draft amidships, trim: both ends immersed, by the stern and by the head
    [1, 0.4],
    [1, -0.6],
    // the forefoot out of the water: the wetted length ends at 8.125 m, between stations 8 and 9 m
    [0.5, 1.6],
    // the heel of the box out: by the head, wetted from 10 - 6.25 ... forward
    [0.4, -1.28],
  ])('at %f m amidships and trim %f m the table is the sloping cut of the box', (d, trim) => {
    const row = trimmedHydrostaticsAt(p, d, trim);
    const hA = d + trim / 2;
    const hF = d - trim / 2;
    expect(row.draftAft).toBeCloseTo(hA, 12);
    expect(row.draftFwd).toBeCloseTo(hF, 12);
    expect(row.trim).toBe(trim);
    expect(row.draft).toBe(d);
    // By the head with the aft end out, mirror the box end for end: x -> L - x.
    const mirrored = hA < 0;
    const e = mirrored ? boxExact(hF, hA) : boxExact(hA, hF);
    const lcb = mirrored ? L - e.lcb : e.lcb;
    const lcf = mirrored ? L - e.lcf : e.lcf;
    expect(row.volume).toBeRelClose(e.volume, 1e-12);
    expect(row.lcb).toBeCloseTo(lcb, 11);
    expect(row.vcb).toBeCloseTo(e.kb, 11);
    expect(row.waterplaneArea).toBeRelClose(e.waterplaneArea, 1e-12);
    expect(row.lcf).toBeCloseTo(lcf, 11);
    expect(row.bmt).toBeRelClose(e.bmt, 1e-11);
    expect(row.bml).toBeRelClose(e.bml, 1e-11);
    expect(row.kmt).toBeCloseTo(row.vcb + row.bmt, 11);
  });
});

describe('other shapes trimmed', () => {
  test('a wedge in plan (the bow of a punt): volume and LCB of the sloping cut', () => {
    // Half-breadth (B/2) x / L, so section area B x h(x) / L; both ends immersed.
    const p = prepareHull(planWedge(L, B, D, 11, 5));
    const d = 1;
    const trim = 0.8;
    const hA = d + trim / 2;
    const s = trim / L;
    const h = (x: number): number => hA - s * x;
    // ∫0^L x h = hA L²/2 - s L³/3; ∫ x² h = hA L³/3 - s L⁴/4; ∫ x h² / 2 by expansion.
    const v = (B / L) * ((hA * L * L) / 2 - (s * L ** 3) / 3);
    const mx = (B / L) * ((hA * L ** 3) / 3 - (s * L ** 4) / 4);
    const mz = (B / L) * 0.5 * ((hA * hA * L * L) / 2 - (2 * hA * s * L ** 3) / 3 + (s * s * L ** 4) / 4);
    const row = trimmedHydrostaticsAt(p, d, trim);
    expect(row.volume).toBeRelClose(v, 1e-12);
    expect(row.lcb).toBeCloseTo(mx / v, 11);
    expect(row.vcb).toBeCloseTo(mz / v, 11);
    expect(h(L)).toBeCloseTo(row.draftFwd, 12);
  });

  test('a prism of V sections with its forefoot out: area B h² / (2 D) along a wetted length that ends between stations', () => {
    const p = prepareHull(vPrism(L, B, D, 11, 9));
    const d = 0.6;
    const trim = 1.5; // hA 1.35, hF -0.15: wetted to x = 9 m
    const hA = d + trim / 2;
    const s = trim / L;
    const l = hA / s;
    // ∫0^l (hA - s x)² dx = hA³ / (3 s); ∫ x (hA - s x)² dx = hA⁴ / (12 s²).
    const k = B / (2 * D);
    const v = (k * hA ** 3) / (3 * s);
    const mx = (k * hA ** 4) / (12 * s * s);
    // A V section's centroid is 2/3 of its depth up: ∫ (2/3) h k h² dx = (2/3) k hA⁴ / (4 s).
    const mz = ((2 / 3) * k * hA ** 4) / (4 * s);
    const row = trimmedHydrostaticsAt(p, d, trim);
    expect(row.volume).toBeRelClose(v, 1e-12);
    expect(row.lcb).toBeCloseTo(mx / v, 11);
    expect(row.vcb).toBeCloseTo(mz / v, 11);
    // Waterplane: breadth B h / D, a triangle in plan from x = 0 to l.
    expect(row.waterplaneArea).toBeRelClose((B * hA * l) / (2 * D), 1e-12);
    expect(row.lcf).toBeCloseTo(l / 3, 11);
  });
});

describe('against the level table and the inclined waterplane', () => {
  test.each(['survey-launch.csv', 'workboat.csv'])('%s at zero trim is the upright table, field by field', (file) => {
    const p = prepareHull(demo(file));
    for (const d of [0.3 * p.lowestDeck + 0.7 * p.lowestKeel, 0.5 * (p.lowestDeck + p.lowestKeel)]) {
      const up = hydrostaticsAt(p, d);
      const tr = trimmedHydrostaticsAt(p, d, 0);
      for (const { key } of HYDROSTATIC_FIELDS) expect(tr[key], key).toBe(up[key]);
    }
  });

  test.each(['survey-launch.csv', 'workboat.csv'])('%s trimmed by the stern and by the head: volume and centre of buoyancy as the inclined waterplane gives them', (file) => {
    const p = prepareHull(demo(file));
    const d = 0.5 * (p.lowestDeck + p.lowestKeel) + 0.1 * (p.lowestDeck - p.lowestKeel);
    for (const trim of [0.02 * p.perp.lbp, -0.015 * p.perp.lbp]) {
      const row = trimmedHydrostaticsAt(p, d, trim);
      const ref = inclinedHydrostatics(p, waterplaneOf(p, d, trim, 0));
      expect(row.volume).toBeRelClose(ref.volume, 1e-9);
      expect(row.lcb).toBeCloseTo(ref.xB, 8);
      expect(row.vcb).toBeCloseTo(ref.zB, 8);
    }
  });
});

describe('drafts for displacements at a held trim', () => {
  const p = prepareHull(boxBarge(L, B, D, 11, 5));
  const rho = 1.025;

  test('a trimmed box: L B d with both ends in, B hA l / 2 with the forefoot out', () => {
    // 40 m³ at 0.4 m by the stern: d = 40 / (L B) = 1 m. 21.125 m³ at 1.6 m by the stern:
    // the wedge of hA = d + 0.8 over l = 10 hA / 1.6, so 4 hA² 10 / 3.2 = 21.125, hA = 1.3, d = 0.5.
    expect(draftsForDisplacements(p, [40 * rho], rho, 0.4)[0]).toBeCloseTo(1, 11);
    expect(draftsForDisplacements(p, [21.125 * rho], rho, 1.6)[0]).toBeCloseTo(0.5, 11);
  });

  test('more than the hull floats at that trim within its deck is refused, naming the limit', () => {
    // At 1.2 m by the stern the transom's deck edge (2 m) is reached at 1.4 m amidships: L B 1.4 = 56 m³.
    expect(() => draftsForDisplacements(p, [40, 60 * rho], rho, 1.2)).toThrow(/displacement 61.5 t is more than the hull floats at a trim of 1.2 m within its deck: 57.4 t .*draft 1.4 m amidships/);
  });
});

describe('bad drafts and trims', () => {
  const p = prepareHull(boxBarge(L, B, D, 11, 5));

  test('a waterline that rises above the deck at the stern is refused, naming the station and the index', () => {
    // 1.5 amidships with 1.2 by the stern: 2.1 m at the transom, deck at 2 m.
    let issues: readonly Issue[] = [];
    try {
      trimmedHydrostaticTable(p, [1, 1.5, 0.1], 1.2);
    } catch (e) {
      if (isHalfbreadthError(e)) issues = e.issues;
    }
    expect(issues.map((i) => [i.code, i.path])).toEqual([['HYD_DRAFT_OUT_OF_RANGE', ['drafts', 1]]]);
    expect(issues[0]!.message).toMatch(/z = 2\.1 m at station x = 0 m, above its deck edge \(z = 2 m\)/);
  });

  test('a waterline clear of every station, and a trim that is not a number, are refused', () => {
    expect(() => trimmedHydrostaticsAt(p, -2, 0.5)).toThrow(/clear of the water/);
    expect(() => trimmedHydrostaticTable(p, [1], Number.NaN)).toThrow(/trim NaN/);
  });
});
