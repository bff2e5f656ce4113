/**
 * The options every command that answers with a table shares, declared once:
 * `--format`, `--units`, `--fields`, `--digits`, `--plain-header` and `--input-units`.
 * A command opts in by declaring `answers` (cli/command.ts): cli/main.ts then adds these
 * options to its own and their help to its help, the command reads them with
 * `answerOptions` and writes its result with `writeResult`, and the shared output step
 * (core/report/answerForm.ts) does the rest from the form the command declares.
 */
import type { Issue } from '../core/common/errors.js';
import { fail } from '../core/common/errors.js';
import { isLengthUnit, LENGTH_UNITS, type LengthUnit } from '../core/common/units.js';
import { readOffsetsCsv, type ReadResult } from '../core/offsets/readOffsets.js';
import { writeAnswer, type AnswerForm } from '../core/report/answerForm.js';
import { readDigits, readFields, readUnitSystem, type OutputOptions } from '../core/report/outputOptions.js';
import { converterFor, type Converter } from '../core/report/unitConversion.js';
import { attempt, throwIfAny } from './collect.js';
import type { CommandArgs, OptionSpec } from './command.js';
import { chooseFormat, terminalSafe, str, type CliIo, type Format, type Input } from './io.js';

/** The shared options' specifications, added to every command that declares `answers`. */
export const ANSWER_OPTIONS: Readonly<Record<string, OptionSpec>> = {
  format: { type: 'string', example: '--format csv' },
  units: { type: 'string', example: '--units imperial' },
  fields: { type: 'string', example: '--fields displacement,wettedSurface' },
  digits: { type: 'string', example: '--digits 6' },
  'plain-header': { type: 'boolean' },
  'input-units': { type: 'string', example: '--input-units mm' },
};

/** Their help, added under a command's own. `formats` are the command's forms. */
export function answerOptionsHelp(formats: readonly Format[]): string {
  const csv = formats.includes('csv');
  return `Options every table command takes:
  --format <form>     ${formats.join(', ')} (default: table on a terminal, ${csv ? 'csv' : formats[0]} when
                      the output is piped or redirected)
  --units <system>    si (default) or imperial: feet, square and cubic feet, ft4,
                      long tons, TPI (long tons per inch), MTI (long ton-feet per
                      inch); lengths typed (drafts) are then feet, as decimal feet
                      (2.5) or feet-inches-eighths (2-6-0; 3-4-5+ adds a sixteenth,
                      3-4-5- takes one away)
  --fields <list>     the table's columns, in this order, e.g.
                      displacement,wettedSurface (names as in the JSON rows)
  --digits <n>        significant digits of every number written, 3 to 17
                      (default 12; 17 gives every digit of the double)
  --plain-header      CSV whose first line is the column header, the # lines and
                      the caution after the rows (for a spreadsheet's import)
  --input-units <u>   the unit of an offsets file that has no '# units:' line and
                      no unit in its x header cell: ${LENGTH_UNITS.join(', ')}`;
}

/** What the shared options say. */
export interface AnswerChoice {
  readonly format: Format;
  readonly output: OutputOptions;
  readonly inputUnits: LengthUnit | undefined;
}

/** The shared options of a command's arguments (each problem as an issue); `piped` is the form when stdout is not a terminal. */
export function answerOptions(args: CommandArgs, formats: readonly Format[], piped: Format, io: CliIo): AnswerChoice {
  const v = args.values;
  const issues: Issue[] = [];
  const format = attempt(() => chooseFormat(str(v['format']), formats, piped, io.stdout), issues);
  const units = attempt(() => readUnitSystem(str(v['units']), '--units'), issues);
  const fields = attempt(() => readFields(str(v['fields']), '--fields'), issues);
  const digits = attempt(() => readDigits(str(v['digits']), '--digits'), issues);
  const inputText = str(v['input-units']);
  const inputUnits = attempt(() => {
    if (inputText === undefined) return undefined;
    if (!isLengthUnit(inputText)) fail('HYD_BAD_ARGUMENT', ['--input-units'], `--input-units '${inputText.slice(0, 40)}' is not one of ${LENGTH_UNITS.join(', ')}`);
    return inputText;
  }, issues);
  throwIfAny(issues);
  return { format: format!, output: { units: units!, fields, digits: digits!, plainHeader: v['plain-header'] === true }, inputUnits };
}

/** The offsets of an input read with the request's input units. */
export function readOffsetsOf(input: Input, choice: Pick<AnswerChoice, 'inputUnits'> | undefined): ReadResult {
  return readOffsetsCsv(input.text, { inputUnits: choice?.inputUnits });
}

/** The converter of the answer's unit system (imperial loads mathjs, only then). */
export function converterOf(choice: AnswerChoice): Promise<Converter> {
  return converterFor(choice.output.units);
}

/** Write a result in the chosen form on stdout: JSON indented, a table made terminal-safe. */
export function writeResult<R>(io: CliIo, form: AnswerForm<R>, result: R, choice: AnswerChoice, conv: Converter): void {
  const text = writeAnswer(form, result, choice.format, choice.output, conv, true);
  io.stdout.write(choice.format === 'table' ? terminalSafe(text) : text);
}
