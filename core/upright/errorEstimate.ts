/**
 * An estimate of the integration error of the hydrostatics, by halving.
 *
 * Method: the same hydrostatics are computed again on a coarser hull made from the
 * model, with every second station and every second point of each section, and the two
 * results are combined as Richardson extrapolation does for a rule of known order. For
 * Simpson's rules the error falls as h^4, so with I(h) = I + C h^4,
 *
 *   exact - fine ≈ (fine - coarse) / (2^4 - 1) = (fine - coarse) / 15,
 *
 * which is the estimate given (the amount to add to the computed value; its size is the
 * likely error). Reference: L. F. Richardson & J. A. Gaunt, "The deferred approach to the
 * limit", Phil. Trans. R. Soc. A 226 (1927) 299-361; for the rule's order, P. J. Davis &
 * P. Rabinowitz, Methods of Numerical Integration, 2nd ed. (Academic Press, 1984),
 * sec. 2.1 and 6.3 (from memory).
 *
 * The coarse hull: stations 0, 2, 4, ... of the model and the last one; in each section,
 * between its corners (the keel, each knuckle, the deck edge, all kept), points 0, 2,
 * 4, ... of the run and its last point. The perpendiculars are kept, so levers and LBP do
 * not change.
 *
 * Assumptions, which the estimate needs to be trusted:
 * - The hull is smooth between its corners (no unmarked knuckle, no abrupt end of a
 *   waterline such as a half-power stem or a round bilge meeting the keel at a vertical
 *   tangent) and both spacings are already fine enough for the h^4 law to hold (the
 *   asymptotic range). On a hull that is not smooth the error falls more slowly than h^4
 *   and the estimate is too small.
 * - Clean halving needs an odd number of stations (an even number of intervals) and
 *   runs with an odd number of points; best of all a number of intervals that is a
 *   multiple of four, so the coarse hull is Simpson's first rule throughout. Where a
 *   count is even the last ordinate is kept as well, so the last coarse interval is as
 *   long as a fine one; the estimate is still given but marked `clean: false`.
 * - A run of fewer than five points is kept whole (halving it would leave a straight
 *   line, not a coarser Simpson rule): its vertical error is then not estimated. Fewer
 *   than five stations cannot be halved at all (the coarse hull needs three): the
 *   estimate is then NaN.
 * - Drafts on a waterline kept in the coarse hull (every second tabulated one) give the
 *   cleanest estimate; between them both hulls integrate a cut panel along its fitted
 *   curve and the h^4 law holds only roughly.
 *
 * Where these assumptions fail the estimate can be ten times too small, or of the wrong
 * sign, which is worse than none. So an estimate is given only where it can be trusted,
 * and otherwise is marked unreliable with the reason, instead of a number:
 * - the halving moves where the waterline ends (a raked stem, a cut-up stern or a fin's
 *   foot lies between stations, and the keel line through every second station crosses
 *   the waterline elsewhere), or changes the number of its immersed runs;
 * - the keel line turns sharply at a station the halving drops (a fin or skeg spanning
 *   fewer than four stations, a forefoot's knuckle): the coarse hull does not have the
 *   feature the fine hull has;
 * - the waterline crosses a knuckle line between stations (its crossing moves with the
 *   stations);
 * - a third level (every fourth station and waterline) shows the h^4 law does not hold:
 *   the ratio of the coarser difference to the finer one, about 16 under the law, lies
 *   outside 6 to 46 for that quantity (H4_RATIO_BAND, where the estimate would be off by
 *   more than a factor of three), or no third level can be made to check it (fewer than
 *   nine stations).
 * The bounds and the keel test (a turn of more than 2 % of the hull's depth from the
 * straight line between the neighbours) are common practice, no source.
 */
import { SEA_WATER_DENSITY } from '../common/constants.js';
import type { HullModel, Point, Station } from '../hull/hullModel.js';
import { perpendiculars } from '../hull/hullModel.js';
import { hydrostaticsAt, hydrostaticTable } from './hydrostatics.js';
import { waterlinePlan } from './waterlinePlan.js';
import { prepareHull, type PreparedHull } from '../hull/preparedHull.js';

/** The quantities whose integration error is estimated, with their units. */
export const ERROR_ESTIMATE_FIELDS = [
  { key: 'volume', unit: 'm3' },
  { key: 'lcb', unit: 'm' },
  { key: 'vcb', unit: 'm' },
  { key: 'waterplaneArea', unit: 'm2' },
  { key: 'bmt', unit: 'm' },
] as const;

export type ErrorEstimateField = (typeof ERROR_ESTIMATE_FIELDS)[number]['key'];

/** Estimated exact minus computed value of each quantity (same units as the quantity). */
export type ErrorEstimate = Record<ErrorEstimateField, number>;

/** How the coarse hull was made. */
export interface Halving {
  /** True when every station count and run halved cleanly (odd counts throughout). */
  readonly clean: boolean;
  /** False when the hull has fewer than five stations and no estimate can be made. */
  readonly possible: boolean;
  /** Plain words on what was kept whole or not halved cleanly; empty when clean. */
  readonly notes: readonly string[];
}

/** Indices 0, 2, 4, ... of `count` items and the last one. */
function everySecond(count: number): number[] {
  const out: number[] = [];
  for (let k = 0; k < count; k += 2) out.push(k);
  if (out[out.length - 1] !== count - 1) out.push(count - 1);
  return out;
}

/** Every second point of each run between corners; runs of fewer than five points kept whole. */
function halveSection(points: readonly Point[]): { points: Point[]; uneven: boolean; keptWhole: boolean } {
  const corners = [0];
  for (let k = 1; k < points.length - 1; k++) if (points[k]!.knuckle) corners.push(k);
  corners.push(points.length - 1);
  const kept: Point[] = [points[0]!];
  let uneven = false;
  let keptWhole = false;
  for (let r = 0; r + 1 < corners.length; r++) {
    const s = corners[r]!;
    const count = corners[r + 1]! - s + 1;
    let picks: number[];
    if (count < 5) {
      picks = Array.from({ length: count }, (_, k) => k);
      if (count > 2) keptWhole = true;
    } else {
      picks = everySecond(count);
      if (count % 2 === 0) uneven = true;
    }
    for (const k of picks.slice(1)) kept.push(points[s + k]!);
  }
  return { points: kept, uneven, keptWhole };
}

/** The coarse hull of the halving, and how it was made. */
export function coarseHull(hull: HullModel): { hull: HullModel; halving: Halving } {
  const n = hull.stations.length;
  const notes: string[] = [];
  if (n < 5) {
    return { hull, halving: { clean: false, possible: false, notes: [`${n} stations cannot be halved: the coarse hull needs at least 3 (5 or more in the model)`] } };
  }
  if (n % 2 === 0) notes.push(`${n} stations (an odd number of intervals): the last station is kept as well, so the last coarse interval is a fine one`);
  let uneven = 0;
  let whole = 0;
  const stations: Station[] = everySecond(n).map((i) => {
    const st = hull.stations[i]!;
    const h = halveSection(st.points);
    if (h.uneven) uneven++;
    if (h.keptWhole) whole++;
    return { x: st.x, points: h.points };
  });
  if (uneven > 0) notes.push(`${uneven} coarse station(s) have a run with an even number of points: its last point is kept as well`);
  if (whole > 0) notes.push(`${whole} coarse station(s) have a run of 3 or 4 points, kept whole: its vertical error is not estimated`);
  const p = perpendiculars(hull);
  const waterlines = hull.waterlines === undefined ? undefined : everySecond(hull.waterlines.length).map((k) => hull.waterlines![k]!);
  const coarse: HullModel = { name: `${hull.name} (every second station and waterline)`, ap: p.ap, fp: p.fp, stations, ...(waterlines === undefined ? {} : { waterlines }) };
  return { hull: coarse, halving: { clean: notes.length === 0, possible: true, notes } };
}

const NO_ESTIMATE: ErrorEstimate = { volume: Number.NaN, lcb: Number.NaN, vcb: Number.NaN, waterplaneArea: Number.NaN, bmt: Number.NaN };

/**
 * The h^4 law's ratio between successive differences is 16. If the error falls by a factor
 * r per halving, (fine - coarse)/15 is (r - 1)/15 times the error: within a factor of three
 * of it for r from 6 to 46. The third level's ratio stands in for r; outside this band the
 * estimate is not given.
 */
export const H4_RATIO_BAND = { min: 6, max: 46 } as const;

/** A keel turning by more than this share of the hull's depth at a dropped station is a feature the coarse hull lacks. */
const KEEL_TURN = 0.02;

/** The error estimates at each draft, with the reasons an estimate is not given. */
export interface ErrorEstimates {
  /** Estimated exact minus computed, per draft; NaN where no estimate is given. */
  readonly estimates: ErrorEstimate[];
  /** Per draft, why some or all of its estimates are not given (empty when all are). */
  readonly unreliable: string[][];
  readonly halving: Halving;
}

const fmt = (v: number): string => String(Number(v.toPrecision(6)));

/** Indices of the fine hull's stations that the halving keeps (everySecond of the count). */
function keptStations(n: number): Set<number> {
  return new Set(everySecond(n));
}

/** Reasons that the coarse hull cannot stand for the fine one at `draft`, in words. */
function structuralReasons(fine: PreparedHull, coarse: PreparedHull, draft: number): string[] {
  const reasons: string[] = [];
  const a = waterlinePlan(fine, draft);
  const b = waterlinePlan(coarse, draft);
  const tol = 1e-6 * Math.max(1, Math.abs(fine.perp.lbp));
  if (a.runs.length !== b.runs.length) {
    reasons.push(`the waterline has ${a.runs.length} immersed stretch(es) with every station but ${b.runs.length} with every second`);
  } else {
    a.ends.forEach((e, k) => {
      const f = b.ends[k]!;
      if (Math.abs(e.x - f.x) > tol) reasons.push(`the halving moves where the waterline ends ${e.side} (x = ${fmt(e.x)} m with every station, ${fmt(f.x)} m with every second)`);
    });
  }
  // The keel line at the stations the halving drops.
  const n = fine.x.length;
  const kept = keptStations(n);
  let zTop = -Infinity;
  for (const s of fine.sections) zTop = Math.max(zTop, s.zDeck);
  const depth = zTop - fine.lowestKeel;
  for (let i = 1; i < n - 1; i++) {
    if (kept.has(i) || !(fine.keel[i]! < draft)) continue;
    const t = (fine.x[i]! - fine.x[i - 1]!) / (fine.x[i + 1]! - fine.x[i - 1]!);
    const line = (1 - t) * fine.keel[i - 1]! + t * fine.keel[i + 1]!;
    if (Math.abs(fine.keel[i]! - line) > KEEL_TURN * depth) {
      reasons.push(`the keel line turns at x = ${fmt(fine.x[i]!)} m (a fin, skeg or knuckle), a station the halving drops`);
    }
  }
  // Knuckle lines the waterline crosses between stations: corners matched by their order.
  const counts = new Map<number, number>();
  for (const s of fine.sections) counts.set(s.cornerIndices().length, (counts.get(s.cornerIndices().length) ?? 0) + 1);
  const common = [...counts.entries()].sort((p, q) => q[1] - p[1])[0]?.[0] ?? 0;
  for (let j = 1; j < common - 1; j++) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const s of fine.sections) {
      const c = s.cornerIndices();
      if (c.length !== common) continue;
      const z = s.pointsZ()[c[j]!]!;
      lo = Math.min(lo, z);
      hi = Math.max(hi, z);
    }
    if (lo < draft && draft < hi) reasons.push(`the waterline crosses a knuckle line (from z = ${fmt(lo)} to ${fmt(hi)} m) between stations, where the halving moves the crossing`);
  }
  return reasons;
}

/**
 * The error estimate at each draft (m): `fine` is the prepared hull, drafts as for
 * hydrostaticTable (checked on the fine hull; the coarse hull has the same keel and deck
 * heights at the stations it keeps). Density does not enter the estimated quantities.
 */
export function errorEstimates(fine: PreparedHull, drafts: readonly number[], density = SEA_WATER_DENSITY): ErrorEstimates {
  const rows = hydrostaticTable(fine, drafts, density);
  const { hull, halving } = coarseHull(fine.hull);
  if (!halving.possible) {
    return { estimates: rows.map(() => ({ ...NO_ESTIMATE })), unreliable: rows.map(() => [...halving.notes]), halving };
  }
  const coarse = prepareHull(hull);
  const third = coarseHull(hull);
  const coarser = third.halving.possible ? prepareHull(third.hull) : undefined;
  const inRange = (p: PreparedHull, d: number): boolean => d > p.lowestKeel && d <= p.lowestDeck;
  const estimates: ErrorEstimate[] = [];
  const unreliable: string[][] = [];
  for (const f of rows) {
    const d = f.draft;
    const notes: string[] = [];
    // A draft that only the dropped stations reach (a keel lower than any kept one) has no coarse value.
    if (!inRange(coarse, d)) {
      estimates.push({ ...NO_ESTIMATE });
      unreliable.push([`only stations the halving drops reach draft ${fmt(d)} m`]);
      continue;
    }
    const c = hydrostaticsAt(coarse, d, density);
    const structural = structuralReasons(fine, coarse, d);
    const cc = coarser !== undefined && inRange(coarser, d) ? hydrostaticsAt(coarser, d, density) : undefined;
    const e = {} as ErrorEstimate;
    for (const { key } of ERROR_ESTIMATE_FIELDS) {
      const d1 = f[key] - c[key];
      e[key] = d1 / 15;
      if (structural.length > 0) continue;
      // Differences at rounding level: the rule is exact for this quantity here.
      const scale = Math.max(Math.abs(f[key]), key === 'lcb' ? Math.abs(fine.perp.lbp) : 0);
      if (Math.abs(d1) <= 1e-11 * scale) continue;
      if (cc === undefined) {
        notes.push(`${key}: no third level (every fourth station) can be made to check that the error falls as h^4`);
        e[key] = Number.NaN;
        continue;
      }
      const ratio = (c[key] - cc[key]) / d1;
      if (!(ratio >= H4_RATIO_BAND.min && ratio <= H4_RATIO_BAND.max)) {
        notes.push(`${key}: halving twice gives a ratio of ${fmt(ratio)} between the differences, not about 16: the error does not fall as h^4 here`);
        e[key] = Number.NaN;
      }
    }
    if (structural.length > 0) {
      for (const { key } of ERROR_ESTIMATE_FIELDS) e[key] = Number.NaN;
      notes.push(...structural);
    }
    estimates.push(e);
    unreliable.push(notes);
  }
  return { estimates, unreliable, halving };
}
