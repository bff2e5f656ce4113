/**
 * The sectional-area curve as an answer (core/report/answerForm.ts): one row per station
 * (x, area, fraction of the midship area), the volume, LCB and midship area as the lines
 * above it. The text form draws each ordinate as a bar and marks the LCB between the
 * stations it lies between. Every form carries the caution.
 */
import { CAUTION } from '../common/caution.js';
import type { HullModel } from '../hull/hullModel.js';
import type { SectionalAreaCurve } from '../upright/sectionalAreaCurve.js';
import { writeAnswer, type AnswerForm, type FormContext } from './answerForm.js';
import { DEFAULT_OUTPUT } from './outputOptions.js';
import { datumLine, HULL_UNITS, hullSummary, type HullSummary } from './resultParts.js';
import { textCell } from './textTable.js';
import { SI_CONVERTER } from './unitConversion.js';

export interface AreasResult extends SectionalAreaCurve {
  readonly hull: HullSummary;
  readonly caution: string;
}

export function areasResult(hull: HullModel, curve: SectionalAreaCurve): AreasResult {
  return { hull: hullSummary(hull), caution: CAUTION, ...curve };
}

function summaryLines(r: AreasResult, ctx: FormContext): string[] {
  const [m, m2, m3] = [ctx.u('m'), ctx.u('m2'), ctx.u('m3')];
  return [
    `draft: ${ctx.n(r.draft)} ${m}`,
    `volume (area under the curve): ${ctx.n(r.volume)} ${m3}`,
    `lcb (its centroid): x = ${ctx.n(r.lcb)} ${m} (amidships x = ${ctx.n(r.amidships)} ${m})`,
    `am (area at amidships): ${ctx.n(r.am)} ${m2}; lwl ${ctx.n(r.lwl)} ${m}; cp ${ctx.n(r.cp)}`,
  ];
}

const BAR = 40;

/** One line per station with a bar for its area, the LCB marked between the stations it lies between. */
function barText(r: AreasResult, ctx: FormContext): string | undefined {
  if (ctx.options.fields !== undefined) return undefined;
  const [m, m2] = [ctx.u('m'), ctx.u('m2')];
  const top = Math.max(...r.stations.map((s) => s.area), 0);
  const rows: string[][] = [[`x ${m}`, `area ${m2}`, 'A/Am', '']];
  let marked = false;
  const lcbRow = (): string[] => [textCell(r.lcb, 'm'), '', '', '<-- LCB (centroid of the area under the curve)'];
  for (const s of r.stations) {
    if (!marked && r.lcb < s.x) {
      rows.push(lcbRow());
      marked = true;
    }
    const bar = top > 0 ? '#'.repeat(Math.round((s.area / top) * BAR)) : '';
    rows.push([textCell(s.x, 'm'), s.area.toFixed(4), Number.isFinite(s.fraction) ? s.fraction.toFixed(4) : '-', bar]);
  }
  if (!marked) rows.push(lcbRow());
  const widths = [0, 1, 2].map((k) => Math.max(...rows.map((row) => row[k]!.length)));
  const lines = [
    `${r.hull.name}: sectional areas at draft ${ctx.n(r.draft)} ${m}`,
    datumLine(r.hull, ctx.n, m),
    ...rows.map((row) => [...row.slice(0, 3).map((c, k) => c.padStart(widths[k]!)), row[3]].join('  ').trimEnd()),
    '',
    ...summaryLines(r, ctx),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}

/** The sectional-area curve's answer form. */
export const AREAS_FORM: AnswerForm<AreasResult> = {
  units: { hull: HULL_UNITS, draft: 'm', stations: [{ x: 'm', area: 'm2', fraction: '-' }], volume: 'm3', lcb: 'm', am: 'm2', amidships: 'm', lwl: 'm', cp: '-' },
  columns: [
    { key: 'x', unit: 'm', label: 'x' },
    { key: 'area', unit: 'm2', label: 'area' },
    { key: 'fraction', unit: '-', label: 'A/Am' },
  ],
  rowsKey: 'stations',
  lines: (r, ctx) => [`hull: ${r.hull.name}`, 'sectional areas (both sides) against x', datumLine(r.hull, ctx.n, ctx.u('m')), ...summaryLines(r, ctx)],
  text: barText,
};

export function areasCsv(r: AreasResult): string {
  return writeAnswer(AREAS_FORM, r, 'csv', DEFAULT_OUTPUT, SI_CONVERTER);
}

export function areasText(r: AreasResult): string {
  return writeAnswer(AREAS_FORM, r, 'table', DEFAULT_OUTPUT, SI_CONVERTER);
}
