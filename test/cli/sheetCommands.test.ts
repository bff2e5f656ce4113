/**
 * The commands sheet, bonjean and areas, the --units imperial and --error-estimate
 * options of hydrostatics and the fairness warnings of check, run in-process through
 * `main(argv, io)` with fake streams. These check the plumbing (options, forms, exit
 * codes, the caution) against the core called directly; the figures themselves are held
 * to closed forms in the core's tests (calculationSheet, bonjean, sectionalAreaCurve,
 * imperial, errorEstimate, fairness).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { written } from '../helpers/written.js';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import { hydrostaticsAt } from '../../core/upright/hydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import '../helpers/relClose.js';
import { runCli } from '../helpers/runCli.js';

const demo = (name: string): string => fileURLToPath(new URL(`../../offsets-demo/${name}`, import.meta.url));
const WORKBOAT = demo('workboat.csv');
const LAUNCH = demo('survey-launch.csv');

/** The command line in-process (test/helpers/runCli.ts). */
const run = (argv: string[], files: Record<string, string> = {}) => runCli(argv, { files });

const prepared = (file: string) => prepareHull(readOffsetsCsv(readFileSync(file, 'utf8')).hull);
/** Twice the greatest half-breadth of a demo file, read from its cells. */
const beamOf = (file: string): number => 2 * Math.max(...readOffsetsCsv(readFileSync(file, 'utf8')).hull.stations.flatMap((st) => st.points.map((q) => q.y)));
const csvRows = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true }).data;

describe('sheet', () => {
  test('JSON gives the sheet of the core, with the caution and each station\'s vertical sheet', async () => {
    const r = await run(['sheet', WORKBOAT, '--draft', '1.3', '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    const core = calculationSheet(prepared(WORKBOAT), 1.3);
    expect(j.caution).toBe(CAUTION);
    expect(j.spacing).toBe(written(core.spacing));
    expect(j.results.volume).toBe(written(core.results.volume));
    expect(j.stations[4]).toMatchObject({ x: 4.2, multiplierText: '2' });
    expect(j.stations[4].vertical.ordinates.length).toBeGreaterThan(3);
  });

  test('CSV opens with the caution and ends with the sums; the table shows the formulae', async () => {
    const csv = await run(['sheet', LAUNCH, '--draft', '0.45', '--format', 'csv']);
    expect(csv.out.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const rows = csvRows(csv.out);
    expect(rows[rows.length - 1]!['kind']).toBe('sum');
    const table = await run(['sheet', LAUNCH, '--draft', '0.45', '--format', 'table']);
    expect(table.out).toContain('volume = h/3 x sum(A.SM) =');
    expect(table.out.trimEnd().endsWith(CAUTION)).toBe(true);
  });

  test('refuses more than one draft, and a draft outside the hull, with exit status 2', async () => {
    const two = await run(['sheet', WORKBOAT, '--draft', '1,1.2']);
    expect(two.code).toBe(2);
    expect(two.err).toContain("--draft '1,1.2' is not one number of metres");
    const high = await run(['sheet', WORKBOAT, '--draft', '3']);
    expect(high.code).toBe(2);
    expect(high.err).toContain('outside the hull');
  });
});

describe('bonjean and areas', () => {
  test('bonjean CSV has a row per station and height, extra heights included', async () => {
    const r = await run(['bonjean', WORKBOAT, '--drafts', '1.3', '--format', 'csv']);
    expect(r.code).toBe(0);
    expect(r.out.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const rows = csvRows(r.out);
    expect(rows.filter((row) => row['x_m'] === '7' && row['z_m'] === '1.3')).toHaveLength(1);
  });

  test('bonjean refuses a height above every deck edge', async () => {
    const r = await run(['bonjean', WORKBOAT, '--drafts', '5']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('meets no station');
  });

  test('areas JSON carries the LCB of the hydrostatics and the caution', async () => {
    const r = await run(['areas', LAUNCH, '--draft', '0.45', '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.caution).toBe(CAUTION);
    expect(j.lcb).toBe(written(hydrostaticsAt(prepared(LAUNCH), 0.45).lcb));
    const table = await run(['areas', LAUNCH, '--draft', '0.45', '--format', 'table']);
    expect(table.out).toContain('<-- LCB');
  });
});

describe('hydrostatics options', () => {
  test('--units imperial takes drafts in feet and gives feet, long tons, TPI and MTI', async () => {
    // --digits 17: every digit of the conversion, so the factors can be checked to rounding.
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '4.5', '--units', 'imperial', '--format', 'csv', '--digits', '17']);
    expect(r.code).toBe(0);
    expect(r.out.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const [row] = csvRows(r.out);
    const si = hydrostaticsAt(prepared(WORKBOAT), 4.5 * 0.3048);
    expect(Number(row!['draft_ft'])).toBeRelClose(4.5, 1e-14);
    // 1 ft = 0.3048 m (1959); 1 long ton = 1.0160469088 t.
    expect(Number(row!['volume_ft3'])).toBeRelClose(si.volume / 0.3048 ** 3, 1e-14);
    expect(Number(row!['displacement_LT'])).toBeRelClose(si.displacement / 1.0160469088, 1e-14);
    expect(row).toHaveProperty('tpi_LT_per_in');
    expect(row).toHaveProperty('mti_LTft_per_in');
  });

  test('--error-estimate adds the estimate to each JSON row, and to the CSV as columns', async () => {
    const j = JSON.parse((await run(['hydrostatics', WORKBOAT, '--drafts', '1,1.5', '--error-estimate', '--format', 'json'])).out);
    expect(j.caution).toBe(CAUTION);
    expect(Object.keys(j.rows[0].errorEstimate)).toEqual(['volume', 'lcb', 'vcb', 'waterplaneArea', 'bmt']);
    expect(j.halving.possible).toBe(true);
    const csv = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--error-estimate', '--format', 'csv']);
    expect(Object.keys(csvRows(csv.out)[0]!)).toContain('volumeError_m3');
  });

  test('--units with a system it does not know is bad input', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '1', '--units', 'cubits']);
    expect(r.code).toBe(2);
    expect(r.err).toContain("--units 'cubits' is not one of si, imperial");
  });
});

describe('check warns of unfair offsets', () => {
  test('a demo hull gives no warning', async () => {
    const j = JSON.parse((await run(['check', WORKBOAT, '--format', 'json'])).out);
    expect(j.warnings).toEqual([]);
  });

  test('an offset moved by 2 % of the beam is warned of, with its place and a fair value; the file still reads', async () => {
    // The workboat's half-breadth at x = 7 m on the 1.25 m waterline, moved out by 2 % of its beam.
    const original = readFileSync(WORKBOAT, 'utf8');
    const header = original.split(/\r?\n/).find((l) => l.startsWith('x,'))!.split(',');
    const column = header.indexOf('1.25');
    const row = original.split(/\r?\n/).find((l) => l.startsWith('7,'))!.split(',');
    const was = Number(row[column]);
    const move = 0.02 * beamOf(WORKBOAT);
    row[column] = String(was + move);
    const text = original.replace(/^7,.*$/m, row.join(','));
    const r = await run(['check', 'bumped.csv', '--format', 'json'], { 'bumped.csv': text });
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.warnings).toHaveLength(1);
    expect(j.warnings[0]).toMatchObject({ x: 7, z: 1.25, value: written(was + move) });
    expect(Math.abs(j.warnings[0].suggested - was)).toBeLessThan(0.25 * move);
    // Said as the file says it: its line and column, the station and waterline as written.
    const line = original.split(/\r\n|\n|\r/).findIndex((l) => l.startsWith('7,')) + 1;
    expect(j.warnings[0]).toMatchObject({ line, column: column + 1 });
    expect(r.err).toContain(`bumped.csv: warning: line ${line}, column ${column + 1} (station x = 7 m, WL 1.25 m): half-breadth ${Number((was + move).toPrecision(6))} m is not fair`);
  });
});
