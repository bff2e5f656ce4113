/**
 * The plots of a hull by name, as the service (GET /v1/hulls/{id}/plots/<name>.svg)
 * and the command line (`halfbreadth plot <name>`) offer them: each turns a prepared
 * hull and the parameters of its computation into SVG text, with the core's own
 * computations for every number: the stability plots draw the cross curves and the
 * righting levers of core/stability/ for the loading their parameters give.
 */
import { ticks } from 'd3-array';
import { fairnessWarnings } from '../fairness/fairness.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { bonjean } from '../upright/bonjean.js';
import { hydrostaticTable } from '../upright/hydrostatics.js';
import { sectionalAreaCurve } from '../upright/sectionalAreaCurve.js';
import type { CriteriaSet } from '../stability/criteria.js';
import { crossCurves, type CrossCurveRow, type TrimMode } from '../stability/crossCurves.js';
import { rightingLevers, type GzResult, type Opening } from '../stability/rightingLevers.js';
import type { DeckEdges } from '../stability/stabilityInput.js';
import { bonjeanPlot } from './bonjeanPlot.js';
import { crossCurvesPlot } from './crossCurvesPlot.js';
import { gzPlot } from './gzPlot.js';
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
  /** Displacements of the cross curves, t. */
  readonly displacements?: readonly number[];
  /** Heels, degrees: of the cross curves (default 0 to 90 every 10), or the points of a GZ curve. */
  readonly heels?: readonly number[];
  /** How the hull trims as it heels. */
  readonly trim?: TrimMode;
  /** The loading of a GZ curve: displacement (t), KG (m), free-surface moment (t·m), openings, criteria. */
  readonly displacement?: number;
  readonly kg?: number;
  readonly fsm?: number;
  readonly openings?: readonly Opening[];
  readonly criteria?: CriteriaSet;
  /** The deck edges the offsets leave unsaid (heeled work refuses them). */
  readonly deck?: DeckEdges;
}

/** A parameter a plot reads. */
export type PlotParam = 'drafts' | 'draft' | 'density' | 'displacements' | 'heels' | 'trim' | 'displacement' | 'kg' | 'fsm' | 'openings' | 'criteria';

export interface HullPlot {
  /** The name in URLs and on the command line. */
  readonly name: string;
  readonly summary: string;
  /** The parameters it reads. */
  readonly takes: readonly PlotParam[];
  /** Those it cannot be drawn without. */
  readonly needs?: readonly PlotParam[];
  render(p: PreparedHull, params: HullPlotParams): string;
  /**
   * For a plot of a computation the service offers (its name there): the plot drawn from
   * that computation's JSON result, so that the service may compute it where it computes
   * the rest (a worker thread for heavy work) and only draw it on the request thread.
   */
  readonly of?: { readonly computation: 'cross-curves' | 'gz'; draw(name: string, result: unknown): string };
}

/** Heels of the cross curves when none are given: 0 to 90 degrees every 10. */
export const CROSS_CURVE_HEELS: readonly number[] = Array.from({ length: 10 }, (_, k) => 10 * k);

/** What the cross-curves plot draws of its computation's result. */
interface CrossCurvesDrawn {
  readonly trim: TrimMode;
  readonly rows: readonly CrossCurveRow[];
}

const drawCrossCurves = (name: string, r: CrossCurvesDrawn): string => crossCurvesPlot({ name, rows: r.rows, trim: r.trim });
const drawGz = (name: string, r: GzResult): string => gzPlot({ name, result: r, displacement: r.displacement, kg: r.kg });

/** A parameter the plot needs, else a plain fault (the routes and the command line ask for it first). */
function needed<T>(value: T | undefined, plot: string, name: string): T {
  if (value === undefined) throw new Error(`the ${plot} plot needs ${name}`);
  return value;
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
    needs: ['draft'],
    render: (p, o) => sectionalAreaPlot({ name: p.hull.name, curve: sectionalAreaCurve(p, needed(o.draft, 'sectional-area', 'a draft')) }),
  },
  {
    name: 'cross-curves',
    summary: 'the cross curves of stability: KN against displacement, one curve per heel',
    takes: ['displacements', 'heels', 'trim', 'density'],
    needs: ['displacements'],
    render: (p, o) => {
      const trim = o.trim ?? 'level';
      const rows = crossCurves(p, needed(o.displacements, 'cross-curves', 'displacements'), o.heels ?? CROSS_CURVE_HEELS, o.density, trim, o.deck);
      return drawCrossCurves(p.hull.name, { trim, rows });
    },
    of: { computation: 'cross-curves', draw: (name, result) => drawCrossCurves(name, result as CrossCurvesDrawn) },
  },
  {
    name: 'gz',
    summary: 'the righting-lever (GZ) curve of a loading, with GM0, the largest GZ, the areas and the criteria',
    takes: ['displacement', 'kg', 'fsm', 'heels', 'openings', 'criteria', 'trim', 'density'],
    needs: ['displacement', 'kg'],
    render: (p, o) => {
      const result = rightingLevers(
        p,
        {
          displacement: needed(o.displacement, 'gz', 'a displacement'),
          kg: needed(o.kg, 'gz', 'a KG'),
          ...(o.fsm === undefined ? {} : { fsm: o.fsm }),
          ...(o.heels === undefined ? {} : { heels: o.heels }),
          ...(o.openings === undefined ? {} : { openings: o.openings }),
          ...(o.criteria === undefined ? {} : { criteria: o.criteria }),
          ...(o.trim === undefined ? {} : { trim: o.trim }),
          ...(o.deck === undefined ? {} : { deck: o.deck }),
        },
        o.density,
      );
      return drawGz(p.hull.name, result);
    },
    of: { computation: 'gz', draw: (name, result) => drawGz(name, result as GzResult) },
  },
];

export function findHullPlot(name: string): HullPlot | undefined {
  return HULL_PLOTS.find((q) => q.name === name);
}
