/**
 * The options every table command of the command line shares (--fields, --digits,
 * --plain-header, --input-units, --units), and --levers stations of the sheet, run
 * in-process through main() with fake streams. Figures are checked on a box barge
 * L x B x D = 10 x 4 x 2 m written out in the test (closed forms: displacement
 * rho L B T, wetted surface L B + 2 L T + 2 B T, TPC rho L B / 100; E. C. Tupper,
 * Introduction to Naval Architecture, 5th ed., 2013, ch. 3-4), and warnings on the
 * demo workboat in feet-inches-eighths with one offset moved.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { boxCsv } from '../fixtures/serverHelpers.js';
import { runCli } from '../helpers/runCli.js';

/** The command line in-process (test/helpers/runCli.ts); stdout a terminal when `tty`. */
const run = (argv: string[], files: Record<string, string> = {}, tty = false) => runCli(argv, { files, ttyOut: tty });

const BOX = { 'box.csv': boxCsv('test box', 10, 4, 2) };
const DATUM = "x and every position along the length are measured from the offsets' origin (positive forward): AP at x = 0 m; amidships at x = 5 m; FP at x = 10 m; LBP 10 m; 11 stations";

describe('the shared options of the table commands', () => {
  test('--fields and --plain-header: the header first, the caution last, whole output', async () => {
    const r = await run(['hydrostatics', 'box.csv', '--drafts', '1,1.5', '--fields', 'displacement,wettedSurface', '--plain-header'], BOX);
    expect(r.code, r.err).toBe(0);
    // 1.025 x 40 x T: 41 and 61.5 t; 40 + 20 T + 8 T: 68 and 82 m2.
    expect(r.out).toBe(['displacement_t,wettedSurface_m2', '41,68', '61.5,82', '# hull: test box', '# density: 1.025 t/m3', `# ${DATUM}`, `# ${CAUTION}`, ''].join('\r\n'));
  });

  test('--digits 3 rounds every number written; an unknown field is named with the columns there are', async () => {
    const r = await run(['hydrostatics', 'box.csv', '--drafts', '1.1', '--density', '1.03', '--fields', 'tpc,displacement', '--digits', '3', '--format', 'json'], BOX);
    // 1.03 x 40 / 100 = 0.412 t/cm; 1.03 x 40 x 1.1 = 45.32 t, to three digits 45.3.
    expect(JSON.parse(r.out).rows).toEqual([{ tpc: 0.412, displacement: 45.3 }]);
    const bad = await run(['hydrostatics', 'box.csv', '--drafts', '1', '--fields', 'freeboard', '--digits', '20'], BOX);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain("halfbreadth hydrostatics: --digits '20' is not a whole number of significant digits from 3 to 17");
    const field = await run(['hydrostatics', 'box.csv', '--drafts', '1', '--fields', 'freeboard'], BOX);
    expect(field.err).toContain("fields: 'freeboard' is not a column of this answer; its columns are draft, volume, displacement");
  });

  test('--input-units names the unit of a file that gives none', async () => {
    const mm = ['x,0,500,1000,1500,2000', ...[0, 1000, 2000, 3000, 4000, 5000, 6000, 7000, 8000, 9000, 10000].map((x) => `${x},2000,2000,2000,2000,2000`)].join('\n');
    const r = await run(['hydrostatics', 'mm.csv', '--drafts', '1', '--input-units', 'mm', '--fields', 'displacement', '--format', 'json'], { 'mm.csv': mm });
    expect(JSON.parse(r.out).rows).toEqual([{ displacement: 41 }]);
    const clash = await run(['check', 'mm.csv', '--input-units', 'mm'], { 'mm.csv': `# units: m\n${mm}` });
    expect(clash.code).toBe(2);
    expect(clash.err).toContain('mm.csv: line 1: the units line (line 1) says m but the request names mm');
    const unknown = await run(['hydrostatics', 'mm.csv', '--drafts', '1', '--input-units', 'cm'], { 'mm.csv': mm });
    expect(unknown.err).toContain("--input-units 'cm' is not one of m, mm, ft, in, ft-in-8");
  });

  test('every table command lists them in its help', async () => {
    for (const command of ['hydrostatics', 'sheet', 'bonjean', 'areas', 'check']) {
      const r = await run([command, '--help']);
      for (const option of ['--units <system>', '--fields <list>', '--digits <n>', '--plain-header', '--input-units <u>']) expect(r.out, `${command} ${option}`).toContain(option);
    }
  });

  test('the text table shows a small figure to three significant digits, not 0.000', async () => {
    // A box 1 x 0.1 x 0.1 m at 0.05 m: MCT 1 cm = rho V BML / (100 L) with BML = L^2 / (12 T),
    // = 1.025 x 0.005 x (1 / 0.6) / 100 = 8.54e-5 t.m/cm; IT = L B^3 / 12 = 8.33e-5 m4.
    const r = await run(['hydrostatics', 'tiny.csv', '--drafts', '0.05', '--format', 'table'], { 'tiny.csv': boxCsv('tiny', 1, 0.1, 0.1) });
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('0.0000854');
    expect(r.out).toContain('0.0000833');
    expect(r.out).not.toMatch(/\s0\.000\s/);
  });
});

describe('Bonjean heights in the text table', () => {
  test('are written clean: a table in millimetres gives z 0.7, not z 0.7000000000000001', async () => {
    // 700 mm x 0.001 m/mm is 0.7000000000000001 in a double (IEEE 754), the binary noise a reader should never see.
    expect(700 * 0.001).not.toBe(0.7);
    const mm = ['# units: mm', 'x,0,350,700,1050', '0,500,500,500,500', '1000,500,500,500,500', '2000,500,500,500,500'].join('\n');
    const r = await run(['bonjean', 'mm.csv', '--format', 'table'], { 'mm.csv': mm });
    expect(r.out).toContain('z 0.7 ');
    expect(r.out).not.toContain('0.7000000000000001');
  });
});

describe('the sheet with levers in station spaces', () => {
  test('--levers stations: the levers count stations from amidships, and the results are those in metres', async () => {
    const st = JSON.parse((await run(['sheet', 'box.csv', '--draft', '1', '--levers', 'stations', '--format', 'json'], BOX)).out);
    const m = JSON.parse((await run(['sheet', 'box.csv', '--draft', '1', '--format', 'json'], BOX)).out);
    expect(st.levers).toBe('stations');
    expect(st.stations.map((s: { lever: number }) => s.lever)).toEqual([-5, -4, -3, -2, -1, 0, 1, 2, 3, 4, 5]);
    expect(m.stations.map((s: { lever: number }) => s.lever)).toEqual([-5, -4, -3, -2, -1, 0, 1, 2, 3, 4, 5]);
    expect(st.results).toEqual(m.results);
    const bad = await run(['sheet', 'box.csv', '--draft', '1', '--levers', 'feet'], BOX);
    expect(bad.err).toContain("--levers 'feet' is not one of metres, stations");
  });
});

describe('warnings in the file\'s own units, at its line and column', () => {
  test('an unfair offset of a feet-inches-eighths table is said in feet-inches-eighths', async () => {
    // The demo workboat in ft-in-8 with its half-breadth at station 22-11-4+ on WL 4-1-1+ (line 13,
    // column 11, after x, keel_z, deck_z, deck_y and six waterlines) moved out from 7-2-4+ by
    // about 2 % of the beam, to 7-6-1+.
    const file = fileURLToPath(new URL('../../offsets-demo/workboat-ftin.csv', import.meta.url));
    const lines = readFileSync(file, 'utf8').split('\n');
    expect(lines[12]!.split(',')[10]).toBe('7-2-4+');
    const cells = lines[12]!.split(',');
    cells[10] = '7-6-1+';
    lines[12] = cells.join(',');
    const r = await run(['check', 'bumped.csv', '--format', 'json'], { 'bumped.csv': lines.join('\n') });
    expect(r.code).toBe(0);
    expect(r.err).toContain('bumped.csv: warning: line 13, column 11 (station x = 22-11-4+, WL 4-1-1+): half-breadth 7-6-1+ is not fair along');
    expect(JSON.parse(r.out).warnings[0]).toMatchObject({ line: 13, column: 11 });
  });
});
