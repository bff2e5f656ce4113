/**
 * What the command line touches of the outside world, behind one small interface so
 * that the commands can be run in-process with fake streams (the tests do), and the
 * helpers every command shares: reading an input file or standard input, and choosing
 * the output format.
 */
import { createReadStream } from 'node:fs';
import type { Readable } from 'node:stream';
import { HalfbreadthError, issue } from '../core/common/errors.js';
import { LIMITS } from '../core/common/limits.js';

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

const tooLarge = (limit: number): HalfbreadthError =>
  new HalfbreadthError([
    issue('HYD_TOO_LARGE', ['file'], `the input is larger than ${limit / (1024 * 1024)} MiB, the limit of an offsets file (the service's body limit); is it the right file?`),
  ]);

/**
 * All of a stream, but no more than `limit` bytes: past it the stream is closed and the
 * read fails at once, so an endless input (`/dev/zero`, a runaway pipe) gets a clear
 * error instead of filling the memory.
 */
export async function readBounded(stream: Readable, limit: number = LIMITS.maxInputBytes): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let size = 0;
  try {
    for await (const chunk of stream) {
      size += (chunk as Buffer).length;
      if (size > limit) throw tooLarge(limit);
      chunks.push(chunk as Buffer);
    }
  } finally {
    stream.destroy();
  }
  return Buffer.concat(chunks);
}

/** The real process's streams, files and environment; inputs read in a bounded way. */
export function processIo(): CliIo {
  return {
    stdout: process.stdout,
    stderr: process.stderr,
    readStdin: () => readBounded(process.stdin),
    readFile: (path) => readBounded(createReadStream(path, { highWaterMark: 1024 * 1024 })),
    env: process.env,
  };
}

/**
 * The one line the command line prints when it cannot write its output: the reader went
 * away (EPIPE), the disk is full (ENOSPC), or another failure of the output stream.
 */
export function outputFault(e: unknown): string {
  const code = (e as NodeJS.ErrnoException | undefined)?.code;
  const why =
    code === 'EPIPE'
      ? 'the reader closed the output before all of it was written (EPIPE)'
      : code === 'ENOSPC'
        ? 'no space left on the device (ENOSPC)'
        : code === 'EBADF'
          ? 'standard output is closed (EBADF)'
          : `${code ?? (e instanceof Error ? e.message : String(e))}`;
  return `halfbreadth: cannot write the output: ${why}\n`;
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
    if (e instanceof HalfbreadthError) throw e;
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
