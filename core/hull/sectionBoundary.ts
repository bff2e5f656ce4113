/**
 * The whole section of a station as one closed curve, for waterlines that are not level:
 * the starboard half-section's fitted pieces from the keel up (core/hull/section.ts),
 * the flat deck across from deck edge to deck edge, the port half mirrored and run from
 * the deck edge down, and the flat of bottom across to the starboard keel point. It runs
 * anticlockwise in (y, z) with y to starboard, so that Green's theorem gives the enclosed
 * area and its moments from integrals along it (core/hull/sectionCut.ts).
 *
 * Each segment is a cubic in its own parameter u from 0 to its span, as the pieces are;
 * the port pieces are the starboard ones reflected and reversed (y(u) = -Y(S - u),
 * z(u) = Z(S - u), expanded into monomials), the deck and the flat of bottom straight
 * lines. For each segment the integrals over the whole of it are worked once: an area or
 * moment then costs nothing for a segment wholly below the waterline.
 *
 * The conventions close a section with a flat deck between the deck edges and a flat of
 * bottom to the centreline ("Offsets files"); a section whose deck edge lies on the
 * centreline (a stem) has no deck segment, one whose keel point does none of bottom.
 */
import { GL5_T, GL5_W } from '../quadrature/gauss.js';
import type { Section } from './section.js';

export interface SectionBoundary {
  readonly count: number;
  /** Monomial coefficients of y and z, four per segment. */
  readonly cy: Float64Array;
  readonly cz: Float64Array;
  readonly span: Float64Array;
  /** Bounding box of each segment: y from yMin to yMax, z from zMin to zMax. */
  readonly yMin: Float64Array;
  readonly yMax: Float64Array;
  readonly zMin: Float64Array;
  readonly zMax: Float64Array;
  /** Over each whole segment: the integrals of y dz, y²/2 dz and y z dz. */
  readonly fullArea: Float64Array;
  readonly fullMy: Float64Array;
  readonly fullMz: Float64Array;
  /** A length for tolerances: the section's extent, m. */
  readonly scale: number;
}

/** Roots in (0, s) of a + b u + c u² (at most two), ascending. */
function quadraticRootsIn(a: number, b: number, c: number, s: number): number[] {
  const out: number[] = [];
  if (c === 0) {
    if (b !== 0) out.push(-a / b);
  } else {
    const disc = b * b - 4 * a * c;
    if (disc >= 0) {
      // The numerically stable pair (no cancellation between -b and the root of the discriminant).
      const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
      out.push(q / c);
      if (q !== 0) out.push(a / q);
    }
  }
  return out.filter((u) => u > 0 && u < s).sort((p, q) => p - q);
}

/** Value of the cubic with coefficients c[o..o+3] at u. */
export function cubicAt(c: Float64Array, o: number, u: number): number {
  return c[o]! + u * (c[o + 1]! + u * (c[o + 2]! + u * c[o + 3]!));
}

/** Least and greatest value of the cubic c[o..o+3] over [0, s]. */
function cubicRange(c: Float64Array, o: number, s: number): [number, number] {
  let lo = Math.min(cubicAt(c, o, 0), cubicAt(c, o, s));
  let hi = Math.max(cubicAt(c, o, 0), cubicAt(c, o, s));
  for (const u of quadraticRootsIn(c[o + 1]!, 2 * c[o + 2]!, 3 * c[o + 3]!, s)) {
    const v = cubicAt(c, o, u);
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [lo, hi];
}

/** The integrals of y dz, y²/2 dz and y z dz along segment k from u = a to u = b, into out[0..2]. */
export function segmentIntegrals(bd: Pick<SectionBoundary, 'cy' | 'cz'>, k: number, a: number, b: number, out: Float64Array): void {
  const o = 4 * k;
  const { cy, cz } = bd;
  const y0 = cy[o]!, y1 = cy[o + 1]!, y2 = cy[o + 2]!, y3 = cy[o + 3]!;
  const z0 = cz[o]!, z1 = cz[o + 1]!, z2 = cz[o + 2]!, z3 = cz[o + 3]!;
  const h = b - a;
  let area = 0;
  let my = 0;
  let mz = 0;
  for (let g = 0; g < 5; g++) {
    const u = a + h * GL5_T[g]!;
    const y = y0 + u * (y1 + u * (y2 + u * y3));
    const z = z0 + u * (z1 + u * (z2 + u * z3));
    const dz = (z1 + u * (2 * z2 + u * 3 * z3)) * h * GL5_W[g]!;
    area += y * dz;
    my += 0.5 * y * y * dz;
    mz += y * z * dz;
  }
  out[0] = area;
  out[1] = my;
  out[2] = mz;
}

/** The closed boundary of a section (see the module note). */
export function sectionBoundary(section: Section): SectionBoundary {
  const { count: n, span, cy, cz } = section.pieces();
  const ys = section.pointsY();
  const zs = section.pointsZ();
  const yDeck = ys[ys.length - 1]!;
  const zDeck = zs[zs.length - 1]!;
  const yKeel = section.yKeel;
  const zKeel = section.zKeel;
  const segY: number[] = [];
  const segZ: number[] = [];
  const spans: number[] = [];
  const add = (y: readonly number[], z: readonly number[], s: number): void => {
    segY.push(...y);
    segZ.push(...z);
    spans.push(s);
  };
  for (let i = 0; i < n; i++) {
    const o = 4 * i;
    add([cy[o]!, cy[o + 1]!, cy[o + 2]!, cy[o + 3]!], [cz[o]!, cz[o + 1]!, cz[o + 2]!, cz[o + 3]!], span[i]!);
  }
  if (yDeck > 0) add([yDeck, -1, 0, 0], [zDeck, 0, 0, 0], 2 * yDeck);
  for (let i = n - 1; i >= 0; i--) {
    const o = 4 * i;
    const s = span[i]!;
    // p(S - u) for p = c0 + c1 v + c2 v² + c3 v³; y is reflected as well.
    const rev = (c: Float64Array, sign: number): number[] => {
      const c0 = c[o]!, c1 = c[o + 1]!, c2 = c[o + 2]!, c3 = c[o + 3]!;
      return [
        sign * (c0 + s * (c1 + s * (c2 + s * c3))),
        sign * -(c1 + s * (2 * c2 + s * 3 * c3)),
        sign * (c2 + 3 * c3 * s),
        sign * -c3,
      ];
    };
    add(rev(cy, -1), rev(cz, 1), s);
  }
  if (yKeel > 0) add([-yKeel, 1, 0, 0], [zKeel, 0, 0, 0], 2 * yKeel);

  const count = spans.length;
  const bd = {
    count,
    cy: new Float64Array(segY),
    cz: new Float64Array(segZ),
    span: new Float64Array(spans),
    yMin: new Float64Array(count),
    yMax: new Float64Array(count),
    zMin: new Float64Array(count),
    zMax: new Float64Array(count),
    fullArea: new Float64Array(count),
    fullMy: new Float64Array(count),
    fullMz: new Float64Array(count),
    scale: 0,
  };
  const part = new Float64Array(3);
  let extent = 0;
  for (let k = 0; k < count; k++) {
    const [ya, yb] = cubicRange(bd.cy, 4 * k, bd.span[k]!);
    const [za, zb] = cubicRange(bd.cz, 4 * k, bd.span[k]!);
    bd.yMin[k] = ya;
    bd.yMax[k] = yb;
    bd.zMin[k] = za;
    bd.zMax[k] = zb;
    extent = Math.max(extent, Math.abs(ya), Math.abs(yb), Math.abs(za), Math.abs(zb));
    segmentIntegrals(bd, k, 0, bd.span[k]!, part);
    bd.fullArea[k] = part[0]!;
    bd.fullMy[k] = part[1]!;
    bd.fullMz[k] = part[2]!;
  }
  return { ...bd, scale: Math.max(extent, 1e-9) };
}
