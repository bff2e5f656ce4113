/**
 * Reading offsets files. The files here are invented for the tests, a few lines each;
 * line numbers in the checks are those of the lines arrays (index + 1), as an editor
 * shows them.
 */
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError, type Issue } from '../../core/common/errors.js';
import { HullModelSchema, type HullModel } from '../../core/hull/hullModel.js';
import { LIMITS } from '../../core/common/limits.js';
import { readHullJson, readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { lengthFactor } from '../../core/common/units.js';
import { relClose } from '../helpers/relClose.js';

const file = (...lines: string[]): string => lines.join('\n');

/** The issues of a file that must not read; fails the test when it reads. */
function issuesOf(text: string): readonly Issue[] {
  try {
    readOffsetsCsv(text);
  } catch (e) {
    if (isHalfbreadthError(e)) return e.issues;
    throw e;
  }
  throw new Error('the file was read without issues');
}

/** The one issue of `code` in a file. */
function oneIssue(text: string, code: string): Issue {
  const found = issuesOf(text).filter((i) => i.code === code);
  expect(found, `issues with code ${code}`).toHaveLength(1);
  return found[0]!;
}

const SOUND_GRID = [
  '# name: test launch',
  '# units: m',
  'x,0,0.25,0.5,0.75,1.0',
  '0,,0.30,0.62,0.80,0.86',
  '1.5,0,0.41,0.70,0.86,0.90',
  '3,0,0.40,0.60,0.70,0.80',
];

const SOUND_POINTS = [
  '# units: m',
  'x,y,z,knuckle',
  '0,0,0,1',
  '0,0.5,0.5,0',
  '0,0.6,1,1',
  '1,0,0,1',
  '1,0.5,0.1,1',
  '1,0.7,1,1',
  '2,0,0,1',
  '2,0.4,1,1',
];

describe('the grid form', () => {
  test('a sound grid file reads into stations of points, waterlines and the metadata', () => {
    const r = readOffsetsCsv(file(...SOUND_GRID));
    expect(r.form).toBe('grid');
    expect(r.units).toBe('m');
    expect(r.hull.name).toBe('test launch');
    expect(r.hull.waterlines).toEqual([0, 0.25, 0.5, 0.75, 1.0]);
    expect(r.hull.stations.map((s) => s.x)).toEqual([0, 1.5, 3]);
    // The leading blank of the first station is no point: its section starts at WL 0.25.
    expect(r.hull.stations[0]!.points).toEqual([
      { y: 0.3, z: 0.25, knuckle: false },
      { y: 0.62, z: 0.5, knuckle: false },
      { y: 0.8, z: 0.75, knuckle: false },
      { y: 0.86, z: 1.0, knuckle: false },
    ]);
    expect(r.hull.stations[1]!.points).toHaveLength(5);
    expect(r.hull.ap).toBeUndefined();
    expect(r.hull.fp).toBeUndefined();
  });

  test('the hull read is a valid hull model by the schema', () => {
    const r = readOffsetsCsv(file(...SOUND_GRID));
    expect(HullModelSchema.safeParse(r.hull).success).toBe(true);
  });

  test('trailing blanks and short rows both mean no surface above the deck edge', () => {
    const r = readOffsetsCsv(file('x,0,1,2,3', '0,0.1,0.2,,', '1,0.1,0.2', '2,0.1,0.2,0.3,'));
    expect(r.hull.stations.map((s) => s.points.length)).toEqual([2, 2, 3]);
  });

  test('a file without a name or units is unnamed and in metres', () => {
    const r = readOffsetsCsv(file('x,0,1', '0,1,1', '1,1,1', '2,1,1'));
    expect(r.hull.name).toBe('unnamed hull');
    expect(r.units).toBe('m');
  });
});

describe('the points form', () => {
  test('a sound points file reads stations as runs of rows with the same x, knuckles as given', () => {
    const r = readOffsetsCsv(file(...SOUND_POINTS));
    expect(r.form).toBe('points');
    expect(r.hull.waterlines).toBeUndefined();
    expect(r.hull.stations.map((s) => s.x)).toEqual([0, 1, 2]);
    expect(r.hull.stations[0]!.points).toEqual([
      { y: 0, z: 0, knuckle: true },
      { y: 0.5, z: 0.5, knuckle: false },
      { y: 0.6, z: 1, knuckle: true },
    ]);
    expect(HullModelSchema.safeParse(r.hull).success).toBe(true);
  });

  test('columns may come in any order and the knuckle column may be left out', () => {
    const r = readOffsetsCsv(file('Z, Y ,X', '0,0,0', '1,1,0', '0,0,1', '1,1,1', '0,0,2', '1,1,2'));
    expect(r.hull.stations.map((s) => s.x)).toEqual([0, 1, 2]);
    expect(r.hull.stations[2]!.points).toEqual([
      { y: 0, z: 0, knuckle: false },
      { y: 1, z: 1, knuckle: false },
    ]);
  });

  test('1.5 and 1.50 are the same station, and a blank knuckle cell is 0', () => {
    const r = readOffsetsCsv(file('x,y,z,knuckle', '0,0,0,', '0,1,1,', '1.5,0,0,1', '1.50,1,1,', '2,0,0,', '2,1,1,'));
    expect(r.hull.stations).toHaveLength(3);
    expect(r.hull.stations[1]!.points.map((p) => p.knuckle)).toEqual([true, false]);
  });

  test('equal heights with different half-breadths are allowed (a flat at one height)', () => {
    const r = readOffsetsCsv(file('x,y,z', '0,0,0', '0,1,0', '0,1,1', '1,0,0', '1,1,1', '2,0,0', '2,1,1'));
    expect(r.hull.stations[0]!.points).toHaveLength(3);
  });
});

describe('comments and metadata', () => {
  test('the caution line and plain comments are ignored wherever they are', () => {
    const r = readOffsetsCsv(
      file(
        '# Caution: these figures are for design and estimating only.',
        '#',
        '# lines faired 3 May 2020, rev B',
        '# units: mm',
        'x,0,1000',
        '# a comment between stations',
        '0,500,600',
        '   ',
        '1000,500,600',
        '2000,500,600',
        '# CAUTION: the caution may be repeated at the end',
      ),
    );
    expect(r.units).toBe('mm');
    expect(r.hull.stations).toHaveLength(3);
  });

  test('metadata keys are read in any case and ap and fp in the file units', () => {
    const r = readOffsetsCsv(file('# Units: mm', '# AP: -500', '# fp: 2500', 'x,0,1000', '0,500,600', '1000,500,600', '2000,500,600'));
    // 1 mm = 0.001 m, SI prefix milli (BIPM, The International System of Units, 9th ed., 2019, table 7).
    expect(r.hull.ap).toBe(-0.5);
    expect(r.hull.fp).toBe(2.5);
  });

  test('a name keeps its colons and inner spaces, and loses the spaces at its ends', () => {
    const r = readOffsetsCsv(file('# name:   yard no. 7: the "Tern"  ', 'x,0,1', '0,1,1', '1,1,1', '2,1,1'));
    expect(r.hull.name).toBe('yard no. 7: the "Tern"');
  });

  test('CRLF line ends give the same lines and hull as LF', () => {
    const lf = file(...SOUND_GRID);
    const data = ({ place: _place, ...r }: ReturnType<typeof readOffsetsCsv>): object => r;
    expect(data(readOffsetsCsv(lf.replace(/\n/g, '\r\n')))).toEqual(data(readOffsetsCsv(lf)));
    const bad = file('x,0,1', '0,1,1', '1,-1,1', '2,1,1');
    expect(issuesOf(bad.replace(/\n/g, '\r\n'))).toEqual(issuesOf(bad));
  });

  test('a byte order mark at the start is not part of the header', () => {
    const r = readOffsetsCsv(`\uFEFF${file(...SOUND_GRID)}`);
    expect(r.form).toBe('grid');
  });
});

describe('each rule has its code and names the place', () => {
  test('an unclosed quote makes the CSV unreadable, reported with its line', () => {
    const i = oneIssue(file('x,0,1', '0,1,1', '1,"1,1', '2,1,1'), 'HYD_CSV_UNREADABLE');
    expect(i.path).toEqual(['offsets', 3]);
    expect(i.message).toMatch(/^line 3: /);
    expect(i.message).toContain('quote');
  });

  test('a malformed quoted cell makes the CSV unreadable, reported with its line', () => {
    const i = oneIssue(file('x,0,1', '0,1,1', '1,"1"x,1', '2,1,1'), 'HYD_CSV_UNREADABLE');
    expect(i.path).toEqual(['offsets', 3]);
    expect(i.message).toMatch(/^line 3: /);
  });

  test('a file with no rows is unreadable', () => {
    expect(oneIssue('', 'HYD_CSV_UNREADABLE').path).toEqual(['offsets']);
    expect(oneIssue(file('# name: empty', '# units: m', ''), 'HYD_CSV_UNREADABLE').message).toContain('no header');
  });

  test('a header that is neither x and heights nor column names is reported at its first cell', () => {
    const i = oneIssue(file('# units: m', 'station,0,1', '0,1,1'), 'HYD_HEADER');
    expect(i.path).toEqual(['offsets', 2, 1]);
    expect(i.message).toMatch(/^line 2, column 1: /);
    expect(i.message).toContain("'station'");
  });

  test('a grid header cell that is not a height is reported with its column', () => {
    const i = oneIssue(file('x,0,WL2,1', '0,1,1,1', '1,1,1,1', '2,1,1,1'), 'HYD_HEADER');
    expect(i.path).toEqual(['offsets', 1, 3]);
    expect(i.message).toBe("line 1, column 3: waterline height 'WL2' is not a number");
  });

  test('a blank grid header cell is reported with its column', () => {
    const i = oneIssue(file('x,0,,1', '0,1,1,1', '1,1,1,1', '2,1,1,1'), 'HYD_HEADER');
    expect(i.path).toEqual(['offsets', 1, 3]);
  });

  test('a points header with an unknown, a repeated or a missing column is reported', () => {
    const issues = issuesOf(file('x,y,y,keel', '0,0,0,0'));
    // An issue about the whole line comes before those about its cells.
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_HEADER', ['offsets', 1]],
      ['HYD_HEADER', ['offsets', 1, 3]],
      ['HYD_HEADER', ['offsets', 1, 4]],
    ]);
    expect(issues[0]!.message).toContain('no z column');
    expect(issues[1]!.message).toContain("column 'y' is named twice (first in column 2)");
    expect(issues[2]!.message).toContain("unknown column 'keel'");
  });

  test('a non-numeric half-breadth is reported with line, column, station and waterline', () => {
    const i = oneIssue(file('# units: m', 'x,0.25,0.50,0.75', '0,0.1,0.2,0.3', '1.5,0.2,abc,0.4', '3,0.1,0.2,0.3'), 'HYD_CELL_NOT_NUMBER');
    expect(i.path).toEqual(['offsets', 4, 3]);
    expect(i.message).toBe("line 4, column 3 (station x = 1.5 m, WL 0.50 m): half-breadth 'abc' is not a number");
  });

  test('a non-numeric or blank station x is reported with its line and column 1', () => {
    const issues = issuesOf(file('x,0,1', '0,1,1', 'one,1,1', ',1,1', '2,1,1', '3,1,1'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_CELL_NOT_NUMBER', ['offsets', 3, 1]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 4, 1]],
    ]);
    expect(issues[0]!.message).toContain("station x 'one' is not a number");
    expect(issues[1]!.message).toContain('station x is blank');
  });

  test('a hexadecimal or comma-decimal number is not a number here', () => {
    const issues = issuesOf(file('x,0,1', '0,1,1', '1,0x1,1', '2,1,"0,5"'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_CELL_NOT_NUMBER', ['offsets', 3, 2]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 4, 3]],
    ]);
  });

  test('NaN, Infinity and numbers too large for a double are reported as not finite', () => {
    const issues = issuesOf(file('x,0,1,2', '0,1,NaN,1', '1,1,-Infinity,1', '2,1,1e999,1'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_CELL_NOT_FINITE', ['offsets', 2, 3]],
      ['HYD_CELL_NOT_FINITE', ['offsets', 3, 3]],
      ['HYD_CELL_NOT_FINITE', ['offsets', 4, 3]],
    ]);
    expect(issues[0]!.message).toBe('line 2, column 3 (station x = 0 m, WL 1 m): half-breadth NaN is not a finite number');
    expect(issues[2]!.message).toContain('1e999');
  });

  test('a negative half-breadth is reported with line, column, station x, waterline and value', () => {
    const text = file(
      '# name: negative cell',
      '# units: m',
      '# a plain comment',
      'x,0.25,0.50,0.75',
      '0,0.1,0.2,0.3',
      '1.0,0.1,0.2,0.3',
      '1.5,0.2,-0.3,0.4',
      '2.0,0.1,0.2,0.3',
    );
    const i = oneIssue(text, 'HYD_HALF_BREADTH_NEGATIVE');
    expect(i.path).toEqual(['offsets', 7, 3]);
    expect(i.message).toBe('line 7, column 3 (station x = 1.5 m, WL 0.50 m): half-breadth -0.3 < 0');
  });

  test('a negative half-breadth in the points form names the point', () => {
    const i = oneIssue(file('z,x,y', '0,0,0', '1,0,1', '0,1,0', '0.5,1,-0.25', '0,2,0', '1,2,1'), 'HYD_HALF_BREADTH_NEGATIVE');
    expect(i.path).toEqual(['offsets', 5, 3]);
    expect(i.message).toBe('line 5, column 3 (station x = 1 m, point z = 0.5 m): half-breadth -0.25 < 0');
  });

  test('a station x that does not increase is reported at its x cell, naming the station before', () => {
    const i = oneIssue(file('x,0,1', '0,1,1', '2,1,1', '1.5,1,1', '3,1,1'), 'HYD_X_NOT_INCREASING');
    expect(i.path).toEqual(['offsets', 4, 1]);
    expect(i.message).toMatch(/^line 4, column 1 \(station x = 1\.5 m\): /);
    expect(i.message).toContain('x = 2 m, line 3');
  });

  test('in the points form a station that comes back to an earlier x is reported', () => {
    const i = oneIssue(file('x,y,z', '0,0,0', '0,1,1', '1,0,0', '1,1,1', '0,0,0', '0,1,1'), 'HYD_X_NOT_INCREASING');
    expect(i.path).toEqual(['offsets', 6, 1]);
    expect(i.message).toContain('x = 1 m, line 4');
  });

  test('waterline heights that do not increase are reported at the header cell', () => {
    const i = oneIssue(file('x,0,0.5,0.5,1', '0,1,1,1,1', '1,1,1,1,1', '2,1,1,1,1'), 'HYD_Z_NOT_INCREASING');
    expect(i.path).toEqual(['offsets', 1, 4]);
    expect(i.message).toBe(
      'line 1, column 4 (WL 0.5 m): waterline height 0.5 m is not above the one before it (0.5 m, column 3); waterline heights must increase strictly',
    );
  });

  test('a point below the one before it in a station is reported at its z cell', () => {
    const i = oneIssue(file('x,y,z', '0,0,0', '0,1,1', '1,0,0', '1,0.5,0.6', '1,0.8,0.4', '1,1,1', '2,0,0', '2,1,1'), 'HYD_Z_NOT_INCREASING');
    expect(i.path).toEqual(['offsets', 6, 3]);
    expect(i.message).toMatch(/^line 6, column 3 \(station x = 1 m, point z = 0\.4 m\): z = 0\.4 m is below the point before it \(z = 0\.6 m, line 5\)/);
  });

  test('a point repeating the one before it is reported with its line', () => {
    const i = oneIssue(file('x,y,z', '0,0,0', '0,1,1', '1,0,0', '1,0,0', '1,1,1', '2,0,0', '2,1,1'), 'HYD_Z_NOT_INCREASING');
    expect(i.path).toEqual(['offsets', 5]);
    expect(i.message).toContain('line 4');
  });

  test('a blank inside a row is reported with its line and column', () => {
    const i = oneIssue(file('# units: m', 'x,0,0.25,0.5,0.75,1', '0,0,0.3,0.5,0.6,0.7', '1.5,0,0.4,,,0.9', '3,0,0.3,0.5,0.6,0.7'), 'HYD_BLANK_INSIDE_ROW');
    expect(i.path).toEqual(['offsets', 4, 4]);
    expect(i.message).toMatch(/^line 4, column 4 \(station x = 1\.5 m, WL 0\.5 m\): columns 4 to 5 are blank between defined half-breadths/);
  });

  test('a station with fewer than two points is reported with its line', () => {
    const issues = issuesOf(file('x,0,1,2', '0,1,1,1', '1,,1,', '2,,,', '3,1,1,1'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_STATION_TOO_FEW_POINTS', ['offsets', 3]],
      ['HYD_STATION_TOO_FEW_POINTS', ['offsets', 4]],
    ]);
    expect(issues[0]!.message).toBe('line 3 (station x = 1 m): the row has 1 defined half-breadth(s); a section needs at least 2');
  });

  test('a points-form station with one point is reported at its first line', () => {
    const i = oneIssue(file('x,y,z', '0,0,0', '0,1,1', '1,0.5,0', '2,0,0', '2,1,1'), 'HYD_STATION_TOO_FEW_POINTS');
    expect(i.path).toEqual(['offsets', 4]);
    expect(i.message).toContain('station x = 1 m');
  });

  test('fewer than three stations is reported for the whole file', () => {
    const i = oneIssue(file('x,0,1', '0,1,1', '1,1,1'), 'HYD_TOO_FEW_STATIONS');
    expect(i.path).toEqual(['offsets']);
    expect(i.message).toContain('2 station(s)');
  });

  test('a knuckle other than 0 or 1 is reported with its line, column and point', () => {
    const i = oneIssue(file('x,y,z,knuckle', '0,0,0,1', '0,1,1,yes', '1,0,0,0', '1,1,1,0', '2,0,0,0', '2,1,1,0'), 'HYD_KNUCKLE_VALUE');
    expect(i.path).toEqual(['offsets', 3, 4]);
    expect(i.message).toBe("line 3, column 4 (station x = 0 m, point z = 1 m): knuckle 'yes' must be 0 or 1");
  });

  test('an unknown metadata key is reported with its line', () => {
    const i = oneIssue(file('# name: a', '# draught: 1.2', ...SOUND_GRID.slice(2)), 'HYD_METADATA_UNKNOWN');
    expect(i.path).toEqual(['offsets', 2]);
    expect(i.message).toMatch(/^line 2: unknown metadata key 'draught'/);
  });

  test('unknown units are a bad metadata value, reported with the line', () => {
    const i = oneIssue(file('# units: yd', 'x,0,1', '0,1,1', '1,1,1', '2,1,1'), 'HYD_METADATA_VALUE');
    expect(i.path).toEqual(['offsets', 1]);
    expect(i.message).toBe("line 1: units 'yd' is not one of m, mm, ft, in, ft-in-8");
  });

  test('a non-numeric ap or fp is a bad metadata value, reported with its line', () => {
    const issues = issuesOf(file('# ap: aft', '# fp: 3-4-5', 'x,0,1', '0,1,1', '1,1,1', '2,1,1'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_METADATA_VALUE', ['offsets', 1]],
      ['HYD_METADATA_VALUE', ['offsets', 2]],
    ]);
    expect(issues[0]!.message).toContain("ap 'aft' is not a number");
  });

  test('a metadata key given twice is a bad metadata value', () => {
    const i = oneIssue(file('# units: m', '# units: mm', 'x,0,1', '0,1,1', '1,1,1', '2,1,1'), 'HYD_METADATA_VALUE');
    expect(i.path).toEqual(['offsets', 2]);
    expect(i.message).toContain('first on line 1');
  });

  test('metadata after the header is reported rather than silently ignored', () => {
    const i = oneIssue(file('x,0,1', '# units: mm', '0,1,1', '1,1,1', '2,1,1'), 'HYD_METADATA_PLACE');
    expect(i.path).toEqual(['offsets', 2]);
    expect(i.message).toContain('after the header row (line 1)');
  });

  test('an fp aft of ap is reported at the metadata line', () => {
    const i = oneIssue(file('# ap: 2', '# fp: 1', 'x,0,1', '0,1,1', '1,1,1', '2,1,1'), 'HYD_PERPENDICULARS');
    expect(i.path).toEqual(['offsets', 2]);
    expect(i.message).toBe('line 2: fp must lie forward of ap (fp = 1 m; ap = 2 m)');
  });

  test('a row longer than the header is reported at its first extra column', () => {
    const i = oneIssue(file('x,0,1', '0,1,1', '1,1,1,1', '2,1,1'), 'HYD_ROW_LENGTH');
    expect(i.path).toEqual(['offsets', 3, 4]);
    expect(i.message).toBe('line 3, column 4: the row has 4 cells but the header has 3; cells beyond the header must be blank');
  });

  test('more waterlines than the limit are too large', () => {
    const header = ['x', ...Array.from({ length: LIMITS.maxWaterlines + 1 }, (_, k) => String(k))].join(',');
    const i = oneIssue(file(header, '0,1,1'), 'HYD_TOO_LARGE');
    expect(i.path).toEqual(['offsets', 1]);
    expect(i.message).toContain(String(LIMITS.maxWaterlines));
  });

  test('more stations than the limit are too large', () => {
    const rows = Array.from({ length: LIMITS.maxStations + 1 }, (_, k) => `${k},1,1`);
    const i = oneIssue(file('x,0,1', ...rows), 'HYD_TOO_LARGE');
    expect(i.path).toEqual(['offsets']);
    expect(i.message).toContain(String(LIMITS.maxStations));
  });

  test('more points in a station than the limit are too large', () => {
    const rows = Array.from({ length: LIMITS.maxPointsPerStation + 1 }, (_, k) => `0,1,${k}`);
    const i = oneIssue(file('x,y,z', ...rows), 'HYD_TOO_LARGE');
    expect(i.path).toEqual(['offsets', LIMITS.maxPointsPerStation + 2]);
  });
});

describe('all issues of a file at once', () => {
  test('every issue of a file is reported together, in file order', () => {
    const text = file(
      '# units: m', // 1
      '# colour: blue', // 2
      'x,0,0.5,1', // 3
      '0,0.2,abc,0.4', // 4
      '1,0.2,,0.4,9', // 5
      '0.5,-0.1,0.3,0.4', // 6
      '2,0.2,NaN,0.4', // 7
    );
    let caught: unknown;
    try {
      readOffsetsCsv(text);
    } catch (e) {
      caught = e;
    }
    expect(isHalfbreadthError(caught)).toBe(true);
    if (!isHalfbreadthError(caught)) return;
    expect(caught.issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_METADATA_UNKNOWN', ['offsets', 2]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 4, 3]],
      ['HYD_BLANK_INSIDE_ROW', ['offsets', 5, 3]],
      ['HYD_ROW_LENGTH', ['offsets', 5, 5]],
      ['HYD_X_NOT_INCREASING', ['offsets', 6, 1]],
      ['HYD_HALF_BREADTH_NEGATIVE', ['offsets', 6, 2]],
      ['HYD_CELL_NOT_FINITE', ['offsets', 7, 3]],
    ]);
    expect(caught.code).toBe('HYD_METADATA_UNKNOWN');
    expect(caught.message).toMatch(/^7 problems; first: line 2: /);
  });

  test('a station that lost a cell to a non-number is not also called short of points', () => {
    const issues = issuesOf(file('x,0,1', '0,1,1', '1,1,abc', '2,1,1'));
    expect(issues.map((i) => i.code)).toEqual(['HYD_CELL_NOT_NUMBER']);
  });

  test('a row left out for a bad x does not also make the file short of stations', () => {
    const issues = issuesOf(file('x,0,1', '0,1,1', 'x1,1,1', '2,1,1'));
    expect(issues.map((i) => i.code)).toEqual(['HYD_CELL_NOT_NUMBER']);
  });
});

describe('units', () => {
  test('the unit factors are the definitions of the units', () => {
    // 1 mm = 0.001 m (SI prefix milli); 1 ft = 0.3048 m and 1 in = 0.0254 m exactly
    // (international yard and pound agreement, 1959).
    expect(lengthFactor('m')).toBe(1);
    expect(lengthFactor('mm')).toBe(0.001);
    expect(lengthFactor('ft')).toBe(0.3048);
    expect(lengthFactor('in')).toBe(0.0254);
    expect(lengthFactor('ft-in-8')).toBe(0.3048);
  });

  /*
   * One invented hull written by hand in each unit. Its lengths are multiples of 3/16 in,
   * so every unit writes them exactly as decimals (3/16 in = 0.015625 ft). The expected
   * hull is the inch values times 0.0254 m (1959 agreement).
   */
  const INCHES = {
    ap: 0,
    fp: 96,
    waterlines: [0, 6, 12],
    stations: [
      { x: 0, points: [[10.5, 6], [13.5, 12]] },
      { x: 48, points: [[0, 0], [18.1875, 6], [22.5, 12]] },
      { x: 96, points: [[0, 0], [9.375, 6], [12, 12]] },
    ],
  } as const;
  const grid = (units: string, rows: string[]): string => file(`# units: ${units}`, ...rows);
  const FILES: Record<string, string> = {
    m: grid('m', ['# ap: 0', '# fp: 2.4384', 'x,0,0.1524,0.3048', '0,,0.2667,0.3429', '1.2192,0,0.4619625,0.5715', '2.4384,0,0.238125,0.3048']),
    mm: grid('mm', ['# ap: 0', '# fp: 2438.4', 'x,0,152.4,304.8', '0,,266.7,342.9', '1219.2,0,461.9625,571.5', '2438.4,0,238.125,304.8']),
    ft: grid('ft', ['# ap: 0', '# fp: 8', 'x,0,0.5,1', '0,,0.875,1.125', '4,0,1.515625,1.875', '8,0,0.78125,1']),
    in: grid('in', ['# ap: 0', '# fp: 96', 'x,0,6,12', '0,,10.5,13.5', '48,0,18.1875,22.5', '96,0,9.375,12']),
    'ft-in-8': grid('ft-in-8', ['# ap: 0', '# fp: 8-0-0', 'x,0-0-0,0-6-0,1-0-0', '0,,0-10-4,1-1-4', '4-0-0,0,1-6-1+,1-10-4', '8-0-0,0-0-0,0-9-3,1-0-0']),
  };
  const INCH = 0.0254;

  test.each(Object.keys(FILES))('a hull written in %s reads as the same hull in metres', (units) => {
    const r = readOffsetsCsv(FILES[units]!);
    expect(r.units).toBe(units);
    const h: HullModel = r.hull;
    const close = (a: number | undefined, inches: number): boolean => a !== undefined && relClose(a, inches * INCH, { rel: 1e-12 });
    expect(close(h.ap, INCHES.ap)).toBe(true);
    expect(close(h.fp, INCHES.fp)).toBe(true);
    expect(h.waterlines?.length).toBe(3);
    h.waterlines!.forEach((z, k) => expect(close(z, INCHES.waterlines[k]!), `waterline ${k}`).toBe(true));
    expect(h.stations).toHaveLength(3);
    h.stations.forEach((st, i) => {
      const want = INCHES.stations[i]!;
      expect(close(st.x, want.x), `station ${i} x`).toBe(true);
      expect(st.points).toHaveLength(want.points.length);
      st.points.forEach((p, j) => {
        expect(close(p.y, want.points[j]![0]), `station ${i} point ${j} y`).toBe(true);
        expect(close(p.z, want.points[j]![1]), `station ${i} point ${j} z`).toBe(true);
      });
    });
  });

  test('a bad feet-inches-eighths cell is reported with its place and the rule', () => {
    const i = oneIssue(file('# units: ft-in-8', 'x,0,0-6-0', '0,0-1-0,0-2-0', '4-0-0,0-1-0,0-13-0', '8-0-0,0-1-0,0-2-0'), 'HYD_CELL_NOT_NUMBER');
    expect(i.path).toEqual(['offsets', 4, 3]);
    expect(i.message).toBe("line 4, column 3 (station x = 4-0-0, WL 0-6-0): half-breadth '0-13-0': inches 13 must be 0 to 11");
  });

  test('a decimal in a feet-inches-eighths file is not feet-inches-eighths', () => {
    const i = oneIssue(file('# units: ft-in-8', 'x,0,0-6-0', '0,0-1-0,0.5', '4-0-0,0-1-0,0-2-0', '8-0-0,0-1-0,0-2-0'), 'HYD_CELL_NOT_NUMBER');
    expect(i.path).toEqual(['offsets', 3, 3]);
  });
});

describe('size', () => {
  const gridText = (stations: number, waterlines: number): string => {
    const lines = [`x,${Array.from({ length: waterlines }, (_, k) => String(k * 0.05)).join(',')}`];
    for (let i = 0; i < stations; i++) lines.push(`${i * 0.5},${Array.from({ length: waterlines }, (_, k) => String(1 + 0.001 * k)).join(',')}`);
    return lines.join('\n');
  };

  // Speed is measured in the benchmark (npm run bench), never asserted here.
  test('a grid of 2,000 stations by 500 waterlines is accepted', () => {
    const r = readOffsetsCsv(gridText(2000, 500));
    expect(r.hull.stations).toHaveLength(2000);
    expect(r.hull.stations.every((s) => s.points.length === 500)).toBe(true);
    expect(r.hull.stations[1999]!.points[499]).toEqual({ y: 1.499, z: 499 * 0.05, knuckle: false });
  });
});

describe('hull models given as JSON', () => {
  const sound = {
    name: 'json hull',
    stations: [
      { x: 0, points: [{ y: 0, z: 0 }, { y: 1, z: 1 }] },
      { x: 1, points: [{ y: 0, z: 0 }, { y: 1, z: 1, knuckle: true }] },
      { x: 2, points: [{ y: 0, z: 0 }, { y: 1, z: 1 }] },
    ],
  };

  const jsonIssues = (value: unknown): readonly Issue[] => {
    try {
      readHullJson(value);
    } catch (e) {
      if (isHalfbreadthError(e)) return e.issues;
      throw e;
    }
    throw new Error('the model was read without issues');
  };

  test('a sound model is read with the defaults filled in', () => {
    const h = readHullJson(sound);
    expect(h.stations[0]!.points[0]).toEqual({ y: 0, z: 0, knuckle: false });
    expect(h.stations[1]!.points[1]!.knuckle).toBe(true);
  });

  test('wrong types are reported with their paths', () => {
    const issues = jsonIssues({ ...sound, name: 7, stations: [{ x: '0', points: [] }, ...sound.stations.slice(1)] });
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_MODEL_INVALID', ['name']],
      ['HYD_MODEL_INVALID', ['stations', 0, 'x']],
    ]);
    expect(issues[1]!.message).toMatch(/^stations\[0\]\.x: /);
  });

  test('NaN, infinities and numbers as strings are refused with their paths', () => {
    const bad = structuredClone(sound) as { stations: { points: { y: unknown; z: unknown }[] }[] };
    bad.stations[0]!.points[1]!.y = Number.NaN;
    bad.stations[1]!.points[0]!.z = Number.POSITIVE_INFINITY;
    bad.stations[2]!.points[1]!.y = 'NaN';
    expect(jsonIssues(bad).map((i) => [i.code, i.path])).toEqual([
      ['HYD_MODEL_INVALID', ['stations', 0, 'points', 1, 'y']],
      ['HYD_MODEL_INVALID', ['stations', 1, 'points', 0, 'z']],
      ['HYD_MODEL_INVALID', ['stations', 2, 'points', 1, 'y']],
    ]);
  });

  test('missing fields and unknown keys are reported with their paths', () => {
    expect(jsonIssues({ name: 'no stations' }).map((i) => i.path)).toEqual([['stations']]);
    expect(jsonIssues({ ...sound, stations: [{ x: 0 }, ...sound.stations.slice(1)] }).map((i) => i.path)).toEqual([['stations', 0, 'points']]);
    const extra = jsonIssues({ ...sound, draught: 1 });
    expect(extra[0]!.code).toBe('HYD_MODEL_INVALID');
    expect(extra[0]!.message).toContain('draught');
    expect(jsonIssues(null)[0]!.message).toMatch(/^the hull: /);
  });

  test('a list longer than its limit is too large, with its path', () => {
    const many = { ...sound, waterlines: Array.from({ length: LIMITS.maxWaterlines + 1 }, (_, k) => k) };
    const issues = jsonIssues(many);
    expect(issues.map((i) => [i.code, i.path])).toEqual([['HYD_TOO_LARGE', ['waterlines']]]);
  });

  test('a broken geometric rule keeps its own code and the model path', () => {
    const bad = structuredClone(sound);
    bad.stations[1]!.points[1]!.y = -0.5;
    bad.stations[2]!.x = 0.5;
    const issues = jsonIssues(bad);
    expect(issues.map((i) => [i.code, i.path])).toEqual([
      ['HYD_HALF_BREADTH_NEGATIVE', ['stations', 1, 'points', 1, 'y']],
      ['HYD_X_NOT_INCREASING', ['stations', 2, 'x']],
    ]);
    expect(issues[0]!.message).toContain('-0.5 < 0');
  });
});
