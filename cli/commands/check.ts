/**
 * `halfbreadth check <file|->`: reads and validates an offsets file and prints either
 * its particulars (what the file holds, and the drafts a table of it may use) or every
 * error found, each with its line and column.
 */
import { CAUTION } from '../../core/common/caution.js';
import { HalfbreadthError, type Issue } from '../../core/common/errors.js';
import { fairnessWarningsIn } from '../../core/fairness/fairnessInFile.js';
import { checkWarnings, proportionWarnings } from '../../core/offsets/readingWarnings.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import type { ReadResult } from '../../core/offsets/readOffsets.js';
import type { AnswerForm, FormContext } from '../../core/report/answerForm.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, terminalSafe, type CliIo } from '../io.js';
import { issueLines } from '../printIssues.js';

/** A remark on a sound hull that a person should look at, such as an offset that is not fair. */
export interface Warning {
  readonly code: string;
  readonly path: readonly (string | number)[];
  readonly message: string;
}

/**
 * The checks that find warnings in a hull that reads without error: how the table was
 * written (a keel taken at a tabulated waterline, proportions that suggest the wrong
 * unit; core/offsets/readingWarnings.ts) and the fairness of the offsets
 * (core/fairness/fairness.ts; each warning also gives x, z, value and a suggested value).
 */
export const WARNING_CHECKS: readonly ((read: ReadResult) => readonly Warning[])[] = [
  (read) => checkWarnings(read.notes),
  (read) => proportionWarnings(read.hull, read.units),
  (read) => fairnessWarningsIn(read.hull, read),
];

/** What `check` reports of a sound file. Lengths in metres, whatever the file's units. */
export interface Particulars {
  name: string;
  form: ReadResult['form'];
  units: ReadResult['units'];
  stations: number;
  /** Tabulated waterlines of a grid; null for the points form. */
  waterlines: number | null;
  points: number;
  ap: number;
  fp: number;
  lbp: number;
  amidships: number;
  /** Keel heights above the baseline over the stations, m. */
  keel: { lowest: number; highest: number };
  /** Deck-edge heights above the baseline over the stations, m. */
  deckEdge: { lowest: number; highest: number };
  /** A table may use drafts above `above` and up to `atMost`, m (above the lowest keel, not above the lowest deck edge). */
  drafts: { above: number; atMost: number };
}

export function particulars(read: ReadResult): Particulars {
  const { hull } = read;
  const p = prepareHull(hull);
  const decks = p.sections.map((s) => s.zDeck);
  return {
    name: hull.name,
    form: read.form,
    units: read.units,
    stations: hull.stations.length,
    waterlines: hull.waterlines?.length ?? null,
    points: hull.stations.reduce((n, s) => n + s.points.length, 0),
    ap: p.perp.ap,
    fp: p.perp.fp,
    lbp: p.perp.lbp,
    amidships: p.perp.xm,
    keel: { lowest: p.lowestKeel, highest: Math.max(...p.keel) },
    deckEdge: { lowest: p.lowestDeck, highest: Math.max(...decks) },
    drafts: { above: p.lowestKeel, atMost: p.lowestDeck },
  };
}

/** The JSON report: `{ errors, warnings, particulars, caution }`; particulars null when there are errors. */
export interface CheckReport {
  errors: readonly Issue[];
  warnings: readonly Warning[];
  particulars: Particulars | null;
  caution: string;
}

/** The particulars as aligned lines for the terminal, lengths in the answer's unit. */
export function particularsText(label: string, p: Particulars, ctx: Pick<FormContext, 'n' | 'u'>): string {
  const u = ctx.u('m');
  const m = (v: number): string => `${Number.isFinite(v) ? v.toFixed(3) : '-'} ${u}`;
  const rows: [string, string][] = [
    ['name', p.name],
    ['form', p.form === 'grid' ? 'grid (table of offsets)' : 'points (sections as point lists)'],
    ['units in file', p.units],
    ['stations', String(p.stations)],
    ['waterlines', p.waterlines === null ? '-' : String(p.waterlines)],
    ['points', String(p.points)],
    ['ap', m(p.ap)],
    ['fp', m(p.fp)],
    ['LBP', m(p.lbp)],
    ['amidships', m(p.amidships)],
    ['keel', `${m(p.keel.lowest)} lowest, ${m(p.keel.highest)} highest`],
    ['deck edge', `${m(p.deckEdge.lowest)} lowest, ${m(p.deckEdge.highest)} highest`],
    ['drafts', `above ${m(p.drafts.above)}, up to ${m(p.drafts.atMost)}`],
  ];
  const w = Math.max(...rows.map(([k]) => k.length));
  return [
    `${label}: reads without error (lengths in ${u === 'm' ? 'metres' : 'feet'}; x from the offsets' origin)`,
    ...rows.map(([k, v]) => `  ${k.padEnd(w)}  ${v}`),
    '',
    CAUTION,
  ].join('\n') + '\n';
}

/** The check's answer: findings, not a table (no columns, no CSV); its lengths convert with the units. */
function checkForm(label: string): AnswerForm<CheckReport> {
  const pair = { lowest: 'm', highest: 'm' };
  return {
    units: {
      particulars: { ap: 'm', fp: 'm', lbp: 'm', amidships: 'm', keel: pair, deckEdge: pair, drafts: { above: 'm', atMost: 'm' } },
      warnings: [{ x: 'm', z: 'm', value: 'm', suggested: 'm' }],
    },
    columns: [],
    jsonOnly: true,
    lines: () => [],
    text: (r, ctx) => (r.particulars === null ? '' : particularsText(label, r.particulars, ctx)),
  };
}

export const check: Command = {
  name: 'check',
  summary: 'validate an offsets file: particulars, errors, unfair offsets',
  synopsis: 'check <file|-> [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'json'], piped: 'table' },
  options: {},
  help: `Reads an offsets file and reports either what it holds (name, form,
units, stations, waterlines, points, ap, fp, LBP, amidships, keel and deck-edge
heights, and the drafts a hydrostatic table of it may use) or every error
found, each with its line and column. It also warns of offsets that are not
fair (a bump or hollow in a waterline or a section, with a fair value), of a
keel taken at a tabulated waterline where a keel_z column would place it,
and of proportions that suggest the wrong unit (no vessel is over 400 m).
Errors and warnings name the line and column and give values in the file's
own units; the particulars are in metres, or feet with --units imperial.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  -h, --help          this help

Forms:
  table   the particulars as lines on stdout; errors and warnings on stderr
  json    { "errors": [...], "warnings": [...], "particulars": {...} | null,
          "caution": "..." } on stdout; each error is { code, path, message };
          each warning { code, path, message }, and for an offset that is
          not fair along its waterline or section also x, z, value and a
          fair value from its neighbours (in metres, or feet) and its line
          and column; errors and warnings also go to stderr

Exit status: 0 when the file reads without error, 2 when it has errors.`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const choice = answerOptions(args, ['table', 'json'], 'table', io);
    const input = await readInput(args.positionals[0]!, io);
    const program = 'halfbreadth check';
    let read: ReadResult | undefined;
    let errors: readonly Issue[] = [];
    try {
      read = readOffsetsOf(input, choice);
    } catch (e) {
      if (!(e instanceof HalfbreadthError)) throw e;
      errors = e.issues;
    }
    const warnings = read === undefined ? [] : WARNING_CHECKS.flatMap((f) => f(read));
    const found = read === undefined ? null : particulars(read);
    if (errors.length > 0) io.stderr.write(issueLines(errors, input.label, program).join('\n') + '\n');
    if (warnings.length > 0) io.stderr.write(warnings.map((w) => terminalSafe(`${input.label}: warning: ${w.message}`)).join('\n') + '\n');
    const conv = await converterOf(choice);
    const report: CheckReport = { errors, warnings, particulars: found, caution: CAUTION };
    writeResult(io, checkForm(input.label), report, choice, conv);
    return errors.length > 0 ? EXIT.badInput : EXIT.ok;
  },
};
