/**
 * The hydrostatic table (core/upright/hydrostatics.ts) at a list of drafts, or at the drafts
 * that float a list of displacements, level or at a held trim (core/stability/), in a water
 * density.
 */
import { z } from 'zod';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { HYDROSTATICS_FORM, hydrostaticResult, type HydrostaticResult } from '../../core/report/formatHydrostatics.js';
import { fail } from '../../core/common/errors.js';
import { TRIMMED_FORM, trimmedTableResult, type TrimmedTableResult } from '../../core/report/formatTrimmed.js';
import { draftsForDisplacements } from '../../core/stability/levelDrafts.js';
import { trimmedHydrostaticTable } from '../../core/stability/trimmedHydrostatics.js';
import { DensityBody, DensityQuery, OptionalDraftsBody, OptionalDraftsQuery } from '../requestFields.js';
import { LENGTH_FIELDS, OptionalDisplacementsBody, OptionalDisplacementsQuery } from '../stabilityFields.js';
import { TrimmedTableSchema } from '../stabilitySchemas.js';
import { HydrostaticResultSchema } from '../responseSchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';
import { HYDROSTATIC_FIELDS } from '../../core/upright/hydrostaticFields.js';
import { requireFormedRows } from '../../core/upright/formedRows.js';

interface Params {
  drafts?: number[];
  displacements?: number[];
  trim?: number;
  density: number;
}

/** The drafts asked for, or as many as the displacements. */
const rowCount = (p: Params): number => p.drafts?.length ?? p.displacements?.length ?? 0;

/** Exactly one of drafts and displacements. */
function requireOneList(p: Params): void {
  if ((p.drafts === undefined) === (p.displacements === undefined)) {
    fail('HYD_DRAFT_LIST', ['drafts'], p.drafts === undefined ? 'drafts or displacements is required: give drafts in m, e.g. 0.2:0.1:1.2, or displacements in t' : 'give drafts or displacements, not both');
  }
}

export const hydrostatics: Computation<Params, HydrostaticResult | TrimmedTableResult> = {
  name: 'hydrostatics',
  summary: 'Upright hydrostatic table',
  description:
    'Hydrostatic particulars, upright and level, at each draft: volume, displacement, LCB, VCB, waterplane area, LCF, ' +
    'IT, IL, BMt, BMl, KMt, KMl, TPC, MCT1cm, LWL, BWL, Am, the form coefficients and the wetted surface. Give drafts, or displacements to have ' +
    'each row at the draft that floats one of them. With trim (m, draft aft - draft forward, positive by the stern) the table is at that trim: ' +
    'draft is then the draft amidships and each row adds draftAft, draftFwd and trim (as do rows found for displacements).',
  query: z.object({ drafts: OptionalDraftsQuery, displacements: OptionalDisplacementsQuery, trim: LENGTH_FIELDS.trim.optionalQuery, density: DensityQuery }),
  body: z.object({ drafts: OptionalDraftsBody, displacements: OptionalDisplacementsBody, trim: LENGTH_FIELDS.trim.optionalBody, density: DensityBody }),
  result: z.union([HydrostaticResultSchema, TrimmedTableSchema]),
  // The lists' exact doubles as base64: canonical (0.5 and 0.50 give one key) and far cheaper than writing them as text.
  key: (p) =>
    `drafts=${p.drafts === undefined ? '' : Buffer.from(Float64Array.from(p.drafts).buffer).toString('base64')}` +
    `&displacements=${p.displacements?.join(',') ?? ''}&trim=${p.trim ?? ''}&density=${p.density}`,
  cost: (hull, p) => {
    requireOneList(p);
    // A draft found for a displacement takes a few rows' work by Newton's rule.
    const each = p.displacements === undefined ? 1 : 8;
    return { cells: rowCount(p) * (HYDROSTATIC_FIELDS.length + 3), work: prepareWork(hull) + each * rowCount(p) * hull.stations.length };
  },
  run: (h, p, conv) => {
    requireOneList(p);
    if (p.displacements !== undefined || p.trim !== undefined) {
      const trim = p.trim ?? 0;
      const drafts = p.displacements === undefined ? p.drafts! : draftsForDisplacements(h.prepared, p.displacements, p.density, trim);
      const rows = trimmedHydrostaticTable(h.prepared, drafts, trim, p.density);
      requireFormedRows(rows);
      return trimmedTableResult(h.hull, p.density, rows, trim, p.displacements ?? null, conv);
    }
    const rows = hydrostaticTable(h.prepared, p.drafts!, p.density);
    requireFormedRows(rows);
    return hydrostaticResult(h.hull, p.density, rows, conv);
  },
  form: (p) => (p.displacements !== undefined || p.trim !== undefined ? TRIMMED_FORM : HYDROSTATICS_FORM),
};
