/**
 * `halfbreadth hydrostatics <file|-> --drafts <list>`: the upright hydrostatic table of
 * an offsets file at a list of drafts, as a text table, CSV or JSON. Thin: the reading,
 * the figures and the forms all come from the core; the shared options (units, fields,
 * digits, plain header, input units) from cli/answerOptions.ts.
 */
import { HalfbreadthError, issue, type Issue } from '../../core/common/errors.js';
import { FRESH_WATER_DENSITY, SEA_WATER_DENSITY } from '../../core/common/constants.js';
import { readDecimal } from '../../core/common/decimal.js';
import { checkDensity } from '../../core/common/density.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { ESTIMATED_FORM, estimatedResult, HYDROSTATICS_FORM, hydrostaticResult } from '../../core/report/formatHydrostatics.js';
import { errorEstimates } from '../../core/upright/errorEstimate.js';
import { requireFormedRows } from '../../core/upright/formedRows.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { TRIMMED_FORM, trimmedTableResult } from '../../core/report/formatTrimmed.js';
import { draftsForDisplacements } from '../../core/stability/levelDrafts.js';
import { parseDisplacements } from '../../core/stability/stabilityInput.js';
import { trimmedHydrostaticTable } from '../../core/stability/trimmedHydrostatics.js';
import { lengthOption } from '../stabilityOptions.js';
import { answerOptions, converterOf, readOffsetsOf, writeResult } from '../answerOptions.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { readInput, type CliIo, str } from '../io.js';

/** The density from --density or --fresh (sea water when neither), checked against DENSITY_RANGE. */
export function densityOption(values: CommandArgs['values']): number {
  const text = str(values['density']);
  if (values['fresh'] === true) {
    if (text !== undefined) {
      throw new HalfbreadthError([issue('HYD_BAD_ARGUMENT', ['--fresh'], '--fresh and --density both set the density; give one of them')]);
    }
    return FRESH_WATER_DENSITY;
  }
  if (text === undefined) return SEA_WATER_DENSITY;
  return checkDensity(readDecimal(text), ['density'], text);
}

export const hydrostatics: Command = {
  name: 'hydrostatics',
  summary: 'the hydrostatic table of a hull at a list of drafts or displacements, level or trimmed',
  synopsis: 'hydrostatics <file|-> --drafts <list> | --displacements <list> [--trim <m>] [options]',
  positionals: ['<file|->'],
  answers: { formats: ['table', 'csv', 'json'], piped: 'csv' },
  options: {
    drafts: { type: 'string', example: '--drafts 0.2:0.1:1.2,1.25' },
    displacements: { type: 'string', example: '--displacements 3:0.5:6' },
    trim: { type: 'string', example: '--trim 0.2' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    'error-estimate': { type: 'boolean' },
  },
  help: `The upright, level hydrostatic particulars of the hull in an offsets file
at each draft of a list: volume, displacement, LCB, VCB (KB), waterplane area,
LCF, IT, IL, BMt, BMl, KMt, KMl, TPC, MCT1cm, LWL, BWL, Am, Cb, Cm, Cp, Cwp and
wetted surface. LCB and LCF are x positions from the offsets' origin (the
table's header lines give the AP and amidships in the same x).

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --drafts <list>     drafts above the baseline, in metres (feet with --units
                      imperial): values and ranges from:step:to, comma-separated,
                      e.g. 0.2:0.1:1.2,1.25 or, in feet, 2-0-0:0-3-0:4-0-0
  --displacements <list>
                      instead of --drafts: the displacements, tonnes (long tons
                      with --units imperial), values and ranges; each row is at
                      the draft that floats one of them ("what draft for 4.5 t")
  --trim <m>          the table at this trim, m (ft with --units imperial):
                      draft aft - draft forward, positive by the stern; draft
                      is then the draft amidships, and each row adds draftAft,
                      draftFwd and trim (so do rows found for --displacements)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  --error-estimate    add to each row an estimate of the integration error of
                      volume, LCB, VCB, waterplane area and BMt (exact minus
                      computed), by halving the stations and waterlines and
                      Richardson's rule for Simpson's h^4; an estimate is not
                      given (-) where a third halving does not confirm the h^4
                      law or the halving loses a feature of the hull, and the
                      reason is printed above the table
  -h, --help          this help

Forms:
  table   aligned columns under a units line, for reading
  csv     one row per draft; headers carry their units (volume_m3,
          tpc_t_per_cm); leading # lines give the caution, the hull, the
          datum of x and the density
  json    { "hull": {...}, "density": ..., "caution": "...", "rows": [...],
          "notes": [...] }, one row object per draft; a coefficient that is
          undefined is null; with --units imperial or --fields, also "units"
          and "fields" (each column's key and unit); with --error-estimate
          each row's "errorEstimate", "halving" and "errorNotes"

Every form carries the caution. Exit status: 0 done; 2 bad input, with every
problem of the file, the drafts and the options listed on stderr.

Example:
  halfbreadth hydrostatics offsets-demo/workboat.csv --drafts 0.5:0.25:2 \\
    > workboat-hydrostatics.csv`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const choice = attempt(() => answerOptions(args, ['table', 'csv', 'json'], 'csv', io), issues);
    const system = choice?.output.units ?? 'si';
    const byDisplacement = values['displacements'] !== undefined;
    if (byDisplacement === (values['drafts'] !== undefined)) {
      issues.push(issue('HYD_BAD_ARGUMENT', ['--drafts'], byDisplacement ? 'give --drafts or --displacements, not both' : '--drafts or --displacements is required (e.g. --drafts 0.2:0.1:1.2,1.25)'));
    }
    const drafts = byDisplacement || values['drafts'] === undefined ? undefined : attempt(() => parseDraftList(str(values['drafts']) ?? '', ['drafts'], system), issues);
    const displacements = byDisplacement ? attempt(() => parseDisplacements(str(values['displacements']) ?? '', ['--displacements'], system), issues) : undefined;
    const trim = attempt(() => lengthOption(values, 'trim', system), issues);
    if (values['error-estimate'] === true && trim !== undefined && trim !== 0) {
      issues.push(issue('HYD_BAD_ARGUMENT', ['--error-estimate'], '--error-estimate is given for the level table; leave out --trim for it'));
    }
    const density = attempt(() => densityOption(values), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsOf(input, choice), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const conv = await converterOf(choice!);
    const prepared = prepareHull(hull);
    if (displacements !== undefined || trim !== undefined) {
      const held = trim ?? 0;
      const at = displacements === undefined ? drafts! : draftsForDisplacements(prepared, displacements, density!, held);
      const trimmed = trimmedHydrostaticTable(prepared, at, held, density!);
      requireFormedRows(trimmed);
      if (values['error-estimate'] === true) {
        // Level rows found for displacements: the estimate of the level table at their drafts.
        const est = errorEstimates(prepared, at, density!);
        writeResult(io, ESTIMATED_FORM, estimatedResult(hull, density!, trimmed, est, conv), choice!, conv);
      } else {
        writeResult(io, TRIMMED_FORM, trimmedTableResult(hull, density!, trimmed, held, displacements ?? null, conv), choice!, conv);
      }
      return EXIT.ok;
    }
    const rows = hydrostaticTable(prepared, drafts!, density!);
    requireFormedRows(rows);
    if (values['error-estimate'] === true) {
      const est = errorEstimates(prepared, drafts!, density!);
      writeResult(io, ESTIMATED_FORM, estimatedResult(hull, density!, rows, est, conv), choice!, conv);
    } else {
      writeResult(io, HYDROSTATICS_FORM, hydrostaticResult(hull, density!, rows, conv), choice!, conv);
    }
    return EXIT.ok;
  },
};
