/**
 * Writing a hull model as an offsets file (CSV text), the reverse of readOffsetsCsv.
 *
 * The file starts with the caution as a `# Caution: ...` comment, then the metadata
 * (`name`, `units`, and `ap`, `fp` when the hull gives them), then the table. The grid
 * form is chosen when the hull has `waterlines` and every station's points lie on
 * consecutive tabulated heights with no knuckles; otherwise the points form.
 *
 * Numbers are written in the shortest form that reads back to the same double
 * (`String(n)`), so a file in m reads back to the very same hull, and one in mm, ft or
 * in to within a rounding or two of the unit's factor. Feet-inches-eighths are rounded
 * to the nearest sixteenth of an inch, as lofting tables are, and so do not round-trip
 * exactly. A hull written in the points form has no `waterlines` when read back.
 */
import Papa from 'papaparse';
import { CAUTION } from '../common/caution.js';
import { csvSafeText } from '../common/csvSafe.js';
import { fail } from '../common/errors.js';
import { formatFeetInches } from '../common/feetInches.js';
import type { HullModel } from '../hull/hullModel.js';
import type { OffsetsForm } from './readOffsets.js';
import { lengthFactor, type LengthUnit } from '../common/units.js';

export interface WriteOptions {
  /** Unit of the written lengths; m by default. */
  readonly units?: LengthUnit;
  /** Form of the table; by default grid when the hull fits one, else points. */
  readonly form?: OffsetsForm;
}

/**
 * The metadata line of the name, written by csvSafeText (core/common/csvSafe.ts) like
 * every text cell: control characters and line breaks become spaces, and a part a
 * spreadsheet splitting the line could read as a formula (`a,=1+2`) gets an apostrophe.
 */
export function nameLine(name: string): string {
  return csvSafeText(`# name: ${name.trim()}`).trimEnd();
}

/**
 * For each station, the index of the waterline its first point lies on, when the hull
 * fits the grid form; else a sentence saying why it does not.
 */
export function gridStarts(hull: Pick<HullModel, 'waterlines' | 'stations'>): number[] | string {
  const wl = hull.waterlines;
  if (wl === undefined || wl.length === 0) return 'the hull has no waterlines';
  const at = new Map<number, number>();
  for (let k = 0; k < wl.length; k++) {
    if (k > 0 && !(wl[k]! > wl[k - 1]!)) return `waterline ${k + 1} is not above the one before it`;
    at.set(wl[k]!, k);
  }
  const starts: number[] = [];
  for (let i = 0; i < hull.stations.length; i++) {
    const pts = hull.stations[i]!.points;
    const start = pts.length === 0 ? 0 : at.get(pts[0]!.z);
    if (start === undefined) return `station ${i + 1}'s first point is not on a waterline`;
    for (let j = 0; j < pts.length; j++) {
      const p = pts[j]!;
      if (p.knuckle) return `station ${i + 1}, point ${j + 1} is a knuckle, which a grid cannot mark`;
      if (wl[start + j] !== p.z) return `station ${i + 1}, point ${j + 1} is not on the next waterline up`;
    }
    starts.push(start);
  }
  return starts;
}

/** Write a hull (lengths in metres) as offsets CSV text. */
export function writeOffsetsCsv(hull: HullModel, options: WriteOptions = {}): string {
  const units = options.units ?? 'm';
  const f = lengthFactor(units);
  const len = units === 'ft-in-8' ? (v: number): string => formatFeetInches(v / f) : (v: number): string => String(v / f);

  const starts = gridStarts(hull);
  const form: OffsetsForm = options.form ?? (typeof starts === 'string' ? 'points' : 'grid');
  if (form === 'grid' && typeof starts === 'string') {
    fail('HYD_BAD_ARGUMENT', ['form'], `the hull cannot be written as a grid: ${starts}`);
  }

  const head = [`# ${CAUTION}`, nameLine(hull.name), `# units: ${units}`];
  if (hull.ap !== undefined) head.push(`# ap: ${len(hull.ap)}`);
  if (hull.fp !== undefined) head.push(`# fp: ${len(hull.fp)}`);

  const table: string[][] = [];
  if (form === 'grid' && typeof starts !== 'string') {
    const wl = hull.waterlines ?? [];
    table.push(['x', ...wl.map(len)]);
    for (let i = 0; i < hull.stations.length; i++) {
      const st = hull.stations[i]!;
      const row = new Array<string>(wl.length + 1).fill('');
      row[0] = len(st.x);
      for (let j = 0; j < st.points.length; j++) row[starts[i]! + j + 1] = len(st.points[j]!.y);
      // Trailing blanks are left out: a row may be shorter than the header.
      let end = row.length;
      while (end > 1 && row[end - 1] === '') end--;
      table.push(row.slice(0, end));
    }
  } else {
    table.push(['x', 'y', 'z', 'knuckle']);
    for (const st of hull.stations) {
      const x = len(st.x);
      for (const p of st.points) table.push([x, len(p.y), len(p.z), p.knuckle ? '1' : '0']);
    }
  }
  return `${head.join('\n')}\n${Papa.unparse(table, { newline: '\n', quotes: false })}\n`;
}
