/**
 * The calculation sheet of the upright hydrostatics at one draft: one line per station
 * with its ordinates, Simpson's multiplier and products, then the sums, the common
 * factor and the particulars they give, as a naval architect sets the work out by hand.
 *
 * Method: the multipliers are the prepared hull's Simpson weights along the length
 * divided by h/3, h the most common station interval (core/quadrature/simpson.ts
 * simpsonMultipliers): 1, 4, 2, 4, ..., 4, 1 on equal spacing, 1/2, 2, 1 1/2, 4, ...
 * where the end intervals are halved, and the weight of each ordinate over h/3 on any
 * other spacing. The per-station values (immersed area, its vertical moment, the
 * half-breadth at the waterline) come from the station's fitted section, so the sheet's
 * results equal those of core/upright/hydrostatics.ts hydrostaticsAt to rounding: it is the same
 * sum, set out. Levers are x - amidships (amidships = (ap + fp) / 2), as the moments in
 * hydrostaticsAt are taken, and the results are given back in the file's x.
 *
 * Formulae (E. C. Tupper, Introduction to Naval Architecture, 5th ed., Butterworth-
 * Heinemann 2013, ch. 3 and 4):
 *   volume = h/3 Σ(A·SM);  LCB = amidships + Σ(A·SM·lever) / Σ(A·SM);
 *   VCB = Σ(Mz·SM) / Σ(A·SM);  Aw = 2 h/3 Σ(y·SM);  LCF = amidships + Σ(y·SM·lever) / Σ(y·SM);
 *   iT = 2/3 · h/3 Σ(y³·SM);  iL = 2 h/3 Σ(y·SM·lever²) - Aw (LCF - amidships)².
 */
import { SEA_WATER_DENSITY } from '../common/constants.js';
import { checkDraft } from './hydrostatics.js';
import { particularsFromIntegrals, type LengthParticulars } from './particulars.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { simpsonMultipliers } from '../quadrature/simpson.js';
import { verticalSheet, type VerticalSheet } from './verticalSheet.js';

/** One station's line of the sheet. */
export interface SheetStation {
  readonly x: number;
  /** x - amidships, m. */
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
  readonly lbp: number;
  readonly stations: readonly SheetStation[];
  readonly totals: SheetTotals;
  readonly results: SheetResults;
  /** The vertical sheet of each station, in station order. */
  readonly verticals: readonly VerticalSheet[];
}

/** The calculation sheet at `draft` (m) in water of `density` (t/m³). The draft is checked as for hydrostaticsAt. */
export function calculationSheet(p: PreparedHull, draft: number, density = SEA_WATER_DENSITY): CalculationSheet {
  checkDraft(p, draft);
  const { spacing, multipliers } = simpsonMultipliers(p.x);
  const commonFactor = spacing / 3;
  const xm = p.perp.xm;
  const stations: SheetStation[] = [];
  const verticals: VerticalSheet[] = [];
  const t = { areaSM: 0, areaSMLever: 0, momentZSM: 0, ySM: 0, ySMLever: 0, ySMLever2: 0, y3SM: 0 };
  p.sections.forEach((section, i) => {
    const v = section.evaluate(draft);
    const x = p.x[i]!;
    const lever = x - xm;
    const sm = multipliers[i]!;
    const y = v.halfBreadth;
    const row: SheetStation = {
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
    verticals.push(verticalSheet(p.hull.stations[i]!.points, section, draft));
  });
  const results = particularsFromIntegrals(
    {
      volume: commonFactor * t.areaSM,
      momentX: commonFactor * t.areaSMLever,
      momentZ: commonFactor * t.momentZSM,
      waterplaneArea: 2 * commonFactor * t.ySM,
      waterplaneMomentX: 2 * commonFactor * t.ySMLever,
      waterplaneSecondMomentX: 2 * commonFactor * t.ySMLever2,
      iT: (2 / 3) * commonFactor * t.y3SM,
    },
    xm,
    p.perp.lbp,
    density,
  );
  return {
    draft,
    density,
    spacing,
    commonFactor,
    amidships: xm,
    lbp: p.perp.lbp,
    stations,
    totals: t,
    results,
    verticals,
  };
}
