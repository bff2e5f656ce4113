/**
 * Bonjean data (core/upright/bonjean.ts, core/report/formatBonjean.ts) against closed-form sections.
 *
 * Sources (outside the project): the areas and moments of a rectangle and of a
 * triangle, worked beside each check (elementary calculus); the heights of each curve
 * against the header row of the demo table itself.
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { bonjean } from '../../core/upright/bonjean.js';
import { CAUTION } from '../../core/common/caution.js';
import { HalfbreadthError } from '../../core/common/errors.js';
import { bonjeanCsv, bonjeanResult, bonjeanText } from '../../core/report/formatBonjean.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { boxBarge, vPrism } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const demoText = (file: string): string => readFileSync(new URL(`../../offsets-demo/${file}`, import.meta.url), 'utf8');

function thrown(f: () => unknown): HalfbreadthError {
  try {
    f();
  } catch (e) {
    if (e instanceof HalfbreadthError) return e;
    throw e;
  }
  throw new Error('expected a HalfbreadthError');
}

describe('Bonjean data', () => {
  test('a V section gives area B z^2 / (2D) and moment B z^3 / (3D) at every waterline and extra height', () => {
    // y = (B/2) z / D: area 2 integral of y dz = B z^2 / (2D); moment 2 integral of y z dz = B z^3 / (3D).
    const B = 3;
    const D = 2;
    const stations = bonjean(prepareHull(vPrism(10, B, D, 5, 5)), [1.3, 0.05]);
    expect(stations).toHaveLength(5);
    for (const s of stations) {
      expect(s.points.map((q) => q.z)).toEqual([0, 0.05, 0.5, 1, 1.3, 1.5, 2]);
      for (const q of s.points) {
        expect(q.area, `z = ${q.z}`).toBeRelClose((B * q.z * q.z) / (2 * D), 1e-13, 1e-15);
        expect(q.momentZ, `z = ${q.z}`).toBeRelClose((B * q.z ** 3) / (3 * D), 1e-13, 1e-15);
      }
    }
  });

  test('a box section gives area B z and moment B z^2 / 2', () => {
    const stations = bonjean(prepareHull(boxBarge(10, 4, 2, 3, 3)));
    expect(stations[1]!.points.map((q) => [q.z, q.area, q.momentZ])).toEqual([
      [0, 0, 0],
      [1, 4, 2],
      [2, 8, 8],
    ]);
  });

  test('each station of a grid table runs from its keel through the header waterlines above it to its deck edge', () => {
    const text = demoText('workboat.csv');
    // The header row of the file itself: x, then the waterline heights.
    const header = text.split(/\r?\n/).find((l) => l.startsWith('x,'))!.split(',').slice(1).map(Number);
    const stations = bonjean(prepareHull(readOffsetsCsv(text).hull));
    for (const s of stations) {
      const expected = [s.keel, ...header.filter((z) => z > s.keel && z <= s.deck)];
      expect(s.points.map((q) => q.z), `station ${s.x}`).toEqual(expected);
      // Areas grow with height: every section has half-breadths >= 0.
      for (let k = 1; k < s.points.length; k++) expect(s.points[k]!.area).toBeGreaterThan(s.points[k - 1]!.area);
    }
  });

  test('a points-form table uses each station\'s own point heights', () => {
    const { hull } = readOffsetsCsv(demoText('survey-launch.csv'));
    const stations = bonjean(prepareHull(hull));
    stations.forEach((s, i) => expect(s.points.map((q) => q.z)).toEqual(hull.stations[i]!.points.map((q) => q.z)));
  });

  test('heights that meet no station are refused together, each with its index', () => {
    const p = prepareHull(boxBarge(10, 4, 2));
    const e = thrown(() => bonjean(p, [1, 2.5, -1]));
    expect(e.issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_DRAFT_OUT_OF_RANGE', ['drafts', 1]],
      ['HYD_DRAFT_OUT_OF_RANGE', ['drafts', 2]],
    ]);
  });
});

describe('Bonjean data in its forms', () => {
  const hull = boxBarge(10, 4, 2, 3, 3);
  const r = bonjeanResult(hull, bonjean(prepareHull(hull), [0.5]));

  test('JSON carries the caution and every station', () => {
    expect(r.caution).toBe(CAUTION);
    expect(r.stations.map((s) => s.x)).toEqual([0, 5, 10]);
  });

  test('CSV is one row per station and height after the caution line', () => {
    const csv = bonjeanCsv(r);
    expect(csv.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const rows = Papa.parse<string[]>(csv.split('\r\n').filter((l) => !l.startsWith('#')).join('\n'), { skipEmptyLines: true }).data;
    expect(rows[0]).toEqual(['x_m', 'z_m', 'area_m2', 'momentZ_m3']);
    expect(rows.slice(1, 5)).toEqual([
      ['0', '0', '0', '0'],
      ['0', '0.5', '2', '0.5'],
      ['0', '1', '4', '2'],
      ['0', '2', '8', '8'],
    ]);
    expect(rows).toHaveLength(1 + 3 * 4);
  });

  test('the text table has a column per height and ends with the caution', () => {
    const t = bonjeanText(r);
    expect(t).toContain('z 0.5');
    expect(t).toContain('8.0000');
    expect(t.trimEnd().endsWith(CAUTION)).toBe(true);
  });
});
