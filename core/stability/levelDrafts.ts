/**
 * The level drafts that float given displacements: the designer's "what draft for 4.5 t",
 * the inverse of the upright table.
 *
 * Method: Newton's iteration on the draft d with dV/dd = Aw, the waterplane area, from the
 * upright table itself (core/upright/hydrostatics.ts), inside the bracket of drafts the
 * table allows (above the lowest keel, at or below the lowest deck edge), bisecting where a
 * step would leave it. So the upright table at the draft returned gives back the
 * displacement to the iteration's tolerance, 1e-12 of the volume.
 */
import { HalfbreadthError, issue, type Issue } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { hydrostaticsAt } from '../upright/hydrostatics.js';

const fmt = (v: number): string => String(Number(v.toPrecision(6)));

/** The level draft (m) at which the upright hull displaces `volume` (m³); clamped to the table's range. */
export function levelDraftFor(p: PreparedHull, volume: number): number {
  let lo = p.lowestKeel;
  let hi = p.lowestDeck;
  if (!(hydrostaticsAt(p, hi).volume > volume)) return hi;
  let d = lo + 0.5 * (hi - lo);
  for (let it = 0; it < 200; it++) {
    const row = hydrostaticsAt(p, d);
    const f = row.volume - volume;
    if (Math.abs(f) <= 1e-12 * volume) break;
    if (f > 0) hi = d;
    else lo = d;
    let next = row.waterplaneArea > 0 ? d - f / row.waterplaneArea : Number.NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (hi - lo <= 1e-14 * (1 + Math.abs(d))) break;
    d = next;
  }
  return d;
}

/**
 * The level drafts for a list of displacements (t) in water of `density` (t/m³). Every
 * displacement is checked first and all that the hull cannot float at a level waterline
 * within its deck are reported together, each naming its place in the list and the limit.
 */
export function draftsForDisplacements(p: PreparedHull, displacements: readonly number[], density: number): number[] {
  const most = hydrostaticsAt(p, p.lowestDeck).volume * density;
  const issues: Issue[] = [];
  displacements.forEach((dis, k) => {
    if (!Number.isFinite(dis) || !(dis > 0)) {
      issues.push(issue('HYD_LOAD_OUT_OF_RANGE', ['displacements', k], `displacement ${dis} t: a hull floats a displacement above zero`));
    } else if (dis > most) {
      issues.push(
        issue(
          'HYD_LOAD_OUT_OF_RANGE',
          ['displacements', k],
          `displacement ${dis} t is more than the hull floats level within its deck: ${fmt(most)} t at its lowest deck edge (z = ${fmt(p.lowestDeck)} m) in water of ${density} t/m3`,
        ),
      );
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  return displacements.map((dis) => levelDraftFor(p, dis / density));
}
