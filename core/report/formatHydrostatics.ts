/**
 * The hydrostatic table as an answer (core/report/answerForm.ts): its result, the unit of
 * each number, its columns (HYDROSTATIC_FIELDS) and the lines that say what it is of.
 * With the integration-error estimate (core/upright/errorEstimate.ts) each row also
 * carries `errorEstimate` and the table a column per estimated quantity. JSON, CSV and
 * text, SI or imperial, all columns or some, come from the shared step. Every form
 * carries the caution.
 */
import { CAUTION } from '../common/caution.js';
import { coefficientNotes } from '../upright/coefficientNotes.js';
import { ERROR_ESTIMATE_FIELDS, type ErrorEstimates, type Halving } from '../upright/errorEstimate.js';
import { HYDROSTATIC_FIELDS, type HydrostaticRow } from '../upright/hydrostaticFields.js';
import type { HullModel } from '../hull/hullModel.js';
import { writeAnswer, type AnswerForm, type Row, type TableColumn } from './answerForm.js';
import { DEFAULT_OUTPUT } from './outputOptions.js';
import { datumLine, HULL_UNITS, hullSummary, type HullSummary } from './resultParts.js';
import { SI_CONVERTER, type Converter, type UnitTree } from './unitConversion.js';

export { csvHeader, csvPreamble, hullSummary, toJson, type HullSummary } from './resultParts.js';

export interface HydrostaticResult {
  hull: HullSummary;
  density: number;
  caution: string;
  rows: HydrostaticRow[];
  /** Why a coefficient is not given at a draft (core/upright/coefficientNotes.ts); empty when every one is. */
  notes: string[];
}

/** The table with each row's estimate of its integration error (exact minus computed), and why some are not given. */
export interface EstimatedResult extends Omit<HydrostaticResult, 'rows'> {
  rows: (HydrostaticRow & { errorEstimate: Record<string, number> })[];
  /** How the coarse hull of the estimate was made. */
  halving: Halving;
  /** Why estimates are not given, each reason once with its drafts. */
  errorNotes: string[];
}

/** The result of the table; `conv` writes the drafts of the notes in the answer's units. */
export function hydrostaticResult(hull: HullModel, density: number, rows: HydrostaticRow[], conv: Converter = SI_CONVERTER): HydrostaticResult {
  return { hull: hullSummary(hull), density, caution: CAUTION, rows, notes: coefficientNotes(rows, conv.length) };
}

/** Each reason once, with the drafts it holds at: "drafts 1 m; 1.2 m: <reason>". */
function groupedNotes(drafts: readonly number[], reasons: readonly (readonly string[])[], length: (m: number) => string): string[] {
  const byReason = new Map<string, number[]>();
  drafts.forEach((d, i) => {
    for (const r of reasons[i] ?? []) {
      const list = byReason.get(r) ?? [];
      list.push(d);
      byReason.set(r, list);
    }
  });
  return [...byReason].map(([r, ds]) => `draft${ds.length > 1 ? 's' : ''} ${ds.map(length).join('; ')}: ${r}`);
}

/** The table with the estimates of `errorEstimates` put on its rows. */
export function estimatedResult(hull: HullModel, density: number, rows: HydrostaticRow[], est: ErrorEstimates, conv: Converter = SI_CONVERTER): EstimatedResult {
  return {
    ...hydrostaticResult(hull, density, rows, conv),
    rows: rows.map((r, i) => ({ ...r, errorEstimate: { ...est.estimates[i]! } })),
    halving: est.halving,
    errorNotes: groupedNotes(rows.map((r) => r.draft), est.unreliable, conv.length),
  };
}

const ROW_UNITS: Record<string, UnitTree> = Object.fromEntries(HYDROSTATIC_FIELDS.map((f) => [f.key, f.unit]));
const ESTIMATE_UNITS: Record<string, UnitTree> = Object.fromEntries(ERROR_ESTIMATE_FIELDS.map((f) => [f.key, f.unit]));

/** The lines that say what a hydrostatic table is of: the hull, the density (and the imperial units), the datum of x. */
export function tableLines(r: HydrostaticResult, ctx: Parameters<AnswerForm<HydrostaticResult>['lines']>[1]): string[] {
  const u = ctx.u('m');
  return [
    `hull: ${r.hull.name}`,
    ctx.conv.system === 'si'
      ? `density: ${r.density} t/m3`
      : `density: ${r.density} t/m3; units: feet and long tons (1 ft = 0.3048 m; 1 long ton = 1016.0469088 kg); TPI in long tons per inch and MTI in long ton-feet per inch`,
    `${datumLine(r.hull, ctx.n, u)}; LBP ${ctx.n(r.hull.lbp)} ${u}; ${r.hull.stations} stations`,
  ];
}

/** The hydrostatic table's answer form. */
export const HYDROSTATICS_FORM: AnswerForm<HydrostaticResult> = {
  units: { hull: HULL_UNITS, rows: [ROW_UNITS] },
  columns: HYDROSTATIC_FIELDS,
  rowsKey: 'rows',
  lines: tableLines,
  notes: (r) => r.notes,
};

const ESTIMATE_COLUMNS: readonly TableColumn[] = ERROR_ESTIMATE_FIELDS.map((q) => ({
  key: `${q.key}Error`,
  unit: q.unit,
  label: `err ${HYDROSTATIC_FIELDS.find((f) => f.key === q.key)!.label}`,
}));

/** The form of the table with its error estimates: a column per estimated quantity after the fields. */
export const ESTIMATED_FORM: AnswerForm<EstimatedResult> = {
  units: { hull: HULL_UNITS, rows: [{ ...ROW_UNITS, errorEstimate: ESTIMATE_UNITS }] },
  columns: [...HYDROSTATIC_FIELDS, ...ESTIMATE_COLUMNS],
  rows: (r) =>
    r.rows.map((row): Row => {
      const flat: Record<string, unknown> = { ...row };
      for (const [k, v] of Object.entries(row.errorEstimate)) flat[`${k}Error`] = v;
      return flat;
    }),
  lines: (r, ctx) => [
    ...tableLines(r, ctx),
    "error estimates: exact minus computed by halving (every second station and waterline) and Richardson extrapolation for Simpson's h^4; given only where a third level confirms the h^4 law and the halving keeps the hull's features",
    ...r.halving.notes.map((n) => `error estimate: ${n}`),
    ...r.errorNotes.map((n) => `error estimate not given at ${n}`),
  ],
  notes: (r) => r.notes,
};

/** The hydrostatic table as CSV in SI with every column (the shared step's defaults). */
export function hydrostaticsCsv(result: HydrostaticResult): string {
  return writeAnswer(HYDROSTATICS_FORM, result, 'csv', DEFAULT_OUTPUT, SI_CONVERTER);
}

/** The hydrostatic table as an aligned text table with a units line, for the terminal. */
export function hydrostaticsText(result: HydrostaticResult): string {
  return writeAnswer(HYDROSTATICS_FORM, result, 'table', DEFAULT_OUTPUT, SI_CONVERTER);
}
