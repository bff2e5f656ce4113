/** The upright hydrostatic table (core/upright/hydrostatics.ts) at a list of drafts and a water density. */
import { z } from 'zod';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { HYDROSTATICS_FORM, hydrostaticResult, type HydrostaticResult } from '../../core/report/formatHydrostatics.js';
import { DensityBody, DensityQuery, DraftsBody, DraftsQuery } from '../requestFields.js';
import { HydrostaticResultSchema } from '../responseSchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';
import { HYDROSTATIC_FIELDS } from '../../core/upright/hydrostaticFields.js';
import { requireFormedRows } from '../../core/upright/formedRows.js';

interface Params {
  drafts: number[];
  density: number;
}

export const hydrostatics: Computation<Params, HydrostaticResult> = {
  name: 'hydrostatics',
  summary: 'Upright hydrostatic table',
  description:
    'Hydrostatic particulars, upright and level, at each draft: volume, displacement, LCB, VCB, waterplane area, LCF, ' +
    'IT, IL, BMt, BMl, KMt, KMl, TPC, MCT1cm, LWL, BWL, Am, the form coefficients and the wetted surface.',
  query: z.object({ drafts: DraftsQuery, density: DensityQuery }),
  body: z.object({ drafts: DraftsBody, density: DensityBody }),
  result: HydrostaticResultSchema,
  // The drafts' exact doubles as base64: canonical (0.5 and 0.50 give one key) and far cheaper than writing them as text.
  key: (p) => `drafts=${Buffer.from(Float64Array.from(p.drafts).buffer).toString('base64')}&density=${p.density}`,
  cost: (hull, p) => ({ cells: p.drafts.length * HYDROSTATIC_FIELDS.length, work: prepareWork(hull) + p.drafts.length * hull.stations.length }),
  run: (h, p, conv) => {
    const rows = hydrostaticTable(h.prepared, p.drafts, p.density);
    requireFormedRows(rows);
    return hydrostaticResult(h.hull, p.density, rows, conv);
  },
  form: () => HYDROSTATICS_FORM,
};
