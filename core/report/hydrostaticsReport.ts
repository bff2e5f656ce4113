/**
 * The hydrostatic table with its options: in SI or imperial units (core/report/imperial.ts),
 * with or without the integration-error estimate of each row (core/upright/errorEstimate.ts).
 * Three forms as for the plain table (core/report/formatHydrostatics.ts, whose CSV preamble and
 * JSON writer it reuses); every form carries the caution. Without either option the
 * plain table's own formatter is the one to use.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import { ERROR_ESTIMATE_FIELDS, type ErrorEstimates, type Halving } from '../upright/errorEstimate.js';
import { csvHeader, csvPreamble, hullSummary, type HullSummary } from './formatHydrostatics.js';
import { HYDROSTATIC_FIELDS, type HydrostaticRow } from '../upright/hydrostaticFields.js';
import type { HullModel } from '../hull/hullModel.js';
import { cubicFeetPerLongTon, IMPERIAL_FIELDS, IMPERIAL_UNITS, imperialRow } from './imperial.js';
import { alignedTable, textCell } from './textTable.js';

export type UnitSystem = 'si' | 'imperial';

export interface ReportField {
  readonly key: string;
  readonly unit: string;
  readonly label: string;
}

/** A row: each field a number, and `errorEstimate` an object of numbers when asked for. */
export type ReportRow = Record<string, number | Record<string, number>>;

export interface HydrostaticsReport {
  readonly hull: HullSummary;
  readonly units: UnitSystem;
  /** t/m³, whatever the units of the rows. */
  readonly density: number;
  readonly caution: string;
  /** The fields of each row, with the unit they are given in. */
  readonly fields: readonly ReportField[];
  /** One object per draft; `errorEstimate` (estimated exact minus computed, in the row's units) when asked for. */
  readonly rows: readonly ReportRow[];
  /** How the coarse hull of the error estimate was made, when asked for. */
  readonly halving?: Halving;
  /** Why estimates are not given, each reason once with its drafts, when asked for (core/upright/errorEstimate.ts). */
  readonly errorNotes?: readonly string[];
}

export interface ReportOptions {
  readonly units: UnitSystem;
  readonly errorEstimate?: Pick<ErrorEstimates, 'estimates' | 'unreliable' | 'halving'>;
}

const SI_FIELDS: readonly (ReportField & { from: keyof HydrostaticRow; factor: number })[] = HYDROSTATIC_FIELDS.map((f) => ({
  key: f.key,
  unit: f.unit,
  label: f.label,
  from: f.key,
  factor: 1,
}));

/** The unit of an estimated quantity in the chosen system, and its factor from SI. */
function estimateUnit(siUnit: string, units: UnitSystem): { unit: string; factor: number } {
  return units === 'si' ? { unit: siUnit, factor: 1 } : IMPERIAL_UNITS[siUnit]!;
}

/** Each reason once, with the drafts it holds at: "drafts 1, 1.2 m: <reason>". */
function groupedNotes(drafts: readonly number[], reasons: readonly (readonly string[])[]): string[] {
  const byReason = new Map<string, number[]>();
  drafts.forEach((d, i) => {
    for (const r of reasons[i] ?? []) {
      const list = byReason.get(r) ?? [];
      list.push(d);
      byReason.set(r, list);
    }
  });
  return [...byReason].map(([r, ds]) => `draft${ds.length > 1 ? 's' : ''} ${ds.map((d) => Number(d.toPrecision(6))).join(', ')} m: ${r}`);
}

export function hydrostaticsReport(hull: HullModel, density: number, rows: readonly HydrostaticRow[], options: ReportOptions): HydrostaticsReport {
  const fields = options.units === 'si' ? SI_FIELDS : IMPERIAL_FIELDS;
  const summary = hullSummary(hull);
  const len = options.units === 'si' ? 1 : IMPERIAL_UNITS['m']!.factor;
  const est = options.errorEstimate;
  const out = rows.map((row, i) => {
    const r: ReportRow = options.units === 'si' ? { ...row } : imperialRow(row);
    if (est !== undefined) {
      const e: Record<string, number> = {};
      for (const q of ERROR_ESTIMATE_FIELDS) e[q.key] = est.estimates[i]![q.key] * estimateUnit(q.unit, options.units).factor;
      r['errorEstimate'] = e;
    }
    return r;
  });
  return {
    hull: { ...summary, ap: summary.ap * len, fp: summary.fp * len, lbp: summary.lbp * len },
    units: options.units,
    density,
    caution: CAUTION,
    fields: fields.map((f) => ({ key: f.key, unit: f.unit, label: f.label })),
    rows: out,
    ...(est === undefined
      ? {}
      : { halving: est.halving, errorNotes: groupedNotes(rows.map((r) => r.draft), est.unreliable) }),
  };
}

/** The columns of the CSV and text forms: the fields, then one per estimated quantity. */
function columns(r: HydrostaticsReport): (ReportField & { get: (row: ReportRow) => number; estimate: boolean })[] {
  const cols = r.fields.map((f) => ({ ...f, get: (row: ReportRow) => row[f.key] as number, estimate: false }));
  if (r.halving === undefined) return cols;
  for (const q of ERROR_ESTIMATE_FIELDS) {
    const unit = estimateUnit(q.unit, r.units).unit;
    const label = `err ${r.fields.find((f) => f.key === q.key)!.label}`;
    cols.push({ key: `${q.key}Error`, unit, label, get: (row) => (row['errorEstimate'] as Record<string, number>)[q.key]!, estimate: true });
  }
  return cols;
}

const IMPERIAL_SLUG: Record<string, string> = { 'LT/in': 'LT_per_in', 'LT.ft/in': 'LTft_per_in' };

const header = (c: ReportField): string => (IMPERIAL_SLUG[c.unit] !== undefined ? `${c.key}_${IMPERIAL_SLUG[c.unit]}` : csvHeader(c.key, c.unit));

function preambleLines(r: HydrostaticsReport): string[] {
  const u = r.units === 'si' ? 'm' : 'ft';
  const lines = [
    `hull: ${r.hull.name}; LBP ${Number(r.hull.lbp.toPrecision(10))} ${u}`,
    r.units === 'si'
      ? `density: ${r.density} t/m3`
      : `density: ${r.density} t/m3 (${Number(cubicFeetPerLongTon(r.density).toPrecision(6))} ft3 per long ton); units: feet and long tons (1 ft = 0.3048 m; 1 long ton = 1016.0469088 kg)`,
  ];
  if (r.halving !== undefined) {
    lines.push('error estimates: exact minus computed by halving (every second station and waterline) and Richardson extrapolation for Simpson\'s h^4; given only where a third level confirms the h^4 law and the halving keeps the hull\'s features');
    for (const n of r.halving.notes) lines.push(`error estimate: ${n}`);
    for (const n of r.errorNotes ?? []) lines.push(`error estimate not given at ${n}`);
  }
  return lines;
}

export function reportCsv(r: HydrostaticsReport): string {
  const cols = columns(r);
  const data = r.rows.map((row) => cols.map((c) => (Number.isFinite(c.get(row)) ? c.get(row) : '')));
  return csvPreamble(preambleLines(r)) + Papa.unparse({ fields: cols.map(header), data }, { newline: '\r\n' }) + '\r\n';
}

export function reportText(r: HydrostaticsReport): string {
  const cols = columns(r).map((c) => ({
    label: c.label,
    unit: c.unit,
    cells: r.rows.map((row) => {
      const v = c.get(row);
      return c.estimate && Number.isFinite(v) ? v.toExponential(1) : textCell(v, c.unit);
    }),
  }));
  return alignedTable(preambleLines(r), cols, r.rows.length);
}
