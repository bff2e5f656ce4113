/**
 * The typed lists of the stability work (core/stability/stabilityInput.ts,
 * core/common/numberList.ts): what a person types and what it must give, and the message
 * of each thing that is wrong. The expected values are the arithmetic of the ranges typed.
 */
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError } from '../../core/common/errors.js';
import { LIMITS } from '../../core/common/limits.js';
import { checkCrossCurveSize, parseDisplacements, parseHeels, parseOpenings } from '../../core/stability/stabilityInput.js';

function issueOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (isHalfbreadthError(e)) return `${e.issues[0]!.code} ${JSON.stringify(e.issues[0]!.path)} ${e.issues[0]!.message}`;
    throw e;
  }
  return 'no issue';
}

describe('displacements and heels', () => {
  test('values and ranges from:step:to, ranges inclusive and free of rounding noise', () => {
    expect(parseDisplacements('5:2.5:15,16')).toEqual([5, 7.5, 10, 12.5, 15, 16]);
    expect(parseHeels('-30:10:30')).toEqual([-30, -20, -10, 0, 10, 20, 30]);
    expect(parseHeels('0:0.1:0.3')).toEqual([0, 0.1, 0.2, 0.3]);
    expect(parseHeels(' 12.5 ')).toEqual([12.5]);
  });

  test('each fault names the list, the item and the rule', () => {
    // Malformed, not out of range: HYD_BAD_ARGUMENT, as a JSON body's malformed field is.
    expect(issueOf(() => parseDisplacements(''))).toMatch(/^HYD_BAD_ARGUMENT \["displacements"\] the displacements list is empty/);
    expect(issueOf(() => parseDisplacements('5,ten'))).toMatch(/^HYD_BAD_ARGUMENT \["displacements",1\] displacements item 2 "ten": not a number/);
    expect(issueOf(() => parseHeels('0:-5:30'))).toMatch(/^HYD_BAD_ARGUMENT \["heels",0\] heels item 1 "0:-5:30": the step must be greater than zero/);
    expect(issueOf(() => parseHeels('30:5:0'))).toMatch(/the range must run upwards/);
    expect(issueOf(() => parseHeels('0:5'))).toMatch(/a range is written from:step:to/);
    expect(issueOf(() => parseHeels('0x10'))).toMatch(/not a number/);
    expect(issueOf(() => parseHeels(`0:1:${LIMITS.maxHeels}`))).toMatch(new RegExp(`more than ${LIMITS.maxHeels} heels in all`));
  });
});

describe('openings', () => {
  test('x,y,z points separated by semicolons', () => {
    expect(parseOpenings('4.2,1.1,1.6; 6,-0.9,1.8;')).toEqual([
      { x: 4.2, y: 1.1, z: 1.6 },
      { x: 6, y: -0.9, z: 1.8 },
    ]);
    expect(parseOpenings('')).toEqual([]);
  });

  test('a point that is not three numbers is refused, naming it', () => {
    expect(issueOf(() => parseOpenings('4.2,1.1,1.6;6,1.8'))).toMatch(/^HYD_BAD_ARGUMENT \["openings",1\] opening 2 "6,1.8" is not a point x,y,z in m/);
    expect(issueOf(() => parseOpenings('a,b,c'))).toMatch(/^HYD_BAD_ARGUMENT/);
  });
});

describe('the size of a set of cross curves', () => {
  test('at most the documented number of points', () => {
    expect(() => checkCrossCurveSize(20, 19)).not.toThrow();
    expect(issueOf(() => checkCrossCurveSize(200, 73))).toMatch(new RegExp(`^HYD_TOO_LARGE .*200 displacements x 73 heels is 14600 points of cross curves; at most ${LIMITS.maxCrossCurvePoints}`));
  });
});

describe('imperial units', () => {
  test('displacements in long tons and openings in feet are given in tonnes and metres', () => {
    // 1 long ton = 1.0160469088 t and 1 ft = 0.3048 m, exactly (international yard and pound agreement, 1959).
    expect(parseDisplacements('10,20', ['displacements'], 'imperial')).toEqual([10.160469088, 20.320938176]);
    const [o] = parseOpenings('10,2-6-0,5', ['openings'], 'imperial');
    expect(o!.x).toBeCloseTo(3.048, 12);
    expect(o!.y).toBeCloseTo(0.762, 12);
    expect(o!.z).toBeCloseTo(1.524, 12);
  });
});
