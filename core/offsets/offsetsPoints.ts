/**
 * The points form of an offsets file: a header naming `x`, `y`, `z` and optionally
 * `knuckle` in any order, then one row per point. A station is a run of consecutive
 * rows with the same x (compared as numbers: `1.5` and `1.50` are one station).
 * A blank knuckle cell reads as 0.
 */
import type { Issue } from '../common/errors.js';
import type { Point, Station } from '../hull/hullModel.js';
import { LIMITS } from '../common/limits.js';
import { readLength } from './lengthCell.js';
import { csvIssue } from './offsetsIssue.js';
import { cellText, hasCellsBeyond, type BodyRead, type Sheet } from './offsetsSheet.js';

export const POINT_COLUMNS = ['x', 'y', 'z', 'knuckle'] as const;
type PointColumn = (typeof POINT_COLUMNS)[number];

export interface PointColumns {
  readonly x: number;
  readonly y: number;
  readonly z: number;
  /** -1 when the file has no knuckle column. */
  readonly knuckle: number;
}

/** The columns of a points header (names trimmed and lowercased), or the issues that keep it from being read. */
export function readPointsHeader(names: readonly string[], line: number): { columns: PointColumns; issues: Issue[] } {
  const issues: Issue[] = [];
  const at: Record<PointColumn, number> = { x: -1, y: -1, z: -1, knuckle: -1 };
  for (let c = 0; c < names.length; c++) {
    const n = names[c]!;
    if (!(POINT_COLUMNS as readonly string[]).includes(n)) {
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined,
        n === '' ? 'column name is blank; name the columns x, y, z and optionally knuckle'
          : `unknown column '${n}'; the points form names the columns x, y, z and optionally knuckle (a grid header is x, then waterline heights)`));
      continue;
    }
    const k = n as PointColumn;
    if (at[k] >= 0) {
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, `column '${k}' is named twice (first in column ${at[k] + 1})`));
      continue;
    }
    at[k] = c;
  }
  const missing = (['x', 'y', 'z'] as const).filter((k) => at[k] < 0);
  if (missing.length > 0) {
    issues.push(csvIssue('HYD_HEADER', line, undefined, undefined, `the header has no ${missing.join(', ')} column; the points form needs x, y and z`));
  }
  return { columns: at, issues };
}

/** Read the point rows of a points table whose header has been read. */
export function readPointsBody(sheet: Sheet, columns: PointColumns): BodyRead {
  const { rows, rowLines, header, label, unit, factor } = sheet;
  const ncol = header.length;
  const issues: Issue[] = [];
  const stations: Station[] = [];
  const stationRow: number[] = [];
  const pointRow: number[][] = [];
  const tainted = new Set<number>();
  let rowsLeftOut = false;
  const map = { form: 'points', stationRow, pointRow, xCol: columns.x, yCol: columns.y, zCol: columns.z } as const;

  if (rows.length > LIMITS.maxPoints) {
    issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${rows.length} point rows; the limit is ${LIMITS.maxPoints}`));
    return { stations, issues, map, tainted, rowsLeftOut, stopped: true };
  }

  let cur: Point[] | undefined;
  let curRows: number[] = [];
  let curX = Number.NaN;
  let taintNext = false;
  for (let r = 0; r < rows.length; r++) {
    const cells = rows[r]!;
    const line = rowLines[r]!;
    if (cells.length > ncol && hasCellsBeyond(cells, ncol)) {
      issues.push(csvIssue('HYD_ROW_LENGTH', line, ncol + 1, undefined, `the row has ${cells.length} cells but the header has ${ncol}; cells beyond the header must be blank`));
    }
    const xt = cellText(cells, columns.x);
    const xv = xt === '' ? undefined : readLength(xt, unit, sheet.decimalComma);
    if (typeof xv !== 'number') {
      issues.push(csvIssue(xv === undefined ? 'HYD_CELL_NOT_NUMBER' : xv.code, line, columns.x + 1, undefined,
        xv === undefined ? 'x is blank; every point needs x, y and z' : `station x ${xv.why}`));
      rowsLeftOut = true;
      if (cur !== undefined) tainted.add(stations.length - 1);
      taintNext = true;
      continue;
    }
    if (cur === undefined || xv !== curX) {
      if (stations.length === LIMITS.maxStations) {
        issues.push(csvIssue('HYD_TOO_LARGE', line, undefined, undefined, `station ${stations.length + 1} begins here; the limit is ${LIMITS.maxStations} stations`));
        return { stations, issues, map, tainted, rowsLeftOut, stopped: true };
      }
      cur = [];
      curRows = [];
      curX = xv;
      stations.push({ x: xv * factor, points: cur });
      stationRow.push(r);
      pointRow.push(curRows);
      if (taintNext) tainted.add(stations.length - 1);
    }
    taintNext = false;
    const i = stations.length - 1;
    const zt = cellText(cells, columns.z);
    const yt = cellText(cells, columns.y);
    const station = `station x = ${xt}${label}`;
    const zv = zt === '' ? undefined : readLength(zt, unit, sheet.decimalComma);
    const yv = yt === '' ? undefined : readLength(yt, unit, sheet.decimalComma);
    const where = typeof zv === 'number' ? `${station}, point z = ${zt}${label}` : station;
    if (typeof yv !== 'number') {
      issues.push(csvIssue(yv === undefined ? 'HYD_CELL_NOT_NUMBER' : yv.code, line, columns.y + 1, where,
        yv === undefined ? 'half-breadth y is blank; every point needs x, y and z' : `half-breadth ${yv.why}`));
    }
    if (typeof zv !== 'number') {
      issues.push(csvIssue(zv === undefined ? 'HYD_CELL_NOT_NUMBER' : zv.code, line, columns.z + 1, station,
        zv === undefined ? 'z is blank; every point needs x, y and z' : `z ${zv.why}`));
    }
    let knuckle = false;
    if (columns.knuckle >= 0) {
      const kt = cellText(cells, columns.knuckle);
      if (kt === '1') knuckle = true;
      else if (kt !== '0' && kt !== '') {
        issues.push(csvIssue('HYD_KNUCKLE_VALUE', line, columns.knuckle + 1, where, `knuckle '${kt}' must be 0 or 1`));
      }
    }
    if (typeof yv !== 'number' || typeof zv !== 'number') {
      tainted.add(i);
      continue;
    }
    if (cur.length === LIMITS.maxPointsPerStation) {
      issues.push(csvIssue('HYD_TOO_LARGE', line, undefined, station, `the station has more than ${LIMITS.maxPointsPerStation} points, the limit`));
      return { stations, issues, map, tainted, rowsLeftOut, stopped: true };
    }
    cur.push({ y: yv * factor, z: zv * factor, knuckle });
    curRows.push(r);
  }
  return { stations, issues, map, tainted, rowsLeftOut, stopped: false };
}
