/**
 * The hydrostatic table at a held trim, or at the drafts that float a list of
 * displacements, as answers (core/report/answerForm.ts): the rows of the upright table
 * with the drafts at the perpendiculars and the trim beside the draft, and lines that say
 * what `draft` means (the draft amidships) and at what trim the table is.
 */
import type { HullModel } from '../hull/hullModel.js';
import type { TrimmedRow } from '../stability/trimmedHydrostatics.js';
import { HYDROSTATIC_FIELDS } from '../upright/hydrostaticFields.js';
import type { AnswerForm, FormContext, TableColumn } from './answerForm.js';
import { hydrostaticResult, tableLines, type HydrostaticResult } from './formatHydrostatics.js';
import { HULL_UNITS } from './resultParts.js';
import { SI_CONVERTER, type Converter, type UnitTree } from './unitConversion.js';

/** The columns beside the draft in a trimmed table. */
export const TRIM_COLUMNS: readonly TableColumn[] = [
  { key: 'draftAft', unit: 'm', label: 'T aft' },
  { key: 'draftFwd', unit: 'm', label: 'T fwd' },
  { key: 'trim', unit: 'm', label: 'Trim' },
];

export interface TrimmedTableResult extends HydrostaticResult {
  /** The trim held, m (draft aft - draft forward; positive by the stern). */
  trim: number;
  /** The displacements asked for, t, when the drafts were found from them. */
  displacements: number[] | null;
  rows: TrimmedRow[];
}

/** The result of a table at `trim` (m); `displacements` when its drafts float them. */
export function trimmedTableResult(hull: HullModel, density: number, rows: TrimmedRow[], trim: number, displacements: number[] | null, conv: Converter = SI_CONVERTER): TrimmedTableResult {
  return { ...hydrostaticResult(hull, density, rows, conv), trim, displacements, rows };
}

const ROW_UNITS: Record<string, UnitTree> = Object.fromEntries([...HYDROSTATIC_FIELDS, ...TRIM_COLUMNS].map((f) => [f.key, f.unit]));

function trimmedLines(r: TrimmedTableResult, ctx: FormContext): string[] {
  const u = ctx.u('m');
  const lines = tableLines(r, ctx);
  const mid = ctx.n((r.hull.ap + r.hull.fp) / 2);
  lines.push(
    r.trim === 0
      ? 'level trim'
      : `trim ${ctx.n(Math.abs(r.trim))} ${u} by the ${r.trim > 0 ? 'stern' : 'head'} (draft aft - draft forward = ${ctx.n(r.trim)} ${u}); draft is the draft amidships (x = ${mid} ${u}) and draftAft and draftFwd are at the perpendiculars`,
  );
  if (r.displacements !== null) lines.push(`drafts found for the displacements asked for (${ctx.u('t')}), one row each, in their order`);
  return lines;
}

/** The form of a table at a trim or for displacements: the trim's columns after the draft. */
export const TRIMMED_FORM: AnswerForm<TrimmedTableResult> = {
  units: { hull: HULL_UNITS, trim: 'm', displacements: ['t'], rows: [ROW_UNITS] },
  columns: [HYDROSTATIC_FIELDS[0]!, ...TRIM_COLUMNS, ...HYDROSTATIC_FIELDS.slice(1)],
  rowsKey: 'rows',
  lines: trimmedLines,
  notes: (r) => r.notes,
};
