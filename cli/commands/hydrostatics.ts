/**
 * `halfbreadth hydrostatics <file|-> --drafts <list>`: the upright hydrostatic table of
 * an offsets file at a list of drafts, as a text table, CSV or JSON. Thin: the reading,
 * the figures and the three forms all come from the core.
 */
import { HalfbreadthError, issue, type Issue } from '../../core/common/errors.js';
import { FRESH_WATER_DENSITY, SEA_WATER_DENSITY } from '../../core/common/constants.js';
import { readDecimal } from '../../core/common/decimal.js';
import { checkDensity } from '../../core/common/density.js';
import { parseDraftList } from '../../core/common/draftList.js';
import { hydrostaticResult, hydrostaticsCsv, hydrostaticsText, toJson } from '../../core/report/formatHydrostatics.js';
import { errorEstimates } from '../../core/upright/errorEstimate.js';
import { requireFormedRows } from '../../core/upright/formedRows.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import type { UnitSystem } from '../../core/report/hydrostaticsReport.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { attempt, attemptAsync, throwIfAny } from '../collect.js';
import type { Command, CommandArgs } from '../command.js';
import { EXIT } from '../command.js';
import { chooseFormat, readInput, terminalSafe, type CliIo, str } from '../io.js';

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

/** The unit system of --units: si (the default) or imperial. */
export function unitsOption(text: string | undefined): UnitSystem {
  if (text === undefined || text === 'si') return 'si';
  if (text === 'imperial') return 'imperial';
  throw new HalfbreadthError([issue('HYD_BAD_ARGUMENT', ['--units'], `--units '${text.slice(0, 40)}' is not one of si, imperial`)]);
}

export const hydrostatics: Command = {
  name: 'hydrostatics',
  summary: 'the upright hydrostatic table of a hull at a list of drafts',
  synopsis: 'hydrostatics <file|-> --drafts <list> [options]',
  positionals: ['<file|->'],
  options: {
    drafts: { type: 'string', required: true, example: '--drafts 0.2:0.1:1.2,1.25' },
    density: { type: 'string', example: '--density 1.025' },
    fresh: { type: 'boolean' },
    format: { type: 'string', example: '--format csv' },
    units: { type: 'string', example: '--units imperial' },
    'error-estimate': { type: 'boolean' },
  },
  help: `The upright, level hydrostatic particulars of the hull in an offsets file
at each draft of a list: volume, displacement, LCB, VCB (KB), waterplane area,
LCF, IT, IL, BMt, BMl, KMt, KMl, TPC, MCT1cm, LWL, BWL, Am, Cb, Cm, Cp, Cwp and
wetted surface.

Arguments:
  <file|->            offsets CSV, grid or points form; - reads standard input

Options:
  --drafts <list>     drafts in metres above the baseline: values and ranges
                      from:step:to, comma-separated, e.g. 0.2:0.1:1.2,1.25
                      (required)
  --density <t/m3>    water density, 0.9 to 1.1 (default 1.025, sea water)
  --fresh             fresh water: density 1.000
  --format <form>     table, csv or json (default: table on a terminal, csv when
                      the output is piped or redirected to a file)
  --units <system>    si (default) or imperial: feet, long tons, TPI (long tons
                      per inch) and MTI (long ton-feet per inch); with imperial
                      the drafts are given in feet
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
          tpc_t_per_cm); leading # lines give the caution, the hull and the
          density
  json    { "hull": {...}, "density": ..., "caution": "...", "rows": [...] },
          one row object per draft; a coefficient that is undefined is null;
          with --units or --error-estimate, also "units" and "fields" (each
          field's key and unit), and each row's "errorEstimate" when asked for

Every form carries the caution. Exit status: 0 done; 2 bad input, with every
problem of the file, the drafts and the options listed on stderr.

Example:
  halfbreadth hydrostatics offsets-demo/workboat.csv --drafts 0.5:0.25:2 \\
    > workboat-hydrostatics.csv`,
  async run(args: CommandArgs, io: CliIo): Promise<number> {
    const issues: Issue[] = [];
    const { values } = args;
    const format = attempt(() => chooseFormat(str(values['format']), ['table', 'csv', 'json'], 'csv', io.stdout), issues);
    const drafts = attempt(() => parseDraftList(str(values['drafts']) ?? ''), issues);
    const density = attempt(() => densityOption(values), issues);
    const units = attempt(() => unitsOption(str(values['units'])), issues);
    const input = await attemptAsync(() => readInput(args.positionals[0]!, io), issues);
    const read = input === undefined ? undefined : attempt(() => readOffsetsCsv(input.text), issues);
    throwIfAny(issues);
    const { hull } = read!;
    const prepared = prepareHull(hull);
    if (units !== 'si' || values['error-estimate'] === true) {
      // Loaded only when asked for: the imperial factors come from mathjs, whose import
      // costs most of a second, which the plain SI table should not pay.
      const { hydrostaticsReport, reportCsv, reportText } = await import('../../core/report/hydrostaticsReport.js');
      const { IMPERIAL_FACTORS } = await import('../../core/report/imperial.js');
      // Drafts are typed in feet when the table is asked for in imperial units.
      const metres = units === 'imperial' ? drafts!.map((d) => d * IMPERIAL_FACTORS.metresPerFoot) : drafts!;
      const rows = hydrostaticTable(prepared, metres, density!);
      requireFormedRows(rows);
      const errorEstimate = values['error-estimate'] === true ? errorEstimates(prepared, metres, density!) : undefined;
      const report = hydrostaticsReport(hull, density!, rows, { units: units!, ...(errorEstimate === undefined ? {} : { errorEstimate }) });
      io.stdout.write(format === 'json' ? toJson(report) + '\n' : format === 'csv' ? reportCsv(report) : terminalSafe(reportText(report)));
      return EXIT.ok;
    }
    const rows = hydrostaticTable(prepared, drafts!, density!);
    requireFormedRows(rows);
    const result = hydrostaticResult(hull, density!, rows);
    const text = format === 'json' ? toJson(result) + '\n' : format === 'csv' ? hydrostaticsCsv(result) : terminalSafe(hydrostaticsText(result));
    io.stdout.write(text);
    return EXIT.ok;
  },
};
