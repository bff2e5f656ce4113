/**
 * The JSON results of the stability computations (float, cross-curves, gz) and of the
 * hydrostatic table at a trim or by displacement, as zod schemas for the OpenAPI
 * document: the conventions' field names, with hull, density and caution. Numbers in SI
 * (t, m, degrees, m·rad); units=imperial converts them as it says in `units` and `fields`.
 */
import { z } from 'zod';
import { CRITERION_KINDS } from '../core/stability/criteria.js';
import { HydrostaticRowSchema } from '../core/upright/hydrostaticFields.js';
import { CautionField, HullSummarySchema, HydrostaticResultSchema } from './responseSchemas.js';

const Answered = { hull: HullSummarySchema, density: z.number().describe('water density, t/m3'), caution: CautionField };

const IDS = CRITERION_KINDS.map((k) => k.id) as [string, ...string[]];

export const TrimmedTableSchema = HydrostaticResultSchema.extend({
  trim: z.number().describe('the trim held, m: draft aft - draft forward, positive by the stern'),
  displacements: z.array(z.number()).nullable().describe('the displacements asked for, t, when the drafts were found from them'),
  rows: z.array(
    HydrostaticRowSchema.extend({
      draftAft: z.number().describe('draft at the aft perpendicular, m'),
      draftFwd: z.number().describe('draft at the forward perpendicular, m'),
      trim: z.number().describe('draft aft - draft forward, m'),
    }).describe('a row of the table; draft is the draft amidships'),
  ),
}).describe('the hydrostatic table at a held trim, or at the drafts that float displacements');

export const FloatResultSchema = z
  .object({
    ...Answered,
    displacement: z.number().describe('the load, t'),
    lcg: z.number().describe("x of G in the offsets' frame, m"),
    tcg: z.number().describe('y of G, m, positive to starboard'),
    kg: z.number().nullable().describe('height of G above the baseline, m; null when not given (the balance is then LCB = LCG, upright)'),
    draftAft: z.number().describe('draft at the aft perpendicular, m'),
    draftFwd: z.number().describe('draft at the forward perpendicular, m'),
    trim: z.number().describe('draft aft - draft forward, m; positive by the stern'),
    heel: z.number().describe('degrees, positive to starboard'),
    draft: z.number().describe('draft amidships, m'),
    lcb: z.number().describe('x of the centre of buoyancy, m'),
    tcb: z.number().describe('y of the centre of buoyancy, m'),
    vcb: z.number().describe('height of the centre of buoyancy, m'),
    residuals: z
      .object({
        volume: z.number().describe('immersed volume less the load\'s, m3'),
        longitudinal: z.number().describe("B's distance from G's vertical along the waterplane, m"),
        transverse: z.number().describe("B's distance from G's vertical across the waterplane, m"),
      })
      .describe('what is left of the balance'),
    gm: z.number().nullable().describe('the metacentric height at the balance, m: the slope of GZ there per radian (GM0 = KMt - KG upright); null without a KG'),
    stable: z.boolean().nullable().describe('whether the balance is stable to a small heel (gm above zero); false where the vessel would loll or capsize; null without a KG'),
  })
  .describe('the floating position of a load');

export const CrossCurvesResultSchema = z
  .object({
    ...Answered,
    trim: z.enum(['level', 'free']).describe('level: the hull kept at level trim as it heels; free: trimmed so that B stays at the upright LCB of each displacement'),
    rows: z.array(
      z.object({
        displacement: z.number().describe('t'),
        heel: z.number().describe('degrees'),
        kn: z.number().describe('KN, m: from K on the centreline to the line of action of buoyancy, positive when it rights the hull'),
        draft: z.number().nullable().describe('draft amidships on the centreline, m; null at 90 degrees'),
        trim: z.number().nullable().describe('draft aft - draft forward on the centreline, m; null at 90 degrees'),
      }),
    ),
  })
  .describe('the cross curves of stability, one row per displacement and heel; the CSV has one row per displacement and one KN column per heel');

export const GzResultSchema = z
  .object({
    ...Answered,
    displacement: z.number().describe('t'),
    kg: z.number().describe('height of G above the baseline, m'),
    fsm: z.number().describe('free-surface moment, t.m'),
    kgEffective: z.number().describe('KG + FSM / displacement, m'),
    trim: z.enum(['level', 'free']),
    gm0: z.number().describe('KMt - KG - FSM / displacement at the upright draft, m'),
    points: z.array(z.object({ heel: z.number().describe('degrees'), gz: z.number().describe('m') })),
    areas: z.array(z.object({ heel: z.number().describe('degrees'), area: z.number().describe('area under the GZ curve from 0, m.rad') })),
    maxGz: z.number().describe('m'),
    angleOfMaxGz: z.number().describe('degrees'),
    vanishingAngle: z.number().nullable().describe('degrees; null when GZ stays positive to 180'),
    lollAngle: z.number().nullable().describe('the angle of loll, degrees: where GZ, negative off the upright (GM0 below zero), rises through zero again; null when there is none'),
    downfloodingAngle: z.number().nullable().describe('degrees; null without openings, or when none reaches the water'),
    criteriaSet: z.object({ name: z.string(), source: z.string() }),
    criteria: z.array(
      z.object({
        id: z.enum(IDS),
        required: z.number().describe('in unit'),
        actual: z.number().describe('in unit'),
        unit: z.string().describe('m.rad, m or deg: the rule\'s own, whatever units= says'),
        pass: z.boolean(),
      }),
    ),
    notes: z.array(z.string()).describe('what every verdict says beside its numbers'),
  })
  .describe('the righting-lever curve of a loading with the intact-stability criteria');
