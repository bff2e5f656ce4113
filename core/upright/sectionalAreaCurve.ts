/**
 * The curve of sectional areas at a draft: the immersed area of each station against x,
 * with the centre of buoyancy (the centroid of the area under the curve) marked.
 *
 * Method: the areas are those of the stations' fitted sections (core/hull/section.ts); the
 * volume, LCB and midship area are core/upright/hydrostatics.ts hydrostaticsAt's, so the area
 * under the curve by Simpson's rule is the volume and its centroid the LCB (E. C.
 * Tupper, Introduction to Naval Architecture, 5th ed., Butterworth-Heinemann 2013,
 * ch. 3). Each area is also given as a fraction of the midship area, the usual form for
 * comparing hulls; the fraction is NaN where the midship area is zero.
 */
import { SEA_WATER_DENSITY } from '../common/constants.js';
import { hydrostaticsAt } from './hydrostatics.js';
import type { PreparedHull } from '../hull/preparedHull.js';

export interface AreaOrdinate {
  readonly x: number;
  /** Immersed sectional area, both sides, m². */
  readonly area: number;
  /** area / am. */
  readonly fraction: number;
}

export interface SectionalAreaCurve {
  readonly draft: number;
  readonly stations: readonly AreaOrdinate[];
  /** Area under the curve: the displaced volume, m³. */
  readonly volume: number;
  /** x of the centroid of the area under the curve: the LCB, m. */
  readonly lcb: number;
  /** Immersed area at amidships, m². */
  readonly am: number;
  readonly amidships: number;
  readonly lwl: number;
  /** Prismatic coefficient volume / (am x lwl). */
  readonly cp: number;
}

/** The sectional-area curve at `draft` (m); the draft is checked as for hydrostaticsAt. */
export function sectionalAreaCurve(p: PreparedHull, draft: number): SectionalAreaCurve {
  const row = hydrostaticsAt(p, draft, SEA_WATER_DENSITY);
  const stations = p.sections.map((s, i): AreaOrdinate => {
    const area = s.evaluate(draft).area;
    return { x: p.x[i]!, area, fraction: row.am > 0 ? area / row.am : Number.NaN };
  });
  return { draft, stations, volume: row.volume, lcb: row.lcb, am: row.am, amidships: p.perp.xm, lwl: row.lwl, cp: row.cp };
}
