/**
 * The numbers of a text table (core/report/textTable.ts). Significant figures as a
 * drawing office counts them (common practice, no source): leading zeros are not
 * significant, trailing zeros after the decimal point are.
 */
import { describe, expect, test } from 'vitest';
import { textCell } from '../../core/report/textTable.js';

describe('textCell', () => {
  test('fixed decimals by unit where they show three significant digits or more', () => {
    expect(textCell(13.79, 'm3')).toBe('13.790');
    expect(textCell(0.125, 'm')).toBe('0.125');
    expect(textCell(0, 'm')).toBe('0.000');
  });

  test('three significant digits, trailing zeros kept, where the decimals would show fewer', () => {
    expect(textCell(0.000412, 't.m/cm')).toBe('0.000412');
    expect(textCell(0.05, 'm')).toBe('0.0500');
    expect(textCell(-0.0524, 'm')).toBe('-0.0524');
  });

  test('undefined figures are a dash', () => {
    expect(textCell(Number.NaN, 'm')).toBe('-');
  });
});
