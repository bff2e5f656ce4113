/**
 * `halfbreadth sheet <file|-> --draft <m>`: the calculation sheet of the upright
 * hydrostatics at one draft, as a text sheet, CSV or JSON. Thin: the sheet and its
 * forms come from the core (core/upright/calculationSheet.ts, core/report/formatSheet.ts).
 */
import { fail, type Issue } from '../../core/common/errors.js';
import { calculationSheet, LEVER_UNITS, type LeverUnit } from '../../core/upright/calculationSheet.js';
import { requireFormed } from '../../core/upright/formedRows.js';
import { sheetForm, sheetResult } from '../../core/report/formatSheet.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, type CliIo, str } from '../io.js';
import { singleDraft } from './draftOption.js';
import { densityOption } from './hydrostatics.js';

/** `--levers metres` (the default) or `--levers stations`. */
export function leversOption(text: string | undefined): LeverUnit {
  if (text === undefined) return 'metres';
  const found = LEVER_UNITS.find((l) => l === text);
  if (found === undefined) fail('HYD_BAD_ARGUMENT', ['--levers'], `--levers '${text.slice(0, 40)}' is not one of ${LEVER_UNITS.join(', ')}`);
  return found;
}

export const sheet: Command = {
  name: 'sheet',
  summary: "the calculation sheet at a draft, with Simpson's multipliers",
  synopsis: 'sheet <file|-> --draft <m> [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    draft: { type: 'string', required: true, example: '--draft 1.3' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    levers: { type: 'string', example: '--levers stations' },
  },
  help: `The hydrostatics of the hull at one draft set out as a calculation sheet:
for each station its number (in station spaces from the AP: 0, 1/2, 1, ...),
x, lever from amidships, half-breadth at the waterline, immersed area and its
vertical moment, Simpson's multiplier, and the products for volume,
longitudinal and vertical moment, waterplane area and its moment, and the
second moments; then the sums, the common factor h/3 (h the most common
station spacing, stated) and the particulars they give, each with its formula
and the sums put in it, which are those of the hydrostatics command at that
draft. For each station a vertical sheet follows: the ordinates up to the
draft, their multipliers and products, and in words which panel and rule
take the last part below the waterline.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --draft <m>         the draft above the baseline, in metres (feet with
                      --units imperial: 4.25 or 4-3-0) (required)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  --levers <unit>     metres (default): levers x - amidships; or stations:
                      levers (x - amidships) / h in station spaces, as a hand
                      sheet takes them, the results then multiplying by h (LCB,
                      LCF) and h^2 (IL)
  -h, --help          this help

Forms:
  table   both sheets, multipliers written 1, 4, 1 1/2 ..., each result with
          its formula and working
  csv     the longitudinal sheet, one row per line and a row of sums;
          leading # lines give the caution, h, h/3, the datum and the results
  json    { "draft", "spacing", "commonFactor", "levers", "caution",
          "stations": [ { "station", "x", "halfBreadth", "area", "multiplier",
          ..., "vertical": {...} } ], "totals": {...}, "results": {...} }

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth sheet offsets-demo/workboat.csv --draft 1.3 --levers stations`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const draft = attempt(() => singleDraft(str(values['draft']), choice?.output.units ?? 'si'), issues);
    const density = attempt(() => densityOption(values), issues);
    const levers = attempt(() => leversOption(str(values['levers'])), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const conv = await converterOf(choice!);
    const sheet = calculationSheet(prepareHull(hull), draft!, density!, { levers: levers!, length: conv.length });
    requireFormed(draft!, sheet.results);
    writeResult(io, sheetForm(levers!), sheetResult(hull, sheet), choice!, conv);
    return EXIT.ok;
  },
};
