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
 */
import { SEA_WATER_DENSITY } from '../common/constants.js';
import type { HullModel, Point, Station } from '../hull/hullModel.js';
import { perpendiculars } from '../hull/hullModel.js';
import { hydrostaticsAt, hydrostaticTable } from './hydrostatics.js';
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
 * The error estimate at each draft (m): `fine` is the prepared hull, drafts as for
 * hydrostaticTable (checked on the fine hull; the coarse hull has the same keel and deck
 * heights, since corners are kept). Density does not enter the estimated quantities.
 */
export function errorEstimates(fine: PreparedHull, drafts: readonly number[], density = SEA_WATER_DENSITY): { estimates: ErrorEstimate[]; halving: Halving } {
  const rows = hydrostaticTable(fine, drafts, density);
  const { hull, halving } = coarseHull(fine.hull);
  if (!halving.possible) return { estimates: rows.map(() => ({ ...NO_ESTIMATE })), halving };
  const coarse = prepareHull(hull);
  const estimates = rows.map((f) => {
    // A draft that only the dropped stations reach (a keel lower than any kept one) has no coarse value.
    if (!(f.draft > coarse.lowestKeel) || f.draft > coarse.lowestDeck) return { ...NO_ESTIMATE };
    const c = hydrostaticsAt(coarse, f.draft, density);
    const e = {} as ErrorEstimate;
    for (const { key } of ERROR_ESTIMATE_FIELDS) e[key] = (f[key] - c[key]) / 15;
    return e;
  });
  return { estimates, halving };
}
