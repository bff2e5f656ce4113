/**
 * Relative-tolerance comparison for the numerical tests. Vitest's `toBeCloseTo` checks
 * an absolute number of decimal places, which is meaningless across quantities that
 * run from 1e-3 m to 1e6 m⁴; here a check passes when
 *
 *   |actual - expected| <= rel * |expected| + abs
 *
 * `abs` (default 0) is a floor for expected values at or near zero, where a relative
 * test cannot work. NaN matches nothing, not even NaN, so a field that came out
 * undefined always fails loudly.
 */
import { expect } from 'vitest';

export interface Tolerance {
  /** Relative tolerance, a fraction of |expected|. */
  readonly rel: number;
  /** Absolute floor in the quantity's own unit (default 0). */
  readonly abs?: number;
}

/** The relative error of `actual` against `expected` (|a - e| / |e|; the plain difference when e = 0). */
export function relativeError(actual: number, expected: number): number {
  const d = Math.abs(actual - expected);
  return expected === 0 ? d : d / Math.abs(expected);
}

/** Whether `actual` lies within the tolerance of `expected`. */
export function relClose(actual: number, expected: number, tol: Tolerance): boolean {
  if (!Number.isFinite(actual) || !Number.isFinite(expected)) return false;
  if (!(tol.rel >= 0) || !((tol.abs ?? 0) >= 0)) throw new RangeError('a tolerance must be a non-negative number');
  return Math.abs(actual - expected) <= tol.rel * Math.abs(expected) + (tol.abs ?? 0);
}

interface RelCloseMatchers<R = unknown> {
  /** `expect(actual).toBeRelClose(expected, rel, abs?)`: see `relClose`. */
  toBeRelClose(expected: number, rel: number, abs?: number): R;
}

declare module 'vitest' {
  interface Matchers<T = any> extends RelCloseMatchers<T> {}
}

expect.extend({
  toBeRelClose(received: unknown, expected: number, rel: number, abs = 0) {
    const actual = typeof received === 'number' ? received : Number.NaN;
    const pass = relClose(actual, expected, { rel, abs });
    const err = relativeError(actual, expected);
    return {
      pass,
      message: () =>
        `expected ${String(received)} ${pass ? 'not ' : ''}to lie within ${rel} relative` +
        `${abs > 0 ? ` (+ ${abs} absolute)` : ''} of ${expected}; relative error ${err.toExponential(3)}`,
      actual: received,
      expected,
    };
  },
});

/**
 * Check every key of `expected` in `actual` at one tolerance, naming the key that fails
 * (a plain loop of `expect` would report only "expected x to be close to y").
 */
export function expectFieldsRelClose(
  actual: Readonly<Record<string, number>>,
  expected: Readonly<Record<string, number>>,
  rel: number,
  abs = 0,
): void {
  for (const key of Object.keys(expected)) {
    expect(actual[key], `field ${key}`).toBeRelClose(expected[key]!, rel, abs);
  }
}
