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
import { singleDraft } from './draftOption.js';

const w = Math.max(...HULL_PLOTS.map((p) => p.name.length));

export const plot: Command = {
  name: 'plot',
  summary: 'a plot as SVG: the lines, curves of form, Bonjean or sectional areas',
  synopsis: 'plot <name> <file|-> [--drafts <list>] [--draft <m>] > plot.svg',
  positionals: ['<name>', '<file|->'],
  options: {
    drafts: { type: 'string', example: '--drafts 0.2:0.1:1.2' },
    draft: { type: 'string', example: '--draft 1.3' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
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
  --density <t/m3>    curves-of-form: water density (default 1.025, sea water)
  --fresh             curves-of-form: fresh water, 1.000
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
    for (const option of ['drafts', 'draft', 'density', 'fresh']) {
      const given = values[option] !== undefined;
      const takesIt = takes.has(option === 'fresh' ? 'density' : option);
      if (chosen !== undefined && given && !takesIt) issues.push(issue('HYD_BAD_ARGUMENT', [`--${option}`], `the ${name} plot takes no --${option}`));
    }
    if (chosen !== undefined && takes.has('draft') && values['draft'] === undefined) issues.push(issue('HYD_BAD_ARGUMENT', ['--draft'], `the ${name} plot needs --draft <m>, e.g. --draft 1.3`));
    const drafts = values['drafts'] === undefined ? undefined : attempt(() => parseDraftList(str(values['drafts']) ?? '', ['drafts']), issues);
    const draft = values['draft'] === undefined ? undefined : attempt(() => singleDraft(str(values['draft'])), issues);
    const density = attempt(() => densityOption(values), issues);
    const input = await attemptAsync(() => readInput(args.positionals[1]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    if (chosen === undefined) throw new HalfbreadthError(issues);
    io.stdout.write(
      chosen.render(prepareHull(read!.hull), {
        density: density!,
        ...(drafts === undefined ? {} : { drafts }),
        ...(draft === undefined ? {} : { draft }),
      }),
    );
    return EXIT.ok;
  },
};
