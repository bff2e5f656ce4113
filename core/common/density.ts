/**
 * The one rule for a water density given by a person (command line, query): a finite
 * number of t/m³ within DENSITY_RANGE. Anything outside is a typing error (kg/m³ for
 * t/m³, a slipped digit), not water.
 */
import { fail } from './errors.js';
import { DENSITY_RANGE, FRESH_WATER_DENSITY, SEA_WATER_DENSITY } from './constants.js';

/**
 * The density if it is plausible, else HalfbreadthError HYD_DENSITY at `path`.
 * `written` is the text as typed, quoted in the message when given.
 *
 * @example checkDensity(1.025) // 1.025
 */
export function checkDensity(value: number, path: readonly (string | number)[] = ['density'], written?: string): number {
  const shown = written === undefined ? String(value) : `'${written}'`;
  if (!Number.isFinite(value)) {
    fail('HYD_DENSITY', path, `density ${shown} is not a number; give t/m3, e.g. ${SEA_WATER_DENSITY} for sea water or ${FRESH_WATER_DENSITY.toFixed(3)} for fresh water`);
  }
  if (value < DENSITY_RANGE.min || value > DENSITY_RANGE.max) {
    const hint = value >= 900 && value <= 1100 ? ` (${value} looks like kg/m3; t/m3 is ${value / 1000})` : '';
    fail('HYD_DENSITY', path, `density ${shown} t/m3 is outside ${DENSITY_RANGE.min} to ${DENSITY_RANGE.max} t/m3${hint}`);
  }
  return value;
}
