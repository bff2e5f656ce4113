/**
 * The shared output step's rounding: roundNumber must give exactly what the text of
 * `toPrecision` reads back to (ECMA-262, Number.prototype.toPrecision and Number::toString,
 * the outside reference), whatever double it is given, while doing the common case in
 * integers for speed.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { roundNumber, roundNumbers } from '../../core/report/answerForm.js';

const reference = (v: number, d: number): number => (Number.isFinite(v) && v !== 0 ? Number(v.toPrecision(d)) : v);

describe('roundNumber', () => {
  test('equals toPrecision read back, for any double and any digits from 3 to 17', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true }), fc.integer({ min: 3, max: 17 }), (v, d) => Object.is(roundNumber(v, d), reference(v, d))),
      { numRuns: 20000 },
    );
  });

  test('equals it next to powers of ten and halves, where the integer path must step aside', () => {
    for (let e = -15; e <= 15; e++) {
      for (const m of [1, 9.99999999999, 9.999999999995, 1.0000000000005, 5.5, 0.5, 1.25]) {
        for (const d of [3, 6, 12, 15]) {
          for (const v of [m * 10 ** e, m * 10 ** e * (1 + 2e-16), -m * 10 ** e * (1 - 2e-16)]) expect(roundNumber(v, d), `${v} to ${d}`).toBe(reference(v, d));
        }
      }
    }
  });

  test('takes the binary noise away at 12 digits', () => {
    // Each left-hand value is what a double computes for the decimal on the right (IEEE 754 arithmetic).
    expect(roundNumber(0.1 + 0.2, 12)).toBe(0.3);
    expect(roundNumber(700 * 0.001, 12)).toBe(0.7);
    expect(roundNumber(13.790000000000001, 12)).toBe(13.79);
    expect(roundNumber(699.9999999999999, 12)).toBe(700);
    expect(roundNumber(Number.NaN, 12)).toBeNaN();
    expect(roundNumber(-0, 12)).toBe(-0);
  });

  test('roundNumbers walks objects and arrays, and leaves text, booleans and null alone', () => {
    expect(roundNumbers({ a: [0.1 + 0.2, 'x', null, true], b: { c: 700 * 0.001 } }, 12)).toEqual({ a: [0.3, 'x', null, true], b: { c: 0.7 } });
  });
});
