/**
 * Bonjean data: the immersed area of every station, and its moment about the baseline,
 * against the height of the waterline, from the station's keel to its deck edge.
 *
 * Method: each value is the station's fitted section (core/hull/section.ts) integrated to
 * the height, so the curves pass exactly through Simpson's rule on the offsets at the
 * tabulated heights and follow the same fitted curve between them. The heights of a
 * station's curve are its keel (area 0), every tabulated waterline of the table above
 * the keel and at or below the deck edge (a points-form table has none: the heights of
 * the station's own points are used), and any extra heights asked for within the same
 * range. With these curves the volume and centre of buoyancy at any trimmed waterline
 * can be read station by station (E. C. Tupper, Introduction to Naval Architecture,
 * 5th ed., Butterworth-Heinemann 2013, ch. 3, "Bonjean curves").
 */
import { HalfbreadthError, issue, type Issue } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';

export interface BonjeanPoint {
  /** Height of the waterline above the baseline, m. */
  readonly z: number;
  /** Immersed area of the section, both sides, m². */
  readonly area: number;
  /** Moment of that area about the baseline, m³. */
  readonly momentZ: number;
}

export interface BonjeanStation {
  readonly x: number;
  /** Keel height (the curve starts here at area 0), m. */
  readonly keel: number;
  /** Deck-edge height (the curve ends here), m. */
  readonly deck: number;
  readonly points: readonly BonjeanPoint[];
}

/** The highest deck edge of the hull: no station's curve runs above it. */
function highestDeck(p: PreparedHull): number {
  return Math.max(...p.sections.map((s) => s.zDeck));
}

/** Check extra heights: each must lie above the lowest keel and at or below the highest deck edge. */
function checkHeights(p: PreparedHull, extra: readonly number[]): void {
  const top = highestDeck(p);
  const issues: Issue[] = [];
  extra.forEach((z, k) => {
    if (!Number.isFinite(z)) issues.push(issue('HYD_DRAFT_LIST', ['drafts', k], `draft ${z} is not a finite number`));
    else if (!(z > p.lowestKeel) || z > top) {
      issues.push(
        issue(
          'HYD_DRAFT_OUT_OF_RANGE',
          ['drafts', k],
          `draft ${z} m meets no station: Bonjean heights must lie above the lowest keel (z = ${p.lowestKeel} m) and at or below the highest deck edge (z = ${top} m)`,
        ),
      );
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
}

/** The Bonjean data of every station, at the tabulated heights and at `extra` heights (m). */
export function bonjean(p: PreparedHull, extra: readonly number[] = []): BonjeanStation[] {
  checkHeights(p, extra);
  const table = p.hull.waterlines;
  return p.sections.map((section, i) => {
    const keel = section.zKeel;
    const deck = section.zDeck;
    const own = table ?? p.hull.stations[i]!.points.map((q) => q.z);
    const heights = [...new Set([...own, ...extra].filter((z) => z > keel && z <= deck))].sort((a, b) => a - b);
    const points: BonjeanPoint[] = [{ z: keel, area: 0, momentZ: 0 }];
    for (const z of heights) {
      const v = section.evaluate(z);
      points.push({ z, area: v.area, momentZ: v.momentZ });
    }
    return { x: p.x[i]!, keel, deck, points };
  });
}
