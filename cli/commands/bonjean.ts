/**
 * `halfbreadth bonjean <file|-> [--drafts <list>]`: the Bonjean data of every station
 * (immersed area and its moment against height), as a text table, CSV or JSON. Thin:
 * the data and its forms come from core/upright/bonjean.ts and core/report/formatBonjean.ts.
 */
import type { Issue } from '../../core/common/errors.js';
import { bonjean as bonjeanData } from '../../core/upright/bonjean.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { BONJEAN_FORM, bonjeanResult } from '../../core/report/formatBonjean.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, type CliIo, str } from '../io.js';

export const bonjean: Command = {
  name: 'bonjean',
  summary: 'Bonjean data: the immersed area of every station against height',
  synopsis: 'bonjean <file|-> [--drafts <list>] [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    drafts: { type: 'string', example: '--drafts 1.3,1.45' },
  },
  help: `The Bonjean data of the hull: for every station, the immersed area of its
section (both sides) and the moment of that area about the baseline, from the
station's keel (area 0) through every tabulated waterline above the keel up to
its deck edge, and at any extra heights asked for. A points-form table has no
tabulated waterlines: each station's own point heights are used.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --drafts <list>     extra heights in metres (feet with --units imperial),
                      values and ranges from:step:to, e.g. 1.3,1.45 or
                      0.1:0.1:2; each must meet some station
  -h, --help          this help

Forms:
  table   areas, stations down and heights across
  csv     x_m, z_m, area_m2, momentZ_m3: one row per station and height
  json    { "hull", "caution", "stations": [ { "x", "keel", "deck",
          "points": [ { "z", "area", "momentZ" } ] } ] }

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth bonjean offsets-demo/workboat.csv --drafts 1.3 --format csv`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const text = str(values['drafts']);
    const extra = text === undefined ? [] : attempt(() => parseDraftList(text, ['drafts'], choice?.output.units ?? 'si'), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const conv = await converterOf(choice!);
    writeResult(io, BONJEAN_FORM, bonjeanResult(hull, bonjeanData(prepareHull(hull), extra!)), choice!, conv);
    return EXIT.ok;
  },
};
