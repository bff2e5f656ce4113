/**
 * Bonjean data as an answer (core/report/answerForm.ts): JSON with each station and its
 * points; the table in long form (one row per station and height: x, z, area, momentZ)
 * for CSV; a text table of areas, stations down and heights across, blank where a
 * height is outside a station. Every form carries the caution.
 */
import type { BonjeanStation } from '../upright/bonjean.js';
import { CAUTION } from '../common/caution.js';
import type { HullModel } from '../hull/hullModel.js';
import { writeAnswer, type AnswerForm, type FormContext } from './answerForm.js';
import { DEFAULT_OUTPUT } from './outputOptions.js';
import { datumLine, HULL_UNITS, hullSummary, type HullSummary } from './resultParts.js';
import { textCell } from './textTable.js';
import { SI_CONVERTER } from './unitConversion.js';

export interface BonjeanResult {
  readonly hull: HullSummary;
  readonly caution: string;
  readonly stations: readonly BonjeanStation[];
}

export function bonjeanResult(hull: HullModel, stations: readonly BonjeanStation[]): BonjeanResult {
  return { hull: hullSummary(hull), caution: CAUTION, stations };
}

/** Areas across the heights met by any station, stations down; the aligned table of the long form when fields are chosen. */
function matrixText(r: BonjeanResult, ctx: FormContext): string | undefined {
  if (ctx.options.fields !== undefined) return undefined;
  const [m, m2] = [ctx.u('m'), ctx.u('m2')];
  const heights = [...new Set(r.stations.flatMap((s) => s.points.slice(1).map((q) => q.z)))].sort((a, b) => a - b);
  const head = [`x ${m}`, `keel ${m}`, ...heights.map((z) => `z ${ctx.n(z)}`)];
  const rows = r.stations.map((s) => {
    const byZ = new Map(s.points.map((q) => [q.z, q.area]));
    return [textCell(s.x, 'm'), textCell(s.keel, 'm'), ...heights.map((z) => (byZ.has(z) ? byZ.get(z)!.toFixed(4) : ''))];
  });
  const all = [head, ...rows];
  const widths = head.map((_h, k) => Math.max(...all.map((row) => row[k]!.length)));
  const lines = [
    `${r.hull.name}: Bonjean data, immersed area of each station in ${m2} (both sides) at each height z (${m}); blank where the height is outside the station`,
    datumLine(r.hull, ctx.n, m),
    ...all.map((row) => row.map((c, k) => c.padStart(widths[k]!)).join('  ')),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}

/** Bonjean data's answer form. */
export const BONJEAN_FORM: AnswerForm<BonjeanResult> = {
  units: { hull: HULL_UNITS, stations: [{ x: 'm', keel: 'm', deck: 'm', points: [{ z: 'm', area: 'm2', momentZ: 'm3' }] }] },
  columns: [
    { key: 'x', unit: 'm', label: 'x' },
    { key: 'z', unit: 'm', label: 'z' },
    { key: 'area', unit: 'm2', label: 'area' },
    { key: 'momentZ', unit: 'm3', label: 'Mz' },
  ],
  rows: (r) => r.stations.flatMap((s) => s.points.map((q) => ({ x: s.x, z: q.z, area: q.area, momentZ: q.momentZ }))),
  lines: (r, ctx) => [
    `hull: ${r.hull.name}`,
    'Bonjean data: immersed area of each station (both sides) and its moment about the baseline',
    datumLine(r.hull, ctx.n, ctx.u('m')),
  ],
  text: matrixText,
};

export function bonjeanCsv(r: BonjeanResult): string {
  return writeAnswer(BONJEAN_FORM, r, 'csv', DEFAULT_OUTPUT, SI_CONVERTER);
}

export function bonjeanText(r: BonjeanResult): string {
  return writeAnswer(BONJEAN_FORM, r, 'table', DEFAULT_OUTPUT, SI_CONVERTER);
}
