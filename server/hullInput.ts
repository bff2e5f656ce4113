/**
 * A hull from a request body: an offsets file (text/csv) read by core's readOffsetsCsv,
 * or a JSON hull model (the `offsets` field of a JSON body) read by readHullJson.
 * Issues of a JSON model get `offsets` at the head of their paths, as CSV issues have.
 */
import { HalfbreadthError } from '../core/common/errors.js';
import { isLengthUnit, type LengthUnit } from '../core/common/units.js';
import type { FileReading } from '../core/fairness/fairnessInFile.js';
import type { HullModel } from '../core/hull/hullModel.js';
import { prepareHull, type PreparedHull } from '../core/hull/preparedHull.js';
import { readHullJson, readOffsetsCsv, type ReadResult } from '../core/offsets/readOffsets.js';
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
  /** Where the file placed each offset and in what unit, for warnings in its own terms; undefined for a JSON model. */
  readonly reading: () => FileReading | undefined;
}

export function hullFromCsv(text: string, inputUnits?: LengthUnit): ReadHull {
  const r = readOffsetsCsv(text, { inputUnits });
  return { hull: r.hull, form: r.form, units: r.units, notes: () => r.notes, reading: () => r };
}

/**
 * The notes and the reading of a stored upload, found by reading its text again when
 * asked for (the store keeps the model read from it, not the notes), in the unit it was
 * read in when stored (`units`, which covers a file read with inputUnits).
 */
export function sourceReading(mediaType: string, bytes: () => Buffer | undefined, units: string): Pick<ReadHull, 'notes' | 'reading'> {
  let read: ReadResult | undefined | null = null;
  const once = (): ReadResult | undefined => {
    if (read !== null) return read;
    const b = mediaType === 'text/csv' ? bytes() : undefined;
    read = b === undefined ? undefined : readOffsetsCsv(b.toString('utf8'), { inputUnits: isLengthUnit(units) ? units : undefined });
    return read;
  };
  return { notes: () => once()?.notes ?? [], reading: () => once() };
}

export function hullFromJson(offsets: unknown): ReadHull {
  try {
    return { hull: readHullJson(offsets), form: 'model', units: 'm', notes: () => [], reading: () => undefined };
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
