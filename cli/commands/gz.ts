/**
 * `halfbreadth gz <file|-> --displacement <t> --kg <m>`: the righting-lever curve of a
 * loading, what is read from it and the intact-stability criteria, as a text table, CSV
 * or JSON. Thin: the curve is core/stability/rightingLevers.ts's, the forms core/report's.
 */
import type { Issue } from '../../core/common/errors.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { GZ_FORM, gzAnswer } from '../../core/report/formatStability.js';
import { rightingLevers } from '../../core/stability/rightingLevers.js';
import { checkHeels, parseHeels, parseOpenings } from '../../core/stability/stabilityInput.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, str, type CliIo } from '../io.js';
import { criteriaOption, deckEdgesOf, displacementOption, fsmOption, lengthOption, trimModeOption } from '../stabilityOptions.js';
import { densityOption } from './hydrostatics.js';

export const gz: Command = {
  name: 'gz',
  summary: 'the righting-lever (GZ) curve of a loading, checked against the intact-stability criteria',
  synopsis: 'gz <file|-> --displacement <t> --kg <m> [--fsm <t.m>] [--opening x,y,z ...] [--criteria <file.json>] [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    displacement: { type: 'string', required: true, example: '--displacement 4.5' },
    kg: { type: 'string', required: true, example: '--kg 1.1' },
    fsm: { type: 'string', example: '--fsm 0.4' },
    heels: { type: 'string', example: '--heels 0:5:90' },
    opening: { type: 'string', repeatable: true, example: '--opening 5.2,0.8,1.4' },
    criteria: { type: 'string', example: '--criteria small-craft.json' },
    'level-trim': { type: 'boolean' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
  },
  help: `The righting levers of a loading: GZ = KN - KG' sin(heel), with KG' = KG +
FSM / displacement (the free surface's virtual rise of G), the hull floated at
each heel free to trim with its centre of buoyancy at the upright LCB. From the
curve: GM0 (KMt - KG'), the largest GZ and its angle, the angle of vanishing
stability, the area under the curve to each heel (m.rad), the downflooding angle
(the first heel at which an opening reaches the water) and the verdict of each
intact-stability criterion.

The criteria are the general criteria of the IMO 2008 Intact Stability Code,
resolution MSC.267(85), Part A, 2.2 (thresholds from memory of the code), unless
--criteria gives another set. The severe wind and rolling (weather) criterion is
not checked. A small craft, a vessel under a classification society's rules or
under a flag's rules may be held to other criteria: give them with --criteria.
Heeled work needs every station's deck edge (deck_z in the grid form, or the
points form).

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --displacement <t>  tonnes (long tons with --units imperial) (required)
  --kg <m>            height of G above the baseline, m (ft with --units
                      imperial) (required)
  --fsm <t.m>         free-surface moment, t.m (long ton-feet with --units
                      imperial; default 0)
  --heels <list>      the heels of the curve given, degrees, -180 to 180
                      (default 0:5:90); the criteria read a finer curve of their own
  --opening x,y,z     a downflooding point in the offsets' frame, m (ft); give
                      the option once for each, or several as x,y,z;x,y,z
  --criteria <file>   a criteria set as JSON: { "name": "...", "source": "...",
                      "criteria": [ { "id": "gm0", "required": 0.35 }, ... ] },
                      ids area-0-30, area-0-40, area-30-40 (m.rad), gz-at-30,
                      gm0 (m), angle-of-max-gz (deg)
  --level-trim        keep the hull at level trim as it heels (default: free)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  -h, --help          this help

Forms:
  table, csv  one row per heel: heel, GZ, area under the curve to it; the
              loading, GM0, the largest GZ, the angles and each criterion's
              verdict in the lines above (the # lines of the CSV)
  json        { "hull", "density", "caution", "displacement", "kg", "fsm",
              "kgEffective", "trim", "gm0", "points": [ { "heel", "gz" } ],
              "areas": [ { "heel", "area" } ], "maxGz", "angleOfMaxGz",
              "vanishingAngle", "lollAngle", "downfloodingAngle",
              "criteriaSet", "criteria": [ { "id", "required", "actual",
              "unit", "pass" } ], "notes" }; lollAngle is the angle of loll
              where GM0 is below zero and GZ rises through zero again

A KG that gives a negative GM0 is answered, with the criteria it fails. Every
form carries the caution: the verdicts do not replace an approved stability book.
Exit status: 0 done (whatever the verdicts); 2 bad input.

Example:
  halfbreadth gz offsets-demo/survey-launch.csv --displacement 4.5 --kg 1.0 \\
    --opening 5.2,0.8,1.4`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const system = choice?.output.units ?? 'si';
    const displacement = attempt(() => displacementOption(values, system), issues);
    const kg = attempt(() => lengthOption(values, 'kg', system), issues);
    const fsm = attempt(() => fsmOption(values, system), issues);
    const heels = values['heels'] === undefined ? undefined : attempt(() => {
      const list = parseHeels(str(values['heels']) ?? '', ['--heels']);
      checkHeels(list, ['--heels']);
      return list;
    }, issues);
    const openings = attempt(() => parseOpenings(str(values['opening']) ?? '', ['--opening'], system), issues);
    const trim = attempt(() => trimModeOption(values, 'free'), issues);
    const density = attempt(() => densityOption(values), issues);
    const criteria = await attemptAsync(() => criteriaOption(values, io), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const conv = await converterOf(choice!);
    const result = rightingLevers(
      prepareHull(read!.hull),
      {
        displacement: displacement!,
        kg: kg!,
        fsm: fsm!,
        openings: openings!,
        trim: trim!,
        deck: deckEdgesOf(read!),
        ...(heels === undefined ? {} : { heels }),
        ...(criteria === undefined ? {} : { criteria }),
      },
      density!,
    );
    writeResult(io, GZ_FORM, gzAnswer(read!.hull, density!, result), choice!, conv);
    return EXIT.ok;
  },
};
