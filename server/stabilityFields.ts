/**
 * The fields of the stability requests (float, cross-curves, gz, and the hydrostatic
 * table by displacement or at a trim), each declared once as a zod schema for the query
 * (text as it arrives) and the JSON body (typed), in SI; STABILITY_IMPERIAL_FORMS gives
 * each one's form for units=imperial (long tons, feet, long ton-feet), which
 * requestFields.ts's inUnitSystem swaps in. The rules are core's
 * (core/stability/stabilityInput.ts, core/stability/criteria.ts, core/common/typedLength.ts).
 */
import { z } from 'zod';
import { readDecimal } from '../core/common/decimal.js';
import { LIMITS } from '../core/common/limits.js';
import { readTypedLength, TYPED_LENGTH_HINT, typedLengthFactor, typedMassFactor, typedMomentFactor } from '../core/common/typedLength.js';
import type { UnitSystem } from '../core/common/units.js';
import { CriteriaSetSchema, readCriteriaSet, type CriteriaSet } from '../core/stability/criteria.js';
import { checkHeels, HEEL_RANGE, parseDisplacements, parseHeels, parseOpenings } from '../core/stability/stabilityInput.js';
import type { Opening } from '../core/stability/rightingLevers.js';
import { coreRule } from './validate.js';

/** Longest text of a typed list or criteria set in a query, characters. */
const MAX_LIST_TEXT = 4_000;

const MASS: Readonly<Record<UnitSystem, string>> = { si: 't', imperial: 'long tons (units=imperial)' };
const LENGTH: Readonly<Record<UnitSystem, string>> = { si: 'm', imperial: 'ft (units=imperial)' };
const MOMENT: Readonly<Record<UnitSystem, string>> = { si: 't.m', imperial: 'long ton-feet (units=imperial)' };

const once = (name: string, hint: string) => (iss: { input?: unknown }) => (iss.input === undefined ? `${name} is required; ${hint}` : `${name} must be given once; ${hint}`);

/** `displacement=4.5`: one number of tonnes (long tons); given in tonnes. Whether the hull floats it is core's check. */
export function displacementQuery(system: UnitSystem) {
  const hint = `give the displacement in ${MASS[system]}, e.g. 4.5`;
  return z
    .string({ error: once('displacement', hint) })
    .transform((text, ctx) => {
      const v = readDecimal(text.trim());
      if (!Number.isFinite(v)) {
        ctx.addIssue({ code: 'custom', message: `displacement '${text.slice(0, 40)}' is not one number; ${hint}`, input: text, params: { code: 'HYD_BAD_ARGUMENT' } });
        return z.NEVER;
      }
      return v * typedMassFactor(system);
    })
    .describe(`displacement, ${MASS[system]}`)
    .meta({ examples: ['4.5'] });
}

export function displacementBody(system: UnitSystem) {
  return z
    .number({ error: (iss) => (iss.input === undefined ? `displacement is required, ${MASS[system]}` : `displacement must be a number of ${MASS[system]}`) })
    .transform((v) => v * typedMassFactor(system))
    .describe(`displacement, ${MASS[system]}`);
}

/** `displacements=2:0.5:6`: values and ranges, tonnes (long tons); given in tonnes. */
export function displacementsQuery(system: UnitSystem) {
  const hint = `give displacements in ${MASS[system]} as values and ranges from:step:to, e.g. 2:0.5:6`;
  return z
    .string({ error: once('displacements', hint) })
    .max(MAX_LIST_TEXT, { error: `the displacements text is longer than ${MAX_LIST_TEXT} characters; use ranges from:step:to` })
    .transform((text, ctx) => coreRule(ctx, text, () => parseDisplacements(text, ['displacements'], system)))
    .describe(`displacements, ${MASS[system]}: values and inclusive ranges from:step:to, at most ${LIMITS.maxDisplacements}`)
    .meta({ examples: ['2:0.5:6'] });
}

export function displacementsBody(system: UnitSystem) {
  return z
    .array(z.number({ error: `a displacement must be a number of ${MASS[system]}` }), { error: `displacements must be an array of numbers, ${MASS[system]}` })
    .min(1, { error: 'displacements is empty' })
    .max(LIMITS.maxDisplacements, { error: `more than ${LIMITS.maxDisplacements} displacements` })
    .transform((v) => v.map((d) => d * typedMassFactor(system)))
    .describe(`displacements, ${MASS[system]}, at most ${LIMITS.maxDisplacements}`);
}

/** A length of the loading or the waterline (`kg=1.1`, `lcg=4.3`, `trim=0.2`): metres, or feet (decimal or feet-inches-eighths); given in metres. */
export function lengthQuery(system: UnitSystem, name: string, what: string) {
  const hint = `give ${TYPED_LENGTH_HINT[system]}`;
  return z
    .string({ error: once(name, hint) })
    .transform((text, ctx) => {
      const v = readTypedLength(text.trim(), system);
      if (!Number.isFinite(v)) {
        ctx.addIssue({ code: 'custom', message: `${name} '${text.slice(0, 40)}' is not ${TYPED_LENGTH_HINT[system]}`, input: text, params: { code: 'HYD_BAD_ARGUMENT' } });
        return z.NEVER;
      }
      return v;
    })
    .describe(`${what}, ${LENGTH[system]}`);
}

export function lengthBody(system: UnitSystem, name: string, what: string) {
  return z
    .number({ error: (iss) => (iss.input === undefined ? `${name} is required, ${LENGTH[system]}` : `${name} must be a number of ${LENGTH[system]}`) })
    .transform((v) => v * typedLengthFactor(system))
    .describe(`${what}, ${LENGTH[system]}`);
}

const FSM_RULE = (system: UnitSystem) => `free-surface moment, ${MOMENT[system]}, 0 or more (default 0)`;

/** `fsm=0.4`: the free-surface moment, t·m (long ton-feet), at least 0; given in t·m. */
export function fsmQuery(system: UnitSystem) {
  return z
    .string({ error: `fsm must be given once; ${FSM_RULE(system)}` })
    .default('0')
    .transform((text, ctx) => {
      const v = readDecimal(text.trim());
      if (!Number.isFinite(v) || v < 0) {
        ctx.addIssue({ code: 'custom', message: `fsm '${text.slice(0, 40)}' is not a ${FSM_RULE(system)}`, input: text, params: { code: 'HYD_BAD_ARGUMENT' } });
        return z.NEVER;
      }
      return v * typedMomentFactor(system);
    })
    .describe(FSM_RULE(system));
}

export function fsmBody(system: UnitSystem) {
  return z
    .number({ error: `fsm must be a number; ${FSM_RULE(system)}` })
    .min(0, { error: `fsm is below 0; ${FSM_RULE(system)}` })
    .default(0)
    .transform((v) => v * typedMomentFactor(system))
    .describe(FSM_RULE(system));
}

/** `openings=5.2,0.8,1.4;6,-0.8,1.5`: downflooding points, m (ft); given in metres. */
export function openingsQuery(system: UnitSystem) {
  return z
    .string({ error: 'openings must be given once: x,y,z points separated by ;' })
    .max(MAX_LIST_TEXT, { error: `the openings text is longer than ${MAX_LIST_TEXT} characters` })
    .default('')
    .transform((text, ctx): Opening[] => coreRule(ctx, text, () => parseOpenings(text, ['openings'], system)))
    .describe(`downflooding points x,y,z in the offsets' frame, ${LENGTH[system]}, separated by ; (at most ${LIMITS.maxOpenings})`)
    .meta({ examples: ['5.2,0.8,1.4;5.2,-0.8,1.4'] });
}

export function openingsBody(system: UnitSystem) {
  const f = typedLengthFactor(system);
  return z
    .array(z.object({ x: z.number(), y: z.number(), z: z.number() }).strict(), { error: `openings must be an array of { x, y, z } points, ${LENGTH[system]}` })
    .max(LIMITS.maxOpenings, { error: `more than ${LIMITS.maxOpenings} openings` })
    .default([])
    .transform((v): Opening[] => v.map((o) => ({ x: o.x * f, y: o.y * f, z: o.z * f })))
    .describe(`downflooding points in the offsets' frame, ${LENGTH[system]}`);
}

const HEELS_TEXT = `heels, degrees, ${HEEL_RANGE.min} to ${HEEL_RANGE.max}: values and inclusive ranges from:step:to, at most ${LIMITS.maxHeels}`;

/**
 * `heels=0:10:90` in a query; `fallback` when left out (undefined: the computation's own).
 * Each heel is held to its range here, as the query is read: a route may leave its heels
 * unused (the report's, without displacements), and a heel of 400 degrees must not pass unnoticed.
 */
export function heelsQuery(fallback: string | undefined) {
  const text = z.string({ error: `heels must be given once; ${HEELS_TEXT}` }).max(MAX_LIST_TEXT, { error: `the heels text is longer than ${MAX_LIST_TEXT} characters` });
  const read = (t: string, ctx: z.RefinementCtx): number[] =>
    coreRule(ctx, t, () => {
      const heels = parseHeels(t, ['heels']);
      checkHeels(heels, ['heels']);
      return heels;
    });
  return (fallback === undefined ? text.optional().transform((t, ctx) => (t === undefined ? undefined : read(t, ctx))) : text.default(fallback).transform(read))
    .describe(`${HEELS_TEXT}${fallback === undefined ? '' : ` (default ${fallback})`}`)
    .meta({ examples: ['0:10:90'] });
}

export function heelsBody(fallback: readonly number[] | undefined) {
  const list = z
    .array(z.number({ error: 'a heel must be a number of degrees' }), { error: 'heels must be an array of degrees' })
    .min(1, { error: 'heels is empty' })
    .max(LIMITS.maxHeels, { error: `more than ${LIMITS.maxHeels} heels` });
  return (fallback === undefined ? list.optional() : list.default([...fallback])).describe(HEELS_TEXT);
}

/** `trim=level|free`: how the hull trims as it heels. */
export function trimModeField(fallback: 'level' | 'free') {
  return z
    .enum(['level', 'free'], { error: 'trim must be level or free' })
    .default(fallback)
    .describe(`level: the hull keeps level trim as it heels; free: it trims until its centre of buoyancy lies at the upright LCB (default ${fallback})`);
}

/** `criteria={...}` in a query: a criteria set as JSON text (URL-encoded); the IMO 2008 general criteria when left out. */
export const CriteriaQuery = z
  .string({ error: 'criteria must be given once, as the JSON text of a criteria set' })
  .max(MAX_LIST_TEXT, { error: `the criteria text is longer than ${MAX_LIST_TEXT} characters` })
  .optional()
  .transform((text, ctx): CriteriaSet | undefined => {
    if (text === undefined) return undefined;
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: `criteria is not JSON: ${(e as Error).message}`, input: text, params: { code: 'HYD_CRITERIA' } });
      return z.NEVER;
    }
    return coreRule(ctx, text, () => readCriteriaSet(json, ['criteria']));
  })
  .describe('a criteria set as JSON text, { "name", "source", "criteria": [ { "id", "required" } ] } (default: the IMO 2008 IS Code general criteria)');

export const CriteriaBody = z
  .unknown()
  .optional()
  .transform((json, ctx): CriteriaSet | undefined => (json === undefined ? undefined : coreRule(ctx, json, () => readCriteriaSet(json, ['criteria']))))
  .describe('a criteria set (default: the IMO 2008 IS Code general criteria)');

/** The body's criteria set as the OpenAPI document shows it. */
export const CriteriaBodyDocument = CriteriaSetSchema.optional();

/** The SI forms, which the computations declare. */
export const DisplacementQuery = displacementQuery('si');
export const DisplacementBody = displacementBody('si');
export const DisplacementsQuery = displacementsQuery('si');
export const DisplacementsBody = displacementsBody('si');
export const OptionalDisplacementsQuery = displacementsQuery('si').optional();
export const OptionalDisplacementsBody = displacementsBody('si').optional();
export const FsmQuery = fsmQuery('si');
export const FsmBody = fsmBody('si');
export const OpeningsQuery = openingsQuery('si');
export const OpeningsBody = openingsBody('si');

/** Each length field of the loading, SI form and imperial form, by name. */
const LENGTHS = {
  kg: 'KG, height of the centre of gravity above the baseline',
  lcg: "LCG, x of the centre of gravity in the offsets' frame",
  tcg: 'TCG, y of the centre of gravity, positive to starboard',
  trim: 'trim held, draft aft - draft forward (positive by the stern)',
} as const;
type LengthName = keyof typeof LENGTHS;

const lengthFields = (system: UnitSystem) => {
  const out = {} as Record<LengthName, { query: z.ZodType; body: z.ZodType; optionalQuery: z.ZodType; optionalBody: z.ZodType }>;
  for (const k of Object.keys(LENGTHS) as LengthName[]) {
    out[k] = {
      query: lengthQuery(system, k, LENGTHS[k]),
      body: lengthBody(system, k, LENGTHS[k]),
      optionalQuery: lengthQuery(system, k, LENGTHS[k]).optional(),
      optionalBody: lengthBody(system, k, LENGTHS[k]).optional(),
    };
  }
  return out;
};

/** The lengths of the loading and the waterline, each as a required and an optional field of a query and a body (SI). */
export const LENGTH_FIELDS = lengthFields('si');
const IMPERIAL_LENGTH_FIELDS = lengthFields('imperial');

/** Each SI field above and its form for units=imperial. */
export const STABILITY_IMPERIAL_FORMS: readonly (readonly [z.ZodType, z.ZodType])[] = [
  [DisplacementQuery, displacementQuery('imperial')],
  [DisplacementBody, displacementBody('imperial')],
  [DisplacementsQuery, displacementsQuery('imperial')],
  [DisplacementsBody, displacementsBody('imperial')],
  [OptionalDisplacementsQuery, displacementsQuery('imperial').optional()],
  [OptionalDisplacementsBody, displacementsBody('imperial').optional()],
  [FsmQuery, fsmQuery('imperial')],
  [FsmBody, fsmBody('imperial')],
  [OpeningsQuery, openingsQuery('imperial')],
  [OpeningsBody, openingsBody('imperial')],
  ...(Object.keys(LENGTHS) as LengthName[]).flatMap((k) =>
    (['query', 'body', 'optionalQuery', 'optionalBody'] as const).map((form) => [LENGTH_FIELDS[k][form], IMPERIAL_LENGTH_FIELDS[k][form]] as const),
  ),
];
