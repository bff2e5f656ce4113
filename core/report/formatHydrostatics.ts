/**
 * The hydrostatic table in its three output forms: JSON, CSV with unit-suffixed
 * headers, and an aligned text table. Pure: callers write the text where they like.
 * Every form carries the caution.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import { csvSafeText } from '../common/csvSafe.js';
import { alignedTable, textCell } from './textTable.js';
import { coefficientNotes } from '../upright/coefficientNotes.js';
import { HYDROSTATIC_FIELDS, type HydrostaticRow } from '../upright/hydrostaticFields.js';
import { perpendiculars, type HullModel } from '../hull/hullModel.js';

/** What a result says of the hull it came from. */
export interface HullSummary {
  name: string;
  stations: number;
  waterlines: number | null;
  ap: number;
  fp: number;
  lbp: number;
}

export function hullSummary(hull: HullModel): HullSummary {
  const p = perpendiculars(hull);
  return { name: hull.name, stations: hull.stations.length, waterlines: hull.waterlines?.length ?? null, ap: p.ap, fp: p.fp, lbp: p.lbp };
}

export interface HydrostaticResult {
  hull: HullSummary;
  density: number;
  caution: string;
  rows: HydrostaticRow[];
  /** Why a coefficient is not given at a draft (core/upright/coefficientNotes.ts); empty when every one is. */
  notes: string[];
}

export function hydrostaticResult(hull: HullModel, density: number, rows: HydrostaticRow[]): HydrostaticResult {
  return { hull: hullSummary(hull), density, caution: CAUTION, rows, notes: coefficientNotes(rows) };
}

const UNIT_SLUG: Record<string, string> = { m: 'm', m2: 'm2', m3: 'm3', m4: 'm4', t: 't', 't/cm': 't_per_cm', 't.m/cm': 'tm_per_cm', '-': '' };

/** CSV header of a field: its name with the unit as a suffix (`volume_m3`); none for coefficients. */
export function csvHeader(key: string, unit: string): string {
  const slug = UNIT_SLUG[unit] ?? unit.replace(/[^a-z0-9]+/gi, '_');
  return slug === '' ? key : `${key}_${slug}`;
}

/** JSON text of a result: NaN (an undefined coefficient) is written as null. */
export function toJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2);
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
  // Commas go, so a line stays one cell for a reader that splits on them; csvSafeText makes it safe for the others.
  const tidy = (l: string): string => csvSafeText(l.replace(/,+/g, ' '));
  return [`# ${CAUTION}`, ...lines.map((l) => `# ${tidy(l)}`)].join('\r\n') + '\r\n';
}

/** The hydrostatic table as CSV: caution line, hull and density lines, header, one row per draft. */
export function hydrostaticsCsv(result: HydrostaticResult): string {
  const header = HYDROSTATIC_FIELDS.map((f) => csvHeader(f.key, f.unit));
  const data = result.rows.map((r) => HYDROSTATIC_FIELDS.map((f) => (Number.isFinite(r[f.key]) ? r[f.key] : '')));
  const preamble = csvPreamble([`hull: ${result.hull.name}`, `density: ${result.density} t/m3`, ...result.notes]);
  return preamble + Papa.unparse({ fields: header, data }, { newline: '\r\n' }) + '\r\n';
}

/** An aligned text table with a units line, for the terminal. */
export function hydrostaticsText(result: HydrostaticResult): string {
  const columns = HYDROSTATIC_FIELDS.map((f) => ({ label: f.label, unit: f.unit, cells: result.rows.map((r) => textCell(r[f.key], f.unit)) }));
  const title = `${result.hull.name}: ${result.hull.stations} stations, LBP ${result.hull.lbp.toFixed(3)} m, density ${result.density} t/m3`;
  return alignedTable([title], columns, result.rows.length, result.notes);
}
