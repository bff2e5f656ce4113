/**
 * Length units of offsets files and their factors to metres.
 *
 * The factors are exact by definition: 1 in = 0.0254 m and 1 ft = 12 in = 0.3048 m (the
 * international yard and pound agreement of 1959), 1 mm = 0.001 m (SI). They are plain
 * numbers here rather than read from mathjs at start-up: importing mathjs costs well
 * over a second of every command-line run, several times the rest of it. mathjs stays
 * the outside check of these numbers in the tests (test/common/units.test.ts).
 *
 * `ft-in-8` is feet-inches-eighths lofting notation (core/common/feetInches.ts). Its cells read
 * as a number of feet, so its factor is the foot's.
 */
import { z } from 'zod';

export const LENGTH_UNITS = ['m', 'mm', 'ft', 'in', 'ft-in-8'] as const;

export const LengthUnitSchema = z.enum(LENGTH_UNITS).describe('length unit of an offsets file');

export type LengthUnit = z.infer<typeof LengthUnitSchema>;

/** Metres per unit (see the module note for the definitions). */
const METRES_PER: Readonly<Record<LengthUnit, number>> = { m: 1, mm: 0.001, ft: 0.3048, in: 0.0254, 'ft-in-8': 0.3048 };

/**
 * Metres per unit: multiply a length read in `u` by this to get metres.
 *
 * @example lengthFactor('ft') // 0.3048 (exact, by the 1959 international yard and pound agreement)
 */
export function lengthFactor(u: LengthUnit): number {
  return METRES_PER[u];
}

/**
 * Tonnes in a long ton (2240 lb of 0.45359237 kg, exact by the same agreement): the unit
 * of displacements typed with imperial units. A plain number for the reason above; the
 * tests check it against mathjs.
 */
export const TONNES_PER_LONG_TON = 1.0160469088;

/**
 * The unit system of results and of lengths typed in a request: SI (m, t; the default)
 * or imperial (ft, long tons; core/report/imperial.ts converts results).
 */
export type UnitSystem = 'si' | 'imperial';

export const UNIT_SYSTEMS = ['si', 'imperial'] as const satisfies readonly UnitSystem[];

export function isLengthUnit(text: string): text is LengthUnit {
  return (LENGTH_UNITS as readonly string[]).includes(text);
}
