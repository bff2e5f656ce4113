/**
 * The grid form's optional keel_z, deck_z and deck_y columns (the project's conventions,
 * "Grid form"): with them the grid describes the same hull as the points form; without
 * them nothing changes, and the reader notes where it took a keel at a tabulated
 * waterline. The yacht here is invented for the test, from formulae written below.
 */
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError, type Issue } from '../../core/common/errors.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { proportionWarnings } from '../../core/offsets/readingWarnings.js';
import { HYDROSTATIC_FIELDS } from '../../core/upright/hydrostaticFields.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { relativeError } from '../helpers/relClose.js';

const file = (...lines: string[]): string => lines.join('\n');

function issuesOf(text: string): readonly Issue[] {
  try {
    readOffsetsCsv(text);
  } catch (e) {
    if (isHalfbreadthError(e)) return e.issues;
    throw e;
  }
  throw new Error('the file was read without issues');
}

/**
 * A 10 m yacht with rocker and sheer: keel z = 0.15 + 0.45 xi^2 (xi = x/5 - 1), deck edge
 * z = 1.3 + 0.25 xi^2, half-breadth (1.6 (1 - 0.8 xi^2)) ((z - keel)/(deck - keel))^0.6 up
 * the section; stations every metre (0.25 m from the ends so that no section is empty),
 * waterlines every 0.2 m from 0 to 1.6 m.
 */
const YACHT_STATIONS = [0.25, 1, 2, 3, 4, 5, 6, 7, 8, 9, 9.75];
const YACHT_WATERLINES = [0, 0.2, 0.4, 0.6, 0.8, 1, 1.2, 1.4, 1.6];
const keel = (x: number): number => 0.15 + 0.45 * (x / 5 - 1) ** 2;
const deck = (x: number): number => 1.3 + 0.25 * (x / 5 - 1) ** 2;
const halfBreadth = (x: number, z: number): number => 1.6 * (1 - 0.8 * (x / 5 - 1) ** 2) * ((z - keel(x)) / (deck(x) - keel(x))) ** 0.6;

/** The yacht's offsets in the grid form, with or without the keel and deck columns. */
function yachtGrid(withKeelDeck: boolean): string {
  const head = withKeelDeck ? ['x', 'keel_z', 'deck_z', 'deck_y', ...YACHT_WATERLINES] : ['x', ...YACHT_WATERLINES];
  const rows = YACHT_STATIONS.map((x) => {
    const cells = YACHT_WATERLINES.map((z) => (z > keel(x) && z < deck(x) ? String(halfBreadth(x, z)) : ''));
    if (!withKeelDeck) {
      // Without the columns a table can only give what lies on its waterlines: the deck edge
      // is left at the highest waterline below it.
      return [x, ...cells].join(',');
    }
    return [x, keel(x), deck(x), halfBreadth(x, deck(x)), ...cells].join(',');
  });
  return file('# name: rocker yacht', '# units: m', head.join(','), ...rows);
}

/** The same yacht in the points form: the keel point, the waterline points, the deck edge. */
function yachtPoints(): string {
  const rows = YACHT_STATIONS.flatMap((x) => {
    const pts = [[0, keel(x)], ...YACHT_WATERLINES.filter((z) => z > keel(x) && z < deck(x)).map((z) => [halfBreadth(x, z), z]), [halfBreadth(x, deck(x)), deck(x)]];
    return pts.map(([y, z]) => `${x},${y},${z},0`);
  });
  return file('# name: rocker yacht', '# units: m', 'x,y,z,knuckle', ...rows);
}

describe('keel and deck columns of the grid form', () => {
  test('a hull with rocker and sheer written in both forms gives the same table to 1e-6', () => {
    const grid = readOffsetsCsv(yachtGrid(true));
    const points = readOffsetsCsv(yachtPoints());
    expect(grid.form).toBe('grid');
    expect(grid.notes).toEqual([]);
    const drafts = [0.3, 0.55, 0.9, 1.2];
    const a = hydrostaticTable(prepareHull(grid.hull), drafts);
    const b = hydrostaticTable(prepareHull(points.hull), drafts);
    a.forEach((row, i) => {
      for (const { key } of HYDROSTATIC_FIELDS) expect(relativeError(row[key], b[i]![key]), `${key} at ${row.draft}`).toBeLessThan(1e-6);
    });
  });

  test('without them the keel is taken at a tabulated waterline: the volume is short, and the reader says where', () => {
    const without = readOffsetsCsv(yachtGrid(false));
    const withCols = readOffsetsCsv(yachtGrid(true));
    const [short] = hydrostaticTable(prepareHull(without.hull), [1.0]);
    const [full] = hydrostaticTable(prepareHull(withCols.hull), [1.0]);
    expect(short!.volume).toBeLessThan(full!.volume);
    // Every station's keel (0.15 m and up) lies between waterlines, so each row gets a note,
    // naming its line (the header is line 3, the first station line 4).
    const keelNotes = without.notes.filter((n) => n.code === 'HYD_KEEL_AT_WATERLINE');
    expect(keelNotes).toHaveLength(YACHT_STATIONS.length);
    expect(keelNotes[0]).toMatchObject({ code: 'HYD_KEEL_AT_WATERLINE', path: ['offsets', 4, expect.any(Number)] });
    expect(keelNotes[0]!.message).toContain('keel_z');
  });

  test('a keel at the lowest cell confirms the flat of bottom: the same hull, and no note', () => {
    const plain = readOffsetsCsv(file('# units: m', 'x,0,0.5,1', '0,,0.8,1', '1,,0.9,1.1', '2,,0.8,1'));
    const confirmed = readOffsetsCsv(file('# units: m', 'x,keel_z,0,0.5,1', '0,0.5,,0.8,1', '1,0.5,,0.9,1.1', '2,0.5,,0.8,1'));
    expect(confirmed.hull.stations).toEqual(plain.hull.stations);
    const keelNotes = (r: typeof plain) => r.notes.filter((n) => n.code === 'HYD_KEEL_AT_WATERLINE');
    expect(keelNotes(plain)).toHaveLength(3);
    expect(keelNotes(confirmed)).toEqual([]);
  });

  test('the keel point comes first and the deck edge last; blank cells in the columns change nothing', () => {
    const r = readOffsetsCsv(file('# units: m', 'x,keel_z,deck_z,deck_y,0,0.5,1', '0,0.2,1.2,1.1,,0.8,1', '1,,,,0.5,0.9,1.1', '2,0.1,1.3,1.05,,0.8,1'));
    expect(r.hull.stations[0]!.points.map((p) => [p.y, p.z])).toEqual([[0, 0.2], [0.8, 0.5], [1, 1], [1.1, 1.2]]);
    expect(r.hull.stations[1]!.points.map((p) => [p.y, p.z])).toEqual([[0.5, 0], [0.9, 0.5], [1.1, 1]]);
    expect(r.hull.waterlines).toEqual([0, 0.5, 1]);
  });

  test('their rules are errors naming the line and column', () => {
    // keel above the lowest half-breadth (line 3, column 2)
    const above = issuesOf(file('# units: m', 'x,keel_z,0,0.5,1', '0,0.7,,0.8,1', '1,0,0.5,0.9,1.1', '2,0,0.5,0.8,1'));
    expect(above).toHaveLength(1);
    expect(above[0]).toMatchObject({ code: 'HYD_KEEL_DECK', path: ['offsets', 3, 2] });
    expect(above[0]!.message).toMatch(/keel_z \(0\.7 m\) lies above the lowest defined half-breadth/);
    // a half-breadth above the deck edge (deck_z 0.8 under the cell at 1.0)
    const overDeck = issuesOf(file('# units: m', 'x,deck_z,deck_y,0,0.5,1', '0,0.8,0.9,0.5,0.8,1', '1,,,0.5,0.9,1.1', '2,,,0.5,0.8,1'));
    expect(overDeck[0]).toMatchObject({ code: 'HYD_KEEL_DECK', path: ['offsets', 3, 2] });
    // deck_z without deck_y in the header
    const lone = issuesOf(file('# units: m', 'x,deck_z,0,0.5,1', '0,1.2,0.5,0.8,1', '1,1.2,0.5,0.9,1.1', '2,1.2,0.5,0.8,1'));
    expect(lone[0]).toMatchObject({ code: 'HYD_HEADER', path: ['offsets', 2, 2] });
    // deck_y blank in a row that gives deck_z
    const half = issuesOf(file('# units: m', 'x,deck_z,deck_y,0,0.5,1', '0,1.2,,0.5,0.8,1', '1,,,0.5,0.9,1.1', '2,,,0.5,0.8,1'));
    expect(half[0]).toMatchObject({ code: 'HYD_KEEL_DECK', path: ['offsets', 3, 3] });
  });
});

describe('proportions that suggest the wrong unit', () => {
  test('a table in millimetres read as metres is warned of, with the unit its numbers fit', () => {
    const mm = readOffsetsCsv(file('x,0,500,1000', '0,300,800,1000', '5000,400,900,1100', '10000,300,800,1000'));
    expect(mm.units).toBe('m'); // no units line: metres, as the conventions say
    const warnings = proportionWarnings(mm.hull, mm.units);
    expect(warnings.map((w) => w.code)).toContain('HYD_PROPORTIONS');
    expect(warnings[0]!.message).toContain('10000 m');
    expect(warnings[0]!.message).toContain('mm (10 m)');
    // The same table with its units line: no warning.
    const right = readOffsetsCsv(file('# units: mm', 'x,0,500,1000', '0,300,800,1000', '5000,400,900,1100', '10000,300,800,1000'));
    expect(proportionWarnings(right.hull, right.units)).toEqual([]);
  });

  test('a breadth over the length is warned of (half-breadths and x swapped, say)', () => {
    const r = readOffsetsCsv(file('# units: m', 'x,0,1,2', '0,3,4,5', '1,3,4,5', '2,3,4,5'));
    expect(proportionWarnings(r.hull, r.units).map((w) => w.message).join()).toMatch(/greatest breadth \(10 m\) exceeds the length between perpendiculars \(2 m\)/);
  });
});
