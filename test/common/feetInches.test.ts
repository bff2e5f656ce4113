/**
 * Feet-inches-eighths: lofting-table notation, `F-I-E` = F ft + (I + E/8) in, a trailing
 * `+` adding 1/16 in. The notation is common practice of the lofting floor, no source.
 * 1 ft = 12 in, and 1 in = 0.0254 m, 1 ft = 0.3048 m exactly: the international yard and
 * pound agreement of 1959.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError } from '../../core/common/errors.js';
import { formatFeetInches, parseFeetInches, scanFeetInches } from '../../core/common/feetInches.js';
import { lengthFactor } from '../../core/common/units.js';

/** Feet from the notation's definition: feet, inches, eighths and sixteenths added up by hand. */
const feetOf = (ft: number, inches: number, eighths: number, sixteenth = 0): number => ft + (inches + eighths / 8 + sixteenth / 16) / 12;

describe('reading feet-inches-eighths', () => {
  test('3-4-5 is 3 ft 4 5/8 in', () => {
    expect(scanFeetInches('3-4-5')).toBe(feetOf(3, 4, 5));
  });

  test('a trailing plus adds a sixteenth: 3-4-5+ is 3 ft 4 11/16 in', () => {
    expect(scanFeetInches('3-4-5+')).toBe(feetOf(3, 4, 5, 1));
    expect(scanFeetInches('3-4-5+')).toBe(3 + 4.6875 / 12);
  });

  test('a leading minus gives a length aft of the origin', () => {
    expect(scanFeetInches('-3-4-5')).toBe(-feetOf(3, 4, 5));
    expect(scanFeetInches('-0-6-0')).toBe(-0.5);
  });

  test('plain 0 and 0-0-0 are both zero', () => {
    expect(scanFeetInches('0')).toBe(0);
    expect(scanFeetInches('0-0-0')).toBe(0);
  });

  test('the largest inches and eighths, 11 and 7+, stay below the next foot', () => {
    expect(scanFeetInches('12-11-7+')).toBe(feetOf(12, 11, 7, 1));
    expect(scanFeetInches('12-11-7+')).toBeLessThan(13);
  });

  test('surrounding spaces are ignored and two-digit inches are read', () => {
    expect(scanFeetInches('  10-10-2 ')).toBe(feetOf(10, 10, 2));
    expect(scanFeetInches('1-06-0')).toBe(1.5);
  });

  test('one foot is 0.3048 m and one inch 0.0254 m through the unit factor (1959 agreement)', () => {
    expect((scanFeetInches('1-0-0') as number) * lengthFactor('ft-in-8')).toBe(0.3048);
    expect((scanFeetInches('0-1-0') as number) * lengthFactor('ft-in-8')).toBeCloseTo(0.0254, 15);
  });

  test('inches above 11 are refused with the rule in words', () => {
    expect(scanFeetInches('3-12-0')).toBe("'3-12-0': inches 12 must be 0 to 11");
  });

  test('eighths above 7 are refused with the rule in words', () => {
    expect(scanFeetInches('3-4-8')).toBe("'3-4-8': eighths 8 must be 0 to 7");
  });

  test("a trailing minus takes a sixteenth away, as the loftsman's 3-4-5- is 3 ft 4 9/16 in", () => {
    // 3 ft 4 9/16 in = 3 + 4.5625 / 12 ft (arithmetic; the notation is common practice, no source).
    // In sixteenths of an inch (192 to the foot): 3 x 192 + 4 x 16 + 5 x 2 - 1 = 649.
    expect(scanFeetInches('3-4-5-')).toBe(649 / 192);
    expect(scanFeetInches('-3-4-5-')).toBe(-649 / 192);
    // A sixteenth less than 2 ft 0 in is 1 ft 11 15/16 in: 383 sixteenths.
    expect(scanFeetInches('2-0-0-')).toBe(383 / 192);
  });

  test.each(['', '3-4', '3.5', 'a-b-c', '3-4-5++', '--3-4-5', '3-4-5--', '3-4-5+-', '3--5', '3-123-0', '3-4-55', '+3-4-5', '-0', '3 - 4 - 5'])(
    "'%s' is not feet-inches-eighths and the reason says how to write it",
    (text) => {
      const r = scanFeetInches(text);
      expect(typeof r).toBe('string');
      expect(r).toContain('3-4-5');
    },
  );

  test('parseFeetInches throws a HalfbreadthError naming the argument', () => {
    expect(parseFeetInches('3-4-5+', ['kg'])).toBe(feetOf(3, 4, 5, 1));
    let caught: unknown;
    try {
      parseFeetInches('3-13-0', ['kg']);
    } catch (e) {
      caught = e;
    }
    expect(isHalfbreadthError(caught)).toBe(true);
    if (!isHalfbreadthError(caught)) return;
    expect(caught.code).toBe('HYD_BAD_ARGUMENT');
    expect(caught.issues[0]!.path).toEqual(['kg']);
    expect(caught.message).toContain('inches 13 must be 0 to 11');
  });
});

describe('writing feet-inches-eighths', () => {
  test('3 ft 4 5/8 in is written 3-4-5, and 3 ft 4 11/16 in 3-4-5+', () => {
    expect(formatFeetInches(feetOf(3, 4, 5))).toBe('3-4-5');
    expect(formatFeetInches(feetOf(3, 4, 5, 1))).toBe('3-4-5+');
  });

  test('negative lengths keep their minus, and zero is 0-0-0', () => {
    expect(formatFeetInches(-feetOf(3, 4, 5))).toBe('-3-4-5');
    expect(formatFeetInches(0)).toBe('0-0-0');
    expect(formatFeetInches(-0.0001)).toBe('0-0-0');
  });

  test('lengths are rounded to the nearest sixteenth of an inch', () => {
    // 1/40 in above 4 5/8 in is nearer 4 5/8 than 4 11/16 (1/40 < 1/32).
    expect(formatFeetInches(feetOf(3, 4, 5) + 1 / 40 / 12)).toBe('3-4-5');
    // 1/20 in above 4 5/8 in is nearer 4 11/16 (1/20 > 1/32).
    expect(formatFeetInches(feetOf(3, 4, 5) + 1 / 20 / 12)).toBe('3-4-5+');
  });

  test('rounding carries across inches into feet', () => {
    // 11.999 in rounds up to 12 in = 1 ft.
    expect(formatFeetInches(11.999 / 12)).toBe('1-0-0');
    // 2 ft 11 15/16 in and 0.04 in more is nearer 3 ft than 2 ft 11 15/16 in (0.04 > 1/32).
    expect(formatFeetInches(feetOf(2, 11, 7, 1) + 0.04 / 12)).toBe('3-0-0');
  });

  test('non-finite lengths cannot be written', () => {
    expect(() => formatFeetInches(Number.NaN)).toThrow(RangeError);
    expect(() => formatFeetInches(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });

  test('every whole number of sixteenths is written and read back exactly', () => {
    fc.assert(
      fc.property(fc.integer({ min: -2_000_000, max: 2_000_000 }), (sixteenths) => {
        const feet = sixteenths / 192;
        const text = formatFeetInches(feet);
        expect(scanFeetInches(text)).toBe(feet === 0 ? 0 : feet);
      }),
    );
  });

  test('any length is written within half a sixteenth of an inch', () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), (feet) => {
        const back = scanFeetInches(formatFeetInches(feet));
        expect(typeof back).toBe('number');
        // Half of 1/16 in is 1/384 ft; a little more for the rounding of the arithmetic.
        expect(Math.abs((back as number) - feet)).toBeLessThanOrEqual(1 / 384 + 1e-12);
      }),
    );
  });
});
