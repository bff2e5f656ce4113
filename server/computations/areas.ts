/**
 * The curve of sectional areas at one draft (core/upright/sectionalAreaCurve.ts): each station's
 * immersed area, also as a fraction of the midship area, with the volume under the curve,
 * its centroid (the LCB), the midship area, LWL and the prismatic coefficient. The CSV is
 * core/report/formatAreas.ts areasCsv.
 */
import { z } from 'zod';
import { AREAS_FORM, areasResult, type AreasResult } from '../../core/report/formatAreas.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { DraftBody, DraftQuery } from '../requestFields.js';
import { CautionField, HullSummarySchema } from '../responseSchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';
import { requireImmersed } from '../../core/upright/formedRows.js';

export const AreasResultSchema = z
  .object({
    hull: HullSummarySchema,
    caution: CautionField,
    draft: z.number().describe('draft, m'),
    stations: z.array(
      z.object({
        x: z.number().describe('station position, m'),
        area: z.number().describe('immersed sectional area, both sides, m2'),
        fraction: z.number().nullable().describe('area / am; null where the midship area is zero'),
      }),
    ),
    volume: z.number().describe('area under the curve: the displaced volume, m3'),
    lcb: z.number().describe('x of the centroid of the area under the curve: the LCB, m'),
    am: z.number().describe('immersed area at amidships, m2'),
    amidships: z.number().describe('x of amidships, (ap + fp) / 2, m'),
    lwl: z.number().describe('length of the waterplane, m'),
    cp: z.number().nullable().describe('prismatic coefficient volume / (am x lwl); null where am is zero'),
  })
  .describe('the curve of sectional areas at one draft, with its LCB');

interface Params {
  draft: number;
}

export const areas: Computation<Params, AreasResult> = {
  name: 'areas',
  summary: 'Sectional-area curve at a draft',
  description:
    'The immersed area of every station at one draft against its x, each also as a fraction of the midship area, with the volume ' +
    '(the area under the curve), the LCB (its centroid), the midship area, LWL and the prismatic coefficient.',
  query: z.object({ draft: DraftQuery }),
  body: z.object({ draft: DraftBody }),
  result: AreasResultSchema,
  key: (p) => `draft=${p.draft}`,
  cost: (hull) => ({ cells: 3 * hull.stations.length + 10, work: prepareWork(hull) + hull.stations.length }),
  run: (h, p) => {
    const curve = sectionalAreaCurve(h.prepared, p.draft);
    requireImmersed(p.draft, curve.volume);
    return areasResult(h.hull, curve);
  },
  form: () => AREAS_FORM,
};
