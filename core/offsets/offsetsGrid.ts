/**
 * The grid form of an offsets file: a header `x, z1, z2, ...` and one row per station,
 * `x, y1, y2, ...`, blanks only leading or trailing the defined half-breadths.
 */
import type { Issue } from '../common/errors.js';
import type { Point, Station } from '../hull/hullModel.js';
import { LIMITS } from '../common/limits.js';
import { readLength } from './lengthCell.js';
import { csvIssue } from './offsetsIssue.js';
import { cellText, type BodyRead, type Sheet } from './offsetsSheet.js';

/** The waterline heights of a grid header in metres, or the issues that keep it from being read. */
export function readGridHeader(sheet: Sheet): { waterlines: number[]; issues: Issue[] } {
  const { header, headerLine: line } = sheet;
  const issues: Issue[] = [];
  const waterlines: number[] = [];
  if (header.length < 2) {
    issues.push(csvIssue('HYD_HEADER', line, undefined, undefined, 'the header has x but no waterline heights after it'));
  }
  if (header.length - 1 > LIMITS.maxWaterlines) {
    issues.push(csvIssue('HYD_TOO_LARGE', line, undefined, undefined, `the header has ${header.length - 1} waterlines; the limit is ${LIMITS.maxWaterlines}`));
    return { waterlines, issues };
  }
  for (let c = 1; c < header.length; c++) {
    const t = header[c]!;
    if (t === '') {
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, 'waterline height is blank; every header cell after x must be a height'));
      continue;
    }
    const v = readLength(t, sheet.unit);
    if (typeof v === 'number') waterlines.push(v * sheet.factor);
    else issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, `waterline height ${v.why}`));
  }
  return { waterlines, issues };
}

/** Read the station rows of a grid whose header has been read (`waterlines` in metres, one per header cell after x). */
export function readGridBody(sheet: Sheet, waterlines: readonly number[]): BodyRead {
  const { rows, rowLines, header, label, unit, factor } = sheet;
  const ncol = header.length;
  const issues: Issue[] = [];
  const stations: Station[] = [];
  const stationRow: number[] = [];
  const pointCol: number[][] = [];
  const tainted = new Set<number>();
  let rowsLeftOut = false;

  if (rows.length > LIMITS.maxStations) {
    issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${rows.length} station rows; the limit is ${LIMITS.maxStations}`));
    return { stations, issues, map: { form: 'grid', stationRow, pointCol }, tainted, rowsLeftOut, stopped: true };
  }

  for (let r = 0; r < rows.length; r++) {
    const cells = rows[r]!;
    const line = rowLines[r]!;
    if (cells.length > ncol) {
      issues.push(csvIssue('HYD_ROW_LENGTH', line, ncol + 1, undefined, `the row has ${cells.length} cells but the header has ${ncol}`));
    }
    const xt = cellText(cells, 0);
    const xv = xt === '' ? undefined : readLength(xt, unit);
    if (typeof xv !== 'number') {
      issues.push(csvIssue(xv === undefined ? 'HYD_CELL_NOT_NUMBER' : xv.code, line, 1, undefined,
        xv === undefined ? 'station x is blank; every row starts with its station x' : `station x ${xv.why}`));
      rowsLeftOut = true;
      continue;
    }
    const i = stations.length;
    const points: Point[] = [];
    const cols: number[] = [];
    const end = Math.min(cells.length, ncol);
    // 0: no defined cell yet; 1: inside the run of defined cells; 2: in a blank after the run.
    let state = 0;
    let blankFrom = 0;
    for (let c = 1; c < end; c++) {
      const t = cellText(cells, c);
      if (t.length === 0) {
        if (state === 1) {
          state = 2;
          blankFrom = c;
        }
        continue;
      }
      if (state === 2) {
        const span = blankFrom === c - 1 ? `column ${blankFrom + 1} is blank` : `columns ${blankFrom + 1} to ${c} are blank`;
        issues.push(csvIssue('HYD_BLANK_INSIDE_ROW', line, blankFrom + 1, `station x = ${xt}${label}, WL ${header[blankFrom]}${label}`,
          `${span} between defined half-breadths; the defined cells of a row must be one unbroken run (blanks may only lead or trail it)`));
      }
      state = 1;
      const v = readLength(t, unit);
      if (typeof v !== 'number') {
        issues.push(csvIssue(v.code, line, c + 1, `station x = ${xt}${label}, WL ${header[c]}${label}`, `half-breadth ${v.why}`));
        tainted.add(i);
        continue;
      }
      points.push({ y: v * factor, z: waterlines[c - 1]!, knuckle: false });
      cols.push(c);
    }
    stations.push({ x: xv * factor, points });
    stationRow.push(r);
    pointCol.push(cols);
  }
  return { stations, issues, map: { form: 'grid', stationRow, pointCol }, tainted, rowsLeftOut, stopped: false };
}
