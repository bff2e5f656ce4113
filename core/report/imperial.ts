/**
 * Imperial units for results: feet, long tons, TPI and MTI.
 *
 * The factors are declared once here, each computed once from mathjs's unit
 * definitions (never per cell):
 * - 1 ft = 0.3048 m exactly and 1 lb = 0.45359237 kg exactly, by the international yard
 *   and pound agreement of 1959; 1 in = ft / 12 = 2.54 cm.
 * - 1 long ton = 2240 lb = 1016.0469088 kg exactly (the British ton, used for
 *   displacement in imperial hydrostatics).
 * - TPI, long tons per inch immersion = TPC x (cm per inch) x (long tons per tonne).
 * - MTI, moment to change trim one inch, long ton-feet per inch =
 *   MCT1cm x (long tons per tonne) x (feet per metre) x (cm per inch); with GML taken as
 *   BML, as for MCT1cm, this is displacement x BML / (12 x LBP) in long tons and feet
 *   (common practice, no source).
 * Coefficients carry no unit and are not changed.
 */
import { unit } from 'mathjs';
import { HYDROSTATIC_FIELDS, type HydrostaticField, type HydrostaticRow } from '../upright/hydrostaticFields.js';
import type { Converter } from './unitConversion.js';

const POUNDS_PER_LONG_TON = 2240;

/** The conversion factors, each from mathjs once, at load. */
export const IMPERIAL_FACTORS = {
  /** Metres in a foot: 0.3048. */
  metresPerFoot: unit(1, 'ft').toNumber('m'),
  /** Tonnes in a long ton: 1.0160469088. */
  tonnesPerLongTon: unit(POUNDS_PER_LONG_TON, 'lbm').toNumber('t'),
  /** Centimetres in an inch: 2.54. */
  cmPerInch: unit(1, 'inch').toNumber('cm'),
} as const;

const { metresPerFoot: FT, tonnesPerLongTon: LT, cmPerInch: IN_CM } = IMPERIAL_FACTORS;

/** Each SI unit of the hydrostatic fields, its imperial unit and the factor (imperial = SI x factor). */
export const IMPERIAL_UNITS: Readonly<Record<string, { unit: string; factor: number }>> = {
  m: { unit: 'ft', factor: 1 / FT },
  m2: { unit: 'ft2', factor: 1 / FT ** 2 },
  m3: { unit: 'ft3', factor: 1 / FT ** 3 },
  m4: { unit: 'ft4', factor: 1 / FT ** 4 },
  t: { unit: 'LT', factor: 1 / LT },
  't/cm': { unit: 'LT/in', factor: IN_CM / LT },
  't.m/cm': { unit: 'LT.ft/in', factor: IN_CM / (LT * FT) },
  't.m': { unit: 'LT.ft', factor: 1 / (LT * FT) },
  'm.rad': { unit: 'ft.rad', factor: 1 / FT },
  '-': { unit: '-', factor: 1 },
};

/** Fields whose name changes with the unit: TPC becomes TPI, MCT1cm becomes MTI. */
const RENAMED: Readonly<Record<string, { key: string; label: string; description: string }>> = {
  tpc: { key: 'tpi', label: 'TPI', description: 'long tons per inch immersion' },
  mct1cm: { key: 'mti', label: 'MTI', description: 'moment to change trim one inch (GML taken as BML)' },
};

export interface ImperialField {
  /** The SI field it is converted from. */
  readonly from: HydrostaticField;
  readonly key: string;
  readonly unit: string;
  readonly label: string;
  readonly description: string;
  readonly factor: number;
}

/** The hydrostatic fields in imperial units, in the order of HYDROSTATIC_FIELDS. */
export const IMPERIAL_FIELDS: readonly ImperialField[] = HYDROSTATIC_FIELDS.map((f) => {
  const u = IMPERIAL_UNITS[f.unit]!;
  const r = RENAMED[f.key as string];
  return { from: f.key, key: r?.key ?? f.key, unit: u.unit, label: r?.label ?? f.label, description: r?.description ?? f.description, factor: u.factor };
});

/** A hydrostatic row in imperial units, keyed by the imperial field names (tpi, mti). */
export function imperialRow(row: HydrostaticRow): Record<string, number> {
  const out: Record<string, number> = {};
  for (const f of IMPERIAL_FIELDS) out[f.key] = row[f.from] * f.factor;
  // The draft was typed in feet: give it back as typed, not with the noise of the round trip through metres.
  out['draft'] = Number(out['draft']!.toPrecision(12));
  return out;
}

/** A length in metres, in feet. */
export function toFeet(metres: number): number {
  return metres / FT;
}

/** Density in t/m³ as cubic feet of water per long ton, the form imperial tables state (sea water about 35). */
export function cubicFeetPerLongTon(density: number): number {
  return LT / density / FT ** 3;
}

/** Lengths in feet for text: six significant digits. */
const feetText = (metres: number): string => `${String(Number((metres / FT).toPrecision(6)))} ft`;

/**
 * The imperial system for core/report/unitConversion.ts: each SI unit's imperial unit and
 * factor (IMPERIAL_UNITS; a unit not listed, such as t/m3 for density, is kept), TPC and
 * MCT1cm renamed TPI and MTI wherever they appear in a result.
 */
export const IMPERIAL_CONVERTER: Converter = {
  system: 'imperial',
  unit: (u) => IMPERIAL_UNITS[u] ?? { unit: u, factor: 1 },
  key: (k, u) => (IMPERIAL_UNITS[u] !== undefined && u !== '-' ? RENAMED[k]?.key ?? k : k),
  label: (k, l) => RENAMED[k]?.label ?? l,
  length: feetText,
};
