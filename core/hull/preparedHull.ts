/**
 * A hull made ready for repeated evaluation: each station's section fitted once, the
 * Simpson weights along the length computed once, the wetted-surface slope factors
 * found once. Every draft after that costs one section evaluation per station.
 * Preparing costs O(stations x points); a table at D drafts then O(D x stations x log points).
 */
import { perpendiculars, type HullModel, type Perpendiculars } from './hullModel.js';
import { Section } from './section.js';
import { simpsonWeights } from '../quadrature/simpson.js';
import { applyWettedFactors } from './wettedSurface.js';

export interface PreparedHull {
  readonly hull: HullModel;
  readonly perp: Perpendiculars;
  /** Station positions, m. */
  readonly x: Float64Array;
  /** Composite Simpson weights along the length for the stations (core/quadrature/simpson.ts). */
  readonly weights: Float64Array;
  readonly sections: readonly Section[];
  /** Keel height of each station, m. */
  readonly keel: Float64Array;
  /** The lowest keel height of the hull: drafts must lie above it. */
  readonly lowestKeel: number;
  /** The lowest deck edge of the hull: drafts may not lie above it. */
  readonly lowestDeck: number;
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
  applyWettedFactors(x, sections);
  return {
    hull,
    perp: perpendiculars(hull),
    x,
    weights: simpsonWeights(x),
    sections,
    keel,
    lowestKeel: sections.reduce((m, s) => Math.min(m, s.zKeel), Infinity),
    lowestDeck: sections.reduce((m, s) => Math.min(m, s.zDeck), Infinity),
  };
}
