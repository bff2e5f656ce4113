/**
 * `halfbreadth plot <name> <file|-> [options] > file.svg`: one plot of core/plots as an
 * SVG document on standard output. Thin: the plot and every number in it come from
 * core/plots/plotCatalogue.ts.
 */
import { HalfbreadthError, issue, type Issue } from '../../core/common/errors.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { findHullPlot, HULL_PLOTS } from '../../core/plots/plotCatalogue.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, str, type CliIo } from '../io.js';
import { densityOption } from './hydrostatics.js';
import { deckEdgesOf, STABILITY_OPTIONS, stabilityChoice } from '../stabilityOptions.js';
import { singleDraft } from './draftOption.js';

/** The plot parameter each option gives, where its name differs. */
const PARAM_OF_OPTION: Readonly<Record<string, string>> = { fresh: 'density', 'free-trim': 'trim', 'level-trim': 'trim', opening: 'openings' };

const w = Math.max(...HULL_PLOTS.map((p) => p.name.length));

export const plot: Command = {
  name: 'plot',
  summary: 'a plot as SVG: the lines, curves of form, Bonjean, sectional areas, cross curves or GZ',
  synopsis: 'plot <name> <file|-> [options] > plot.svg',
  positionals: ['<name>', '<file|->'],
  options: {
    drafts: { type: 'string', example: '--drafts 0.2:0.1:1.2' },
    draft: { type: 'string', example: '--draft 1.3' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    ...STABILITY_OPTIONS,
  },
  help: `Writes one plot of the hull as an SVG document on standard output, with axis
titles and units, a title and description for screen readers, and the caution.

Plots:
${HULL_PLOTS.map((p) => `  ${p.name.padEnd(w)}  ${p.summary}`).join('\n')}

Arguments:
  <name>              one of the plots above
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --drafts <list>     curves-of-form: the drafts, m (default: about twenty round
                      drafts from the keel to the lowest deck edge); bonjean:
                      extra heights, m
  --draft <m>         sectional-areas: the draft, m (required)
  --density <t/m3>    curves-of-form, cross-curves, gz: water density (default
                      1.025, sea water)
  --fresh             the same: fresh water, 1.000
  --displacements <list>  cross-curves: the displacements, t (required)
  --heels <list>      cross-curves: the heels, degrees (default 0:10:90); gz:
                      the heels of the points drawn (default 0:5:90)
  --free-trim         cross-curves: free to trim as the hull heels
  --level-trim        gz: kept at level trim as the hull heels
  --displacement <t>  gz: the displacement of the loading (required)
  --kg <m>            gz: the height of G above the baseline (required)
  --fsm <t.m>         gz: the free-surface moment (default 0)
  --opening x,y,z     gz: a downflooding point, m; once for each
  --criteria <file>   gz: a criteria set as JSON (see 'halfbreadth gz --help')
  -h, --help          this help

Exit status: 0 done; 2 bad input.

Example:
  halfbreadth plot lines offsets-demo/workboat.csv > lines.svg`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const name = args.positionals[0]!;
    const chosen = findHullPlot(name);
    if (chosen === undefined) issues.push(issue('HYD_BAD_ARGUMENT', ['argv'], `there is no plot '${name.slice(0, 40)}'; the plots are ${HULL_PLOTS.map((p) => p.name).join(', ')}`));
    const takes = new Set<string>(chosen?.takes ?? []);
    for (const option of Object.keys(plot.options)) {
      const given = values[option] !== undefined;
      const takesIt = takes.has(PARAM_OF_OPTION[option] ?? option);
      if (chosen !== undefined && given && !takesIt) issues.push(issue('HYD_BAD_ARGUMENT', [`--${option}`], `the ${name} plot takes no --${option}`));
    }
    for (const need of chosen?.needs ?? []) {
      if (values[need] === undefined) issues.push(issue('HYD_BAD_ARGUMENT', [`--${need}`], `the ${name} plot needs --${need}, e.g. ${plot.options[need]?.example ?? `--${need} <value>`}`));
    }
    const drafts = values['drafts'] === undefined ? undefined : attempt(() => parseDraftList(str(values['drafts']) ?? '', ['drafts']), issues);
    const draft = values['draft'] === undefined ? undefined : attempt(() => singleDraft(str(values['draft'])), issues);
    const density = attempt(() => densityOption(values), issues);
    const stability = await stabilityChoice(values, io, issues);
    const input = await attemptAsync(() => readInput(args.positionals[1]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    if (chosen === undefined) throw new HalfbreadthError(issues);
    io.stdout.write(
      chosen.render(prepareHull(read!.hull), {
        density: density!,
        deck: deckEdgesOf(read!),
        ...stability,
        ...(drafts === undefined ? {} : { drafts }),
        ...(draft === undefined ? {} : { draft }),
      }),
    );
    return EXIT.ok;
  },
};
