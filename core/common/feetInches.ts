/**
 * Feet-inches-eighths, the notation of lofting tables: `3-4-5` is 3 ft 4 5/8 in, a
 * trailing `+` adds a sixteenth (`3-4-5+` is 3 ft 4 11/16 in) and a trailing `-` takes
 * one away (`3-4-5-` is 3 ft 4 9/16 in, the loftsman's "minus a sixteenth"). A leading
 * minus marks a length aft of the origin or below it (`-3-4-5`); plain `0` is zero.
 * Inches run 0 to 11 and eighths 0 to 7. (Common practice of the lofting floor, no source.)
 *
 * Values are in feet: multiply by lengthFactor('ft-in-8') (0.3048) for metres.
 */
import { fail } from './errors.js';

const DASH = 45;
const PLUS = 43;
const ZERO = 48;
const NINE = 57;

/** Sixteenths of an inch in a foot. */
const SIXTEENTHS_PER_FOOT = 12 * 16;

/** The end of the message for feet too many to be a number at all. */
export const FEET_TOO_LARGE = 'has too many feet to be a finite number';

const shape = (t: string): string =>
  `'${t}' is not feet-inches-eighths: write feet-inches-eighths with dashes, e.g. 3-4-5 for 3 ft 4 5/8 in, 3-4-5+ for 3 ft 4 11/16 in, 3-4-5- for 3 ft 4 9/16 in`;

/**
 * Read feet-inches-eighths text. Returns the length in feet, or a string saying why the
 * text is not feet-inches-eighths (no exception, so a reader can gather every fault of a
 * file). Surrounding spaces are ignored.
 *
 * @example scanFeetInches('3-4-5+') // 3 + 4.6875 / 12 = 3.390625
 * @example scanFeetInches('3-4-5-') // 3 + 4.5625 / 12 = 3.380208333...
 */
export function scanFeetInches(text: string): number | string {
  const t = text.trim();
  if (t === '0') return 0;
  const n = t.length;
  let i = 0;
  const negative = t.charCodeAt(0) === DASH;
  if (negative) i = 1;

  let feet = 0;
  const feetStart = i;
  for (let c = t.charCodeAt(i); c >= ZERO && c <= NINE; c = t.charCodeAt(++i)) feet = feet * 10 + (c - ZERO);
  if (i === feetStart || t.charCodeAt(i) !== DASH) return shape(t);
  i++;

  let inches = 0;
  const inchStart = i;
  for (let c = t.charCodeAt(i); c >= ZERO && c <= NINE; c = t.charCodeAt(++i)) inches = inches * 10 + (c - ZERO);
  if (i === inchStart || i - inchStart > 2 || t.charCodeAt(i) !== DASH) return shape(t);
  i++;

  const e = t.charCodeAt(i);
  if (!(e >= ZERO && e <= NINE)) return shape(t);
  const eighths = e - ZERO;
  i++;
  const sign = t.charCodeAt(i);
  const sixteenth = sign === PLUS ? 1 : sign === DASH ? -1 : 0;
  if (sixteenth !== 0) i++;
  if (i !== n) return shape(t);

  if (inches > 11) return `'${t}': inches ${inches} must be 0 to 11`;
  if (eighths > 7) return `'${t}': eighths ${eighths} must be 0 to 7`;
  const sixteenths = feet * SIXTEENTHS_PER_FOOT + inches * 16 + eighths * 2 + sixteenth;
  const value = sixteenths / SIXTEENTHS_PER_FOOT;
  // 309 or more digits of feet overflow a double: an error, never an infinite length.
  if (!Number.isFinite(value)) return `'${t.slice(0, 24)}...' ${FEET_TOO_LARGE}`;
  return negative ? -value : value;
}

/**
 * Read feet-inches-eighths text as feet, throwing a HalfbreadthError (HYD_BAD_ARGUMENT)
 * when it is malformed; `path` names the argument in the issue.
 */
export function parseFeetInches(text: string, path: readonly (string | number)[] = []): number {
  const v = scanFeetInches(text);
  if (typeof v === 'string') fail('HYD_BAD_ARGUMENT', path, v);
  return v;
}

/**
 * Write a length in feet as feet-inches-eighths, rounded to the nearest sixteenth of an
 * inch (halves away from zero); an odd sixteenth is written as a trailing `+`.
 * Zero is written `0-0-0`.
 *
 * @example formatFeetInches(3.390625) // '3-4-5+'
 */
export function formatFeetInches(feet: number): string {
  if (!Number.isFinite(feet)) throw new RangeError(`cannot write ${feet} as feet-inches-eighths`);
  const s = Math.round(Math.abs(feet) * SIXTEENTHS_PER_FOOT);
  if (s === 0) return '0-0-0';
  const ft = Math.floor(s / SIXTEENTHS_PER_FOOT);
  const rem = s - ft * SIXTEENTHS_PER_FOOT;
  const inches = Math.floor(rem / 16);
  const r = rem - inches * 16;
  return `${feet < 0 ? '-' : ''}${ft}-${inches}-${r >> 1}${(r & 1) === 1 ? '+' : ''}`;
}
