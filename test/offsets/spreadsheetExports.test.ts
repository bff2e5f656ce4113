/**
 * Offsets files as spreadsheets save them, each read to the same hull as the plain CSV of
 * the same table. The files are written here byte for byte as the export dialogs of the
 * common spreadsheets write them (from memory: a UTF-8 byte-order mark where the
 * format is "CSV UTF-8", CRLF line ends, text cells in quotes when they hold the
 * delimiter or when "quote all text cells" is ticked, and every row padded with
 * delimiters to the width of the widest row, empty rows included). Locales with a decimal
 * comma export with a semicolon or tab between cells (common practice, no source).
 *
 * The table is our own invented launch (not any vessel's), metres, with a keel column.
 */
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError, type Issue } from '../../core/common/errors.js';
import { readOffsetsCsv, type ReadOptions } from '../../core/offsets/readOffsets.js';

const BOM = '\uFEFF';
const CRLF = '\r\n';

/** The plain CSV: the project's own form, commas, points, LF, no padding. */
const PLAIN = [
  '# name: test launch',
  '# units: m',
  'x,keel_z,0,0.25,0.5,0.75',
  '0,0.1,,0.31,0.52,0.6',
  '1.5,0,0.12,0.45,0.61,0.66',
  '3,0,0.1,0.42,0.58,0.64',
  '4.5,0.05,,0.2,0.33,0.4',
].join('\n');

/** The same table's cells, row by row (header first), with the decimal mark a spreadsheet of the locale writes. */
const CELLS = [
  ['x', 'keel_z', '0', '0.25', '0.5', '0.75'],
  ['0', '0.1', '', '0.31', '0.52', '0.6'],
  ['1.5', '0', '0.12', '0.45', '0.61', '0.66'],
  ['3', '0', '0.1', '0.42', '0.58', '0.64'],
  ['4.5', '0.05', '', '0.2', '0.33', '0.4'],
];

/**
 * A spreadsheet's export: comment rows and the table, `sep` between cells, numbers with
 * `mark` as the decimal mark, every row padded to `width` cells, text quoted as `quote`
 * says, CRLF, a BOM in front.
 */
function exported(sep: string, mark: '.' | ',', width: number, quote: 'needed' | 'all-text' = 'needed', header: string[] = CELLS[0]!): string {
  const isNumber = (c: string): boolean => /^-?[\d.]+$/.test(c);
  const cell = (c: string): string => {
    const text = isNumber(c) ? c.replace('.', mark) : c;
    const q = quote === 'all-text' ? c !== '' && !isNumber(c) : text.includes(sep) || text.includes('"');
    return q ? `"${text.replace(/"/g, '""')}"` : text;
  };
  const row = (cells: string[]): string => [...cells, ...Array<string>(width - cells.length).fill('')].map(cell).join(sep);
  const lines = [
    row(['# name: test launch']),
    row(['# units: m']),
    row([]),
    row(header),
    ...CELLS.slice(1).map(row),
    row([]),
  ];
  return BOM + lines.join(CRLF) + CRLF;
}

const plain = readOffsetsCsv(PLAIN);

function issuesOf(text: string, options?: ReadOptions): readonly Issue[] {
  try {
    readOffsetsCsv(text, options);
  } catch (e) {
    if (isHalfbreadthError(e)) return e.issues;
    throw e;
  }
  throw new Error('the file was read without issues');
}

describe('exports of a spreadsheet read to the same hull as the plain CSV', () => {
  test.each([
    ['a semicolon file with decimal commas (a decimal-comma locale\'s CSV)', ';', ','],
    ['a tab file with decimal commas (a decimal-comma locale\'s text export)', '\t', ','],
    ['a tab file with decimal points', '\t', '.'],
    ['a comma file with decimal points, BOM and CRLF ("CSV UTF-8")', ',', '.'],
  ] as const)('%s', (_what, sep, mark) => {
    // Eight columns wide: two empty columns beyond the table, as a sheet with a note further right exports.
    const text = exported(sep, mark, 8);
    const r = readOffsetsCsv(text);
    expect(r.hull).toEqual(plain.hull);
    expect(r.units).toBe('m');
    expect(r.delimiter).toBe(sep);
  });

  test('every text cell quoted ("quote all text cells"), semicolons and decimal commas', () => {
    const text = exported(';', ',', 6, 'all-text');
    expect(text).toContain('"# name: test launch";;;;;');
    expect(text).toContain('"x";"keel_z";0;0,25;0,5;0,75');
    expect(readOffsetsCsv(text).hull).toEqual(plain.hull);
  });

  test('a name holding the delimiter comes quoted, and reads whole', () => {
    const text = exported(';', ',', 6).replace('# name: test launch;;;;;', '"# name: test launch; hull 2";;;;;');
    expect(readOffsetsCsv(text).hull.name).toBe('test launch; hull 2');
  });

  test('trailing empty cells of a row, and rows of nothing but delimiters, are no cells and no stations', () => {
    const text = ['x,0,0.5,1,,,', '0,0.2,0.4,0.5,,,', ',,,,,,', '1,0.3,0.5,0.6,,,', '2,0.2,0.4,0.5', ',,,'].join('\r\n');
    const r = readOffsetsCsv(text);
    expect(r.hull.waterlines).toEqual([0, 0.5, 1]);
    expect(r.hull.stations.map((s) => s.x)).toEqual([0, 1, 2]);
  });

  test('a cell beyond the header that is not blank is still an error, at its line and column', () => {
    const issues = issuesOf(['x,0,0.5,1', '0,0.2,0.4,0.5,,7', '1,0.3,0.5,0.6', '2,0.2,0.4,0.5'].join('\n'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([['HYD_ROW_LENGTH', ['offsets', 2, 5]]]);
  });

  test('the points form exports the same way, with a unit in each column name', () => {
    const points = ['x,y,z', '0,0,0', '0,0.5,0.5', '1,0,0', '1,0.6,0.5', '2,0,0', '2,0.4,0.5'];
    const semicolons = [BOM + 'x (m);y (m);z (m);;', '0;0;0;;', '0;0,5;0,5;;', '1;0;0;;', '1;0,6;0,5;;', ';;;;', '2;0;0;;', '2;0,4;0,5;;'].join(CRLF);
    expect(readOffsetsCsv(semicolons).hull).toEqual(readOffsetsCsv(points.join('\n')).hull);
  });

  test('a comma file keeps its comma for cells: a decimal comma there is still not a number', () => {
    const issues = issuesOf(['x,0,0.5,1', '0,0.2,"0,4",0.5', '1,0.3,0.5,0.6', '2,0.2,0.4,0.5'].join('\n'));
    expect(issues.map((i) => [i.code, i.path])).toEqual([['HYD_CELL_NOT_NUMBER', ['offsets', 2, 3]]]);
  });

  test('thousands separators are not read as decimal marks', () => {
    const issues = issuesOf(['x;0;500;1.000,5', '0;200;400;500', '1000;300;500;600', '2000;200;400;500'].join('\n'));
    expect(issues[0]!.code).toBe('HYD_HEADER');
    expect(issues[0]!.path).toEqual(['offsets', 1, 4]);
  });
});

describe('a unit in the x header cell', () => {
  // The plain table in millimetres: every length x 1000.
  const mmCells = (sep: string): string[] => [
    '0;0;;310;520;600'.replace(/;/g, sep),
    '1500;0;120;450;610;660'.replace(/;/g, sep),
    '3000;0;100;420;580;640'.replace(/;/g, sep),
    '4500;50;;200;330;400'.replace(/;/g, sep),
  ];
  const mm = (header: string, ...meta: string[]): string => [...meta, header, ...mmCells(',')].join('\n');
  const metres = readOffsetsCsv(PLAIN.replace('0,0.1,,0.31', '0,0,,0.31').replace('4.5,0.05', '4.5,0.05')).hull;

  test('stands for the units line: x (mm) reads millimetres', () => {
    const r = readOffsetsCsv(mm('x (mm),keel_z,0,250,500,750', '# name: test launch'));
    expect(r.units).toBe('mm');
    expect(r.hull.waterlines).toEqual([0, 0.25, 0.5, 0.75]);
    expect(r.hull.stations.map((s) => s.x)).toEqual([0, 1.5, 3, 4.5]);
    expect(r.hull).toEqual(metres);
  });

  test('x [mm] agreeing with "# units: mm" reads the same', () => {
    expect(readOffsetsCsv(mm('x [mm],keel_z,0,250,500,750', '# name: test launch', '# units: mm')).hull).toEqual(metres);
  });

  test('a header unit that disagrees with the units line is an error naming both', () => {
    const issues = issuesOf(mm('x (mm),keel_z,0,250,500,750', '# name: test launch', '# units: m'));
    expect(issues).toEqual([
      {
        code: 'HYD_UNITS_CONFLICT',
        path: ['offsets', 3, 1],
        message: 'line 3, column 1: the header gives the unit mm but the units line (line 2) says m; give the unit once, or make them agree',
      },
    ]);
  });

  test('a unit that is not a length unit of the files is named', () => {
    const issues = issuesOf(mm('x (cm),keel_z,0,250,500,750'));
    expect(issues[0]).toMatchObject({ code: 'HYD_HEADER', path: ['offsets', 1, 1] });
    expect(issues[0]!.message).toContain("the unit 'cm' in header cell 'x (cm)' is not one of m, mm, ft, in, ft-in-8");
  });

  test('heights written with their unit are refused with a hint to write it once in the x cell', () => {
    const issues = issuesOf(['x,0 m,0.5 m', '0,0.2,0.4', '1,0.3,0.5', '2,0.2,0.4'].join('\n'));
    expect(issues[0]!.message).toContain("write heights as plain numbers and the unit once, in the x header cell (x (m)) or a '# units:' line");
  });

  test('the request names the unit of a file that gives none (input units)', () => {
    const r = readOffsetsCsv(mm('x,keel_z,0,250,500,750', '# name: test launch'), { inputUnits: 'mm' });
    expect(r.units).toBe('mm');
    expect(r.hull).toEqual(metres);
  });

  test('input units that disagree with the file\'s own are an error naming both', () => {
    const issues = issuesOf(mm('x,keel_z,0,250,500,750', '# units: m'), { inputUnits: 'mm' });
    expect(issues).toEqual([
      {
        code: 'HYD_UNITS_CONFLICT',
        path: ['offsets', 1],
        message: 'line 1: the units line (line 1) says m but the request names mm (input units, for a file without a units line); leave the input units out, or make them agree',
      },
    ]);
    // Input units that agree are no error.
    expect(readOffsetsCsv(mm('x (mm),keel_z,0,250,500,750'), { inputUnits: 'mm' }).units).toBe('mm');
  });
});
