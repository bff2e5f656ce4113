/**
 * What the command line touches of the outside world, behind one small interface so
 * that the commands can be run in-process with fake streams (the tests do), and the
 * helpers every command shares: reading an input file or standard input, and choosing
 * the output format.
 */
import { readFile } from 'node:fs/promises';
import { HalfbreadthError, issue } from '../core/common/errors.js';

/** A stream the command line writes text to. */
export interface TextSink {
  write(text: string): unknown;
  /** True when the stream is a terminal (process.stdout.isTTY). */
  readonly isTTY?: boolean | undefined;
}

export interface CliIo {
  readonly stdout: TextSink;
  readonly stderr: TextSink;
  /** All of standard input, as bytes. */
  readStdin(): Promise<Uint8Array>;
  /** A whole file, as bytes. */
  readFile(path: string): Promise<Uint8Array>;
  readonly env: Readonly<Record<string, string | undefined>>;
}

/** The real process's streams, files and environment. */
export function processIo(): CliIo {
  return {
    stdout: process.stdout,
    stderr: process.stderr,
    readStdin: async () => {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks);
    },
    readFile: (path) => readFile(path),
    env: process.env,
  };
}

/** An input once read: its text and the name to print before its issues. */
export interface Input {
  readonly label: string;
  readonly text: string;
  /** The bytes as read (the report prints their sha256). */
  readonly bytes: Uint8Array;
}

/** The name standard input goes by in messages. */
export const STDIN_LABEL = '<stdin>';

// Fatal: a file that is not UTF-8 is reported, not read with replacement characters
// in place of its numbers.
const utf8 = new TextDecoder('utf-8', { fatal: true });

/** Read the file named by a positional argument, or standard input for `-`. */
export async function readInput(arg: string, io: CliIo): Promise<Input> {
  const label = arg === '-' ? STDIN_LABEL : arg;
  let bytes: Uint8Array;
  try {
    bytes = arg === '-' ? await io.readStdin() : await io.readFile(arg);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException | undefined)?.code;
    if (typeof code !== 'string') throw e;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder, not a file' : code === 'EACCES' ? 'permission denied' : code;
    throw new HalfbreadthError([issue('HYD_BAD_ARGUMENT', ['file'], `cannot be read: ${why}`)]);
  }
  try {
    return { label, text: utf8.decode(bytes), bytes };
  } catch {
    throw new HalfbreadthError([issue('HYD_CSV_UNREADABLE', ['offsets'], 'the file is not UTF-8 text; save it as UTF-8 CSV')]);
  }
}

export const FORMATS = ['table', 'csv', 'json'] as const;
export type Format = (typeof FORMATS)[number];

/**
 * The output format: `--format` when given, else `table` on a terminal and the
 * command's piped form (CSV for tables of figures) when stdout is a pipe or a file, so
 * that `> table.csv` gives a file a spreadsheet opens.
 */
export function chooseFormat(requested: string | undefined, allowed: readonly Format[], piped: Format, stdout: TextSink): Format {
  if (requested === undefined) return stdout.isTTY === true ? 'table' : piped;
  const found = allowed.find((f) => f === requested);
  if (found === undefined) {
    throw new HalfbreadthError([issue('HYD_BAD_ARGUMENT', ['--format'], `--format '${requested}' is not one of ${allowed.join(', ')}`)]);
  }
  return found;
}

/**
 * Text for a terminal with its control characters (other than line ends) shown as `?`:
 * a hull name in a file could otherwise carry escape sequences that retitle or
 * rewrite the terminal.
 */
export function terminalSafe(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/g, '?');
}

/** An option's value when it was given as text (parseArgs gives booleans for flags, undefined when absent). */
export const str = (v: string | boolean | undefined): string | undefined => (typeof v === 'string' ? v : undefined);
