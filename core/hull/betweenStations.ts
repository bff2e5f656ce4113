/**
 * The hull between two stations: the section at a position between them, read from the
 * two stations' fitted sections the way the profile runs.
 *
 * Method: the keel line runs straight from one station's keel to the other's. At a
 * fraction t of the way from station a to station b the keel is at
 * k(t) = (1 - t) ka + t kb, and the section there is taken as the blend, at equal depth
 * below the waterline, of the two stations' sections each hung from its own keel: its
 * half-breadth at depth h above the keel is (1 - t) ya(ka + h) + t yb(kb + h). So the
 * immersed area, the moments and the waterline half-breadth at a draft d are the blends
 * of the two stations' values at the drafts ka + (d - k) and kb + (d - k), the vertical
 * moment shifted by each keel's offset. Where the hull between the stations is made of
 * planes (a raked stem, a rising flat of bottom, a chine running straight) this is
 * exact; on a curved hull it is the linear interpolation of Bonjean values at equal
 * depth that a hand calculation would make. At the depth h = 0 (where the waterline
 * meets the keel line) the area is 0 and the half-breadth that of the flat of bottom.
 *
 * Wetted surface: the side girth of each station is blended with its own slope factors;
 * the flat of bottom gets the slope of this keel line, sqrt(1 + (dk/dx)^2).
 *
 * Derivation: common practice, no source (the interpolation of sectional properties
 * at equal draft above the keel is how Bonjean curves are read between stations).
 */
import { emptyValues, type Section, type SectionValues } from './section.js';

/** Scratch values for the two stations, reused to spare allocation. */
const scratchA = emptyValues();
const scratchB = emptyValues();

/**
 * Immersed properties, into `out`, of the section at fraction `t` (0 at station a, 1 at
 * station b) of the way between two stations `dx` apart (b - a, signed; only its size
 * enters the keel slope), cut by the waterline at `draft`.
 */
export function valuesBetween(a: Section, b: Section, t: number, dx: number, draft: number, out: SectionValues = emptyValues()): SectionValues {
  const keel = (1 - t) * a.zKeel + t * b.zKeel;
  const depth = draft - keel;
  const bottom = (1 - t) * a.yBottom + t * b.yBottom; // half-width of the flat of bottom
  const slope = (b.zKeel - a.zKeel) / dx;
  const keelFactor = Math.sqrt(1 + slope * slope);
  if (!(depth > 0)) {
    // Where the waterline meets the keel line the flat of bottom, if any, is wetted to its edge.
    out.immersed = false;
    out.halfBreadth = depth === 0 ? bottom : 0;
    out.area = 0;
    out.momentZ = 0;
    out.momentYHalf = 0;
    out.girth = depth === 0 ? 2 * bottom : 0;
    out.wettedGirth = depth === 0 ? 2 * bottom * keelFactor : 0;
    return out;
  }
  const va = a.evaluate(a.zKeel + depth, scratchA);
  const vb = b.evaluate(b.zKeel + depth, scratchB);
  const s = 1 - t;
  out.immersed = true;
  out.area = s * va.area + t * vb.area;
  out.momentZ = s * (va.momentZ + va.area * (keel - a.zKeel)) + t * (vb.momentZ + vb.area * (keel - b.zKeel));
  out.momentYHalf = s * va.momentYHalf + t * vb.momentYHalf;
  out.halfBreadth = s * va.halfBreadth + t * vb.halfBreadth;
  out.girth = s * va.girth + t * vb.girth;
  // The flat of bottom, drawn or closed, carries the station's keel factor (core/hull/wettedSurface.ts).
  const sidesA = va.wettedGirth - 2 * a.yBottom * a.bottomFactor;
  const sidesB = vb.wettedGirth - 2 * b.yBottom * b.bottomFactor;
  out.wettedGirth = s * sidesA + t * sidesB + 2 * bottom * keelFactor;
  return out;
}

/** Properties where the waterline meets the keel line between two stations: no area, the flat of bottom's half-breadth. */
export function keelLineEnd(a: Section, b: Section, t: number, dx: number, out: SectionValues = emptyValues()): SectionValues {
  const draft = (1 - t) * a.zKeel + t * b.zKeel;
  return valuesBetween(a, b, t, dx, draft, out);
}
