/**
 * A unit written in a header cell, as people label a column in a spreadsheet: `x (m)`,
 * `x [mm]`, `X(ft-in-8)`. The unit is one of the length units of offsets files
 * (core/common/units.ts); it stands for the file's `# units:` line, or agrees with it.
 * Any named column may carry one (`x (m)`, and in the points form `y (m)`, `z (m)`), and
 * all the units given must be the same.
 *
 * Where the file's unit comes from, in order: the `# units:` line, a unit in the header,
 * the unit the request names for a file without one (`--input-units`, `inputUnits=`),
 * else metres. Two of them that are given and disagree are an error naming both
 * (HYD_UNITS_CONFLICT): reading a millimetre table as metres is never a silent choice.
 */
import type { Issue } from '../common/errors.js';
import { isLengthUnit, LENGTH_UNITS, type LengthUnit } from '../common/units.js';
import { csvIssue } from './offsetsIssue.js';

/** `name (unit)` or `name [unit]`, the name a word of letters and underscores. */
const WITH_UNIT = /^([A-Za-z_]+)\s*(?:\(\s*([^()]*?)\s*\)|\[\s*([^[\]]*?)\s*\])$/;

export interface HeaderUnit {
  /** The header cells with their units taken off (`x (m)` becomes `x`). */
  readonly cells: string[];
  /** The unit the header gives, if any, and the 1-based column it was first given in. */
  readonly unit: LengthUnit | undefined;
  readonly column: number | undefined;
  readonly issues: Issue[];
}

/** The units written in a header's cells (trimmed), and the cells without them. */
export function headerUnit(header: readonly string[], line: number): HeaderUnit {
  const issues: Issue[] = [];
  let unit: LengthUnit | undefined;
  let column: number | undefined;
  const cells = header.map((cell, c) => {
    const m = WITH_UNIT.exec(cell);
    if (m === null) return cell;
    const written = (m[2] ?? m[3] ?? '').toLowerCase();
    if (!isLengthUnit(written)) {
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, `the unit '${written}' in header cell '${cell}' is not one of ${LENGTH_UNITS.join(', ')}`));
    } else if (unit === undefined) {
      unit = written;
      column = c + 1;
    } else if (written !== unit) {
      issues.push(csvIssue('HYD_UNITS_CONFLICT', line, c + 1, undefined, `header cell '${cell}' gives the unit ${written} but column ${column} gives ${unit}; a table has one unit`));
    }
    return m[1]!;
  });
  return { cells, unit, column, issues };
}

/** The places a file's unit can be given, as read. */
export interface UnitSources {
  /** The `# units:` line's unit and line, when there is one. */
  readonly line?: { readonly unit: LengthUnit; readonly at: number } | undefined;
  /** The header's unit, its line and column, when there is one. */
  readonly header?: { readonly unit: LengthUnit; readonly at: number; readonly column: number } | undefined;
  /** The unit the request names for a file without a units line. */
  readonly input?: LengthUnit | undefined;
}

/** Issues where the given units disagree, each naming both (HYD_UNITS_CONFLICT). */
export function unitConflicts(s: UnitSources): Issue[] {
  const out: Issue[] = [];
  const { line, header, input } = s;
  if (line !== undefined && header !== undefined && line.unit !== header.unit) {
    out.push(csvIssue('HYD_UNITS_CONFLICT', header.at, header.column, undefined,
      `the header gives the unit ${header.unit} but the units line (line ${line.at}) says ${line.unit}; give the unit once, or make them agree`));
  }
  const given = line ?? header;
  if (given !== undefined && input !== undefined && given.unit !== input) {
    const where = line !== undefined ? `the units line (line ${line.at}) says ${line.unit}` : `the header (column ${header!.column}) gives ${header!.unit}`;
    out.push(csvIssue('HYD_UNITS_CONFLICT', given.at, line !== undefined ? undefined : header!.column, undefined,
      `${where} but the request names ${input} (input units, for a file without a units line); leave the input units out, or make them agree`));
  }
  return out;
}
