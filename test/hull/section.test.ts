/**
 * Fitted half-sections (core/hull/section.ts) against closed-form areas, moments and girths.
 *
 * The expected values are worked in each test from the section's defining formula:
 * areas and moments are integrals of polynomials (any calculus text); the girth of a
 * straight piece is its length, and of a parabola z -> a z^2 the arc length
 * (u sqrt(1 + u^2) + asinh u) / (4a), u = 2 a z (standard integral; from memory, and
 * checked against its derivative below). A section's area is of both sides; its
 * momentYHalf is of one side, as core/hull/section.ts documents.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { Section, type SectionPointInput } from '../../core/hull/section.js';
import { finite, polyIntegral, polyMul, polyScale, polyValue, unevenAbscissae } from '../fixtures/polynomials.js';
import '../helpers/relClose.js';

// Integrals of polynomial pieces are taken by Gauss-Legendre quadrature that is exact
// for them: what is left is rounding, a few ulps of the integrand's scale.
const ROUNDING = 1e-11;

/** A quadratic half-breadth y(z) >= 0 on uneven heights, as section points. */
const quadraticSection = fc
  .record({
    c: fc.tuple(finite(0, 3), finite(-1, 3), finite(-1, 1)),
    z: unevenAbscissae(3, 16).map((z) => z.map((v) => v + 5)), // heights from 0 up
  })
  .filter(({ c, z }) => {
    // Keep y >= 0 over the section: check both ends and the vertex if it lies inside.
    const [c0, c1, c2] = c;
    const lo = z[0]!;
    const hi = z[z.length - 1]!;
    const at = [lo, hi];
    if (c2 !== 0) {
      const v = -c1 / (2 * c2);
      if (v > lo && v < hi) at.push(v);
    }
    return at.every((t) => c0 + c1 * t + c2 * t * t >= 0);
  });

const pointsOf = (c: readonly number[], z: readonly number[]): SectionPointInput[] => z.map((zk) => ({ y: polyValue(c, zk), z: zk }));

describe('half-breadth and integrals of a smooth section', () => {
  test('the half-breadth at any height reproduces a quadratic y(z), on and between the points', () => {
    fc.assert(
      fc.property(quadraticSection, fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 10 }), ({ c, z }, fractions) => {
        const s = new Section(pointsOf(c, z));
        const lo = z[0]!;
        const hi = z[z.length - 1]!;
        const scale = polyScale(c, lo, hi) / (hi - lo);
        for (const zk of z) expect(s.halfBreadthAt(zk)).toBeRelClose(polyValue(c, zk), ROUNDING, ROUNDING * scale);
        for (const f of fractions) {
          const zq = lo + f * (hi - lo);
          expect(s.halfBreadthAt(zq)).toBeRelClose(polyValue(c, zq), ROUNDING, ROUNDING * scale);
        }
      }),
    );
  });

  test('area and moments to any waterline are exact for a quadratic y(z)', () => {
    // Both sides: area = 2 int y dz, momentZ = 2 int y z dz; one side: momentYHalf =
    // int y^2 / 2 dz; all from the keel (lowest point) to the waterline.
    fc.assert(
      fc.property(quadraticSection, fc.double({ min: 0, max: 1, noNaN: true }), ({ c, z }, f) => {
        const s = new Section(pointsOf(c, z));
        const lo = z[0]!;
        const hi = z[z.length - 1]!;
        const d = lo + f * (hi - lo);
        const v = s.evaluate(d);
        if (!(d > lo)) {
          expect(v.immersed).toBe(false);
          expect(v.area).toBe(0);
          return;
        }
        const yz = polyMul(c, [0, 1]);
        const yy = polyMul(c, c).map((k) => k / 2);
        expect(v.immersed).toBe(true);
        expect(v.halfBreadth).toBeRelClose(polyValue(c, d), ROUNDING, ROUNDING * polyScale(c, lo, hi));
        expect(v.area).toBeRelClose(2 * polyIntegral(c, lo, d), ROUNDING, ROUNDING * polyScale(c, lo, hi));
        expect(v.momentZ).toBeRelClose(2 * polyIntegral(yz, lo, d), ROUNDING, ROUNDING * polyScale(yz, lo, hi));
        expect(v.momentYHalf).toBeRelClose(polyIntegral(yy, lo, d), ROUNDING, ROUNDING * polyScale(yy, lo, hi));
      }),
    );
  });

  test('a section below its keel is dry, and above its deck edge is taken whole', () => {
    const c = [0.2, 1, -0.1];
    const z = [0.5, 0.8, 1.4, 2, 2.3];
    const s = new Section(pointsOf(c, z));
    expect(s.evaluate(0.5)).toMatchObject({ immersed: false, area: 0, momentZ: 0, girth: 0 });
    expect(s.evaluate(0.1)).toMatchObject({ immersed: false, area: 0 });
    expect(s.evaluate(3).area).toBeRelClose(2 * polyIntegral(c, 0.5, 2.3), ROUNDING);
    expect(s.evaluate(3).area).toBe(s.evaluate(2.3).area);
    expect(s.halfBreadthAt(0.4)).toBeNaN();
    expect(s.halfBreadthAt(2.4)).toBeNaN();
  });

  test('the girth of a parabolic section matches the arc length of the parabola', () => {
    // y = a z^2 from the keel: half girth = int sqrt(1 + (2 a z)^2) dz (plus no flat,
    // since y = 0 at the keel). The arc length of a piece is five-point Gauss-Legendre
    // on one panel per piece (not exact for a square root): on this arc it comes within
    // about 1.5e-9, so 1e-8 relative is the quadrature's error with a margin, and nothing
    // looser (a millimetre in a hundred kilometres of girth).
    const a = 0.8;
    const arc = (zz: number): number => {
      const u = 2 * a * zz;
      return (u * Math.sqrt(1 + u * u) + Math.asinh(u)) / (4 * a);
    };
    // The closed form is checked against its own derivative, so a slip in it cannot pass.
    const dz = 1e-5;
    expect((arc(0.7 + dz) - arc(0.7 - dz)) / (2 * dz)).toBeRelClose(Math.hypot(1, 2 * a * 0.7), 1e-8);
    const z = [0, 0.25, 0.5, 0.75, 1, 1.25, 1.5];
    const s = new Section(z.map((zk) => ({ y: a * zk * zk, z: zk })));
    for (const d of [0.5, 1, 1.5, 0.3, 1.1]) {
      const v = s.evaluate(d);
      expect(v.girth, `girth to ${d}`).toBeRelClose(2 * arc(d), 1e-8);
      expect(v.wettedGirth, 'with no slope factors set, the wetted girth is the girth').toBeRelClose(v.girth, 1e-15);
    }
  });

  test('the girth runs on without a step as a draft crosses a tabulated height or reaches the deck edge', () => {
    // Arc length is a continuous function of the draft (elementary calculus); a step at
    // a point would be a quadrature taken one way below it and another way above.
    // A steep, strongly curved section, where a step would show most: y = 2 sqrt(z).
    const z = [0, 0.05, 0.14, 0.19, 0.24];
    const s = new Section(z.map((zk) => ({ y: 2 * Math.sqrt(zk), z: zk })));
    for (const zk of z.slice(1)) {
      const below = s.evaluate(zk * (1 - 1e-13)).girth;
      const at = s.evaluate(zk).girth;
      expect(below, `just under z = ${zk}`).toBeRelClose(at, 1e-11);
      if (zk < z[z.length - 1]!) expect(s.evaluate(zk * (1 + 1e-13)).girth, `just over z = ${zk}`).toBeRelClose(at, 1e-11);
    }
  });
});

describe('corners, flats and closures', () => {
  // A chine section: bottom straight from the keel (0, 0) to the chine (1.2, 0.3), a
  // deadrise of atan(0.3 / 1.2) = 14 degrees, then a vertical side y = 1.2 up to 1.2.
  // Half-section per side: y = 4z below the chine, y = 1.2 above.
  const chine: SectionPointInput[] = [
    { y: 0, z: 0 },
    { y: 1.2, z: 0.3, knuckle: true },
    { y: 1.2, z: 0.5 },
    { y: 1.2, z: 0.8 },
    { y: 1.2, z: 1.2 },
  ];
  const chineArea = (d: number): number => (d <= 0.3 ? 2 * (2 * d * d) : 2 * (0.18 + 1.2 * (d - 0.3)));
  const chineMomentZ = (d: number): number => (d <= 0.3 ? 2 * ((4 * d ** 3) / 3) : 2 * (0.036 + 0.6 * (d * d - 0.09)));
  const chineGirth = (d: number): number => (d <= 0.3 ? 2 * d * Math.sqrt(17) : 2 * (0.3 * Math.sqrt(17) + (d - 0.3)));
  const drafts = [0.1, 0.25, 0.3, 0.45, 0.7, 1.0, 1.2];

  test('a knuckle is not smoothed across: a chine section is exact below, at and above the chine', () => {
    const s = new Section(chine);
    for (const d of drafts) {
      const v = s.evaluate(d);
      expect(v.area, `area to ${d}`).toBeRelClose(chineArea(d), ROUNDING);
      expect(v.momentZ, `momentZ to ${d}`).toBeRelClose(chineMomentZ(d), ROUNDING);
      expect(v.girth, `girth to ${d}`).toBeRelClose(chineGirth(d), ROUNDING);
      expect(v.halfBreadth, `half-breadth at ${d}`).toBeRelClose(Math.min(4 * d, 1.2), ROUNDING);
    }
  });

  test('without the knuckle mark the same points are smoothed across the chine, and the area is wrong', () => {
    // The other side of the test above: the first panel then fits a parabola through
    // (0, 0), (1.2, 0.3), (1.2, 0.5), so the mark is what makes the chine exact.
    const s = new Section(chine.map((p) => ({ y: p.y, z: p.z })));
    const err = Math.abs(s.evaluate(0.25).area - chineArea(0.25)) / chineArea(0.25);
    expect(err).toBeGreaterThan(0.01);
  });

  test('a flat bottom given as two points at the same height works, with or without a knuckle at the bilge', () => {
    // A box section of half-breadth 1 given as points from the centreline: (0, 0),
    // (1, 0), then up the side. Area 2d, momentZ d^2, momentYHalf d/2, girth 2(1 + d).
    for (const knuckle of [true, false]) {
      const s = new Section([{ y: 0, z: 0 }, { y: 1, z: 0, knuckle }, { y: 1, z: 0.5 }, { y: 1, z: 1 }]);
      for (const d of [0.2, 0.5, 0.77, 1]) {
        const v = s.evaluate(d);
        const what = `${knuckle ? 'with' : 'without'} knuckle, draft ${d}`;
        expect(v.area, what).toBeRelClose(2 * d, ROUNDING);
        expect(v.momentZ, what).toBeRelClose(d * d, ROUNDING);
        expect(v.momentYHalf, what).toBeRelClose(d / 2, ROUNDING);
        expect(v.girth, what).toBeRelClose(2 * (1 + d), ROUNDING);
        expect(v.halfBreadth, what).toBeRelClose(1, ROUNDING);
      }
      expect(s.halfBreadthAt(0.3)).toBeRelClose(1, ROUNDING);
    }
  });

  test('a flat of bottom drawn as three or more points, unevenly spaced, is fitted along its chord length', () => {
    // The run's heights do not rise (0, 0, 0 ...), so the section is fitted with the chord
    // length as parameter (y(t), z(t)); for points on straight lines that fit is the lines
    // themselves. A box section of half-breadth 1: area 2d, momentZ d^2, girth 2(1 + d),
    // whether the bilge is marked a knuckle or the side continues the same run.
    for (const knuckle of [true, false]) {
      const s = new Section([
        { y: 0, z: 0 },
        { y: 0.3, z: 0 },
        { y: 1, z: 0, knuckle },
        { y: 1, z: 0.2 },
        { y: 1, z: 0.9 },
        { y: 1, z: 1.2 },
        { y: 1, z: 2 },
      ]);
      for (const d of [0.1, 0.2, 0.55, 0.9, 1.7]) {
        const v = s.evaluate(d);
        const what = `${knuckle ? 'with' : 'without'} knuckle, draft ${d}`;
        expect(v.area, what).toBeRelClose(2 * d, ROUNDING);
        expect(v.momentZ, what).toBeRelClose(d * d, ROUNDING);
        expect(v.girth, what).toBeRelClose(2 * (1 + d), ROUNDING);
        expect(v.halfBreadth, what).toBeRelClose(1, ROUNDING);
      }
      expect(s.yBottom).toBe(1);
    }
  });

  test('a flat of bottom running on into a round bilge in one run, unevenly spaced, follows the circle', () => {
    // Flat of half-width 1 on the baseline, then a quarter circle of radius 1 centred at
    // (y, z) = (1, 1), with no knuckle between: one run whose heights do not rise at first,
    // fitted along its chord length. Closed forms (any table of integrals): with
    // c = (R - d)/R, the area beside the circle up to d is (R^2/2)(pi/2 - asin c - c sqrt(1 - c^2))
    // and its arc R acos c. Points are placed at uneven angles on purpose: the chord length
    // follows them, where an even parameter would bend the fitted curve (1.5 % off).
    const angles = [0.1, 0.5, 0.7, 1.2, Math.PI / 2];
    const s = new Section([{ y: 0, z: 0 }, { y: 0.4, z: 0 }, { y: 1, z: 0 }, ...angles.map((t) => ({ y: 1 + Math.sin(t), z: 1 - Math.cos(t) }))]);
    for (const d of [0.3, 0.6, 1]) {
      const c = 1 - d;
      const area = d + 0.5 * (Math.PI / 2 - Math.asin(c) - c * Math.sqrt(1 - c * c));
      // Measured 4e-4 of the area and 3e-4 of the girth at worst (the parabolas' own error
      // on a circle at these spacings); the bound is about twice that.
      expect(s.evaluate(d).area / 2).toBeRelClose(area, 1e-3);
      expect(s.evaluate(d).girth / 2).toBeRelClose(1 + Math.acos(c), 1e-3);
    }
  });

  test('the flat of bottom closes to the centreline when the lowest half-breadth is above zero', () => {
    // Grid-form box: the lowest point is (1, 0), so the bottom runs flat from there to
    // the centreline: it adds to the girth and bounds the area, as for the box above.
    const box = new Section([{ y: 1, z: 0 }, { y: 1, z: 0.5 }, { y: 1, z: 1 }]);
    const v = box.evaluate(0.6);
    expect(v.area).toBeRelClose(1.2, ROUNDING);
    expect(v.girth).toBeRelClose(2 * (1 + 0.6), ROUNDING);
    expect(v.momentYHalf).toBeRelClose(0.3, ROUNDING);
    // A flat of 0.5 under a 45-degree side y = 0.5 + z: area 2 (0.5 d + d^2 / 2),
    // girth 2 (0.5 + d sqrt 2).
    const flared = new Section([{ y: 0.5, z: 0 }, { y: 1, z: 0.5 }, { y: 1.5, z: 1 }]);
    const d = 0.8;
    const w = flared.evaluate(d);
    expect(w.area).toBeRelClose(2 * (0.5 * d + (d * d) / 2), ROUNDING);
    expect(w.girth).toBeRelClose(2 * (0.5 + d * Math.SQRT2), ROUNDING);
    expect(flared.yKeel).toBe(0.5);
  });

  test('the girth of a rectangle is 2 (b + d) and of a V is 2 d sqrt(1 + k^2)', () => {
    fc.assert(
      fc.property(finite(0.1, 10), finite(0.1, 10), fc.double({ min: 0.01, max: 1, noNaN: true }), fc.integer({ min: 2, max: 12 }), (b, depth, f, n) => {
        const z = Array.from({ length: n }, (_, k) => (depth * k) / (n - 1));
        const d = f * depth;
        const rect = new Section(z.map((zk) => ({ y: b, z: zk })));
        expect(rect.evaluate(d).girth).toBeRelClose(2 * (b + d), ROUNDING);
        const k = b / depth; // V of half-breadth b at the top: y = k z
        const vee = new Section(z.map((zk) => ({ y: k * zk, z: zk })));
        expect(vee.evaluate(d).girth).toBeRelClose(2 * d * Math.sqrt(1 + k * k), ROUNDING);
        expect(vee.evaluate(d).area).toBeRelClose(k * d * d, ROUNDING);
      }),
    );
  });
});
