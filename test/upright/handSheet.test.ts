/**
 * The calculation sheet as a checker lays it beside her own: stations numbered 0, 1/2,
 * 1, ... in station spaces from the AP, levers in station spaces, and the final
 * multiplication by h and h² shown; and the vertical sheet saying in words which panel
 * and rule it used at a draft between tabulated waterlines.
 *
 * The hull is ten station spaces long (11 stations, 0 to 10), wall-sided with a flat
 * bottom, its half-breadth a cubic along the length:
 *   y(x) = 2 (1 - 0.8 xi^2)(1 + 0.1 xi),  xi = (x - 10) / 10,  0 <= x <= 20 m, h = 2 m,
 * so each section's immersed area is A = 2 y T and its moment about the baseline A T / 2.
 * The hand sheet is worked here with Simpson's first rule over the ten intervals,
 * multipliers 1, 4, 2, 4, ..., 4, 1 (C. B. Barrass & D. R. Derrett, Ship Stability for
 * Masters and Mates, 7th ed., 2012, ch. 10), levers i - 5 from amidships; and its
 * volume against the exact integral, which Simpson's rule gives exactly for a cubic:
 *   V = 2 T int y dx = 40 T int_{-1}^{1} (1 - 0.8 xi^2)(1 + 0.1 xi) dxi = 40 T (2 - 1.6 / 3).
 */
import { describe, expect, test } from 'vitest';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import { sheetResult, sheetText } from '../../core/report/formatSheet.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { gridHull } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const h = 2;
const xs = Array.from({ length: 11 }, (_, i) => i * h);
const half = (x: number): number => {
  const xi = (x - 10) / 10;
  return 2 * (1 - 0.8 * xi * xi) * (1 + 0.1 * xi);
};
const hull = gridHull('ten-space hull', xs, [0, 0.5, 1, 1.5], (x) => half(x));
const T = 1;
const RHO = 1.025;

// The hand sheet.
const SM = [1, 4, 2, 4, 2, 4, 2, 4, 2, 4, 1];
const lever = xs.map((_, i) => i - 5);
const y = xs.map(half);
const A = y.map((v) => 2 * v * T);
const sum = (f: (i: number) => number): number => SM.reduce((s, m, i) => s + m * f(i), 0);
const hand = {
  areaSM: sum((i) => A[i]!),
  areaSMLever: sum((i) => A[i]! * lever[i]!),
  momentZSM: sum((i) => (A[i]! * T) / 2),
  ySM: sum((i) => y[i]!),
  ySMLever: sum((i) => y[i]! * lever[i]!),
  ySMLever2: sum((i) => y[i]! * lever[i]! ** 2),
  y3SM: sum((i) => y[i]! ** 3),
};

describe('a hand sheet in station spaces, ten spaces long', () => {
  const sheet = calculationSheet(prepareHull(hull), T, RHO, { levers: 'stations' });
  const inMetres = calculationSheet(prepareHull(hull), T, RHO);

  test('numbers the stations 0 to 10 from the AP and takes levers -5 to 5 from amidships', () => {
    expect(sheet.stations.map((s) => s.station)).toEqual(xs.map((_, i) => i));
    expect(sheet.stations.map((s) => s.lever)).toEqual(lever);
    expect(sheet.stations.map((s) => s.multiplier)).toEqual(SM);
    expect(sheet.spacing).toBe(h);
  });

  test('its sums are those of the hand sheet', () => {
    for (const [k, v] of Object.entries(hand)) expect(sheet.totals[k as keyof typeof hand], k).toBeRelClose(v, 1e-13);
  });

  test('its results multiply by h and h² at the end, and equal the hand working and the sheet in metres', () => {
    const V = (h / 3) * hand.areaSM;
    // Simpson's rule is exact for the cubic area curve.
    expect(V).toBeRelClose(40 * T * (2 - 1.6 / 3), 1e-14);
    const Aw = 2 * (h / 3) * hand.ySM;
    const lcf = 10 + (h * hand.ySMLever) / hand.ySM;
    const r = sheet.results;
    expect(r.volume).toBeRelClose(V, 1e-13);
    expect(r.lcb).toBeRelClose(10 + (h * hand.areaSMLever) / hand.areaSM, 1e-13);
    expect(r.vcb).toBeRelClose(T / 2, 1e-13);
    expect(r.waterplaneArea).toBeRelClose(Aw, 1e-13);
    expect(r.lcf).toBeRelClose(lcf, 1e-13);
    expect(r.iT).toBeRelClose((2 / 3) * (h / 3) * hand.y3SM, 1e-13);
    expect(r.iL).toBeRelClose(2 * (h / 3) * h * h * hand.ySMLever2 - Aw * (lcf - 10) ** 2, 1e-13);
    for (const k of Object.keys(r) as (keyof typeof r)[]) expect(r[k], k).toBeRelClose(inMetres.results[k], 1e-12);
  });

  test('the text shows the working: h x the lever sum, and h^2 x the second-moment sum', () => {
    const t = sheetText(sheetResult(hull, sheet));
    expect(t).toContain('levers in station spaces: (x - amidships) / h');
    expect(t).toContain(`lcb = amidships + h x sum(A.SM.lever) / sum(A.SM) = 10 + 2 x ${Number(hand.areaSMLever.toPrecision(12))} / ${Number(hand.areaSM.toPrecision(12))} =`);
    expect(t).toContain(`iL = 2 x h/3 x h^2 x sum(y.SM.lever2) - Aw x (LCF - amidships)^2 = 2 x 0.666666666667 x 2^2 x ${Number(hand.ySMLever2.toPrecision(12))} -`);
    // The units line marks the levers as station spaces.
    expect(t).toMatch(/\n\s+m\s+sp\s+m\s+m2/);
  });

  test('half stations are numbered 1/2 and 9 1/2, as the trade writes them', () => {
    const fine = gridHull('with half stations', [0, 1, 2, 4, 6, 8, 10, 12, 14, 16, 18, 19, 20], [0, 0.5, 1, 1.5], (x) => half(x));
    const r = sheetResult(fine, calculationSheet(prepareHull(fine), T));
    expect(r.stations.map((s) => s.stationText)).toEqual(['0', '1/2', '1', '2', '3', '4', '5', '6', '7', '8', '9', '9 1/2', '10']);
  });
});

describe('the vertical sheet between tabulated waterlines', () => {
  test('says between which ordinates the draft lies, and which panel and rule take the last part', () => {
    // Four waterlines, three intervals: one panel of Simpson's second rule (the 3/8 rule) through all four.
    const sheet = sheetResult(hull, calculationSheet(prepareHull(hull), 0.8));
    const v = sheet.stations[3]!.vertical!;
    expect(v.cutPanel).toEqual({ rule: 'cubic', heights: [0, 0.5, 1, 1.5], from: 0 });
    expect(v.lastPart).toContain('the draft 0.8 m lies between the ordinates at z = 0.5 m and z = 1 m');
    expect(v.lastPart).toContain("Simpson's second-rule panel (the cubic through its four ordinates) of the ordinates at z = 0 m, 0.5 m, 1 m, 1.5 m");
    expect(v.lastPart).toContain('integrated from the foot of the panel, z = 0 m, up to the draft');
    // A wall-sided section: the area to 0.8 m is 2 y 0.8 whatever the rule.
    expect(v.area).toBeRelClose(2 * y[3]! * 0.8, 1e-13);
  });
});
