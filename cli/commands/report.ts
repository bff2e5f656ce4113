/**
 * `halfbreadth report <file|-> [options] > report.html`: the printable report of a
 * hull (core/document/reportHtml.ts) as one self-contained HTML document, or, with
 * `--pdf <file>`, printed to PDF by a Chromium installed on the machine.
 */
import { createHash } from 'node:crypto';
import { fail, type Issue } from '../../core/common/errors.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { PAPER_SIZES, reportDate, reportHtml, type PaperSize } from '../../core/document/reportHtml.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, str, type CliIo } from '../io.js';
import { findBrowser, INSTALL_BROWSER, printPdf } from '../printPdf.js';
import { densityOption } from './hydrostatics.js';
import { singleDraft } from './draftOption.js';

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
  },
  help: `Writes one self-contained HTML document for print: the hull's particulars, the
table of offsets, the lines, the hydrostatic table and the curves of form, the
Bonjean curves and the sectional-area curve, the sha256 of the input and the
date, with the caution printed on every page.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --paper <size>      a4 (default) or letter
  --pdf <out.pdf>     print the report to this PDF file instead, with the Chromium
                      installed on this machine (HALFBREADTH_BROWSER, else
                      /usr/bin/chromium); nothing is written on standard output
  --drafts <list>     drafts of the hydrostatic table, m (default: about twenty
                      round drafts from the keel to the lowest deck edge)
  --draft <m>         draft of the sectional-area curve (default: the middle
                      draft of the table)
  --density <t/m3>    water density (default 1.025, sea water)
  --fresh             fresh water, 1.000
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
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    const prepared = prepareHull(read!.hull);
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
