/** The cross curves of stability (core/stability/crossCurves.ts): KN for each displacement and heel, level or free to trim. */
import { z } from 'zod';
import { deckAssumedAt } from '../../core/offsets/readingWarnings.js';
import { crossCurvesForm, crossCurvesResult, type CrossCurvesResult } from '../../core/report/formatStability.js';
import { crossCurves, type TrimMode } from '../../core/stability/crossCurves.js';
import { checkCrossCurveSize } from '../../core/stability/stabilityInput.js';
import { DensityBody, DensityQuery } from '../requestFields.js';
import { DisplacementsBody, DisplacementsQuery, heelsBody, heelsQuery, trimModeField } from '../stabilityFields.js';
import { CrossCurvesResultSchema } from '../stabilitySchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';

interface Params {
  displacements: number[];
  heels: number[];
  trim: TrimMode;
  density: number;
}

/** Heels when none are asked for, degrees: 0 to 90 every 10. */
const DEFAULT_HEELS = '0:10:90';
const DEFAULT_HEEL_LIST = Array.from({ length: 10 }, (_, k) => 10 * k);

/** Work units of one point (a displacement at a heel), a station: a few evaluations of each inclined section (npm run bench). */
const WORK_PER_POINT_STATION = 80;

export const crossCurvesComputation: Computation<Params, CrossCurvesResult> = {
  name: 'cross-curves',
  summary: 'Cross curves of stability',
  description:
    'KN for each displacement and heel: the distance from K, on the centreline at the baseline, to the line of action of buoyancy, positive when ' +
    'it rights the hull, at level trim or free to trim (B kept at the upright LCB of each displacement). At most 2,000 points ' +
    '(displacements x heels) in one request. Heeled work needs every station\'s deck edge in the offsets. The CSV has one row per displacement ' +
    'and one KN column per heel.',
  query: z.object({ displacements: DisplacementsQuery, heels: heelsQuery(DEFAULT_HEELS), trim: trimModeField('level'), density: DensityQuery }),
  body: z.object({ displacements: DisplacementsBody, heels: heelsBody(DEFAULT_HEEL_LIST), trim: trimModeField('level'), density: DensityBody }),
  result: CrossCurvesResultSchema,
  key: (p) => `displacements=${p.displacements.join(',')}&heels=${p.heels.join(',')}&trim=${p.trim}&density=${p.density}`,
  cost: (hull, p) => {
    checkCrossCurveSize(p.displacements.length, p.heels.length);
    const points = p.displacements.length * p.heels.length;
    return { cells: 5 * points, work: prepareWork(hull) + WORK_PER_POINT_STATION * points * hull.stations.length };
  },
  usesNotes: true,
  run: (h, p) => crossCurvesResult(h.hull, p.density, p.trim, crossCurves(h.prepared, p.displacements, p.heels, p.density, p.trim, { assumedAt: deckAssumedAt(h.notes()) })),
  form: (p) => crossCurvesForm(p.heels),
};
