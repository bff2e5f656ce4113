/**
 * The upright hydrostatic particulars of a hull at a draft.
 *
 * Method: each station's immersed area, vertical moment, waterline half-breadth and
 * wetted girth come from its section (core/hull/section.ts); the longitudinal integrals are
 * the composite Simpson rule over the stations (core/quadrature/simpson.ts), so the results equal
 * a calculation sheet of Simpson's multipliers. Definitions follow the field table of
 * the project's conventions (README, "Hydrostatic particulars"); for the formulae see
 * e.g. E. C. Tupper, Introduction to Naval Architecture, 5th ed. (Butterworth-
 * Heinemann, 2013), ch. 3 and 4.
 *
 * Where a waterline ends between two stations (a raked stem, a cut-up stern) its end
 * is placed where the straight keel line between them crosses the waterline; that sets
 * LWL. The midship area is that of a station at amidships, or read from the parabola
 * through the three stations nearest to it.
 */
import { fail, HalfbreadthError, type Issue } from '../common/errors.js';
import { SEA_WATER_DENSITY } from '../common/constants.js';
import type { HydrostaticRow } from './hydrostaticFields.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { particularsFromIntegrals } from './particulars.js';
import { emptyValues } from '../hull/section.js';

/** Check that a draft lies within the hull; the path names it in the request. */
export function checkDraft(p: PreparedHull, draft: number, path: readonly (string | number)[] = ['draft']): void {
  if (!Number.isFinite(draft)) fail('HYD_DRAFT_LIST', path, `draft ${draft} is not a finite number`);
  if (!(draft > p.lowestKeel) || draft > p.lowestDeck) {
    fail(
      'HYD_DRAFT_OUT_OF_RANGE',
      path,
      `draft ${draft} m is outside the hull: it must lie above the lowest keel (z = ${p.lowestKeel} m) and at or below the lowest deck edge (z = ${p.lowestDeck} m)`,
    );
  }
}

/** The aft and forward ends of the waterline at `draft`, m (see the module note). */
export function waterlineEnds(p: PreparedHull, draft: number): { aft: number; fwd: number } {
  const { x, keel } = p;
  const n = x.length;
  let a = 0;
  while (a < n && !(keel[a]! < draft)) a++;
  let f = n - 1;
  while (f >= 0 && !(keel[f]! < draft)) f--;
  if (a >= n || f < 0) return { aft: Number.NaN, fwd: Number.NaN };
  const cross = (i: number, j: number): number => {
    // keel[j] >= draft > keel[i]; straight keel line between stations i and j.
    const t = (keel[j]! - draft) / (keel[j]! - keel[i]!);
    return x[j]! + (x[i]! - x[j]!) * t;
  };
  return { aft: a === 0 ? x[0]! : cross(a, a - 1), fwd: f === n - 1 ? x[n - 1]! : cross(f, f + 1) };
}

/** Immersed sectional area at amidships (see the module note). */
function midshipArea(p: PreparedHull, areas: Float64Array): number {
  const { x } = p;
  const xm = p.perp.xm;
  const n = x.length;
  const tol = 1e-9 * Math.max(1, Math.abs(p.perp.lbp));
  let near = 0;
  for (let i = 1; i < n; i++) if (Math.abs(x[i]! - xm) < Math.abs(x[near]! - xm)) near = i;
  if (Math.abs(x[near]! - xm) <= tol) return areas[near]!;
  const s = Math.min(Math.max(near - 1, 0), n - 3);
  let sum = 0;
  for (let k = s; k < s + 3; k++) {
    let basis = 1;
    for (let m = s; m < s + 3; m++) if (m !== k) basis *= (xm - x[m]!) / (x[k]! - x[m]!);
    sum += basis * areas[k]!;
  }
  return sum;
}

/** Scratch arrays reused across drafts of one table. */
interface Scratch {
  areas: Float64Array;
}

function scratchFor(p: PreparedHull): Scratch {
  return { areas: new Float64Array(p.x.length) };
}

/** Hydrostatic particulars at one draft (m), density in t/m³. */
export function hydrostaticsAt(p: PreparedHull, draft: number, density = SEA_WATER_DENSITY, scratch: Scratch = scratchFor(p)): HydrostaticRow {
  checkDraft(p, draft);
  const { x, weights, sections } = p;
  const xm = p.perp.xm;
  const n = x.length;
  const areas = scratch.areas;
  const v = emptyValues();
  let vol = 0;
  let momX = 0;
  let momZ = 0;
  let aw = 0;
  let awX = 0;
  let awXX = 0;
  let iT = 0;
  let ws = 0;
  let yMax = 0;
  for (let i = 0; i < n; i++) {
    sections[i]!.evaluate(draft, v);
    const w = weights[i]!;
    const dx = x[i]! - xm; // moments about amidships keep the sums well conditioned
    const y = v.halfBreadth;
    areas[i] = v.area;
    vol += w * v.area;
    momX += w * v.area * dx;
    momZ += w * v.momentZ;
    aw += w * y;
    awX += w * y * dx;
    awXX += w * y * dx * dx;
    iT += w * y * y * y;
    ws += w * v.wettedGirth;
    if (y > yMax) yMax = y;
  }
  // Immersed end faces (a transom, a square bow) are part of the wetted surface.
  ws += areas[0]! + areas[n - 1]!;
  const particulars = particularsFromIntegrals(
    { volume: vol, momentX: momX, momentZ: momZ, waterplaneArea: 2 * aw, waterplaneMomentX: 2 * awX, waterplaneSecondMomentX: 2 * awXX, iT: (2 / 3) * iT },
    xm,
    p.perp.lbp,
    density,
  );
  const ends = waterlineEnds(p, draft);
  const lwl = ends.fwd - ends.aft;
  const bwl = 2 * yMax;
  const am = midshipArea(p, areas);
  const ratio = (a: number, b: number): number => (b > 0 ? a / b : Number.NaN);
  return {
    draft,
    ...particulars,
    lwl,
    bwl,
    am,
    cb: ratio(vol, lwl * bwl * draft),
    cm: ratio(am, bwl * draft),
    cp: ratio(vol, am * lwl),
    cwp: ratio(particulars.waterplaneArea, lwl * bwl),
    wettedSurface: ws,
  };
}

/**
 * The hydrostatic table at a list of drafts. Every draft is checked first, so bad ones
 * fail the whole request together, each with its index named, and nothing is half-computed.
 */
export function hydrostaticTable(p: PreparedHull, drafts: readonly number[], density = SEA_WATER_DENSITY): HydrostaticRow[] {
  const issues: Issue[] = [];
  drafts.forEach((d, k) => {
    try {
      checkDraft(p, d, ['drafts', k]);
    } catch (e) {
      if (e instanceof HalfbreadthError) issues.push(...e.issues);
      else throw e;
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  const scratch = scratchFor(p);
  return drafts.map((d) => hydrostaticsAt(p, d, density, scratch));
}
