/**
 * The hydrostatic particulars that follow from the longitudinal integrals of a draft:
 * the one place where centres, BM, KM, TPC and MCT 1 cm are formed, for the table
 * (core/upright/hydrostatics.ts) and the calculation sheet (core/upright/calculationSheet.ts) alike.
 * Definitions as in the project's conventions; see E. C. Tupper, Introduction to Naval
 * Architecture, 5th ed. (2013), ch. 3-4.
 */
import type { HydrostaticRow } from './hydrostaticFields.js';

/** Integrals over the length at one draft; moments about amidships (x = xm). */
export interface LengthIntegrals {
  /** ∫ A dx, m³. */
  readonly volume: number;
  /** ∫ A (x - xm) dx, m⁴. */
  readonly momentX: number;
  /** ∫ (∫∫ z dA) dx, m⁴. */
  readonly momentZ: number;
  /** 2 ∫ y dx, m². */
  readonly waterplaneArea: number;
  /** 2 ∫ y (x - xm) dx, m³. */
  readonly waterplaneMomentX: number;
  /** 2 ∫ y (x - xm)² dx, m⁴. */
  readonly waterplaneSecondMomentX: number;
  /** (2/3) ∫ y³ dx, m⁴. */
  readonly iT: number;
}

export type LengthParticulars = Pick<
  HydrostaticRow,
  'volume' | 'displacement' | 'lcb' | 'vcb' | 'waterplaneArea' | 'lcf' | 'iT' | 'iL' | 'bmt' | 'bml' | 'kmt' | 'kml' | 'tpc' | 'mct1cm'
>;

export function particularsFromIntegrals(s: LengthIntegrals, xm: number, lbp: number, density: number): LengthParticulars {
  const { volume, waterplaneArea, iT } = s;
  const lcfFromMid = s.waterplaneMomentX / waterplaneArea;
  // Parallel axes: the second moment about amidships less the part due to the LCF's offset.
  const iL = s.waterplaneSecondMomentX - waterplaneArea * lcfFromMid * lcfFromMid;
  const vcb = s.momentZ / volume;
  const bmt = iT / volume;
  const bml = iL / volume;
  const displacement = density * volume;
  return {
    volume,
    displacement,
    lcb: xm + s.momentX / volume,
    vcb,
    waterplaneArea,
    lcf: xm + lcfFromMid,
    iT,
    iL,
    bmt,
    bml,
    kmt: vcb + bmt,
    kml: vcb + bml,
    tpc: (density * waterplaneArea) / 100,
    mct1cm: (displacement * bml) / (100 * lbp),
  };
}
