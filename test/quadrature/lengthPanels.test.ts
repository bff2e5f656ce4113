/**
 * The panels along the length (core/quadrature/lengthPanels.ts) on random station
 * spacings: no negative weight ever, the weights of a run sum to its length, and each
 * panel integrates exactly the polynomials its rule is exact for (a property of
 * interpolatory rules: P. J. Davis & P. Rabinowitz, Methods of Numerical Integration,
 * 2nd ed., 1984, sec. 2.1; Simpson's first and second rules are exact for cubics on
 * equal spacing, C. B. Barrass & D. R. Derrett, Ship Stability for Masters and Mates,
 * 7th ed., 2012, ch. 10, from memory). Exact integrals of the polynomials are worked in
 * test/fixtures/polynomials.ts.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { cleanMultiplier } from '../../core/quadrature/cleanMultiplier.js';
import { isSpacingStep, lengthPanels, lengthWeights, STEP_RATIO, type LengthRule } from '../../core/quadrature/lengthPanels.js';
import { finite, polyIntegral, polynomial, polyValue } from '../fixtures/polynomials.js';
import '../helpers/relClose.js';

/** The degree of polynomial each rule integrates exactly. */
const EXACT_DEGREE: Readonly<Record<LengthRule, number>> = { first: 3, second: 3, cubic: 3, parabola: 2, single: 1 };

/** Station positions from random intervals: some equal runs, some uneven, some steps. */
const stations = fc
  .tuple(
    finite(-50, 50),
    fc.array(
      fc.oneof(
        fc.record({ h: finite(0.2, 5), n: fc.integer({ min: 1, max: 6 }), r: fc.constant(1) }), // a run of equal intervals
        fc.record({ h: finite(0.05, 8), n: fc.constant(1), r: fc.constant(1) }), // one interval of any size
        fc.record({ h: finite(0.2, 5), n: fc.integer({ min: 2, max: 6 }), r: finite(0.5, 2) }), // intervals growing or shrinking steadily
      ),
      { minLength: 1, maxLength: 8 },
    ),
  )
  .map(([start, runs]) => {
    const x = [start];
    for (const { h, n, r } of runs) for (let k = 0; k < n; k++) x.push(x[x.length - 1]! + h * r ** k);
    return x;
  });

describe('panels along the length', () => {
  test('on any spacing every weight is positive, none straddles a step, and they sum to the span', () => {
    fc.assert(
      fc.property(stations, (x) => {
        const panels = lengthPanels(x);
        let covered = 0;
        for (const p of panels) {
          for (const w of p.weights) expect(w).toBeGreaterThanOrEqual(0);
          // No station inside a panel stands at a step in the spacing.
          for (let k = p.start + 1; k < p.start + p.size - 1; k++) expect(isSpacingStep(x, k)).toBe(false);
          covered += p.size - 1;
        }
        expect(covered).toBe(x.length - 1);
        const w = lengthWeights(x);
        expect(w.reduce((a, b) => a + b, 0)).toBeRelClose(x[x.length - 1]! - x[0]!, 1e-12);
      }),
    );
  });

  test('each panel integrates exactly the polynomials of its rule\'s degree over its own span', () => {
    fc.assert(
      fc.property(stations, polynomial(3), (x, c) => {
        for (const p of lengthPanels(x)) {
          const degree = EXACT_DEGREE[p.rule];
          const poly = c.slice(0, degree + 1);
          const a = x[p.start]!;
          const b = x[p.start + p.size - 1]!;
          const sum = p.weights.reduce((s, w, k) => s + w * polyValue(poly, x[p.start + k]!), 0);
          const scale = p.weights.reduce((s, w, k) => s + Math.abs(w * polyValue(poly, x[p.start + k]!)), 0);
          expect(Math.abs(sum - polyIntegral(poly, a, b))).toBeLessThanOrEqual(1e-9 * Math.max(1, scale));
        }
      }),
    );
  });

  test('equal spacing gives the trade\'s rules: first rule in pairs, the second rule at the end of an odd run', () => {
    expect(lengthPanels([0, 1, 2, 3, 4]).map((p) => p.rule)).toEqual(['first', 'first']);
    expect(lengthPanels([0, 1, 2, 3, 4, 5]).map((p) => p.rule)).toEqual(['first', 'second']);
    expect(lengthPanels([0, 1, 2, 3]).map((p) => p.rule)).toEqual(['second']);
    // Half stations at the ends: 1/2, 2, 1 1/2, 4, 2, 4, 1 1/2, 2, 1/2 (h/3 of the whole stations).
    const x = [0, 0.5, 1, 2, 3, 4, 5, 5.5, 6];
    expect(Array.from(lengthWeights(x), (w) => cleanMultiplier(w / (1 / 3)))).toEqual([0.5, 2, 1.5, 4, 2, 4, 1.5, 2, 0.5]);
  });

  test('a step in the spacing of more than two cuts the run: the barge with stations 3 m apart, then 1 m', () => {
    const x = [0, 3, 6, 9, 12, 15, 18, 21, 24, 27, 28, 29];
    expect(isSpacingStep(x, 9)).toBe(true);
    const panels = lengthPanels(x);
    expect(panels.map((p) => [p.rule, p.start])).toEqual([['first', 0], ['first', 2], ['first', 4], ['second', 6], ['first', 9]]);
    // A change of exactly STEP_RATIO is not a step: the parabola's end weight is then zero, not negative.
    expect(isSpacingStep([0, 1, 1 + STEP_RATIO], 1)).toBe(false);
    expect(lengthPanels([0, 1, 1 + STEP_RATIO])[0]!.weights[0]).toBeCloseTo(0, 15);
  });

  test('a single interval between steps is left for its caller, with the trapezoid\'s weights', () => {
    const panels = lengthPanels([0, 3, 6, 6.5, 7]);
    expect(panels.map((p) => p.rule)).toEqual(['first', 'first']);
    const lone = lengthPanels([0, 3, 6, 7, 10, 13]);
    expect(lone.map((p) => p.rule)).toEqual(['first', 'single', 'first']);
    expect(lone[1]!.weights).toEqual([0.5, 0.5]);
  });

  test('intervals equal to rounding (0.6096 m from feet, 2.1 - 1.4) still take the trade multipliers exactly', () => {
    const ft = [0, 2, 4, 6, 8].map((f) => f * 0.3048);
    expect(lengthPanels(ft).map((p) => p.rule)).toEqual(['first', 'first']);
    const multipliers = Array.from(lengthWeights(ft), (w) => cleanMultiplier(w / ((2 * 0.3048) / 3)));
    expect(multipliers).toEqual([1, 4, 2, 4, 1]);
    expect(cleanMultiplier(4.0000000000000036)).toBe(4);
    expect(cleanMultiplier(1.4999999999999998)).toBe(1.5);
    expect(cleanMultiplier(1.2345678)).toBe(1.2345678);
  });
});
