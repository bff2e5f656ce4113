/**
 * The fairness check of a table of offsets: offsets that make a bump or a hollow in a
 * waterline (along x) or a section (along z), each reported with a fair value from its
 * neighbours.
 *
 * Lines checked. Every section between its corners (v = half-breadth, s = z): the keel,
 * each knuckle and the deck edge end a run, so no curve is read across a corner; a keel
 * point off the centreline (the edge of a flat of bottom, which a bilge may leave at any
 * angle) is left out of its section's curve. Every longitudinal line (s = x): a grid
 * table's waterlines, less the offsets where a waterline meets the keel or deck profile
 * between two stations (those are the flat of keel or the deck, not the waterline); in a
 * points-form table, the points of one index on consecutive stations that share their
 * count and knuckles, half-breadths and heights both.
 *
 * Method. Along a line each offset is compared with the value its neighbours predict:
 * the polynomial through the nearest ones (two each side where it can), of degree up to
 * three. An offset moved by d from a fair curve shows as a residual d at its own place
 * and smaller ones of the other sign at its neighbours: its second differences change
 * sign against theirs, the bump or hollow a loftsman reads in a column of differences.
 * The tolerance of each residual is
 *   gain x 0.4 % of the hull's greatest half-breadth   (the predictor's amplification of
 *                                                      rounding, larger near an end)
 *   + 4 x the predictor's own error on a fair curve     (its divided difference one order
 *                                                      up, from neighbours that leave the
 *                                                      offset out, times the product of
 *                                                      the distances to the points used)
 * so a bump of a given proportion is found whatever the units, while a fair line offset
 * coarsely for its curvature (a round bilge on a flat keel, a waterline running into the
 * stem) is let pass, and a bad offset does not raise its own tolerance.
 * The worst residual of a line is blamed on the one offset near it whose fair value
 * leaves the least unfairness around it; the blame stands only if that correction takes
 * away three quarters of the local unfairness (one bad offset explains it; a coarse fair
 * line does not). The fair value is then put in its place and the line looked at again,
 * so one bad offset is reported once, not with its neighbours. An offset blamed by one
 * line and shown clearly fair (below half its tolerance) by another line through it is
 * not reported: a short line cannot always tell which of its offsets is wrong.
 *
 * Ends. The first and last offsets of a line are not judged along it, since a fair line
 * may turn hard at its end and extrapolation cannot tell; they are judged along the
 * other line through them. An offset at the end of every line through it (a corner of
 * the table, such as the keel at the transom) is not checked, nor is a line of fewer
 * than four offsets, which cannot tell a bump from a curve.
 *
 * Reference for reading fairness from differences: common practice of the mould loft,
 * no source; the predictor and its error term are Lagrange interpolation's (e.g. P. J.
 * Davis, Interpolation and Approximation, Dover 1975, ch. 3; from memory).
 */
import type { HullModel } from '../hull/hullModel.js';

/** One unfair offset. `path` points into the hull model. */
export interface FairnessWarning {
  readonly code: 'HYD_UNFAIR_OFFSET';
  readonly path: readonly (string | number)[];
  /** Station position, m. */
  readonly x: number;
  /** Height of the offset (its waterline), m. */
  readonly z: number;
  /** Which coordinate is unfair: the half-breadth or (points form) the height of the point. */
  readonly offset: 'halfBreadth' | 'height';
  /** The offset as given, m. */
  readonly value: number;
  /** A fair value from its neighbours, m. */
  readonly suggested: number;
  /** The lines along which it was found. */
  readonly along: readonly ('waterline' | 'section' | 'line')[];
  readonly message: string;
  /** Line and column of the offset in the file it was read from (core/fairness/fairnessInFile.ts); absent for a JSON model. */
  readonly line?: number;
  readonly column?: number;
}

/**
 * The tolerance's constants (see the module note): the fraction of the greatest
 * half-breadth, the factor on the predictor's own error, the share of local unfairness a
 * correction must leave, and the ratio below which a line shows an offset clearly fair.
 * Chosen on the demo tables (offsets rounded to the millimetre and to a sixteenth of an
 * inch): half the factor on the predictor's error already reports none of their fair
 * offsets, and an offset moved by 2 % of the beam is found at most places.
 */
export const FAIRNESS_TOLERANCE = { sizeFraction: 0.004, differenceFraction: 4, explained: 0.25, clearlyFair: 0.5 } as const;

interface CurvePoint {
  readonly station: number;
  readonly point: number;
}

interface Curve {
  readonly along: 'waterline' | 'section' | 'line';
  readonly coordinate: 'y' | 'z';
  readonly s: readonly number[];
  readonly v: number[];
  readonly at: readonly CurvePoint[];
}

interface Prediction {
  value: number;
  /** sqrt(1 + sum of squared weights): how much the predictor amplifies rounding. */
  gain: number;
  /** The largest difference one order above the predictor's among the neighbours, k left out. */
  roughness: number;
}

/** The divided difference of `v` over the points idx[from .. from + count - 1] (Newton's, any spacing). */
function dividedDifference(s: readonly number[], v: readonly number[], idx: readonly number[], from: number, count: number): number {
  let dd = 0;
  for (let a = from; a < from + count; a++) {
    const j = idx[a]!;
    let denom = 1;
    for (let b = from; b < from + count; b++) if (b !== a) denom *= s[j]! - s[idx[b]!]!;
    dd += v[j]! / denom;
  }
  return dd;
}

/**
 * Value at s[k] of the polynomial through the `degree + 1` nearest other points of the
 * curve, and how rough the curve is near k without k: the largest difference of one
 * order higher over the runs of neighbours beside k, so that a fair line turning hard
 * near k (a waterline running into the keel) raises the tolerance, while a bad offset
 * at k does not raise its own.
 */
function predict(s: readonly number[], v: readonly number[], k: number, degree: number): Prediction {
  const n = s.length;
  const idx: number[] = [];
  // The nearest degree + 1 others, in order: as many before k as after, shifted at the ends.
  const before = Math.min(k, Math.max(Math.ceil((degree + 1) / 2), degree + 1 - (n - 1 - k)));
  for (let j = k - before; idx.length < degree + 1; j++) if (j !== k) idx.push(j);
  let value = 0;
  let sq = 0;
  for (const j of idx) {
    let w = 1;
    for (const m of idx) if (m !== j) w *= (s[k]! - s[m]!) / (s[j]! - s[m]!);
    value += w * v[j]!;
    sq += w * w;
  }
  // The predictor's own error on a fair curve: f[s_j..., t] x product of (s_k - s_j), the
  // divided difference one order up estimated from runs of degree + 2 neighbours that
  // straddle k and leave it out (the largest of them, so that a line turning hard near k,
  // as a waterline running into the keel, raises the tolerance; a bad offset at k does not
  // raise its own).
  const size = degree + 2;
  const first = Math.max(0, k - size - 1);
  const others: number[] = [];
  for (let j = first; j < Math.min(n, k + size + 2); j++) if (j !== k) others.push(j);
  const at = k - first; // k's place in `others`: others[at - 1] < k < others[at]
  const lo = Math.max(0, Math.min(at - size + 1, others.length - size));
  const hi = Math.max(lo, Math.min(at - 1, others.length - size));
  let dd = 0;
  for (let a = lo; a <= hi; a++) dd = Math.max(dd, Math.abs(dividedDifference(s, v, others, a, size)));
  let span = 1;
  for (const j of idx) span *= Math.abs(s[k]! - s[j]!);
  const roughness = dd * span;
  return { value, gain: Math.sqrt(1 + sq), roughness };
}

/**
 * A max-heap of places by unfairness ratio (the smaller index first on a tie), with
 * stale entries skipped on the way out: the worst place of a line is found in
 * O(log n), not by a scan of the whole line every round.
 */
class WorstFirst {
  private readonly ratio: number[] = [];
  private readonly index: number[] = [];

  private before(a: number, b: number): boolean {
    const ra = this.ratio[a]!;
    const rb = this.ratio[b]!;
    return ra > rb || (ra === rb && this.index[a]! < this.index[b]!);
  }

  private swap(a: number, b: number): void {
    [this.ratio[a], this.ratio[b]] = [this.ratio[b]!, this.ratio[a]!];
    [this.index[a], this.index[b]] = [this.index[b]!, this.index[a]!];
  }

  push(index: number, ratio: number): void {
    this.ratio.push(ratio);
    this.index.push(index);
    for (let i = this.ratio.length - 1; i > 0; ) {
      const up = (i - 1) >> 1;
      if (!this.before(i, up)) break;
      this.swap(i, up);
      i = up;
    }
  }

  /** The top entry, or undefined when empty; removed. */
  pop(): { index: number; ratio: number } | undefined {
    const n = this.ratio.length;
    if (n === 0) return undefined;
    const top = { index: this.index[0]!, ratio: this.ratio[0]! };
    this.swap(0, n - 1);
    this.ratio.pop();
    this.index.pop();
    for (let i = 0; ; ) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < n - 1 && this.before(l, m)) m = l;
      if (r < n - 1 && this.before(r, m)) m = r;
      if (m === i) break;
      this.swap(i, m);
      i = m;
    }
    return top;
  }
}

/**
 * The offsets of one curve found unfair, in the order found, with their suggested values.
 *
 * Cost: O(n log n) in the offsets of the line. A correction changes the predictions
 * only within `degree + 3` places of it (the predictor's reach and that of its error
 * term), so only those are computed again; the worst place is taken from a heap; and a
 * place let pass is looked at again only when a correction lands near enough to change
 * what it was judged on.
 */
function checkCurve(curve: Curve, size: number): { found: { index: number; value: number; suggested: number; ratio: number }[]; first: number[] } {
  const { s } = curve;
  const v = curve.v.slice();
  const n = s.length;
  const degree = Math.min(3, n - 3);
  if (degree < 1) return { found: [], first: [] };
  const found: { index: number; value: number; suggested: number; ratio: number }[] = [];
  const tolerance = (p: Prediction): number => p.gain * FAIRNESS_TOLERANCE.sizeFraction * size + FAIRNESS_TOLERANCE.differenceFraction * p.roughness;
  const ratioAt = (values: readonly number[], k: number, p = predict(s, values, k, degree)): number => Math.abs(values[k]! - p.value) / tolerance(p);
  // An offset's predictor reaches at most degree + 1 places either side: only there can a change show.
  const reach = degree + 1;
  // A value reaches the prediction and error term of places this far away.
  const depends = degree + 3;
  // What judging a worst place reads: the ratios of its window, with trials near it.
  const judgedOn = 3 * reach + depends;
  const judged = (k: number): boolean => k > 0 && k < n - 1;
  const pred = s.map((_s, k) => predict(s, v, k, degree));
  const ratio = pred.map((p, k) => ratioAt(v, k, p));
  const first = ratio.map((r, k) => (judged(k) ? r : Number.NaN));
  const passed = new Set<number>(); // unfair-looking places that no single offset explains
  const heap = new WorstFirst();
  const offer = (k: number): void => {
    if (judged(k) && ratio[k]! > 1 && !passed.has(k)) heap.push(k, ratio[k]!);
  };
  for (let k = 0; k < n; k++) offer(k);
  for (let round = 0; round < 2 * n; round++) {
    let top = heap.pop();
    // Skip entries made stale by a correction or a pass since they went in.
    while (top !== undefined && (top.ratio !== ratio[top.index] || passed.has(top.index) || !(ratio[top.index]! > 1))) top = heap.pop();
    if (top === undefined) break;
    const worst = top.index;
    // Every candidate is scored over the same window, so the scores compare.
    const from = Math.max(1, worst - 3 * reach);
    const to = Math.min(n - 2, worst + 3 * reach);
    let before = 0;
    for (let k = from; k <= to; k++) before += ratio[k]! ** 2;
    let best = worst;
    let bestScore = Number.POSITIVE_INFINITY;
    for (let c = Math.max(0, worst - reach); c <= Math.min(n - 1, worst + reach); c++) {
      if (!judged(c) || !(ratio[c]! > 1)) continue;
      // The trial correction in place, undone after: no copy of the line per candidate.
      const kept = v[c]!;
      v[c] = pred[c]!.value;
      let score = 0;
      for (let k = from; k <= to; k++) score += ratioAt(v, k) ** 2;
      v[c] = kept;
      if (score < bestScore) {
        bestScore = score;
        best = c;
      }
    }
    // One bad offset explains nearly all the unfairness around it; a fair line too coarsely
    // offset for its curvature does not, and is let pass.
    if (!(bestScore <= FAIRNESS_TOLERANCE.explained * before)) {
      passed.add(worst);
      continue;
    }
    found.push({ index: best, value: curve.v[best]!, suggested: pred[best]!.value, ratio: ratio[best]! });
    v[best] = pred[best]!.value;
    for (let k = Math.max(0, best - depends); k <= Math.min(n - 1, best + depends); k++) {
      pred[k] = predict(s, v, k, degree);
      ratio[k] = ratioAt(v, k, pred[k]);
    }
    // Places let pass near the correction are judged again; those further away were judged on what has not changed.
    for (let k = Math.max(0, best - judgedOn); k <= Math.min(n - 1, best + judgedOn); k++) {
      passed.delete(k);
      offer(k);
    }
  }
  return { found, first };
}

/** The corners of a station: the first and last points and every knuckle. */
function corners(points: HullModel['stations'][number]['points']): number[] {
  const c = [0];
  for (let k = 1; k < points.length - 1; k++) if (points[k]!.knuckle) c.push(k);
  c.push(points.length - 1);
  return c;
}

function sectionCurves(hull: HullModel): Curve[] {
  const curves: Curve[] = [];
  hull.stations.forEach((st, i) => {
    const c = corners(st.points);
    for (let r = 0; r + 1 < c.length; r++) {
      const at: CurvePoint[] = [];
      // A keel point off the centreline is the edge of a flat of bottom: the side may leave
      // it at any angle (a bilge turning from a flat keel), so the curve starts above it.
      const first = r === 0 && st.points[0]!.y > 0 ? 1 : c[r]!;
      for (let k = first; k <= c[r + 1]!; k++) at.push({ station: i, point: k });
      const s = at.map((a) => st.points[a.point]!.z);
      if (s.some((z, k) => k > 0 && !(z > s[k - 1]!))) continue; // a flat given as points: not a y(z) curve
      curves.push({ along: 'section', coordinate: 'y', s, v: at.map((a) => st.points[a.point]!.y), at });
    }
  });
  return curves;
}

/** Maximal runs of consecutive stations for which `pointAt` finds a point. */
function longitudinalRuns(hull: HullModel, pointAt: (station: number) => number | undefined): CurvePoint[][] {
  const runs: CurvePoint[][] = [];
  let run: CurvePoint[] = [];
  hull.stations.forEach((_st, i) => {
    const j = pointAt(i);
    if (j === undefined) {
      if (run.length > 0) runs.push(run);
      run = [];
    } else run.push({ station: i, point: j });
  });
  if (run.length > 0) runs.push(run);
  return runs;
}

function lineCurves(hull: HullModel): Curve[] {
  const curves: Curve[] = [];
  const make = (along: Curve['along'], coordinate: Curve['coordinate'], at: CurvePoint[]): Curve => ({
    along,
    coordinate,
    s: at.map((a) => hull.stations[a.station]!.x),
    v: at.map((a) => hull.stations[a.station]!.points[a.point]![coordinate]),
    at,
  });
  if (hull.waterlines !== undefined) {
    // Each station's points by height, found once (a grid has one point per defined cell).
    const byHeight = hull.stations.map((st) => new Map(st.points.map((q, j) => [q.z, j] as const)));
    for (const z of hull.waterlines) {
      const at = (i: number): number | undefined => byHeight[i]?.get(z);
      // Where a waterline meets the keel or the deck edge between two stations (its lowest or
      // highest offset at one, an ordinary one at the next) it ends at the profile: that
      // offset is the flat of keel or the deck, not a point of the waterline's curve.
      const onProfile = (i: number, j: number): boolean => {
        const last = hull.stations[i]!.points.length - 1;
        if (j !== 0 && j !== last) return false;
        return [i - 1, i + 1].some((nb) => {
          const k = at(nb);
          return k !== undefined && (j === 0 ? k !== 0 : k !== hull.stations[nb]!.points.length - 1);
        });
      };
      for (const run of longitudinalRuns(hull, (i) => {
        const j = at(i);
        return j === undefined || onProfile(i, j) ? undefined : j;
      })) {
        curves.push(make('waterline', 'y', run));
      }
    }
    return curves;
  }
  // Points form: the same point index on stations that share their count and knuckles.
  const pattern = (i: number): string => hull.stations[i]!.points.map((q) => (q.knuckle ? 'k' : '.')).join('');
  let start = 0;
  for (let i = 1; i <= hull.stations.length; i++) {
    if (i < hull.stations.length && pattern(i) === pattern(start)) continue;
    const count = hull.stations[start]!.points.length;
    for (let j = 0; j < count; j++) {
      const at: CurvePoint[] = [];
      for (let t = start; t < i; t++) at.push({ station: t, point: j });
      curves.push(make('line', 'y', at), make('line', 'z', at));
    }
    start = i;
  }
  return curves;
}

// Four decimals of a metre; a value too large to round so (none within the physical limits) is written as it is.
const fmt = (v: number): string => (Math.abs(v) < 1e12 ? String(Math.round(v * 1e4) / 1e4) : v.toPrecision(6));

/**
 * Every unfair offset of a hull, one warning per offset, in station and point order.
 * A fair hull gives none.
 */
export function fairnessWarnings(hull: HullModel): FairnessWarning[] {
  let size = 0;
  for (const st of hull.stations) for (const q of st.points) size = Math.max(size, q.y);
  if (!(size > 0)) return [];
  const byPlace = new Map<number, { station: number; point: number; coordinate: 'y' | 'z'; value: number; suggested: number; ratio: number; along: Set<Curve['along']> }>();
  // The smallest unfairness ratio each offset shows on a line that judges it (interior) and does not accuse it.
  // Indexed by place: (first point of the station + point) x 2 + (0 for y, 1 for z).
  const base: number[] = [];
  let total = 0;
  for (const st of hull.stations) {
    base.push(total);
    total += st.points.length;
  }
  const place = (at: CurvePoint, coordinate: 'y' | 'z'): number => (base[at.station]! + at.point) * 2 + (coordinate === 'z' ? 1 : 0);
  const clearest = new Float64Array(2 * total).fill(Number.POSITIVE_INFINITY);
  for (const curve of [...lineCurves(hull), ...sectionCurves(hull)]) {
    const { found, first } = checkCurve(curve, size);
    const accused = new Set(found.map((f) => f.index));
    first.forEach((r, k) => {
      if (Number.isNaN(r) || accused.has(k)) return;
      const at = curve.at[k]!;
      const key = place(at, curve.coordinate);
      clearest[key] = Math.min(r, clearest[key]!);
    });
    for (const f of found) {
      const at = curve.at[f.index]!;
      const key = place(at, curve.coordinate);
      const seen = byPlace.get(key);
      if (seen === undefined) {
        byPlace.set(key, { ...at, coordinate: curve.coordinate, value: f.value, suggested: f.suggested, ratio: f.ratio, along: new Set([curve.along]) });
      } else {
        seen.along.add(curve.along);
        // Keep the suggestion of the line that found it most clearly.
        if (f.ratio > seen.ratio) Object.assign(seen, { suggested: f.suggested, ratio: f.ratio });
      }
    }
  }
  // An offset that another line through it shows clearly fair was blamed for a neighbour's
  // fault (a short line cannot always tell which of its offsets is wrong): it is not reported.
  for (const [key, w] of byPlace) if (clearest[key]! < FAIRNESS_TOLERANCE.clearlyFair && w.along.size === 1) byPlace.delete(key);
  const out = [...byPlace.values()].sort((a, b) => a.station - b.station || a.point - b.point || a.coordinate.localeCompare(b.coordinate));
  return out.map((w) => {
    const st = hull.stations[w.station]!;
    const q = st.points[w.point]!;
    const what = w.coordinate === 'y' ? 'half-breadth' : 'height';
    const lines = [...w.along].map((a) => (a === 'line' ? 'the line of points along the length' : `the ${a}`)).join(' and ');
    return {
      code: 'HYD_UNFAIR_OFFSET',
      path: ['stations', w.station, 'points', w.point, w.coordinate],
      x: st.x,
      z: q.z,
      offset: w.coordinate === 'y' ? 'halfBreadth' : 'height',
      value: w.value,
      suggested: w.suggested,
      along: [...w.along],
      message: `station x = ${fmt(st.x)} m, z = ${fmt(q.z)} m: ${what} ${fmt(w.value)} m is not fair along ${lines}; its neighbours suggest ${fmt(w.suggested)} m`,
    };
  });
}
