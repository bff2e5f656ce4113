/**
 * `halfbreadth float <file|-> --displacement <t> --lcg <m>`: the floating position of a
 * load (drafts at the perpendiculars, trim and heel), as a text table, CSV or JSON. Thin:
 * the balance is core/stability/floatingPosition.ts's, the forms core/report's.
 */
import { issue, type Issue } from '../../core/common/errors.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { FLOAT_FORM, floatResult } from '../../core/report/formatStability.js';
import { floatingPosition } from '../../core/stability/floatingPosition.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, type CliIo } from '../io.js';
import { deckEdgesOf, displacementOption, lengthOption } from '../stabilityOptions.js';
import { densityOption } from './hydrostatics.js';

export const float: Command = {
  name: 'float',
  summary: 'the floating position for a load: drafts at AP and FP, trim and heel',
  synopsis: 'float <file|-> --displacement <t> --lcg <m> [--tcg <m> --kg <m>] [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    displacement: { type: 'string', required: true, example: '--displacement 4.5' },
    lcg: { type: 'string', required: true, example: '--lcg 4.3' },
    tcg: { type: 'string', example: '--tcg 0.05' },
    kg: { type: 'string', example: '--kg 1.1' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
  },
  help: `Where the hull floats with a load: the displacement and the position of its
centre of gravity G. The hull sinks, trims and heels until it displaces the load
and its centre of buoyancy B lies on the vertical through G; the answer gives the
drafts at the aft and forward perpendiculars, the trim (draft aft - draft
forward, positive by the stern), the heel (positive to starboard), the draft
amidships, where B is, and the residuals of the balance.

Without --kg the balance is along the length only (LCB = LCG, upright), the usual
way of trimming a hull by its hydrostatics. A TCG heels the hull by an amount that
depends on the height of G, so --tcg needs --kg, and the offsets must give every
station's deck edge (deck_z in the grid form, or the points form).

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --displacement <t>  the load, tonnes (long tons with --units imperial)
                      (required)
  --lcg <m>           x of G in the offsets' frame, m (ft with --units imperial)
                      (required)
  --tcg <m>           y of G, positive to starboard (default 0)
  --kg <m>            height of G above the baseline
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  -h, --help          this help

Forms:
  table, csv  one row: displacement, LCG, TCG, KG, draft aft and forward, trim,
              heel, draft amidships, LCB, TCB, VCB, GM; the residuals under it
  json        { "hull", "density", "caution", "displacement", "lcg", "tcg",
              "kg", "draftAft", "draftFwd", "trim", "heel", "draft", "lcb",
              "tcb", "vcb", "residuals": { "volume", "longitudinal",
              "transverse" }, "gm", "stable" }

With --kg, GM is the metacentric height at the balance (the slope of GZ there)
and "stable" whether a small heel is righted; an unstable balance (G above the
metacentre) is said in words: the vessel would loll or capsize, and gz shows which.

Every form carries the caution. Exit status: 0 done; 2 bad input (a load the
hull cannot float is refused, naming the most it floats; so is a centre of
gravity no floating position balances).

Example:
  halfbreadth float offsets-demo/survey-launch.csv --displacement 4.5 --lcg 4.3`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const system = choice?.output.units ?? 'si';
    const displacement = attempt(() => displacementOption(values, system), issues);
    const lcg = attempt(() => lengthOption(values, 'lcg', system), issues);
    const tcg = attempt(() => lengthOption(values, 'tcg', system), issues);
    const kg = attempt(() => lengthOption(values, 'kg', system), issues);
    // Said here, with the other options' problems, before the file is read: the rule is core's (floatingPosition).
    if (tcg !== undefined && tcg !== 0 && values['kg'] === undefined) {
      issues.push(issue('HYD_BAD_ARGUMENT', ['--tcg'], '--tcg needs --kg: a TCG heels the hull by an amount that depends on the height of G'));
    }
    const density = attempt(() => densityOption(values), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const conv = await converterOf(choice!);
    const load = { displacement: displacement!, lcg: lcg!, ...(tcg === undefined ? {} : { tcg }), ...(kg === undefined ? {} : { kg }) };
    const position = floatingPosition(prepareHull(read!.hull), load, density!, deckEdgesOf(read!));
    writeResult(io, FLOAT_FORM, floatResult(read!.hull, density!, position), choice!, conv);
    return EXIT.ok;
  },
};
