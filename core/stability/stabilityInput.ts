/**
 * The rules of the stability work's inputs, in one place: heels within a half turn either
 * way, and a deck edge given at every station for any heeled waterplane.
 *
 * Heeled, a section's immersed part depends on where its deck edge is (deck immersion);
 * a grid table that stops at its top waterline without saying the deck edge is there
 * leaves that unknown, and a heeled figure would rest on a guess. So heeled work is
 * refused for such a table (HYD_DECK_NOT_GIVEN, naming the stations), and the deck_z and
 * deck_y columns of the grid form, or the points form, say where the deck edges are.
 */
import { fail } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';

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
