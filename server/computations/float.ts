/** The floating position of a load (core/stability/floatingPosition.ts): drafts at AP and FP, trim, heel and the residuals of the balance. */
import { z } from 'zod';
import { deckAssumedAt } from '../../core/offsets/readingWarnings.js';
import { FLOAT_FORM, floatResult, type FloatResult } from '../../core/report/formatStability.js';
import { floatingPosition } from '../../core/stability/floatingPosition.js';
import { DensityBody, DensityQuery } from '../requestFields.js';
import { DisplacementBody, DisplacementQuery, LENGTH_FIELDS } from '../stabilityFields.js';
import { FloatResultSchema } from '../stabilitySchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';

interface Params {
  displacement: number;
  lcg: number;
  tcg?: number;
  kg?: number;
  density: number;
}

/** Work units of one floating position, a station: about twenty evaluations of each inclined section (npm run bench). */
const WORK_PER_STATION = 300;

export const float: Computation<Params, FloatResult> = {
  name: 'float',
  summary: 'Floating position for a load',
  description:
    'Where the hull floats with a displacement and its centre of gravity at LCG (and TCG, KG): drafts at the aft and forward perpendiculars, ' +
    'trim (positive by the stern), heel (positive to starboard), the centre of buoyancy and the residuals of the balance. Without KG the balance ' +
    'is LCB = LCG, upright; a TCG needs KG, and every station\'s deck edge in the offsets.',
  query: z.object({
    displacement: DisplacementQuery,
    lcg: LENGTH_FIELDS.lcg.query,
    tcg: LENGTH_FIELDS.tcg.optionalQuery,
    kg: LENGTH_FIELDS.kg.optionalQuery,
    density: DensityQuery,
  }),
  body: z.object({
    displacement: DisplacementBody,
    lcg: LENGTH_FIELDS.lcg.body,
    tcg: LENGTH_FIELDS.tcg.optionalBody,
    kg: LENGTH_FIELDS.kg.optionalBody,
    density: DensityBody,
  }),
  result: FloatResultSchema,
  key: (p) => `displacement=${p.displacement}&lcg=${p.lcg}&tcg=${p.tcg ?? ''}&kg=${p.kg ?? ''}&density=${p.density}`,
  cost: (hull) => ({ cells: 20, work: prepareWork(hull) + WORK_PER_STATION * hull.stations.length }),
  usesNotes: true,
  run: (h, p) => {
    const load = { displacement: p.displacement, lcg: p.lcg, ...(p.tcg === undefined ? {} : { tcg: p.tcg }), ...(p.kg === undefined ? {} : { kg: p.kg }) };
    return floatResult(h.hull, p.density, floatingPosition(h.prepared, load, p.density, { assumedAt: deckAssumedAt(h.notes()) }));
  },
  form: () => FLOAT_FORM,
};
