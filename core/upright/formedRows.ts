/**
 * Whether the particulars at a draft can be formed at all. Centres, BM, KM and MCT are
 * quotients by the immersed volume or the waterplane area: where the hull has no
 * immersed volume at a draft (every half-breadth below it zero, or a draft a hair above
 * the keel whose area underflows to zero) or no waterplane, they have no value, and an
 * answer must say so naming the draft rather than carry a row of nulls. Only the form
 * coefficients (Cb, Cm, Cp, Cwp) may be undefined, where their denominator is zero; they
 * are written as null in JSON and empty in CSV, as documented.
 *
 * Checked on the rows once computed, so that the numerics stay as they are.
 */
import { HalfbreadthError, issue, type Issue } from '../common/errors.js';
import { HYDROSTATIC_FIELDS, type HydrostaticField, type HydrostaticRow } from './hydrostaticFields.js';
import type { LengthParticulars } from './particulars.js';

/** The fields that may be undefined (null in JSON): the form coefficients, where a denominator is zero. */
export const UNDEFINED_ALLOWED: ReadonlySet<HydrostaticField> = new Set(['cb', 'cm', 'cp', 'cwp']);

const label = (key: string): string => HYDROSTATIC_FIELDS.find((f) => f.key === key)?.label ?? key;

/** The fields that must be finite, listed once (the check runs on every row of every table). */
const MUST_BE_FINITE: readonly HydrostaticField[] = HYDROSTATIC_FIELDS.map((f) => f.key).filter((k) => !UNDEFINED_ALLOWED.has(k));

/** The issue of one draft's particulars, or undefined when they are all formed. */
function formedIssue(draft: number, values: Partial<Record<HydrostaticField, number>>, path: () => readonly (string | number)[]): Issue | undefined {
  const where = (): string => `draft ${draft} m`;
  if (values.volume! < 0) {
    return issue('HYD_NOT_IMMERSED', path(), `${where()}: the immersed volume comes out negative (${values.volume!.toPrecision(4)} m3): the stations are spaced too unevenly for Simpson's rule (an interval far shorter than the one beside it); space them more evenly`);
  }
  if (!(values.volume! > 0)) {
    return issue('HYD_NOT_IMMERSED', path(), `${where()}: the hull has no immersed volume at this draft (its half-breadths below it are zero, or it lies too close to the keel), so the centres and moments of buoyancy cannot be formed; give a draft where the hull has breadth`);
  }
  if (!(values.waterplaneArea! > 0)) {
    return issue('HYD_NOT_IMMERSED', path(), `${where()}: the hull has no waterplane at this draft (its half-breadths at the waterline are all zero), so the centre of flotation and the longitudinal moments cannot be formed`);
  }
  let allFinite = true;
  for (const k of MUST_BE_FINITE) {
    const v = values[k];
    if (v !== undefined && !Number.isFinite(v)) allFinite = false;
  }
  if (allFinite) return undefined;
  const bad = MUST_BE_FINITE.filter((k) => values[k] !== undefined && !Number.isFinite(values[k]));
  return issue('HYD_NOT_IMMERSED', path(), `${where()}: ${bad.map(label).join(', ')} cannot be formed as finite numbers; the hull is too small or too thin at this draft to float`);
}

/** Throw HYD_NOT_IMMERSED naming every draft of a table whose particulars cannot be formed. */
export function requireFormedRows(rows: readonly HydrostaticRow[], path: readonly (string | number)[] = ['drafts']): void {
  const issues: Issue[] = [];
  rows.forEach((r, k) => {
    const found = formedIssue(r.draft, r, () => [...path, k]);
    if (found !== undefined) issues.push(found);
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
}

/** The same for the particulars of one draft (a calculation sheet's results). */
export function requireFormed(draft: number, results: LengthParticulars, path: readonly (string | number)[] = ['draft']): void {
  const found = formedIssue(draft, results, () => path);
  if (found !== undefined) throw new HalfbreadthError([found]);
}

/** A curve of sectional areas at a draft has an LCB only where the hull has immersed volume there. */
export function requireImmersed(draft: number, volume: number, path: readonly (string | number)[] = ['draft']): void {
  const found = formedIssue(draft, { volume, waterplaneArea: 1 }, () => path);
  if (found !== undefined) throw new HalfbreadthError([found]);
}
