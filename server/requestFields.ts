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
import { LIMITS } from '../core/common/limits.js';
import { SERVICE_LIMITS } from './serviceLimits.js';
import { addCoreIssues, type FieldCodes } from './validate.js';

/** Codes of issues on each field, for issues zod raises itself (a wrong type, a missing field). */
export const FIELD_CODES: FieldCodes = {
  drafts: 'HYD_DRAFT_LIST',
  draft: 'HYD_DRAFT_LIST',
  density: 'HYD_DENSITY',
  offsets: 'HYD_MODEL_INVALID',
};

const DRAFTS_HINT = 'give drafts in m as values and ranges from:step:to, e.g. 0.2:0.1:1.2,1.25';

/** `drafts=0.2:0.1:1.2,1.25` in a query. */
export const DraftsQuery = z
  .string({ error: (iss) => (iss.input === undefined ? `drafts is required; ${DRAFTS_HINT}` : `drafts must be given once; ${DRAFTS_HINT}`) })
  .max(SERVICE_LIMITS.maxDraftsText, { error: `the drafts text is longer than ${SERVICE_LIMITS.maxDraftsText} characters; use ranges from:step:to` })
  .transform((text, ctx) => {
    try {
      return parseDraftList(text, ['drafts']);
    } catch (e) {
      addCoreIssues(e, ctx, text);
      return z.NEVER;
    }
  })
  .describe(`drafts, m: comma-separated values and inclusive ranges from:step:to, at most ${LIMITS.maxDrafts} in all`)
  .meta({ examples: ['0.2:0.1:1.2,1.25'] });

/** `drafts: [0.5, 0.6]` in a JSON body. */
export const DraftsBody = z
  .array(z.number({ error: (iss) => `a draft must be a number of metres, not ${JSON.stringify(iss.input) ?? 'nothing'}` }), {
    error: (iss) => (iss.input === undefined ? `drafts is required; give an array of drafts in m` : 'drafts must be an array of numbers, m'),
  })
  .min(1, { error: 'drafts is empty; give at least one draft, m' })
  .max(LIMITS.maxDrafts, { error: `more than ${LIMITS.maxDrafts} drafts` })
  .describe(`drafts, m, at most ${LIMITS.maxDrafts}`);

/** Extra Bonjean heights: the drafts list of a query, optional (none asked for: the tabulated heights only). */
export const HeightsQuery = DraftsQuery.optional().describe(
  `extra heights, m, at which every station's area is also given: values and ranges from:step:to, at most ${LIMITS.maxDrafts} in all; each must meet some station`,
);

/** Extra Bonjean heights in a JSON body; may be left out or empty. */
export const HeightsBody = z
  .array(z.number({ error: (iss) => `a height must be a number of metres, not ${JSON.stringify(iss.input) ?? 'nothing'}` }), {
    error: 'drafts must be an array of heights, m',
  })
  .max(LIMITS.maxDrafts, { error: `more than ${LIMITS.maxDrafts} heights` })
  .optional()
  .describe(`extra heights, m, at most ${LIMITS.maxDrafts}; each must meet some station`);

/** A plain decimal number as typed (`1.3`, `.5`, `2e-1`), else NaN: the one number syntax of core/common/decimal.ts. */
export const decimalNumber = readDecimal;

const DRAFT_HINT = 'give one draft in m above the baseline, e.g. 1.3';

/** `draft=1.3` in a query: one plain number of metres; whether it lies within the hull is core's check (checkDraft). */
export const DraftQuery = z
  .string({ error: (iss) => (iss.input === undefined ? `draft is required; ${DRAFT_HINT}` : `draft must be given once; ${DRAFT_HINT}`) })
  .transform((text, ctx) => {
    const value = decimalNumber(text);
    if (!Number.isFinite(value)) {
      ctx.addIssue({ code: 'custom', message: `draft '${text.slice(0, 40)}' is not one number of metres; ${DRAFT_HINT}`, input: text, params: { code: 'HYD_DRAFT_LIST' } });
      return z.NEVER;
    }
    return value;
  })
  .describe('draft, m: the height of the waterline above the baseline, above the lowest keel and at or below the lowest deck edge')
  .meta({ examples: ['1.3'] });

/** `draft: 1.3` in a JSON body. */
export const DraftBody = z
  .number({
    error: (iss) =>
      iss.input === undefined
        ? `draft is required; ${DRAFT_HINT}`
        : typeof iss.input === 'number'
          ? `draft ${iss.input} is not a finite number of metres; ${DRAFT_HINT}`
          : `draft must be a number of metres, not ${JSON.stringify(iss.input)?.slice(0, 40) ?? 'nothing'}`,
  })
  .describe('draft, m: the height of the waterline above the baseline');

const DENSITY_TEXT = `water density, t/m3, ${DENSITY_RANGE.min} to ${DENSITY_RANGE.max} (default ${SEA_WATER_DENSITY}, sea water)`;

/** The density rule of core (core/common/density.ts) as a zod refinement. */
const densityRule = (value: number, ctx: z.RefinementCtx, written?: string): number => {
  try {
    return checkDensity(value, ['density'], written);
  } catch (e) {
    addCoreIssues(e, ctx, value);
    return z.NEVER;
  }
};

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
