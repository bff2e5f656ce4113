/**
 * The hull at any waterplane: trimmed, heeled or both. Immersed volume and its centre
 * (x, y, z), the waterplane's area, its centre (the centre of flotation) and its second
 * moments about axes through that centre in the waterplane.
 *
 * The waterplane. With φ the heel (starboard down positive) and τ the trim angle
 * (positive by the stern), its upward unit normal in the hull's frame is
 *   n = (sin τ, -sin φ cos τ, cos φ cos τ),
 * and the water lies where n · r < h. At a station x this is the line
 * -y sin φ + z cos φ < h(x), h(x) = (h - x sin τ) / cos τ, cut through the whole section
 * (both sides, closed by the deck and the flat of bottom; core/hull/sectionCut.ts).
 * Draft at amidships d (at the centreline), trim t = draft aft - draft forward over
 * the LBP and heel φ give tan τ = t cos φ / LBP and h = (xm sin τ + d cos φ cos τ).
 *
 * Along the length the stations are integrated exactly as the level waterline is
 * (core/upright/waterlinePlan.ts planOfDepths): runs of immersed stations by Simpson's
 * rules, no panel across a step in the spacing, and where the waterline leaves the hull
 * between two stations an end piece read from the hull between them. A station is
 * immersed where its lowest point below the line (the keel upright, a bilge when heeled)
 * is under water; between stations each section is hung from the straight keel line and
 * cut by the same waterline, and the two blended. At zero heel and trim every step is
 * that of the upright table, so the results equal it to rounding.
 *
 * The waterplane's in-plane axes: e2 = (0, cos φ, sin φ) across, e1 = e2 × n along. The
 * chord at a station lies at ξ = x cos τ - h(x) sin τ along e1, and its points at
 * η = y cos φ + z sin φ across; the area element is chord × dx / cos τ.
 * Reference for the quantities: E. C. Tupper, Introduction to Naval Architecture, 5th ed.
 * (Butterworth-Heinemann, 2013), ch. 3 and 4 (from memory).
 */
import type { PreparedHull } from '../hull/preparedHull.js';
import { sectionBoundary, type SectionBoundary } from '../hull/sectionBoundary.js';
import { cutSection, emptyCut, lowestAlong, type CutValues } from '../hull/sectionCut.js';
import { isStationOrdinate, planOfDepths, type WaterlinePlan } from '../upright/waterlinePlan.js';

/** A waterplane in the hull's frame: heel φ (rad), trim angle τ (rad) and h (m), the water where n · r < h. */
export interface Waterplane {
  readonly heel: number;
  readonly trimAngle: number;
  readonly h: number;
}

export interface InclinedValues {
  /** Immersed volume, m³. */
  readonly volume: number;
  /** Centre of buoyancy in the hull's frame, m. */
  readonly xB: number;
  readonly yB: number;
  readonly zB: number;
  /** Waterplane area, m², in the plane. */
  readonly waterplaneArea: number;
  /** Centre of flotation in the hull's frame, m. */
  readonly xF: number;
  readonly yF: number;
  readonly zF: number;
  /** Second moment of the waterplane about its axis along the length through F (in the plane), m⁴. */
  readonly iT: number;
  /** Second moment of the waterplane about its axis across through F (in the plane), m⁴. */
  readonly iL: number;
  /** Where the waterline leaves the hull, aft and forward, m (x). */
  readonly aft: number;
  readonly fwd: number;
}

const boundaries = new WeakMap<PreparedHull, SectionBoundary[]>();

/** The closed section of each station, worked once per prepared hull. */
export function boundariesOf(p: PreparedHull): SectionBoundary[] {
  let b = boundaries.get(p);
  if (b === undefined) {
    b = p.sections.map((s) => sectionBoundary(s));
    boundaries.set(p, b);
  }
  return b;
}

/** Each station's least and greatest -y sin φ + z cos φ at a heel: how low and how high the section reaches across the waterplane. */
export interface Extremes {
  readonly low: Float64Array;
  readonly high: Float64Array;
}

const extremesCache = new WeakMap<PreparedHull, Map<number, Extremes>>();
/** Heels whose extremes are kept per hull: a sweep of cross curves or a GZ curve uses a few dozen. */
const EXTREMES_KEPT = 512;

/** The extremes of every station at heel φ (rad), worked once per hull and heel (they do not depend on h or trim). */
export function extremesAt(p: PreparedHull, heel: number): Extremes {
  let byHeel = extremesCache.get(p);
  if (byHeel === undefined) {
    byHeel = new Map();
    extremesCache.set(p, byHeel);
  }
  let e = byHeel.get(heel);
  if (e === undefined) {
    const bd = boundariesOf(p);
    const sin = Math.sin(heel);
    const cos = Math.cos(heel);
    const low = new Float64Array(bd.length);
    const high = new Float64Array(bd.length);
    for (let i = 0; i < bd.length; i++) {
      low[i] = lowestAlong(bd[i]!, sin, cos);
      high[i] = -lowestAlong(bd[i]!, -sin, -cos);
    }
    e = { low, high };
    if (byHeel.size >= EXTREMES_KEPT) byHeel.clear();
    byHeel.set(heel, e);
  }
  return e;
}

/** The waterplane of a draft at amidships (centreline), a trim by the stern (m) and a heel (degrees). */
export function waterplaneOf(p: PreparedHull, draftMid: number, trim: number, heelDeg: number): Waterplane {
  const phi = (heelDeg * Math.PI) / 180;
  const tau = Math.atan((trim * Math.cos(phi)) / p.perp.lbp);
  return { heel: phi, trimAngle: tau, h: p.perp.xm * Math.sin(tau) + draftMid * Math.cos(phi) * Math.cos(tau) };
}

/** Height of the waterplane above the baseline at x on the centreline (where it exists: cos φ ≠ 0), m. */
export function draftAtX(w: Waterplane, x: number): number {
  return (w.h - x * Math.sin(w.trimAngle)) / (Math.cos(w.heel) * Math.cos(w.trimAngle));
}

const scratchA = emptyCut();
const scratchB = emptyCut();
const scratch = emptyCut();

/** Values of the section at fraction t from station a to b, hung from the keel line and cut by the plane. */
function between(p: PreparedHull, bd: readonly SectionBoundary[], a: number, b: number, t: number, w: Waterplane, out: CutValues): CutValues {
  const sin = Math.sin(w.heel);
  const cos = Math.cos(w.heel);
  const x = p.x[a]! + t * (p.x[b]! - p.x[a]!);
  const hx = (w.h - x * Math.sin(w.trimAngle)) / Math.cos(w.trimAngle);
  const keel = (1 - t) * p.keel[a]! + t * p.keel[b]!;
  const part = (k: number, into: CutValues): number => {
    const dz = keel - p.keel[k]!; // station k moved up by dz to hang from the keel line
    cutSection(bd[k]!, sin, cos, hx - dz * cos, into);
    return dz;
  };
  const da = part(a, scratchA);
  const db = part(b, scratchB);
  const s = 1 - t;
  out.area = s * scratchA.area + t * scratchB.area;
  out.momentY = s * scratchA.momentY + t * scratchB.momentY;
  out.momentZ = s * (scratchA.momentZ + scratchA.area * da) + t * (scratchB.momentZ + scratchB.area * db);
  // The chord: where each station has one, the blended section's chord runs between the
  // blended ends (so at zero heel its half-breadth is the blend of the two, as upright);
  // otherwise (the line cuts a station in two places) the chords' moments are blended.
  const d1 = da * sin; // a chord's position across moves by dz sin φ with its section
  const d2 = db * sin;
  if (scratchA.chords === 1 && scratchB.chords === 1) {
    const lo = s * (scratchA.chordFrom + d1) + t * (scratchB.chordFrom + d2);
    const hi = s * (scratchA.chordTo + d1) + t * (scratchB.chordTo + d2);
    out.chord = hi - lo;
    out.chordS = (hi * hi - lo * lo) / 2;
    out.chordS2 = (hi ** 3 - lo ** 3) / 3;
  } else {
    const shifted = (c: CutValues, d: number): [number, number] => [c.chordS + d * c.chord, c.chordS2 + 2 * d * c.chordS + d * d * c.chord];
    const [sa1, sa2] = shifted(scratchA, d1);
    const [sb1, sb2] = shifted(scratchB, d2);
    out.chord = s * scratchA.chord + t * scratchB.chord;
    out.chordS = s * sa1 + t * sb1;
    out.chordS2 = s * sa2 + t * sb2;
  }
  return out;
}

/** The plan of ordinates along the length for the waterplane (see the module note). */
export function inclinedPlan(p: PreparedHull, w: Waterplane): WaterlinePlan {
  const { low } = extremesAt(p, w.heel);
  const sinT = Math.sin(w.trimAngle);
  const cosT = Math.cos(w.trimAngle);
  const depth = new Array<number>(p.x.length);
  for (let i = 0; i < depth.length; i++) depth[i] = (w.h - p.x[i]! * sinT) / cosT - low[i]!;
  return planOfDepths(p, depth, Number.NaN);
}

/** Volume, centre of buoyancy and waterplane of the hull at the waterplane `w`. */
export function inclinedHydrostatics(p: PreparedHull, w: Waterplane): InclinedValues {
  const bd = boundariesOf(p);
  const plan = inclinedPlan(p, w);
  const sin = Math.sin(w.heel);
  const cos = Math.cos(w.heel);
  const sinT = Math.sin(w.trimAngle);
  const cosT = Math.cos(w.trimAngle);
  const xm = p.perp.xm;
  let vol = 0;
  let mx = 0;
  let my = 0;
  let mz = 0;
  let len = 0;
  let ls = 0;
  let ls2 = 0;
  let lx = 0;
  let lxx = 0;
  const { weight, a: at, b: bt, t: tt, x: xs } = plan;
  for (let k = 0; k < plan.count; k++) {
    const x = xs[k]!;
    const hx = (w.h - x * sinT) / cosT;
    const v = isStationOrdinate(plan, k) ? cutSection(bd[at[k]!]!, sin, cos, hx, scratch) : between(p, bd, at[k]!, bt[k]!, tt[k]!, w, scratch);
    const wk = weight[k]!;
    const dx = x - xm; // moments about amidships keep the sums well conditioned
    vol += wk * v.area;
    mx += wk * v.area * dx;
    my += wk * v.momentY;
    mz += wk * v.momentZ;
    // The chord's place along the waterplane (ξ = x cos τ - h(x) sin τ), measured from
    // that of q, the foot of (xm, 0, 0) on the plane (ξ = xm cos τ).
    const xi = dx * cosT - hx * sinT;
    len += wk * v.chord;
    ls += wk * v.chordS;
    ls2 += wk * v.chordS2;
    lx += wk * v.chord * xi;
    lxx += wk * v.chord * xi * xi;
  }
  const aw = len / cosT;
  const eta = len > 0 ? ls / len : 0;
  const xiF = len > 0 ? lx / len : 0;
  const iT = ls2 / cosT - aw * eta * eta;
  const iL = lxx / cosT - aw * xiF * xiF;
  // F is q, the foot of (xm, 0, 0) on the plane, (xm, 0, 0) + (h - xm sin τ) n, moved by
  // ξ along e1 and η along e2 (q has ξ = xm cos τ and η = 0).
  const e1 = [cosT, sin * sinT, -cos * sinT] as const;
  const e2 = [0, cos, sin] as const;
  const n = [sinT, -sin * cosT, cos * cosT] as const;
  const lift = w.h - xm * sinT;
  const q = [xm + lift * n[0], lift * n[1], lift * n[2]] as const;
  const xF = q[0] + xiF * e1[0] + eta * e2[0];
  const yF = q[1] + xiF * e1[1] + eta * e2[1];
  const zF = q[2] + xiF * e1[2] + eta * e2[2];
  const ends = plan.ends.map((e) => e.x);
  return {
    volume: vol,
    xB: xm + mx / vol,
    yB: my / vol,
    zB: mz / vol,
    waterplaneArea: aw,
    xF,
    yF,
    zF,
    iT,
    iL,
    aft: ends.length > 0 ? Math.min(...ends) : Number.NaN,
    fwd: ends.length > 0 ? Math.max(...ends) : Number.NaN,
  };
}
