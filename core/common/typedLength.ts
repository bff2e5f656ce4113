/**
 * Lengths typed by a person on the command line or in a query (drafts, heights), in the
 * unit system the request asks for: metres by default; with imperial units, feet, either
 * as decimal feet (`2.5`) or as feet-inches-eighths (`2-6-0`, `3-4-5+`, `3-4-5-`; see
 * core/common/feetInches.ts). Numbers follow core/common/decimal.ts.
 *
 * A foot is 0.3048 m exactly (core/common/units.ts, the factor of files in feet; the
 * international yard and pound agreement of 1959).
 */
import { readDecimal } from './decimal.js';
import { scanFeetInches } from './feetInches.js';
import { lengthFactor, TONNES_PER_LONG_TON, type UnitSystem } from './units.js';

/** The length unit typed lengths are read in, by unit system. */
export const TYPED_LENGTH_UNIT: Readonly<Record<UnitSystem, string>> = { si: 'm', imperial: 'ft' };

/** How a typed length is written, for messages. */
export const TYPED_LENGTH_HINT: Readonly<Record<UnitSystem, string>> = {
  si: 'one number of metres',
  imperial: 'one length in feet, decimal (2.5) or feet-inches-eighths (2-6-0, 3-4-5+, 3-4-5-)',
};

/**
 * The value of a typed length in its system's unit (metres, or feet), else NaN.
 * @example readTypedValue('2-6-0', 'imperial') // 2.5
 * @example readTypedValue('2-6-0', 'si') // NaN
 */
export function readTypedValue(text: string, system: UnitSystem): number {
  const d = readDecimal(text);
  if (Number.isFinite(d) || system === 'si') return d;
  const f = scanFeetInches(text);
  return typeof f === 'number' ? f : Number.NaN;
}

/** Metres per unit of typed lengths in `system`: 1, or 0.3048. */
export function typedLengthFactor(system: UnitSystem): number {
  return system === 'si' ? 1 : lengthFactor('ft');
}

/**
 * A typed length in metres, else NaN.
 * @example readTypedLength('2-0-0', 'imperial') // 0.6096
 */
export function readTypedLength(text: string, system: UnitSystem): number {
  return readTypedValue(text, system) * typedLengthFactor(system);
}

/** The unit typed masses (displacements) are read in, by unit system: tonnes, or long tons. */
export const TYPED_MASS_UNIT: Readonly<Record<UnitSystem, string>> = { si: 't', imperial: 'LT' };

/** Tonnes per unit of typed masses (displacements) in `system`: 1, or 1.0160469088 (long tons). */
export function typedMassFactor(system: UnitSystem): number {
  return system === 'si' ? 1 : TONNES_PER_LONG_TON;
}

/** Tonne-metres per unit of typed moments (a free-surface moment) in `system`: 1, or long ton-feet. */
export function typedMomentFactor(system: UnitSystem): number {
  return typedMassFactor(system) * typedLengthFactor(system);
}
