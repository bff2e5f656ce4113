/**
 * Checking offsets: whether they make a sound hull, every issue if not, what the hull
 * is (stations, perpendiculars, the range of drafts it can be floated at), and the
 * offsets that look unfair (core/fairness/fairness.ts), as warnings. Offsets that break a rule
 * are an answer here (valid: false), not a failure.
 */
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import type { HalfbreadthError } from '../../core/common/errors.js';
import type { FairnessWarning } from '../../core/fairness/fairness.js';
import { fairnessWarningsIn } from '../../core/fairness/fairnessInFile.js';
import { HULL_UNITS } from '../../core/report/resultParts.js';
import { checkWarnings, proportionWarnings, type ReadingWarning } from '../../core/offsets/readingWarnings.js';
import { hullSummary, type HullSummary } from '../../core/report/formatHydrostatics.js';
import { CautionField, HullFormSchema, HullSummarySchema } from '../responseSchemas.js';
import type { LoadedHull } from '../hullInput.js';
import type { Computation } from './computation.js';
import { pointsOf, prepareWork } from './cost.js';

/** Work units of the fairness check per offset: about 3 s for a million offsets (bench/core.bench.ts). */
const FAIRNESS_WORK_PER_POINT = 50;

const ParticularsSchema = z.object({
  form: HullFormSchema,
  units: z.string().describe('length unit of the offsets as given'),
  points: z.number().int().describe('points of all sections together'),
  knuckles: z.number().int().describe('points marked as knuckles (first and last of each section not counted)'),
  lowestKeel: z.number().describe('z of the lowest keel point, m: drafts must lie above it'),
  lowestDeck: z.number().describe('z of the lowest deck edge, m: drafts may not lie above it'),
});

const FairnessWarningSchema = z
  .object({
    code: z.literal('HYD_UNFAIR_OFFSET'),
    path: z.array(z.union([z.string(), z.number()])).describe('where in the hull model'),
    x: z.number().describe('station position, m'),
    z: z.number().describe('height of the offset, m'),
    offset: z.enum(['halfBreadth', 'height']).describe('which coordinate looks unfair'),
    value: z.number().describe('the offset as given, m'),
    suggested: z.number().describe('a fair value from its neighbours, m'),
    along: z.array(z.enum(['waterline', 'section', 'line'])).describe('the lines along which it was found'),
    message: z.string().describe('the place and the values in the offsets file\'s own units and line and column (a JSON model: metres)'),
    line: z.number().int().optional().describe('line of the offset in the offsets file (none for a JSON model)'),
    column: z.number().int().optional().describe('column of the offset in the offsets file (none for a JSON model)'),
  })
  .describe('an offset that makes a bump or a hollow in its waterline or section: a warning, not an error');

const ReadingWarningSchema = z
  .object({
    code: z.enum(['HYD_KEEL_AT_WATERLINE', 'HYD_PROPORTIONS']),
    path: z.array(z.union([z.string(), z.number()])).describe('where in the offsets file (line) or the hull model'),
    message: z.string(),
  })
  .describe('how the table is written: a keel taken at a tabulated waterline, or proportions that suggest the wrong unit or swapped columns');

const WarningSchema = z.union([ReadingWarningSchema, FairnessWarningSchema]);

export const CheckResultSchema = z
  .object({
    valid: z.boolean(),
    hull: HullSummarySchema.nullable(),
    particulars: ParticularsSchema.nullable(),
    issues: z.array(z.object({ code: z.string(), path: z.array(z.union([z.string(), z.number()])), message: z.string() })),
    warnings: z.array(WarningSchema).describe('how the table is written, and offsets that look unfair (none when the offsets are not valid)'),
    caution: CautionField,
  })
  .describe('whether the offsets make a sound hull, and what it is');

interface CheckResult {
  valid: boolean;
  hull: HullSummary | null;
  particulars: z.infer<typeof ParticularsSchema> | null;
  issues: { code: string; path: (string | number)[]; message: string }[];
  warnings: readonly (FairnessWarning | ReadingWarning)[];
  caution: string;
}

function particulars(h: LoadedHull): z.infer<typeof ParticularsSchema> {
  let points = 0;
  let knuckles = 0;
  for (const st of h.hull.stations) {
    points += st.points.length;
    for (let j = 1; j < st.points.length - 1; j++) if (st.points[j]!.knuckle) knuckles++;
  }
  return { form: h.form, units: h.units, points, knuckles, lowestKeel: h.prepared.lowestKeel, lowestDeck: h.prepared.lowestDeck };
}

export const check: Computation<Record<string, never>, CheckResult> = {
  name: 'check',
  summary: 'Check offsets',
  description:
    'Whether the offsets make a sound hull, with every issue (line and column, or field) when they do not, and the hull\'s particulars ' +
    'and warnings when they do: a keel taken at a tabulated waterline, proportions that suggest the wrong unit, offsets that look unfair.',
  query: z.object({}),
  body: z.object({}),
  result: CheckResultSchema,
  key: () => '',
  usesNotes: true,
  // At most one warning per offset (a fair table has none; an unfair one a few per line).
  cost: (hull) => ({ cells: pointsOf(hull), work: prepareWork(hull) + FAIRNESS_WORK_PER_POINT * pointsOf(hull) }),
  run: (h) => ({
    valid: true,
    hull: hullSummary(h.hull),
    particulars: particulars(h),
    issues: [],
    warnings: [...checkWarnings(h.notes()), ...proportionWarnings(h.hull, h.units), ...fairnessWarningsIn(h.hull, h.reading())],
    caution: CAUTION,
  }),
  jsonOnly: true,
  form: () => ({
    units: {
      hull: HULL_UNITS,
      particulars: { lowestKeel: 'm', lowestDeck: 'm' },
      warnings: [{ x: 'm', z: 'm', value: 'm', suggested: 'm' }],
    },
    columns: [],
    lines: () => [],
  }),
  invalid: (err: HalfbreadthError) => ({
    valid: false,
    hull: null,
    particulars: null,
    issues: err.issues.map((i) => ({ code: i.code, path: [...i.path], message: i.message })),
    warnings: [],
    caution: CAUTION,
  }),
};
