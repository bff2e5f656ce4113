/**
 * The calculation sheet of the upright hydrostatics at one draft: one line per ordinate
 * along the length (each immersed station, and where the waterline ends between
 * stations the end and the middle of the end piece) with its ordinates, Simpson's
 * multiplier and products, then the pieces of the integration and the rule of each, the
 * sums, the common factor and the particulars they give, as a naval architect sets the
 * work out by hand.
 *
 * Method: the ordinates and weights are those of core/upright/waterlinePlan.ts, the
 * same plan the table is computed from; each weight divided by h/3, h the most common
 * station interval, is the multiplier: 1, 4, 2, 4, ..., 4, 1 on equal spacing, 1/2, 2,
 * 1 1/2, 4, ... where the end intervals are halved, 3/8 multiples on a second-rule
 * panel, and the weight of the ordinate over h/3 on an end piece or uneven spacing.
 * Multipliers that are a trade fraction to rounding are written as that fraction
 * exactly (4, not 4.0000000000000036), and h is given to 12 significant digits, so the
 * products on the sheet are what a checker gets by hand. The station values (immersed
 * area, its vertical moment, the half-breadth at the waterline) come from the station's
 * fitted section, the end and middle values from the section read between two stations
 * (core/hull/betweenStations.ts), so the sheet's results equal those of core/upright/
 * hydrostatics.ts hydrostaticsAt to rounding: it is the same sum, set out. Levers are
 * x - amidships (amidships = (ap + fp) / 2), as the moments in hydrostaticsAt are
 * taken, and the results are given back in the file's x.
 *
 * Each line also carries its position in station spaces from the AP, (x - ap) / h, as
 * the trade numbers stations (0, 1/2, 1, ... 10); an end or middle line between two
 * stations gets its own (9 1/2, or a decimal). With levers in station spaces (the hand
 * sheet's way) the lever is (x - amidships) / h, the moment sums are in h and h², and
 * the final multiplication by h (LCB, LCF) and by h² (IL) is part of the results'
 * formulae; the results are the same.
 *
 * Formulae (E. C. Tupper, Introduction to Naval Architecture, 5th ed., Butterworth-
 * Heinemann 2013, ch. 3 and 4):
 *   volume = h/3 Σ(A·SM);  LCB = amidships + Σ(A·SM·lever) / Σ(A·SM);
 *   VCB = Σ(Mz·SM) / Σ(A·SM);  Aw = 2 h/3 Σ(y·SM);  LCF = amidships + Σ(y·SM·lever) / Σ(y·SM);
 *   iT = 2/3 · h/3 Σ(y³·SM);  iL = 2 h/3 Σ(y·SM·lever²) - Aw (LCF - amidships)².
 */
import { SEA_WATER_DENSITY } from '../common/constants.js';
import { metresInWords } from '../common/lengthWords.js';
import { checkDraft } from './hydrostatics.js';
import { particularsFromIntegrals, type LengthParticulars } from './particulars.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { commonSpacing } from '../quadrature/simpson.js';
import { cleanMultiplier } from '../quadrature/cleanMultiplier.js';
import type { OrdinateKind } from './waterlinePlan.js';
import { ordinateValues, planOrdinates, waterlinePlan } from './waterlinePlan.js';
import { verticalSheet, type VerticalSheet } from './verticalSheet.js';

/** How the sheet takes its levers: in metres from amidships, or in station spaces (h) from amidships. */
export type LeverUnit = 'metres' | 'stations';

export const LEVER_UNITS = ['metres', 'stations'] as const satisfies readonly LeverUnit[];

/** Options of a sheet. */
export interface SheetOptions {
  /** Levers in metres (the default) or in station spaces. */
  readonly levers?: LeverUnit;
  /** Writes a length given in metres for the sheet's words (the answer's unit; metres by default). */
  readonly length?: (metres: number) => string;
}

/** One line of the sheet: an ordinate along the length. */
export interface SheetStation {
  /** A station, the end of the waterline between two stations, or the middle of a piece read between two stations. */
  readonly kind: OrdinateKind;
  /** For an end or a middle ordinate: where it is read from, in words; null for a station. */
  readonly note: string | null;
  /** Position in station spaces from the AP: (x - ap) / h (0, 0.5, 1, ... as the trade numbers stations). */
  readonly station: number;
  readonly x: number;
  /** x - amidships, m; or (x - amidships) / h, station spaces, with levers in station spaces. */
  readonly lever: number;
  /** Half-breadth at the waterline, m. */
  readonly halfBreadth: number;
  /** Immersed sectional area, both sides, m². */
  readonly area: number;
  /** Moment of the immersed area about the baseline, m³. */
  readonly momentZ: number;
  /** Simpson's multiplier (weight / (h/3)). */
  readonly multiplier: number;
  /** area x SM (volume product), m². */
  readonly areaSM: number;
  /** area x SM x lever (longitudinal moment product), m³. */
  readonly areaSMLever: number;
  /** momentZ x SM (vertical moment product), m³. */
  readonly momentZSM: number;
  /** y x SM (waterplane area product), m. */
  readonly ySM: number;
  /** y x SM x lever (waterplane longitudinal moment product), m². */
  readonly ySMLever: number;
  /** y x SM x lever² (longitudinal second moment product), m³. */
  readonly ySMLever2: number;
  /** y³ x SM (transverse second moment product), m³. */
  readonly y3SM: number;
}

/** The sums of the product columns. */
export type SheetTotals = Pick<SheetStation, 'areaSM' | 'areaSMLever' | 'momentZSM' | 'ySM' | 'ySMLever' | 'ySMLever2' | 'y3SM'>;

/** What the sums give: the particulars formed from them (core/upright/particulars.ts). */
export type SheetResults = LengthParticulars;

export interface CalculationSheet {
  readonly draft: number;
  readonly density: number;
  /** h, the most common station interval, m. */
  readonly spacing: number;
  /** h/3, m. */
  readonly commonFactor: number;
  /** Amidships, the origin of the levers, m. */
  readonly amidships: number;
  /** The aft perpendicular, the origin of the station numbers, m. */
  readonly ap: number;
  readonly lbp: number;
  /** Metres, or station spaces. */
  readonly levers: LeverUnit;
  /** The lines of the sheet in x order. */
  readonly stations: readonly SheetStation[];
  /** The pieces of the integration along the length, in x order, with the rule of each. */
  readonly pieces: readonly SheetPiece[];
  /** Where the waterline ends, in words, aft and forward of each immersed run. */
  readonly ends: readonly string[];
  readonly totals: SheetTotals;
  readonly results: SheetResults;
  /** The vertical sheet of each line's station; null for an end or middle line. */
  readonly verticals: readonly (VerticalSheet | null)[];
}

/** A piece of the integration along the length. */
export interface SheetPiece {
  readonly from: number;
  readonly to: number;
  readonly rule: string;
  /** Indices into the sheet's lines of the ordinates the piece uses. */
  readonly lines: readonly number[];
}

const fmt = (v: number): string => String(Number(v.toPrecision(10)));

/** The calculation sheet at `draft` (m) in water of `density` (t/m³). The draft is checked as for hydrostaticsAt. */
export function calculationSheet(p: PreparedHull, draft: number, density = SEA_WATER_DENSITY, options: SheetOptions = {}): CalculationSheet {
  checkDraft(p, draft);
  const levers = options.levers ?? 'metres';
  const len = options.length ?? metresInWords;
  const plan = waterlinePlan(p, draft, { pieces: true });
  // h to 12 significant digits: the interval a person reads off the offsets (2.1 - 1.4 is 0.7).
  const spacing = Number(commonSpacing(p.x).toPrecision(12));
  const commonFactor = spacing / 3;
  const xm = p.perp.xm;
  const ap = p.perp.ap;
  // In station spaces a lever is (x - xm) / h, taken clean where it is a small fraction (5, not 4.999999999999999).
  const leverOf = (x: number): number => (levers === 'stations' ? cleanMultiplier((x - xm) / spacing) : x - xm);
  const stations: SheetStation[] = [];
  const verticals: (VerticalSheet | null)[] = [];
  const t = { areaSM: 0, areaSMLever: 0, momentZSM: 0, ySM: 0, ySMLever: 0, ySMLever2: 0, y3SM: 0 };
  planOrdinates(plan).forEach((o, k) => {
    const v = ordinateValues(p, plan, k);
    const x = o.x;
    const lever = leverOf(x);
    const sm = cleanMultiplier(o.weight / commonFactor);
    const y = v.halfBreadth;
    const row: SheetStation = {
      kind: o.kind,
      note: o.kind === 'station' ? null : ordinateNote(p, o.kind, o.a, o.b, o.t, draft, len),
      station: cleanMultiplier((x - ap) / spacing),
      x,
      lever,
      halfBreadth: y,
      area: v.area,
      momentZ: v.momentZ,
      multiplier: sm,
      areaSM: v.area * sm,
      areaSMLever: v.area * sm * lever,
      momentZSM: v.momentZ * sm,
      ySM: y * sm,
      ySMLever: y * sm * lever,
      ySMLever2: y * sm * lever * lever,
      y3SM: y * y * y * sm,
    };
    stations.push(row);
    t.areaSM += row.areaSM;
    t.areaSMLever += row.areaSMLever;
    t.momentZSM += row.momentZSM;
    t.ySM += row.ySM;
    t.ySMLever += row.ySMLever;
    t.ySMLever2 += row.ySMLever2;
    t.y3SM += row.y3SM;
    verticals.push(o.kind === 'station' ? verticalSheet(p.hull.stations[o.a]!.points, p.sections[o.a]!, draft, len) : null);
  });
  // Sums of levers in station spaces are in h (first moments) and h² (the second moment).
  const h1 = levers === 'stations' ? spacing : 1;
  const results = particularsFromIntegrals(
    {
      volume: commonFactor * t.areaSM,
      momentX: commonFactor * h1 * t.areaSMLever,
      momentZ: commonFactor * t.momentZSM,
      waterplaneArea: 2 * commonFactor * t.ySM,
      waterplaneMomentX: 2 * commonFactor * h1 * t.ySMLever,
      waterplaneSecondMomentX: 2 * commonFactor * h1 * h1 * t.ySMLever2,
      iT: (2 / 3) * commonFactor * t.y3SM,
    },
    xm,
    p.perp.lbp,
    density,
  );
  const ends = plan.ends.map((e) =>
    e.between === null
      ? `${e.side} end at x = ${len(e.x)}: the hull's ${e.side === 'aft' ? 'aftmost' : 'foremost'} station, immersed`
      : `${e.side} end at x = ${len(e.x)}: where the straight keel line from station x = ${len(p.x[e.between[0]]!)} (keel z = ${len(p.keel[e.between[0]]!)}) to station x = ${len(p.x[e.between[1]]!)} (keel z = ${len(p.keel[e.between[1]]!)}) crosses the waterline`,
  );
  return {
    draft,
    density,
    spacing,
    commonFactor,
    amidships: xm,
    ap,
    lbp: p.perp.lbp,
    levers,
    stations,
    pieces: plan.pieces.map((pc) => ({ from: pc.from, to: pc.to, rule: pc.rule, lines: pc.ordinates })),
    ends,
    totals: t,
    results,
    verticals,
  };
}

/** Where an end or middle ordinate is read from, in words. */
function ordinateNote(p: PreparedHull, kind: OrdinateKind, a: number, b: number, t: number, draft: number, len: (m: number) => string): string {
  const xa = len(p.x[a]!);
  const xb = len(p.x[b]!);
  if (kind === 'end') return `the waterline meets the keel line ${fmt(t)} of the way from station x = ${xa} to station x = ${xb}: no area; y is the flat of bottom there`;
  const keel = (1 - t) * p.keel[a]! + t * p.keel[b]!;
  return `read ${fmt(t)} of the way from station x = ${xa} to station x = ${xb}, each section taken ${len(draft - keel)} above its own keel and blended`;
}
