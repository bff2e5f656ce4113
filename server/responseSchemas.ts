/**
 * Schemas of the answers that the service builds itself (hull records, lists, health),
 * and of core's results, for the OpenAPI document. Types of core's results come from
 * core; a test pins that these schemas infer the same types.
 */
import { z } from 'zod';
import { HullModelSchema } from '../core/hull/hullModel.js';
import { HydrostaticRowSchema } from '../core/upright/hydrostaticFields.js';
import { LengthUnitSchema } from '../core/common/units.js';

export const CautionField = z.string().describe('the caution that goes with every result (core/common/caution.ts)');

/** core's HullSummary (core/report/formatHydrostatics.ts). */
export const HullSummarySchema = z
  .object({
    name: z.string(),
    stations: z.number().int().describe('number of stations'),
    waterlines: z.number().int().nullable().describe('number of tabulated waterlines of a grid table; null for a points table or model'),
    ap: z.number().describe('x of the aft perpendicular, m'),
    fp: z.number().describe('x of the forward perpendicular, m'),
    lbp: z.number().describe('length between perpendiculars, m'),
  })
  .describe('what a result says of the hull it came from');

/** core's HydrostaticResult (core/report/formatHydrostatics.ts). */
export const HydrostaticResultSchema = z
  .object({
    hull: HullSummarySchema,
    density: z.number().describe('water density, t/m3'),
    caution: CautionField,
    rows: z.array(HydrostaticRowSchema),
    notes: z.array(z.string()).describe('why a coefficient is null at a draft: a ratio that would exceed 1, or nothing immersed at amidships'),
  })
  .describe('the upright hydrostatic table, one row per draft');

export const HullFormSchema = z.enum(['grid', 'points', 'model']).describe('how the offsets arrived: a grid table, a points table, or a JSON model');

export const HullListItemSchema = z.object({
  id: z.string(),
  name: z.string(),
  created: z.string().describe('ISO 8601 time the hull was stored'),
  updated: z.string().describe('ISO 8601 time the hull was last replaced'),
  hash: z.string().describe('sha256 of the stored upload, hex'),
  stations: z.number().int(),
});

export const HullListSchema = z.object({ hulls: z.array(HullListItemSchema), caution: CautionField }).describe('the stored hulls, oldest first');

export const HullRecordSchema = HullListItemSchema.extend({
  waterlines: HullSummarySchema.shape.waterlines,
  ap: HullSummarySchema.shape.ap,
  fp: HullSummarySchema.shape.fp,
  lbp: HullSummarySchema.shape.lbp,
  form: HullFormSchema,
  units: z.union([LengthUnitSchema, z.literal('m')]).describe('length unit of the upload (a JSON model is in m)'),
  mediaType: z.string().describe('media type of the upload'),
  bytes: z.number().int().describe('size of the upload, bytes'),
  links: z.object({
    self: z.string(),
    source: z.string().describe('the upload, byte for byte'),
    hydrostatics: z.string().describe('template: add drafts=...'),
    value: z.string().describe('template of one figure as text/plain: put a field of the table for {field}, and add a draft'),
    sheet: z.string().describe('template: add draft=...'),
    bonjean: z.string().describe('add drafts=... for extra heights'),
    areas: z.string().describe('template: add draft=...'),
    check: z.string(),
  }),
  caution: CautionField,
}).describe('a stored hull');

export const HullWithOffsetsSchema = HullRecordSchema.extend({ offsets: HullModelSchema }).describe('a stored hull with its model, lengths in m');

export const HealthSchema = z.object({ status: z.literal('ok'), caution: CautionField });
