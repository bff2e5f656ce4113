/**
 * The grid form of an offsets file: a header `x, z1, z2, ...` and one row per station,
 * `x, y1, y2, ...`, blanks only leading or trailing the defined half-breadths.
 *
 * Optional columns named in the header between `x` and the heights carry what a table
 * of offsets gives at each station besides its half-breadths (a blank cell: not given
 * at this station): `keel_z`, the height where the section meets the centreline at the
 * bottom (the keel or rabbet line), and `deck_z` with `deck_y`, the height and
 * half-breadth of the deck edge (the sheer). A keel below the lowest defined cell adds
 * the point (0, keel_z) under the half-breadths; a deck edge above the highest adds
 * (deck_y, deck_z) over them. Without them a station's keel is its lowest defined cell
 * and its deck edge its highest, as before.
 */
import type { Issue } from '../common/errors.js';
import type { Point, Station } from '../hull/hullModel.js';
import { LIMITS } from '../common/limits.js';
import { readLength } from './lengthCell.js';
import { csvIssue } from './offsetsIssue.js';
import { deckAtTopWaterlineWarning, keelAtWaterlineWarning, type ReadingWarning } from './readingWarnings.js';
import { cellText, hasCellsBeyond, type BodyRead, type Sheet } from './offsetsSheet.js';

/** The optional columns of the grid form, in the order they may appear. */
export const GRID_EXTRA_COLUMNS = ['keel_z', 'deck_z', 'deck_y'] as const;
export type GridExtraColumn = (typeof GRID_EXTRA_COLUMNS)[number];

/** What the header of a grid says: the waterline heights and where each column is. */
export interface GridHeader {
  /** Waterline heights, m, one per header cell from `first` on. */
  waterlines: number[];
  /** Column (0-based) of the first waterline height. */
  first: number;
  /** Column (0-based) of each optional column given. */
  extra: Partial<Record<GridExtraColumn, number>>;
  issues: Issue[];
}

/** The waterline heights of a grid header in metres and its optional columns, or the issues that keep it from being read. */
export function readGridHeader(sheet: Sheet): GridHeader {
  const { header, headerLine: line } = sheet;
  const issues: Issue[] = [];
  const waterlines: number[] = [];
  const extra: Partial<Record<GridExtraColumn, number>> = {};
  let first = 1;
  while (first < header.length && (GRID_EXTRA_COLUMNS as readonly string[]).includes(header[first]!.toLowerCase())) {
    const name = header[first]!.toLowerCase() as GridExtraColumn;
    if (extra[name] !== undefined) issues.push(csvIssue('HYD_HEADER', line, first + 1, undefined, `${name} is named twice; each optional column is given once`));
    extra[name] = first;
    first++;
  }
  if ((extra.deck_z === undefined) !== (extra.deck_y === undefined)) {
    const has = extra.deck_z !== undefined ? 'deck_z' : 'deck_y';
    issues.push(csvIssue('HYD_HEADER', line, extra[has]! + 1, undefined, `${has} is given without ${has === 'deck_z' ? 'deck_y' : 'deck_z'}; the deck edge needs both its height and its half-breadth`));
  }
  if (header.length - first < 1) {
    issues.push(csvIssue('HYD_HEADER', line, undefined, undefined, 'the header has x but no waterline heights after it'));
  }
  if (header.length - first > LIMITS.maxWaterlines) {
    issues.push(csvIssue('HYD_TOO_LARGE', line, undefined, undefined, `the header has ${header.length - first} waterlines; the limit is ${LIMITS.maxWaterlines}`));
    return { waterlines, first, extra, issues };
  }
  for (let c = first; c < header.length; c++) {
    const t = header[c]!;
    if (t === '') {
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, 'waterline height is blank; every header cell after x must be a height'));
      continue;
    }
    const v = readLength(t, sheet.unit, sheet.decimalComma);
    if (typeof v === 'number') waterlines.push(v * sheet.factor);
    else {
      const named = /^[a-z_]+$/i.test(t) ? `; the optional columns ${GRID_EXTRA_COLUMNS.join(', ')} come right after x` : '';
      const withUnit = /^[-+]?[\d.,]+(?:e[-+]?\d+)?\s*\(?(m|mm|ft|in)\)?$/i.exec(t);
      const unitHint = withUnit === null ? '' : `; write heights as plain numbers and the unit once, in the x header cell (x (${withUnit[1]!.toLowerCase()})) or a '# units:' line`;
      issues.push(csvIssue('HYD_HEADER', line, c + 1, undefined, `waterline height ${v.why}${named}${unitHint}`));
    }
  }
  return { waterlines, first, extra, issues };
}

/** Read the station rows of a grid whose header has been read (`waterlines` in metres, one per header cell from `first`). */
export function readGridBody(sheet: Sheet, head: Pick<GridHeader, 'waterlines' | 'first' | 'extra'>): BodyRead {
  const { waterlines, first, extra } = head;
  const { rows, rowLines, header, label, unit, factor } = sheet;
  const ncol = header.length;
  const issues: Issue[] = [];
  const stations: Station[] = [];
  const stationRow: number[] = [];
  const pointCol: number[][] = [];
  const tainted = new Set<number>();
  const notes: ReadingWarning[] = [];
  let rowsLeftOut = false;

  if (rows.length > LIMITS.maxStations) {
    issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${rows.length} station rows; the limit is ${LIMITS.maxStations}`));
    return { stations, issues, map: { form: 'grid', stationRow, pointCol, first }, tainted, rowsLeftOut, stopped: true };
  }

  for (let r = 0; r < rows.length; r++) {
    const cells = rows[r]!;
    const line = rowLines[r]!;
    if (cells.length > ncol && hasCellsBeyond(cells, ncol)) {
      issues.push(csvIssue('HYD_ROW_LENGTH', line, ncol + 1, undefined, `the row has ${cells.length} cells but the header has ${ncol}; cells beyond the header must be blank`));
    }
    const xt = cellText(cells, 0);
    const xv = xt === '' ? undefined : readLength(xt, unit, sheet.decimalComma);
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
    const where = (c: number): string => `station x = ${xt}${label}, ${header[c]}`;
    // The optional columns: undefined when blank, NaN when unreadable (reported).
    const optional = (name: GridExtraColumn): number | undefined => {
      const c = extra[name];
      if (c === undefined) return undefined;
      const t = cellText(cells, c);
      if (t === '') return undefined;
      const v = readLength(t, unit, sheet.decimalComma);
      if (typeof v === 'number') return v * factor;
      issues.push(csvIssue(v.code, line, c + 1, where(c), `${name} ${v.why}`));
      tainted.add(i);
      return Number.NaN;
    };
    const keelZ = optional('keel_z');
    const deckZ = optional('deck_z');
    const deckY = optional('deck_y');
    // 0: no defined cell yet; 1: inside the run of defined cells; 2: in a blank after the run.
    let state = 0;
    let blankFrom = 0;
    for (let c = first; c < end; c++) {
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
      const v = readLength(t, unit, sheet.decimalComma);
      if (typeof v !== 'number') {
        issues.push(csvIssue(v.code, line, c + 1, `station x = ${xt}${label}, WL ${header[c]}${label}`, `half-breadth ${v.why}`));
        tainted.add(i);
        continue;
      }
      points.push({ y: v * factor, z: waterlines[c - first]!, knuckle: false });
      cols.push(c);
    }
    const lowest = points[0];
    if (keelZ === undefined && lowest !== undefined && lowest.y > 0 && lowest.z > waterlines[0]!) {
      const c0 = cols[0]!;
      notes.push(keelAtWaterlineWarning(i, { x: xt, z: header[c0]!, y: cellText(cells, c0), label }, line, c0 + 1));
    }
    const highest = points[points.length - 1];
    if (deckZ === undefined && highest !== undefined && highest.z === waterlines[waterlines.length - 1]) {
      notes.push(deckAtTopWaterlineWarning(i, xv * factor, highest.z, line));
    }
    addKeelAndDeck(points, cols, { keelZ, deckZ, deckY, extra, line, where, issues, label });
    stations.push({ x: xv * factor, points });
    stationRow.push(r);
    pointCol.push(cols);
  }
  return { stations, issues, map: { form: 'grid', stationRow, pointCol, first }, tainted, rowsLeftOut, stopped: false, notes };
}

interface KeelDeck {
  readonly keelZ: number | undefined;
  readonly deckZ: number | undefined;
  readonly deckY: number | undefined;
  readonly extra: Partial<Record<GridExtraColumn, number>>;
  readonly line: number;
  readonly where: (column: number) => string;
  readonly issues: Issue[];
  readonly label: string;
}

const m6 = (v: number): string => String(Math.round(v * 1e6) / 1e6);

/**
 * Put a station's keel point under its half-breadths and its deck-edge point over them,
 * where the optional columns give them (see the module note), or report the rule they
 * break. `cols` gets the column each added point came from.
 */
function addKeelAndDeck(points: Point[], cols: number[], k: KeelDeck): void {
  const { keelZ, deckZ, deckY, extra, line, where, issues } = k;
  const lowest = points[0];
  const highest = points[points.length - 1];
  if (keelZ !== undefined && Number.isFinite(keelZ)) {
    const c = extra.keel_z!;
    if (lowest !== undefined && keelZ > lowest.z) {
      issues.push(csvIssue('HYD_KEEL_DECK', line, c + 1, where(c), `keel_z (${m6(keelZ)} m) lies above the lowest defined half-breadth (at ${m6(lowest.z)} m); the keel must be at or below it`));
    } else if (lowest === undefined || keelZ < lowest.z) {
      points.unshift({ y: 0, z: keelZ, knuckle: false });
      cols.unshift(c);
    }
  }
  if ((deckZ === undefined) !== (deckY === undefined)) {
    const c = deckZ === undefined ? extra.deck_z! : extra.deck_y!;
    issues.push(csvIssue('HYD_KEEL_DECK', line, c + 1, where(c), `${deckZ === undefined ? 'deck_z' : 'deck_y'} is blank while ${deckZ === undefined ? 'deck_y' : 'deck_z'} is given; give the deck edge's height and half-breadth together`));
    return;
  }
  if (deckZ === undefined || deckY === undefined || !Number.isFinite(deckZ) || !Number.isFinite(deckY)) return;
  const c = extra.deck_z!;
  const top = points[points.length - 1];
  if (highest !== undefined && top !== undefined && deckZ < top.z) {
    issues.push(csvIssue('HYD_KEEL_DECK', line, c + 1, where(c), `deck_z (${m6(deckZ)} m) lies below a defined half-breadth (at ${m6(top.z)} m); cells above the deck edge must be blank`));
  } else if (top !== undefined && deckZ === top.z) {
    if (deckY !== top.y) {
      issues.push(csvIssue('HYD_KEEL_DECK', line, extra.deck_y! + 1, where(extra.deck_y!), `deck_y (${m6(deckY)} m) differs from the half-breadth at the same height (${m6(top.y)} m)`));
    }
  } else {
    points.push({ y: deckY, z: deckZ, knuckle: false });
    cols.push(extra.deck_y!);
  }
}
