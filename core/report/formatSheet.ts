/**
 * The calculation sheet in its three output forms. JSON holds everything, each station
 * with its vertical sheet; CSV holds the longitudinal sheet with a line of sums, the
 * spacing, common factor and results as leading comment lines; the text form sets out
 * both sheets as a hand calculation is, with the formula beside each result. Every form
 * carries the caution.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import type { CalculationSheet, SheetResults, SheetStation, SheetTotals } from '../upright/calculationSheet.js';
import { csvHeader, csvPreamble, hullSummary, type HullSummary } from './formatHydrostatics.js';
import type { HullModel } from '../hull/hullModel.js';
import { multiplierText } from './multiplierText.js';
import type { VerticalSheet } from '../upright/verticalSheet.js';

/** The product columns of the longitudinal sheet, declared once for the CSV and the text table. */
export const SHEET_COLUMNS = [
  { key: 'kind', unit: '', label: 'line' },
  { key: 'x', unit: 'm', label: 'x' },
  { key: 'lever', unit: 'm', label: 'lever' },
  { key: 'halfBreadth', unit: 'm', label: 'y' },
  { key: 'area', unit: 'm2', label: 'A' },
  { key: 'momentZ', unit: 'm3', label: 'Mz' },
  { key: 'multiplier', unit: '-', label: 'SM' },
  { key: 'areaSM', unit: 'm2', label: 'A.SM' },
  { key: 'areaSMLever', unit: 'm3', label: 'A.SM.lever' },
  { key: 'momentZSM', unit: 'm3', label: 'Mz.SM' },
  { key: 'ySM', unit: 'm', label: 'y.SM' },
  { key: 'ySMLever', unit: 'm2', label: 'y.SM.lever' },
  { key: 'ySMLever2', unit: 'm3', label: 'y.SM.lever2' },
  { key: 'y3SM', unit: 'm3', label: 'y3.SM' },
] as const satisfies readonly { key: keyof SheetStation; unit: string; label: string }[];

/** The numeric columns: all but the line's kind. */
type NumericColumn = Exclude<(typeof SHEET_COLUMNS)[number]['key'], 'kind'>;
const isNumeric = (key: (typeof SHEET_COLUMNS)[number]['key']): key is NumericColumn => key !== 'kind';

/** The results with their units and the formula that gives each from the sums. */
export const SHEET_RESULTS = [
  { key: 'volume', unit: 'm3', formula: 'h/3 x sum(A.SM)' },
  { key: 'displacement', unit: 't', formula: 'density x volume' },
  { key: 'lcb', unit: 'm', formula: 'amidships + sum(A.SM.lever) / sum(A.SM)' },
  { key: 'vcb', unit: 'm', formula: 'sum(Mz.SM) / sum(A.SM)' },
  { key: 'waterplaneArea', unit: 'm2', formula: '2 x h/3 x sum(y.SM)' },
  { key: 'lcf', unit: 'm', formula: 'amidships + sum(y.SM.lever) / sum(y.SM)' },
  { key: 'iT', unit: 'm4', formula: '2/3 x h/3 x sum(y3.SM)' },
  { key: 'iL', unit: 'm4', formula: '2 x h/3 x sum(y.SM.lever2) - Aw x (LCF - amidships)^2' },
  { key: 'bmt', unit: 'm', formula: 'iT / volume' },
  { key: 'bml', unit: 'm', formula: 'iL / volume' },
  { key: 'kmt', unit: 'm', formula: 'vcb + bmt' },
  { key: 'kml', unit: 'm', formula: 'vcb + bml' },
  { key: 'tpc', unit: 't/cm', formula: 'density x Aw / 100' },
  { key: 'mct1cm', unit: 't.m/cm', formula: 'displacement x bml / (100 x LBP)' },
] as const satisfies readonly { key: keyof SheetResults; unit: string; formula: string }[];

export interface SheetStationResult extends SheetStation {
  /** The multiplier as the trade writes it (1, 4, 1 1/2 ...). */
  readonly multiplierText: string;
  /** The station's vertical sheet; null on an end or middle line. */
  readonly vertical: VerticalSheetResult | null;
}

export interface VerticalSheetResult extends Omit<VerticalSheet, 'ordinates'> {
  readonly ordinates: readonly (VerticalSheet['ordinates'][number] & { readonly multiplierText: string | null })[];
}

export interface SheetResult {
  readonly hull: HullSummary;
  readonly draft: number;
  readonly density: number;
  readonly spacing: number;
  readonly commonFactor: number;
  readonly amidships: number;
  readonly caution: string;
  readonly stations: readonly SheetStationResult[];
  readonly pieces: CalculationSheet['pieces'];
  readonly ends: readonly string[];
  readonly totals: SheetTotals;
  readonly results: SheetResults;
}

/** The JSON shape of a sheet: each station carries its vertical sheet. */
export function sheetResult(hull: HullModel, sheet: CalculationSheet): SheetResult {
  return {
    hull: hullSummary(hull),
    draft: sheet.draft,
    density: sheet.density,
    spacing: sheet.spacing,
    commonFactor: sheet.commonFactor,
    amidships: sheet.amidships,
    caution: CAUTION,
    stations: sheet.stations.map((s, i) => {
      const v = sheet.verticals[i] ?? null;
      return {
        ...s,
        multiplierText: multiplierText(s.multiplier),
        vertical: v === null ? null : { ...v, ordinates: v.ordinates.map((o) => ({ ...o, multiplierText: o.multiplier === null ? null : multiplierText(o.multiplier) })) },
      };
    }),
    pieces: sheet.pieces,
    ends: sheet.ends,
    totals: sheet.totals,
    results: sheet.results,
  };
}

/** Shortest text of a number to 10 significant digits (for comment lines). */
const num = (v: number): string => (Number.isFinite(v) ? String(Number(v.toPrecision(10))) : '-');

/** The pieces of the integration and the ends of the waterline, in words. */
function pieceLines(r: SheetResult): string[] {
  return [
    ...r.ends,
    ...r.pieces.map((pc) => `x = ${num(pc.from)} to ${num(pc.to)} m: ${pc.rule}`),
  ];
}

function resultLines(r: SheetResult): string[] {
  return SHEET_RESULTS.map((f) => `${f.key} = ${f.formula} = ${num(r.results[f.key])} ${f.unit}`);
}

/** The longitudinal sheet as CSV: caution and particulars as `#` lines, one row per station, a row of sums. */
export function sheetCsv(r: SheetResult): string {
  const header = SHEET_COLUMNS.map((c) => csvHeader(c.key, c.unit));
  const data: (string | number)[][] = r.stations.map((s) => SHEET_COLUMNS.map((c) => s[c.key]));
  data.push(SHEET_COLUMNS.map((c, k) => (k === 0 ? 'sum' : c.key in r.totals ? r.totals[c.key as keyof SheetTotals] : '')));
  const preamble = csvPreamble([
    `hull: ${r.hull.name}`,
    `draft: ${r.draft} m; density: ${r.density} t/m3`,
    `h = ${num(r.spacing)} m (the most common station interval); h/3 = ${num(r.commonFactor)} m; amidships = ${num(r.amidships)} m (levers are x - amidships)`,
    ...pieceLines(r),
    ...resultLines(r),
    'the vertical sheet of each station is in the table and json forms',
  ]);
  return preamble + Papa.unparse({ fields: header, data }, { newline: '\r\n' }) + '\r\n';
}

/** Right-aligned columns: every row the same number of cells. */
function alignRows(rows: readonly (readonly string[])[]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((c, k) => (widths[k] = Math.max(widths[k] ?? 0, c.length)));
  return rows.map((row) => row.map((c, k) => c.padStart(widths[k]!)).join('  '));
}

const f4 = (v: number): string => (Number.isFinite(v) ? v.toFixed(4) : '-');

function verticalText(x: number, v: VerticalSheetResult | null): string[] {
  if (v === null) return [];
  const head = `Station x = ${num(x)} m, keel z = ${num(v.keel)} m`;
  if (!v.immersed) return [head, `  ${v.lastPart}`];
  const rows = [
    ['z m', 'y m', 'SM', 'y.SM m'],
    ...v.ordinates.map((o) => [`${f4(o.z)}${o.aboveDraft ? '*' : ''}`, f4(o.halfBreadth), o.multiplierText ?? 'curve', o.product === null ? '-' : f4(o.product)]),
    ['sum', '', '', f4(v.sum)],
  ];
  const lines = [head, `  h = ${num(v.spacing)} m, h/3 = ${num(v.commonFactor)} m`, ...alignRows(rows).map((l) => `  ${l}`)];
  for (const c of v.curveParts) lines.push(`  from z = ${num(c.zFrom)} to ${num(c.zTo)} m along the fitted curve: ${f4(c.area)} m2 one side`);
  lines.push(`  area = 2 x (h/3 x sum${v.curveParts.length > 0 ? ' + curve parts' : ''}) = ${f4(v.area)} m2 (section: ${f4(v.sectionArea)} m2)`);
  lines.push(`  ${v.lastPart}${v.cutPanel !== null ? ' (marked *)' : ''}`);
  return lines;
}

/** Both sheets as text for the terminal, the formula beside each result. */
export function sheetText(r: SheetResult): string {
  const rows = [
    SHEET_COLUMNS.map((c) => c.label),
    SHEET_COLUMNS.map((c) => (c.unit === '-' ? '' : c.unit)),
    ...r.stations.map((s) => SHEET_COLUMNS.map((c) => (c.key === 'multiplier' ? s.multiplierText : isNumeric(c.key) ? f4(s[c.key]) : s.kind))),
    SHEET_COLUMNS.map((c, k) => (k === 0 ? 'sum' : c.key in r.totals ? f4(r.totals[c.key as keyof SheetTotals]) : '')),
  ];
  const notes = r.stations.filter((s) => s.note !== null).map((s) => `${s.kind} line at x = ${num(s.x)} m: ${s.note}`);
  const lines = [
    `${r.hull.name}: calculation sheet at draft ${r.draft} m, density ${r.density} t/m3`,
    `h = ${num(r.spacing)} m (the most common station interval), h/3 = ${num(r.commonFactor)} m; levers from amidships x = ${num(r.amidships)} m`,
    '',
    ...alignRows(rows),
    '',
    ...notes,
    ...pieceLines(r),
    '',
    ...resultLines(r),
    '',
    'Vertical sheets (area of each section below the waterline; y is the half-breadth):',
    ...r.stations.flatMap((s) => (s.vertical === null ? [] : ['', ...verticalText(s.x, s.vertical)])),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}
