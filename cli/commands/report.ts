/**
 * `halfbreadth report <file|-> [options] > report.html`: the printable report of a
 * hull (core/document/reportHtml.ts) as one self-contained HTML document, or, with
 * `--pdf <file>`, printed to PDF by a Chromium installed on the machine.
 */
import { createHash } from 'node:crypto';
import { fail, issue, type Issue } from '../../core/common/errors.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { PAPER_SIZES, reportDate, reportHtml, type PaperSize } from '../../core/document/reportHtml.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { CROSS_CURVE_HEELS } from '../../core/plots/plotCatalogue.js';
import { crossCurves } from '../../core/stability/crossCurves.js';
import { rightingLevers } from '../../core/stability/rightingLevers.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, str, type CliIo } from '../io.js';
import { findBrowser, INSTALL_BROWSER, printPdf } from '../printPdf.js';
import { densityOption } from './hydrostatics.js';
import { singleDraft } from './draftOption.js';
import { deckEdgesOf, STABILITY_OPTIONS, stabilityChoice } from '../stabilityOptions.js';

function paperOption(text: string | undefined): PaperSize {
  if (text === undefined) return 'a4';
  const found = PAPER_SIZES.find((p) => p === text.toLowerCase());
  if (found === undefined) fail('HYD_BAD_ARGUMENT', ['--paper'], `--paper '${text.slice(0, 20)}' is not one of ${PAPER_SIZES.join(', ')}`);
  return found;
}

export const report: Command = {
  name: 'report',
  summary: 'a printable report of a hull (HTML, or PDF through Chromium)',
  synopsis: 'report <file|-> [--paper a4|letter] [--pdf <out.pdf>] [options] > report.html',
  positionals: ['<file|->'],
  options: {
    paper: { type: 'string', example: '--paper letter' },
    pdf: { type: 'string', example: '--pdf report.pdf' },
    drafts: { type: 'string', example: '--drafts 0.2:0.1:1.2' },
    draft: { type: 'string', example: '--draft 1.3' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    ...STABILITY_OPTIONS,
  },
  help: `Writes one self-contained HTML document for print: the hull's particulars, the
table of offsets, the lines, the hydrostatic table and the curves of form, the
Bonjean curves and the sectional-area curve, the sha256 of the input and the
date, with the caution printed on every page. With --displacements it also
holds the cross curves of stability; with --displacement and --kg the
righting-lever curve of that loading and the verdicts of the criteria.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --paper <size>      a4 (default) or letter
  --pdf <out.pdf>     print the report to this PDF file instead, with the Chromium
                      installed on this machine (HALFBREADTH_BROWSER, else
                      Debian's chromium-headless-shell, else /usr/bin/chromium);
                      nothing is written on standard output
  --drafts <list>     drafts of the hydrostatic table, m (default: about twenty
                      round drafts from the keel to the lowest deck edge)
  --draft <m>         draft of the sectional-area curve (default: the middle
                      draft of the table)
  --density <t/m3>    water density (default 1.025, sea water)
  --fresh             fresh water, 1.000
  --displacements <list>  cross curves at these displacements, t
  --heels <list>      their heels, degrees (default 0:10:90)
  --free-trim         the cross curves free to trim (default level)
  --displacement <t>  the loading of the GZ curve, t (with --kg)
  --kg <m>            its height of G above the baseline, m
  --fsm <t.m>         its free-surface moment (default 0)
  --opening x,y,z     a downflooding point, m; once for each
  --criteria <file>   a criteria set as JSON (see 'halfbreadth gz --help')
  --level-trim        the GZ curve at level trim (default free)
  -h, --help          this help

Exit status: 0 done; 2 bad input; 3 --pdf and no Chromium installed (the
message says how to install it).

Examples:
  halfbreadth report offsets-demo/workboat.csv > report.html
  halfbreadth report offsets-demo/workboat.csv --paper letter --pdf report.pdf`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const paperText = str(values['paper']);
    const paper = attempt(() => paperOption(paperText), issues);
    const drafts = values['drafts'] === undefined ? undefined : attempt(() => parseDraftList(str(values['drafts']) ?? '', ['drafts']), issues);
    const draft = values['draft'] === undefined ? undefined : attempt(() => singleDraft(str(values['draft'])), issues);
    const density = attempt(() => densityOption(values), issues);
    // The two trim options govern different parts here (--free-trim the cross curves,
    // --level-trim the GZ curve) and are read below, so both may be given at once.
    const stability = await stabilityChoice({ ...values, 'free-trim': undefined, 'level-trim': undefined }, io, issues);
    if ((values['displacement'] !== undefined) !== (values['kg'] !== undefined)) {
      issues.push(issue('HYD_BAD_ARGUMENT', [values['kg'] === undefined ? '--kg' : '--displacement'], 'the righting levers need a loading: give --displacement and --kg together'));
    }
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    const prepared = prepareHull(read!.hull);
    const deck = deckEdgesOf(read!);
    const { displacements, heels, displacement, kg, fsm, openings, criteria } = stability;
    const crossTrim = values['free-trim'] === true ? 'free' : 'level';
    const crossCurveRows = displacements === undefined ? undefined : crossCurves(prepared, displacements, heels ?? CROSS_CURVE_HEELS, density!, crossTrim, deck);
    const gzResult =
      displacement === undefined || kg === undefined
        ? undefined
        : rightingLevers(
            prepared,
            { displacement, kg, deck, trim: values['level-trim'] === true ? 'level' : 'free', ...(fsm === undefined ? {} : { fsm }), ...(openings === undefined ? {} : { openings }), ...(criteria === undefined ? {} : { criteria }) },
            density!,
          );
    const html = reportHtml({
      prepared,
      form: read!.form,
      units: read!.units,
      sha256: createHash('sha256').update(input!.bytes).digest('hex'),
      date: reportDate(new Date()),
      paper: paper!,
      density: density!,
      ...(drafts === undefined ? {} : { drafts }),
      ...(draft === undefined ? {} : { areasDraft: draft }),
      stability: {
        ...(crossCurveRows === undefined ? {} : { crossCurves: { rows: crossCurveRows, trim: crossTrim } }),
        ...(gzResult === undefined ? {} : { gz: { result: gzResult } }),
      },
    });
    const pdf = str(values['pdf']);
    if (pdf === undefined) {
      io.stdout.write(html);
      return EXIT.ok;
    }
    const browser = findBrowser(io.env);
    if (browser === undefined) {
      io.stderr.write(`halfbreadth report: ${INSTALL_BROWSER}\n`);
      return EXIT.missingProgram;
    }
    await printPdf(browser, html, pdf);
    io.stderr.write(`halfbreadth report: wrote ${pdf}\n`);
    return EXIT.ok;
  },
};
