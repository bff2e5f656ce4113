/**
 * Turning the issues of `checkHull` (model paths such as `["stations", 3, "points", 2, "y"]`)
 * into issues of the offsets file they came from: the line and column, the station x
 * and waterline as written, and the rule in the file's own values. The rules
 * themselves live in core/hull/hullRules.ts alone; this file only says where they were broken.
 *
 * An issue that merely follows from one already reported is dropped: a station that
 * lost a cell to a non-number is not also short of points, and in the grid form the
 * z of every point is a header height, so the header's own issue stands for them.
 */
import type { Issue } from '../common/errors.js';
import type { HullModel } from '../hull/hullModel.js';
import type { Metadata } from './offsetsMetadata.js';
import { csvIssue } from './offsetsIssue.js';
import { cellText, type BodyRead, type Sheet, type SourceMap } from './offsetsSheet.js';

interface Spot {
  readonly line?: number | undefined;
  readonly column?: number | undefined;
  /** The station and waterline, in words: `station x = 1.5 m, WL 0.50 m`. */
  readonly where?: string | undefined;
  /** The value at the spot, as written. */
  readonly text?: string | undefined;
}

export interface PlaceContext {
  readonly sheet: Sheet;
  readonly body: BodyRead;
  readonly meta: Metadata;
  readonly hull: HullModel;
}

/** Where a point of the model was written in the file: its line, the column of `field` (of the point's cell in a grid), the station and waterline in words, and the cell's text. */
export interface FilePlace {
  readonly line?: number | undefined;
  readonly column?: number | undefined;
  readonly where?: string | undefined;
  readonly text?: string | undefined;
}

/** The place in the file of point `j` of station `i` of the model read from `sheet` (see SourceMap). */
export function pointPlace(sheet: Sheet, map: SourceMap, i: number, j: number, field: 'y' | 'z' | undefined): FilePlace {
  const { rows, rowLines, header, label } = sheet;
  if (i >= map.stationRow.length) return {};
  if (map.form === 'grid') {
    const r = map.stationRow[i]!;
    const c = map.pointCol[i]![j];
    const xt = cellText(rows[r]!, 0);
    if (c === undefined) return { line: rowLines[r], where: `station x = ${xt}${label}` };
    const text = field === 'z' ? header[c] : cellText(rows[r]!, c);
    // A keel or deck-edge point comes from its own column (keel_z, deck_y), not a waterline.
    const place = c < map.first ? `${header[c]}` : `WL ${header[c]}${label}`;
    return { line: rowLines[r], column: c + 1, where: `station x = ${xt}${label}, ${place}`, text };
  }
  const r = map.pointRow[i]![j];
  if (r === undefined) return {};
  const xt = cellText(rows[map.stationRow[i]!]!, map.xCol);
  const zt = cellText(rows[r]!, map.zCol);
  const column = field === 'y' ? map.yCol + 1 : field === 'z' ? map.zCol + 1 : undefined;
  const text = field === 'z' ? zt : cellText(rows[r]!, map.yCol);
  return { line: rowLines[r], column, where: `station x = ${xt}${label}, point z = ${zt}${label}`, text };
}

/** The file issues for the model issues of `checkHull`, in the same order, consequences dropped. */
export function placeHullIssues(found: readonly Issue[], ctx: PlaceContext): Issue[] {
  const { sheet, body, meta, hull } = ctx;
  const { rows, rowLines, header, headerLine, label } = sheet;
  const { map } = body;
  const grid = map.form === 'grid';

  const stationSpot = (i: number): Spot => {
    const r = map.stationRow[i]!;
    const xt = cellText(rows[r]!, grid ? 0 : map.xCol);
    return { line: rowLines[r], where: `station x = ${xt}${label}`, text: xt };
  };
  const xSpot = (i: number): Spot => ({ ...stationSpot(i), column: map.form === 'grid' ? 1 : map.xCol + 1 });
  const pointSpot = (i: number, j: number, field: 'y' | 'z' | undefined): Spot => pointPlace(sheet, map, i, j, field);
  const firstWl = map.form === 'grid' ? map.first : 1;
  const waterlineSpot = (k: number): Spot => ({ line: headerLine, column: k + firstWl + 1, where: `WL ${header[k + firstWl]}${label}`, text: header[k + firstWl] });

  const spotOf = (path: readonly (string | number)[]): Spot => {
    const [head, i, sub, j, field] = path;
    if (head === 'waterlines' && typeof i === 'number') return waterlineSpot(i);
    if (head === 'ap' || head === 'fp') return { line: meta[head]?.line, text: meta[head] === undefined ? undefined : `${head} ${meta[head].text}` };
    if (head !== 'stations' || typeof i !== 'number' || i >= map.stationRow.length) return {};
    if (sub === 'x') return xSpot(i);
    if (sub === 'points' && typeof j === 'number') return pointSpot(i, j, field === 'y' || field === 'z' ? field : undefined);
    return stationSpot(i);
  };

  const out: Issue[] = [];
  const put = (f: Issue, s: Spot, rule: string): void => {
    out.push(csvIssue(f.code, s.line, s.column, s.where, rule));
  };
  for (const f of found) {
    const s = spotOf(f.path);
    const i = f.path[1];
    const j = f.path[3];
    switch (f.code) {
      case 'HYD_HALF_BREADTH_NEGATIVE':
        put(f, s, `half-breadth ${s.text} < 0`);
        break;
      case 'HYD_VALUE_RANGE':
        // In the grid form every point's z is a header height, whose own issue stands for it.
        if (grid && f.path[0] === 'stations' && f.path[4] === 'z') break;
        put(f, s, `${s.text}${label}: ${f.message.slice(f.message.indexOf(' m: ') + 4)}`);
        break;
      case 'HYD_X_NOT_INCREASING': {
        const p = typeof i === 'number' && i > 0 ? xSpot(i - 1) : {};
        put(f, s, `x must be greater than the station before it (x = ${p.text}${label}, line ${p.line}); stations run in strictly increasing x`);
        break;
      }
      case 'HYD_Z_NOT_INCREASING': {
        if (f.path[0] === 'waterlines' && typeof i === 'number') {
          const p = waterlineSpot(i - 1);
          put(f, s, `waterline height ${s.text}${label} is not above the one before it (${p.text}${label}, column ${p.column}); waterline heights must increase strictly`);
        } else if (!grid && typeof i === 'number' && typeof j === 'number') {
          const p = pointSpot(i, j - 1, 'z');
          if (f.path[4] === 'z') {
            put(f, s, `z = ${s.text}${label} is below the point before it (z = ${p.text}${label}, line ${p.line}); list a station's points from the keel up`);
          } else {
            put(f, s, `the point repeats the one before it (line ${p.line}); consecutive points of a station must differ`);
          }
        }
        break;
      }
      case 'HYD_STATION_TOO_FEW_POINTS': {
        if (typeof i !== 'number' || body.tainted.has(i)) break;
        const n = hull.stations[i]?.points.length ?? 0;
        put(f, s, grid
          ? `the row has ${n} defined half-breadth(s); a section needs at least 2`
          : `the station has ${n} point(s); a section needs at least 2`);
        break;
      }
      case 'HYD_TOO_FEW_STATIONS':
        if (!body.rowsLeftOut) put(f, s, `the file has ${hull.stations.length} station(s); at least 3 are needed to integrate along the length`);
        break;
      case 'HYD_PERPENDICULARS': {
        if (meta.perpendicularFault) break;
        const end = (key: 'ap' | 'fp', i: number, which: string): string => {
          const m = meta[key];
          return m !== undefined ? `${key} = ${m.text}${label}` : `${key} = ${stationSpot(i).text}${label}, the ${which} station`;
        };
        put(f, s, `fp must lie forward of ap (${end('fp', hull.stations.length - 1, 'foremost')}; ${end('ap', 0, 'aftmost')})`);
        break;
      }
      default:
        put(f, s, f.message);
    }
  }
  return out;
}
