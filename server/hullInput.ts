/**
 * A hull from a request body: an offsets file (text/csv) read by core's readOffsetsCsv,
 * or a JSON hull model (the `offsets` field of a JSON body) read by readHullJson.
 * Issues of a JSON model get `offsets` at the head of their paths, as CSV issues have.
 */
import { HalfbreadthError } from '../core/common/errors.js';
import type { HullModel } from '../core/hull/hullModel.js';
import { prepareHull, type PreparedHull } from '../core/hull/preparedHull.js';
import { readHullJson, readOffsetsCsv } from '../core/offsets/readOffsets.js';
import type { HullForm } from './store/hullStore.js';

/** A hull read and made ready for computation. */
export interface LoadedHull {
  readonly hull: HullModel;
  readonly form: HullForm;
  readonly units: string;
  readonly prepared: PreparedHull;
}

export interface ReadHull {
  readonly hull: HullModel;
  readonly form: HullForm;
  readonly units: string;
}

export function hullFromCsv(text: string): ReadHull {
  const r = readOffsetsCsv(text);
  return { hull: r.hull, form: r.form, units: r.units };
}

export function hullFromJson(offsets: unknown): ReadHull {
  try {
    return { hull: readHullJson(offsets), form: 'model', units: 'm' };
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
