/**
 * The command line's limits and its failures of output: input is read in a bounded
 * way (the service's 16 MiB body limit), so an endless input gets a clear error within a
 * second instead of filling the memory; output that cannot be written (a full disk, a
 * reader gone) is said in one line with exit status 1; a value it cannot read is named
 * by its option; numbers are plain decimals everywhere.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { readInput, processIo } from '../../cli/io.js';
import { main } from '../../cli/main.js';
import { isHalfbreadthError } from '../../core/common/errors.js';
import { LIMITS } from '../../core/common/limits.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = fileURLToPath(new URL('../../bin/halfbreadth.js', import.meta.url));
const WORKBOAT = fileURLToPath(new URL('../../offsets-demo/workboat.csv', import.meta.url));

const cli = (args: string[], shell?: string) =>
  shell === undefined
    ? spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8' })
    : spawnSync('bash', ['-c', shell], { cwd: ROOT, encoding: 'utf8' });

/** In-process run with captured output. */
async function run(argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io = { ...processIo(), stdout: { write: (t: string) => (out += t), isTTY: false }, stderr: { write: (t: string) => (err += t) } };
  const code = await main(argv, io);
  return { code, out, err };
}

describe('bounded input', () => {
  test.runIf(existsSync('/dev/zero'))('reading /dev/zero stops at the limit with a clear error within a second', async () => {
    const t0 = performance.now();
    const e = await readInput('/dev/zero', processIo()).catch((x: unknown) => x);
    // A bound on the defect: before, the read grew to the machine's memory.
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(isHalfbreadthError(e)).toBe(true);
    expect((e as Error).message).toContain(`larger than ${LIMITS.maxInputBytes / (1024 * 1024)} MiB`);
  });

  test.runIf(existsSync('/dev/zero'))('check /dev/zero exits 2 with that error, one line', () => {
    const r = cli(['check', '/dev/zero']);
    expect(r.status).toBe(2);
    expect(r.stderr).toBe('/dev/zero: the input is larger than 16 MiB, the limit of an offsets file (the service\'s body limit); is it the right file?\n');
  });

  test('standard input is bounded the same way', () => {
    const r = cli([], `head -c ${LIMITS.maxInputBytes + 1} /dev/zero | "${process.execPath}" "${BIN}" check -`);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('<stdin>: the input is larger than 16 MiB');
  });
});

describe('output that cannot be written', () => {
  test.runIf(existsSync('/dev/full'))('a full disk (ENOSPC): one line on stderr, exit status 1, no stack', () => {
    const r = cli([], `"${process.execPath}" "${BIN}" hydrostatics "${WORKBOAT}" --drafts 1 > /dev/full`);
    expect(r.status).toBe(1);
    expect(r.stderr).toBe('halfbreadth: cannot write the output: no space left on the device (ENOSPC)\n');
  });
});

describe('options it cannot read are named', () => {
  test('--draft abc names --draft, not a drafts list item', async () => {
    const r = await run(['sheet', WORKBOAT, '--draft', 'abc']);
    expect(r.code).toBe(2);
    expect(r.err).toBe("halfbreadth sheet: --draft 'abc' is not one number of metres; give one draft above the baseline, e.g. --draft 1.3\n");
  });

  test('hexadecimal and binary are not numbers, in drafts, a draft or a density', async () => {
    for (const argv of [
      ['hydrostatics', WORKBOAT, '--drafts', '0x1'],
      ['hydrostatics', WORKBOAT, '--drafts', '0.5:0b1:1'],
      ['hydrostatics', WORKBOAT, '--drafts', '1', '--density', '0x1'],
      ['areas', WORKBOAT, '--draft', '0b1'],
    ]) {
      const r = await run(argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.out).toBe('');
    }
  });

  test('a draft where the hull has no volume is named, not a row of empty cells', async () => {
    const r = await run(['hydrostatics', WORKBOAT, '--drafts', '5e-324,1']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^--drafts: draft 5e-324 m: /);
  });
});
