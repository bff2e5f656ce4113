/**
 * The rules of the stability work's inputs, in one place for the core, the command line
 * and the service: heels within a half turn either way, a deck edge given at every station
 * for any heeled waterplane, the typed lists (displacements in t and heels in degrees as
 * values and ranges from:step:to, core/common/numberList.ts; openings as `x,y,z` points
 * separated by `;`) and the size of a set of cross curves.
 *
 * A list or a point that cannot be read (a word, a range the wrong way round, more values
 * than the limit) is a malformed argument, HYD_BAD_ARGUMENT (400 in the service), as the
 * same fault in a JSON body is; HYD_ANGLE_RANGE and HYD_LOAD_OUT_OF_RANGE are kept for
 * values that read but break their rule (a heel past a half turn, a load the hull cannot float).
 *
 * Heeled, a section's immersed part depends on where its deck edge is (deck immersion);
 * a grid table that stops at its top waterline without saying the deck edge is there
 * leaves that unknown, and a heeled figure would rest on a guess. So heeled work is
 * refused for such a table (HYD_DECK_NOT_GIVEN, naming the stations), and the deck_z and
 * deck_y columns of the grid form, or the points form, say where the deck edges are.
 */
import { fail } from '../common/errors.js';
import { LIMITS } from '../common/limits.js';
import { parseNumberList } from '../common/numberList.js';
import { readTypedLength, TYPED_LENGTH_UNIT, typedMassFactor } from '../common/typedLength.js';
import type { UnitSystem } from '../common/units.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import type { Opening } from './rightingLevers.js';

/** Heels allowed, degrees: from a capsized hull one way to the other. */
export const HEEL_RANGE = { min: -180, max: 180 } as const;

/** Which stations' deck edges the offsets leave unsaid (taken at the table's top waterline): indices. */
export interface DeckEdges {
  readonly assumedAt: readonly number[];
}

/** Every heel finite and within HEEL_RANGE; the first that is not is HYD_ANGLE_RANGE at `path`. */
export function checkHeels(heels: readonly number[], path: readonly (string | number)[]): void {
  heels.forEach((h, k) => {
    if (!Number.isFinite(h) || h < HEEL_RANGE.min || h > HEEL_RANGE.max) {
      fail('HYD_ANGLE_RANGE', [...path, k], `heel ${h} degrees is outside ${HEEL_RANGE.min} to ${HEEL_RANGE.max} degrees`);
    }
  });
}

/** HYD_DECK_NOT_GIVEN when any heel is not 0 and some station's deck edge is not given. */
export function checkDeckEdges(p: PreparedHull, heels: readonly number[], deck: DeckEdges): void {
  if (deck.assumedAt.length === 0 || heels.every((h) => h === 0)) return;
  const xs = deck.assumedAt.slice(0, 8).map((i) => String(Number(p.x[i]!.toPrecision(6))));
  const more = deck.assumedAt.length > 8 ? ` and ${deck.assumedAt.length - 8} more` : '';
  fail(
    'HYD_DECK_NOT_GIVEN',
    ['offsets'],
    `heeled hydrostatics need every station's deck edge, and the table stops at its top waterline at x = ${xs.join(', ')} m${more} without saying the deck edge is there: give deck_z and deck_y (or the points form)`,
  );
}

/** Displacements `5:2.5:15,16`, in tonnes (long tons with imperial units); given in tonnes. */
export function parseDisplacements(text: string, path: readonly (string | number)[] = ['displacements'], system: UnitSystem = 'si'): number[] {
  const values = parseNumberList(text, path, { noun: 'displacements', code: 'HYD_BAD_ARGUMENT', max: LIMITS.maxDisplacements, example: '5:2.5:15,16' });
  const f = typedMassFactor(system);
  return f === 1 ? values : values.map((v) => v * f);
}

/** Heels, degrees: `0:10:90` or `-30:5:30`; each within HEEL_RANGE, checked where they are used. */
export function parseHeels(text: string, path: readonly (string | number)[] = ['heels']): number[] {
  return parseNumberList(text, path, { noun: 'heels', code: 'HYD_BAD_ARGUMENT', max: LIMITS.maxHeels, example: '0:10:90' });
}

/**
 * Openings (downflooding points) `x,y,z;x,y,z` in the hull's frame, metres (feet, decimal or
 * feet-inches-eighths, with imperial units); given in metres. Where each lies is checked
 * against the hull later (checkOpenings).
 */
export function parseOpenings(text: string, path: readonly (string | number)[] = ['openings'], system: UnitSystem = 'si'): Opening[] {
  const parts = text.split(';').map((s) => s.trim()).filter((s) => s !== '');
  if (parts.length > LIMITS.maxOpenings) fail('HYD_BAD_ARGUMENT', path, `more than ${LIMITS.maxOpenings} openings`);
  const unit = TYPED_LENGTH_UNIT[system];
  return parts.map((part, k) => {
    const nums = part.split(',').map((s) => readTypedLength(s.trim(), system));
    if (nums.length !== 3 || nums.some((v) => !Number.isFinite(v))) {
      fail('HYD_BAD_ARGUMENT', [...path, k], `opening ${k + 1} "${part.slice(0, 40)}" is not a point x,y,z in ${unit} (openings are separated by ;, e.g. 4.2,1.1,1.6;6,-0.9,1.8)`);
    }
    const [x, y, z] = nums as [number, number, number];
    return { x, y, z };
  });
}

/** A set of cross curves within LIMITS.maxCrossCurvePoints, else HYD_TOO_LARGE naming the product. */
export function checkCrossCurveSize(displacements: number, heels: number, path: readonly (string | number)[] = ['heels']): void {
  if (displacements * heels > LIMITS.maxCrossCurvePoints) {
    fail('HYD_TOO_LARGE', path, `${displacements} displacements x ${heels} heels is ${displacements * heels} points of cross curves; at most ${LIMITS.maxCrossCurvePoints} in one request`);
  }
}
