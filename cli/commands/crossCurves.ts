/**
 * `halfbreadth cross-curves <file|-> --displacements <list>`: KN for each displacement and
 * heel, as a text table, CSV (one row per displacement, one column per heel) or JSON.
 * Thin: the curves are core/stability/crossCurves.ts's, the forms core/report's. A run
 * that takes more than a second shows its progress on stderr when stderr is a terminal.
 */
import type { Issue } from '../../core/common/errors.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { crossCurvesForm, crossCurvesResult } from '../../core/report/formatStability.js';
import { crossCurves } from '../../core/stability/crossCurves.js';
import { checkCrossCurveSize, checkHeels, parseDisplacements, parseHeels } from '../../core/stability/stabilityInput.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, str, type CliIo, type TextSink } from '../io.js';
import { deckEdgesOf, trimModeOption } from '../stabilityOptions.js';
import { densityOption } from './hydrostatics.js';

/** Heels of the cross curves when none are asked for: 0 to 90 degrees every 10. */
export const DEFAULT_CROSS_CURVE_HEELS = '0:10:90';

/** Time before progress is shown, ms: a short run says nothing. */
const PROGRESS_AFTER_MS = 1000;

/** A progress line on `sink` once a run has taken PROGRESS_AFTER_MS, rewritten in place; `done` clears it. */
export function progressLine(sink: TextSink, what: string, now: () => number = Date.now): { step: (done: number, total: number) => void; done: () => void } {
  const start = now();
  let shown = false;
  return {
    step: (done, total) => {
      if (sink.isTTY !== true || now() - start < PROGRESS_AFTER_MS) return;
      shown = true;
      sink.write(`\r${what}: ${done} of ${total}`);
    },
    done: () => {
      if (shown) sink.write('\r\x1b[2K');
    },
  };
}

export const crossCurvesCommand: Command = {
  name: 'cross-curves',
  summary: 'cross curves of stability: KN for each displacement and heel',
  synopsis: 'cross-curves <file|-> --displacements <list> [--heels <list>] [--free-trim] [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    displacements: { type: 'string', required: true, example: '--displacements 2:0.5:6' },
    heels: { type: 'string', example: '--heels 0:10:90' },
    'free-trim': { type: 'boolean' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
  },
  help: `The cross curves of stability of the hull: for each displacement and heel, KN,
the distance from K (the baseline on the centreline) to the line of action of
buoyancy, positive when it rights the hull. GZ for a loading is KN - KG sin(heel).

At each heel the hull sinks until it displaces each displacement; it stays at
level trim, or with --free-trim trims until its centre of buoyancy lies at the
upright LCB of that displacement. Heeled work needs every station's deck edge
(deck_z in the grid form, or the points form).

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --displacements <list>  tonnes (long tons with --units imperial): values and
                      ranges from:step:to, e.g. 2:0.5:6 (required)
  --heels <list>      degrees, -180 to 180: values and ranges, e.g. 0:15:180
                      (default ${DEFAULT_CROSS_CURVE_HEELS})
  --free-trim         free to trim as the hull heels (default: level trim)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  -h, --help          this help

At most 2,000 points (displacements x heels) in one run. A run that takes more
than a second shows its progress on stderr when stderr is a terminal.

Forms:
  table, csv  one row per displacement, one KN column per heel (kn_30deg_m)
  json        { "hull", "density", "caution", "trim": "level"|"free",
              "rows": [ { "displacement", "heel", "kn", "draft", "trim" } ] },
              one row per displacement and heel; draft (amidships) and trim
              are null at 90 degrees, where the waterplane is upright

Every form carries the caution. Exit status: 0 done; 2 bad input.

Example:
  halfbreadth cross-curves offsets-demo/survey-launch.csv \\
    --displacements 2:0.5:5 --heels 0:10:90 > launch-kn.csv`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const system = choice?.output.units ?? 'si';
    const displacements = attempt(() => parseDisplacements(str(values['displacements']) ?? '', ['--displacements'], system), issues);
    const heels = attempt(() => {
      const list = parseHeels(str(values['heels']) ?? DEFAULT_CROSS_CURVE_HEELS, ['--heels']);
      checkHeels(list, ['--heels']);
      return list;
    }, issues);
    if (displacements !== undefined && heels !== undefined) attempt(() => checkCrossCurveSize(displacements.length, heels.length, ['--heels']), issues);
    const trim = attempt(() => trimModeOption(values, 'level'), issues);
    const density = attempt(() => densityOption(values), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const conv = await converterOf(choice!);
    const progress = progressLine(io.stderr, 'cross curves, displacements done');
    let rows;
    try {
      rows = crossCurves(prepareHull(read!.hull), displacements!, heels!, density!, trim!, deckEdgesOf(read!), progress.step);
    } finally {
      progress.done();
    }
    writeResult(io, crossCurvesForm(heels!), crossCurvesResult(read!.hull, density!, trim!, rows), choice!, conv);
    return EXIT.ok;
  },
};
