/**
 * The sectional-area curve in its three output forms. The text form draws each
 * ordinate as a bar and marks the LCB between the stations it lies between; the CSV
 * gives the volume, LCB and midship area as leading comment lines. Every form carries
 * the caution.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import { csvPreamble, hullSummary, type HullSummary } from './formatHydrostatics.js';
import type { HullModel } from '../hull/hullModel.js';
import type { SectionalAreaCurve } from '../upright/sectionalAreaCurve.js';

export interface AreasResult extends SectionalAreaCurve {
  readonly hull: HullSummary;
  readonly caution: string;
}

export function areasResult(hull: HullModel, curve: SectionalAreaCurve): AreasResult {
  return { hull: hullSummary(hull), caution: CAUTION, ...curve };
}

const num = (v: number): string => (Number.isFinite(v) ? String(Number(v.toPrecision(10))) : '-');

function summaryLines(r: AreasResult): string[] {
  return [
    `draft: ${r.draft} m`,
    `volume (area under the curve): ${num(r.volume)} m3`,
    `lcb (its centroid): x = ${num(r.lcb)} m (amidships x = ${num(r.amidships)} m)`,
    `am (area at amidships): ${num(r.am)} m2; lwl ${num(r.lwl)} m; cp ${num(r.cp)}`,
  ];
}

export function areasCsv(r: AreasResult): string {
  const data = r.stations.map((s) => [s.x, s.area, Number.isFinite(s.fraction) ? s.fraction : '']);
  const preamble = csvPreamble([`hull: ${r.hull.name}`, 'sectional areas (both sides) against x', ...summaryLines(r)]);
  return preamble + Papa.unparse({ fields: ['x_m', 'area_m2', 'fraction_of_am'], data }, { newline: '\r\n' }) + '\r\n';
}

const BAR = 40;

export function areasText(r: AreasResult): string {
  const top = Math.max(...r.stations.map((s) => s.area), 0);
  const rows: string[][] = [['x m', 'area m2', 'A/Am', '']];
  let marked = false;
  const lcbRow = (): string[] => [`${r.lcb.toFixed(3)}`, '', '', '<-- LCB (centroid of the area under the curve)'];
  for (const s of r.stations) {
    if (!marked && r.lcb < s.x) {
      rows.push(lcbRow());
      marked = true;
    }
    const bar = top > 0 ? '#'.repeat(Math.round((s.area / top) * BAR)) : '';
    rows.push([s.x.toFixed(3), s.area.toFixed(4), Number.isFinite(s.fraction) ? s.fraction.toFixed(4) : '-', bar]);
  }
  if (!marked) rows.push(lcbRow());
  const widths = [0, 1, 2].map((k) => Math.max(...rows.map((row) => row[k]!.length)));
  const lines = [
    `${r.hull.name}: sectional areas at draft ${r.draft} m`,
    ...rows.map((row) => [...row.slice(0, 3).map((c, k) => c.padStart(widths[k]!)), row[3]].join('  ').trimEnd()),
    '',
    ...summaryLines(r),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}
