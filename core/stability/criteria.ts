/**
 * Intact-stability criteria: the general criteria of the IMO 2008 Intact Stability Code
 * (resolution MSC.267(85), Part A, 2.2), and sets of the same kinds of criterion with
 * other numbers that a user may give (the rule that governs the vessel).
 *
 * The thresholds of the default set are written from memory of Part A, 2.2.1 to 2.2.4:
 *   2.2.1 area under the GZ curve at least 0.055 m·rad to 30 degrees, 0.09 m·rad to 40
 *         degrees or the downflooding angle if less, and 0.03 m·rad between 30 and 40
 *         degrees (or the downflooding angle if less);
 *   2.2.2 GZ at least 0.20 m at an angle of heel of 30 degrees or more;
 *   2.2.3 the maximum GZ at an angle of heel of at least 25 degrees (preferably over 30);
 *   2.2.4 initial metacentric height GM0 at least 0.15 m.
 * The severe wind and rolling (weather) criterion of the same code (Part A, 2.3) is not
 * checked. A small craft, a vessel under a classification society's rules or a flag's
 * rules may be held to other criteria; the caution applies to every verdict.
 */
import { z } from 'zod';
import { HalfbreadthError, issue } from '../common/errors.js';

/** The kinds of criterion, with their units. */
export const CRITERION_KINDS = [
  { id: 'area-0-30', unit: 'm.rad', what: 'area under the GZ curve from 0 to 30 degrees' },
  { id: 'area-0-40', unit: 'm.rad', what: 'area under the GZ curve from 0 to 40 degrees, or to the downflooding angle if less' },
  { id: 'area-30-40', unit: 'm.rad', what: 'area under the GZ curve from 30 to 40 degrees, or to the downflooding angle if less' },
  { id: 'gz-at-30', unit: 'm', what: 'the largest GZ at 30 degrees or more' },
  { id: 'angle-of-max-gz', unit: 'deg', what: 'the angle of heel of the largest GZ' },
  { id: 'gm0', unit: 'm', what: 'initial metacentric height GM0, free surface allowed for' },
] as const;

export type CriterionId = (typeof CRITERION_KINDS)[number]['id'];

const IDS = CRITERION_KINDS.map((c) => c.id) as [CriterionId, ...CriterionId[]];

export interface CriteriaSet {
  readonly name: string;
  readonly source: string;
  /** The least value each criterion asks for; a kind left out is not checked. */
  readonly required: Partial<Record<CriterionId, number>>;
}

/** IMO 2008 IS Code, MSC.267(85), Part A, 2.2: the general criteria (thresholds from memory; see the module note). */
export const IMO_2008_GENERAL: CriteriaSet = {
  name: 'IMO 2008 Intact Stability Code, general criteria',
  source: 'resolution MSC.267(85), Part A, 2.2 (thresholds from memory)',
  required: { 'area-0-30': 0.055, 'area-0-40': 0.09, 'area-30-40': 0.03, 'gz-at-30': 0.2, 'angle-of-max-gz': 25, gm0: 0.15 },
};

/** A criteria set as a user writes it in JSON. */
export const CriteriaSetSchema = z
  .object({
    name: z
      .string({ error: 'required: a name for the set, as each verdict names it (text)' })
      .min(1, { error: 'required: a name for the set, as each verdict names it (text)' })
      .max(200)
      .describe('what the set is, as a verdict names it'),
    source: z.string().max(500).default('given by the user').describe('where its numbers come from'),
    criteria: z
      .array(
        z
          .object({
            id: z.enum(IDS, { error: (iss) => `${JSON.stringify(iss.input)} is not a criterion this project knows; the ids are ${IDS.join(', ')}` }).describe('the kind of criterion'),
            required: z.number().describe('the least value it asks for, in its unit (m.rad, m or deg)'),
          })
          .strict(),
      )
      .min(1)
      .max(IDS.length),
  })
  .strict()
  .describe('a set of intact-stability criteria of the kinds of IMO 2008 IS Code Part A, 2.2, with the numbers of the rule that governs the vessel');

/** A field of the criteria JSON as its author wrote it: criteria[0].id (JSON's own path notation). */
function fieldText(path: readonly PropertyKey[]): string {
  if (path.length === 0) return 'text';
  return path.map((p, k) => (typeof p === 'number' ? `[${p}]` : `${k === 0 ? '' : '.'}${String(p)}`)).join('');
}

/** A criteria set from its JSON (already parsed); every fault HYD_CRITERIA with its path. */
export function readCriteriaSet(json: unknown, path: readonly (string | number)[] = ['criteria']): CriteriaSet {
  const r = CriteriaSetSchema.safeParse(json);
  if (!r.success) {
    throw new HalfbreadthError(
      r.error.issues.map((i) => issue('HYD_CRITERIA', [...path, ...i.path.map((p) => (typeof p === 'symbol' ? String(p) : p))], `the criteria set's ${fieldText(i.path)}: ${i.message}`)),
    );
  }
  const required: Partial<Record<CriterionId, number>> = {};
  const seen = new Set<string>();
  for (const [k, c] of r.data.criteria.entries()) {
    if (seen.has(c.id)) throw new HalfbreadthError([issue('HYD_CRITERIA', [...path, 'criteria', k, 'id'], `the criteria set's ${fieldText(['criteria', k, 'id'])}: ${c.id} is given twice`)]);
    seen.add(c.id);
    if (!Number.isFinite(c.required)) throw new HalfbreadthError([issue('HYD_CRITERIA', [...path, 'criteria', k, 'required'], `the criteria set's ${fieldText(['criteria', k, 'required'])}: the threshold is not a finite number`)]);
    required[c.id] = c.required;
  }
  return { name: r.data.name, source: r.data.source, required };
}

export interface CriterionResult {
  readonly id: CriterionId;
  readonly required: number;
  readonly actual: number;
  readonly unit: string;
  readonly pass: boolean;
}

/** The verdict of each criterion of `set` on the actual values. */
export function judge(set: CriteriaSet, actual: Record<CriterionId, number>): CriterionResult[] {
  return CRITERION_KINDS.filter((k) => set.required[k.id] !== undefined).map((k) => {
    const required = set.required[k.id]!;
    const value = actual[k.id];
    return { id: k.id, required, actual: value, unit: k.unit, pass: value >= required };
  });
}

/** What every verdict says beside its numbers. */
export const CRITERIA_NOTES: readonly string[] = [
  'The severe wind and rolling (weather) criterion of the IMO 2008 IS Code (Part A, 2.3) is not checked.',
  "A small craft, a vessel under a classification society's rules or under a flag's rules may be held to other criteria: give them as a criteria set.",
];
