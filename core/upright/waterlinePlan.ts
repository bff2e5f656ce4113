/**
 * The ordinates along the length at one level waterline, and their weights: the one
 * place where the longitudinal integration of the upright hydrostatics is set out, for
 * the table (core/upright/hydrostatics.ts) and the calculation sheet alike.
 *
 * Method:
 * 1. The immersed length. A station is immersed when its keel lies below the waterline.
 *    Each run of consecutive immersed stations is integrated on its own, from the
 *    waterline's end aft of it to its end forward. An end is the hull's end station when
 *    that station is immersed (a transom, a square bow: the end face is part of the
 *    wetted surface), else the point between the run's last station and the dry one
 *    beyond it where the straight keel line between them crosses the waterline (a raked
 *    stem, a cut-up stern, the foot of a fin).
 * 2. Inside a run, the stations carry the weights of core/quadrature/lengthPanels.ts:
 *    Simpson's first and second rules where the spacing is even, no panel across a step
 *    in the spacing, no negative weight. A single interval between steps gets Simpson's
 *    first rule over itself with its middle ordinate read from the section between the
 *    two stations (core/hull/betweenStations.ts).
 * 3. An end piece (from a waterline end between stations to the run's last station)
 *    gets Simpson's first rule over itself too: its three ordinates are the end (no
 *    area; the half-breadth of the flat of bottom, if any, so a flat raked bow or a
 *    transom's edge ends the waterplane with its true breadth), the middle of the piece
 *    and the station, the first two read from the section between the station and the
 *    dry one beyond. So a sectional area that goes to zero at a raked stem and a
 *    waterplane that ends with a jump are both integrated as the hull has them, never by
 *    a polynomial through dry stations; where the hull is made of planes the result is
 *    exact.
 * The result is continuous in draft where the hull is: as a waterline end passes a
 * station the end piece becomes a panel of the run, and the two differ only by the
 * rules' own small error.
 *
 * References: C. B. Barrass & D. R. Derrett, Ship Stability for Masters and Mates, 7th
 * ed. (Butterworth-Heinemann, 2012), ch. 10 (Simpson's rules, part intervals at the
 * ends); the reading of the end pieces from the keel line is common practice, no source.
 */
import { keelLineEnd, valuesBetween } from '../hull/betweenStations.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { emptyValues, type SectionValues } from '../hull/section.js';
import { lengthPanels, LENGTH_RULE_TEXT, type LengthPanel } from '../quadrature/lengthPanels.js';

/** What an ordinate is: a station's own section, or a section read between two stations. */
export type OrdinateKind = 'station' | 'end' | 'between';

/** One ordinate of a plan, as an object (the plan holds them as arrays; see planOrdinates). */
export interface PlanOrdinate {
  readonly kind: OrdinateKind;
  readonly x: number;
  /** The station (kind 'station'), or the first of the two it lies between. */
  readonly a: number;
  /** The second station it lies between (equal to `a` for a station). */
  readonly b: number;
  /** Fraction of the way from station a to station b (0 for a station). */
  readonly t: number;
  /** Weight along the length (m): the integral is the sum of weight x ordinate. */
  readonly weight: number;
  /**
   * The part of `weight` from panels forward of a station that stands at a step in the
   * spacing, whose wetted girth is then read with the forward slope factors
   * (core/hull/preparedHull.ts `forward`).
   */
  readonly weightForward: number;
}

/** One piece of the integration, for the calculation sheet. */
export interface PlanPiece {
  /** x where the piece starts and ends, m. */
  readonly from: number;
  readonly to: number;
  /** The rule used, in words. */
  readonly rule: string;
  /** Indices into the plan's ordinates of the ordinates the piece uses, in x order. */
  readonly ordinates: readonly number[];
}

/** Where the waterline ends, and how the end was found. */
export interface WaterlineEnd {
  readonly x: number;
  readonly side: 'aft' | 'fwd';
  /** The two stations whose keel line the waterline crosses; null at the hull's end station. */
  readonly between: readonly [number, number] | null;
}

/** Kinds as held in a plan's `kind` array. */
export const ORDINATE_KINDS: readonly OrdinateKind[] = ['station', 'end', 'between'];
const STATION = 0;
const END = 1;
const BETWEEN = 2;

/**
 * The plan at one draft. Its ordinates, in x order, are held as arrays (one entry each),
 * since a table builds one plan per draft; planOrdinates gives them as objects.
 */
export interface WaterlinePlan {
  /** The level waterline's height at amidships (NaN for an inclined waterplane's plan). */
  readonly draft: number;
  /**
   * How the level waterline rises aft: its height at x is draft + (xm - x) tanTrim
   * (levelAt). 0 when level; trim by the stern over the LBP for a trimmed waterline.
   */
  readonly tanTrim: number;
  readonly count: number;
  /** Index into ORDINATE_KINDS. */
  readonly kind: readonly number[];
  readonly x: readonly number[];
  readonly a: readonly number[];
  readonly b: readonly number[];
  readonly t: readonly number[];
  readonly weight: readonly number[];
  readonly weightForward: readonly number[];
  /** The pieces of the integration, when asked for (PlanOptions); else empty. */
  readonly pieces: readonly PlanPiece[];
  readonly ends: readonly WaterlineEnd[];
  /** First and last station of each run of immersed stations. */
  readonly runs: readonly (readonly [number, number])[];
}

const SIMPSON_PIECE = "Simpson's first rule over the piece, its middle ordinate read between the stations";

/** The weights of a run of stations along the length, worked once per run (core/hull/preparedHull.ts panelCache). */
interface RunWeights {
  readonly panels: readonly LengthPanel[];
  /** Weight of each station of the run (index - first), single intervals by Simpson with a middle ordinate. */
  readonly weight: Float64Array;
  /** The part of each weight from panels forward of the station. */
  readonly forward: Float64Array;
  /** For each station, the weight of the middle ordinate of a single interval starting there (0 if none). */
  readonly middle: Float64Array;
  /** How many middle ordinates the run has. */
  readonly middles: number;
}

function runWeights(p: PreparedHull, from: number, to: number): RunWeights {
  const key = `${from}:${to}`;
  const cached = p.panelCache.get(key) as RunWeights | undefined;
  if (cached !== undefined) return cached;
  const panels = lengthPanels(p.x, from, to);
  const m = to - from + 1;
  const weight = new Float64Array(m);
  const forward = new Float64Array(m);
  const middle = new Float64Array(m);
  for (const panel of panels) {
    const k0 = panel.start - from;
    if (panel.rule === 'single') {
      // Simpson's first rule over the interval: h/6 at each station, 4h/6 at the middle.
      const len = p.x[panel.start + 1]! - p.x[panel.start]!;
      weight[k0]! += len / 6;
      forward[k0]! += len / 6;
      weight[k0 + 1]! += len / 6;
      middle[k0] = (4 * len) / 6;
      continue;
    }
    panel.weights.forEach((w, k) => (weight[k0 + k]! += w));
    forward[k0]! += panel.weights[0]!;
  }
  let middles = 0;
  for (let k = 0; k < m; k++) if (middle[k]! > 0) middles++;
  const out: RunWeights = { panels, weight, forward, middle, middles };
  p.panelCache.set(key, out);
  return out;
}

export interface PlanOptions {
  /** Also set out the pieces of the integration with their rules, for a calculation sheet. */
  readonly pieces?: boolean;
}

/** The runs of consecutive stations with a positive depth (immersed). */
function immersedRuns(depth: ArrayLike<number>): [number, number][] {
  const runs: [number, number][] = [];
  const n = depth.length;
  let i = 0;
  while (i < n) {
    if (!(depth[i]! > 0)) {
      i++;
      continue;
    }
    const a = i;
    while (i + 1 < n && depth[i + 1]! > 0) i++;
    runs.push([a, i]);
    i++;
  }
  return runs;
}

/**
 * The ordinates and weights at the level waterline `draft` (m), in x order. A draft below
 * every keel gives an empty plan.
 */
export function waterlinePlan(p: PreparedHull, draft: number, options: PlanOptions = {}, tanTrim = 0): WaterlinePlan {
  const depth = new Array<number>(p.x.length);
  const xm = p.perp.xm;
  for (let i = 0; i < depth.length; i++) depth[i] = draft + (xm - p.x[i]!) * tanTrim - p.keel[i]!;
  return planOfDepths(p, depth, draft, options, tanTrim);
}

/** Height of the plan's waterline above the baseline at x (a level or trimmed waterline), m. */
export function levelAt(p: PreparedHull, plan: WaterlinePlan, x: number): number {
  return plan.tanTrim === 0 ? plan.draft : plan.draft + (p.perp.xm - x) * plan.tanTrim;
}

/**
 * The plan for any waterline, given by how deep below it each station's lowest point
 * lies (`depth[i]`, positive when the station is immersed): an end between a wet station
 * and a dry one lies where the depth, read straight between them, is zero. For a level
 * waterline the depth is the draft less the keel height, and the end is where the
 * straight keel line crosses the waterline. `draft` is the level waterline's, kept in the
 * plan for its readers (NaN for an inclined one).
 */
export function planOfDepths(p: PreparedHull, depth: ArrayLike<number>, draft: number, options: PlanOptions = {}, tanTrim = 0): WaterlinePlan {
  const { x } = p;
  const n = x.length;
  const runs = immersedRuns(depth);
  // Every station immersed: the plan does not depend on the draft (no end pieces), so it
  // is made once and shared, which spares most of a table's allocation.
  const whole = runs.length === 1 && runs[0]![0] === 0 && runs[0]![1] === n - 1 && options.pieces !== true;
  if (whole) {
    const cached = p.panelCache.get('whole plan') as WaterlinePlan | undefined;
    if (cached !== undefined) return planOf(draft, tanTrim, cached);
  }
  const weights: RunWeights[] = [];
  let count = 0;
  for (const [a, b] of runs) {
    const rw = runWeights(p, a, b);
    weights.push(rw);
    count += b - a + 1 + rw.middles + (a > 0 ? 2 : 0) + (b < n - 1 ? 2 : 0);
  }
  // Plain arrays: a table makes one plan per draft, and typed arrays cost several times
  // more to allocate in V8 than the few dozen numbers each holds.
  const kind = new Array<number>(count).fill(0);
  const ox = new Array<number>(count).fill(0);
  const oa = new Array<number>(count).fill(0);
  const ob = new Array<number>(count).fill(0);
  const ot = new Array<number>(count).fill(0);
  const weight = new Array<number>(count).fill(0);
  const weightForward = new Array<number>(count).fill(0);
  const pieces: PlanPiece[] = [];
  const ends: WaterlineEnd[] = [];
  let k = 0;
  for (let r = 0; r < runs.length; r++) {
    const [a, b] = runs[r]!;
    const rw = weights[r]!;
    // Aft end: Simpson's first rule over the end piece, its end and middle read between stations a and a - 1.
    let aftPiece = 0;
    let kAftEnd = -1;
    if (a > 0) {
      const t = depth[a]! / (depth[a]! - depth[a - 1]!); // fraction from station a toward a - 1
      const xEnd = x[a]! + (x[a - 1]! - x[a]!) * t;
      ends.push({ x: xEnd, side: 'aft', between: [a - 1, a] });
      aftPiece = x[a]! - xEnd;
      kAftEnd = k;
      kind[k] = END;
      ox[k] = xEnd;
      oa[k] = a;
      ob[k] = a - 1;
      ot[k] = t;
      weight[k++] = aftPiece / 6;
      kind[k] = BETWEEN;
      ox[k] = (xEnd + x[a]!) / 2;
      oa[k] = a;
      ob[k] = a - 1;
      ot[k] = t / 2;
      weight[k++] = (4 * aftPiece) / 6;
    } else ends.push({ x: x[0]!, side: 'aft', between: null });

    // The run's stations, each followed by the middle ordinate of a single interval starting there.
    const first = k;
    for (let s = a; s <= b; s++) {
      const j = s - a;
      kind[k] = STATION;
      ox[k] = x[s]!;
      oa[k] = s;
      ob[k] = s;
      weight[k] = rw.weight[j]! + (s === a ? aftPiece / 6 : 0);
      weightForward[k++] = rw.forward[j]!;
      if (rw.middle[j]! > 0) {
        kind[k] = BETWEEN;
        ox[k] = (x[s]! + x[s + 1]!) / 2;
        oa[k] = s;
        ob[k] = s + 1;
        ot[k] = 0.5;
        weight[k++] = rw.middle[j]!;
      }
    }

    // Forward end.
    let kFwdEnd = -1;
    if (b < n - 1) {
      const t = depth[b]! / (depth[b]! - depth[b + 1]!);
      const xEnd = x[b]! + (x[b + 1]! - x[b]!) * t;
      ends.push({ x: xEnd, side: 'fwd', between: [b, b + 1] });
      const len = xEnd - x[b]!;
      weight[k - 1]! += len / 6; // station b (a single interval cannot start at the run's last station)
      weightForward[k - 1]! += len / 6;
      kind[k] = BETWEEN;
      ox[k] = (x[b]! + xEnd) / 2;
      oa[k] = b;
      ob[k] = b + 1;
      ot[k] = t / 2;
      weight[k++] = (4 * len) / 6;
      kFwdEnd = k;
      kind[k] = END;
      ox[k] = xEnd;
      oa[k] = b;
      ob[k] = b + 1;
      ot[k] = t;
      weight[k++] = len / 6;
    } else ends.push({ x: x[n - 1]!, side: 'fwd', between: null });

    if (options.pieces === true) {
      // Index of each station's ordinate in this run, to name the ordinates of each piece.
      const at = new Map<number, number>();
      for (let j = first; j < k; j++) if (kind[j] === STATION) at.set(oa[j]!, j);
      if (kAftEnd >= 0) pieces.push({ from: ox[kAftEnd]!, to: x[a]!, rule: SIMPSON_PIECE, ordinates: [kAftEnd, kAftEnd + 1, at.get(a)!] });
      for (const panel of rw.panels) {
        const ks = Array.from({ length: panel.size }, (_, j) => at.get(panel.start + j)!);
        if (panel.rule === 'single') pieces.push({ from: x[panel.start]!, to: x[panel.start + 1]!, rule: SIMPSON_PIECE, ordinates: [ks[0]!, ks[0]! + 1, ks[1]!] });
        else pieces.push({ from: x[panel.start]!, to: x[panel.start + panel.size - 1]!, rule: LENGTH_RULE_TEXT[panel.rule], ordinates: ks });
      }
      if (kFwdEnd >= 0) pieces.push({ from: x[b]!, to: ox[kFwdEnd]!, rule: SIMPSON_PIECE, ordinates: [at.get(b)!, kFwdEnd - 1, kFwdEnd] });
    }
  }
  const plan = planOf(draft, tanTrim, { count, kind, x: ox, a: oa, b: ob, t: ot, weight, weightForward, pieces, ends, runs });
  if (whole) p.panelCache.set('whole plan', plan);
  return plan;
}

/** One object shape for every plan, so that the loops over plans stay monomorphic in V8. */
function planOf(draft: number, tanTrim: number, q: Omit<WaterlinePlan, 'draft' | 'tanTrim'>): WaterlinePlan {
  return {
    draft,
    tanTrim,
    count: q.count,
    kind: q.kind,
    x: q.x,
    a: q.a,
    b: q.b,
    t: q.t,
    weight: q.weight,
    weightForward: q.weightForward,
    pieces: q.pieces,
    ends: q.ends,
    runs: q.runs,
  };
}

/** The plan's ordinates as objects, in x order (for a calculation sheet). */
export function planOrdinates(plan: WaterlinePlan): PlanOrdinate[] {
  return Array.from({ length: plan.count }, (_, k) => ({
    kind: ORDINATE_KINDS[plan.kind[k]!]!,
    x: plan.x[k]!,
    a: plan.a[k]!,
    b: plan.b[k]!,
    t: plan.t[k]!,
    weight: plan.weight[k]!,
    weightForward: plan.weightForward[k]!,
  }));
}

/** The section values of ordinate `k` of the plan at its draft, into `out`. */
export function ordinateValues(p: PreparedHull, plan: WaterlinePlan, k: number, out: SectionValues = emptyValues()): SectionValues {
  const a = plan.a[k]!;
  const kind = plan.kind[k]!;
  if (kind === STATION) return p.sections[a]!.evaluate(levelAt(p, plan, plan.x[k]!), out);
  const b = plan.b[k]!;
  const sa = sectionFacing(p, a, b);
  const sb = sectionFacing(p, b, a);
  const dx = p.x[b]! - p.x[a]!;
  if (kind === END) return keelLineEnd(sa, sb, plan.t[k]!, dx, out);
  return valuesBetween(sa, sb, plan.t[k]!, dx, levelAt(p, plan, plan.x[k]!), out);
}

/** Whether ordinate `k` is a station's own. */
export function isStationOrdinate(plan: WaterlinePlan, k: number): boolean {
  return plan.kind[k] === STATION;
}

/** Wetted girth of station ordinate `k` with the slope factors of the panels forward of it, m. */
export function forwardWettedGirth(p: PreparedHull, plan: WaterlinePlan, k: number, scratch: SectionValues): number {
  const fwd = p.forward[plan.a[k]!];
  return fwd === undefined ? Number.NaN : fwd.evaluate(levelAt(p, plan, plan.x[k]!), scratch).wettedGirth;
}

/** Station i's section with the slope factors on the side facing station j. */
function sectionFacing(p: PreparedHull, i: number, j: number) {
  return j > i ? (p.forward[i] ?? p.sections[i]!) : p.sections[i]!;
}
