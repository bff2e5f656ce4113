/**
 * The drafts that float given displacements, level or at a held trim: the designer's
 * "what draft for 4.5 t", the inverse of the table.
 *
 * Method: Newton's iteration on the draft amidships d with dV/dd = Aw, the waterplane area,
 * from the table itself (core/upright/hydrostatics.ts, or core/stability/trimmedHydrostatics.ts
 * at a trim), inside the bracket of drafts the table allows (the waterline over some
 * station's keel, and at or below every station's deck edge), bisecting where a step would
 * leave it. So the table at the draft returned gives back the displacement to the
 * iteration's tolerance, 1e-12 of the volume.
 */
import { HalfbreadthError, issue, type Issue } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { hydrostaticsAt } from '../upright/hydrostatics.js';
import type { HydrostaticRow } from '../upright/hydrostaticFields.js';
import { tooLightIssue } from './solveVolume.js';
import { trimmedHydrostaticsAt } from './trimmedHydrostatics.js';

const fmt = (v: number): string => String(Number(v.toPrecision(6)));

/**
 * The drafts amidships (m) between which the waterline at `trim` (m, by the stern) runs from
 * clear of every keel to the first deck edge it meets: the bracket of the table's drafts.
 */
export function draftBracket(p: PreparedHull, trim = 0): { lo: number; hi: number } {
  if (trim === 0) return { lo: p.lowestKeel, hi: p.lowestDeck };
  const tan = trim / p.perp.lbp;
  let lo = Infinity;
  let hi = Infinity;
  for (let i = 0; i < p.x.length; i++) {
    const rise = (p.perp.xm - p.x[i]!) * tan;
    lo = Math.min(lo, p.keel[i]! - rise);
    hi = Math.min(hi, p.sections[i]!.zDeck - rise);
  }
  return { lo, hi };
}

/** The table's row at draft d amidships and `trim`: the level table's own when trim is 0. */
function rowAt(p: PreparedHull, d: number, trim: number): HydrostaticRow {
  return trim === 0 ? hydrostaticsAt(p, d) : trimmedHydrostaticsAt(p, d, trim);
}

/** The draft amidships (m) at which the hull at `trim` (m) displaces `volume` (m³); clamped to the table's range. */
export function levelDraftFor(p: PreparedHull, volume: number, trim = 0): number {
  let { lo, hi } = draftBracket(p, trim);
  if (!(rowAt(p, hi, trim).volume > volume)) return hi;
  let d = lo + 0.5 * (hi - lo);
  for (let it = 0; it < 200; it++) {
    const row = rowAt(p, d, trim);
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
 * The drafts amidships for a list of displacements (t) in water of `density` (t/m³), level
 * or at `trim` (m, by the stern). Every displacement is checked first and all that the
 * hull cannot float at that trim within its deck are reported together, each naming its
 * place in the list and the limit.
 */
export function draftsForDisplacements(p: PreparedHull, displacements: readonly number[], density: number, trim = 0): number[] {
  const { hi } = draftBracket(p, trim);
  const most = rowAt(p, hi, trim).volume * density;
  const at = trim === 0 ? 'level' : `at a trim of ${trim} m`;
  const issues: Issue[] = [];
  displacements.forEach((dis, k) => {
    const path = ['displacements', k];
    const light = tooLightIssue(p, dis, density, path);
    if (light !== undefined) issues.push(light);
    else if (dis > most) {
      issues.push(
        issue(
          'HYD_LOAD_OUT_OF_RANGE',
          path,
          `displacement ${fmt(dis)} t is more than the hull floats ${at} within its deck: ${fmt(most)} t with the waterline at its lowest deck edge (draft ${fmt(hi)} m amidships) in water of ${density} t/m3`,
        ),
      );
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  return displacements.map((dis) => levelDraftFor(p, dis / density, trim));
}
