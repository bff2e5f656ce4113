/**
 * Properties of the hydrostatic table that hold for any hull, checked on random but
 * valid hulls (fast-check): random station and waterline counts and spacings, a random
 * smooth half-breadth function, a keel that may rise forward (blank cells below it),
 * and decks that may stop a waterline short.
 *
 * Sources: the scaling laws are dimensional analysis (a length scales by k, an area by
 * k^2, a volume by k^3, a second moment of area by k^4); translation, density and the
 * box's VCB = T/2 follow from the definitions of the particulars (E. C. Tupper,
 * Introduction to Naval Architecture, 5th ed., ch. 3; from memory). The grid and
 * points forms of one hull are one surface by the project's conventions ("Offsets
 * files"), so they must give one table. Common practice, no source beyond these.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { DENSITY_RANGE } from '../../core/common/constants.js';
import { HYDROSTATIC_FIELDS, type HydrostaticField, type HydrostaticRow } from '../../core/upright/hydrostaticFields.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { writeOffsetsCsv } from '../../core/offsets/writeOffsets.js';
import { finite } from '../fixtures/polynomials.js';
import '../helpers/relClose.js';

/** A table of offsets: station positions, waterline heights, half-breadths (undefined = blank). */
interface Grid {
  readonly xs: number[];
  readonly zs: number[];
  readonly cells: (number | undefined)[][];
}

/** Strictly increasing values from `start`, one per gap. */
const cumulative = (start: number, gaps: readonly number[]): number[] => {
  const out = [start];
  for (const g of gaps) out.push(out[out.length - 1]! + g);
  return out;
};

/**
 * A random hull's offsets. Half-breadth (B/2) (1 - a xi^2)(1 + b xi)(s + (1 - s) zeta^p)
 * with xi = 2u - 1 along the length and zeta = z / D up the section: positive, smooth
 * inside, a flat of bottom when s > 0, a vertical tangent at the keel when p < 1.
 * The keel rises forward over up to half the waterlines; a station's deck may stop one
 * waterline short. Every station keeps at least two defined cells.
 */
const randomGrid: fc.Arbitrary<Grid> = fc
  .record({
    x0: finite(-50, 50),
    xGaps: fc.array(finite(0.2, 10), { minLength: 2, maxLength: 24 }),
    zGaps: fc.array(finite(0.05, 1.5), { minLength: 2, maxLength: 14 }),
    B: finite(0.5, 30),
    a: finite(0, 0.95),
    b: finite(-0.5, 0.5),
    s: finite(0, 1),
    p: finite(0.3, 3),
    keelRise: finite(0, 0.5),
    shortDecks: fc.array(fc.boolean(), { minLength: 25, maxLength: 25 }),
  })
  .map((r) => {
    const xs = cumulative(r.x0, r.xGaps);
    const zs = cumulative(0, r.zGaps);
    const L = xs[xs.length - 1]! - xs[0]!;
    const D = zs[zs.length - 1]!;
    const nw = zs.length;
    const cells = xs.map((x, i) => {
      const u = (x - xs[0]!) / L;
      const xi = 2 * u - 1;
      const blanksBelow = Math.min(nw - 2, Math.floor(r.keelRise * u * u * nw));
      const blanksAbove = r.shortDecks[i] === true && nw - blanksBelow > 2 ? 1 : 0;
      return zs.map((z, k) =>
        k < blanksBelow || k >= nw - blanksAbove ? undefined : (r.B / 2) * (1 - r.a * xi * xi) * (1 + r.b * xi) * (r.s + (1 - r.s) * (z / D) ** r.p),
      );
    });
    return { xs, zs, cells };
  });

/** The grid as a hull model in the grid form: one point per defined cell, no knuckles. */
function gridModel(g: Grid): HullModel {
  return {
    name: 'random hull',
    waterlines: [...g.zs],
    stations: g.xs.map((x, i) => ({
      x,
      points: g.zs.flatMap((z, k) => {
        const y = g.cells[i]![k];
        return y === undefined ? [] : [{ y, z, knuckle: false }];
      }),
    })),
  };
}

/** Random drafts inside the hull (above the lowest keel, at or below the lowest deck edge). */
const draftsFor = (hull: HullModel, fractions: readonly number[]): number[] => {
  const p = prepareHull(hull);
  return fractions.map((f) => p.lowestKeel + (p.lowestDeck - p.lowestKeel) * f);
};
const fractions = fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 1, maxLength: 4 });

const table = (hull: HullModel, drafts: readonly number[], density = 1.025): HydrostaticRow[] => hydrostaticTable(prepareHull(hull), drafts, density);

/** The hull's size: its greatest extent in x, y or z, m. */
function sizeOf(g: Grid): number {
  let yMax = 0;
  for (const row of g.cells) for (const y of row) if (y !== undefined && y > yMax) yMax = y;
  return Math.max(g.xs[g.xs.length - 1]! - g.xs[0]!, g.zs[g.zs.length - 1]! - g.zs[0]!, 2 * yMax);
}

/**
 * Each field of a and b agree to `rel` (NaN only with NaN), naming the field that does
 * not. A field that comes out near zero (iL of a waterplane cut at one station) needs
 * an absolute floor: rounding on the scale of the hull, size^power for its dimension.
 */
function expectRowsClose(a: HydrostaticRow, b: HydrostaticRow, rel: number, what: string, size: number): void {
  for (const { key } of HYDROSTATIC_FIELDS) {
    if (Number.isNaN(b[key])) expect(a[key], `${what}: ${key}`).toBeNaN();
    else expect(a[key], `${what}: ${key}`).toBeRelClose(b[key], rel, 1e-12 * size ** POWER[key]);
  }
}

// The power of the length scale k by which each field scales.
const POWER: Record<HydrostaticField, number> = {
  draft: 1,
  volume: 3,
  displacement: 3,
  lcb: 1,
  vcb: 1,
  waterplaneArea: 2,
  lcf: 1,
  iT: 4,
  iL: 4,
  bmt: 1,
  bml: 1,
  kmt: 1,
  kml: 1,
  tpc: 2,
  mct1cm: 3, // displacement x BMl / LBP: k^3 k / k
  lwl: 1,
  bwl: 1,
  am: 2,
  cb: 0,
  cm: 0,
  cp: 0,
  cwp: 0,
  wettedSurface: 2,
};
// Scaling, moving and rewriting a hull change its numbers only by rounding: the fits and
// rules are linear in the coordinates. 1e-9 relative is rounding with ample room.
const ROUNDING = 1e-9;

describe('scaling and moving a hull', () => {


  test('scaling every length by k scales volume by k^3, areas by k^2, second moments by k^4, lengths by k', () => {
    fc.assert(
      fc.property(randomGrid, fractions, finite(0.1, 10), (g, f, k) => {
        const hull = gridModel(g);
        const scaled = gridModel({ xs: g.xs.map((v) => v * k), zs: g.zs.map((v) => v * k), cells: g.cells.map((row) => row.map((y) => (y === undefined ? y : y * k))) });
        const drafts = draftsFor(hull, f);
        const base = table(hull, drafts);
        const big = table(scaled, drafts.map((d) => d * k));
        base.forEach((row, i) => {
          const want = Object.fromEntries(HYDROSTATIC_FIELDS.map(({ key }) => [key, row[key] * k ** POWER[key]])) as HydrostaticRow;
          expectRowsClose(big[i]!, want, ROUNDING, `scale ${k}`, k * sizeOf(g));
        });
      }),
    );
  });

  test('moving a hull along x by d moves LCB and LCF by d and leaves the rest unchanged', () => {
    fc.assert(
      fc.property(randomGrid, fractions, finite(-1000, 1000), (g, f, d) => {
        const hull = gridModel(g);
        const moved = gridModel({ ...g, xs: g.xs.map((v) => v + d) });
        const drafts = draftsFor(hull, f);
        const base = table(hull, drafts);
        const there = table(moved, drafts);
        const L = g.xs[g.xs.length - 1]! - g.xs[0]!;
        base.forEach((row, i) => {
          const got = there[i]!;
          // x itself loses ulps of |d| when moved: compare positions to a share of the
          // hull's length and the size of the move.
          const posTol = ROUNDING * (L + Math.abs(d) + Math.abs(g.xs[0]!));
          expect(got.lcb - d, 'lcb').toBeRelClose(row.lcb, 0, posTol);
          expect(got.lcf - d, 'lcf').toBeRelClose(row.lcf, 0, posTol);
          const { lcb: _a, lcf: _b, ...rest } = row;
          for (const key of Object.keys(rest) as HydrostaticField[]) {
            if (Number.isNaN(row[key])) expect(got[key], key).toBeNaN();
            else expect(got[key], key).toBeRelClose(row[key], ROUNDING, 1e-12 * sizeOf(g) ** POWER[key]);
          }
        });
      }),
    );
  });
});

describe('one hull in two forms', () => {
  /** The grid written as a grid-form offsets file, by hand (blank cells left empty). */
  const gridCsv = (g: Grid): string =>
    ['# name: random hull', '# units: m', ['x', ...g.zs.map(String)].join(','), ...g.xs.map((x, i) => [String(x), ...g.cells[i]!.map((y) => (y === undefined ? '' : String(y)))].join(','))].join('\n');

  /**
   * The same hull as a points-form file, by hand, with the flat of bottom drawn out:
   * where a station's lowest half-breadth is above zero, a point on the centreline at
   * that height and a knuckle at the bilge corner, which the grid form implies.
   */
  const pointsCsv = (g: Grid): string => {
    const lines = ['# name: random hull', '# units: m', 'x,y,z,knuckle'];
    g.xs.forEach((x, i) => {
      const defined = g.zs.flatMap((z, k) => (g.cells[i]![k] === undefined ? [] : [{ y: g.cells[i]![k]!, z }]));
      defined.forEach((p, j) => {
        if (j === 0 && p.y > 0) {
          lines.push(`${x},0,${p.z},0`);
          lines.push(`${x},${p.y},${p.z},1`);
        } else lines.push(`${x},${p.y},${p.z},0`);
      });
    });
    return lines.join('\n');
  };

  test('the grid form and the points form (flat of bottom drawn out) read to the same table', () => {
    fc.assert(
      fc.property(randomGrid, fractions, (g, f) => {
        const grid = readOffsetsCsv(gridCsv(g));
        const points = readOffsetsCsv(pointsCsv(g));
        expect(grid.form).toBe('grid');
        expect(points.form).toBe('points');
        const drafts = draftsFor(grid.hull, f);
        const a = table(grid.hull, drafts);
        const b = table(points.hull, drafts);
        a.forEach((row, i) => expectRowsClose(b[i]!, row, ROUNDING, 'points vs grid', sizeOf(g)));
      }),
    );
  });

  test('a hull written by the offsets writer in the points form reads back to the same table', () => {
    fc.assert(
      fc.property(randomGrid, fractions, (g, f) => {
        const hull = gridModel(g);
        const back = readOffsetsCsv(writeOffsetsCsv(hull, { form: 'points' }));
        expect(back.form).toBe('points');
        const drafts = draftsFor(hull, f);
        const a = table(hull, drafts);
        const b = table(back.hull, drafts);
        a.forEach((row, i) => expectRowsClose(b[i]!, row, ROUNDING, 'written points vs model', sizeOf(g)));
      }),
    );
  });
});

describe('boxes and densities', () => {
  test('any box floats with VCB = draft / 2, whatever its stations and waterlines', () => {
    // A prism of rectangular section: its centroid is at half its immersed height.
    fc.assert(
      fc.property(
        finite(0, 100),
        fc.array(finite(0.1, 10), { minLength: 2, maxLength: 20 }),
        fc.array(finite(0.05, 2), { minLength: 1, maxLength: 12 }),
        finite(0.1, 40),
        fractions,
        (x0, xGaps, zGaps, B, f) => {
          const xs = cumulative(x0, xGaps);
          const zs = cumulative(0, zGaps);
          const hull = gridModel({ xs, zs, cells: xs.map(() => zs.map(() => B / 2)) });
          const drafts = f.map((v) => v * zs[zs.length - 1]!);
          table(hull, drafts).forEach((row, i) => expect(row.vcb, `draft ${drafts[i]}`).toBeRelClose(drafts[i]! / 2, 1e-12));
        },
      ),
    );
  });

  test('displacement, TPC and MCT 1 cm are proportional to density, and nothing else depends on it', () => {
    fc.assert(
      fc.property(randomGrid, fractions, finite(DENSITY_RANGE.min, DENSITY_RANGE.max), (g, f, rho) => {
        const hull = gridModel(g);
        const drafts = draftsFor(hull, f);
        const fresh = table(hull, drafts, 1);
        const other = table(hull, drafts, rho);
        fresh.forEach((row, i) => {
          const got = other[i]!;
          expect(got.displacement).toBeRelClose(rho * row.displacement, 1e-15);
          expect(got.displacement).toBeRelClose(rho * got.volume, 1e-15);
          expect(got.tpc).toBeRelClose(rho * row.tpc, 1e-15);
          expect(got.mct1cm).toBeRelClose(rho * row.mct1cm, 1e-15);
          for (const { key } of HYDROSTATIC_FIELDS) {
            if (key !== 'displacement' && key !== 'tpc' && key !== 'mct1cm') expect(Object.is(got[key], row[key]), key).toBe(true);
          }
        });
      }),
    );
  });
});

describe('form coefficients', () => {
  /**
   * A hull whose sections widen upward from the keel and whose fullest section stands at
   * amidships: half-breadth (B/2)(1 - a xi^2)(s + (1 - s) eta^p) at a height eta of the
   * depth above a keel k = K xi^2 (rocker, lowest amidships), p <= 1 so the sections
   * widen upward; stations mirrored about a station at amidships, at random spacing.
   * Each coefficient is a ratio of the hull to a figure that encloses such a hull (the
   * block, the midship rectangle, the prism on the midship section, the waterplane's
   * rectangle), so it lies in (0, 1] (definitions as in E. C. Tupper, Introduction to
   * Naval Architecture, 5th ed., ch. 2; from memory).
   */
  const widening = fc
    .record({
      gaps: fc.array(finite(0.2, 4), { minLength: 1, maxLength: 10 }),
      B: finite(0.5, 20),
      D: finite(0.5, 6),
      a: finite(0, 0.95),
      s: finite(0, 1),
      p: finite(0.3, 1),
      K: finite(0, 0.5),
      points: fc.integer({ min: 2, max: 9 }),
    })
    .map((r): HullModel => {
      const half = cumulative(0, r.gaps);
      const xs = [...half.slice(1).map((h) => -h).reverse(), ...half];
      const L = 2 * half[half.length - 1]!;
      const stations = xs.map((x) => {
        const xi = (2 * x) / L;
        const keel = r.K * r.D * xi * xi;
        const depth = r.D * (1 + r.K) - keel;
        const points = Array.from({ length: r.points }, (_, j) => {
          const eta = j / (r.points - 1);
          return { y: (r.B / 2) * (1 - r.a * xi * xi) * (r.s + (1 - r.s) * eta ** r.p), z: keel + depth * eta, knuckle: false };
        });
        return { x, points };
      });
      return { name: 'widening hull', stations };
    });

  test('on random hulls whose sections widen upward, Cb, Cm, Cp and Cwp lie in (0, 1]', () => {
    fc.assert(
      fc.property(widening, fractions, (hull, f) => {
        const p = prepareHull(hull);
        const drafts = f.map((v) => p.lowestKeel + (p.lowestDeck - p.lowestKeel) * (0.02 + 0.98 * v));
        for (const row of hydrostaticTable(p, drafts)) {
          for (const k of ['cb', 'cm', 'cp', 'cwp'] as const) {
            expect(row[k], `${k} at ${row.draft}`).toBeGreaterThan(0);
            expect(row[k], `${k} at ${row.draft}`).toBeLessThanOrEqual(1);
          }
        }
      }),
    );
  });
});
