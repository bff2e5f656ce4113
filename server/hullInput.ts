/**
 * A hull from a request body: an offsets file (text/csv) read by core's readOffsetsCsv,
 * or a JSON hull model (the `offsets` field of a JSON body) read by readHullJson.
 * Issues of a JSON model get `offsets` at the head of their paths, as CSV issues have.
 */
import { HalfbreadthError } from '../core/common/errors.js';
import type { HullModel } from '../core/hull/hullModel.js';
import { prepareHull, type PreparedHull } from '../core/hull/preparedHull.js';
import { readHullJson, readOffsetsCsv } from '../core/offsets/readOffsets.js';
import type { ReadingWarning } from '../core/offsets/readingWarnings.js';
import type { HullForm } from './store/hullStore.js';

/** A hull read and made ready for computation. */
export interface LoadedHull extends ReadHull {
  readonly prepared: PreparedHull;
}

export interface ReadHull {
  readonly hull: HullModel;
  readonly form: HullForm;
  readonly units: string;
  /** Warnings about how the offsets file is written (none for a JSON model); asked for by the check only. */
  readonly notes: () => readonly ReadingWarning[];
}

export function hullFromCsv(text: string): ReadHull {
  const r = readOffsetsCsv(text);
  return { hull: r.hull, form: r.form, units: r.units, notes: () => r.notes };
}

/**
 * The notes of a stored upload, found by reading its text again when asked for (the
 * store keeps the model read from it, not the notes).
 */
export function notesOfSource(mediaType: string, bytes: () => Buffer | undefined): () => readonly ReadingWarning[] {
  return () => {
    if (mediaType !== 'text/csv') return [];
    const b = bytes();
    return b === undefined ? [] : readOffsetsCsv(b.toString('utf8')).notes;
  };
}

export function hullFromJson(offsets: unknown): ReadHull {
  try {
    return { hull: readHullJson(offsets), form: 'model', units: 'm', notes: () => [] };
  } catch (e) {
    if (!(e instanceof HalfbreadthError)) throw e;
    // readHullJson's messages begin with the path in the model ("stations[2].x: ...", "the hull: ...").
    const where = (m: string): string => (m.startsWith('the hull') ? `offsets${m.slice('the hull'.length)}` : `offsets.${m}`);
    throw new HalfbreadthError(e.issues.map((i) => ({ ...i, path: ['offsets', ...i.path], message: where(i.message) })));
  }
}

/** The same hull under another name (a `name` given beside the offsets). */
export function renamed(read: ReadHull, name: string | undefined): ReadHull {
  return name === undefined ? read : { ...read, hull: { ...read.hull, name } };
}

export function loadHull(read: ReadHull): LoadedHull {
  return { ...read, prepared: prepareHull(read.hull) };
}
