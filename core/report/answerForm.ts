/**
 * The shared output step of every answer: a result computed in SI is converted to the
 * unit system asked for, its numbers rounded to the digits asked for, the columns of its
 * table chosen and ordered, and it is written as JSON, CSV (with the caution first, or
 * after the rows with a plain header) or an aligned text table.
 *
 * A command (cli/) or a computation (server/) does none of this itself: it declares its
 * answer's form, an `AnswerForm`: the unit of each number of its result (a unit tree,
 * core/report/unitConversion.ts), its table's columns (key, SI unit, label), where the
 * table's rows are, and the lines that say what the table is of. `--units`, `--fields`,
 * `--digits` and `--plain-header` on the command line and `units=`, `fields=`,
 * `digits=` and `header=plain` in a query then work on it with no code of its own.
 *
 * Numbers are rounded to `digits` significant digits (12 by default) and written in the
 * shortest form that reads back to the rounded value (ECMA-262 Number::toString), so a
 * spreadsheet receives 13.79, not 13.790000000000001; 17 digits give the double itself.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import { fail } from '../common/errors.js';
import { csvSafeText } from '../common/csvSafe.js';
import type { OutputOptions } from './outputOptions.js';
import { csvCommentLine, csvHeader, csvPreamble } from './resultParts.js';
import { alignedTable, textCell } from './textTable.js';
import { convertResult, type Converter, type UnitTree } from './unitConversion.js';

/** A row of a table: numbers (null where not given), and text cells. */
export type Row = Readonly<Record<string, unknown>>;

/** A column of a table: the key of its values in the rows, its SI unit (`-` none, `` text) and its label. */
export interface TableColumn {
  readonly key: string;
  readonly unit: string;
  readonly label: string;
}

/** A column as answered: its key, unit and label in the output system, and the SI key it comes from. */
export interface OutColumn extends TableColumn {
  readonly from: string;
}

/** What a form's writers are given besides the result. */
export interface FormContext {
  readonly options: OutputOptions;
  readonly conv: Converter;
  /** The columns chosen, in order, in the output's names and units. */
  readonly columns: readonly OutColumn[];
  /** The output unit of an SI unit (`m` or `ft`). */
  u(siUnit: string): string;
  /** A number for a line of words, at the answer's digits; `-` where not finite. */
  n(v: number): string;
}

/** The declaration a command or computation makes of its answer (see the module note). */
export interface AnswerForm<R> {
  /** The unit of each number of the result. */
  readonly units: UnitTree;
  /** The table's columns, SI keys and units, in their usual order. */
  readonly columns: readonly TableColumn[];
  /**
   * The key of the result's array whose objects are the table's rows in JSON: `fields`
   * keeps only the chosen keys in them. Without it, a JSON answer with `fields` is the
   * table itself: `{ hull, caution, units, fields, rows }`.
   */
  readonly rowsKey?: string;
  /** The table's rows for CSV and text, keyed by output key; by default the JSON rows. */
  rows?(result: R, ctx: FormContext): readonly Row[];
  /** What the table is of: the CSV's `#` lines after the caution, the lines above a text table. */
  lines(result: R, ctx: FormContext): readonly string[];
  /** Notes under a text table, and further `#` lines of the CSV. */
  notes?(result: R, ctx: FormContext): readonly string[];
  /** The text form, when it is more than the aligned table (a sheet, a bar chart); undefined gives the aligned table. */
  text?(result: R, ctx: FormContext): string | undefined;
  /** True when the answer has no CSV form (a report of findings rather than a table). */
  readonly jsonOnly?: boolean;
}

/** Any form (results differ from one answer to the next). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyAnswerForm = AnswerForm<any>;

/** Exact powers of ten as doubles (10^22 is the last one a double holds exactly). */
const POW10 = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/**
 * A number rounded to `digits` significant digits, the value of `v.toPrecision(digits)`;
 * non-finite values as they are. The common case is done in integers: n = round(v 10^k)
 * with n below 10^15 and 10^k exact, then n / 10^k, which IEEE 754 division rounds to the
 * double nearest the decimal n x 10^-k, as reading the text would; where v 10^k lies near
 * a half (its own rounding could tip it) or out of that range, toPrecision decides. It is
 * about three times faster than toPrecision on a table's figures.
 */
export function roundNumber(v: number, digits: number): number {
  if (!Number.isFinite(v) || v === 0) return v;
  const a = Math.abs(v);
  const k = digits - 1 - Math.floor(Math.log10(a));
  if (digits <= 15 && k >= 0 && k <= 22) {
    // log10 may be off by one next to a power of ten: the scaled value must have `digits` digits.
    let scaled = a * POW10[k]!;
    let kk = k;
    if (scaled >= POW10[digits]!) {
      kk--;
      scaled = a * POW10[kk]!;
    } else if (scaled < POW10[digits - 1]!) {
      kk++;
      if (kk > 22) return Number(v.toPrecision(digits));
      scaled = a * POW10[kk]!;
    }
    if (kk >= 0) {
      const frac = scaled - Math.floor(scaled);
      if (Math.abs(frac - 0.5) > 1e-6) {
        const n = Math.round(scaled) / POW10[kk]!;
        return v < 0 ? -n : n;
      }
    }
  }
  return Number(v.toPrecision(digits));
}

/** Every number of a value rounded to `digits` significant digits (plain objects and arrays walked). */
export function roundNumbers<T>(value: T, digits: number): T {
  if (typeof value === 'number') return roundNumber(value, digits) as T;
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) {
    const out = new Array<unknown>(value.length);
    for (let i = 0; i < value.length; i++) out[i] = roundNumbers(value[i] as unknown, digits);
    return out as T;
  }
  const out: Record<string, unknown> = {};
  const src = value as Record<string, unknown>;
  for (const k in src) if (Object.hasOwn(src, k)) out[k] = roundNumbers(src[k], digits);
  return out as T;
}

/**
 * The columns an answer gives, in the output's names and units: all of the form's, or
 * those `fields` names in its order (a field may be named by its output key, `tpi`, or
 * its SI key, `tpc`). An unknown name is a HYD_BAD_ARGUMENT naming the ones there are.
 */
export function selectColumns(form: Pick<AnyAnswerForm, 'columns'>, options: Pick<OutputOptions, 'fields'>, conv: Converter): OutColumn[] {
  const all = form.columns.map((c) => ({ key: conv.key(c.key, c.unit), unit: conv.unit(c.unit).unit, label: conv.label(c.key, c.label, c.unit), from: c.key }));
  if (options.fields === undefined) return all;
  if (all.length === 0) fail('HYD_BAD_ARGUMENT', ['fields'], 'fields: this answer is not a table, so it has no columns to choose');
  const unknown = options.fields.filter((f) => !all.some((c) => c.key === f || c.from === f));
  if (unknown.length > 0) {
    fail('HYD_BAD_ARGUMENT', ['fields'], `fields: ${unknown.map((f) => `'${f.slice(0, 40)}'`).join(', ')} ${unknown.length > 1 ? 'are not columns' : 'is not a column'} of this answer; its columns are ${all.map((c) => c.key).join(', ')}`);
  }
  return options.fields.map((f) => all.find((c) => c.key === f || c.from === f)!);
}

/** A result shaped for its answer: converted and rounded, with the context its writers use. */
export interface ShapedAnswer<R> {
  readonly form: AnswerForm<R>;
  readonly result: R;
  readonly ctx: FormContext;
}

/** Convert, round and choose the columns of a result (see the module note). */
export function shapeAnswer<R>(form: AnswerForm<R>, result: R, options: OutputOptions, conv: Converter): ShapedAnswer<R> {
  const columns = selectColumns(form, options, conv);
  const shaped = roundNumbers(convertResult(result, form.units, conv), options.digits);
  const ctx: FormContext = {
    options,
    conv,
    columns,
    u: (siUnit) => conv.unit(siUnit).unit,
    n: (v) => (Number.isFinite(v) ? String(roundNumber(v, options.digits)) : '-'),
  };
  return { form, result: shaped, ctx };
}

function tableRows<R>(a: ShapedAnswer<R>): readonly Row[] {
  if (a.form.rows !== undefined) return a.form.rows(a.result, a.ctx);
  const key = a.form.rowsKey;
  const rows = key === undefined ? undefined : (a.result as Record<string, unknown>)[key];
  return Array.isArray(rows) ? (rows as Row[]) : [];
}

const pick = (row: Row, columns: readonly OutColumn[]): Record<string, unknown> => Object.fromEntries(columns.map((c) => [c.key, row[c.key] ?? null]));

/** The JSON value of an answer. With other units or chosen fields it also says `units` and `fields` (each column's key, unit and label). */
export function answerJson<R>(a: ShapedAnswer<R>): unknown {
  const { options, columns } = a.ctx;
  const result = a.result as Record<string, unknown>;
  const meta = options.units !== 'si' || options.fields !== undefined;
  const fields = columns.map(({ key, unit, label }) => ({ key, unit, label }));
  if (options.fields !== undefined && a.form.rowsKey === undefined) {
    return { hull: result['hull'], caution: CAUTION, units: options.units, fields, rows: tableRows(a).map((r) => pick(r, columns)) };
  }
  const out: Record<string, unknown> = { ...result };
  if (options.fields !== undefined && a.form.rowsKey !== undefined) {
    const rows = result[a.form.rowsKey];
    if (Array.isArray(rows)) out[a.form.rowsKey] = (rows as Row[]).map((r) => pick(r, columns));
  }
  return meta ? { ...out, units: options.units, fields } : out;
}

/** A cell of the CSV: a number as written by rounding, text made formula-safe, empty where not given. */
function csvCell(v: unknown): string | number {
  if (typeof v === 'number') return Number.isFinite(v) ? v : '';
  if (typeof v === 'string') return csvSafeText(v);
  if (typeof v === 'boolean') return v ? 'true' : 'false';
  return '';
}

/**
 * The CSV of an answer: the caution and the lines as leading `#` lines, the header, the
 * rows; or with a plain header, the header first, the rows, then the lines and the
 * caution last (for a spreadsheet's web query, which takes the first row as the header).
 */
export function answerCsv<R>(a: ShapedAnswer<R>): string {
  const { columns, options } = a.ctx;
  const lines = [...a.form.lines(a.result, a.ctx), ...(a.form.notes?.(a.result, a.ctx) ?? [])];
  const data = tableRows(a).map((r) => columns.map((c) => csvCell(r[c.key])));
  const table = Papa.unparse({ fields: columns.map((c) => csvHeader(c.key, c.unit)), data }, { newline: '\r\n' }) + '\r\n';
  if (!options.plainHeader) return csvPreamble(lines) + table;
  return table + [...lines.map(csvCommentLine), `# ${CAUTION}`].join('\r\n') + '\r\n';
}

/** The text of an answer: the form's own, or the aligned table under its lines with its notes. */
export function answerText<R>(a: ShapedAnswer<R>): string {
  const own = a.form.text?.(a.result, a.ctx);
  if (own !== undefined) return own;
  const rows = tableRows(a);
  const columns = a.ctx.columns.map((c) => ({
    label: c.label,
    unit: c.unit,
    cells: rows.map((r) => {
      const v = r[c.key];
      return typeof v === 'number' ? textCell(v, c.unit) : v === null || v === undefined ? '-' : String(v);
    }),
  }));
  return alignedTable(a.form.lines(a.result, a.ctx), columns, rows.length, a.form.notes?.(a.result, a.ctx) ?? []);
}

/**
 * The one value of an answer whose `fields` name one column, from its first row, as text
 * (for a spreadsheet cell); empty where the value is not given (a coefficient that cannot
 * be formed).
 */
export function answerValue<R>(a: ShapedAnswer<R>): string {
  const col = a.ctx.columns[0];
  const row = tableRows(a)[0];
  const v = col === undefined || row === undefined ? undefined : row[col.key];
  return typeof v === 'number' && Number.isFinite(v) ? String(v) : '';
}

/** The forms an answer can be written in. */
export type AnswerFormat = 'json' | 'csv' | 'table';

/** Shape and write an answer in one step. JSON is compact unless `pretty`. */
export function writeAnswer<R>(form: AnswerForm<R>, result: R, format: AnswerFormat, options: OutputOptions, conv: Converter, pretty = false): string {
  const a = shapeAnswer(form, result, options, conv);
  if (format === 'csv') return answerCsv(a);
  if (format === 'table') return answerText(a);
  const value = answerJson(a);
  return pretty ? `${JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n` : JSON.stringify(value);
}
