/**
 * The parts of the stability results (core/stability/) that the stability plots draw,
 * with the conventions' field names: cross-curve rows and a righting-lever (GZ) result
 * with its criteria. A plot asks only for what it draws, so a test can hand it a curve
 * made from a formula.
 */
import type { CriterionResult, CrossCurveRow, GzResult } from '../stability/index.js';

/** One point of the cross curves: KN at a displacement and heel. */
export type CrossCurvePoint = Pick<CrossCurveRow, 'displacement' | 'heel' | 'kn'>;

export interface GzPoint {
  /** degrees */
  readonly heel: number;
  /** m */
  readonly gz: number;
}

/** One criterion's verdict, e.g. { id: 'area-0-30', required: 0.055, actual: 0.08, unit: 'm.rad', pass: true }. */
export type CriterionVerdict = Omit<CriterionResult, 'id'> & { readonly id: string };

/** The righting levers of a loading as a plot draws them. Angles in degrees, lengths in m. */
export type GzCurve = Pick<GzResult, 'gm0' | 'maxGz' | 'angleOfMaxGz'> &
  Partial<Pick<GzResult, 'vanishingAngle' | 'downfloodingAngle' | 'lollAngle'>> & {
    readonly points: readonly GzPoint[];
    readonly criteria: readonly CriterionVerdict[];
  };
