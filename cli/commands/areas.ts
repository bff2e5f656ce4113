/**
 * `halfbreadth areas <file|-> --draft <m>`: the curve of sectional areas at a draft
 * with its LCB, as a text table, CSV or JSON. Thin: the curve and its forms come from
 * core/upright/sectionalAreaCurve.ts and core/report/formatAreas.ts.
 */
import type { Issue } from '../../core/common/errors.js';
import { AREAS_FORM, areasResult } from '../../core/report/formatAreas.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { requireImmersed } from '../../core/upright/formedRows.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, type CliIo, str } from '../io.js';
import { singleDraft } from './draftOption.js';

export const areas: Command = {
  name: 'areas',
  summary: 'the curve of sectional areas at a draft, with the LCB marked',
  synopsis: 'areas <file|-> --draft <m> [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    draft: { type: 'string', required: true, example: '--draft 1.3' },
  },
  help: `The immersed area of every station at one draft against its x, each also as
a fraction of the midship area, with the volume (the area under the curve), the
LCB (its centroid), the midship area, LWL and the prismatic coefficient.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --draft <m>         the draft above the baseline, in metres (feet with
                      --units imperial) (required)
  -h, --help          this help

Forms:
  table   one line per station with a bar for its area; the LCB is marked
          between the stations it lies between
  csv     x_m, area_m2, fraction; leading # lines give the caution,
          the datum of x, volume, LCB, Am, LWL and Cp
  json    { "hull", "caution", "draft", "stations": [ { "x", "area",
          "fraction" } ], "volume", "lcb", "am", "amidships", "lwl", "cp" }

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth areas offsets-demo/survey-launch.csv --draft 0.45`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const draft = attempt(() => singleDraft(str(values['draft']), choice?.output.units ?? 'si'), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const conv = await converterOf(choice!);
    const curve = sectionalAreaCurve(prepareHull(hull), draft!);
    requireImmersed(draft!, curve.volume);
    writeResult(io, AREAS_FORM, areasResult(hull, curve), choice!, conv);
    return EXIT.ok;
  },
};
