/**
 * Length units of offsets files and their factors to metres.
 *
 * The factors come from mathjs's unit definitions, once per unit, at the edge of the
 * program: readers and writers take the factor and multiply (or divide) plain numbers,
 * never calling mathjs per cell.
 *
 * `ft-in-8` is feet-inches-eighths lofting notation (core/feetInches.ts). Its cells read
 * as a number of feet, so its factor is the foot's.
 */
import { unit } from 'mathjs';
import { z } from 'zod';

export const LENGTH_UNITS = ['m', 'mm', 'ft', 'in', 'ft-in-8'] as const;

export const LengthUnitSchema = z.enum(LENGTH_UNITS).describe('length unit of an offsets file');

export type LengthUnit = z.infer<typeof LengthUnitSchema>;

/** The mathjs unit whose size gives each length unit's factor (ft-in-8 cells are read as feet). */
const MATHJS_NAME: Readonly<Record<LengthUnit, string>> = { m: 'm', mm: 'mm', ft: 'ft', in: 'in', 'ft-in-8': 'ft' };

const factors = new Map<LengthUnit, number>();

/**
 * Metres per unit: multiply a length read in `u` by this to get metres.
 *
 * @example lengthFactor('ft') // 0.3048 (exact, by the 1959 international yard and pound agreement)
 */
export function lengthFactor(u: LengthUnit): number {
  let f = factors.get(u);
  if (f === undefined) {
    f = unit(1, MATHJS_NAME[u]).toNumber('m');
    factors.set(u, f);
  }
  return f;
}

export function isLengthUnit(text: string): text is LengthUnit {
  return (LENGTH_UNITS as readonly string[]).includes(text);
}
