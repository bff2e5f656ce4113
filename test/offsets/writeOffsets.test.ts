/**
 * Writing offsets files, checked by reading them back (readOffsetsCsv) and against the
 * file layout of the conventions. Hulls here are random or invented for the tests.
 */
import { csvSafeText } from '../../core/common/csvSafe.js';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { isHalfbreadthError } from '../../core/common/errors.js';
import type { HullModel, Station } from '../../core/hull/hullModel.js';
import { checkHull } from '../../core/hull/hullRules.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { writeOffsetsCsv } from '../../core/offsets/writeOffsets.js';
import { relClose } from '../helpers/relClose.js';

/** Where two hulls differ, beyond `rel` relative in each length (an empty list when they agree). */
function differences(a: HullModel, b: HullModel, rel: number): string[] {
  const out: string[] = [];
  const num = (what: string, p: number | undefined, q: number | undefined): void => {
    if (p === undefined || q === undefined) {
      if (p !== q) out.push(`${what}: ${p} against ${q}`);
    } else if (!(p === q || relClose(p, q, { rel }))) out.push(`${what}: ${p} against ${q}`);
  };
  if (a.name !== b.name) out.push(`name: ${JSON.stringify(a.name)} against ${JSON.stringify(b.name)}`);
  num('ap', a.ap, b.ap);
  num('fp', a.fp, b.fp);
  if ((a.waterlines === undefined) !== (b.waterlines === undefined)) out.push('waterlines given in one only');
  if (a.waterlines !== undefined && b.waterlines !== undefined) {
    if (a.waterlines.length !== b.waterlines.length) out.push('waterline counts differ');
    else a.waterlines.forEach((z, k) => num(`waterline ${k}`, z, b.waterlines![k]));
  }
  if (a.stations.length !== b.stations.length) return [...out, 'station counts differ'];
  a.stations.forEach((s, i) => {
    const t = b.stations[i]!;
    num(`station ${i} x`, s.x, t.x);
    if (s.points.length !== t.points.length) {
      out.push(`station ${i} point counts differ`);
      return;
    }
    s.points.forEach((p, j) => {
      num(`station ${i} point ${j} y`, p.y, t.points[j]!.y);
      num(`station ${i} point ${j} z`, p.z, t.points[j]!.z);
      if (p.knuckle !== t.points[j]!.knuckle) out.push(`station ${i} point ${j} knuckle`);
    });
  });
  return out;
}

const length = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const cumulative = (start: number, gaps: readonly number[]): number[] => {
  const out = [start];
  for (const g of gaps) out.push(out[out.length - 1]! + g);
  return out;
};

/** Names that a metadata line holds as they are: no control characters or line breaks, no spaces at the ends. */
// Names a spreadsheet could read no formula out of (others are written with an apostrophe, see csvSafe.test.ts).
const names = fc.string({ maxLength: 40 }).filter((s) => !/[\p{Cc}\p{Zl}\p{Zp}]/u.test(s) && s === s.trim() && csvSafeText(`# name: ${s}`) === `# name: ${s}`);
const decimalUnits = fc.constantFrom('m' as const, 'mm' as const, 'ft' as const, 'in' as const);

const perpendiculars = (xs: readonly number[]) =>
  fc.record({ ap: fc.option(length(0, 5), { nil: undefined }), fp: fc.option(length(0, 5), { nil: undefined }) }).map(({ ap, fp }) => ({
    ap: ap === undefined ? undefined : xs[0]! - ap,
    fp: fp === undefined ? undefined : xs[xs.length - 1]! + fp,
  }));

/**
 * Random sound hulls in the grid form: each station a run of consecutive waterlines, at
 * least two; stations and waterlines at least `gap` m apart.
 */
const gridHullsApart = (gap: number) => fc.integer({ min: 2, max: 8 }).chain((nw) =>
  fc
    .record({
      name: names,
      waterlines: fc.tuple(length(-2, 2), fc.array(length(gap, 3), { minLength: nw - 1, maxLength: nw - 1 })).map(([z0, g]) => cumulative(z0, g)),
      xs: fc.tuple(length(-50, 50), fc.array(length(gap, 20), { minLength: 2, maxLength: 11 })).map(([x0, g]) => cumulative(x0, g)),
      runs: fc.array(
        fc.record({ start: fc.integer({ min: 0, max: nw - 2 }), count: fc.integer({ min: 2, max: nw }), ys: fc.array(length(0, 20), { minLength: nw, maxLength: nw }) }),
        { minLength: 12, maxLength: 12 },
      ),
    })
    .chain((h) => perpendiculars(h.xs).map((p) => ({ ...h, ...p }))),
).map(({ name, waterlines, xs, runs, ap, fp }): HullModel => {
  const stations: Station[] = xs.map((x, i) => {
    const r = runs[i]!;
    const count = Math.min(r.count, waterlines.length - r.start);
    return { x, points: Array.from({ length: count }, (_, j) => ({ y: r.ys[j]!, z: waterlines[r.start + j]!, knuckle: false })) };
  });
  const hull: HullModel = { name, waterlines, stations };
  if (ap !== undefined) hull.ap = ap;
  if (fp !== undefined) hull.fp = fp;
  return hull;
});
// Apart by more than the least spacing a hull may have (1 mm, PHYSICAL_LIMITS.minSpacing), rounding of the sums included.
const gridHulls = gridHullsApart(2e-3);

/** Random sound hulls in the points form: z rising through each station, knuckles anywhere. */
const pointsHulls = fc
  .record({
    name: names,
    xs: fc.tuple(length(-50, 50), fc.array(length(2e-3, 20), { minLength: 2, maxLength: 9 })).map(([x0, g]) => cumulative(x0, g)),
    sections: fc.array(
      fc.record({
        z0: length(-1, 3),
        gaps: fc.array(length(1e-3, 2), { minLength: 1, maxLength: 7 }),
        ys: fc.array(length(0, 15), { minLength: 8, maxLength: 8 }),
        knuckles: fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }),
      }),
      { minLength: 10, maxLength: 10 },
    ),
  })
  .chain((h) => perpendiculars(h.xs).map((p) => ({ ...h, ...p })))
  .map(({ name, xs, sections, ap, fp }): HullModel => {
    const stations: Station[] = xs.map((x, i) => {
      const s = sections[i]!;
      const zs = cumulative(s.z0, s.gaps);
      return { x, points: zs.map((z, j) => ({ y: s.ys[j]!, z, knuckle: s.knuckles[j]! })) };
    });
    const hull: HullModel = { name, stations };
    if (ap !== undefined) hull.ap = ap;
    if (fp !== undefined) hull.fp = fp;
    return hull;
  });

describe('round trips', () => {
  test('the random hulls are sound, so that a round trip can read them', () => {
    fc.assert(fc.property(gridHulls, (h) => checkHull(h).length === 0));
    fc.assert(fc.property(pointsHulls, (h) => checkHull(h).length === 0));
  });

  test('a grid hull written in metres reads back as the very same hull, in the grid form', () => {
    fc.assert(
      fc.property(gridHulls, (hull) => {
        const back = readOffsetsCsv(writeOffsetsCsv(hull));
        expect(back.form).toBe('grid');
        expect(back.units).toBe('m');
        expect(differences(back.hull, hull, 0)).toEqual([]);
      }),
    );
  });

  test('a grid hull written in mm, ft or in reads back to 1e-12 relative, in the grid form', () => {
    fc.assert(
      fc.property(gridHulls, decimalUnits, (hull, units) => {
        const back = readOffsetsCsv(writeOffsetsCsv(hull, { units }));
        expect(back.form).toBe('grid');
        expect(back.units).toBe(units);
        // A length is divided by the unit's factor on writing and multiplied on reading:
        // two roundings of about 1.1e-16 each, far inside 1e-12.
        expect(differences(back.hull, hull, 1e-12)).toEqual([]);
      }),
    );
  });

  test('a points hull written in any decimal unit reads back to 1e-12 relative, knuckles kept, in the points form', () => {
    fc.assert(
      fc.property(pointsHulls, fc.constantFrom('m' as const, 'mm' as const, 'ft' as const, 'in' as const), (hull, units) => {
        const back = readOffsetsCsv(writeOffsetsCsv(hull, { units }));
        expect(back.form).toBe('points');
        expect(differences(back.hull, hull, 1e-12)).toEqual([]);
      }),
    );
  });

  test('a grid hull may be written in the points form on request and reads back without waterlines', () => {
    fc.assert(
      fc.property(gridHulls, (hull) => {
        const back = readOffsetsCsv(writeOffsetsCsv(hull, { form: 'points' }));
        expect(back.form).toBe('points');
        const { waterlines: _dropped, ...rest } = hull;
        expect(differences(back.hull, rest, 0)).toEqual([]);
      }),
    );
  });
});

describe('the file written', () => {
  const small: HullModel = {
    name: 'small grid',
    ap: 0,
    fp: 2,
    waterlines: [0, 0.5, 1],
    stations: [
      { x: 0, points: [{ y: 0.3, z: 0.5, knuckle: false }, { y: 0.4, z: 1, knuckle: false }] },
      { x: 1, points: [{ y: 0, z: 0, knuckle: false }, { y: 0.5, z: 0.5, knuckle: false }, { y: 0.6, z: 1, knuckle: false }] },
      { x: 2, points: [{ y: 0, z: 0, knuckle: false }, { y: 0.2, z: 0.5, knuckle: false }] },
    ],
  };

  test('the file starts with the caution as a comment line, then the metadata and the table of the conventions', () => {
    const lines = writeOffsetsCsv(small).split('\n');
    expect(lines[0]).toBe(`# ${CAUTION}`);
    expect(lines[0]).toMatch(/^# Caution: /);
    // The grid layout of the conventions: x then the heights; leading blanks below the
    // keel, rows ending at the deck edge.
    expect(lines.slice(1)).toEqual(['# name: small grid', '# units: m', '# ap: 0', '# fp: 2', 'x,0,0.5,1', '0,,0.3,0.4', '1,0,0.5,0.6', '2,0,0.2', '']);
  });

  test('the points form lists x, y, z and knuckle, one point a row', () => {
    const lines = writeOffsetsCsv(small, { form: 'points', units: 'mm' }).split('\n');
    expect(lines.slice(2, 5)).toEqual(['# units: mm', '# ap: 0', '# fp: 2000']);
    expect(lines.slice(5, 8)).toEqual(['x,y,z,knuckle', '0,300,500,0', '0,400,1000,0']);
  });

  test('a name with line breaks and control characters stays on its one line, with spaces for them', () => {
    const hull = { ...small, name: 'Tern\nyard no. 7\r\nrev\tB\u0000\u2028x ' };
    const text = writeOffsetsCsv(hull);
    // caution, name, units, ap, fp, header, three stations and the final newline.
    expect(text.split('\n')).toHaveLength(10);
    expect(readOffsetsCsv(text).hull.name).toBe('Tern yard no. 7  rev B  x');
  });

  test('a name that looks like metadata or a formula stays inside the name', () => {
    const hull = { ...small, name: '=1+1 # units: mm' };
    const back = readOffsetsCsv(writeOffsetsCsv(hull));
    expect(back.hull.name).toBe('=1+1 # units: mm');
    expect(back.units).toBe('m');
  });

  test('a hull with a knuckle is written in the points form', () => {
    const hull = structuredClone(small);
    hull.stations[1]!.points[1]!.knuckle = true;
    expect(readOffsetsCsv(writeOffsetsCsv(hull)).form).toBe('points');
  });

  test('a hull with a point off the tabulated heights is written in the points form', () => {
    const hull = structuredClone(small);
    hull.stations[2]!.points[1]!.z = 0.6;
    expect(readOffsetsCsv(writeOffsetsCsv(hull)).form).toBe('points');
  });

  test('asking for a grid of a hull that does not fit one is refused with the reason', () => {
    const hull = structuredClone(small);
    delete hull.waterlines;
    let caught: unknown;
    try {
      writeOffsetsCsv(hull, { form: 'grid' });
    } catch (e) {
      caught = e;
    }
    expect(isHalfbreadthError(caught)).toBe(true);
    if (!isHalfbreadthError(caught)) return;
    expect(caught.code).toBe('HYD_BAD_ARGUMENT');
    expect(caught.issues[0]!.path).toEqual(['form']);
    expect(caught.message).toContain('no waterlines');
  });
});

describe('feet-inches-eighths', () => {
  const INCH = 0.0254; // m, exact (international yard and pound agreement, 1959)

  test('lengths on whole sixteenths of an inch are written as lofting figures and read back', () => {
    const hull: HullModel = {
      name: 'on sixteenths',
      waterlines: [0, 6 * INCH, 12 * INCH],
      stations: [
        { x: 0, points: [{ y: 10.5 * INCH, z: 6 * INCH, knuckle: false }, { y: 13.5 * INCH, z: 12 * INCH, knuckle: false }] },
        { x: 40.6875 * INCH, points: [{ y: 0, z: 0, knuckle: false }, { y: (18 + 3 / 16) * INCH, z: 6 * INCH, knuckle: false }] },
        { x: 96 * INCH, points: [{ y: 0, z: 0, knuckle: false }, { y: 9.375 * INCH, z: 6 * INCH, knuckle: false }] },
      ],
    };
    const text = writeOffsetsCsv(hull, { units: 'ft-in-8' });
    // 40 11/16 in = 3 ft 4 11/16 in; 18 3/16 in = 1 ft 6 3/16 in; 9 3/8 in = 9 3/8 in.
    expect(text).toContain('\nx,0-0-0,0-6-0,1-0-0\n0-0-0,,0-10-4,1-1-4\n3-4-5+,0-0-0,1-6-1+\n8-0-0,0-0-0,0-9-3\n');
    const back = readOffsetsCsv(text);
    expect(back.units).toBe('ft-in-8');
    expect(differences(back.hull, hull, 1e-12)).toEqual([]);
  });

  test('other lengths are rounded to the nearest sixteenth of an inch', () => {
    fc.assert(
      // Lengths 3 mm apart stay apart when rounded to sixteenths (1/16 in = 1.5875 mm).
      fc.property(gridHullsApart(3e-3), (hull) => {
        const back = readOffsetsCsv(writeOffsetsCsv(hull, { units: 'ft-in-8' })).hull;
        const far = (a: number, b: number): boolean => Math.abs(a - b) > INCH / 32 + 1e-12;
        back.stations.forEach((s, i) => {
          expect(far(s.x, hull.stations[i]!.x)).toBe(false);
          s.points.forEach((p, j) => expect(far(p.y, hull.stations[i]!.points[j]!.y)).toBe(false));
        });
      }),
      { numRuns: 50 },
    );
  });
});
