/**
 * `halfbreadth areas <file|-> --draft <m>`: the curve of sectional areas at a draft
 * with its LCB, as a text table, CSV or JSON. Thin: the curve and its forms come from
 * core/upright/sectionalAreaCurve.ts and core/report/formatAreas.ts.
 */
import type { Issue } from '../../core/common/errors.js';
import { areasCsv, areasResult, areasText } from '../../core/report/formatAreas.js';
import { toJson } from '../../core/report/formatHydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { requireImmersed } from '../../core/upright/formedRows.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { chooseFormat, readInput, terminalSafe, type CliIo, str } from '../io.js';
import { singleDraft } from './draftOption.js';

export const areas: Command = {
  name: 'areas',
  summary: 'the curve of sectional areas at a draft, with the LCB marked',
  synopsis: 'areas <file|-> --draft <m> [--format <form>]',
  positionals: ['<file|->'],
  options: {
    draft: { type: 'string', required: true, example: '--draft 1.3' },
    format: { type: 'string', example: '--format csv' },
  },
  help: `The immersed area of every station at one draft against its x, each also as
a fraction of the midship area, with the volume (the area under the curve), the
LCB (its centroid), the midship area, LWL and the prismatic coefficient.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --draft <m>         the draft in metres above the baseline (required)
  --format <form>     table, csv or json (default: table on a terminal, csv when
                      piped or redirected)
  -h, --help          this help

Forms:
  table   one line per station with a bar for its area; the LCB is marked
          between the stations it lies between
  csv     x_m, area_m2, fraction_of_am; leading # lines give the caution,
          volume, LCB, Am, LWL and Cp
  json    { "hull", "caution", "draft", "stations": [ { "x", "area",
          "fraction" } ], "volume", "lcb", "am", "amidships", "lwl", "cp" }

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth areas offsets-demo/survey-launch.csv --draft 0.45`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const format = attempt(() => chooseFormat(str(values['format']), ['table', 'csv', 'json'], 'csv', io.stdout), issues);
    const draft = attempt(() => singleDraft(str(values['draft'])), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const curve = sectionalAreaCurve(prepareHull(hull), draft!);
    requireImmersed(draft!, curve.volume);
    const result = areasResult(hull, curve);
    io.stdout.write(format === 'json' ? toJson(result) + '\n' : format === 'csv' ? areasCsv(result) : terminalSafe(areasText(result)));
    return EXIT.ok;
  },
};
