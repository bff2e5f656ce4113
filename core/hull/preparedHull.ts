/**
 * A hull made ready for repeated evaluation: each station's section fitted once, the
 * steps in the station spacing found once, the wetted-surface slope factors found once.
 * Every draft after that costs one section evaluation per station, plus a few for the
 * ends of the waterline (core/upright/waterlinePlan.ts).
 * Preparing costs O(stations x points); a table at D drafts then O(D x stations x log points).
 */
import { perpendiculars, type HullModel, type Perpendiculars } from './hullModel.js';
import { Section } from './section.js';
import { isSpacingStep } from '../quadrature/lengthPanels.js';
import { applyWettedFactors } from './wettedSurface.js';

export interface PreparedHull {
  readonly hull: HullModel;
  readonly perp: Perpendiculars;
  /** Station positions, m. */
  readonly x: Float64Array;
  readonly sections: readonly Section[];
  /**
   * Where station i stands at a step in the spacing (the intervals either side differ by
   * more than core/quadrature/lengthPanels.ts allows in one panel), a copy of its section whose
   * wetted-surface factors come from the stations forward of it; `sections[i]` then has
   * those from aft. Undefined elsewhere.
   */
  readonly forward: readonly (Section | undefined)[];
  /** Keel height of each station, m. */
  readonly keel: Float64Array;
  /** The lowest keel height of the hull: drafts must lie above it. */
  readonly lowestKeel: number;
  /** The lowest deck edge of the hull: drafts may not lie above it. */
  readonly lowestDeck: number;
  /** Worked once and kept: the weights along the length of each run of stations met so far, by "from:to", and the plan with every station immersed (core/upright/waterlinePlan.ts fills it on use). */
  readonly panelCache: Map<string, unknown>;
}

export function prepareHull(hull: HullModel): PreparedHull {
  const n = hull.stations.length;
  const x = new Float64Array(n);
  const keel = new Float64Array(n);
  const sections = hull.stations.map((s, i) => {
    const sec = new Section(s.points);
    x[i] = s.x;
    keel[i] = sec.zKeel;
    return sec;
  });
  const forward = hull.stations.map((s, i) => (isSpacingStep(x, i) ? new Section(s.points) : undefined));
  applyWettedFactors(x, sections, forward);
  return {
    hull,
    perp: perpendiculars(hull),
    x,
    sections,
    forward,
    keel,
    lowestKeel: sections.reduce((m, s) => Math.min(m, s.zKeel), Infinity),
    lowestDeck: sections.reduce((m, s) => Math.min(m, s.zDeck), Infinity),
    panelCache: new Map(),
  };
}
