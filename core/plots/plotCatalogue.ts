/**
 * The plots of a hull by name, as the service (GET /v1/hulls/{id}/plots/<name>.svg)
 * and the command line (`halfbreadth plot <name>`) offer them: each turns a prepared
 * hull and the parameters of its computation into SVG text, with the core's own
 * computations for every number. The stability plots (crossCurvesPlot, gzPlot) take
 * their results as data and are not listed here until the computations they draw are.
 */
import { ticks } from 'd3-array';
import { fairnessWarnings } from '../fairness/fairness.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { bonjean } from '../upright/bonjean.js';
import { hydrostaticTable } from '../upright/hydrostatics.js';
import { sectionalAreaCurve } from '../upright/sectionalAreaCurve.js';
import { bonjeanPlot } from './bonjeanPlot.js';
import { curvesOfFormPlot } from './curvesOfFormPlot.js';
import { linesData } from './linesData.js';
import { linesPlot } from './linesPlot.js';
import { sectionalAreaPlot } from './sectionalAreaPlot.js';

export interface HullPlotParams {
  /** Drafts of a table (m); the curves of form default to defaultDrafts. */
  readonly drafts?: readonly number[];
  /** One draft (m), for the plots at a waterline. */
  readonly draft?: number;
  /** t/m³ */
  readonly density: number;
}

export interface HullPlot {
  /** The name in URLs and on the command line. */
  readonly name: string;
  readonly summary: string;
  /** The parameters it reads: `drafts` optional, `draft` required. */
  readonly takes: readonly ('drafts' | 'draft' | 'density')[];
  render(p: PreparedHull, params: HullPlotParams): string;
}

/**
 * About twenty round drafts from just above the lowest keel to the lowest deck edge,
 * the range a hydrostatic table may use (d3-array's ticks: steps of 1, 2 or 5 times a
 * power of ten), and the deck edge itself.
 */
export function defaultDrafts(p: PreparedHull): number[] {
  const inside = ticks(p.lowestKeel, p.lowestDeck, 20).filter((z) => z > p.lowestKeel && z <= p.lowestDeck);
  return inside[inside.length - 1] === p.lowestDeck ? inside : [...inside, p.lowestDeck];
}

export const HULL_PLOTS: readonly HullPlot[] = [
  {
    name: 'lines',
    summary: 'the lines: profile, half-breadth plan and body plan, offsets as dots, knuckles marked, unfair offsets ringed',
    takes: [],
    render: (p) => linesPlot(linesData(p, fairnessWarnings(p.hull))),
  },
  {
    name: 'curves-of-form',
    summary: 'the curves of form: each particular against draft, each at its own stated scale',
    takes: ['drafts', 'density'],
    render: (p, o) =>
      curvesOfFormPlot({ name: p.hull.name, density: o.density, rows: hydrostaticTable(p, o.drafts ?? defaultDrafts(p), o.density) }),
  },
  {
    name: 'bonjean',
    summary: 'the Bonjean curves on the profile: each station\'s immersed area against height',
    takes: ['drafts'],
    render: (p, o) => bonjeanPlot({ name: p.hull.name, stations: bonjean(p, o.drafts ?? []) }),
  },
  {
    name: 'sectional-areas',
    summary: 'the sectional-area curve at a draft, with the LCB marked',
    takes: ['draft'],
    render: (p, o) => {
      if (o.draft === undefined) throw new Error('the sectional-area plot needs a draft');
      return sectionalAreaPlot({ name: p.hull.name, curve: sectionalAreaCurve(p, o.draft) });
    },
  },
];

export function findHullPlot(name: string): HullPlot | undefined {
  return HULL_PLOTS.find((q) => q.name === name);
}
