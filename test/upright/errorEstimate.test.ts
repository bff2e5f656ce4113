/**
 * The integration-error estimate (core/upright/errorEstimate.ts) against the true error on
 * hulls whose exact hydrostatics are known.
 *
 * Exact values (derived here; elementary calculus):
 * - Sine hull y = (B/2) w(xi) s(z), xi = 2x/L - 1, w = (1 + a xi) cos(pi xi / 2),
 *   s = sin(k z), k = pi / (2D), keel at z = 0, deck at z = D. With W0 = integral of w
 *   over [-1, 1] = 4/pi (the odd part a xi cos vanishes) and W1 = integral of xi w =
 *   a (4/pi - 32/pi^3) (from the integral of u^2 cos u, u^2 sin u + 2u cos u - 2 sin u):
 *   volume = B (L/2) W0 S0,  S0 = (1 - cos kT) / k;
 *   LCB = L/2 + (L/2) W1 / W0;  VCB = S1 / S0,  S1 = sin(kT)/k^2 - T cos(kT)/k;
 *   Aw = B (L/2) W0 s(T);  iT = (2/3)(B/2)^3 s(T)^3 (L/2) W3, W3 = integral of w^3,
 *   taken by a dense Gauss-Legendre quadrature written in this file (the integrand is
 *   smooth; 400 panels of 5 points are exact to rounding).
 * - Parabolic hull (test/fixtures/hulls.ts): iT = (2/3)(B/2)^3 (L/2)(32/35) at z = T,
 *   the integral of (1 - xi^2)^3 over [-1, 1] being 32/35; volume (4/9) L B T.
 * - Quartic waterplane y = (B/2)(1 - xi^4), wall-sided: volume 0.8 L B T (the integral of
 *   1 - xi^4 is 8/5), Aw 0.8 L B; its Simpson error is exactly C h^4, so Richardson is
 *   exact for the volume.
 * The criterion, from the requirement on the estimate: wherever the true error exceeds
 * 1e-6 of the value, estimate / true error lies between 1/3 and 3.
 */
import { describe, expect, test } from 'vitest';
import { coarseHull, errorEstimates, ERROR_ESTIMATE_FIELDS, type ErrorEstimateField } from '../../core/upright/errorEstimate.js';
import { GL5_T, GL5_W } from '../../core/quadrature/gauss.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { gridHull, linspace, parabolicHull } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

/** Dense reference quadrature on [a, b]: 400 panels of 5-point Gauss-Legendre. */
function dense(f: (t: number) => number, a: number, b: number): number {
  const panels = 400;
  const h = (b - a) / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) for (let g = 0; g < 5; g++) sum += GL5_W[g]! * h * f(a + (p + GL5_T[g]!) * h);
  return sum;
}

type Exact = Record<ErrorEstimateField, number>;

/** Check estimate / true error in [1/3, 3] wherever the true error is above 1e-6 of the value; returns how many were checked. */
function expectBracketed(hull: HullModel, draft: number, exact: Exact): number {
  const p = prepareHull(hull);
  const fine = hydrostaticsAt(p, draft);
  const [est] = errorEstimates(p, [draft]).estimates;
  let checked = 0;
  for (const { key } of ERROR_ESTIMATE_FIELDS) {
    const truth = exact[key] - fine[key];
    if (Math.abs(truth) <= 1e-6 * Math.abs(exact[key])) continue;
    const ratio = est![key] / truth;
    expect(ratio, `${hull.name} at ${draft} m, ${key}: estimate ${est![key]} against true error ${truth}`).toBeGreaterThanOrEqual(1 / 3);
    expect(ratio, `${hull.name} at ${draft} m, ${key}: estimate ${est![key]} against true error ${truth}`).toBeLessThanOrEqual(3);
    checked++;
  }
  return checked;
}

describe('the error estimate brackets the true error', () => {
  const L = 24;
  const B = 6;
  const D = 3;
  const a = 0.3;
  const k = Math.PI / (2 * D);
  const w = (xi: number): number => (1 + a * xi) * Math.cos((Math.PI * xi) / 2);
  const sineHull = (stations: number, waterlines: number): HullModel =>
    gridHull('sine hull', linspace(0, L, stations), linspace(0, D, waterlines), (x, z) => (B / 2) * w((2 * x) / L - 1) * Math.sin(k * z));
  const sineExact = (T: number): Exact => {
    const W0 = 4 / Math.PI;
    const W1 = a * (4 / Math.PI - 32 / Math.PI ** 3);
    const W3 = dense((xi) => w(xi) ** 3, -1, 1);
    const S0 = (1 - Math.cos(k * T)) / k;
    const S1 = Math.sin(k * T) / (k * k) - (T * Math.cos(k * T)) / k;
    const sT = Math.sin(k * T);
    const volume = B * (L / 2) * W0 * S0;
    const iT = (2 / 3) * (B / 2) ** 3 * sT ** 3 * (L / 2) * W3;
    return { volume, lcb: L / 2 + ((L / 2) * W1) / W0, vcb: S1 / S0, waterplaneArea: B * (L / 2) * W0 * sT, bmt: iT / volume };
  };

  test('the reference integral of cos^3 is right (8 / (3 pi) for a = 0)', () => {
    // A check on the dense quadrature itself: the integral of cos^3(pi xi / 2) over [-1, 1] is 8/(3 pi).
    expect(dense((xi) => Math.cos((Math.PI * xi) / 2) ** 3, -1, 1)).toBeRelClose(8 / (3 * Math.PI), 1e-14);
  });

  test('on a sine hull with 13 stations and 9 waterlines, for every estimated quantity', () => {
    // 12 and 8 intervals: the coarse hull is Simpson's first rule throughout.
    const hull = sineHull(13, 9);
    expect(coarseHull(hull).halving.clean).toBe(true);
    let checked = 0;
    for (const T of [D / 2, (3 * D) / 4, D]) checked += expectBracketed(hull, T, sineExact(T));
    // All five quantities have a true error above 1e-6 at every draft: the test is not empty.
    expect(checked).toBe(15);
  });

  test('on a finer sine hull too, where the errors are sixteen times smaller', () => {
    const hull = sineHull(25, 17);
    let checked = 0;
    for (const T of [D / 2, D]) checked += expectBracketed(hull, T, sineExact(T));
    expect(checked).toBeGreaterThanOrEqual(8);
  });

  test("on the parabolic hull's iT and BMt (its volume is exact)", () => {
    const Lp = 20;
    const Bp = 4;
    const T = 1.5;
    const hull = parabolicHull(Lp, Bp, T, 2 * T, 9, 5);
    const volume = (4 / 9) * Lp * Bp * T;
    const iT = (2 / 3) * (Bp / 2) ** 3 * (Lp / 2) * (32 / 35);
    const exact: Exact = { volume, lcb: Lp / 2, vcb: (5 * T) / 8, waterplaneArea: (2 / 3) * Lp * Bp, bmt: iT / volume };
    expect(expectBracketed(hull, T, exact)).toBe(1); // bmt only: the rest is integrated exactly
    // And where the true error is nil, so is the estimate (to rounding).
    const [est] = errorEstimates(prepareHull(hull), [T]).estimates;
    expect(Math.abs(est!.volume)).toBeLessThan(1e-12 * volume);
  });

  test('on a wall-sided quartic waterplane, where Richardson is exact for the volume', () => {
    const Lq = 16;
    const Bq = 4;
    const Dq = 2;
    // 33 stations: the iT integrand (1 - xi^4)^3 is of degree 12, and its Simpson error
    // still changes sign between 9 and 17 stations; from 17 to 33 to 65 it falls by 11.5
    // and 14.9, close to the h^4 law's 16 (the asymptotic range the estimate assumes).
    const hull = gridHull('quartic waterplane', linspace(0, Lq, 33), linspace(0, Dq, 5), (x) => (Bq / 2) * (1 - ((2 * x) / Lq - 1) ** 4));
    const T = 1;
    const W3 = dense((xi) => (1 - xi ** 4) ** 3, -1, 1);
    const volume = 0.8 * Lq * Bq * T;
    const iT = (2 / 3) * (Bq / 2) ** 3 * (Lq / 2) * W3;
    const exact: Exact = { volume, lcb: Lq / 2, vcb: T / 2, waterplaneArea: 0.8 * Lq * Bq, bmt: iT / volume };
    expect(expectBracketed(hull, T, exact)).toBe(3);
    const p = prepareHull(hull);
    const [est] = errorEstimates(p, [T]).estimates;
    expect(est!.volume).toBeRelClose(volume - hydrostaticsAt(p, T).volume, 1e-9);
  });
});

describe('the coarse hull', () => {
  test('keeps every second station and point, the corners and the perpendiculars', () => {
    const hull = gridHull('grid', linspace(0, 8, 9), linspace(0, 2, 5), () => 1);
    const { hull: c, halving } = coarseHull(hull);
    expect(c.stations.map((s) => s.x)).toEqual([0, 2, 4, 6, 8]);
    expect(c.stations[0]!.points.map((q) => q.z)).toEqual([0, 1, 2]);
    expect(c.waterlines).toEqual([0, 1, 2]);
    expect([c.ap, c.fp]).toEqual([0, 8]);
    expect(halving).toEqual({ clean: true, possible: true, notes: [] });
  });

  test('keeps the last station too when the count is even, and says the halving is not clean', () => {
    const hull = gridHull('grid', linspace(0, 9, 10), linspace(0, 2, 5), () => 1);
    const { hull: c, halving } = coarseHull(hull);
    expect(c.stations.map((s) => s.x)).toEqual([0, 2, 4, 6, 8, 9]);
    expect(halving.clean).toBe(false);
    expect(halving.notes[0]).toMatch(/10 stations/);
  });

  test('keeps short runs whole and never halves across a knuckle', () => {
    const pts = [
      { y: 0, z: 0, knuckle: false },
      { y: 0.3, z: 0.1, knuckle: false },
      { y: 0.6, z: 0.2, knuckle: false },
      { y: 0.9, z: 0.3, knuckle: false },
      { y: 1.2, z: 0.4, knuckle: true },
      { y: 1.25, z: 0.8, knuckle: false },
      { y: 1.3, z: 1.2, knuckle: false },
    ];
    const hull: HullModel = { name: 'chine', stations: [0, 1, 2, 3, 4].map((x) => ({ x, points: pts })) };
    const { hull: c, halving } = coarseHull(hull);
    expect(c.stations[0]!.points.map((q) => q.z)).toEqual([0, 0.2, 0.4, 0.8, 1.2]);
    expect(c.stations[0]!.points[2]!.knuckle).toBe(true);
    expect(halving.notes.some((n) => n.includes('kept whole'))).toBe(true);
  });

  test('fewer than five stations give no estimate', () => {
    const hull = gridHull('short', [0, 1, 2, 3], [0, 1, 2], () => 1);
    const { estimates, halving } = errorEstimates(prepareHull(hull), [1]);
    expect(halving.possible).toBe(false);
    expect(Number.isNaN(estimates[0]!.volume)).toBe(true);
  });
});
