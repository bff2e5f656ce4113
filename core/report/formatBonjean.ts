/**
 * Bonjean data in its three output forms: JSON (each station with its points), CSV in
 * long form (one row per station and height) and a text table of areas, stations down
 * and heights across, blank where a height is outside a station. Every form carries the
 * caution.
 */
import Papa from 'papaparse';
import type { BonjeanStation } from '../upright/bonjean.js';
import { CAUTION } from '../common/caution.js';
import { csvPreamble, hullSummary, type HullSummary } from './formatHydrostatics.js';
import type { HullModel } from '../hull/hullModel.js';

export interface BonjeanResult {
  readonly hull: HullSummary;
  readonly caution: string;
  readonly stations: readonly BonjeanStation[];
}

export function bonjeanResult(hull: HullModel, stations: readonly BonjeanStation[]): BonjeanResult {
  return { hull: hullSummary(hull), caution: CAUTION, stations };
}

export function bonjeanCsv(r: BonjeanResult): string {
  const data = r.stations.flatMap((s) => s.points.map((q) => [s.x, q.z, q.area, q.momentZ]));
  const preamble = csvPreamble([`hull: ${r.hull.name}`, 'Bonjean data: immersed area of each station (both sides) and its moment about the baseline']);
  return preamble + Papa.unparse({ fields: ['x_m', 'z_m', 'area_m2', 'momentZ_m3'], data }, { newline: '\r\n' }) + '\r\n';
}

/** Text table of areas: one row per station, one column per height met by any station. */
export function bonjeanText(r: BonjeanResult): string {
  const heights = [...new Set(r.stations.flatMap((s) => s.points.slice(1).map((q) => q.z)))].sort((a, b) => a - b);
  const head = ['x m', 'keel m', ...heights.map((z) => `z ${z}`)];
  const rows = r.stations.map((s) => {
    const byZ = new Map(s.points.map((q) => [q.z, q.area]));
    return [s.x.toFixed(3), s.keel.toFixed(3), ...heights.map((z) => (byZ.has(z) ? byZ.get(z)!.toFixed(4) : ''))];
  });
  const all = [head, ...rows];
  const widths = head.map((_h, k) => Math.max(...all.map((row) => row[k]!.length)));
  const lines = [
    `${r.hull.name}: Bonjean data, immersed area of each station in m2 (both sides) at each height z (m); blank where the height is outside the station`,
    ...all.map((row) => row.map((c, k) => c.padStart(widths[k]!)).join('  ')),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}
