/**
 * One station's half-section read as a fair curve, and its immersed properties to any
 * waterline.
 *
 * Method: the points (keel to deck edge) are split into runs at corners (the first and
 * last points and every knuckle). A run of two points is a straight line. A longer run
 * is split into the panels of the composite Simpson rule (core/quadrature/simpson.ts): a parabola
 * through each three points, a cubic through the last four when the number of
 * intervals is odd. Where z rises strictly along the run, the curve is y(z), so a
 * half-breadth quadratic in z is reproduced exactly and the area to a tabulated
 * waterline equals Simpson's rule on the offsets. Where z does not rise strictly (a flat
 * of bottom given as points) the run is parameterised by chord length, y(t) and z(t);
 * a panel whose fitted z(t) would turn back is replaced by straight lines.
 *
 * Every integral over a piece is taken by five-point Gauss-Legendre quadrature, exact
 * for the polynomial integrands (area, moments) and accurate for the arc length.
 * The section is closed by a flat from its lowest point to the centreline and, above,
 * by a flat deck; areas and moments are of the region between the curve and the
 * centreline below the waterline.
 *
 * Degenerate input: a section must have at least two points (core/hull/hullRules.ts).
 */
import { GL5_T, GL5_W } from '../quadrature/gauss.js';
import { simpsonPanels } from '../quadrature/simpson.js';

export interface SectionPointInput {
  readonly y: number;
  readonly z: number;
  readonly knuckle?: boolean | undefined;
}

/** Immersed properties of a section to a waterline; both sides unless said otherwise. */
export interface SectionValues {
  /** True when the keel of this station lies below the waterline. */
  immersed: boolean;
  /** Half-breadth at the waterline, m (0 when not immersed). */
  halfBreadth: number;
  /** Immersed area of the whole section (both sides), m². */
  area: number;
  /** First moment of the immersed area about the baseline, m³ (vcb of the section = momentZ / area). */
  momentZ: number;
  /** First moment of one side's immersed area about the centreline, m³. */
  momentYHalf: number;
  /** Wetted girth, both sides, flat of bottom included, m. */
  girth: number;
  /** Girth weighted by the longitudinal slope factor of the surface (see core/hull/wettedSurface.ts), read linearly along each piece between its end points, m. */
  wettedGirth: number;
}

export function emptyValues(): SectionValues {
  return { immersed: false, halfBreadth: 0, area: 0, momentZ: 0, momentYHalf: 0, girth: 0, wettedGirth: 0 };
}

const KIND_Z = 1; // the piece is y(z): its parameter is z itself
// Gauss-Legendre panels per piece for the arc length (the one integrand not a polynomial):
// the same for a whole piece and for the part below a draft, so that the girth and the
// wetted surface run on continuously as a draft crosses a tabulated waterline or a deck.
// One panel of five points comes within about 1e-9 of the arc of a smooth cubic piece;
// a second panel halves the speed of every table for digits no offsets carry.
const QUAD_SUBDIVISIONS = 1;

function horner(c: Float64Array, o: number, u: number): number {
  return c[o]! + u * (c[o + 1]! + u * (c[o + 2]! + u * c[o + 3]!));
}
function hornerD(c: Float64Array, o: number, u: number): number {
  return c[o + 1]! + u * (2 * c[o + 2]! + u * 3 * c[o + 3]!);
}

/**
 * Monomial coefficients (in u = t - t0) of the polynomial through the n <= 4 points
 * (t[from + k], v[from + k]), appended to `out` as four numbers (zeros above degree n - 1).
 */
function fitCoefficients(t: ArrayLike<number>, v: ArrayLike<number>, from: number, n: number, out: number[]): void {
  // Newton divided differences, then expansion of d0 + d1 (u - u0) + d2 (u - u0)(u - u1) + ...
  const t0 = t[from]!;
  const d0 = v[from]!;
  let d1 = 0;
  let d2 = 0;
  let d3 = 0;
  const u1 = n > 1 ? t[from + 1]! - t0 : 0;
  const u2 = n > 2 ? t[from + 2]! - t0 : 0;
  const u3 = n > 3 ? t[from + 3]! - t0 : 0;
  if (n > 1) {
    const v1 = v[from + 1]!;
    const f01 = (v1 - d0) / u1;
    d1 = f01;
    if (n > 2) {
      const v2 = v[from + 2]!;
      const f12 = (v2 - v1) / (u2 - u1);
      const f012 = (f12 - f01) / u2;
      d2 = f012;
      if (n > 3) {
        const v3 = v[from + 3]!;
        const f23 = (v3 - v2) / (u3 - u2);
        const f123 = (f23 - f12) / (u3 - u1);
        d3 = (f123 - f012) / u3;
      }
    }
  }
  // p(u) = d0 + d1 u + d2 u (u - u1) + d3 u (u - u1)(u - u2)
  out.push(d0, d1 - d2 * u1 + d3 * u1 * u2, d2 - d3 * (u1 + u2), d3);
}

/** Whether the cubic or parabola through a panel's z values never turns back. */
function monotoneZ(t: Float64Array, zs: Float64Array, i0: number, size: number): boolean {
  const c: number[] = [];
  fitCoefficients(t, zs, i0, size, c);
  const span = t[i0 + size - 1]! - t[i0]!;
  const samples = 32;
  for (let k = 0; k <= samples; k++) {
    const u = (span * k) / samples;
    if (c[1]! + u * (2 * c[2]! + u * 3 * c[3]!) < -1e-12) return false;
  }
  return true;
}

export class Section {
  /** Height of the lowest point (the keel of this station), m. */
  readonly zKeel: number;
  /** Height of the highest point (the deck edge), m. */
  readonly zDeck: number;
  /** Half-breadth of the lowest point: the flat of bottom to the centreline, m. */
  readonly yKeel: number;
  /**
   * Half-width of the flat of bottom, m: the widest point at the keel's height, whether
   * the flat is left to the section's closure (then yKeel) or drawn out as points.
   */
  readonly yBottom: number;
  readonly pieceCount: number;

  private readonly span: Float64Array; // parameter length of each piece
  private readonly zA: Float64Array;
  private readonly zB: Float64Array;
  private readonly kind: Uint8Array;
  private readonly cy: Float64Array;
  private readonly cz: Float64Array;
  private readonly firstPoint: Int32Array; // index of each piece's first point
  private readonly pointCount: Int32Array; // points in each piece
  private readonly factor: Float64Array; // wetted-surface slope factor at each point, for the run above it
  private readonly factorBelow: Float64Array; // the same for the run below it (differs only at a corner)
  private readonly cumArea: Float64Array; // at piece starts, half-section integrals from the keel
  private readonly cumMz: Float64Array;
  private readonly cumMy: Float64Array;
  private readonly cumGirth: Float64Array;
  private readonly cumWetted: Float64Array;
  private readonly ys: Float64Array;
  private readonly zs: Float64Array;
  // Unit tangent (dy/ds, dz/ds) at each point, from its neighbours in the run above it
  // and in the run below it: the two differ only at a corner, which has one of each.
  private readonly tanY: Float64Array;
  private readonly tanZ: Float64Array;
  private readonly tanYBelow: Float64Array;
  private readonly tanZBelow: Float64Array;
  private readonly corners: Int32Array; // indices of the corner points, keel and deck edge included

  constructor(points: readonly SectionPointInput[]) {
    const n = points.length;
    if (n < 2) throw new RangeError('a section needs at least two points');
    // Plain loops: typed-array `from` with a map function is slow in V8, and this runs per station.
    this.ys = new Float64Array(n);
    this.zs = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      this.ys[k] = points[k]!.y;
      this.zs[k] = points[k]!.z;
    }
    this.zKeel = this.zs[0]!;
    this.zDeck = this.zs[n - 1]!;
    this.yKeel = this.ys[0]!;
    let yBottom = this.yKeel;
    for (let k = 1; k < n && this.zs[k] === this.zKeel; k++) yBottom = Math.max(yBottom, this.ys[k]!);
    this.yBottom = yBottom;

    const corners: number[] = [0];
    for (let k = 1; k < n - 1; k++) if (points[k]!.knuckle === true) corners.push(k);
    corners.push(n - 1);
    this.corners = Int32Array.from(corners);
    this.tanY = new Float64Array(n);
    this.tanZ = new Float64Array(n);
    this.tanYBelow = new Float64Array(n);
    this.tanZBelow = new Float64Array(n);
    const ys = this.ys;
    const zs = this.zs;
    // Pieces are gathered in plain arrays, then packed into typed arrays once.
    const first: number[] = [];
    const size: number[] = [];
    const kinds: number[] = [];
    const spans: number[] = [];
    const coefY: number[] = [];
    const coefZ: number[] = [];
    const t = new Float64Array(n); // parameter of each point along its run

    for (let r = 0; r + 1 < corners.length; r++) {
      const s = corners[r]!;
      const e = corners[r + 1]!;
      let zStrict = true;
      for (let k = s + 1; k <= e; k++) if (!(zs[k]! > zs[k - 1]!)) zStrict = false;
      // Parameter along the run: z itself, or the chord length.
      t[s] = zStrict ? zs[s]! : 0;
      for (let k = s + 1; k <= e; k++) {
        t[k] = zStrict ? zs[k]! : t[k - 1]! + Math.sqrt((ys[k]! - ys[k - 1]!) ** 2 + (zs[k]! - zs[k - 1]!) ** 2);
      }
      for (let k = s; k <= e; k++) {
        const a = Math.max(s, k - 1);
        const b = Math.min(e, k + 1);
        const dz = zs[b]! - zs[a]!;
        const dy = ys[b]! - ys[a]!;
        const len = Math.sqrt(dy * dy + dz * dz); // not Math.hypot: it is several times slower in V8
        const ty = len > 0 ? dy / len : 0;
        const tz = len > 0 ? dz / len : 1;
        // A corner ends one run and starts the next: its tangent on each side is its own.
        if (k < e || e === n - 1) {
          this.tanY[k] = ty;
          this.tanZ[k] = tz;
        }
        if (k > s || s === 0) {
          this.tanYBelow[k] = ty;
          this.tanZBelow[k] = tz;
        }
      }
      const addPiece = (i0: number, count: number): void => {
        first.push(i0);
        size.push(count);
        kinds.push(zStrict ? KIND_Z : 0);
        spans.push(t[i0 + count - 1]! - t[i0]!);
        fitCoefficients(t, ys, i0, count, coefY);
        if (zStrict) coefZ.push(zs[i0]!, 1, 0, 0);
        else fitCoefficients(t, zs, i0, count, coefZ);
      };
      const m = e - s + 1;
      const panels = m === 2 ? [{ start: 0, size: 2 as const }] : simpsonPanels(m);
      for (const p of panels) {
        const i0 = s + p.start;
        if (!zStrict && p.size > 2 && !monotoneZ(t, zs, i0, p.size)) {
          for (let k = 0; k + 1 < p.size; k++) addPiece(i0 + k, 2);
        } else addPiece(i0, p.size);
      }
    }

    const count = first.length;
    this.pieceCount = count;
    this.span = new Float64Array(spans);
    this.zA = new Float64Array(count);
    this.zB = new Float64Array(count);
    for (let i = 0; i < count; i++) {
      this.zA[i] = zs[first[i]!]!;
      this.zB[i] = zs[first[i]! + size[i]! - 1]!;
    }
    this.kind = new Uint8Array(kinds);
    this.cy = new Float64Array(coefY);
    this.cz = new Float64Array(coefZ);
    this.firstPoint = new Int32Array(first);
    this.pointCount = new Int32Array(size);
    this.factor = new Float64Array(n).fill(1);
    this.factorBelow = new Float64Array(n).fill(1);
    this.cumArea = new Float64Array(count + 1);
    this.cumMz = new Float64Array(count + 1);
    this.cumMy = new Float64Array(count + 1);
    this.cumGirth = new Float64Array(count + 1);
    this.cumWetted = new Float64Array(count + 1);
  }

  // The integrals over whole pieces are taken on first use, after the hull has set the
  // wetted-surface factors, so preparing a hull integrates every piece once, not twice.
  private integrated = false;

  private integrate(): void {
    const part = emptyValues();
    for (let i = 0; i < this.pieceCount; i++) {
      this.partial(i, this.span[i]!, part, QUAD_SUBDIVISIONS);
      this.cumArea[i + 1] = this.cumArea[i]! + part.area;
      this.cumMz[i + 1] = this.cumMz[i]! + part.momentZ;
      this.cumMy[i + 1] = this.cumMy[i]! + part.momentYHalf;
      this.cumGirth[i + 1] = this.cumGirth[i]! + part.girth;
      this.cumWetted[i + 1] = this.cumWetted[i]! + part.wettedGirth;
    }
    this.integrated = true;
  }

  /** The points of the section, as given (m). */
  pointsY(): Float64Array {
    return this.ys;
  }
  pointsZ(): Float64Array {
    return this.zs;
  }

  /**
   * The unit tangent (dy/ds, dz/ds) at each point, up the section, in the run above the
   * point and in the run below it (the deck edge has only the one below, the keel only
   * the one above; both are filled). They differ only at corners.
   */
  pointTangents(): { y: Float64Array; z: Float64Array; yBelow: Float64Array; zBelow: Float64Array } {
    return { y: this.tanY, z: this.tanZ, yBelow: this.tanYBelow, zBelow: this.tanZBelow };
  }

  /** Indices of the corner points: the keel, every knuckle, the deck edge. */
  cornerIndices(): Int32Array {
    return this.corners;
  }

  /**
   * The fitted pieces of the starboard half-section, keel up: for piece i, y and z are
   * the cubics with coefficients cy[4i..4i+3] and cz[4i..4i+3] in u (monomials), for u
   * from 0 to span[i]. Read-only views, for the whole-section boundary of
   * core/hull/sectionBoundary.ts.
   */
  pieces(): { readonly count: number; readonly span: Float64Array; readonly cy: Float64Array; readonly cz: Float64Array } {
    return { count: this.pieceCount, span: this.span, cy: this.cy, cz: this.cz };
  }

  /**
   * Set the wetted-surface slope factor at each point (1 = the surface runs square to
   * the section), for the run above each point and for the run below it (the same
   * unless the point is a knuckle); between points the factor is read linearly along
   * the curve.
   */
  setWettedFactors(factors: ArrayLike<number>, factorsBelow: ArrayLike<number> = factors): void {
    this.factor.set(factors);
    this.factorBelow.set(factorsBelow);
    this.integrated = false;
  }

  /** Index of the piece in which height z lies: the first whose top is above z. */
  private pieceAt(z: number): number {
    let lo = 0;
    let hi = this.pieceCount - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.zB[mid]! > z) hi = mid;
      else lo = mid + 1;
    }
    return lo;
  }

  /** Parameter u within piece i where z(u) = z (z between the piece's end heights). */
  private solveU(i: number, z: number): number {
    const span = this.span[i]!;
    if (this.kind[i] === KIND_Z) return Math.min(span, Math.max(0, z - this.zA[i]!));
    const o = 4 * i;
    // Safeguarded Newton on a monotone polynomial: bracket [lo, hi] always holds the root.
    let lo = 0;
    let hi = span;
    let u = span * ((z - this.zA[i]!) / (this.zB[i]! - this.zA[i]! || 1));
    for (let it = 0; it < 60; it++) {
      const f = horner(this.cz, o, u) - z;
      if (Math.abs(f) <= 1e-14 * (1 + Math.abs(z))) break;
      if (f > 0) hi = u;
      else lo = u;
      const d = hornerD(this.cz, o, u);
      let next = d > 0 ? u - f / d : 0.5 * (lo + hi);
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (hi - lo < 1e-15 * (1 + span)) break;
      u = next;
    }
    return u;
  }

  /**
   * Half-section integrals over piece i from its start to parameter uEnd, into `out`
   * (area and moments of one side; girth of one side). The slope factor is read
   * linearly between the piece's end points. This is the inner loop of every table:
   * coefficients are loaded once and nothing is allocated.
   */
  private partial(i: number, uEnd: number, out: SectionValues, subdivisions: number): void {
    const o = 4 * i;
    const cy = this.cy;
    const cz = this.cz;
    const y0 = cy[o]!, y1 = cy[o + 1]!, y2 = cy[o + 2]!, y3 = cy[o + 3]!;
    const z0 = cz[o]!, z1 = cz[o + 1]!, z2 = cz[o + 2]!, z3 = cz[o + 3]!;
    const span = this.span[i]!;
    const fA = this.factor[this.firstPoint[i]!]!;
    const fB = this.factorBelow[this.firstPoint[i]! + this.pointCount[i]! - 1]!;
    const fSlope = span > 0 ? (fB - fA) / span : 0;
    let area = 0;
    let mz = 0;
    let my = 0;
    let girth = 0;
    let wetted = 0;
    const h = uEnd / subdivisions;
    for (let sd = 0; sd < subdivisions; sd++) {
      for (let g = 0; g < 5; g++) {
        const u = h * (sd + GL5_T[g]!);
        const w = GL5_W[g]! * h;
        const y = y0 + u * (y1 + u * (y2 + u * y3));
        const z = z0 + u * (z1 + u * (z2 + u * z3));
        const dy = y1 + u * (2 * y2 + u * 3 * y3);
        const dz = z1 + u * (2 * z2 + u * 3 * z3);
        const ds = w * Math.sqrt(dy * dy + dz * dz);
        const a = w * y * dz;
        area += a;
        mz += a * z;
        my += 0.5 * a * y;
        girth += ds;
        wetted += ds * (fA + fSlope * u);
      }
    }
    out.area = area;
    out.momentZ = mz;
    out.momentYHalf = my;
    out.girth = girth;
    out.wettedGirth = wetted;
  }

  /** Half-breadth at height z, m; NaN outside the section (below the keel or above the deck). */
  halfBreadthAt(z: number): number {
    if (!(z >= this.zKeel && z <= this.zDeck)) return Number.NaN;
    if (z === this.zDeck) return this.ys[this.ys.length - 1]!;
    const i = this.pieceAt(z);
    return horner(this.cy, 4 * i, this.solveU(i, z));
  }

  /**
   * Immersed properties to a waterline at height `draft`, written into `out` (reused to
   * spare allocation in the hydrostatic loop). Above the deck edge the section is taken
   * whole; the caller keeps drafts below the deck.
   */
  evaluate(draft: number, out: SectionValues = emptyValues()): SectionValues {
    if (!(draft > this.zKeel)) {
      out.immersed = false;
      out.halfBreadth = 0;
      out.area = 0;
      out.momentZ = 0;
      out.momentYHalf = 0;
      out.girth = 0;
      out.wettedGirth = 0;
      return out;
    }
    if (!this.integrated) this.integrate();
    const bottom = this.yKeel; // flat of bottom, one side
    let area: number;
    let mz: number;
    let my: number;
    let girth: number;
    let wetted: number;
    let y: number;
    if (draft >= this.zDeck) {
      const c = this.pieceCount;
      area = this.cumArea[c]!;
      mz = this.cumMz[c]!;
      my = this.cumMy[c]!;
      girth = this.cumGirth[c]!;
      wetted = this.cumWetted[c]!;
      y = this.ys[this.ys.length - 1]!;
    } else {
      const i = this.pieceAt(draft);
      const u = this.solveU(i, draft);
      this.partial(i, u, out, QUAD_SUBDIVISIONS);
      area = this.cumArea[i]! + out.area;
      mz = this.cumMz[i]! + out.momentZ;
      my = this.cumMy[i]! + out.momentYHalf;
      girth = this.cumGirth[i]! + out.girth;
      wetted = this.cumWetted[i]! + out.wettedGirth;
      y = horner(this.cy, 4 * i, u);
    }
    out.immersed = true;
    out.halfBreadth = y;
    out.area = 2 * area;
    out.momentZ = 2 * mz;
    out.momentYHalf = my;
    out.girth = 2 * (girth + bottom);
    out.wettedGirth = 2 * (wetted + bottom * this.bottomFactor);
    return out;
  }

  /** Slope factor of the flat of bottom (the keel line's rise along x), set by the hull. */
  bottomFactor = 1;
}
