/**
 * The fairness check (core/fairness/fairness.ts).
 *
 * What it is held to (from the requirement on the check, and the trade's sense of a fair
 * line; common practice, no source): a fair hull gives no warning, whether a closed-form
 * hull (test/fixtures/hulls.ts, polynomial and so perfectly fair) or one of the demo
 * tables (smooth formulae, offsets rounded to the millimetre or to a sixteenth of an
 * inch); one offset moved by 2 % of the beam is found, and only that one, with a fair
 * value from its neighbours near the one it had; a knuckle is not reported as a bump.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { fairnessWarnings } from '../../core/fairness/fairness.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { boxBarge, linspace, parabolicHull, planWedge, vPrism } from '../fixtures/hulls.js';

const demo = (file: string): HullModel => readOffsetsCsv(readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8')).hull;

const beam = (hull: HullModel): number => 2 * Math.max(...hull.stations.flatMap((s) => s.points.map((q) => q.y)));

/** The hull with one half-breadth moved by `fraction` of the beam. */
function moved(hull: HullModel, station: number, point: number, fraction: number): { hull: HullModel; from: number; to: number } {
  const copy: HullModel = structuredClone(hull);
  const q = copy.stations[station]!.points[point]!;
  const from = q.y;
  q.y = from + fraction * beam(hull);
  return { hull: copy, from, to: q.y };
}

function expectFoundAlone(hull: HullModel, station: number, point: number, fraction: number): void {
  const m = moved(hull, station, point, fraction);
  const w = fairnessWarnings(m.hull);
  const where = `station ${station} (x = ${hull.stations[station]!.x}), point ${point} moved by ${fraction * 100} % of the beam`;
  expect(w.map((x) => x.path), where).toEqual([['stations', station, 'points', point, 'y']]);
  const found = w[0]!;
  expect(found.x).toBe(hull.stations[station]!.x);
  expect(found.z).toBe(hull.stations[station]!.points[point]!.z);
  expect(found.value).toBe(m.to);
  // The fair value its neighbours suggest lies near the offset as it was: within a quarter of the move.
  expect(Math.abs(found.suggested - m.from), `${where}: suggested ${found.suggested}, was ${m.from}`).toBeLessThan(0.25 * Math.abs(m.to - m.from));
  expect(found.message).toMatch(/^station x = .* m, z = .* m: half-breadth .* m is not fair along the/);
}

describe('fair hulls give no warning', () => {
  test('the closed-form hulls', () => {
    for (const hull of [boxBarge(10, 4, 2), vPrism(10, 4, 2), planWedge(12, 3, 2, 13, 5), parabolicHull(20, 4, 1.5, 3, 21, 11), parabolicHull(20, 4, 1.5, 3, 9, 7)]) {
      expect(fairnessWarnings(hull), hull.name).toEqual([]);
    }
  });

  test('the demo hulls, in metres and in feet-inches-eighths', () => {
    for (const file of ['workboat.csv', 'workboat-ftin.csv', 'survey-launch.csv']) expect(fairnessWarnings(demo(file)), file).toEqual([]);
  });
});

describe('one offset moved by 2 % of the beam is found, and only that one', () => {
  const workboat = demo('workboat.csv');
  const launch = demo('survey-launch.csv');
  const at = (hull: HullModel, x: number, z?: number): [number, number] => {
    const i = hull.stations.findIndex((s) => s.x === x);
    const j = z === undefined ? -1 : hull.stations[i]!.points.findIndex((q) => q.z === z);
    return [i, j];
  };

  test.each([
    ['amidships', 7, 1.25],
    ['near the aft end', 0.7, 1.5],
    ['near the bow', 13.3, 1.5],
    ['on the flat of keel', 8.4, 0],
    ['on the flat of keel forward', 9.8, 0],
    ['near the keel, at the second waterline above it', 9.8, 0.25],
    ['at the deck edge', 4.2, 2.2],
  ])('on the grid workboat %s (x = %s m, z = %s m)', (_where, x, z) => {
    const [i, j] = at(workboat, x, z);
    expectFoundAlone(workboat, i, j, 0.02);
    expectFoundAlone(workboat, i, j, -0.02);
  });

  test.each([
    ['on the bottom near the keel, amidships', 5, 1],
    ['on the topside near the transom', 0.5, 4],
    ['at the chine (a knuckle) near the stem', 9, 3],
    ['at the chine amidships', 5, 3],
    ['at the sheer', 4, 5],
  ])('on the points-form launch %s (x = %s m, point %s)', (_where, x, point) => {
    const [i] = at(launch, x);
    expectFoundAlone(launch, i, point, 0.02);
    expectFoundAlone(launch, i, point, -0.02);
  });

  test('at most places of the demo hulls: a floor on how often a 2 % move is found alone', () => {
    // Offsets on the end stations are corners of the table (the end of every line through
    // them) and are not checked; the rest are tried both ways.
    for (const [hull, floor] of [
      [launch, 0.9],
      [workboat, 0.65],
    ] as const) {
      let tried = 0;
      let alone = 0;
      hull.stations.forEach((st, i) => {
        if (i === 0 || i === hull.stations.length - 1) return;
        st.points.forEach((q, j) => {
          for (const f of [0.02, -0.02]) {
            if (q.y + f * beam(hull) < 0) continue;
            tried++;
            const w = fairnessWarnings(moved(hull, i, j, f).hull);
            if (w.length === 1 && w[0]!.path[1] === i && w[0]!.path[3] === j) alone++;
          }
        });
      });
      expect(alone / tried, `${hull.name}: ${alone} of ${tried}`).toBeGreaterThanOrEqual(floor);
    }
  });
});

describe('knuckles', () => {
  // Nine stations of a hard-chine prism: a V bottom y = 2.4 z + small rounding below the
  // chine at z = 0.5, a flared side above it, both scaled along the length by a smooth
  // plan shape. Five points on each side of the chine.
  const plan = (x: number): number => 1 - 0.3 * ((x - 8) / 8) ** 2;
  const station = (x: number) => {
    const bottom = linspace(0, 0.5, 5).map((z, k) => ({ y: plan(x) * (2.4 * z - 0.2 * z * z), z, knuckle: k === 4 }));
    const side = linspace(0.5, 1.5, 5)
      .slice(1)
      .map((z) => ({ y: plan(x) * (1.15 + 0.2 * (z - 0.5) - 0.05 * (z - 0.5) ** 2), z, knuckle: false }));
    return { x, points: [...bottom, ...side] };
  };
  const chine: HullModel = { name: 'hard chine', stations: linspace(0, 16, 9).map(station) };

  test('a marked knuckle is not reported as a bump', () => {
    expect(fairnessWarnings(chine)).toEqual([]);
    expect(fairnessWarnings(demo('survey-launch.csv'))).toEqual([]);
  });

  test('a bump beside the knuckle is found, the section read on its own side of the corner', () => {
    expectFoundAlone(chine, 4, 3, 0.02);
    expectFoundAlone(chine, 4, 5, -0.02);
  });
});

describe('what a warning says', () => {
  test('names the station, the waterline, the value and a suggested value', () => {
    const m = moved(boxBarge(10, 4, 2, 11, 5), 5, 2, 0.02);
    const [w] = fairnessWarnings(m.hull);
    expect(w).toMatchObject({ code: 'HYD_UNFAIR_OFFSET', path: ['stations', 5, 'points', 2, 'y'], x: 5, z: 1, offset: 'halfBreadth', value: 2.08 });
    // A box is straight both ways: the fair value is exactly the box's half-breadth.
    expect(w!.suggested).toBeCloseTo(2, 12);
    expect(w!.along).toEqual(['waterline', 'section']);
    expect(w!.message).toBe('station x = 5 m, z = 1 m: half-breadth 2.08 m is not fair along the waterline and the section; its neighbours suggest 2 m');
  });
});

describe('the cost of the check', () => {
  test('a line of 5,000 offsets spanning seven orders of magnitude is checked within 3 s', () => {
    // The probe of 2026-12-02 (half-breadths 1e100 to 1e308 on 5,000 stations) froze the
    // service for 47 s: every round of the check re-predicted the whole line, so a line
    // with many unfair-looking places cost O(n^2). The same line within the physical
    // limits (1e-3 to 1e4 m) took 35 s with that code; now a correction re-predicts only
    // its neighbourhood and the worst place comes from a heap, O(n log n): about 0.3 s.
    // A bound on the defect with a tenfold margin for a busy machine, not a benchmark.
    let seed = 7;
    const rnd = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647; // Park and Miller, CACM 31(10), 1988
    const rows = Array.from({ length: 5000 }, (_, i) => `${i},${(10 ** (-3 + 7 * rnd())).toPrecision(6)},${(10 ** (-3 + 7 * rnd())).toPrecision(6)}`);
    const { hull } = readOffsetsCsv(['x,0,1', ...rows].join('\n'));
    const t0 = performance.now();
    const warnings = fairnessWarnings(hull);
    expect(performance.now() - t0).toBeLessThan(3000);
    // Noise that wild is unfair everywhere; the check still names offsets one by one.
    expect(warnings.length).toBeGreaterThan(0);
    expect(new Set(warnings.map((w) => w.path.join('.'))).size).toBe(warnings.length);
  });
});
