/**
 * `halfbreadth sheet <file|-> --draft <m>`: the calculation sheet of the upright
 * hydrostatics at one draft, as a text sheet, CSV or JSON. Thin: the sheet and its
 * forms come from the core (core/upright/calculationSheet.ts, core/report/formatSheet.ts).
 */
import type { Issue } from '../../core/common/errors.js';
import { calculationSheet } from '../../core/upright/calculationSheet.js';
import { requireFormed } from '../../core/upright/formedRows.js';
import { toJson } from '../../core/report/formatHydrostatics.js';
import { sheetCsv, sheetResult, sheetText } from '../../core/report/formatSheet.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { chooseFormat, readInput, terminalSafe, type CliIo, str } from '../io.js';
import { singleDraft } from './draftOption.js';
import { densityOption } from './hydrostatics.js';

export const sheet: Command = {
  name: 'sheet',
  summary: "the calculation sheet at a draft, with Simpson's multipliers",
  synopsis: 'sheet <file|-> --draft <m> [options]',
  positionals: ['<file|->'],
  options: {
    draft: { type: 'string', required: true, example: '--draft 1.3' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    format: { type: 'string', example: '--format json' },
  },
  help: `The hydrostatics of the hull at one draft set out as a calculation sheet:
for each station its x, lever from amidships, half-breadth at the waterline,
immersed area and its vertical moment, Simpson's multiplier, and the products
for volume, longitudinal and vertical moment, waterplane area and its moment,
and the second moments; then the sums, the common factor h/3 (h the most
common station spacing, stated) and the particulars they give, which are
those of the hydrostatics command at that draft. For each station a vertical
sheet follows: the ordinates up to the draft, their multipliers and products,
and how the last part below the waterline is taken.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --draft <m>         the draft in metres above the baseline (required)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  --format <form>     table, csv or json (default: table on a terminal, csv when
                      piped or redirected)
  -h, --help          this help

Forms:
  table   both sheets, multipliers written 1, 4, 1 1/2 ..., each result with
          its formula
  csv     the longitudinal sheet, one row per station and a row of sums;
          leading # lines give the caution, h, h/3 and the results
  json    { "draft", "spacing", "commonFactor", "caution", "stations": [ { "x",
          "halfBreadth", "area", "multiplier", ..., "vertical": {...} } ],
          "totals": {...}, "results": {...} }

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth sheet offsets-demo/workboat.csv --draft 1.3`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const format = attempt(() => chooseFormat(str(values['format']), ['table', 'csv', 'json'], 'csv', io.stdout), issues);
    const draft = attempt(() => singleDraft(str(values['draft'])), issues);
    const density = attempt(() => densityOption(values), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const sheet = calculationSheet(prepareHull(hull), draft!, density!);
    requireFormed(draft!, sheet.results);
    const result = sheetResult(hull, sheet);
    io.stdout.write(format === 'json' ? toJson(result) + '\n' : format === 'csv' ? sheetCsv(result) : terminalSafe(sheetText(result)));
    return EXIT.ok;
  },
};
