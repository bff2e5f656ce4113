/**
 * Simpson's rules (core/quadrature/simpson.ts) against what each rule must integrate exactly and
 * how fast its error must fall.
 *
 * Sources for the expected behaviour (outside the project):
 * - Exactness and error order of the closed Newton-Cotes rules (first rule and 3/8 rule
 *   exact for cubics, error O(h^4); trapezoid exact for lines, error O(h^2)):
 *   P. J. Davis & P. Rabinowitz, Methods of Numerical Integration, 2nd ed. (Academic
 *   Press, 1984), sec. 2.1-2.2 (from memory).
 * - Composite error terms: trapezoid -(b-a) h^2 f''/12, Simpson -(b-a) h^4 f''''/180,
 *   so halving h divides the error by about 4 and about 16 (the same book; also any
 *   numerical-analysis text; from memory).
 * - The trade's multipliers 1,4,2,4,...,4,1, and 1/2, 2, 1 1/2, 4, 2, ... with half
 *   ordinates at the ends; the 5,8,-1 rule: C. B. Barrass & D. R. Derrett, Ship
 *   Stability for Masters and Mates, 7th ed. (2012), ch. 10 (from memory); common
 *   practice in any calculation sheet of areas.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import {
  integrateWeighted,
  simpson,
  simpson13,
  simpson38,
  simpson58m1,
  simpsonMultipliers,
  simpsonPanels,
  simpsonWeights,
  trapezoid,
} from '../../core/quadrature/simpson.js';
import { finite, polyIntegral, polynomial, polyScale, polyValue, unevenAbscissae } from '../fixtures/polynomials.js';
import '../helpers/relClose.js';

// Rounding tolerance for "exact" rules: a sum of a few dozen terms loses a few ulps of
// the polynomial's scale (see polyScale), far below any truncation error (>= 1e-6 here).
const ROUNDING = 1e-12;

const evenly = (a: number, h: number, count: number): number[] => Array.from({ length: count }, (_, k) => a + k * h);
const values = (c: readonly number[], x: readonly number[]): number[] => x.map((v) => polyValue(c, v));

describe('exactness on polynomials', () => {
  test('simpson13 integrates any cubic exactly on any odd count of equal intervals', () => {
    fc.assert(
      fc.property(polynomial(3), finite(-5, 5), finite(0.01, 1), fc.integer({ min: 1, max: 20 }), (c, a, h, pairs) => {
        const count = 2 * pairs + 1;
        const x = evenly(a, h, count);
        const exact = polyIntegral(c, a, x[count - 1]!);
        expect(simpson13(h, values(c, x))).toBeRelClose(exact, ROUNDING, ROUNDING * polyScale(c, a, x[count - 1]!));
      }),
    );
  });

  test('simpson38 integrates any cubic exactly on 3k + 1 equally spaced ordinates', () => {
    fc.assert(
      fc.property(polynomial(3), finite(-5, 5), finite(0.01, 1), fc.integer({ min: 1, max: 12 }), (c, a, h, k) => {
        const count = 3 * k + 1;
        const x = evenly(a, h, count);
        const exact = polyIntegral(c, a, x[count - 1]!);
        expect(simpson38(h, values(c, x))).toBeRelClose(exact, ROUNDING, ROUNDING * polyScale(c, a, x[count - 1]!));
      }),
    );
  });

  test('the composite weights integrate any quadratic exactly on any uneven spacing', () => {
    // Each panel's weights integrate the parabola (or cubic) through its ordinates, which
    // is the quadratic itself: exact whatever the intervals.
    fc.assert(
      fc.property(polynomial(2), unevenAbscissae(3, 30), (c, x) => {
        const a = x[0]!;
        const b = x[x.length - 1]!;
        expect(simpson(x, values(c, x))).toBeRelClose(polyIntegral(c, a, b), ROUNDING, ROUNDING * polyScale(c, a, b));
      }),
    );
  });

  test('the composite weights integrate any cubic exactly on even spacing, for odd and even counts alike', () => {
    // An even count of ordinates is an odd count of intervals: the last three make a
    // 3/8 panel, also exact for cubics.
    fc.assert(
      fc.property(polynomial(3), finite(-5, 5), finite(0.01, 1), fc.integer({ min: 3, max: 40 }), (c, a, h, count) => {
        const x = evenly(a, h, count);
        const b = x[count - 1]!;
        expect(simpson(x, values(c, x))).toBeRelClose(polyIntegral(c, a, b), ROUNDING, ROUNDING * polyScale(c, a, b));
      }),
    );
  });

  test('the composite weights integrate any cubic exactly when each first-rule panel has equal intervals', () => {
    // A parabola panel with equal halves is exact for cubics by symmetry (the cubic term
    // is odd about its middle); a four-point panel is exact for cubics on any spacing.
    // So panels of different widths, and an uneven 3/8 panel at the end, stay exact.
    const layout = fc.record({
      start: finite(-5, 5),
      pairWidths: fc.array(finite(0.02, 1), { minLength: 0, maxLength: 12 }),
      lastThree: fc.option(fc.tuple(finite(0.01, 1), finite(0.01, 1), finite(0.01, 1)), { nil: undefined }),
    });
    fc.assert(
      fc.property(
        polynomial(3),
        layout.filter((l) => l.pairWidths.length > 0 || l.lastThree !== undefined),
        (c, l) => {
          const x = [l.start];
          const last = (): number => x[x.length - 1]!;
          for (const h of l.pairWidths) {
            const mid = last() + h;
            x.push(mid, mid + h);
          }
          for (const g of l.lastThree ?? []) x.push(last() + g);
          expect(simpson(x, values(c, x))).toBeRelClose(polyIntegral(c, x[0]!, last()), ROUNDING, ROUNDING * polyScale(c, x[0]!, last()));
        },
      ),
    );
  });

  test('the composite weights are not exact for a cubic when a first-rule panel has unequal intervals', () => {
    // The other side of the rule above, so that it is not passing for a reason of its
    // own: on 0, 1, 3 the first rule misses x^3. Parabola through (0,0), (1,1), (3,27)
    // is 4x^2 - 3x, whose integral over [0, 3] is 36 - 13.5 = 22.5; the cubic's is 20.25.
    expect(simpson([0, 1, 3], [0, 1, 27])).toBeRelClose(22.5, ROUNDING);
  });

  test('simpson58m1 gives the area over the first interval under any quadratic', () => {
    fc.assert(
      fc.property(polynomial(2), finite(-5, 5), finite(0.01, 2), (c, x0, h) => {
        const exact = polyIntegral(c, x0, x0 + h);
        const got = simpson58m1(h, polyValue(c, x0), polyValue(c, x0 + h), polyValue(c, x0 + 2 * h));
        expect(got).toBeRelClose(exact, ROUNDING, ROUNDING * polyScale(c, x0, x0 + 2 * h));
      }),
    );
  });

  test('the trapezoid integrates any straight line exactly on any spacing', () => {
    fc.assert(
      fc.property(polynomial(1), unevenAbscissae(2, 30), (c, x) => {
        const a = x[0]!;
        const b = x[x.length - 1]!;
        expect(trapezoid(x, values(c, x))).toBeRelClose(polyIntegral(c, a, b), ROUNDING, ROUNDING * polyScale(c, a, b));
      }),
    );
  });
});

describe('error order when the spacing halves', () => {
  // Integrals from any table of integrals: e^x over [0, 1] is e - 1; sin x over [0, pi] is 2.
  const cases = [
    { name: 'exp on [0, 1]', f: Math.exp, a: 0, b: 1, exact: Math.E - 1 },
    { name: 'sin on [0, pi]', f: Math.sin, a: 0, b: Math.PI, exact: 2 },
  ];
  const errorWith = (rule: (x: number[], y: number[]) => number, c: (typeof cases)[number], intervals: number): number => {
    const x = evenly(c.a, (c.b - c.a) / intervals, intervals + 1);
    return Math.abs(rule(x, x.map(c.f)) - c.exact);
  };

  for (const c of cases) {
    test(`simpson's error on ${c.name} falls about 16 times when the spacing halves`, () => {
      // Ratio 2^4 = 16 from the h^4 error term; the next term (h^6) moves it by under 1 %
      // at these spacings, so 15.5 .. 16.5 leaves room for that and nothing else.
      for (const n of [8, 16, 32]) {
        const ratio = errorWith(simpson, c, n) / errorWith(simpson, c, 2 * n);
        expect(ratio).toBeGreaterThan(15.5);
        expect(ratio).toBeLessThan(16.5);
      }
    });

    test(`the trapezoid's error on ${c.name} falls about 4 times when the spacing halves`, () => {
      for (const n of [8, 16, 32]) {
        const ratio = errorWith(trapezoid, c, n) / errorWith(trapezoid, c, 2 * n);
        expect(ratio).toBeGreaterThan(3.95);
        expect(ratio).toBeLessThan(4.05);
      }
    });
  }

  test("simpson's error keeps the fourth order with a 3/8 panel at the end (odd numbers of intervals)", () => {
    // Observed order log(e1/e2) / log(h1/h2) for 9, 19, 39, 79 intervals: 4 within 0.3.
    // Not closer: the 3/8 panel's error per unit length (h^4 f''''/80) is larger than
    // the first rule's (h^4 f''''/180) and its share of the length shrinks as the count
    // grows, which bends the observed order by a few tenths.
    const c = cases[0]!;
    const counts = [9, 19, 39, 79];
    for (let k = 0; k + 1 < counts.length; k++) {
      const order = Math.log(errorWith(simpson, c, counts[k]!) / errorWith(simpson, c, counts[k + 1]!)) / Math.log(counts[k + 1]! / counts[k]!);
      expect(order).toBeGreaterThan(3.7);
      expect(order).toBeLessThan(4.3);
    }
  });
});

describe("the trade's multipliers", () => {
  test('11 equal stations give exactly 1, 4, 2, 4, 2, 4, 2, 4, 2, 4, 1', () => {
    const { spacing, multipliers } = simpsonMultipliers(evenly(0, 1, 11));
    expect(spacing).toBe(1);
    expect(Array.from(multipliers)).toEqual([1, 4, 2, 4, 2, 4, 2, 4, 2, 4, 1]);
  });

  test('equal stations at any spacing give 1, 4, 2, ..., 4, 1 to rounding', () => {
    fc.assert(
      fc.property(finite(-50, 50), finite(0.05, 20), fc.integer({ min: 1, max: 15 }), (a, h, pairs) => {
        const count = 2 * pairs + 1;
        const { spacing, multipliers } = simpsonMultipliers(evenly(a, h, count));
        expect(spacing).toBeRelClose(h, 1e-12); // one of the actual intervals: a + k h rounds by ulps of a
        multipliers.forEach((m, k) => {
          const trade = k === 0 || k === count - 1 ? 1 : k % 2 === 1 ? 4 : 2;
          // a + k h rounds by ulps of a: with |a| / h up to 1000 an interval is off by
          // ~1e-13 of itself, and a multiplier by a few times that.
          expect(m, `multiplier ${k}`).toBeRelClose(trade, 1e-11);
        });
      }),
    );
  });

  test('half stations at both ends give 1/2, 2, 1 1/2, 4, 2, ..., 2, 4, 1 1/2, 2, 1/2', () => {
    // Stations 0, 1/2, 1, 2, ..., 9, 9 1/2, 10: the end panels have half the common
    // interval, so their 1, 4, 1 count for half (h/2 over h is 1/2).
    const x = [0, 0.5, 1, 2, 3, 4, 5, 6, 7, 8, 9, 9.5, 10];
    const { spacing, multipliers } = simpsonMultipliers(x);
    expect(spacing).toBe(1);
    expect(Array.from(multipliers)).toEqual([0.5, 2, 1.5, 4, 2, 4, 2, 4, 2, 4, 1.5, 2, 0.5]);
  });

  test('multipliers times h/3 are the weights, and the weights sum to the length', () => {
    // The weights integrate the constant 1 exactly, so they sum to b - a (any rule).
    fc.assert(
      fc.property(unevenAbscissae(3, 25), (x) => {
        const w = simpsonWeights(x);
        const { spacing, multipliers } = simpsonMultipliers(x);
        const length = x[x.length - 1]! - x[0]!;
        expect(w.reduce((s, v) => s + v, 0)).toBeRelClose(length, ROUNDING);
        multipliers.forEach((m, k) => expect(m * (spacing / 3)).toBeRelClose(w[k]!, ROUNDING, ROUNDING * length));
      }),
    );
  });
});

describe('strided views', () => {
  test('integrating a column of a row-major table in place equals integrating a copy of it', () => {
    // A waterline of an offsets table (stations x waterlines, row-major) is the view
    // with stride = number of waterlines and offset = its column.
    fc.assert(
      fc.property(
        unevenAbscissae(3, 20),
        fc.integer({ min: 1, max: 8 }),
        fc.infiniteStream(finite(0, 10)),
        fc.nat(),
        (x, columns, cells, pick) => {
          const rows = x.length;
          const table = new Float64Array(rows * columns);
          const it = cells[Symbol.iterator]();
          for (let i = 0; i < table.length; i++) table[i] = it.next().value as number;
          const col = pick % columns;
          const copy = Array.from({ length: rows }, (_, r) => table[r * columns + col]!);
          const w = simpsonWeights(x);
          expect(integrateWeighted(w, table, rows, columns, col)).toBe(simpson(x, copy));
        },
      ),
    );
  });

  test('simpson13 and simpson38 read strided views as they read plain arrays', () => {
    const columns = 3;
    const rows = 13; // odd, and 3k + 1
    const table = Float64Array.from({ length: rows * columns }, (_, i) => Math.sin(0.37 * i) + 2);
    for (let col = 0; col < columns; col++) {
      const copy = Array.from({ length: rows }, (_, r) => table[r * columns + col]!);
      expect(simpson13(0.25, table, rows, columns, col)).toBe(simpson13(0.25, copy));
      expect(simpson38(0.25, table, rows, columns, col)).toBe(simpson38(0.25, copy));
    }
  });
});

describe('degenerate and invalid counts', () => {
  test('simpson13 rejects an even number of ordinates and fewer than three', () => {
    for (const count of [0, 1, 2, 4, 6, 10]) {
      expect(() => simpson13(1, new Array<number>(count).fill(1))).toThrow(RangeError);
    }
    expect(() => simpson13(1, [1, 1, 1, 1])).toThrow(/odd number of ordinates/);
  });

  test('simpson38 rejects counts that are not 3k + 1', () => {
    for (const count of [0, 1, 2, 3, 5, 6, 8]) {
      expect(() => simpson38(1, new Array<number>(count).fill(1))).toThrow(RangeError);
    }
    expect(simpson38(1, [1, 1, 1, 1, 1, 1, 1])).toBeRelClose(6, ROUNDING);
  });

  test('no ordinates and one ordinate integrate to zero over no length; two make a trapezoid', () => {
    // As documented in core/quadrature/simpson.ts: 0 or 1 ordinates give no panel and zero weights.
    expect(simpsonPanels(0)).toEqual([]);
    expect(simpsonPanels(1)).toEqual([]);
    expect(simpsonPanels(2)).toEqual([{ start: 0, size: 2 }]);
    expect(Array.from(simpsonWeights([]))).toEqual([]);
    expect(Array.from(simpsonWeights([3]))).toEqual([0]);
    expect(simpson([], [])).toBe(0);
    expect(simpson([3], [7])).toBe(0);
    expect(Array.from(simpsonWeights([1, 4]))).toEqual([1.5, 1.5]);
    expect(simpson([1, 4], [2, 6])).toBe(12); // trapezoid: 3 * (2 + 6) / 2
    expect(integrateWeighted([], [])).toBe(0);
  });

  test('panels cover every interval once: first-rule pairs, then a 3/8 panel when the intervals are odd', () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 60 }), (count) => {
        const panels = simpsonPanels(count);
        let next = 0;
        for (const p of panels) {
          expect(p.start).toBe(next);
          next = p.start + p.size - 1;
        }
        expect(next).toBe(count - 1);
        expect(panels.filter((p) => p.size === 4).length).toBe((count - 1) % 2);
        expect(panels.filter((p) => p.size === 2).length).toBe(0);
      }),
    );
  });
});
