/**
 * The command line, run in-process through `main(argv, io)` with fake streams for most
 * checks and as the real installed command (node bin/halfbreadth.js, a child process)
 * for the end-to-end ones. The figures it prints are checked against the core's own
 * hydrostaticTable for the same hull and drafts: an honest check of the plumbing
 * (reading, options, formats, exit codes), not of the numerics, which the core's tests
 * hold against closed-form hulls. Facts about the demo files (stations, perpendiculars,
 * name) are read from the files' own text here, independently of the reader.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { parseDraftList } from '../../core/common/draftList.js';
import type { HydrostaticRow } from '../../core/upright/hydrostaticFields.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { COMMANDS } from '../../cli/commands/index.js';
import type { CliIo } from '../../cli/io.js';
import { main } from '../../cli/main.js';
import { written } from '../helpers/written.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const demo = (name: string): string => fileURLToPath(new URL(`../../offsets-demo/${name}`, import.meta.url));
const WORKBOAT = demo('workboat.csv');
const LAUNCH = demo('survey-launch.csv');
const DRAFTS = '0.4:0.2:2.0,2.1';

/** Field names of a hydrostatic row, as in the field table of the project's conventions. */
const FIELDS = [
  'draft', 'volume', 'displacement', 'lcb', 'vcb', 'waterplaneArea', 'lcf', 'iT', 'iL', 'bmt', 'bml', 'kmt', 'kml',
  'tpc', 'mct1cm', 'lwl', 'bwl', 'am', 'cb', 'cm', 'cp', 'cwp', 'wettedSurface',
] as const;
/** Their CSV headers: the unit written after the name (conventions: "CSV headers carry units"). */
const HEADERS = [
  'draft_m', 'volume_m3', 'displacement_t', 'lcb_m', 'vcb_m', 'waterplaneArea_m2', 'lcf_m', 'iT_m4', 'iL_m4', 'bmt_m',
  'bml_m', 'kmt_m', 'kml_m', 'tpc_t_per_cm', 'mct1cm_tm_per_cm', 'lwl_m', 'bwl_m', 'am_m2', 'cb', 'cm', 'cp', 'cwp',
  'wettedSurface_m2',
];

interface Run {
  code: number;
  out: string;
  err: string;
}

interface FakeOptions {
  tty?: boolean;
  stdin?: string;
  files?: Record<string, string>;
  env?: Record<string, string>;
  readFile?: (path: string) => Promise<Uint8Array>;
}

/** Run main in-process; files not in `files` are read from disk. */
async function run(argv: string[], o: FakeOptions = {}): Promise<Run> {
  let out = '';
  let err = '';
  const io: CliIo = {
    stdout: { write: (t: string) => (out += t), isTTY: o.tty ?? false },
    stderr: { write: (t: string) => (err += t), isTTY: false },
    readStdin: async () => new TextEncoder().encode(o.stdin ?? ''),
    readFile:
      o.readFile ??
      (async (p: string) => {
        const v = o.files?.[p];
        return v === undefined ? readFileSync(p) : new TextEncoder().encode(v);
      }),
    env: o.env ?? {},
  };
  const code = await main(argv, io);
  return { code, out, err };
}

/** The table the core computes for a file and a drafts list, without the command line. */
function coreRows(file: string, drafts: string, density = 1.025): HydrostaticRow[] {
  const { hull } = readOffsetsCsv(readFileSync(file, 'utf8'));
  return hydrostaticTable(prepareHull(hull), parseDraftList(drafts), density);
}

function parseCsv(text: string): Papa.ParseResult<Record<string, string>> {
  return Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true });
}

/** The `# key: value` metadata of a file, read with a regular expression. */
function metadata(file: string, key: string): string | undefined {
  return new RegExp(`^#\\s*${key}\\s*:\\s*(.*)$`, 'm').exec(readFileSync(file, 'utf8'))?.[1]?.trim();
}

/** Data lines of a file: not blank, not comments, after the header. */
function dataLines(file: string): string[] {
  const lines = readFileSync(file, 'utf8').split(/\r?\n/).filter((l) => l.trim() !== '' && !l.trim().startsWith('#'));
  return lines.slice(1);
}

/** Drafts a person would type, as numbers: the list written out by hand. */
const DRAFT_VALUES = [0.4, 0.6, 0.8, 1.0, 1.2, 1.4, 1.6, 1.8, 2.0, 2.1];

describe('hydrostatics as CSV', () => {
  test('piped output is CSV by default: caution first, unit headers, one row per draft', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const parsed = parseCsv(r.out);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(HEADERS);
    expect(parsed.data.map((row) => Number(row['draft_m']))).toEqual(DRAFT_VALUES);
  });

  test('every CSV figure equals the core table for the same hull and drafts', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS, '--format', 'csv']);
    const rows = parseCsv(r.out).data;
    const expected = coreRows(WORKBOAT, DRAFTS);
    expect(rows).toHaveLength(expected.length);
    rows.forEach((row, i) => {
      FIELDS.forEach((f, k) => {
        const want = expected[i]![f];
        const cell = row[HEADERS[k]!]!;
        if (Number.isFinite(want)) expect(Number(cell), `${f} at row ${i}`).toBe(written(want));
        else expect(cell).toBe('');
      });
    });
  });

  test('the CSV names the hull and the density in comment lines', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--density', '1.02']);
    const comments = r.out.split('\r\n').filter((l) => l.startsWith('#'));
    expect(comments[1]).toBe(`# hull: ${metadata(WORKBOAT, 'name')!.replace(/,/g, ' ')}`);
    expect(comments[2]).toBe('# density: 1.02 t/m3');
  });
});

describe('hydrostatics as a table and as JSON', () => {
  test('on a terminal the default is the text table, with a units line and the caution', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS], { tty: true });
    expect(r.code).toBe(0);
    const all = r.out.trimEnd().split('\n');
    // The lines above the table say what it is of: the hull, the density, the datum of x.
    const lines = all.slice(all.findIndex((l) => l.trim().startsWith('Draft')) - 1);
    expect(lines[1]!.trim().split(/\s+/).slice(0, 3)).toEqual(['Draft', 'Volume', 'Displ.']);
    expect(lines[2]!.trim().split(/\s+/).slice(0, 3)).toEqual(['m', 'm3', 't']);
    expect(lines.slice(3, 3 + DRAFT_VALUES.length).map((l) => Number(l.trim().split(/\s+/)[0]))).toEqual(DRAFT_VALUES);
    expect(lines[lines.length - 1]).toBe(CAUTION);
  });

  test('the table shows the core figures rounded: volume to the millimetre cube', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS, '--format', 'table']);
    const expected = coreRows(WORKBOAT, DRAFTS);
    const all = r.out.split('\n');
    const head = all.findIndex((l) => l.trim().startsWith('Draft'));
    const body = all.slice(head + 2, head + 2 + expected.length);
    body.forEach((l, i) => expect(Number(l.trim().split(/\s+/)[1])).toBeCloseTo(expected[i]!.volume, 3));
  });

  test('--format json wins over a terminal and gives hull, density, caution and rows', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS, '--format', 'json'], { tty: true });
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { hull: Record<string, unknown>; density: number; caution: string; rows: Record<string, number | null>[] };
    expect(Object.keys(j)).toEqual(['hull', 'density', 'caution', 'rows', 'notes']);
    expect(j.caution).toBe(CAUTION);
    expect(j.density).toBe(1.025);
    expect(j.hull['name']).toBe(metadata(WORKBOAT, 'name'));
    expect(j.hull['stations']).toBe(dataLines(WORKBOAT).length);
    expect(j.hull['lbp']).toBe(Number(metadata(WORKBOAT, 'fp')) - Number(metadata(WORKBOAT, 'ap')));
    const expected = coreRows(WORKBOAT, DRAFTS);
    expect(j.rows).toHaveLength(expected.length);
    j.rows.forEach((row, i) => {
      expect(Object.keys(row)).toEqual([...FIELDS]);
      for (const f of FIELDS) {
        const want = expected[i]![f];
        expect(row[f]).toBe(Number.isFinite(want) ? written(want) : null);
      }
    });
  });

  test('--format table wins over a pipe', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--format', 'table']);
    const all = r.out.split('\n');
    expect(all[all.findIndex((l) => l.trim().startsWith('Draft')) + 1]!.trim().startsWith('m')).toBe(true);
  });

  test('the points form (survey launch) runs the same way', async () => {
    const drafts = '0.2:0.1:1.2';
    const r = await run(['hydrostatics', LAUNCH, '--drafts', drafts, '--format', 'json']);
    expect(r.code).toBe(0);
    const rows = (JSON.parse(r.out) as { rows: Record<string, number | null>[] }).rows;
    const expected = coreRows(LAUNCH, drafts);
    expect(rows.map((x) => x['volume'])).toEqual(expected.map((x) => written(x.volume)));
    expect(rows.map((x) => x['kmt'])).toEqual(expected.map((x) => written(x.kmt)));
  });
});

describe('density', () => {
  test('--fresh is density 1.000: displacement equals volume, as Δ = ρ∇ (conventions)', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '0.5,1.5', '--fresh', '--format', 'json']);
    const j = JSON.parse(r.out) as { density: number; rows: { volume: number; displacement: number }[] };
    expect(j.density).toBe(1);
    for (const row of j.rows) expect(row.displacement).toBe(row.volume);
  });

  test('sea water by default: displacement is 1.025 times the volume (common practice, no source)', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--format', 'json']);
    const row = (JSON.parse(r.out) as { rows: { volume: number; displacement: number }[] }).rows[0]!;
    expect(row.displacement).toBeCloseTo(1.025 * row.volume, 9);
  });

  test.each([['1025', /kg\/m3/], ['0.5', /outside 0.9 to 1.1/], ['abc', /not a number/], ['', /not a number/]])(
    '--density %j is bad input naming the density',
    async (value, why) => {
      const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', `--density=${value}`]);
      expect(r.code).toBe(2);
      expect(r.out).toBe('');
      expect(r.err).toMatch(/^--density: density /);
      expect(r.err).toMatch(why);
    },
  );

  test('--fresh and --density together are refused', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--fresh', '--density', '1.0']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--fresh and --density');
  });
});

describe('standard input', () => {
  test('- reads the offsets from standard input and gives the same table as the file', async () => {
    const text = readFileSync(WORKBOAT, 'utf8');
    const fromStdin = await run(['hydrostatics', '-', '--drafts', DRAFTS], { stdin: text });
    const fromFile = await run(['hydrostatics', WORKBOAT, '--drafts', DRAFTS]);
    expect(fromStdin.code).toBe(0);
    expect(fromStdin.out).toBe(fromFile.out);
  });

  test('errors in standard input are labelled <stdin>', async () => {
    const r = await run(['check', '-'], { stdin: 'x,0,1\n0,1,-1\n' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^<stdin>: line 2, column 3/m);
  });
});

/** A grid file with four faults on known lines and columns (an invented table). */
const BROKEN = [
  '# name: broken example',
  '# units: m',
  'x,0,0.5,1',
  '0,0.1,-0.3,0.5', // line 4, column 3: a negative half-breadth
  '1,a,0.4,0.5', // line 5, column 2: not a number
  '2,0.2,,0.6', // line 6, column 3: a blank inside the row
  '1.5,0.2,0.3,0.4', // line 7, column 1: x goes backwards
  '',
].join('\n');

describe('bad input', () => {
  test('a broken file reports every error with its line and column, and exit 2', async () => {
    const r = await run(['hydrostatics', 'broken.csv', '--drafts', '0.5'], { files: { 'broken.csv': BROKEN } });
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    const lines = r.err.trimEnd().split('\n');
    expect(lines.slice(0, 4).map((l) => /^broken\.csv: line \d+, column \d+/.exec(l)?.[0])).toEqual([
      'broken.csv: line 4, column 3',
      'broken.csv: line 5, column 2',
      'broken.csv: line 6, column 3',
      'broken.csv: line 7, column 1',
    ]);
    expect(lines[0]).toContain('-0.3');
    expect(lines[4]).toBe('halfbreadth hydrostatics: 4 problems found');
  });

  test('problems in the options and in the file are reported together', async () => {
    const r = await run(['hydrostatics', 'broken.csv', '--drafts', '0.5,x', '--density', '2'], { files: { 'broken.csv': BROKEN } });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^--drafts: drafts item 2 "x"/m);
    expect(r.err).toMatch(/^--density: density '2'/m);
    expect(r.err).toMatch(/^broken\.csv: line 4, column 3/m);
    expect(r.err).toContain('6 problems found');
  });

  test('every draft outside the hull is named, and nothing is written to stdout', async () => {
    // The workboat's baseline is z = 0 and its deck edge z = 2.2 m (its own header row,
    // whose cells after x and the named columns are the waterline heights).
    const header = readFileSync(WORKBOAT, 'utf8').split('\n').find((l) => l.startsWith('x,'))!;
    const top = Math.max(...header.split(',').slice(1).filter((c) => !/^[a-z_]+$/.test(c)).map(Number));
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', `0,1,${top + 0.5},${top + 1}`]);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    const lines = r.err.trimEnd().split('\n');
    expect(lines.slice(0, 3).every((l) => l.startsWith('--drafts: draft '))).toBe(true);
    expect(lines[0]).toContain('draft 0 m');
    expect(lines[1]).toContain(`draft ${top + 0.5} m`);
    expect(lines[2]).toContain(`draft ${top + 1} m`);
  });

  test.each([
    [['hydrostatics', WORKBOAT], /--drafts or --displacements is required/],
    [['hydrostatics', '--drafts', '1'], /missing <file\|->/],
    [['hydrostatics', WORKBOAT, '--drafts'], /--drafts needs a value/],
    [['hydrostatics', WORKBOAT, '--drafts', '--format', 'csv'], /--drafts needs a value/],
    [['hydrostatics', WORKBOAT, '--drafts', '1', '--bogus'], /unknown option --bogus/],
    [['hydrostatics', WORKBOAT, '--drafts', '1', '-q'], /unknown option -q/],
    [['hydrostatics', WORKBOAT, '--drafts', '1', '--fresh=yes'], /--fresh takes no value/],
    [['hydrostatics', WORKBOAT, '--drafts', '1', '--drafts', '2'], /--drafts is given more than once/],
    [['hydrostatics', WORKBOAT, 'extra.csv', '--drafts', '1'], /unexpected argument 'extra\.csv'/],
    [['hydrostatics', WORKBOAT, '--drafts', '1', '--format', 'xml'], /--format 'xml' is not one of table, csv, json/],
    [['check', WORKBOAT, '--format', 'csv'], /--format 'csv' is not one of table, json/],
    [['hydrostatics', 'no-such-file.csv', '--drafts', '1'], /^no-such-file\.csv: cannot be read: no such file/m],
    [['frobnicate'], /unknown command 'frobnicate'; the commands are .*hydrostatics.*check/],
    [['--frob'], /unknown option --frob/],
    [[], /no command given/],
  ])('%j is bad input, exit 2', async (argv, why) => {
    const r = await run(argv);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(why);
  });

  test('an unknown command is answered with the list of every command', async () => {
    const r = await run(['frobnicate']);
    for (const c of COMMANDS) expect(r.err).toContain(c.name);
  });

  test('a file that is not UTF-8 is reported, not read', async () => {
    const r = await run(['check', 'latin1.csv'], {
      readFile: async () => Uint8Array.from([0x78, 0x2c, 0x30, 0x0a, 0xe9, 0xff, 0x0a]),
    });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^latin1\.csv: .*UTF-8/m);
  });
});

describe('text from a file on a terminal', () => {
  // ESC starts a terminal control sequence (ECMA-48); a file's text must not bring one.
  const ESC = '\u001b';
  const named = `# name: evil${ESC}]0;owned${ESC}\\ hull\n` + readFileSync(WORKBOAT, 'utf8').replace(/^# name:.*\n/m, '');

  test('a hull name with control characters is refused where it comes in, naming its line', async () => {
    const r = await run(['hydrostatics', 'named.csv', '--drafts', '1', '--format', 'table'], { files: { 'named.csv': named } });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^named\.csv: line 1: name holds a control character/m);
    expect(r.err).not.toContain(ESC);
  });

  test('and in error messages', async () => {
    const r = await run(['check', 'bad.csv'], { files: { 'bad.csv': `x,0,1\n0,1,${ESC}[2J\n1,1,1\n2,1,1\n` } });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^bad\.csv: line 2, column 3/m);
    expect(r.err).not.toContain(ESC);
  });
});

describe('internal faults', () => {
  const broken = async (): Promise<Uint8Array> => {
    throw new TypeError('disk on fire');
  };

  test('a fault that is not bad input exits 1 with its message and no stack', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1'], { readFile: broken });
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toContain('internal fault: disk on fire');
    expect(r.err).not.toMatch(/^\s+at /m);
  });

  test('HALFBREADTH_DEBUG=1 adds the stack', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1'], { readFile: broken, env: { HALFBREADTH_DEBUG: '1' } });
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^\s+at /m);
  });
});

describe('help', () => {
  test('--help lists the commands and explains the default format, exit 0', async () => {
    const r = await run(['--help']);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(r.out).toMatch(/^ {2}hydrostatics +\S/m);
    expect(r.out).toMatch(/^ {2}check +\S/m);
    expect(r.out).toMatch(/table when stdout is a terminal and CSV when it is piped/);
    expect(r.out).toContain('naval architect');
  });

  test.each([[['hydrostatics', '--help']], [['help', 'hydrostatics']], [['hydrostatics', '-h', '--bogus']]])(
    '%j prints the help of hydrostatics',
    async (argv) => {
      const r = await run(argv);
      expect(r.code).toBe(0);
      expect(r.out).toMatch(/^Usage: halfbreadth hydrostatics <file\|-> --drafts <list>/);
      expect(r.out).toContain('--density <t/m3>');
      expect(r.out).toContain('csv when');
    },
  );

  test('help of check', async () => {
    const r = await run(['check', '--help']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^Usage: halfbreadth check <file\|->/);
  });

  test('help of an unknown command is bad input', async () => {
    const r = await run(['help', 'frob']);
    expect(r.code).toBe(2);
    expect(r.err).toContain("unknown command 'frob'");
  });
});

describe('check', () => {
  test('a sound grid file: its particulars, from its own text, and exit 0', async () => {
    const r = await run(['check', WORKBOAT, '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { errors: unknown[]; warnings: unknown[]; particulars: Record<string, unknown>; caution: string };
    expect(j.errors).toEqual([]);
    expect(j.warnings).toEqual([]);
    expect(j.caution).toBe(CAUTION);
    // The header is x, keel_z, deck_z, deck_y, then the waterline heights (the conventions' grid form).
    const header = readFileSync(WORKBOAT, 'utf8').split('\n').find((l) => l.startsWith('x,'))!.split(',');
    expect(header.slice(1, 4)).toEqual(['keel_z', 'deck_z', 'deck_y']);
    const first = 4;
    const heights = header.slice(first).map(Number);
    const ap = Number(metadata(WORKBOAT, 'ap'));
    const fp = Number(metadata(WORKBOAT, 'fp'));
    const rows = dataLines(WORKBOAT).map((l) => l.split(','));
    // A point per defined half-breadth, and one more where the keel lies below the lowest of them.
    const points = rows.reduce((n, cells) => {
      const defined = cells.slice(first).map((c, k) => (c.trim() === '' ? undefined : heights[k]!)).filter((z) => z !== undefined);
      return n + defined.length + (Number(cells[1]) < Math.min(...defined) ? 1 : 0);
    }, 0);
    expect(j.particulars).toMatchObject({
      name: metadata(WORKBOAT, 'name'),
      form: 'grid',
      units: 'm',
      stations: rows.length,
      waterlines: heights.length,
      points,
      ap,
      fp,
      lbp: fp - ap,
      amidships: (ap + fp) / 2,
    });
    // The lowest keel: the lowest keel_z; the deck edge: the header's top.
    const lowestKeel = Math.min(...rows.map((cells) => Number(cells[1])));
    expect(j.particulars['drafts']).toEqual({ above: lowestKeel, atMost: heights[heights.length - 1] });
  });

  test('a sound points file as a table', async () => {
    const r = await run(['check', LAUNCH], { tty: true });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/reads without error/);
    expect(r.out).toMatch(/^ {2}form +points/m);
    expect(r.out).toMatch(new RegExp(`^ {2}stations +${new Set(dataLines(LAUNCH).map((l) => Number(l.split(',')[0]))).size}$`, 'm'));
    expect(r.out).toMatch(/^ {2}waterlines +-$/m);
    expect(r.out.trimEnd().endsWith(CAUTION)).toBe(true);
  });

  test('a feet-inches file is reported in metres: fp 45-11-1+ gives LBP 14.0001625 m', async () => {
    // 45-11-1+ is 45 ft 11 3/16 in (one eighth and a sixteenth): (45 × 12 + 11.1875) × 0.0254 m
    // = 14.0001625 m (1 in = 25.4 mm exactly, by the 1959 international yard and pound agreement).
    const r = await run(['check', demo('workboat-ftin.csv'), '--format', 'json']);
    const p = (JSON.parse(r.out) as { particulars: { units: string; lbp: number } }).particulars;
    expect(p.units).toBe('ft-in-8');
    expect(p.lbp).toBeCloseTo((45 * 12 + 11.1875) * 0.0254, 9);
  });

  test('a broken file: every error in JSON with code and path, also on stderr, exit 2', async () => {
    const r = await run(['check', 'broken.csv', '--format', 'json'], { files: { 'broken.csv': BROKEN } });
    expect(r.code).toBe(2);
    const j = JSON.parse(r.out) as { errors: { code: string; path: unknown[]; message: string }[]; particulars: unknown };
    expect(j.particulars).toBeNull();
    expect(j.errors.map((e) => [e.code, e.path])).toEqual([
      ['HYD_HALF_BREADTH_NEGATIVE', ['offsets', 4, 3]],
      ['HYD_CELL_NOT_NUMBER', ['offsets', 5, 2]],
      ['HYD_BLANK_INSIDE_ROW', ['offsets', 6, 3]],
      ['HYD_X_NOT_INCREASING', ['offsets', 7, 1]],
    ]);
    expect(r.err.trimEnd().split('\n')).toHaveLength(5);
  });

  test('a broken file as a table: errors on stderr only', async () => {
    const r = await run(['check', 'broken.csv'], { files: { 'broken.csv': BROKEN }, tty: true });
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/^broken\.csv: line 7, column 1/m);
  });
});

describe('the installed command, end to end', () => {
  const BIN = fileURLToPath(new URL('../../bin/halfbreadth.js', import.meta.url));
  const node = (args: string[], input?: string) =>
    spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, input, encoding: 'utf8', env: { ...process.env, HALFBREADTH_DEBUG: '' } });

  // The bin runs dist/cli/main.js, which test/globalSetup.ts has made current.

  test('hydrostatics to a pipe writes CSV and exits 0', () => {
    const r = node(['hydrostatics', 'offsets-demo/workboat.csv', '--drafts', DRAFTS]);
    expect(r.stderr).toBe('');
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout.startsWith(`# ${CAUTION}\r\n`)).toBe(true);
    const rows = parseCsv(r.stdout).data;
    expect(rows.map((row) => Number(row['volume_m3']))).toEqual(coreRows(WORKBOAT, DRAFTS).map((x) => written(x.volume)));
  });

  test('standard input with -, as JSON', () => {
    const r = node(['hydrostatics', '-', '--drafts', '1', '--format', 'json'], readFileSync(LAUNCH, 'utf8'));
    expect(r.status, r.stderr).toBe(0);
    expect((JSON.parse(r.stdout) as { rows: unknown[] }).rows).toHaveLength(1);
  });

  test('bad input exits 2 with the errors on stderr', () => {
    const r = node(['check', '-'], BROKEN);
    expect(r.status, r.stderr).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^<stdin>: line 4, column 3/m);
  });

  test('a reader that stops early gets one line on stderr and exit status 1: the output is not whole', () => {
    // 2,000 drafts make a table far longer than a pipe buffer; the reader takes one line and closes the pipe (EPIPE).
    const r = spawnSync('bash', ['-c', `"${process.execPath}" "${BIN}" hydrostatics offsets-demo/workboat.csv --drafts 0.001:0.0011:2.2 | head -n 1; echo "status \${PIPESTATUS[0]}" >&2`], {
      cwd: ROOT,
      encoding: 'utf8',
    });
    expect(r.stdout).toBe(`# ${CAUTION}\n`.replace('\n', '\r\n'));
    expect(r.stderr).toBe('halfbreadth: cannot write the output: the reader closed the output before all of it was written (EPIPE)\nstatus 1\n');
  });
});
