/**
 * The righting-lever (GZ) curve of a loading, and what is read from it: GM0, the largest
 * GZ and its angle, the angle of vanishing stability, the area under the curve to any
 * angle, the downflooding angle, and the criteria.
 *
 * GZ = KN - KG' sin φ, with KG' = KG + FSM / Δ the centre of gravity raised by the free
 * surface moment (the virtual rise of G), and KN from the hull floated at each heel free
 * to trim with its centre of buoyancy kept at the upright LCB (core/stability/heeledFloat.ts;
 * level trim on request). GM0 = KMt - KG' at the level draft of the displacement.
 *
 * The curve is worked on a grid of heels, every 2.5 degrees to 40 and every 5 degrees to
 * 90, further every 10 degrees while GZ stays positive: enough for Simpson's rule on the
 * areas, whose error there is under 1e-4 m·rad on the test hulls. Areas to an angle between
 * grid points add the part of the parabola through the three nearest points (exact for a
 * quadratic). The largest GZ and its angle come from the parabola through the largest grid
 * value and its neighbours; the angle of vanishing stability and the downflooding angle
 * are found between grid points by the secant rule on new evaluations.
 * References: E. C. Tupper, Introduction to Naval Architecture, 5th ed. (2013), ch. 4
 * (the GZ curve, free surface); C. B. Barrass & D. R. Derrett, Ship Stability for Masters
 * and Mates, 7th ed. (2012), ch. on the statical stability curve (both from memory).
 */
import { fail } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { hydrostaticsAt } from '../upright/hydrostatics.js';
import { IMO_2008_GENERAL, judge, type CriteriaSet, type CriterionId, type CriterionResult } from './criteria.js';
import type { TrimMode } from './crossCurves.js';
import { heeledFloat, HeelSweep, knOf } from './heeledFloat.js';
import type { Waterplane } from './inclinedHydrostatics.js';
import { levelDraftFor } from './levelDrafts.js';
import { checkVolume } from './solveVolume.js';
import { checkDeckEdges, checkHeels, type DeckEdges } from './stabilityInput.js';

export interface Opening {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

export interface GzInput {
  /** t */
  readonly displacement: number;
  /** m above the baseline */
  readonly kg: number;
  /** Free surface moment, t·m; 0 by default. */
  readonly fsm?: number;
  /** Heels to give GZ at, degrees; every 5 degrees from 0 to 90 by default. */
  readonly heels?: readonly number[];
  readonly openings?: readonly Opening[];
  readonly criteria?: CriteriaSet;
  readonly trim?: TrimMode;
  readonly deck?: DeckEdges;
}

export interface GzResult {
  readonly displacement: number;
  readonly kg: number;
  readonly fsm: number;
  /** KG + FSM / Δ, m. */
  readonly kgEffective: number;
  readonly trim: TrimMode;
  readonly gm0: number;
  readonly points: readonly { readonly heel: number; readonly gz: number }[];
  /** Area under the curve from 0 to each heel of `points`, m·rad (for a negative heel, the area of the mirror heel with its sign: the hull is symmetric about its centreline). */
  readonly areas: readonly { readonly heel: number; readonly area: number }[];
  readonly maxGz: number;
  readonly angleOfMaxGz: number;
  /** Degrees; 0 when GZ is not positive at any heel; null when GZ stays positive to 180 degrees. */
  readonly vanishingAngle: number | null;
  /**
   * The angle of loll, degrees: where GZ, negative from the upright (GM0 below zero),
   * rises through zero again, the heel at which such a vessel comes to rest. Null when
   * GZ is not negative past the upright, or never comes back above zero.
   */
  readonly lollAngle: number | null;
  /** Degrees; null without openings, or when none reaches the water by 180 degrees. */
  readonly downfloodingAngle: number | null;
  readonly criteriaSet: { readonly name: string; readonly source: string };
  readonly criteria: readonly CriterionResult[];
}

export const DEFAULT_GZ_HEELS: readonly number[] = Array.from({ length: 19 }, (_, k) => 5 * k);

const RAD = Math.PI / 180;

/** The base grid of heels, degrees: 2.5 to 40, then 5 to 90. */
function baseGrid(): number[] {
  const g: number[] = [];
  for (let k = 0; k <= 16; k++) g.push(2.5 * k);
  for (let a = 45; a <= 90; a += 5) g.push(a);
  return g;
}

/** Integral of the curve through (a[k], v[k]) from a[0] to `to` (a ascending, to within range): Simpson on the nodes, a parabola for the part. */
export function areaUnder(a: readonly number[], v: readonly number[], to: number): number {
  let sum = 0;
  let k = 0;
  // Whole pairs of intervals by Simpson's rule (uneven spacing: the parabola's weights).
  const panel = (i: number, upTo: number): number => {
    // Integral from a[i] to upTo of the parabola through i, i+1, i+2.
    const x0 = a[i]!, x1 = a[i + 1]!, x2 = a[i + 2]!;
    const y0 = v[i]!, y1 = v[i + 1]!, y2 = v[i + 2]!;
    const f = (x: number): number => {
      // Antiderivative of the Lagrange form, by its monomial expansion in (x - x0).
      const d1 = (y1 - y0) / (x1 - x0);
      const d2 = ((y2 - y1) / (x2 - x1) - d1) / (x2 - x0);
      const u = x - x0;
      // p(u) = y0 + d1 u + d2 u (u - (x1 - x0))
      return y0 * u + (d1 * u * u) / 2 + d2 * (u ** 3 / 3 - ((x1 - x0) * u * u) / 2);
    };
    return f(upTo) - f(x0);
  };
  while (k + 2 < a.length && a[k + 2]! <= to) {
    sum += panel(k, a[k + 2]!);
    k += 2;
  }
  if (to > a[k]!) {
    const i = Math.min(k, a.length - 3);
    sum += panel(i, to) - panel(i, a[k]!);
  }
  return sum;
}

/** The GZ curve of a loading and what is read from it (see the module note). */
export function rightingLevers(p: PreparedHull, input: GzInput, density: number): GzResult {
  const heels = input.heels ?? DEFAULT_GZ_HEELS;
  checkHeels(heels, ['heels']);
  checkDeckEdges(p, [1], input.deck ?? { assumedAt: [] });
  const volume = checkVolume(p, input.displacement, density, ['displacement']);
  const fsm = input.fsm ?? 0;
  const kgEff = input.kg + fsm / input.displacement;
  const trim = input.trim ?? 'free';
  const d0 = levelDraftFor(p, volume);
  const upright = hydrostaticsAt(p, Math.min(Math.max(d0, p.lowestKeel + 1e-9 * (1 + Math.abs(p.lowestKeel))), p.lowestDeck));
  const lcb = trim === 'free' ? upright.lcb : undefined;
  const openings = input.openings ?? [];
  checkOpenings(p, openings);

  // The curve at a heel, floated from the nearest solution found so far.
  const solved = new Map<number, { gz: number; plane: Waterplane }>();
  const sweep = new HeelSweep();
  const at = (deg: number): { gz: number; plane: Waterplane } => {
    const hit = solved.get(deg);
    if (hit !== undefined) return hit;
    const phi = deg * RAD;
    const fl = heeledFloat(p, volume, phi, lcb, sweep.guess(phi) ?? { h: d0 * Math.cos(phi), trimAngle: 0 });
    sweep.add(phi, fl.plane);
    const kn = knOf(p, fl, phi);
    const v = { gz: kn - kgEff * Math.sin(phi), plane: fl.plane };
    solved.set(deg, v);
    return v;
  };

  // The grid, extended while GZ stays positive.
  const grid = baseGrid();
  for (const a of grid) at(a);
  let top = 90;
  while (at(top).gz > 0 && top < 180) {
    top = Math.min(180, top + 10);
    grid.push(top);
  }
  const gzs = grid.map((a) => at(a).gz);

  // Downflooding: the first heel at which an opening reaches the water (n · r >= h).
  let downfloodingAngle: number | null = null;
  if (openings.length > 0) {
    const margin = (a: number): number => {
      const w = at(a).plane;
      return Math.min(...openings.map((o) => heightAboveWater(w, o)));
    };
    if (!(margin(0) > 0)) fail('HYD_OPENING', ['openings'], 'an opening lies at or below the upright waterline: it floods at no heel');
    for (let k = 0; k + 1 < grid.length; k++) {
      if (margin(grid[k + 1]!) <= 0) {
        downfloodingAngle = secantRoot(margin, grid[k]!, grid[k + 1]!);
        break;
      }
    }
  }
  const gm0 = upright.kmt - kgEff;
  const read = readCurve(grid, gzs, (a) => at(a).gz, downfloodingAngle);
  const criteriaSet = input.criteria ?? IMO_2008_GENERAL;
  const criteria = judge(criteriaSet, { ...read.actual, gm0 });
  const { maxGz, angleOfMaxGz, vanishingAngle, lollAngle } = read;
  const area = (to: number): number => areaUnder(grid, gzs, to) * RAD;

  // The points asked for, and the area to each.
  // GZ at a negative heel is worked as such (the hull heeled to port), not by symmetry.
  const points = heels.map((h) => ({ heel: h, gz: at(h).gz }));
  const areas = heels.map((h) => ({ heel: h, area: h === 0 ? 0 : Math.sign(h) * area(Math.min(Math.abs(h), grid[grid.length - 1]!)) }));
  return {
    displacement: input.displacement,
    kg: input.kg,
    fsm,
    kgEffective: kgEff,
    trim,
    gm0,
    points,
    areas,
    maxGz,
    angleOfMaxGz,
    vanishingAngle,
    lollAngle,
    downfloodingAngle,
    criteriaSet: { name: criteriaSet.name, source: criteriaSet.source },
    criteria,
  };
}

/** What the criteria read from a GZ curve, but GM0 (which is the upright hull's). */
export interface CurveReading {
  readonly maxGz: number;
  readonly angleOfMaxGz: number;
  readonly vanishingAngle: number | null;
  readonly lollAngle: number | null;
  readonly actual: Omit<Record<CriterionId, number>, 'gm0'>;
}

/**
 * Read a GZ curve given at heels `grid` (degrees, ascending from 0) with values `gzs`
 * (m): the largest GZ and its angle (the parabola through the largest value and its
 * neighbours), the angle of vanishing stability (past the largest value, where GZ goes
 * from positive to not; `gzAt` gives GZ between grid points, for the secant rule), the
 * angle of loll (before the largest value, where a GZ negative off the upright rises
 * through zero), and the criteria's actual values: the areas to 30 and 40 degrees and from 30 to 40 (each
 * end at the downflooding angle if less), and the largest GZ at 30 degrees or more.
 */
export function readCurve(grid: readonly number[], gzs: readonly number[], gzAt: (deg: number) => number, downfloodingAngle: number | null): CurveReading {
  let kMax = 1;
  for (let k = 1; k < grid.length; k++) if (gzs[k]! > gzs[kMax]!) kMax = k;
  let maxGz = gzs[kMax]!;
  let angleOfMaxGz = grid[kMax]!;
  if (kMax > 0 && kMax < grid.length - 1) {
    const [a0, a1, a2] = [grid[kMax - 1]!, grid[kMax]!, grid[kMax + 1]!];
    const [g0, g1, g2] = [gzs[kMax - 1]!, gzs[kMax]!, gzs[kMax + 1]!];
    const d1 = (g1 - g0) / (a1 - a0);
    const d2 = ((g2 - g1) / (a2 - a1) - d1) / (a2 - a0);
    if (d2 < 0) {
      // p(a) = g0 + d1 (a - a0) + d2 (a - a0)(a - a1); p'(peak) = 0
      const peak = (d2 * (a0 + a1) - d1) / (2 * d2);
      if (peak > a0 && peak < a2) {
        angleOfMaxGz = peak;
        maxGz = g0 + d1 * (peak - a0) + d2 * (peak - a0) * (peak - a1);
      }
    }
  }
  let vanishingAngle: number | null = null;
  if (!(maxGz > 0)) vanishingAngle = 0;
  else {
    for (let k = kMax; k + 1 < grid.length; k++) {
      if (gzs[k]! > 0 && !(gzs[k + 1]! > 0)) {
        vanishingAngle = secantRoot(gzAt, grid[k]!, grid[k + 1]!);
        break;
      }
    }
  }
  // The angle of loll: GZ negative off the upright, rising through zero before its largest value.
  let lollAngle: number | null = null;
  if (gzs.length > 1 && gzs[1]! < 0 && maxGz > 0) {
    for (let k = 1; k < kMax; k++) {
      if (gzs[k]! < 0 && !(gzs[k + 1]! < 0)) {
        lollAngle = secantRoot((a) => -gzAt(a), grid[k]!, grid[k + 1]!);
        break;
      }
    }
  }
  const limit = (deg: number): number => (downfloodingAngle !== null ? Math.min(deg, downfloodingAngle) : deg);
  const area = (from: number, to: number): number => (to > from ? areaUnder(grid, gzs, to) - areaUnder(grid, gzs, from) : 0) * RAD;
  let gzBeyond30 = -Infinity;
  for (let k = 0; k < grid.length; k++) if (grid[k]! >= 30) gzBeyond30 = Math.max(gzBeyond30, gzs[k]!);
  if (angleOfMaxGz >= 30) gzBeyond30 = Math.max(gzBeyond30, maxGz);
  return {
    maxGz,
    angleOfMaxGz,
    vanishingAngle,
    lollAngle,
    actual: {
      'area-0-30': area(0, limit(30)),
      'area-0-40': area(0, limit(40)),
      'area-30-40': area(30, limit(40)),
      'gz-at-30': gzBeyond30,
      'angle-of-max-gz': angleOfMaxGz,
    },
  };
}

/** How far an opening lies above the waterplane, along its normal, m. */
function heightAboveWater(w: Waterplane, o: Opening): number {
  const sinT = Math.sin(w.trimAngle);
  const cosT = Math.cos(w.trimAngle);
  return o.x * sinT + cosT * (-o.y * Math.sin(w.heel) + o.z * Math.cos(w.heel)) - w.h;
}

/** A root of f between a and b (f(a) > 0 >= f(b)) by the secant rule kept in the bracket, to 1e-4 degrees. */
function secantRoot(f: (a: number) => number, a: number, b: number): number {
  let fa = f(a);
  let fb = f(b);
  for (let it = 0; it < 30 && b - a > 1e-4; it++) {
    let c = fa !== fb ? b - (fb * (b - a)) / (fb - fa) : 0.5 * (a + b);
    if (!(c > a && c < b)) c = 0.5 * (a + b);
    c = Math.round(c * 1e6) / 1e6; // a grid of 1e-6 degrees, so repeated heels are found again
    const fc = f(c);
    if (fc > 0) {
      a = c;
      fa = fc;
    } else {
      b = c;
      fb = fc;
    }
  }
  return fa !== fb ? b - (fb * (b - a)) / (fb - fa) : 0.5 * (a + b);
}

/** Openings must lie within the hull's length and breadth and above its keel; else HYD_OPENING naming it. */
function checkOpenings(p: PreparedHull, openings: readonly Opening[]): void {
  const x0 = p.x[0]!;
  const x1 = p.x[p.x.length - 1]!;
  let half = 0;
  for (const s of p.sections) for (const y of s.pointsY()) half = Math.max(half, y);
  openings.forEach((o, k) => {
    const why =
      !(Number.isFinite(o.x) && Number.isFinite(o.y) && Number.isFinite(o.z))
        ? 'its coordinates are not all numbers'
        : o.x < x0 || o.x > x1
          ? `x = ${o.x} m is outside the hull's length (${x0} to ${x1} m)`
          : Math.abs(o.y) > half
            ? `y = ${o.y} m is outside the hull's breadth (half-breadth ${Number(half.toPrecision(6))} m at most)`
            : o.z < p.lowestKeel
              ? `z = ${o.z} m is below the keel`
              : undefined;
    if (why !== undefined) fail('HYD_OPENING', ['openings', k], `opening ${k + 1} (${o.x}, ${o.y}, ${o.z}): ${why}`);
  });
}
