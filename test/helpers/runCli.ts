/**
 * The command line run in-process through `main(argv, io)` with fake streams: what it
 * wrote on stdout and stderr and the exit code it resolved to. Files are read from disk
 * unless `files` gives their text; `ttyOut` and `ttyErr` say whether each stream is a
 * terminal (both are pipes by default, as under a test runner).
 */
import { readFileSync } from 'node:fs';
import type { CliIo } from '../../cli/io.js';
import { main } from '../../cli/main.js';

export interface CliRun {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

export interface FakeStreams {
  readonly ttyOut?: boolean;
  readonly ttyErr?: boolean;
  readonly stdin?: string;
  readonly files?: Readonly<Record<string, string>>;
  /** The environment the command sees (none by default). */
  readonly env?: Readonly<Record<string, string>>;
}

export async function runCli(argv: readonly string[], o: FakeStreams = {}): Promise<CliRun> {
  let out = '';
  let err = '';
  const io: CliIo = {
    stdout: { write: (t: string) => (out += t), isTTY: o.ttyOut ?? false },
    stderr: { write: (t: string) => (err += t), isTTY: o.ttyErr ?? false },
    readStdin: async () => new TextEncoder().encode(o.stdin ?? ''),
    readFile: async (p: string) => {
      const given = o.files?.[p];
      return given === undefined ? readFileSync(p) : new TextEncoder().encode(given);
    },
    env: { ...o.env },
  };
  const code = await main(argv, io);
  return { code, out, err };
}

/** The `#` comment lines of a CSV answer, without the `# `. */
export function csvComments(text: string): string[] {
  return text.split(/\r?\n/).filter((l) => l.startsWith('#')).map((l) => l.replace(/^#\s?/, ''));
}

/** The header and data rows of a CSV answer (no quoted cells in these answers), its `#` lines left out. */
export function csvTable(text: string): { header: string[]; rows: string[][] } {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== '' && !l.startsWith('#'));
  const [head, ...rows] = lines.map((l) => l.split(','));
  return { header: head ?? [], rows };
}
