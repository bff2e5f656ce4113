/**
 * One station's half-section read as a fair curve, and its immersed properties to any
 * waterline.
 *
 * Method: the points (keel to deck edge) are split into runs at corners (the first and
 * last points and every knuckle). A run of two points is a straight line. A longer run
 * is split into the panels of the composite Simpson rule (core/simpson.ts): a parabola
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
 * Degenerate input: a section must have at least two points (core/hullRules.ts).
 */
import { GL5_T, GL5_W } from './gauss.js';
import { simpsonPanels } from './simpson.js';

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
  /** Girth weighted by the longitudinal slope factor of the surface (see core/wettedSurface.ts), m. */
  wettedGirth: number;
}

export function emptyValues(): SectionValues {
  return { immersed: false, halfBreadth: 0, area: 0, momentZ: 0, momentYHalf: 0, girth: 0, wettedGirth: 0 };
}

const KIND_Z = 1; // the piece is y(z): its parameter is z itself
const QUAD_SUBDIVISIONS = 4; // for the arc length of whole pieces, computed once

function horner(c: Float64Array, o: number, u: number): number {
  return c[o]! + u * (c[o + 1]! + u * (c[o + 2]! + u * c[o + 3]!));
}
function hornerD(c: Float64Array, o: number, u: number): number {
  return c[o + 1]! + u * (2 * c[o + 2]! + u * 3 * c[o + 3]!);
}

/** Monomial coefficients (in u = t - t[0]) of the polynomial through (t[k], v[k]), k < n <= 4. */
function fitCoefficients(t: readonly number[], v: readonly number[], out: Float64Array, o: number): void {
  const n = t.length;
  // Newton divided differences.
  const d = v.slice();
  for (let j = 1; j < n; j++) {
    for (let k = n - 1; k >= j; k--) d[k] = (d[k]! - d[k - 1]!) / (t[k]! - t[k - j]!);
  }
  // Expand d0 + d1 (u - u0) + d2 (u - u0)(u - u1) + ... with u_k = t_k - t_0.
  const poly = [0, 0, 0, 0];
  const basis = [1, 0, 0, 0]; // running product of (u - u_k)
  for (let j = 0; j < n; j++) {
    for (let m = 0; m < 4; m++) poly[m]! += d[j]! * basis[m]!;
    if (j < n - 1) {
      const uj = t[j]! - t[0]!;
      for (let m = 3; m >= 1; m--) basis[m] = basis[m - 1]! - uj * basis[m]!;
      basis[0] = -uj * basis[0]!;
    }
  }
  for (let m = 0; m < 4; m++) out[o + m] = poly[m]!;
}

export class Section {
  /** Height of the lowest point (the keel of this station), m. */
  readonly zKeel: number;
  /** Height of the highest point (the deck edge), m. */
  readonly zDeck: number;
  /** Half-breadth of the lowest point: the flat of bottom to the centreline, m. */
  readonly yKeel: number;
  readonly pieceCount: number;

  private readonly span: Float64Array; // parameter length of each piece
  private readonly zA: Float64Array;
  private readonly zB: Float64Array;
  private readonly kind: Uint8Array;
  private readonly cy: Float64Array;
  private readonly cz: Float64Array;
  private readonly firstPoint: Int32Array; // index of each piece's first point
  private readonly pointCount: Int32Array; // points in each piece
  private readonly pointT: Float64Array; // parameter of each point within its piece, from the piece start
  private readonly factor: Float64Array; // wetted-surface slope factor at each point
  private readonly cumArea: Float64Array; // at piece starts, half-section integrals from the keel
  private readonly cumMz: Float64Array;
  private readonly cumMy: Float64Array;
  private readonly cumGirth: Float64Array;
  private cumWetted: Float64Array;
  private readonly ys: Float64Array;
  private readonly zs: Float64Array;
  private readonly slope: Float64Array; // dz/ds at each point, from its neighbours in the run

  constructor(points: readonly SectionPointInput[]) {
    const n = points.length;
    if (n < 2) throw new RangeError('a section needs at least two points');
    this.ys = Float64Array.from(points, (p) => p.y);
    this.zs = Float64Array.from(points, (p) => p.z);
    this.zKeel = this.zs[0]!;
    this.zDeck = this.zs[n - 1]!;
    this.yKeel = this.ys[0]!;

    const pieces: { first: number; count: number; kind: number; span: number; cy: number[]; cz: number[]; t: number[] }[] = [];
    const corners: number[] = [0];
    for (let k = 1; k < n - 1; k++) if (points[k]!.knuckle === true) corners.push(k);
    corners.push(n - 1);
    this.slope = new Float64Array(n);

    for (let r = 0; r + 1 < corners.length; r++) {
      const s = corners[r]!;
      const e = corners[r + 1]!;
      let zStrict = true;
      for (let k = s + 1; k <= e; k++) if (!(this.zs[k]! > this.zs[k - 1]!)) zStrict = false;
      // Parameter along the run: z itself, or the chord length.
      const t: number[] = [0];
      for (let k = s + 1; k <= e; k++) {
        const dz = this.zs[k]! - this.zs[k - 1]!;
        const dy = this.ys[k]! - this.ys[k - 1]!;
        t.push(t[t.length - 1]! + (zStrict ? dz : Math.hypot(dy, dz)));
      }
      for (let k = s; k <= e; k++) {
        const a = Math.max(s, k - 1);
        const b = Math.min(e, k + 1);
        const dz = this.zs[b]! - this.zs[a]!;
        const len = Math.hypot(this.ys[b]! - this.ys[a]!, dz);
        this.slope[k] = len > 0 ? dz / len : 1;
      }
      const m = e - s + 1;
      const addPiece = (i0: number, count: number): void => {
        const tt: number[] = [];
        const yy: number[] = [];
        const zz: number[] = [];
        for (let k = 0; k < count; k++) {
          tt.push(t[i0 - s + k]!);
          yy.push(this.ys[i0 + k]!);
          zz.push(this.zs[i0 + k]!);
        }
        const cy = new Float64Array(4);
        const cz = new Float64Array(4);
        fitCoefficients(tt, yy, cy, 0);
        if (zStrict) cz.set([zz[0]!, 1, 0, 0]);
        else fitCoefficients(tt, zz, cz, 0);
        pieces.push({
          first: i0,
          count,
          kind: zStrict ? KIND_Z : 0,
          span: tt[count - 1]! - tt[0]!,
          cy: Array.from(cy),
          cz: Array.from(cz),
          t: tt.map((v) => v - tt[0]!),
        });
      };
      const panels = m === 2 ? [{ start: 0, size: 2 as const }] : simpsonPanels(m);
      for (const p of panels) {
        const i0 = s + p.start;
        if (!zStrict && p.size > 2 && !this.monotoneZ(t, s, i0, p.size)) {
          for (let k = 0; k + 1 < p.size; k++) addPiece(i0 + k, 2);
        } else addPiece(i0, p.size);
      }
    }

    const count = pieces.length;
    this.pieceCount = count;
    this.span = new Float64Array(count);
    this.zA = new Float64Array(count);
    this.zB = new Float64Array(count);
    this.kind = new Uint8Array(count);
    this.cy = new Float64Array(4 * count);
    this.cz = new Float64Array(4 * count);
    this.firstPoint = new Int32Array(count);
    this.pointCount = new Int32Array(count);
    this.pointT = new Float64Array(4 * count);
    this.factor = new Float64Array(n).fill(1);
    pieces.forEach((p, i) => {
      this.span[i] = p.span;
      this.zA[i] = this.zs[p.first]!;
      this.zB[i] = this.zs[p.first + p.count - 1]!;
      this.kind[i] = p.kind;
      this.cy.set(p.cy, 4 * i);
      this.cz.set(p.cz, 4 * i);
      this.firstPoint[i] = p.first;
      this.pointCount[i] = p.count;
      this.pointT.set(p.t, 4 * i);
    });
    this.cumArea = new Float64Array(count + 1);
    this.cumMz = new Float64Array(count + 1);
    this.cumMy = new Float64Array(count + 1);
    this.cumGirth = new Float64Array(count + 1);
    this.cumWetted = new Float64Array(count + 1);
    const part = emptyValues();
    for (let i = 0; i < count; i++) {
      this.partial(i, this.span[i]!, part, QUAD_SUBDIVISIONS);
      this.cumArea[i + 1] = this.cumArea[i]! + part.area;
      this.cumMz[i + 1] = this.cumMz[i]! + part.momentZ;
      this.cumMy[i + 1] = this.cumMy[i]! + part.momentYHalf;
      this.cumGirth[i + 1] = this.cumGirth[i]! + part.girth;
      this.cumWetted[i + 1] = this.cumWetted[i]! + part.wettedGirth;
    }
  }

  /** Whether the cubic or parabola through a panel's z values never turns back. */
  private monotoneZ(t: readonly number[], s: number, i0: number, size: number): boolean {
    const tt: number[] = [];
    const zz: number[] = [];
    for (let k = 0; k < size; k++) {
      tt.push(t[i0 - s + k]!);
      zz.push(this.zs[i0 + k]!);
    }
    const c = new Float64Array(4);
    fitCoefficients(tt, zz, c, 0);
    const span = tt[size - 1]! - tt[0]!;
    const samples = 32;
    for (let k = 0; k <= samples; k++) if (hornerD(c, 0, (span * k) / samples) < -1e-12) return false;
    return true;
  }

  /** The points of the section, as given (m). */
  pointsY(): Float64Array {
    return this.ys;
  }
  pointsZ(): Float64Array {
    return this.zs;
  }

  /** dz/ds at each point: the sine of the section's slope from horizontal there. */
  pointSlopes(): Float64Array {
    return this.slope;
  }

  /**
   * Set the wetted-surface slope factor at each point (1 = the surface runs square to
   * the section); between points the factor is read linearly along the curve.
   */
  setWettedFactors(factors: ArrayLike<number>): void {
    this.factor.set(factors);
    const part = emptyValues();
    const cum = new Float64Array(this.pieceCount + 1);
    for (let i = 0; i < this.pieceCount; i++) {
      this.partial(i, this.span[i]!, part, QUAD_SUBDIVISIONS);
      cum[i + 1] = cum[i]! + part.wettedGirth;
    }
    this.cumWetted = cum;
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

  /** The wetted-surface factor at parameter u of piece i, read linearly between its points. */
  private factorAt(i: number, u: number): number {
    const first = this.firstPoint[i]!;
    const count = this.pointCount[i]!;
    const o = 4 * i;
    for (let k = 1; k < count; k++) {
      const tb = this.pointT[o + k]!;
      if (u <= tb || k === count - 1) {
        const ta = this.pointT[o + k - 1]!;
        const w = tb > ta ? (u - ta) / (tb - ta) : 0;
        return this.factor[first + k - 1]! * (1 - w) + this.factor[first + k]! * w;
      }
    }
    return this.factor[first]!;
  }

  /**
   * Half-section integrals over piece i from its start to parameter u, into `out`
   * (area and moments of one side; girth of one side).
   */
  private partial(i: number, uEnd: number, out: SectionValues, subdivisions = 1): void {
    const o = 4 * i;
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
        const y = horner(this.cy, o, u);
        const z = horner(this.cz, o, u);
        const dy = hornerD(this.cy, o, u);
        const dz = hornerD(this.cz, o, u);
        const ds = Math.sqrt(dy * dy + dz * dz);
        area += w * y * dz;
        mz += w * y * z * dz;
        my += w * 0.5 * y * y * dz;
        girth += w * ds;
        wetted += w * ds * this.factorAt(i, u);
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
      this.partial(i, u, out);
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
