/**
 * What a lines drawing shows, as plain numbers: each station's offsets as given and its
 * section as the core reads it (the fitted curve of core/hull/section.ts, sampled
 * between the offsets), the waterlines through the stations, the keel and deck-edge
 * lines, the knuckle lines, and the offsets the fairness check reports.
 *
 * The curves drawn are the ones the hydrostatics integrate: a section is sampled with
 * Section.halfBreadthAt wherever z rises between two offsets, and drawn straight where
 * it does not (a flat), so a bad fit shows in the drawing as it would in the figures.
 */
import { ticks } from 'd3-array';
import type { FairnessWarning } from '../fairness/fairness.js';
import type { PreparedHull } from '../hull/preparedHull.js';

export interface LinesPoint {
  readonly y: number;
  readonly z: number;
  readonly knuckle: boolean;
}

export interface LinesStation {
  readonly x: number;
  /** The offsets as given, keel to deck edge; the first and last are corners. */
  readonly offsets: readonly LinesPoint[];
  /** The fitted half-section, keel to deck edge, densely sampled: [y, z] pairs. */
  readonly curve: readonly (readonly [number, number])[];
  readonly keel: number;
  readonly deck: number;
  /** Half-breadth at the deck edge. */
  readonly deckY: number;
}

export interface LinesWaterline {
  readonly z: number;
  /** Runs of [x, half-breadth] at the stations the waterline meets; a station it misses breaks the run. */
  readonly runs: readonly (readonly (readonly [number, number])[])[];
}

export interface LinesWarning {
  /** 1, 2, ...: the label drawn beside the mark. */
  readonly label: number;
  readonly x: number;
  readonly y: number;
  readonly z: number;
  readonly message: string;
}

export interface LinesData {
  readonly name: string;
  readonly ap: number;
  readonly fp: number;
  readonly amidships: number;
  readonly stations: readonly LinesStation[];
  readonly waterlines: readonly LinesWaterline[];
  /** Each knuckle line (a chine, a knuckle): [x, y, z] at the stations that have it. */
  readonly knuckleLines: readonly (readonly (readonly [number, number, number])[])[];
  readonly warnings: readonly LinesWarning[];
}

/** Samples of the fitted curve between two offsets that differ in height. */
const SAMPLES_BETWEEN = 8;

function fittedCurve(p: PreparedHull, i: number): [number, number][] {
  const section = p.sections[i]!;
  const pts = p.hull.stations[i]!.points;
  const out: [number, number][] = [[pts[0]!.y, pts[0]!.z]];
  for (let k = 1; k < pts.length; k++) {
    const a = pts[k - 1]!;
    const b = pts[k]!;
    if (b.z > a.z) {
      for (let s = 1; s < SAMPLES_BETWEEN; s++) {
        const z = a.z + ((b.z - a.z) * s) / SAMPLES_BETWEEN;
        const y = section.halfBreadthAt(z);
        if (Number.isFinite(y)) out.push([y, z]);
      }
    }
    out.push([b.y, b.z]);
  }
  return out;
}

/** Heights of the waterlines drawn: the table's own, or about eight round heights for a points-form table. */
function waterlineHeights(p: PreparedHull, top: number): number[] {
  const own = p.hull.waterlines ?? ticks(p.lowestKeel, top, 8);
  return own.filter((z) => z > p.lowestKeel && z <= top);
}

function waterline(p: PreparedHull, z: number): LinesWaterline {
  const runs: [number, number][][] = [];
  let run: [number, number][] = [];
  p.sections.forEach((s, i) => {
    const y = s.halfBreadthAt(z);
    if (Number.isFinite(y)) run.push([p.x[i]!, y]);
    else if (run.length > 0) {
      runs.push(run);
      run = [];
    }
  });
  if (run.length > 0) runs.push(run);
  return { z, runs };
}

function knuckleLines(p: PreparedHull): [number, number, number][][] {
  const perStation = p.hull.stations.map((st) => st.points.slice(1, -1).filter((q) => q.knuckle));
  const count = Math.max(0, ...perStation.map((k) => k.length));
  const lines: [number, number, number][][] = [];
  for (let k = 0; k < count; k++) {
    let line: [number, number, number][] = [];
    perStation.forEach((knuckles, i) => {
      const q = knuckles[k];
      if (q !== undefined) line.push([p.x[i]!, q.y, q.z]);
      else if (line.length > 0) {
        if (line.length > 1) lines.push(line);
        line = [];
      }
    });
    if (line.length > 1) lines.push(line);
  }
  return lines;
}

/** The lines of a prepared hull, with the fairness warnings (core/fairness) marked where they are. */
export function linesData(p: PreparedHull, warnings: readonly FairnessWarning[]): LinesData {
  const stations = p.hull.stations.map((st, i): LinesStation => {
    const last = st.points[st.points.length - 1]!;
    return {
      x: st.x,
      offsets: st.points.map((q) => ({ y: q.y, z: q.z, knuckle: q.knuckle })),
      curve: fittedCurve(p, i),
      keel: p.sections[i]!.zKeel,
      deck: p.sections[i]!.zDeck,
      deckY: last.y,
    };
  });
  const top = Math.max(...stations.map((s) => s.deck));
  const marks = warnings.map((w, k): LinesWarning => {
    const [, i, , j] = w.path;
    const q = typeof i === 'number' && typeof j === 'number' ? p.hull.stations[i]?.points[j] : undefined;
    return { label: k + 1, x: w.x, y: q?.y ?? w.value, z: q?.z ?? w.z, message: w.message };
  });
  return {
    name: p.hull.name,
    ap: p.perp.ap,
    fp: p.perp.fp,
    amidships: p.perp.xm,
    stations,
    waterlines: waterlineHeights(p, top).map((z) => waterline(p, z)),
    knuckleLines: knuckleLines(p),
    warnings: marks,
  };
}
