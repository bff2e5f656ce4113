/**
 * The options that shape every answer of a table, shared by the command line and the
 * service and read here once: the unit system (`--units`, `units=`), the columns
 * (`--fields`, `fields=`), the significant digits (`--digits`, `digits=`) and the plain
 * header (`--plain-header`, `header=plain`). A command or computation does not read them
 * itself: it declares its answer's form (core/report/answerForm.ts) and the shared step
 * applies them.
 */
import { fail } from '../common/errors.js';
import { readDecimal } from '../common/decimal.js';
import { UNIT_SYSTEMS, type UnitSystem } from '../common/units.js';

export interface OutputOptions {
  /** SI (the default) or imperial. */
  readonly units: UnitSystem;
  /** The columns of the table, in this order; all when undefined. */
  readonly fields?: readonly string[] | undefined;
  /** Significant digits of every number written (3 to 17; 17 gives the full double). */
  readonly digits: number;
  /** CSV with the column header on its first line and the `#` lines, the caution last, after the rows. */
  readonly plainHeader: boolean;
}

/** Significant digits by default: enough for any figure of a hull, none of a double's binary noise (13.790000000000001). */
export const DEFAULT_DIGITS = 12;
export const DIGITS_RANGE = { min: 3, max: 17 } as const;

export const DEFAULT_OUTPUT: OutputOptions = { units: 'si', digits: DEFAULT_DIGITS, plainHeader: false };

/** `si` or `imperial`; `path` names the option or query field in the issue. */
export function readUnitSystem(text: string | undefined, path: string): UnitSystem {
  if (text === undefined) return 'si';
  const found = UNIT_SYSTEMS.find((u) => u === text);
  if (found === undefined) fail('HYD_BAD_ARGUMENT', [path], `${path} '${text.slice(0, 40)}' is not one of ${UNIT_SYSTEMS.join(', ')}`);
  return found;
}

/** Digits from 3 to 17, default 12. */
export function readDigits(text: string | undefined, path: string): number {
  if (text === undefined) return DEFAULT_DIGITS;
  const v = readDecimal(text);
  if (!Number.isInteger(v) || v < DIGITS_RANGE.min || v > DIGITS_RANGE.max) {
    fail('HYD_BAD_ARGUMENT', [path], `${path} '${text.slice(0, 40)}' is not a whole number of significant digits from ${DIGITS_RANGE.min} to ${DIGITS_RANGE.max} (default ${DEFAULT_DIGITS}; 17 gives every digit of the double)`);
  }
  return v;
}

/** Comma-separated field names, each once; which ones exist is the answer's to say (answerForm.ts selectColumns). */
export function readFields(text: string | undefined, path: string): string[] | undefined {
  if (text === undefined) return undefined;
  const names = text.split(',').map((s) => s.trim());
  if (names.some((n) => n === '')) fail('HYD_BAD_ARGUMENT', [path], `${path} '${text.slice(0, 80)}' has an empty name; give field names separated by commas, e.g. displacement,wettedSurface`);
  const twice = names.find((n, i) => names.indexOf(n) !== i);
  if (twice !== undefined) fail('HYD_BAD_ARGUMENT', [path], `${path}: '${twice.slice(0, 40)}' is named twice`);
  return names;
}
