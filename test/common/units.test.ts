/**
 * The length factors of offsets files, checked against mathjs's unit definitions (a
 * general-purpose reference library from the npm registry), and against the definitions
 * themselves: 1 in = 25.4 mm exactly and 1 ft = 12 in (international yard and pound
 * agreement, 1959).
 */
import { unit } from 'mathjs';
import { describe, expect, test } from 'vitest';
import { LENGTH_UNITS, lengthFactor, TONNES_PER_LONG_TON } from '../../core/common/units.js';

describe('length factors', () => {
  test.each([
    ['m', 'm'],
    ['mm', 'mm'],
    ['ft', 'ft'],
    ['in', 'in'],
    ['ft-in-8', 'ft'], // feet-inches-eighths cells read as feet
  ] as const)('%s agrees with mathjs (%s) to the last bit', (u, name) => {
    expect(lengthFactor(u)).toBe(unit(1, name).toNumber('m'));
  });

  test('a foot is twelve inches and an inch is 25.4 mm', () => {
    expect(lengthFactor('ft')).toBeCloseTo(12 * lengthFactor('in'), 15);
    expect(lengthFactor('in')).toBeCloseTo(25.4 * lengthFactor('mm'), 15);
  });

  test('every unit of the offsets files has a factor', () => {
    for (const u of LENGTH_UNITS) expect(lengthFactor(u)).toBeGreaterThan(0);
  });
});

describe('the long ton', () => {
  test('2240 pounds, as mathjs defines the pound, in tonnes', () => {
    expect(TONNES_PER_LONG_TON).toBeCloseTo(unit(2240, 'lbm').toNumber('t'), 15);
  });
});
