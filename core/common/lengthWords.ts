/**
 * A length in the words of a result (the sheet's notes, a table's notes): metres to six
 * significant digits, enough for a checker to find the place and short enough to read.
 * An answer in other units writes its lengths with its converter instead
 * (core/report/unitConversion.ts), which keeps this form for SI.
 *
 * @example metresInWords(13.925213675213) // '13.9252 m'
 */
export function metresInWords(metres: number): string {
  return `${String(Number(metres.toPrecision(6)))} m`;
}
