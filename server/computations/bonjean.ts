/**
 * Bonjean data (core/upright/bonjean.ts): the immersed area of every station and its moment
 * about the baseline against height, at the tabulated heights and at any extra heights
 * asked for. The CSV (core/report/formatBonjean.ts bonjeanCsv) has one row per station and height.
 */
import { z } from 'zod';
import { bonjean as bonjeanData } from '../../core/upright/bonjean.js';
import { BONJEAN_FORM, bonjeanResult, type BonjeanResult } from '../../core/report/formatBonjean.js';
import { HeightsBody, HeightsQuery } from '../requestFields.js';
import { CautionField, HullSummarySchema } from '../responseSchemas.js';
import type { Computation } from './computation.js';
import { pointsOf, prepareWork } from './cost.js';

const BonjeanStationSchema = z.object({
  x: z.number().describe('station position, m'),
  keel: z.number().describe('keel height: the curve starts here at area 0, m'),
  deck: z.number().describe('deck-edge height: the curve ends here, m'),
  points: z.array(
    z.object({
      z: z.number().describe('height of the waterline above the baseline, m'),
      area: z.number().describe('immersed area of the section, both sides, m2'),
      momentZ: z.number().describe('moment of that area about the baseline, m3'),
    }),
  ),
});

export const BonjeanResultSchema = z
  .object({ hull: HullSummarySchema, caution: CautionField, stations: z.array(BonjeanStationSchema) })
  .describe('Bonjean data: each station\'s immersed area and its moment against height, from its keel to its deck edge');

interface Params {
  drafts?: number[] | undefined;
}

export const bonjean: Computation<Params, BonjeanResult> = {
  name: 'bonjean',
  summary: 'Bonjean data',
  description:
    'For every station, the immersed area of its section (both sides) and its moment about the baseline, from the keel (area 0) ' +
    'through every tabulated waterline up to the deck edge (a points table: the station\'s own point heights), and at any extra ' +
    'heights given as drafts.',
  query: z.object({ drafts: HeightsQuery }),
  body: z.object({ drafts: HeightsBody }),
  result: BonjeanResultSchema,
  key: (p) => `drafts=${(p.drafts ?? []).join(',')}`,
  // Per station: its keel, deck edge and every point height, and each extra height: three numbers each.
  cost: (hull, p) => {
    const cells = 3 * (pointsOf(hull) + hull.stations.length * (3 + (p.drafts?.length ?? 0)));
    return { cells, work: prepareWork(hull) + cells };
  },
  run: (h, p) => bonjeanResult(h.hull, bonjeanData(h.prepared, p.drafts ?? [])),
  form: () => BONJEAN_FORM,
};
