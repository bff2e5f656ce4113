/**
 * Cross curves of stability: KN against displacement, one curve per heel.
 *
 * KN is the horizontal distance from K (the baseline's point on the centreline) to the
 * line of action of buoyancy, positive when it rights the hull: KN = yB cos φ + zB sin φ
 * with (yB, zB) the centre of buoyancy in the hull's frame (the project's conventions).
 * Each displacement's volume is floated at each heel (core/stability/heeledFloat.ts), at
 * level trim or free to trim with the centre of buoyancy kept at the upright LCB of that
 * displacement. Reference: E. C. Tupper, Introduction to Naval Architecture, 5th ed.
 * (2013), ch. 4, cross curves of stability (from memory).
 */
import { HalfbreadthError, type Issue } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { hydrostaticsAt } from '../upright/hydrostatics.js';
import { heeledFloat, HeelSweep, knOf } from './heeledFloat.js';
import { draftAtX } from './inclinedHydrostatics.js';
import { levelDraftFor } from './levelDrafts.js';
import { checkVolume } from './solveVolume.js';
import { checkDeckEdges, checkHeels, type DeckEdges } from './stabilityInput.js';

export interface CrossCurveRow {
  readonly displacement: number;
  /** Degrees. */
  readonly heel: number;
  /** m */
  readonly kn: number;
  /** Draft at amidships on the centreline, m; null where the waterplane runs along the centreline plane (heel 90 degrees). */
  readonly draft: number | null;
  /** Draft aft less draft forward on the centreline, m; 0 at level trim; null as draft is. */
  readonly trim: number | null;
}

export type TrimMode = 'level' | 'free';

/**
 * The cross curves at every displacement (t) and heel (degrees), rows by displacement then
 * heel. `progress` hears of each displacement done (a long run on a terminal shows it).
 */
export function crossCurves(
  p: PreparedHull,
  displacements: readonly number[],
  heels: readonly number[],
  density: number,
  trim: TrimMode = 'level',
  deck: DeckEdges = { assumedAt: [] },
  progress?: (done: number, total: number) => void,
): CrossCurveRow[] {
  checkHeels(heels, ['heels']);
  checkDeckEdges(p, heels, deck);
  const issues: Issue[] = [];
  const volumes: number[] = [];
  displacements.forEach((d, k) => {
    try {
      volumes.push(checkVolume(p, d, density, ['displacements', k]));
    } catch (e) {
      if (e instanceof HalfbreadthError) issues.push(...e.issues);
      else throw e;
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  const rows: CrossCurveRow[] = [];
  const order = heels.map((h, k) => [h, k] as const).sort((a, b) => a[0] - b[0]);
  displacements.forEach((dis, k) => {
    const volume = volumes[k]!;
    const d0 = levelDraftFor(p, volume);
    const lcb = trim === 'free' ? hydrostaticsAt(p, Math.min(Math.max(d0, p.lowestKeel + 1e-9), p.lowestDeck)).lcb : undefined;
    const found = new Array<CrossCurveRow>(heels.length);
    const sweep = new HeelSweep();
    for (const [heel, j] of order) {
      const phi = (heel * Math.PI) / 180;
      // The first heel starts from the level draft's waterplane.
      const fl = heeledFloat(p, volume, phi, lcb, sweep.guess(phi) ?? { h: d0 * Math.cos(phi), trimAngle: 0 });
      sweep.add(phi, fl.plane);
      const kn = knOf(p, fl, phi);
      const across = Math.abs(Math.cos(phi)) > 1e-9;
      const draftAft = draftAtX(fl.plane, p.perp.ap);
      const draftFwd = draftAtX(fl.plane, p.perp.fp);
      found[j] = {
        displacement: dis,
        heel,
        kn,
        draft: across ? draftAtX(fl.plane, p.perp.xm) : null,
        trim: across ? draftAft - draftFwd : null,
      };
    }
    rows.push(...found);
    progress?.(k + 1, displacements.length);
  });
  return rows;
}

