/**
 * The command line's entry: split the arguments with node:util parseArgs, find the
 * command, print help, and turn the outcome into an exit code. 0: success. 2: bad
 * input, every issue printed on stderr. 1: an internal fault, its message on stderr
 * (its stack too when HALFBREADTH_DEBUG=1).
 */
import { parseArgs } from 'node:util';
import { HalfbreadthError, issue, type Issue } from '../core/common/errors.js';
import { ANSWER_OPTIONS, answerOptionsHelp } from './answerOptions.js';
import { EXIT, type Command, type CommandArgs, type OptionSpec } from './command.js';
import { COMMANDS, findCommand } from './commands/index.js';
import { processIo, STDIN_LABEL, type CliIo } from './io.js';
import { printIssues } from './printIssues.js';

const PROGRAM = 'halfbreadth';
/** The positional that names the offsets file, whose name heads the issues printed. */
const FILE_POSITIONAL = '<file|->';

export function mainHelp(): string {
  const w = Math.max(...COMMANDS.map((c) => c.name.length));
  return `${PROGRAM}: hydrostatics from a hull's table of offsets

Usage:
${COMMANDS.map((c) => `  ${PROGRAM} ${c.synopsis}`).join('\n')}
  ${PROGRAM} <command> --help
  ${PROGRAM} --help

Commands:
${COMMANDS.map((c) => `  ${c.name.padEnd(w)}  ${c.summary}`).join('\n')}

Input: an offsets CSV, grid form (x, then waterline heights) or points form
(x, y, z and optionally knuckle), in m, mm, ft, in or ft-in-8 as its '# units:'
line or its x header cell (x (mm)) says, else as --input-units says, else m;
cells split on commas, semicolons or tabs (a decimal comma is read where they
are not commas); - reads standard input. Lengths typed on the command line
(drafts) are metres, or feet with --units imperial.

Output: --format table|csv|json chooses the form and always wins. Without it, a
command writes a table when stdout is a terminal and CSV when it is piped or
redirected, so '> table.csv' gives a file a spreadsheet opens. Every table
command also takes --units si|imperial, --fields <list>, --digits <3..17> and
--plain-header; numbers are written to 12 significant digits by default.

Input is read up to 16 MiB. Numbers are plain decimals (1.25, 2e-1; no 0x).

Exit status: 0 success; 2 bad input (every problem listed on stderr, with its
line and column, or its option); 1 output that could not be written (a full
disk, a reader gone), said in one line, or an internal fault
(HALFBREADTH_DEBUG=1 shows where).

Every result carries a caution: its figures come from the offsets supplied and
are for design and estimating. They do not replace an approved stability book;
decisions on the safety of a vessel defer to classification society rules, the
flag or local authority's regulations and a qualified naval architect.
`;
}

export function commandHelp(c: Command): string {
  const shared = c.answers === undefined ? '' : `\n\n${answerOptionsHelp(c.answers.formats)}`;
  return `Usage: ${PROGRAM} ${c.synopsis}\n\n${c.help}${shared}\n`;
}

/** A command's options: its own, and the shared ones of a command that answers with a table. */
export function optionsOf(c: Command): Readonly<Record<string, OptionSpec>> {
  return c.answers === undefined ? c.options : { ...ANSWER_OPTIONS, ...c.options };
}

const bad = (path: string, message: string): Issue => issue('HYD_BAD_ARGUMENT', [path], message);

/** The arguments after the command word, checked against the command's options: all problems at once. */
export function parseCommandArgs(c: Command, args: readonly string[]): CommandArgs & { help: boolean } {
  const specs = optionsOf(c);
  const options = Object.fromEntries(
    Object.entries(specs).map(([name, o]) => [name, o.short === undefined ? { type: o.type } : { type: o.type, short: o.short }]),
  );
  // Not strict: the tokens are checked here, so that every problem is reported in our words.
  const { tokens } = parseArgs({
    args: [...args],
    options: { ...options, help: { type: 'boolean', short: 'h' } },
    allowPositionals: true,
    strict: false,
    tokens: true,
  });
  const issues: Issue[] = [];
  const values: Record<string, string | boolean | undefined> = {};
  const positionals: string[] = [];
  let help = false;
  let valueMissing = false;
  const see = `see '${PROGRAM} ${c.name} --help'`;
  for (const t of tokens) {
    if (t.kind === 'positional') positionals.push(t.value);
    if (t.kind !== 'option') continue;
    if (t.name === 'help') {
      help = true;
      continue;
    }
    const spec = specs[t.name];
    if (spec === undefined) {
      issues.push(bad(t.rawName, `unknown option ${t.rawName}; ${see}`));
    } else if (values[t.name] !== undefined && spec.repeatable !== true) {
      issues.push(bad(t.rawName, `${t.rawName} is given more than once`));
    } else if (spec.type === 'boolean') {
      if (t.value !== undefined) issues.push(bad(t.rawName, `${t.rawName} takes no value (got '${t.value}')`));
      else values[t.name] = true;
    } else if (t.value === undefined || (!t.inlineValue && t.value.startsWith('--'))) {
      valueMissing = true;
      const eg = spec.example === undefined ? '' : `, e.g. ${spec.example}`;
      issues.push(bad(t.rawName, `${t.rawName} needs a value${eg}`));
    } else {
      const prior = values[t.name];
      values[t.name] = typeof prior === 'string' ? `${prior};${t.value}` : t.value;
    }
  }
  if (!help) {
    for (const [name, spec] of Object.entries(specs)) {
      if (spec.required === true && values[name] === undefined && !issues.some((i) => i.path[0] === `--${name}`)) {
        const eg = spec.example === undefined ? '' : ` (e.g. ${spec.example})`;
        issues.push(bad(`--${name}`, `--${name} is required${eg}`));
      }
    }
    // A value-less option may have swallowed the next word; counting positionals then misleads.
    if (!valueMissing) {
      c.positionals.slice(positionals.length).forEach((name) => {
        const what = name === FILE_POSITIONAL ? 'give an offsets CSV file, or - to read standard input' : `see '${PROGRAM} ${c.name} --help'`;
        issues.push(bad('argv', `missing ${name}: ${what}`));
      });
      positionals.slice(c.positionals.length).forEach((extra) => issues.push(bad('argv', `unexpected argument '${extra}'; ${see}`)));
    }
  }
  if (issues.length > 0 && !help) throw new HalfbreadthError(issues);
  return { values, positionals, help };
}

/** Run the command line on `argv` (the words after the program name); resolves to the exit code. */
export async function main(argv: readonly string[], io: CliIo = processIo()): Promise<number> {
  const first = argv[0];
  let program = PROGRAM;
  let fileLabel: string | undefined;
  try {
    if (first === undefined) {
      io.stderr.write(mainHelp());
      io.stderr.write(`\n${PROGRAM}: no command given\n`);
      return EXIT.badInput;
    }
    if (first === '--help' || first === '-h' || first === 'help') {
      const topic = first === 'help' ? argv[1] : undefined;
      const c = topic === undefined ? undefined : findCommand(topic);
      if (topic !== undefined && c === undefined) throw new HalfbreadthError([unknownCommand(topic)]);
      io.stdout.write(c === undefined ? mainHelp() : commandHelp(c));
      return EXIT.ok;
    }
    const c = findCommand(first);
    if (c === undefined) {
      throw new HalfbreadthError([first.startsWith('-') ? bad('argv', `unknown option ${first} before the command; see '${PROGRAM} --help'`) : unknownCommand(first)]);
    }
    program = `${PROGRAM} ${c.name}`;
    const args = parseCommandArgs(c, argv.slice(1));
    if (args.help) {
      io.stdout.write(commandHelp(c));
      return EXIT.ok;
    }
    const at = c.positionals.indexOf(FILE_POSITIONAL);
    const file = args.positionals[at < 0 ? 0 : at];
    fileLabel = file === undefined ? undefined : file === '-' ? STDIN_LABEL : file;
    return await c.run(args, io);
  } catch (e) {
    if (e instanceof HalfbreadthError) {
      printIssues(io.stderr, e.issues, fileLabel, program);
      return EXIT.badInput;
    }
    const why = e instanceof Error ? e.message : String(e);
    io.stderr.write(`${program}: internal fault: ${why}\n`);
    if (io.env['HALFBREADTH_DEBUG'] === '1') io.stderr.write(`${e instanceof Error ? e.stack ?? '' : ''}\n`);
    else io.stderr.write(`${PROGRAM}: this is a fault in ${PROGRAM}, not in the input; HALFBREADTH_DEBUG=1 shows where it happened\n`);
    return EXIT.fault;
  }
}

function unknownCommand(word: string): Issue {
  return bad('argv', `unknown command '${word}'; the commands are ${COMMANDS.map((c) => c.name).join(', ')} (see '${PROGRAM} --help')`);
}
