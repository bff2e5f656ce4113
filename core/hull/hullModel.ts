/**
 * The hull model: the one JSON shape that every offsets file is read into and that the
 * service accepts. Lengths are metres, in the frame of the conventions (x forward,
 * z up from the baseline, y to starboard; half-breadths y >= 0).
 *
 * Each station is a half-section given as points from the keel up to the deck edge.
 * The grid form of an offsets file becomes one point per defined cell, with no
 * knuckles but the first and last points; `waterlines` then keeps the table's header.
 */
import { z } from 'zod';
import { NAME_PATTERN } from '../common/hullName.js';
import { LIMITS } from '../common/limits.js';
import { checkHull } from './hullRules.js';

export const PointSchema = z
  .object({
    y: z.number().describe('half-breadth, m'),
    z: z.number().describe('height above baseline, m'),
    knuckle: z.boolean().default(false).describe('a corner: no smooth curve is fitted across it'),
  })
  .strict();

export const StationSchema = z
  .object({
    x: z.number().describe('station position, m, positive forward'),
    points: z.array(PointSchema).max(LIMITS.maxPointsPerStation).describe('half-section from keel to deck edge'),
  })
  .strict();

const HullFields = z
  .object({
    name: z
      .string()
      .max(LIMITS.maxNameLength)
      .regex(NAME_PATTERN, { error: 'the name holds a control character or line break; names are one line of printable text' })
      .default('unnamed hull'),
    ap: z.number().optional().describe('x of the aft perpendicular, m (default: aftmost station)'),
    fp: z.number().optional().describe('x of the forward perpendicular, m (default: foremost station)'),
    waterlines: z
      .array(z.number())
      .max(LIMITS.maxWaterlines)
      .optional()
      .describe('tabulated waterline heights of a grid table, m'),
    stations: z.array(StationSchema).max(LIMITS.maxStations),
  })
  .strict();

/** The hull model schema, with the geometric rules of `hullRules.ts` applied. */
export const HullModelSchema = HullFields.superRefine((hull, ctx) => {
  for (const found of checkHull(hull)) {
    ctx.addIssue({ code: 'custom', path: [...found.path], message: found.message, params: { code: found.code } });
  }
});

export type HullModel = z.infer<typeof HullModelSchema>;
export type HullInput = z.input<typeof HullModelSchema>;
export type Station = z.infer<typeof StationSchema>;
export type Point = z.infer<typeof PointSchema>;

/** Perpendiculars and derived lengths of a hull, with the conventions' defaults applied. */
export interface Perpendiculars {
  readonly ap: number;
  readonly fp: number;
  readonly lbp: number;
  /** Amidships, (ap + fp) / 2. */
  readonly xm: number;
}

export function perpendiculars(hull: Pick<HullModel, 'ap' | 'fp' | 'stations'>): Perpendiculars {
  const first = hull.stations[0];
  const last = hull.stations[hull.stations.length - 1];
  const ap = hull.ap ?? first?.x ?? 0;
  const fp = hull.fp ?? last?.x ?? 0;
  return { ap, fp, lbp: fp - ap, xm: (ap + fp) / 2 };
}
