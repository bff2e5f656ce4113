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
  weight: number;
  /**
   * The part of `weight` from panels forward of a station that stands at a step in the
   * spacing, whose wetted girth is then read with the forward slope factors
   * (core/hull/preparedHull.ts `forward`).
   */
  weightForward: number;
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

export interface WaterlinePlan {
  readonly draft: number;
  /** In x order. */
  readonly ordinates: readonly PlanOrdinate[];
  readonly pieces: readonly PlanPiece[];
  readonly ends: readonly WaterlineEnd[];
  /** First and last station of each run of immersed stations. */
  readonly runs: readonly (readonly [number, number])[];
}

const SIMPSON_PIECE = "Simpson's first rule over the piece, its middle ordinate read between the stations";

function panelsOf(p: PreparedHull, from: number, to: number): readonly LengthPanel[] {
  const key = `${from}:${to}`;
  let panels = p.panelCache.get(key);
  if (panels === undefined) {
    panels = lengthPanels(p.x, from, to);
    p.panelCache.set(key, panels);
  }
  return panels;
}

/** The ordinates and weights at the level waterline `draft` (m). A draft below every keel gives an empty plan. */
export function waterlinePlan(p: PreparedHull, draft: number): WaterlinePlan {
  const { x, keel } = p;
  const n = x.length;
  const ordinates: PlanOrdinate[] = [];
  const pieces: PlanPiece[] = [];
  const ends: WaterlineEnd[] = [];
  const runs: [number, number][] = [];
  const stationOrdinate = new Map<number, number>();

  const add = (o: Omit<PlanOrdinate, 'weight' | 'weightForward'>): number => {
    ordinates.push({ ...o, weight: 0, weightForward: 0 });
    return ordinates.length - 1;
  };
  const station = (i: number): number => {
    let k = stationOrdinate.get(i);
    if (k === undefined) {
      k = add({ kind: 'station', x: x[i]!, a: i, b: i, t: 0 });
      stationOrdinate.set(i, k);
    }
    return k;
  };
  /** Simpson's first rule over [xs, xe] with ordinates (start, middle, end) already placed. */
  const simpsonPiece = (k0: number, km: number, k1: number, rule: string): void => {
    const o0 = ordinates[k0]!;
    const o1 = ordinates[k1]!;
    const len = Math.abs(o1.x - o0.x);
    o0.weight += len / 6;
    ordinates[km]!.weight += (4 * len) / 6;
    o1.weight += len / 6;
    // A station at a step takes the piece forward of it with its forward factors.
    if (o0.kind === 'station' && o1.x > o0.x) o0.weightForward += len / 6;
    if (o1.kind === 'station' && o0.x > o1.x) o1.weightForward += len / 6;
    pieces.push({ from: Math.min(o0.x, o1.x), to: Math.max(o0.x, o1.x), rule, ordinates: o0.x < o1.x ? [k0, km, k1] : [k1, km, k0] });
  };

  let i = 0;
  while (i < n) {
    if (!(keel[i]! < draft)) {
      i++;
      continue;
    }
    const a = i;
    while (i + 1 < n && keel[i + 1]! < draft) i++;
    const b = i;
    i++;
    runs.push([a, b]);

    // Aft end.
    if (a > 0) {
      const t = (draft - keel[a]!) / (keel[a - 1]! - keel[a]!); // fraction from station a toward a - 1
      const xEnd = x[a]! + (x[a - 1]! - x[a]!) * t;
      ends.push({ x: xEnd, side: 'aft', between: [a - 1, a] });
      const kEnd = add({ kind: 'end', x: xEnd, a, b: a - 1, t });
      const kMid = add({ kind: 'between', x: (xEnd + x[a]!) / 2, a, b: a - 1, t: t / 2 });
      simpsonPiece(kEnd, kMid, station(a), SIMPSON_PIECE);
    } else ends.push({ x: x[0]!, side: 'aft', between: null });

    // Inside the run.
    for (const panel of panelsOf(p, a, b)) {
      const ks = panel.weights.map((_, k) => station(panel.start + k));
      if (panel.rule === 'single') {
        const s = panel.start;
        const kMid = add({ kind: 'between', x: (x[s]! + x[s + 1]!) / 2, a: s, b: s + 1, t: 0.5 });
        simpsonPiece(ks[0]!, kMid, ks[1]!, SIMPSON_PIECE);
        continue;
      }
      panel.weights.forEach((w, k) => {
        const o = ordinates[ks[k]!]!;
        o.weight += w;
        if (k === 0) o.weightForward += w;
      });
      pieces.push({ from: x[panel.start]!, to: x[panel.start + panel.size - 1]!, rule: LENGTH_RULE_TEXT[panel.rule], ordinates: ks });
    }

    // Forward end.
    if (b < n - 1) {
      const t = (draft - keel[b]!) / (keel[b + 1]! - keel[b]!);
      const xEnd = x[b]! + (x[b + 1]! - x[b]!) * t;
      ends.push({ x: xEnd, side: 'fwd', between: [b, b + 1] });
      const kMid = add({ kind: 'between', x: (x[b]! + xEnd) / 2, a: b, b: b + 1, t: t / 2 });
      const kEnd = add({ kind: 'end', x: xEnd, a: b, b: b + 1, t });
      simpsonPiece(station(b), kMid, kEnd, SIMPSON_PIECE);
    } else ends.push({ x: x[n - 1]!, side: 'fwd', between: null });
  }

  // x order, stable (an end piece's ordinates were placed before the run's stations).
  const order = ordinates.map((_, k) => k).sort((u, v) => ordinates[u]!.x - ordinates[v]!.x || u - v);
  const newIndex = new Array<number>(ordinates.length);
  order.forEach((k, j) => (newIndex[k] = j));
  return {
    draft,
    ordinates: order.map((k) => ordinates[k]!),
    pieces: pieces.map((pc) => ({ ...pc, ordinates: pc.ordinates.map((k) => newIndex[k]!) })),
    ends,
    runs,
  };
}

/**
 * The section values of ordinate `o` at `draft`, into `out`. `wettedForward`, when
 * given, receives the wetted girth with the forward slope factors of a station at a
 * step (else the same as out.wettedGirth).
 */
export function ordinateValues(p: PreparedHull, o: PlanOrdinate, draft: number, out: SectionValues = emptyValues()): SectionValues {
  if (o.kind === 'station') return p.sections[o.a]!.evaluate(draft, out);
  const sa = sectionFacing(p, o.a, o.b);
  const sb = sectionFacing(p, o.b, o.a);
  const dx = p.x[o.b]! - p.x[o.a]!;
  if (o.kind === 'end') return keelLineEnd(sa, sb, o.t, dx, out);
  return valuesBetween(sa, sb, o.t, dx, draft, out);
}

/** Wetted girth of a station ordinate with the slope factors of the panels forward of it, m. */
export function forwardWettedGirth(p: PreparedHull, o: PlanOrdinate, draft: number, scratch: SectionValues): number {
  const fwd = p.forward[o.a];
  return fwd === undefined ? Number.NaN : fwd.evaluate(draft, scratch).wettedGirth;
}

/** Station i's section with the slope factors on the side facing station j. */
function sectionFacing(p: PreparedHull, i: number, j: number) {
  return j > i ? (p.forward[i] ?? p.sections[i]!) : p.sections[i]!;
}
