/**
 * The relative-tolerance matcher that the numerical tests rely on: it must fail when
 * it should, or every check built on it could not fail either.
 */
import { describe, expect, test } from 'vitest';
import { expectFieldsRelClose, relClose, relativeError } from './relClose.js';

describe('relClose', () => {
  test('accepts a value within the relative tolerance and rejects one just outside it', () => {
    expect(relClose(1.0009, 1, { rel: 1e-3 })).toBe(true);
    expect(relClose(1.0011, 1, { rel: 1e-3 })).toBe(false);
    expect(relClose(-2000.5, -2000, { rel: 1e-3 })).toBe(true);
    expect(relClose(-2003, -2000, { rel: 1e-3 })).toBe(false);
  });

  test('needs the absolute floor to accept anything near an expected zero', () => {
    expect(relClose(1e-15, 0, { rel: 1e-9 })).toBe(false);
    expect(relClose(1e-15, 0, { rel: 1e-9, abs: 1e-12 })).toBe(true);
  });

  test('never accepts NaN or an infinity, even against itself', () => {
    expect(relClose(Number.NaN, Number.NaN, { rel: 1 })).toBe(false);
    expect(relClose(Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY, { rel: 1 })).toBe(false);
  });

  test('the matcher fails with the relative error in its message', () => {
    expect(1.5).toBeRelClose(1.5000001, 1e-6);
    expect(() => expect(1.5).toBeRelClose(1.6, 1e-3)).toThrow(/relative error 6\.250e-2/);
    expect(() => expect('1.5').toBeRelClose(1.5, 1)).toThrow();
  });

  test('the field check names the field that is out of tolerance', () => {
    expect(() => expectFieldsRelClose({ a: 1, b: 2 }, { a: 1, b: 2.1 }, 1e-6)).toThrow(/field b/);
    expect(relativeError(2, 4)).toBe(0.5);
  });
});
