/**
 * The shapes of stability results that the stability plots draw, as the project's
 * conventions name their fields: cross-curve rows and a righting-lever (GZ) result with
 * its criteria. Plain data, so the plots need nothing from the computation that made it.
 */

/** One point of the cross curves: KN at a displacement and heel. */
export interface CrossCurveRow {
  /** t */
  readonly displacement: number;
  /** degrees */
  readonly heel: number;
  /** m */
  readonly kn: number;
}

export interface GzPoint {
  /** degrees */
  readonly heel: number;
  /** m */
  readonly gz: number;
}

/** One criterion's verdict, e.g. { id: 'area-0-30', required: 0.055, actual: 0.08, unit: 'm.rad', pass: true }. */
export interface CriterionResult {
  readonly id: string;
  readonly required: number;
  readonly actual: number;
  readonly unit: string;
  readonly pass: boolean;
}

/** The righting levers of a loading. Angles in degrees, lengths in m. */
export interface GzResult {
  readonly gm0: number;
  readonly points: readonly GzPoint[];
  readonly maxGz: number;
  readonly angleOfMaxGz: number;
  /** The heel beyond the maximum where GZ returns to zero; null when it does not within the heels computed. */
  readonly vanishingAngle?: number | null;
  /** The first heel at which an opening reaches the waterline; null or absent when no opening is given. */
  readonly downfloodingAngle?: number | null;
  readonly criteria: readonly CriterionResult[];
}
