/**
 * The fields of requests, each declared once as a zod schema: query parameters (text as
 * it arrives) and JSON body fields (typed). The rules themselves are core's
 * (parseDraftList, checkDensity, LIMITS); the schemas carry them to validation, types
 * and the OpenAPI document.
 */
import { z } from 'zod';
import { DENSITY_RANGE, SEA_WATER_DENSITY } from '../core/common/constants.js';
import { readDecimal } from '../core/common/decimal.js';
import { checkDensity } from '../core/common/density.js';
import { NAME_PATTERN } from '../core/common/hullName.js';
import { parseDraftList } from '../core/common/draftList.js';
import { readTypedLength, TYPED_LENGTH_HINT, typedLengthFactor } from '../core/common/typedLength.js';
import type { UnitSystem } from '../core/common/units.js';
import { LIMITS } from '../core/common/limits.js';
import { SERVICE_LIMITS } from './serviceLimits.js';
import { STABILITY_IMPERIAL_FORMS } from './stabilityFields.js';
import { coreRule, type FieldCodes } from './validate.js';

/** Codes of issues on each field, for issues zod raises itself (a wrong type, a missing field). */
export const FIELD_CODES: FieldCodes = {
  drafts: 'HYD_DRAFT_LIST',
  draft: 'HYD_DRAFT_LIST',
  density: 'HYD_DENSITY',
  offsets: 'HYD_MODEL_INVALID',
};

const DRAFTS_HINT: Readonly<Record<UnitSystem, string>> = {
  si: 'give drafts in m as values and ranges from:step:to, e.g. 0.2:0.1:1.2,1.25',
  imperial: 'give drafts in ft (units=imperial) as values and ranges from:step:to, decimal or feet-inches-eighths, e.g. 2-0-0:0-3-0:4-0-0',
};
const LENGTH_WORD: Readonly<Record<UnitSystem, string>> = { si: 'metres', imperial: 'feet (units=imperial)' };
const UNIT_WORD: Readonly<Record<UnitSystem, string>> = { si: 'm', imperial: 'ft (units=imperial)' };

/** `drafts=0.2:0.1:1.2,1.25` in a query: metres, or feet with units=imperial; given in metres. */
export function draftsQuery(system: UnitSystem) {
  const hint = DRAFTS_HINT[system];
  return z
    .string({ error: (iss) => (iss.input === undefined ? `drafts is required; ${hint}` : `drafts must be given once; ${hint}`) })
    .max(SERVICE_LIMITS.maxDraftsText, { error: `the drafts text is longer than ${SERVICE_LIMITS.maxDraftsText} characters; use ranges from:step:to` })
    .transform((text, ctx) => coreRule(ctx, text, () => parseDraftList(text, ['drafts'], system)))
    .describe(`drafts, ${UNIT_WORD[system]}: comma-separated values and inclusive ranges from:step:to, at most ${LIMITS.maxDrafts} in all${system === 'si' ? '; with units=imperial in feet, decimal or feet-inches-eighths (2-6-0, 3-4-5+, 3-4-5-)' : ''}`)
    .meta({ examples: ['0.2:0.1:1.2,1.25'] });
}

/** `drafts: [0.5, 0.6]` in a JSON body: metres, or feet with units=imperial; given in metres. */
export function draftsBody(system: UnitSystem) {
  const f = typedLengthFactor(system);
  return z
    .array(z.number({ error: (iss) => `a draft must be a number of ${LENGTH_WORD[system]}, not ${JSON.stringify(iss.input) ?? 'nothing'}` }), {
      error: (iss) => (iss.input === undefined ? `drafts is required; give an array of drafts in ${UNIT_WORD[system]}` : `drafts must be an array of numbers, ${UNIT_WORD[system]}`),
    })
    .min(1, { error: `drafts is empty; give at least one draft, ${UNIT_WORD[system]}` })
    .max(LIMITS.maxDrafts, { error: `more than ${LIMITS.maxDrafts} drafts` })
    .transform((v) => (f === 1 ? v : v.map((d) => d * f)))
    .describe(`drafts, m (ft with units=imperial), at most ${LIMITS.maxDrafts}`);
}

/** Extra Bonjean heights: the drafts list of a query, optional (none asked for: the tabulated heights only). */
export function heightsQuery(system: UnitSystem) {
  return draftsQuery(system)
    .optional()
    .describe(`extra heights, ${UNIT_WORD[system]}, at which every station's area is also given: values and ranges from:step:to, at most ${LIMITS.maxDrafts} in all; each must meet some station`);
}

/** Extra Bonjean heights in a JSON body; may be left out or empty. */
export function heightsBody(system: UnitSystem) {
  const f = typedLengthFactor(system);
  return z
    .array(z.number({ error: (iss) => `a height must be a number of ${LENGTH_WORD[system]}, not ${JSON.stringify(iss.input) ?? 'nothing'}` }), {
      error: `drafts must be an array of heights, ${UNIT_WORD[system]}`,
    })
    .max(LIMITS.maxDrafts, { error: `more than ${LIMITS.maxDrafts} heights` })
    .transform((v) => (f === 1 ? v : v.map((d) => d * f)))
    .optional()
    .describe(`extra heights, m (ft with units=imperial), at most ${LIMITS.maxDrafts}; each must meet some station`);
}

/** A plain decimal number as typed (`1.3`, `.5`, `2e-1`), else NaN: the one number syntax of core/common/decimal.ts. */
export const decimalNumber = readDecimal;

const DRAFT_HINT: Readonly<Record<UnitSystem, string>> = {
  si: 'give one draft in m above the baseline, e.g. 1.3',
  imperial: 'give one draft in ft above the baseline, decimal or feet-inches-eighths, e.g. 4.25 or 4-3-0',
};

/** `draft=1.3` in a query: one length, metres or (units=imperial) feet; whether it lies within the hull is core's check (checkDraft). */
export function draftQuery(system: UnitSystem) {
  const hint = DRAFT_HINT[system];
  return z
    .string({ error: (iss) => (iss.input === undefined ? `draft is required; ${hint}` : `draft must be given once; ${hint}`) })
    .transform((text, ctx) => {
      const value = readTypedLength(text, system);
      if (!Number.isFinite(value)) {
        ctx.addIssue({ code: 'custom', message: `draft '${text.slice(0, 40)}' is not ${TYPED_LENGTH_HINT[system]}; ${hint}`, input: text, params: { code: 'HYD_DRAFT_LIST' } });
        return z.NEVER;
      }
      return value;
    })
    .describe(`draft, ${UNIT_WORD[system]}: the height of the waterline above the baseline, above the lowest keel and at or below the lowest deck edge${system === 'si' ? '; with units=imperial in feet, decimal or feet-inches-eighths' : ''}`)
    .meta({ examples: ['1.3'] });
}

/** `draft: 1.3` in a JSON body: metres, or feet with units=imperial; given in metres. */
export function draftBody(system: UnitSystem) {
  const hint = DRAFT_HINT[system];
  const f = typedLengthFactor(system);
  return z
    .number({
      error: (iss) =>
        iss.input === undefined
          ? `draft is required; ${hint}`
          : typeof iss.input === 'number'
            ? `draft ${iss.input} is not a finite number of ${LENGTH_WORD[system]}; ${hint}`
            : `draft must be a number of ${LENGTH_WORD[system]}, not ${JSON.stringify(iss.input)?.slice(0, 40) ?? 'nothing'}`,
    })
    .transform((v) => v * f)
    .describe(`draft, m (ft with units=imperial): the height of the waterline above the baseline`);
}

/** The SI forms, which the computations declare; their imperial forms replace them when a request asks for imperial units. */
export const DraftsQuery = draftsQuery('si');
export const DraftsBody = draftsBody('si');
export const HeightsQuery = heightsQuery('si');
export const HeightsBody = heightsBody('si');
export const DraftQuery = draftQuery('si');
export const DraftBody = draftBody('si');
/** Drafts where a request may give displacements instead (the hydrostatic table). */
export const OptionalDraftsQuery = draftsQuery('si').optional();
export const OptionalDraftsBody = draftsBody('si').optional();

/** Each length field of a request (as a computation declares it) and its form for lengths typed in feet. */
export const IMPERIAL_FORMS: ReadonlyMap<z.ZodType, z.ZodType> = new Map<z.ZodType, z.ZodType>([
  [DraftsQuery, draftsQuery('imperial')],
  [DraftsBody, draftsBody('imperial')],
  [HeightsQuery, heightsQuery('imperial')],
  [HeightsBody, heightsBody('imperial')],
  [DraftQuery, draftQuery('imperial')],
  [DraftBody, draftBody('imperial')],
  [OptionalDraftsQuery, draftsQuery('imperial').optional()],
  [OptionalDraftsBody, draftsBody('imperial').optional()],
  ...STABILITY_IMPERIAL_FORMS,
]);

/** A request schema with its length fields read in the unit system (feet for imperial). */
export function inUnitSystem<S extends z.ZodObject>(schema: S, system: UnitSystem): S {
  if (system === 'si') return schema;
  const kept = inFeet.get(schema);
  if (kept !== undefined) return kept as S;
  const swaps: Record<string, z.ZodType> = {};
  for (const [k, v] of Object.entries(schema.shape)) {
    const imperial = IMPERIAL_FORMS.get(v as z.ZodType);
    if (imperial !== undefined) swaps[k] = imperial;
  }
  const made = Object.keys(swaps).length === 0 ? schema : (schema.extend(swaps) as unknown as S);
  inFeet.set(schema, made);
  return made;
}

/** Each schema's feet form, made once (building a zod object per request would cost more than the request). */
const inFeet = new WeakMap<z.ZodObject, z.ZodObject>();

const DENSITY_TEXT = `water density, t/m3, ${DENSITY_RANGE.min} to ${DENSITY_RANGE.max} (default ${SEA_WATER_DENSITY}, sea water)`;

/** The density rule of core (core/common/density.ts) as a zod refinement. */
const densityRule = (value: number, ctx: z.RefinementCtx, written?: string): number => coreRule(ctx, value, () => checkDensity(value, ['density'], written));

/** `density=1.025` in a query; a plain decimal number. */
export const DensityQuery = z
  .string({ error: `density must be given once; ${DENSITY_TEXT}` })
  .default(String(SEA_WATER_DENSITY))
  .transform((text, ctx) => densityRule(decimalNumber(text), ctx, text.slice(0, 40)))
  .describe(DENSITY_TEXT);

/** `density: 1.025` in a JSON body. */
export const DensityBody = z
  .number({ error: `density must be a number; ${DENSITY_TEXT}` })
  .transform((v, ctx) => densityRule(v, ctx))
  .default(SEA_WATER_DENSITY)
  .describe(DENSITY_TEXT);

/** `format=csv` in a query: overrides the Accept header. */
export const FormatQuery = z
  .enum(['json', 'csv'], { error: 'format must be json or csv' })
  .optional()
  .describe('the form of the answer: json or csv; overrides the Accept header');

export type Format = 'json' | 'csv';

/** A hull name given in a query or body: replaces the name in the offsets. */
export const NameField = z
  .string({ error: 'name must be text, given once' })
  .trim()
  .min(1, { error: 'name is empty' })
  .max(LIMITS.maxNameLength, { error: `name is longer than ${LIMITS.maxNameLength} characters` })
  .regex(NAME_PATTERN, { error: 'name holds a control character or line break (a tab, say); names are one line of printable text' })
  .optional()
  .describe(`a name for the hull (at most ${LIMITS.maxNameLength} characters); replaces the one in the offsets`);
