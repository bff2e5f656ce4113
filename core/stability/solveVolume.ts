/**
 * The waterplane of a given heel and trim that floats a given volume: the plane's offset
 * h along its normal with V(h) = V0.
 *
 * Method: Newton's iteration on h with the derivative dV/dh = Aw (moving the plane by dh
 * along its normal adds the waterplane's area times dh), kept inside a bracket
 * [hLow, hHigh] that always holds the root: below hLow nothing is immersed, above hHigh
 * the whole hull is. Where a Newton step would leave the bracket, or Aw vanishes, the
 * step is a bisection. Converges quadratically once close; to VOLUME_TOLERANCE of V0.
 * Reference: W. H. Press et al., Numerical Recipes, 3rd ed. (Cambridge, 2007), sec. 9.4
 * ("rtsafe", Newton with bisection; from memory).
 */
import { fail, HalfbreadthError, issue, type Issue } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { extremesAt, inclinedHydrostatics, type InclinedValues, type Waterplane } from './inclinedHydrostatics.js';

/** The range of h over which the hull goes from dry to wholly immersed, at a heel and trim. */
export function hRange(p: PreparedHull, heel: number, trimAngle: number): { low: number; high: number } {
  const e = extremesAt(p, heel);
  const sinT = Math.sin(trimAngle);
  const cosT = Math.cos(trimAngle);
  let low = Infinity;
  let high = -Infinity;
  for (let i = 0; i < e.low.length; i++) {
    // n · r = x sin τ + cos τ (-y sin φ + z cos φ): the least and greatest over the station.
    const xs = p.x[i]! * sinT;
    low = Math.min(low, xs + cosT * e.low[i]!);
    high = Math.max(high, xs + cosT * e.high[i]!);
  }
  return { low, high };
}

/** The volume is met to this share of itself: far below what any figure read from it shows. */
export const VOLUME_TOLERANCE = 1e-10;

export interface Floated {
  readonly plane: Waterplane;
  readonly values: InclinedValues;
}

/**
 * The waterplane at heel `heel` and trim angle `trimAngle` (rad) that floats `volume`
 * (m³), starting from `hStart` when given. The volume must lie between 0 and the hull's
 * whole volume: the caller says so to the user first (see checkVolume).
 */
export function floatAt(p: PreparedHull, volume: number, heel: number, trimAngle: number, hStart?: number): Floated {
  const { low, high } = hRange(p, heel, trimAngle);
  let lo = low;
  let hi = high;
  let h = hStart !== undefined && hStart > lo && hStart < hi ? hStart : 0.5 * (lo + hi);
  let plane: Waterplane = { heel, trimAngle, h };
  let values = inclinedHydrostatics(p, plane);
  for (let it = 0; it < 100; it++) {
    const f = values.volume - volume;
    if (Math.abs(f) <= VOLUME_TOLERANCE * volume) break;
    if (f > 0) hi = h;
    else lo = h;
    let next = values.waterplaneArea > 0 ? h - f / values.waterplaneArea : Number.NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (hi - lo <= 1e-13 * (1 + Math.abs(h))) break;
    h = next;
    plane = { heel, trimAngle, h };
    values = inclinedHydrostatics(p, plane);
  }
  return { plane, values };
}

const enclosed = new WeakMap<PreparedHull, number>();

/** The hull's whole enclosed volume, m³ (every section immersed to its deck), worked once per hull. */
export function enclosedVolume(p: PreparedHull): number {
  let v = enclosed.get(p);
  if (v === undefined) {
    const { high } = hRange(p, 0, 0);
    v = inclinedHydrostatics(p, { heel: 0, trimAngle: 0, h: high + 1e-9 * (1 + Math.abs(high)) }).volume;
    enclosed.set(p, v);
  }
  return v;
}

/**
 * The lightest load worked, as a share of the hull's whole enclosed volume. Lighter, the
 * waterplane lies within a few millionths of a metre of the keel on a hull of a few metres,
 * where the solvers' steps (1e-13 of the hull's size on the waterplane's offset) no longer
 * resolve it: on a 10 m box KN upright drifts from 0 by 1e-5 m at 1e-12 of the volume and
 * is NaN at 1e-16. No loading of a real hull is within a factor of a million of it
 * (common practice, no source).
 */
export const LEAST_VOLUME_SHARE = 1e-9;

/**
 * The issue (HYD_LOAD_OUT_OF_RANGE at `path`) of a displacement (t) no hull floats at a
 * draft its offsets resolve: zero or less, or lighter than LEAST_VOLUME_SHARE of the
 * enclosed volume; undefined for one above that. The one place of this rule for a single
 * load (checkVolume) and for a list (core/stability/levelDrafts.ts).
 */
export function tooLightIssue(p: PreparedHull, displacement: number, density: number, path: readonly (string | number)[]): Issue | undefined {
  if (!Number.isFinite(displacement) || !(displacement > 0)) {
    return issue('HYD_LOAD_OUT_OF_RANGE', path, `displacement ${displacement} t: a hull floats a displacement above zero`);
  }
  const least = LEAST_VOLUME_SHARE * enclosedVolume(p);
  if (!(displacement / density < least)) return undefined;
  return issue(
    'HYD_LOAD_OUT_OF_RANGE',
    path,
    `displacement ${displacement} t is too light to float at a draft these offsets resolve: at least ${Number((least * density).toPrecision(2))} t (${LEAST_VOLUME_SHARE} of the ${Number((enclosedVolume(p) * density).toPrecision(6))} t the hull displaces wholly immersed)`,
  );
}

/**
 * The volume a displacement asks for, or HYD_LOAD_OUT_OF_RANGE at `path` when the hull
 * cannot float it: zero or less, too light to resolve (tooLightIssue), or more than its
 * whole enclosed volume.
 */
export function checkVolume(p: PreparedHull, displacement: number, density: number, path: readonly (string | number)[]): number {
  const light = tooLightIssue(p, displacement, density, path);
  if (light !== undefined) throw new HalfbreadthError([light]);
  const most = enclosedVolume(p);
  const volume = displacement / density;
  if (volume >= most) {
    fail(
      'HYD_LOAD_OUT_OF_RANGE',
      path,
      `displacement ${displacement} t is more than the hull can float: wholly immersed to its deck it displaces ${Number((most * density).toPrecision(6))} t in water of ${density} t/m3`,
    );
  }
  return volume;
}
