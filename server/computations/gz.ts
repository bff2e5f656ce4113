/** The righting-lever curve of a loading (core/stability/rightingLevers.ts) with the intact-stability criteria. */
import { z } from 'zod';
import { deckAssumedAt } from '../../core/offsets/readingWarnings.js';
import { GZ_FORM, gzAnswer, type GzAnswer } from '../../core/report/formatStability.js';
import type { CriteriaSet } from '../../core/stability/criteria.js';
import type { TrimMode } from '../../core/stability/crossCurves.js';
import { rightingLevers, type Opening } from '../../core/stability/rightingLevers.js';
import { DensityBody, DensityQuery } from '../requestFields.js';
import { CriteriaBody, CriteriaQuery, DisplacementBody, DisplacementQuery, FsmBody, FsmQuery, heelsBody, heelsQuery, LENGTH_FIELDS, OpeningsBody, OpeningsQuery, trimModeField } from '../stabilityFields.js';
import { GzResultSchema } from '../stabilitySchemas.js';
import type { Computation } from './computation.js';
import { prepareWork } from './cost.js';

interface Params {
  displacement: number;
  kg: number;
  fsm: number;
  heels?: number[];
  openings: Opening[];
  criteria?: CriteriaSet;
  trim: TrimMode;
  density: number;
}

/** Work units of one curve, a station: some forty heels floated, with the criteria's readings (npm run bench). */
const WORK_PER_STATION = 2_500;

export const gz: Computation<Params, GzAnswer> = {
  name: 'gz',
  summary: 'Righting levers and the intact-stability criteria',
  description:
    'The GZ curve of a loading (displacement, KG, free-surface moment), the hull free to trim as it heels (or level): GM0, the largest GZ and its ' +
    'angle, the angle of vanishing stability, the area under the curve to each heel, the downflooding angle of the openings given, and the verdict of ' +
    'each criterion: the general criteria of the IMO 2008 Intact Stability Code, resolution MSC.267(85), Part A, 2.2 (thresholds from memory), or ' +
    'the set given. The weather criterion is not checked; a small craft, a vessel under a classification society\'s or a flag\'s rules may be held ' +
    'to other criteria. A negative GM0 is answered, with the criteria it fails.',
  query: z.object({
    displacement: DisplacementQuery,
    kg: LENGTH_FIELDS.kg.query,
    fsm: FsmQuery,
    heels: heelsQuery(undefined),
    openings: OpeningsQuery,
    criteria: CriteriaQuery,
    trim: trimModeField('free'),
    density: DensityQuery,
  }),
  body: z.object({
    displacement: DisplacementBody,
    kg: LENGTH_FIELDS.kg.body,
    fsm: FsmBody,
    heels: heelsBody(undefined),
    openings: OpeningsBody,
    criteria: CriteriaBody,
    trim: trimModeField('free'),
    density: DensityBody,
  }),
  result: GzResultSchema,
  key: (p) =>
    `displacement=${p.displacement}&kg=${p.kg}&fsm=${p.fsm}&heels=${p.heels?.join(',') ?? ''}&openings=${p.openings.map((o) => `${o.x},${o.y},${o.z}`).join(';')}` +
    `&criteria=${p.criteria === undefined ? '' : JSON.stringify(p.criteria)}&trim=${p.trim}&density=${p.density}`,
  cost: (hull, p) => ({ cells: 3 * (p.heels?.length ?? 19) + 60, work: prepareWork(hull) + WORK_PER_STATION * hull.stations.length }),
  usesNotes: true,
  run: (h, p) =>
    gzAnswer(
      h.hull,
      p.density,
      rightingLevers(
        h.prepared,
        {
          displacement: p.displacement,
          kg: p.kg,
          fsm: p.fsm,
          openings: p.openings,
          trim: p.trim,
          deck: { assumedAt: deckAssumedAt(h.notes()) },
          ...(p.heels === undefined ? {} : { heels: p.heels }),
          ...(p.criteria === undefined ? {} : { criteria: p.criteria }),
        },
        p.density,
      ),
    ),
  form: () => GZ_FORM,
};
