/**
 * Reading one cell of an offsets file as a number or a length, without regular
 * expressions or mathjs (a file may hold a million cells). Numbers are plain decimals,
 * the one number syntax of every input (core/common/decimal.ts): no hexadecimal, no
 * thousands separators.
 */
import { decimalCommaAsPoint, isDecimal } from '../common/decimal.js';
import { FEET_TOO_LARGE, scanFeetInches } from '../common/feetInches.js';
import type { LengthUnit } from '../common/units.js';

/** Why a cell could not be read. */
export interface CellFault {
  readonly code: 'HYD_CELL_NOT_NUMBER' | 'HYD_CELL_NOT_FINITE';
  /** Plain words naming the value and what is wrong with it, e.g. `'abc' is not a number`. */
  readonly why: string;
}

function notFiniteSpelling(t: string): boolean {
  const c = t.charAt(0);
  const bare = (c === '+' || c === '-' ? t.slice(1) : t).toLowerCase();
  return bare === 'nan' || bare === 'inf' || bare === 'infinity';
}

const notFinite = (t: string): CellFault => ({ code: 'HYD_CELL_NOT_FINITE', why: `${t} is not a finite number` });

/**
 * Read a trimmed, non-blank cell as a plain number (knuckle flags aside, for cells that
 * are not lengths). With `decimalComma` (a file split on semicolons or tabs) `0,25` reads
 * as 0.25 (core/common/decimal.ts decimalCommaAsPoint).
 */
export function readNumber(t: string, decimalComma = false): number | CellFault {
  const s = decimalComma ? decimalCommaAsPoint(t) : t;
  if (isDecimal(s)) {
    const v = Number(s);
    return Number.isFinite(v) ? v : { code: 'HYD_CELL_NOT_FINITE', why: `${t} is too large to be a finite number` };
  }
  if (notFiniteSpelling(t)) return notFinite(t);
  return { code: 'HYD_CELL_NOT_NUMBER', why: `'${t}' is not a number` };
}

/**
 * Read a trimmed, non-blank cell as a length in the file's unit: a plain number for
 * m, mm, ft and in, feet-inches-eighths (as feet) for ft-in-8.
 */
export function readLength(t: string, unit: LengthUnit, decimalComma = false): number | CellFault {
  if (unit !== 'ft-in-8') return readNumber(t, decimalComma);
  const v = scanFeetInches(t);
  if (typeof v === 'number') return v;
  if (notFiniteSpelling(t)) return notFinite(t);
  return { code: v.endsWith(FEET_TOO_LARGE) ? 'HYD_CELL_NOT_FINITE' : 'HYD_CELL_NOT_NUMBER', why: v };
}
