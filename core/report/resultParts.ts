/**
 * Parts every result and every form of it shares: what a result says of its hull (and
 * the units of those numbers), the datum line of its longitudinal positions, CSV
 * headers with their units, the leading comment lines of a CSV, and JSON text.
 */
import { CAUTION } from '../common/caution.js';
import { csvSafeText } from '../common/csvSafe.js';
import { perpendiculars, type HullModel } from '../hull/hullModel.js';
import type { UnitTree } from './unitConversion.js';

/** What a result says of the hull it came from. */
export interface HullSummary {
  name: string;
  stations: number;
  waterlines: number | null;
  ap: number;
  fp: number;
  lbp: number;
}

/** The units of a HullSummary's numbers. */
export const HULL_UNITS: UnitTree = { ap: 'm', fp: 'm', lbp: 'm' };

export function hullSummary(hull: HullModel): HullSummary {
  const p = perpendiculars(hull);
  return { name: hull.name, stations: hull.stations.length, waterlines: hull.waterlines?.length ?? null, ap: p.ap, fp: p.fp, lbp: p.lbp };
}

/**
 * Where every x of a table is measured from, in words: the offsets' own origin, with the
 * AP, amidships and FP given in it (conventions: LCB, LCF and the like are x coordinates
 * in the file's frame, not distances from amidships). `n` writes a number, `u` is the
 * length unit of the answer.
 */
export function datumLine(hull: Pick<HullSummary, 'ap' | 'fp'>, n: (v: number) => string, u: string): string {
  return `x and every position along the length are measured from the offsets' origin (positive forward): AP at x = ${n(hull.ap)} ${u}; amidships at x = ${n((hull.ap + hull.fp) / 2)} ${u}; FP at x = ${n(hull.fp)} ${u}`;
}

const UNIT_SLUG: Readonly<Record<string, string>> = {
  't/cm': 't_per_cm',
  't.m/cm': 'tm_per_cm',
  'LT/in': 'LT_per_in',
  'LT.ft/in': 'LTft_per_in',
  't/m3': 't_per_m3',
  '-': '',
  '': '',
};

/** CSV header of a field: its name with the unit as a suffix (`volume_m3`, `tpi_LT_per_in`); none for coefficients and text. */
export function csvHeader(key: string, unit: string): string {
  const slug = UNIT_SLUG[unit] ?? unit.replace(/[^a-z0-9]+/gi, '_');
  return slug === '' ? key : `${key}_${slug}`;
}

/** JSON text of a result: NaN (an undefined coefficient) is written as null. */
export function toJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2);
}

/** A `#` comment line of a CSV: commas become spaces, so the line stays one cell for a reader that splits on them; csvSafeText makes it safe for the others. */
export function csvCommentLine(line: string): string {
  return `# ${csvSafeText(line.replace(/,+/g, ' '))}`;
}

/**
 * Leading comment lines of every CSV result: the caution, then what the table is of.
 * Line breaks and commas become spaces, so each line stays one cell led by `#`. A
 * spreadsheet may also split on a semicolon (where the decimal mark is a comma) or a
 * tab when it imports; one of those followed by =, +, - or @ would start a formula cell
 * (a hull name such as `a;=1+2`), so it becomes a space too. Our own `;` between
 * phrases stays.
 */
export function csvPreamble(lines: readonly string[]): string {
  return [`# ${CAUTION}`, ...lines.map(csvCommentLine)].join('\r\n') + '\r\n';
}
