/**
 * The shape of one command of the command line. Each command is a file under
 * cli/commands/ and is listed once in cli/commands/index.ts; cli/main.ts parses the
 * options a command declares, prints its help and maps what it returns or throws to an
 * exit code.
 */
import type { CliIo, Format } from './io.js';

export interface OptionSpec {
  readonly type: 'string' | 'boolean';
  readonly short?: string;
  /** A string option the command cannot run without. */
  readonly required?: boolean;
  /** Shown when a string option has no value, e.g. `0.2:0.1:1.2`. */
  readonly example?: string;
  /** A string option that may be given more than once; its values reach the command joined by `;`. */
  readonly repeatable?: boolean;
}

/** Parsed arguments: each option once at most, and the positionals in order. */
export interface CommandArgs {
  readonly values: Readonly<Record<string, string | boolean | undefined>>;
  readonly positionals: readonly string[];
}

export interface Command {
  /** The word typed after `halfbreadth`. */
  readonly name: string;
  /** One line for the list of commands. */
  readonly summary: string;
  /** What follows `halfbreadth` in the usage line, e.g. `hydrostatics <file|-> --drafts <list> [options]`. */
  readonly synopsis: string;
  /** The rest of the command's help: what it does, its options, its output. */
  readonly help: string;
  /** Options besides --help, which every command has. */
  readonly options: Readonly<Record<string, OptionSpec>>;
  /** Names of the positional arguments, all required, in order, e.g. `<file|->`. */
  readonly positionals: readonly string[];
  /**
   * For a command that answers with a result of core/report/answerForm.ts: its forms and
   * the form when stdout is piped. The shared options (`--format`, `--units`, `--fields`,
   * `--digits`, `--plain-header`, `--input-units`; cli/answerOptions.ts) are then added to
   * its options and help; the command reads them with answerOptions().
   */
  readonly answers?: { readonly formats: readonly Format[]; readonly piped: Format };
  /** Run with arguments already parsed and counted; resolves to the exit code. Throws HalfbreadthError for bad input. */
  run(args: CommandArgs, io: CliIo): Promise<number>;
}

/** Exit codes of the command line; 3: a program the command needs (a browser to print PDF) is not installed. */
export const EXIT = { ok: 0, fault: 1, badInput: 2, missingProgram: 3 } as const;
