/**
 * The geometric rules a hull must keep, in one place for both offsets files and JSON
 * models. Issues carry model paths (`["stations", i, "points", j, "y"]`); the CSV
 * reader translates them to lines and columns.
 */
import { issue, type Issue } from '../common/errors.js';
import { LIMITS, lengthInRange, PHYSICAL_LIMITS } from '../common/limits.js';

interface RuleHull {
  readonly ap?: number | undefined;
  readonly fp?: number | undefined;
  readonly waterlines?: readonly number[] | undefined;
  readonly stations: readonly { readonly x: number; readonly points: readonly { readonly y: number; readonly z: number }[] }[];
}

const fmt = (v: number): string => (Number.isFinite(v) ? String(Math.round(v * 1e6) / 1e6) : String(v));

const RANGE = `lengths must lie within ${PHYSICAL_LIMITS.maxLength} m of the origin`;

/**
 * Lengths beyond the physical limits (core/common/limits.ts), each reported once: a
 * length more than 10 km from the origin, or neighbouring stations or waterlines closer
 * than 1 mm. Checked before the other rules, which compare lengths and would only repeat
 * the fault. Messages read `<what> <value> m: <rule>`; the CSV reader keeps the rule.
 */
function outOfRange(hull: RuleHull): Issue[] {
  const found: Issue[] = [];
  const check = (v: number, path: (string | number)[], what: string): void => {
    if (!lengthInRange(v)) found.push(issue('HYD_VALUE_RANGE', path, `${what} ${fmt(v)} m: beyond the physical limit; ${RANGE}`));
  };
  const gap = (v: number, before: number | undefined, path: (string | number)[], what: string, things: string): void => {
    const d = before === undefined ? Number.NaN : v - before;
    if (d > 0 && d < PHYSICAL_LIMITS.minSpacing) {
      found.push(issue('HYD_VALUE_RANGE', path, `${what} ${fmt(v)} m: ${d.toPrecision(3)} m above the one before it; ${things} must be at least ${PHYSICAL_LIMITS.minSpacing} m apart`));
    }
  };
  if (hull.ap !== undefined) check(hull.ap, ['ap'], 'ap');
  if (hull.fp !== undefined) check(hull.fp, ['fp'], 'fp');
  hull.waterlines?.forEach((z, k) => {
    check(z, ['waterlines', k], `waterline ${k + 1} at z =`);
    gap(z, hull.waterlines![k - 1], ['waterlines', k], `waterline ${k + 1} at z =`, 'waterlines');
  });
  hull.stations.forEach((st, i) => {
    check(st.x, ['stations', i, 'x'], `station ${i + 1} at x =`);
    gap(st.x, hull.stations[i - 1]?.x, ['stations', i, 'x'], `station ${i + 1} at x =`, 'stations');
    st.points.forEach((p, j) => {
      check(p.y, ['stations', i, 'points', j, 'y'], `station ${i + 1}, point ${j + 1}: half-breadth`);
      check(p.z, ['stations', i, 'points', j, 'z'], `station ${i + 1}, point ${j + 1}: z =`);
    });
  });
  return found;
}

/** Every rule broken by the hull, in file order; an empty list means the hull is sound. */
export function checkHull(hull: RuleHull): Issue[] {
  const range = outOfRange(hull);
  if (range.length > 0) return range;
  const found: Issue[] = [];
  const { stations } = hull;
  if (stations.length < 3) {
    found.push(issue('HYD_TOO_FEW_STATIONS', ['stations'], `the hull has ${stations.length} station(s); at least 3 are needed to integrate along the length`));
  }
  let total = 0;
  for (let i = 0; i < stations.length; i++) {
    const st = stations[i]!;
    total += st.points.length;
    const prev = stations[i - 1];
    if (prev !== undefined && !(st.x > prev.x)) {
      found.push(issue('HYD_X_NOT_INCREASING', ['stations', i, 'x'], `station ${i + 1} at x = ${fmt(st.x)} m: x must be greater than the station before it (x = ${fmt(prev.x)} m)`));
    }
    if (st.points.length < 2) {
      found.push(issue('HYD_STATION_TOO_FEW_POINTS', ['stations', i, 'points'], `station ${i + 1} at x = ${fmt(st.x)} m has ${st.points.length} defined point(s); a section needs at least 2`));
    }
    for (let j = 0; j < st.points.length; j++) {
      const p = st.points[j]!;
      if (p.y < 0) {
        found.push(issue('HYD_HALF_BREADTH_NEGATIVE', ['stations', i, 'points', j, 'y'], `station x = ${fmt(st.x)} m, z = ${fmt(p.z)} m: half-breadth ${fmt(p.y)} < 0`));
      }
      const q = st.points[j - 1];
      if (q !== undefined) {
        if (p.z < q.z) {
          found.push(issue('HYD_Z_NOT_INCREASING', ['stations', i, 'points', j, 'z'], `station x = ${fmt(st.x)} m, point ${j + 1}: z = ${fmt(p.z)} m is below the point before it (z = ${fmt(q.z)} m); list points from the keel up`));
        } else if (p.z === q.z && p.y === q.y) {
          found.push(issue('HYD_Z_NOT_INCREASING', ['stations', i, 'points', j], `station x = ${fmt(st.x)} m, point ${j + 1}: repeats the point before it (y = ${fmt(p.y)} m, z = ${fmt(p.z)} m)`));
        }
      }
    }
  }
  const wl = hull.waterlines;
  if (wl !== undefined) {
    for (let k = 1; k < wl.length; k++) {
      if (!(wl[k]! > wl[k - 1]!)) {
        found.push(issue('HYD_Z_NOT_INCREASING', ['waterlines', k], `waterline ${k + 1} at z = ${fmt(wl[k]!)} m: heights must increase strictly (the one before is ${fmt(wl[k - 1]!)} m)`));
      }
    }
  }
  if (total > LIMITS.maxPoints) {
    found.push(issue('HYD_TOO_LARGE', ['stations'], `the hull has ${total} points; the limit is ${LIMITS.maxPoints}`));
  }
  const first = stations[0];
  const last = stations[stations.length - 1];
  const ap = hull.ap ?? first?.x;
  const fp = hull.fp ?? last?.x;
  // With neither perpendicular given, fp > ap is the end stations' x order, which the
  // station rules above already report; saying it again would only repeat them.
  const given = hull.ap !== undefined || hull.fp !== undefined;
  if (given && ap !== undefined && fp !== undefined && !(fp > ap)) {
    found.push(issue('HYD_PERPENDICULARS', [hull.fp !== undefined ? 'fp' : 'ap'], `fp (x = ${fmt(fp)} m) must lie forward of ap (x = ${fmt(ap)} m)`));
  }
  return found;
}
