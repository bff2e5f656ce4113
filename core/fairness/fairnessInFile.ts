/**
 * The fairness warnings of a hull read from an offsets file, said as the file says them:
 * at the offset's line and column, with the station and waterline as written and the
 * value and its fair value in the file's own units (feet-inches-eighths for a table in
 * them, to the nearest sixteenth). The check itself is core/fairness/fairness.ts's, in
 * metres; only the words change. x, z, value and suggested stay in metres in the JSON.
 */
import { formatFeetInches } from '../common/feetInches.js';
import { lengthFactor, type LengthUnit } from '../common/units.js';
import type { FilePlace } from '../offsets/offsetsPlaces.js';
import { fairnessWarnings, type FairnessWarning } from './fairness.js';
import type { HullModel } from '../hull/hullModel.js';

/** What a file says of where its offsets are: its unit, and the place of each point. */
export interface FileReading {
  readonly units: LengthUnit;
  readonly place: (station: number, point: number, field: 'y' | 'z') => FilePlace;
}

/** A length in metres in a file's unit, as the file would write it. */
export function inFileUnits(metres: number, units: LengthUnit): string {
  if (units === 'ft-in-8') return formatFeetInches(metres / lengthFactor('ft'));
  return `${String(Number((metres / lengthFactor(units)).toPrecision(6)))} ${units}`;
}

/** The fairness warnings of a hull; when it was read from a file, placed and worded in the file's terms. */
export function fairnessWarningsIn(hull: HullModel, reading?: FileReading): FairnessWarning[] {
  const found = fairnessWarnings(hull);
  if (reading === undefined) return found;
  return found.map((w) => {
    const [, i, , j] = w.path as [string, number, string, number, string];
    const field = w.offset === 'halfBreadth' ? 'y' : 'z';
    const at = reading.place(i, j, field);
    const what = w.offset === 'halfBreadth' ? 'half-breadth' : 'height';
    const lines = w.along.map((a) => (a === 'line' ? 'the line of points along the length' : `the ${a}`)).join(' and ');
    const where = at.line === undefined ? '' : at.column === undefined ? `line ${at.line}` : `line ${at.line}, column ${at.column}`;
    const place = at.where === undefined ? where : `${where} (${at.where})`;
    const message = `${place}: ${what} ${inFileUnits(w.value, reading.units)} is not fair along ${lines}; its neighbours suggest ${inFileUnits(w.suggested, reading.units)}`;
    return { ...w, message, ...(at.line === undefined ? {} : { line: at.line }), ...(at.column === undefined ? {} : { column: at.column }) };
  });
}
