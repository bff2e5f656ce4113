/**
 * Warnings about how an offsets table was written, for `check` (command line and
 * service): never errors, never a silent correction. Two kinds:
 *
 * - HYD_KEEL_AT_WATERLINE: a grid row whose first cells are blank and whose lowest
 *   defined half-breadth is above zero, with no keel_z given. Its section starts with a
 *   flat of bottom at that waterline; where the hull's keel (rabbet) lies lower, between
 *   two tabulated waterlines, the volume and the length of the waterline are short. The
 *   `keel_z` column of the grid form says where it is; given equal to the lowest cell's
 *   height it confirms the flat and the warning is not given. The grid reader
 *   (core/offsets/offsetsGrid.ts) finds these, as only it knows which cells were given.
 * - HYD_DECK_AT_TOP_WATERLINE: a grid row whose highest defined half-breadth is on the
 *   table's top waterline, with no deck_z given: the table may simply stop there, below
 *   the deck edge. Upright work to that height does not care; heeled work does (deck
 *   immersion), and refuses such a table (core/stability/stabilityInput.ts) until deck_z
 *   and deck_y say where the deck edge is.
 * - HYD_PROPORTIONS: dimensions no vessel has, which usually mean the wrong unit (an
 *   offsets table in millimetres or inches read as metres) or columns swapped: a
 *   length between perpendiculars over 400 m (the largest ships are about that long),
 *   a greatest breadth over the length, a depth over the length. The thresholds are
 *   common practice, no source.
 */
import { perpendiculars, type HullModel } from '../hull/hullModel.js';
import { lengthFactor, type LengthUnit } from '../common/units.js';

export interface ReadingWarning {
  readonly code: 'HYD_KEEL_AT_WATERLINE' | 'HYD_DECK_AT_TOP_WATERLINE' | 'HYD_PROPORTIONS';
  readonly path: readonly (string | number)[];
  readonly message: string;
  /** The station (index in the hull model) a note is about, where it is about one. */
  readonly station?: number;
}

/** The longest plausible length between perpendiculars, m (about the largest ships). Common practice, no source. */
export const LONGEST_PLAUSIBLE_LBP = 400;

const m3 = (v: number): string => String(Number(v.toFixed(3)));

/**
 * The warning for a grid row whose keel was taken at a tabulated waterline (its lowest
 * defined cell, with blanks below and no keel_z given). The values are as the file
 * writes them, in its own units (`label`: ` m`, ` mm`, nothing for feet-inches-eighths),
 * at the cell's line and column.
 */
export function keelAtWaterlineWarning(
  station: number,
  cell: { readonly x: string; readonly z: string; readonly y: string; readonly label: string },
  line: number,
  column: number,
): ReadingWarning {
  const { x, z, y, label } = cell;
  return {
    code: 'HYD_KEEL_AT_WATERLINE',
    path: ['offsets', line, column],
    message:
      `line ${line}, column ${column} (station x = ${x}${label}, WL ${z}${label}): the keel is taken at this waterline, the lowest with an offset, with a flat of ` +
      `bottom ${y}${label} wide each side; if the keel lies lower, between waterlines, give its height in a keel_z column (station ${station + 1})`,
  };
}

/** The note for a grid row whose top is the table's top waterline, with no deck edge given. */
export function deckAtTopWaterlineWarning(station: number, x: number, z: number, line: number): ReadingWarning {
  return {
    code: 'HYD_DECK_AT_TOP_WATERLINE',
    path: ['offsets', line],
    station,
    message:
      `line ${line}, station x = ${m3(x)} m: the section ends at the table's top waterline (${m3(z)} m) with no deck_z; ` +
      `it is taken as the deck edge, which upright work below it does not need, but heeled work does: give deck_z and deck_y`,
  };
}

/** The notes that `check` shows as warnings: all but the deck edges at the top waterline, which only heeled work needs and which it names itself. */
export function checkWarnings(notes: readonly ReadingWarning[]): ReadingWarning[] {
  return notes.filter((n) => n.code !== 'HYD_DECK_AT_TOP_WATERLINE');
}

/** The stations whose deck edges the notes say are not given. */
export function deckAssumedAt(notes: readonly ReadingWarning[]): number[] {
  return notes.filter((n) => n.code === 'HYD_DECK_AT_TOP_WATERLINE' && n.station !== undefined).map((n) => n.station!);
}

/** Dimensions that suggest the wrong unit or swapped columns (see the module note). `units` is the file's. */
export function proportionWarnings(hull: HullModel, units: LengthUnit | string): ReadingWarning[] {
  const out: ReadingWarning[] = [];
  const { lbp } = perpendiculars(hull);
  let yMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const st of hull.stations) {
    for (const p of st.points) {
      if (p.y > yMax) yMax = p.y;
      if (p.z < zMin) zMin = p.z;
      if (p.z > zMax) zMax = p.z;
    }
  }
  const beam = 2 * yMax;
  const depth = zMax - zMin;
  const factor = units === 'm' || units === 'mm' || units === 'ft' || units === 'in' || units === 'ft-in-8' ? lengthFactor(units) : 1;
  if (lbp > LONGEST_PLAUSIBLE_LBP) {
    const asWritten = lbp / factor;
    const guesses: string[] = [];
    // What the file's numbers would give read in another unit, where that is a plausible length.
    for (const [u, f] of [['mm', 0.001], ['in', 0.0254], ['ft', 0.3048]] as const) {
      if (u !== units && asWritten * f >= 1 && asWritten * f <= LONGEST_PLAUSIBLE_LBP) guesses.push(`${u} (${m3(asWritten * f)} m)`);
    }
    const hint = guesses.length > 0 ? `; read as ${guesses.join(' or ')} it would be a vessel's length: give the unit in a '# units:' line` : '';
    out.push({ code: 'HYD_PROPORTIONS', path: ['stations'], message: `the length between perpendiculars is ${m3(lbp)} m, longer than any vessel (about ${LONGEST_PLAUSIBLE_LBP} m)${hint}` });
  }
  if (lbp > 0 && beam > lbp) {
    out.push({ code: 'HYD_PROPORTIONS', path: ['stations'], message: `the greatest breadth (${m3(beam)} m) exceeds the length between perpendiculars (${m3(lbp)} m): are x and the half-breadths swapped, full breadths given for half-breadths, or ap and fp misplaced?` });
  }
  if (lbp > 0 && depth > lbp) {
    out.push({ code: 'HYD_PROPORTIONS', path: ['stations'], message: `the depth from the lowest to the highest point (${m3(depth)} m) exceeds the length between perpendiculars (${m3(lbp)} m): are the columns or the perpendiculars right?` });
  }
  return out;
}

