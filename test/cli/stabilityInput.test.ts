/**
 * Bad input to the stability commands of the command line, run in-process through
 * `main(argv, io)` with fake streams: each problem is said on stderr in a line that
 * names the option and the rule broken, the exit status is 2 (bad input, cli/main.ts and
 * README's "Exit status"), and nothing is written on stdout. A loading that fails the
 * criteria is not bad input: it is answered, with its verdicts. And the progress line of
 * a long run, with a clock of the test's own.
 *
 * The limits are closed forms on a box barge L x B x D: wholly immersed to its deck it
 * displaces ρ L B D (Archimedes); its length runs from x = 0 to L, its half-breadth is B/2,
 * its keel at z = 0, and at the draft T = Δ / (ρ L B) an opening below T is under water.
 * Heels are allowed within -180 to 180 degrees (a half turn either way: README's
 * conventions and core/stability/stabilityInput.ts). The GM0 of a KG above KMt is
 * negative: KMt = T / 2 + B² / (12 T) for a box (E. C. Tupper, Introduction to Naval
 * Architecture, 5th ed. 2013, ch. 4; from memory).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { progressLine } from '../../cli/commands/crossCurves.js';
import { writeBoxBargeCsv } from '../fixtures/boxBargeCsv.js';
import '../helpers/relClose.js';
import { runCli } from '../helpers/runCli.js';

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const BOX = writeBoxBargeCsv({ L, B, D });
const DIR = mkdtempSync(join(tmpdir(), 'hb-criteria-'));
afterAll(() => {
  rmSync(dirname(BOX), { recursive: true, force: true });
  rmSync(DIR, { recursive: true, force: true });
});

/** A file in the test's folder: its path. */
function file(name: string, text: string): string {
  const p = join(DIR, name);
  writeFileSync(p, text);
  return p;
}

/** The displacement at draft 1 m, and the most the box floats: ρ L B D. */
const AT_1M = RHO * L * B * 1;
const MOST = RHO * L * B * D;
const GZ = ['gz', BOX, '--displacement', String(AT_1M), '--kg', '1.5'];

/** Run, and expect bad input: exit 2, nothing on stdout, a line on stderr matching `line`. */
async function refused(argv: string[], line: RegExp): Promise<void> {
  const r = await runCli(argv);
  expect(r.out, argv.join(' ')).toBe('');
  expect(r.code, argv.join(' ')).toBe(2);
  expect(r.err.split('\n'), argv.join(' ')).toContainEqual(expect.stringMatching(line));
}

describe('bad input is named by its option and rule, exit 2, nothing on stdout', () => {
  test('a heel outside -180 to 180 degrees', async () => {
    const rule = /^--heels: heel (200|-190) degrees is outside -180 to 180 degrees$/;
    await refused(['cross-curves', BOX, '--displacements', '41', '--heels', '0,200'], rule);
    await refused([...GZ, '--heels', '-190,10'], rule);
    await refused(['plot', 'cross-curves', BOX, '--displacements', '41', '--heels', '0,200'], rule);
    // Just inside the range is taken.
    expect((await runCli([...GZ, '--heels', '-180,180'])).code).toBe(0);
  });

  test('a load heavier than the hull floats, with the most it floats: ρ L B D', async () => {
    const most = new RegExp(`100 t is more than the hull (can float|floats level within its deck).*\\b${MOST} t\\b`);
    await refused(['float', BOX, '--displacement', '100', '--lcg', '5'], new RegExp(`^--displacement: displacement ${most.source}`));
    await refused(['gz', BOX, '--displacement', '100', '--kg', '1.5'], new RegExp(`^--displacement: displacement ${most.source}`));
    await refused(['cross-curves', BOX, '--displacements', '41,100'], new RegExp(`^--displacements: displacement ${most.source}`));
    await refused(['hydrostatics', BOX, '--displacements', '41,100'], new RegExp(`^--displacements: displacement ${most.source}`));
    await refused(['float', BOX, '--displacement', '0', '--lcg', '5'], /^--displacement: displacement 0 t: a hull floats a displacement above zero/);
  });

  test('an opening outside the hull, under the upright waterline, or not a point x,y,z', async () => {
    await refused([...GZ, '--opening', '20,0,1.5'], /^--opening: opening 1 \(20, 0, 1.5\): x = 20 m is outside the hull's length \(0 to 10 m\)$/);
    await refused([...GZ, '--opening', '5,0,1.5', '--opening', '5,3,1.5'], /^--opening: opening 2 \(5, 3, 1.5\): y = 3 m is outside the hull's breadth \(half-breadth 2 m at most\)$/);
    await refused([...GZ, '--opening', '5,0,-1'], /^--opening: opening 1 \(5, 0, -1\): z = -1 m is below the keel$/);
    // At draft 1 m a point at z = 0.5 m is under water upright.
    await refused([...GZ, '--opening', '5,0,0.5'], /^--opening: an opening lies at or below the upright waterline/);
    await refused([...GZ, '--opening', '5,0'], /^--opening: opening 1 "5,0" is not a point x,y,z in m/);
    await refused([...GZ, '--opening', '5,0,abc'], /^--opening: opening 1 "5,0,abc" is not a point x,y,z in m/);
  });

  test('--tcg without --kg', async () => {
    await refused(['float', BOX, '--displacement', '41', '--lcg', '5', '--tcg', '0.1'], /^halfbreadth float: --tcg needs --kg: a TCG heels the hull by an amount that depends on the height of G$/);
  });

  test('a criteria file that is malformed, too large or missing', async () => {
    const notJson = file('not.json', '{ "name": ');
    await refused([...GZ, '--criteria', notJson], new RegExp(`^halfbreadth gz: --criteria ${notJson} is not JSON`));
    const unknown = file('unknown.json', JSON.stringify({ name: 'x', criteria: [{ id: 'gm1', required: 0.2 }] }));
    await refused([...GZ, '--criteria', unknown], new RegExp(`^halfbreadth gz: --criteria ${unknown}: the criteria set's criteria\\[0\\]\\.id: "gm1" is not a criterion this project knows; the ids are area-0-30, `));
    const twice = file('twice.json', JSON.stringify({ name: 'x', criteria: [{ id: 'gm0', required: 0.2 }, { id: 'gm0', required: 0.3 }] }));
    await refused([...GZ, '--criteria', twice], new RegExp(`^halfbreadth gz: --criteria ${twice}: .*gm0 is given twice`));
    const big = file('big.json', JSON.stringify({ name: 'x', source: 'y'.repeat(70 * 1024), criteria: [{ id: 'gm0', required: 0.2 }] }));
    await refused([...GZ, '--criteria', big], new RegExp(`^halfbreadth gz: --criteria ${big} is larger than 64 KiB`));
    await refused([...GZ, '--criteria', join(DIR, 'none.json')], /^halfbreadth gz: --criteria .*none\.json: there is no such file$/);
  });

  test('a missing --displacement or --kg', async () => {
    await refused(['float', BOX, '--lcg', '5'], /^halfbreadth float: --displacement is required \(e\.g\. --displacement 4\.5\)$/);
    await refused(['gz', BOX, '--kg', '1.5'], /^halfbreadth gz: --displacement is required/);
    await refused(['gz', BOX, '--displacement', '41'], /^halfbreadth gz: --kg is required/);
    await refused(['cross-curves', BOX], /^halfbreadth cross-curves: --displacements is required/);
    await refused(['report', BOX, '--kg', '1.5'], /^halfbreadth report: the righting levers need a loading: give --displacement and --kg together$/);
  });

  test('every problem of a run is said at once', async () => {
    const r = await runCli(['gz', BOX, '--displacement', 'abc', '--kg', '1.5', '--heels', '0,200', '--opening', '5,0']);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toContain("--displacement 'abc' is not one number of t");
    expect(r.err).toContain('--heels: heel 200 degrees');
    expect(r.err).toContain('--opening: opening 1 "5,0"');
    expect(r.err).toContain('halfbreadth gz: 3 problems found');
  });
});

describe('a loading that fails the criteria is answered, not refused', () => {
  test('KG above KMt: GM0 = KMt - KG < 0, every criterion FAIL, exit 0 (gz --help: "0 done, whatever the verdicts")', async () => {
    const T = 1;
    const kmt = T / 2 + (B * B) / (12 * T);
    const kg = 3.5;
    const r = await runCli(['gz', BOX, '--displacement', String(AT_1M), '--kg', String(kg), '--format', 'json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { gm0: number; criteria: { id: string; actual: number; pass: boolean }[] };
    expect(j.gm0).toBeRelClose(kmt - kg, 1e-9);
    expect(j.gm0).toBeLessThan(0);
    // GZ is negative at every heel of the curve here, so no area, lever or angle can pass.
    expect(j.criteria.map((c) => c.pass)).toEqual([false, false, false, false, false, false]);
    const text = await runCli(['gz', BOX, '--displacement', String(AT_1M), '--kg', String(kg)], { ttyOut: true });
    expect(text.code).toBe(0);
    expect(text.out).toMatch(/^criterion gm0 .*: FAIL$/m);
    expect(text.out).toMatch(/: 0 of 6 met$/m);
    const help = await runCli(['gz', '--help']);
    expect(help.out).toContain('Exit status: 0 done (whatever the verdicts); 2 bad input.');
  });
});

describe('the progress line of a long run', () => {
  /** A sink that keeps what is written, a terminal or not. */
  const sink = (isTTY: boolean) => {
    const written: string[] = [];
    return { written, s: { isTTY, write: (t: string) => written.push(t) } };
  };

  test('on a terminal it says nothing for the first second, then each step in place, and clears itself', () => {
    let now = 1000;
    const { written, s } = sink(true);
    const p = progressLine(s, 'cross curves, displacements done', () => now);
    now += 999;
    p.step(1, 4);
    expect(written).toEqual([]);
    now += 1;
    p.step(2, 4);
    p.step(3, 4);
    expect(written).toEqual(['\rcross curves, displacements done: 2 of 4', '\rcross curves, displacements done: 3 of 4']);
    p.done();
    // ECMA-48: CR, then EL with parameter 2, the whole line erased.
    expect(written.at(-1)).toBe('\r\x1b[2K');
  });

  test('when stderr is not a terminal, or the run is short, nothing is written, not even the clearing', () => {
    let now = 0;
    const piped = sink(false);
    const p = progressLine(piped.s, 'x', () => now);
    now = 5000;
    p.step(1, 2);
    p.done();
    expect(piped.written).toEqual([]);
    const quick = sink(true);
    now = 0;
    const q = progressLine(quick.s, 'x', () => now);
    q.step(1, 2);
    q.done();
    expect(quick.written).toEqual([]);
  });

  test('a short cross-curves run on a terminal leaves stderr empty', async () => {
    const r = await runCli(['cross-curves', BOX, '--displacements', '41', '--heels', '0,10'], { ttyErr: true });
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
  });
});
