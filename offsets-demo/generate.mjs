#!/usr/bin/env node
/**
 * Writes the demo offsets tables of this folder from smooth formulae.
 *
 *   node offsets-demo/generate.mjs
 *
 * Plain JavaScript, no dependencies, deterministic: the same files on every run.
 * Offsets are rounded to the millimetre as a lofting table would be; the imperial
 * table is converted from the rounded metric one, to the nearest sixteenth of an inch.
 * Before anything is written every table is checked (half-breadths >= 0, stations in
 * increasing x, heights increasing, at least two points a station, blanks only at the
 * ends of a row); a failed check stops the script and writes nothing.
 *
 * The hulls are invented for the demo (see README.md); they are not any real vessel.
 */
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));

// ---------------------------------------------------------------- small helpers

/** Round to the millimetre (and never write -0). */
const mm = (v) => {
  const r = Math.round(v * 1000) / 1000;
  return r === 0 ? 0 : r;
};
/** A length cell in metres: shortest decimal of the millimetre-rounded value. */
const cell = (v) => String(mm(v));
const clamp01 = (t) => Math.min(1, Math.max(0, t));
/** Smooth 0 -> 1 step with zero slope at both ends. */
const smoothstep = (t) => {
  const u = clamp01(t);
  return u * u * (3 - 2 * u);
};
const deg = Math.PI / 180;

function check(ok, what) {
  if (!ok) throw new Error(`offsets check failed: ${what}`);
}

// ------------------------------------------------------- survey launch (points form)
//
// Hard chine. x = 0 is the transom (the aft perpendicular); the stem head is at
// x = 9.5 m and the stem crosses the 0.6 m waterline at x = 8.5 m (the forward
// perpendicular), so LBP = 8.5 m. Each station is six points from the keel up:
// keel, two bottom points, chine (a knuckle), one topside point, sheer.

const launch = {
  stemX: 9.5,
  fpX: 8.5,
  dwl: 0.6,
  /** Keel height: straight along the baseline to x = 6 m, then a forefoot sweeping up into the raked stem. */
  keelZ(x) {
    const t = clamp01((x - 6.0) / (this.stemX - 6.0));
    // Power (about 3) chosen so the stem passes through the 0.6 m waterline at the forward perpendicular.
    const p = Math.log(this.dwl / 1.64) / Math.log((this.fpX - 6.0) / (this.stemX - 6.0));
    return 1.64 * t ** p;
  },
  /** Sheer (deck edge) height. */
  sheerZ(x) {
    return 1.3 + 0.4 * (x / this.stemX) ** 2;
  },
  /** Sheer half-breadth: 1.40 m at its widest, 1.30 m at the transom, 0.02 m at the stem head. */
  sheerY(x) {
    if (x <= 4.0) return 1.4 - 0.1 * ((4.0 - x) / 4.0) ** 2;
    const s = clamp01((x - 4.0) / (this.stemX - 4.0));
    return 0.02 + 1.38 * (1 - s * s) ** 0.75;
  },
  /** Chine half-breadth: 1.25 m at its widest, 1.18 m at the transom, 0.01 m at the stem head. */
  chineY(x) {
    if (x <= 3.5) return 1.25 - 0.07 * ((3.5 - x) / 3.5) ** 2;
    const s = clamp01((x - 3.5) / (this.stemX - 3.5));
    return 0.01 + 1.24 * (1 - s ** 2.2) ** 0.9;
  },
  /** Chine height: nearly level aft (about 14 degrees deadrise), rising forward to meet the stem. */
  chineZ(x) {
    const u = x / this.stemX;
    return 0.29 + 0.08 * u + 1.28 * u ** 6;
  },
  section(x) {
    const zk = this.keelZ(x);
    const yc = this.chineY(x);
    const zc = this.chineZ(x);
    const ys = this.sheerY(x);
    const zs = this.sheerZ(x);
    const rise = zc - zk;
    // Bottom a little convex: below the straight keel-to-chine line by 12 % of a parabola.
    const bottom = (eta) => ({ y: eta * yc, z: zk + rise * (eta - 0.12 * eta * (1 - eta)), knuckle: 0 });
    // Topsides flared a little: the mid point lies outboard of the chine-to-sheer chord.
    const top = { y: 0.5 * (yc + ys) + 0.1 * (ys - yc), z: 0.5 * (zc + zs), knuckle: 0 };
    return [
      { y: 0, z: zk, knuckle: 0 },
      bottom(1 / 3),
      bottom(2 / 3),
      { y: yc, z: zc, knuckle: 1 },
      top,
      { y: ys, z: zs, knuckle: 0 },
    ];
  },
};

function launchTable() {
  const stations = [];
  for (let i = 0; i <= 19; i++) {
    const x = mm(i * 0.5);
    const points = launch.section(x).map((p) => ({ y: mm(p.y), z: mm(p.z), knuckle: p.knuckle }));
    stations.push({ x, points });
  }
  return stations;
}

function checkPoints(stations, label) {
  check(stations.length >= 3, `${label}: at least 3 stations`);
  for (let i = 0; i < stations.length; i++) {
    const { x, points } = stations[i];
    if (i > 0) check(x > stations[i - 1].x, `${label}: x increasing at station ${x}`);
    check(points.length >= 4 && points.length <= 7, `${label}: 4 to 7 points at station ${x}`);
    for (let j = 0; j < points.length; j++) {
      const p = points[j];
      check(Number.isFinite(p.y) && Number.isFinite(p.z), `${label}: finite at ${x}`);
      check(p.y >= 0, `${label}: half-breadth >= 0 at station ${x}`);
      if (j > 0) check(p.z > points[j - 1].z, `${label}: z strictly increasing at station ${x}, point ${j + 1}`);
    }
    check(points[0].y === 0, `${label}: keel point on the centreline at station ${x}`);
  }
}

function launchCsv(stations) {
  const lines = [
    '# name: Kestrow Plover - 8.5 m survey launch (invented demo hull)',
    '# units: m',
    '# ap: 0',
    '# fp: 8.5',
    '# Invented for the Halfbreadth demo and not any real vessel - made by generate.mjs',
    'x,y,z,knuckle',
  ];
  for (const { x, points } of stations) {
    for (const p of points) lines.push(`${cell(x)},${cell(p.y)},${cell(p.z)},${p.knuckle}`);
  }
  return lines.join('\n') + '\n';
}

// ---------------------------------------------------------- steel workboat (grid form)
//
// Round bilge, transom stern, raked stem. x = 0 is the transom (the aft perpendicular);
// the stem crosses the 1.4 m design waterline at x = 14 m (the forward perpendicular)
// and meets the deck at x = 14.35 m. Deck edge level at 2.2 m. Each section is
//   y(z) = yk + (yd - yk) * S(eta),   eta = (z - zk) / (deck - zk),
//   S(eta) = (1 - (1 - eta)^m)^(1/m),
// a flat of keel of half-width yk at the keel height zk, a round bilge whose fullness
// grows with m, and a side that comes vertical at the deck edge (half-breadth yd).

const boat = {
  deck: 2.2,
  stemHeadX: 14.35,
  fpX: 14.0,
  dwl: 1.4,
  /** Forward end of the run: the keel is on the baseline from here to the forefoot. */
  runX: 4.2,
  /** Aftmost point of the forefoot: the keel is on the baseline from the run to here. */
  forefootX: 11.2,
  /** Keel height: the run rises to the transom's lower edge (1.0 m), the forefoot into the stem. */
  keelZ(x) {
    if (x < this.runX) {
      // Buttock of the run: tangent to the baseline at x = 4.2 m, through the tabulated
      // waterlines 0.1, 0.5 and 0.75 m at the stations 2.8, 1.4 and 0.7 m.
      const t = x / this.runX;
      return Math.max(0, (1 - t) ** 2 * (1 + 0.48 * t + 0.315 * t * t - 1.89 * t ** 3));
    }
    if (x <= this.forefootX) return 0;
    // Power chosen so the stem passes through the design waterline at the forward perpendicular.
    const a = this.forefootX;
    const p = Math.log(this.dwl / this.deck) / Math.log((this.fpX - a) / (this.stemHeadX - a));
    return this.deck * ((x - a) / (this.stemHeadX - a)) ** p;
  },
  /**
   * Half-width of the flat at the keel: 0.80 m across the transom, 0.30 m flat of keel,
   * narrowing to nothing where the keel rises into the stem (x = 12.6 m on), so the
   * sections there start from the keel point on the centreline that keel_z gives.
   */
  flatY(x) {
    if (x < this.runX) return 0.3 + 0.5 * (1 - x / this.runX) ** 1.5;
    return (0.03 + 0.27 * (1 - smoothstep((x - 7.0) / 5.5))) * (1 - smoothstep((x - this.forefootX) / 1.4));
  },
  /** Deck-edge half-breadth: 2.30 m from x = 6 to 7 m, 1.95 m at the transom, 0 at the stem head. */
  deckY(x) {
    if (x <= 6.0) return 2.3 - 0.35 * (1 - x / 6.0) ** 2;
    if (x <= 7.0) return 2.3;
    const s = clamp01((x - 7.0) / (this.stemHeadX - 7.0));
    return 2.3 * (1 - s ** 2.2) ** 0.8;
  },
  /** Section fullness: 1.3 at the transom, 2.5 at x = 7 m, 1 at the stem (straight-sided). */
  fullness(x) {
    if (x < 7.0) return 2.5 - 1.2 * (1 - x / 7.0) ** 2;
    return 2.5 - 1.5 * smoothstep((x - 7.0) / 7.2);
  },
  halfBreadth(x, z) {
    const zk = this.keelZ(x);
    const eta = clamp01((z - zk) / (this.deck - zk));
    const m = this.fullness(x);
    const s = (1 - (1 - eta) ** m) ** (1 / m);
    const yk = this.flatY(x);
    return yk + (this.deckY(x) - yk) * s;
  },
};

const WATERLINES = [0, 0.1, 0.25, 0.5, 0.75, 1.0, 1.25, 1.5, 1.75, 2.0, 2.2];
/** Stations every LBP/10 = 1.4 m, half stations between the first two and the last two, and one at the stem's overhang. */
const BOAT_STATIONS = [0, 0.7, 1.4, 2.8, 4.2, 5.6, 7.0, 8.4, 9.8, 11.2, 12.6, 13.3, 14.0, 14.2];

function boatTable() {
  return BOAT_STATIONS.map((x) => {
    const zk = boat.keelZ(x);
    // A cell is defined from the first tabulated waterline at or above the keel (a
    // millimetre of tolerance) up to the deck edge; below that the station has no surface.
    const cells = WATERLINES.map((z) => (z >= mm(zk) && z <= boat.deck ? mm(boat.halfBreadth(x, z)) : null));
    // The keel (rabbet) height of every station, as a table of offsets gives it: where it
    // falls on a tabulated waterline it confirms the flat of keel there. The deck edge is
    // the top waterline, 2.2 m, at every station: given too, so that heeled work can rely on it.
    return { x, keel: mm(zk), deckZ: boat.deck, deckY: mm(boat.halfBreadth(x, boat.deck)), cells };
  });
}

function checkGrid(waterlines, rows, label) {
  for (let k = 1; k < waterlines.length; k++) check(waterlines[k] > waterlines[k - 1], `${label}: waterlines increasing`);
  check(rows.length >= 3, `${label}: at least 3 stations`);
  for (let i = 0; i < rows.length; i++) {
    const { x, cells } = rows[i];
    if (i > 0) check(x > rows[i - 1].x, `${label}: x increasing at station ${x}`);
    check(cells.length === waterlines.length, `${label}: row length at station ${x}`);
    const defined = cells.map((c) => c !== null);
    const first = defined.indexOf(true);
    const last = defined.lastIndexOf(true);
    check(first >= 0 && last - first + 1 >= 2, `${label}: at least 2 defined cells at station ${x}`);
    for (let k = first; k <= last; k++) check(defined[k], `${label}: blank inside the row at station ${x}`);
    for (const c of cells) if (c !== null) check(Number.isFinite(c) && c >= 0, `${label}: half-breadth >= 0 at station ${x}`);
    check(rows[i].keel <= waterlines[first], `${label}: keel at or below the lowest half-breadth at station ${x}`);
    check(rows[i].deckZ === waterlines[last] && rows[i].deckY === cells[last], `${label}: the deck edge is the top cell at station ${x}`);
  }
}

function gridCsv(meta, waterlines, rows, fmt) {
  const lines = [...meta, ['x', 'keel_z', 'deck_z', 'deck_y', ...waterlines.map(fmt)].join(',')];
  for (const { x, keel, deckZ, deckY, cells } of rows) {
    lines.push([fmt(x), fmt(keel), fmt(deckZ), fmt(deckY), ...cells.map((c) => (c === null ? '' : fmt(c)))].join(','));
  }
  return lines.join('\n') + '\n';
}

// ------------------------------------------------------------- feet-inches-eighths

const SIXTEENTHS_PER_FOOT = 12 * 16;
/** Metres to feet-inches-eighths, nearest sixteenth (an odd sixteenth is a trailing +). */
function ftIn8(metres) {
  const s = Math.round((Math.abs(metres) / 0.3048) * SIXTEENTHS_PER_FOOT);
  check(metres >= 0, 'no negative lengths in the imperial table');
  if (s === 0) return '0-0-0';
  const ft = Math.floor(s / SIXTEENTHS_PER_FOOT);
  const rem = s - ft * SIXTEENTHS_PER_FOOT;
  const inches = Math.floor(rem / 16);
  const r = rem - inches * 16;
  return `${ft}-${inches}-${r >> 1}${r & 1 ? '+' : ''}`;
}
const sixteenths = (text) => {
  const [ft, inch, e] = text.split('-');
  return Number(ft) * SIXTEENTHS_PER_FOOT + Number(inch) * 16 + Number(e.replace('+', '')) * 2 + (e.endsWith('+') ? 1 : 0);
};

// ------------------------------------------------------------------------ write

const stations = launchTable();
checkPoints(stations, 'survey-launch');

const rows = boatTable();
checkGrid(WATERLINES, rows, 'workboat');

// The shapes make sense: widest near amidships, a transom with immersed area aft, a fine stem.
{
  const widest = stations.reduce((a, b) => (b.points.at(-1).y > a.points.at(-1).y ? b : a));
  check(widest.x > 0.3 * 8.5 && widest.x < 0.6 * 8.5, 'survey-launch: widest near amidships');
  check(stations[0].points[0].z < 0.45 && stations[0].points[3].y > 1, 'survey-launch: a broad transom below the lightest draft');
  check(stations.at(-1).points.at(-1).y < 0.05, 'survey-launch: the foremost station is the stem head');
  const dwl = WATERLINES.indexOf(1.5);
  const wide = rows.reduce((a, b) => ((b.cells[dwl] ?? 0) > (a.cells[dwl] ?? 0) ? b : a));
  check(wide.x > 0.35 * 14 && wide.x < 0.6 * 14, 'workboat: widest near amidships');
  const transom = rows[0].cells.find((c) => c !== null);
  check(transom > 0 && rows[0].cells.indexOf(transom) < dwl, 'workboat: an immersed transom with a flat lower edge');
  check(rows.at(-2).cells[dwl] < 0.1, 'workboat: the stem at the forward perpendicular');
}

// The imperial table keeps its order after rounding to sixteenths.
const wlSixteenths = WATERLINES.map((z) => sixteenths(ftIn8(z)));
const xSixteenths = rows.map((r) => sixteenths(ftIn8(r.x)));
checkGrid(wlSixteenths, rows.map((r, i) => ({ x: xSixteenths[i], keel: sixteenths(ftIn8(r.keel)), deckZ: sixteenths(ftIn8(r.deckZ)), deckY: r.deckY, cells: r.cells })), 'workboat-ftin');

const boatMeta = (units, ap, fp) => [
  '# name: Kestrow Mule - 14 m steel workboat (invented demo hull)',
  `# units: ${units}`,
  `# ap: ${ap}`,
  `# fp: ${fp}`,
  '# Invented for the Halfbreadth demo and not any real vessel - made by generate.mjs',
];

const files = {
  'survey-launch.csv': launchCsv(stations),
  'workboat.csv': gridCsv(boatMeta('m', '0', '14'), WATERLINES, rows, cell),
  'workboat-ftin.csv': gridCsv(boatMeta('ft-in-8', ftIn8(0), ftIn8(14)), WATERLINES, rows, ftIn8),
};
for (const [name, text] of Object.entries(files)) {
  writeFileSync(join(here, name), text);
  console.log(`wrote offsets-demo/${name}`);
}
