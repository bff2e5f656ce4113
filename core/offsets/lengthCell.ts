/**
 * Reading one cell of an offsets file as a number or a length, without regular
 * expressions or mathjs (a file may hold a million cells). Numbers are plain decimals:
 * an optional sign, digits with an optional point, an optional exponent (`1.5`, `-.25`,
 * `2e-3`). Hexadecimal, thousands separators and the like are not numbers here.
 */
import { scanFeetInches } from '../common/feetInches.js';
import type { LengthUnit } from '../common/units.js';

/** Why a cell could not be read. */
export interface CellFault {
  readonly code: 'HYD_CELL_NOT_NUMBER' | 'HYD_CELL_NOT_FINITE';
  /** Plain words naming the value and what is wrong with it, e.g. `'abc' is not a number`. */
  readonly why: string;
}

const PLUS = 43;
const MINUS = 45;
const DOT = 46;
const ZERO = 48;
const NINE = 57;
const E_LOWER = 101;
const E_UPPER = 69;

const isDigit = (c: number): boolean => c >= ZERO && c <= NINE;

/** True when `t` (already trimmed) is a plain decimal number as described above. */
export function isDecimal(t: string): boolean {
  const n = t.length;
  let i = 0;
  let c = t.charCodeAt(0);
  if (c === PLUS || c === MINUS) c = t.charCodeAt(++i);
  let digits = 0;
  while (isDigit(c)) { digits++; c = t.charCodeAt(++i); }
  if (c === DOT) {
    c = t.charCodeAt(++i);
    while (isDigit(c)) { digits++; c = t.charCodeAt(++i); }
  }
  if (digits === 0) return false;
  if (c === E_LOWER || c === E_UPPER) {
    c = t.charCodeAt(++i);
    if (c === PLUS || c === MINUS) c = t.charCodeAt(++i);
    let exp = 0;
    while (isDigit(c)) { exp++; c = t.charCodeAt(++i); }
    if (exp === 0) return false;
  }
  return i === n;
}

function notFiniteSpelling(t: string): boolean {
  const c = t.charCodeAt(0);
  const bare = (c === PLUS || c === MINUS ? t.slice(1) : t).toLowerCase();
  return bare === 'nan' || bare === 'inf' || bare === 'infinity';
}

const notFinite = (t: string): CellFault => ({ code: 'HYD_CELL_NOT_FINITE', why: `${t} is not a finite number` });

/** Read a trimmed, non-blank cell as a plain number (knuckle flags aside, for cells that are not lengths). */
export function readNumber(t: string): number | CellFault {
  if (isDecimal(t)) {
    const v = Number(t);
    return Number.isFinite(v) ? v : { code: 'HYD_CELL_NOT_FINITE', why: `${t} is too large to be a finite number` };
  }
  if (notFiniteSpelling(t)) return notFinite(t);
  return { code: 'HYD_CELL_NOT_NUMBER', why: `'${t}' is not a number` };
}

/**
 * Read a trimmed, non-blank cell as a length in the file's unit: a plain number for
 * m, mm, ft and in, feet-inches-eighths (as feet) for ft-in-8.
 */
export function readLength(t: string, unit: LengthUnit): number | CellFault {
  if (unit !== 'ft-in-8') return readNumber(t);
  const v = scanFeetInches(t);
  if (typeof v === 'number') return v;
  if (notFiniteSpelling(t)) return notFinite(t);
  return { code: 'HYD_CELL_NOT_NUMBER', why: v };
}
