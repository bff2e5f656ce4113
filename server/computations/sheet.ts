/**
 * The calculation sheet at one draft (core/upright/calculationSheet.ts): each station's
 * ordinates, Simpson's multiplier and products, the sums, the common factor and the
 * particulars they give, and each station's vertical sheet. JSON holds everything; the
 * CSV (core/report/formatSheet.ts sheetCsv) holds the longitudinal sheet.
 */
import { z } from 'zod';
import { calculationSheet, LEVER_UNITS, type LeverUnit } from '../../core/upright/calculationSheet.js';
import { SHEET_RESULTS, sheetForm, sheetResult, type SheetResult } from '../../core/report/formatSheet.js';
import { DensityBody, DensityQuery, DraftBody, DraftQuery } from '../requestFields.js';
import { CautionField, HullSummarySchema } from '../responseSchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';
import { requireFormed } from '../../core/upright/formedRows.js';

const OrdinateSchema = z.object({
  point: z.number().int().describe('index of the point in the station\'s list, the keel point 0'),
  z: z.number().describe('height of the ordinate, m'),
  halfBreadth: z.number().describe('half-breadth, m'),
  multiplier: z.number().nullable().describe('weight of the ordinate over h/3; null on a run taken along its fitted curve'),
  product: z.number().nullable().describe('halfBreadth x multiplier, m; null on a run taken along its fitted curve'),
  aboveDraft: z.boolean().describe('an ordinate above the draft that enters through the panel the waterline cuts'),
  multiplierText: z.string().nullable().describe('the multiplier as the trade writes it (1, 4, 1 1/2 ...)'),
});

const VerticalSheetSchema = z
  .object({
    draft: z.number().describe('draft, m'),
    keel: z.number().describe('keel height of the station, m'),
    immersed: z.boolean().describe('false when the keel is at or above the draft: no ordinate, no area'),
    spacing: z.number().describe('h, the most common interval of the ordinates\' heights, m'),
    commonFactor: z.number().describe('h/3, m'),
    ordinates: z.array(OrdinateSchema),
    sum: z.number().describe('sum of the products, m'),
    curveParts: z
      .array(
        z.object({
          zFrom: z.number().describe('foot of the run, m'),
          zTo: z.number().describe('top of the run or the draft, m'),
          area: z.number().describe('area of one side over the run, m2'),
        }),
      )
      .describe('runs given at one height, whose area is read along the fitted curve'),
    cutPanel: z
      .object({
        rule: z.enum(['straight line', 'parabola', 'cubic']),
        heights: z.array(z.number()).describe('heights of the panel\'s ordinates, m'),
        from: z.number().describe('foot of the panel: the curve is integrated from here to the draft, m'),
      })
      .nullable()
      .describe('the panel the waterline cuts; null when the draft is a tabulated height or above the deck edge'),
    waterlineHalfBreadth: z.number().describe('half-breadth at the draft from the fitted section, m'),
    area: z.number().describe('2 x (h/3 x sum + curve parts): the immersed area, both sides, m2'),
    sectionArea: z.number().describe('the fitted section\'s own immersed area, m2, to check the sheet by'),
    lastPart: z.string().describe('how the last part below the waterline is taken, in words'),
  })
  .describe('the vertical sheet of a station: its immersed area set out as ordinates, multipliers and products');

const SheetStationSchema = z.object({
  kind: z
    .enum(['station', 'end', 'between'])
    .describe('a station; the end of the waterline between two stations; or the middle ordinate of a piece, read between two stations'),
  note: z.string().nullable().describe('for an end or middle line, where its values are read from; null for a station'),
  station: z.number().describe('position in station spaces from the AP, (x - ap) / h: 0, 0.5, 1, ... as the trade numbers stations'),
  stationText: z.string().describe('the station number as the trade writes it (0, 1/2, 9 1/2, or a decimal)'),
  x: z.number().describe('position of the ordinate, m, from the offsets\' origin'),
  lever: z.number().describe('x - amidships, m; with levers=stations, (x - amidships) / h in station spaces'),
  halfBreadth: z.number().describe('half-breadth at the waterline, m'),
  area: z.number().describe('immersed sectional area, both sides, m2'),
  momentZ: z.number().describe('moment of the immersed area about the baseline, m3'),
  multiplier: z.number().describe('Simpson\'s multiplier: the station\'s weight along the length over h/3'),
  areaSM: z.number().describe('area x SM, m2 (volume product)'),
  areaSMLever: z.number().describe('area x SM x lever, m3 (longitudinal moment product)'),
  momentZSM: z.number().describe('momentZ x SM, m3 (vertical moment product)'),
  ySM: z.number().describe('y x SM, m (waterplane area product)'),
  ySMLever: z.number().describe('y x SM x lever, m2 (waterplane moment product)'),
  ySMLever2: z.number().describe('y x SM x lever^2, m3 (longitudinal second moment product)'),
  y3SM: z.number().describe('y^3 x SM, m3 (transverse second moment product)'),
  multiplierText: z.string().describe('the multiplier as the trade writes it (1, 4, 1 1/2 ...)'),
  vertical: VerticalSheetSchema.nullable(),
});

const SheetPieceSchema = z
  .object({
    from: z.number().describe('x where the piece starts, m'),
    to: z.number().describe('x where the piece ends, m'),
    rule: z.string().describe('the rule the piece is integrated by, in words'),
    lines: z.array(z.number().int()).describe('indices into stations of the ordinates the piece uses'),
  })
  .describe('a piece of the integration along the length');

const SheetTotalsSchema = z
  .object({
    areaSM: z.number().describe('sum of area x SM, m2'),
    areaSMLever: z.number().describe('sum of area x SM x lever, m3'),
    momentZSM: z.number().describe('sum of momentZ x SM, m3'),
    ySM: z.number().describe('sum of y x SM, m'),
    ySMLever: z.number().describe('sum of y x SM x lever, m2'),
    ySMLever2: z.number().describe('sum of y x SM x lever^2, m3'),
    y3SM: z.number().describe('sum of y^3 x SM, m3'),
  })
  .describe('the sums of the product columns');

/** The results with the formula and unit of core's SHEET_RESULTS; a draft where one cannot be formed is an error (core/upright/formedRows.ts). */
const SheetResultsSchema = z
  .object(
    Object.fromEntries(SHEET_RESULTS.map((f) => [f.key, z.number().describe(`${f.formula} (${f.unit})`)])) as Record<
      (typeof SHEET_RESULTS)[number]['key'],
      z.ZodNumber
    >,
  )
  .describe('what the sums give: the particulars of the hydrostatic table at this draft');

export const SheetResultSchema = z
  .object({
    hull: HullSummarySchema,
    draft: z.number().describe('draft, m'),
    density: z.number().describe('water density, t/m3'),
    spacing: z.number().describe('h, the most common station interval, m'),
    commonFactor: z.number().describe('h/3, m'),
    amidships: z.number().describe('x of amidships, (ap + fp) / 2, the origin of the levers, m'),
    levers: z.enum(LEVER_UNITS).describe('metres: levers x - amidships; stations: levers (x - amidships) / h, the moment sums then multiplied by h (LCB, LCF) and h^2 (IL)'),
    caution: CautionField,
    stations: z.array(SheetStationSchema).describe('the lines of the sheet in x order: immersed stations, waterline ends and middle ordinates'),
    pieces: z.array(SheetPieceSchema).describe('the pieces of the integration along the length, with their rules'),
    ends: z.array(z.string()).describe('where the waterline ends, aft and forward, in words'),
    totals: SheetTotalsSchema,
    results: SheetResultsSchema,
  })
  .describe('the calculation sheet of the upright hydrostatics at one draft');

interface Params {
  draft: number;
  density: number;
  levers?: LeverUnit | undefined;
}

const LeversQuery = z
  .enum(LEVER_UNITS, { error: `levers must be one of ${LEVER_UNITS.join(', ')}` })
  .optional()
  .describe('metres (default): levers x - amidships in m; stations: levers (x - amidships) / h in station spaces, as a hand sheet takes them');

export const sheet: Computation<Params, SheetResult> = {
  name: 'sheet',
  summary: 'Calculation sheet at a draft',
  description:
    'The hydrostatics at one draft set out as a calculation sheet: for each immersed station (and where the waterline ends between ' +
    'stations, the end and the middle of the end piece) its lever from amidships, half-breadth at the waterline, immersed area and ' +
    'its moment, Simpson\'s multiplier and the products; the pieces of the integration and their rules; the sums, the common factor ' +
    'h/3 and the particulars they give; and each station\'s vertical sheet. The CSV holds the longitudinal sheet.',
  query: z.object({ draft: DraftQuery, density: DensityQuery, levers: LeversQuery }),
  body: z.object({ draft: DraftBody, density: DensityBody, levers: LeversQuery }),
  result: SheetResultSchema,
  key: (p) => `draft=${p.draft}&density=${p.density}&levers=${p.levers ?? 'metres'}`,
  // Per station about fifteen numbers, and seven per ordinate of its vertical sheet (its points below the draft, and one more).
  cost: (hull, p) => {
    let ordinates = 0;
    for (const st of hull.stations) {
      ordinates += 1;
      for (const q of st.points) if (q.z < p.draft) ordinates++;
    }
    const cells = 15 * hull.stations.length + 7 * ordinates;
    return { cells, work: prepareWork(hull) + cells };
  },
  run: (h, p, conv) => {
    const s = calculationSheet(h.prepared, p.draft, p.density, { levers: p.levers ?? 'metres', length: conv.length });
    requireFormed(p.draft, s.results);
    return sheetResult(h.hull, s);
  },
  form: (p) => sheetForm(p.levers ?? 'metres'),
};
