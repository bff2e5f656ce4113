/**
 * The calculation sheet as an answer (core/report/answerForm.ts). JSON holds everything,
 * each line with its vertical sheet; the table (CSV) is the longitudinal sheet with a
 * line of sums, the spacing, common factor, pieces and results (each with its formula
 * and the numbers put in it) as the lines above it; the text form sets out both sheets
 * as a hand calculation is. Lines are numbered in station spaces from the AP as the
 * trade numbers stations (0, 1/2, 1, ...), and with levers in station spaces the
 * results show the final multiplication by h and h². Every form carries the caution.
 */
import { CAUTION } from '../common/caution.js';
import type { CalculationSheet, LeverUnit, SheetResults, SheetStation, SheetTotals } from '../upright/calculationSheet.js';
import type { HullModel } from '../hull/hullModel.js';
import type { VerticalSheet } from '../upright/verticalSheet.js';
import { writeAnswer, type AnswerForm, type FormContext, type Row, type TableColumn } from './answerForm.js';
import { multiplierText } from './multiplierText.js';
import { DEFAULT_OUTPUT } from './outputOptions.js';
import { datumLine, HULL_UNITS, hullSummary, type HullSummary } from './resultParts.js';
import { SI_CONVERTER, type UnitTree } from './unitConversion.js';

/** The unit of a lever in station spaces (a count of h), for headers and the units line. */
export const STATION_SPACES = 'sp';

/** The columns of the longitudinal sheet; the lever products' units follow the levers'. */
export function sheetColumns(levers: LeverUnit): readonly TableColumn[] {
  const st = levers === 'stations';
  return [
    { key: 'kind', unit: '', label: 'line' },
    { key: 'station', unit: '-', label: 'St.' },
    { key: 'x', unit: 'm', label: 'x' },
    { key: 'lever', unit: st ? STATION_SPACES : 'm', label: 'lever' },
    { key: 'halfBreadth', unit: 'm', label: 'y' },
    { key: 'area', unit: 'm2', label: 'A' },
    { key: 'momentZ', unit: 'm3', label: 'Mz' },
    { key: 'multiplier', unit: '-', label: 'SM' },
    { key: 'areaSM', unit: 'm2', label: 'A.SM' },
    { key: 'areaSMLever', unit: st ? 'm2' : 'm3', label: 'A.SM.lever' },
    { key: 'momentZSM', unit: 'm3', label: 'Mz.SM' },
    { key: 'ySM', unit: 'm', label: 'y.SM' },
    { key: 'ySMLever', unit: st ? 'm' : 'm2', label: 'y.SM.lever' },
    { key: 'ySMLever2', unit: st ? 'm' : 'm3', label: 'y.SM.lever2' },
    { key: 'y3SM', unit: 'm3', label: 'y3.SM' },
  ];
}

/** The results with their units and the formula that gives each from the sums (levers in metres). */
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
  /** The station number as the trade writes it (0, 1/2, 9 1/2, or a decimal). */
  readonly stationText: string;
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
  /** Metres, or station spaces. */
  readonly levers: LeverUnit;
  readonly caution: string;
  readonly stations: readonly SheetStationResult[];
  readonly pieces: CalculationSheet['pieces'];
  readonly ends: readonly string[];
  readonly totals: SheetTotals;
  readonly results: SheetResults;
}

/** The JSON shape of a sheet: each line carries its vertical sheet. */
export function sheetResult(hull: HullModel, sheet: CalculationSheet): SheetResult {
  return {
    hull: hullSummary(hull),
    draft: sheet.draft,
    density: sheet.density,
    spacing: sheet.spacing,
    commonFactor: sheet.commonFactor,
    amidships: sheet.amidships,
    levers: sheet.levers,
    caution: CAUTION,
    stations: sheet.stations.map((s, i) => {
      const v = sheet.verticals[i] ?? null;
      return {
        ...s,
        stationText: multiplierText(s.station),
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

const VERTICAL_UNITS: UnitTree = {
  draft: 'm',
  keel: 'm',
  spacing: 'm',
  commonFactor: 'm',
  ordinates: [{ z: 'm', halfBreadth: 'm', product: 'm' }],
  sum: 'm',
  curveParts: [{ zFrom: 'm', zTo: 'm', area: 'm2' }],
  cutPanel: { heights: ['m'], from: 'm' },
  waterlineHalfBreadth: 'm',
  area: 'm2',
  sectionArea: 'm2',
};

/** The pieces of the integration and the ends of the waterline, in words. */
function pieceLines(r: SheetResult, ctx: FormContext): string[] {
  return [...r.ends, ...r.pieces.map((pc) => `x = ${ctx.n(pc.from)} to ${ctx.n(pc.to)} ${ctx.u('m')}: ${pc.rule}`)];
}

/** Each result with its formula and the sums put into it, in the answer's units. */
function resultLines(r: SheetResult, ctx: FormContext): string[] {
  const { n, u, conv } = ctx;
  const st = r.levers === 'stations';
  const t = r.totals;
  const res = r.results as unknown as Record<string, number>;
  const get = (key: string, unit: string): number => res[conv.key(key, unit)]!;
  const h3 = n(r.commonFactor);
  const h = st ? `h x ` : '';
  const hv = st ? `${n(r.spacing)} x ` : '';
  const h2 = st ? 'h^2 x ' : '';
  const h2v = st ? `${n(r.spacing)}^2 x ` : '';
  const xm = n(r.amidships);
  const imperial = conv.system === 'imperial';
  // Cubic feet of water per long ton, from the converter's own factors (volume ft3 / displacement LT).
  const k = conv.unit('m3').factor / (r.density * conv.unit('t').factor);
  const lbp = n(r.hull.lbp);
  const line = (key: string, unit: string, formula: string, working: string): string =>
    `${conv.key(key, unit)} = ${formula} = ${working} = ${n(get(key, unit))} ${u(unit) === '-' ? '' : u(unit)}`.trimEnd();
  return [
    line('volume', 'm3', 'h/3 x sum(A.SM)', `${h3} x ${n(t.areaSM)}`),
    imperial
      ? line('displacement', 't', 'volume / (ft3 of water per long ton)', `${n(get('volume', 'm3'))} / ${n(k)}`)
      : line('displacement', 't', 'density x volume', `${n(r.density)} x ${n(get('volume', 'm3'))}`),
    line('lcb', 'm', `amidships + ${h}sum(A.SM.lever) / sum(A.SM)`, `${xm} + ${hv}${n(t.areaSMLever)} / ${n(t.areaSM)}`),
    line('vcb', 'm', 'sum(Mz.SM) / sum(A.SM)', `${n(t.momentZSM)} / ${n(t.areaSM)}`),
    line('waterplaneArea', 'm2', '2 x h/3 x sum(y.SM)', `2 x ${h3} x ${n(t.ySM)}`),
    line('lcf', 'm', `amidships + ${h}sum(y.SM.lever) / sum(y.SM)`, `${xm} + ${hv}${n(t.ySMLever)} / ${n(t.ySM)}`),
    line('iT', 'm4', '2/3 x h/3 x sum(y3.SM)', `2/3 x ${h3} x ${n(t.y3SM)}`),
    line(
      'iL',
      'm4',
      `2 x h/3 x ${h2}sum(y.SM.lever2) - Aw x (LCF - amidships)^2`,
      `2 x ${h3} x ${h2v}${n(t.ySMLever2)} - ${n(get('waterplaneArea', 'm2'))} x (${n(get('lcf', 'm'))} - ${xm})^2`,
    ),
    line('bmt', 'm', 'iT / volume', `${n(get('iT', 'm4'))} / ${n(get('volume', 'm3'))}`),
    line('bml', 'm', 'iL / volume', `${n(get('iL', 'm4'))} / ${n(get('volume', 'm3'))}`),
    line('kmt', 'm', 'vcb + bmt', `${n(get('vcb', 'm'))} + ${n(get('bmt', 'm'))}`),
    line('kml', 'm', 'vcb + bml', `${n(get('vcb', 'm'))} + ${n(get('bml', 'm'))}`),
    imperial
      ? line('tpc', 't/cm', 'Aw / (12 x ft3 of water per long ton)', `${n(get('waterplaneArea', 'm2'))} / (12 x ${n(k)})`)
      : line('tpc', 't/cm', 'density x Aw / 100', `${n(r.density)} x ${n(get('waterplaneArea', 'm2'))} / 100`),
    imperial
      ? line('mct1cm', 't.m/cm', 'displacement x bml / (12 x LBP)', `${n(get('displacement', 't'))} x ${n(get('bml', 'm'))} / (12 x ${lbp})`)
      : line('mct1cm', 't.m/cm', 'displacement x bml / (100 x LBP)', `${n(get('displacement', 't'))} x ${n(get('bml', 'm'))} / (100 x ${lbp})`),
  ];
}

/** h, h/3, the origin of the levers and of the station numbers, in words. */
function spacingLine(r: SheetResult, ctx: FormContext): string {
  const m = ctx.u('m');
  const levers = r.levers === 'stations' ? `levers in station spaces: (x - amidships) / h` : `levers: x - amidships in ${m}`;
  return `h = ${ctx.n(r.spacing)} ${m} (the most common station interval); h/3 = ${ctx.n(r.commonFactor)} ${m}; amidships = ${ctx.n(r.amidships)} ${m}; ${levers}; stations numbered (x - AP) / h from the AP at x = ${ctx.n(r.hull.ap)} ${m}`;
}

function sumRow(r: SheetResult): Row {
  return { kind: 'sum', ...r.totals };
}

/** Right-aligned columns: every row the same number of cells. */
function alignRows(rows: readonly (readonly string[])[]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((c, k) => (widths[k] = Math.max(widths[k] ?? 0, c.length)));
  return rows.map((row) => row.map((c, k) => c.padStart(widths[k]!)).join('  '));
}

const f4 = (v: number): string => (Number.isFinite(v) ? v.toFixed(4) : '-');

function verticalText(s: SheetStationResult, v: VerticalSheetResult, ctx: FormContext): string[] {
  const [m, m2] = [ctx.u('m'), ctx.u('m2')];
  const head = `Station ${s.stationText} (x = ${ctx.n(s.x)} ${m}), keel z = ${ctx.n(v.keel)} ${m}`;
  if (!v.immersed) return [head, `  ${v.lastPart}`];
  const rows = [
    [`z ${m}`, `y ${m}`, 'SM', `y.SM ${m}`],
    ...v.ordinates.map((o) => [`${f4(o.z)}${o.aboveDraft ? '*' : ''}`, f4(o.halfBreadth), o.multiplierText ?? 'curve', o.product === null ? '-' : f4(o.product)]),
    ['sum', '', '', f4(v.sum)],
  ];
  const lines = [head, `  h = ${ctx.n(v.spacing)} ${m}, h/3 = ${ctx.n(v.commonFactor)} ${m}`, ...alignRows(rows).map((l) => `  ${l}`)];
  for (const c of v.curveParts) lines.push(`  from z = ${ctx.n(c.zFrom)} to ${ctx.n(c.zTo)} ${m} along the fitted curve: ${f4(c.area)} ${m2} one side`);
  lines.push(`  area = 2 x (h/3 x sum${v.curveParts.length > 0 ? ' + curve parts' : ''}) = ${f4(v.area)} ${m2} (section: ${f4(v.sectionArea)} ${m2})`);
  lines.push(`  ${v.lastPart}${v.cutPanel !== null ? ' (marked *)' : ''}`);
  return lines;
}

/** Both sheets as text for the terminal, the formula and working beside each result; the aligned table alone when fields are chosen. */
function sheetText_(r: SheetResult, ctx: FormContext): string | undefined {
  if (ctx.options.fields !== undefined) return undefined;
  const columns = ctx.columns;
  const cell = (s: Row, key: string): string => {
    const v = s[key];
    if (key === 'multiplier' && typeof s['multiplierText'] === 'string') return s['multiplierText'];
    if (key === 'station' && typeof s['stationText'] === 'string') return s['stationText'];
    return typeof v === 'number' ? f4(v) : typeof v === 'string' ? v : '';
  };
  const rows = [
    columns.map((c) => c.label),
    columns.map((c) => (c.unit === '-' ? '' : c.unit)),
    ...r.stations.map((s) => columns.map((c) => cell(s as unknown as Row, c.key))),
    columns.map((c) => (c.key === 'kind' ? 'sum' : c.key in r.totals ? f4(r.totals[c.key as keyof SheetTotals]) : '')),
  ];
  const notes = r.stations.filter((s) => s.note !== null).map((s) => `${s.kind} line at station ${s.stationText} (x = ${ctx.n(s.x)} ${ctx.u('m')}): ${s.note}`);
  const lines = [
    `${r.hull.name}: calculation sheet at draft ${ctx.n(r.draft)} ${ctx.u('m')}, density ${r.density} t/m3`,
    spacingLine(r, ctx),
    datumLine(r.hull, ctx.n, ctx.u('m')),
    '',
    ...alignRows(rows),
    '',
    ...notes,
    ...pieceLines(r, ctx),
    '',
    ...resultLines(r, ctx),
    '',
    'Vertical sheets (area of each section below the waterline; y is the half-breadth):',
    ...r.stations.flatMap((s) => (s.vertical === null ? [] : ['', ...verticalText(s, s.vertical, ctx)])),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}

/** The sheet's answer form, for levers in metres or in station spaces. */
export function sheetForm(levers: LeverUnit): AnswerForm<SheetResult> {
  const columns = sheetColumns(levers);
  const unitOf = (key: string): string => columns.find((c) => c.key === key)!.unit;
  const products = ['areaSM', 'areaSMLever', 'momentZSM', 'ySM', 'ySMLever', 'ySMLever2', 'y3SM'];
  const line: Record<string, UnitTree> = Object.fromEntries(columns.filter((c) => c.unit !== '').map((c) => [c.key, c.unit]));
  return {
    units: {
      hull: HULL_UNITS,
      draft: 'm',
      spacing: 'm',
      commonFactor: 'm',
      amidships: 'm',
      stations: [{ ...line, vertical: VERTICAL_UNITS }],
      pieces: [{ from: 'm', to: 'm' }],
      totals: Object.fromEntries(products.map((k) => [k, unitOf(k)])),
      results: Object.fromEntries(SHEET_RESULTS.map((f) => [f.key, f.unit])),
    },
    columns,
    rowsKey: 'stations',
    rows: (r) => [...(r.stations as unknown as Row[]), sumRow(r)],
    lines: (r, ctx) => [
      `hull: ${r.hull.name}`,
      `draft: ${ctx.n(r.draft)} ${ctx.u('m')}; density: ${r.density} t/m3`,
      spacingLine(r, ctx),
      datumLine(r.hull, ctx.n, ctx.u('m')),
      ...pieceLines(r, ctx),
      ...resultLines(r, ctx),
      'the vertical sheet of each station is in the table and json forms',
    ],
    text: sheetText_,
  };
}

/** The sheet as CSV in SI with every column. */
export function sheetCsv(r: SheetResult): string {
  return writeAnswer(sheetForm(r.levers), r, 'csv', DEFAULT_OUTPUT, SI_CONVERTER);
}

/** The sheet as text for the terminal. */
export function sheetText(r: SheetResult): string {
  return writeAnswer(sheetForm(r.levers), r, 'table', DEFAULT_OUTPUT, SI_CONVERTER);
}
