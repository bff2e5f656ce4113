/**
 * The one syntax of a number typed by a person, everywhere: offsets cells, drafts lists,
 * densities, query values and command-line options. A plain decimal: an optional sign,
 * digits with an optional point, an optional exponent (`1.5`, `-.25`, `2e-3`).
 * Hexadecimal (`0x1`), binary (`0b1`), octal (`0o1`), `Infinity`, thousands separators and
 * the like are not numbers here, although JavaScript's `Number()` reads some of them.
 * Scanned by hand, without regular expressions (a file may hold a million cells, and a
 * long run of digits must not make a pattern backtrack).
 */

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

/**
 * The value of a plain decimal (surrounding spaces allowed), else NaN. A decimal too
 * large for a double reads as an infinity: callers that need a finite value check it.
 *
 * @example readDecimal(' 1.3 ') // 1.3
 * @example readDecimal('0x1') // NaN
 */
export function readDecimal(text: string): number {
  const t = text.trim();
  return isDecimal(t) ? Number(t) : Number.NaN;
}

/**
 * A number written with a decimal comma, as a spreadsheet in a locale with a decimal
 * comma writes it (`0,25`, `-1,5e-3`), given as the same text with a point; any other
 * text is given back as it is. The one exception to the plain-decimal rule, and only for
 * an offsets file whose cells are not split on commas (a semicolon or tab delimiter), so
 * that a comma can be nothing but the decimal mark there. A point and a comma together
 * (`1.000,5`, a thousands separator) or two commas are not rewritten, and so stay errors.
 *
 * @example decimalCommaAsPoint('0,25') // '0.25'
 * @example decimalCommaAsPoint('1.000,5') // '1.000,5'
 */
export function decimalCommaAsPoint(t: string): string {
  const at = t.indexOf(',');
  if (at < 0 || t.indexOf(',', at + 1) >= 0 || t.indexOf('.') >= 0) return t;
  const s = `${t.slice(0, at)}.${t.slice(at + 1)}`;
  return isDecimal(s) ? s : t;
}
